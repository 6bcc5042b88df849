#!/usr/bin/python3
"""Fit ancillary equations (starting guesses only) to a fluid's own reference equation.

Some published ancillary equations could not be traced to the publication (ammonia's). For
such fluids this script evaluates the fluid's
reference equation from its data file in src/lib/thermo/fluids/, solves the phase
equilibrium (equal P and g) on a temperature grid from the triple point to just below the
critical point, and fits the coefficients n of the schema's forms with fixed exponents
(linear least squares):

    pSat       ln(P/Pc)     = (Tc/T)·Σ nᵢ θ^tᵢ,   t = 1, 1.5, 2.5, 3, 4, 5, 7.5
    rhoLiquid  ρ'/ρc        = 1 + Σ nᵢ θ^tᵢ
    rhoVapor   ln(ρ''/ρc)   = Σ nᵢ θ^tᵢ

with θ = 1 − T/Tc. For the densities a few exponent sets are tried (RHOL_SETS, RHOV_SETS) and the
one with the smallest worst-case error is kept among those that stay on the right side of ρc
(ρ' > ρc, ρ'' < ρc) for 1e-9 ≤ θ ≤ 1e-3, where the engine still asks for guesses.
Prints the `ancillaries` entries to paste into the fluid file (which defines FITTED_SOURCE),
with the largest relative error of each fit.

The evaluator here is independent of the engine in src/lib/thermo (it uses complex-step
derivatives), so it also serves as a second implementation when checking a data file.

(R-134a used fitted ancillaries too until the schema took a reducing temperature `Tr`: its
data file now carries the paper's own, reduced with 374.18 K.)

Run:  /usr/bin/python3 tests/reference/fit-ancillaries.py ammonia
      (needs numpy and Node with tsx, to read the TypeScript data file)
"""
import cmath
import json
import math
import subprocess
import sys
from pathlib import Path

import numpy as np

ROOT = Path(__file__).resolve().parents[2]
EXPORTS = {
    'ammonia': ('ammonia', 'ammonia'),
    'carbon-dioxide': ('carbon-dioxide', 'carbonDioxide'),
    'r134a': ('r134a', 'r134a'),
    'nitrogen': ('nitrogen', 'nitrogen'),
}

PSAT_T = [1, 1.5, 2.5, 3, 4, 5, 7.5]
RHOL_SETS = [
    [1 / 3, 1 / 2, 2 / 3, 1, 4 / 3, 2, 3, 5],
    [1 / 3, 2 / 3, 1, 4 / 3, 2, 3, 5, 8],
    [1 / 3, 2 / 3, 1, 5 / 3, 8 / 3, 16 / 3, 43 / 3],
]
RHOV_SETS = [
    [1 / 3, 1 / 2, 2 / 3, 1, 4 / 3, 2, 3, 5, 8],
    [1 / 3, 2 / 3, 1, 4 / 3, 2, 3, 5, 8],
    [1 / 3, 2 / 3, 4 / 3, 3, 37 / 6, 71 / 6],
]
EXPONENT_TEXT = {1 / 3: '1 / 3', 2 / 3: '2 / 3', 4 / 3: '4 / 3'}


def load_fluid(fluid_id):
    module, name = EXPORTS[fluid_id]
    code = (
        f"import {{ {name} }} from './src/lib/thermo/fluids/{module}';"
        f"console.log(JSON.stringify({name}));"
    )
    out = subprocess.run(['npx', 'tsx', '-e', code], cwd=ROOT, check=True, capture_output=True, text=True)
    return json.loads(out.stdout)


class Equation:
    """Reduced Helmholtz energy α(δ, τ) of a fluid data file; complex arguments allowed."""

    def __init__(self, fluid):
        self.f = fluid
        self.R = fluid['R']
        self.Tr = fluid['reducing']['T']
        self.rhor = fluid['reducing']['rho']

    def alpha_r(self, delta, tau):
        a = 0
        for term in self.f['residual']:
            k = term['kind']
            if k == 'polynomial':
                for n, d, t in zip(term['n'], term['d'], term['t']):
                    a += n * delta**d * tau**t
            elif k == 'exponential':
                for n, d, t, l in zip(term['n'], term['d'], term['t'], term['l']):
                    a += n * delta**d * tau**t * cmath.exp(-delta**l)
            elif k == 'gaussian':
                for n, d, t, al, be, ga, ep in zip(term['n'], term['d'], term['t'], term['alpha'],
                                                   term['beta'], term['gamma'], term['epsilon']):
                    a += n * delta**d * tau**t * cmath.exp(-al * (delta - ep)**2 - be * (tau - ga)**2)
            elif k == 'non-analytic':
                for n, ai, bi, be, A, B, C, D in zip(term['n'], term['a'], term['b'], term['beta'],
                                                     term['A'], term['B'], term['C'], term['D']):
                    q = (delta - 1)**2
                    theta = (1 - tau) + A * q**(1 / (2 * be))
                    Delta = theta**2 + B * q**ai
                    psi = cmath.exp(-C * q - D * (tau - 1)**2)
                    a += n * Delta**bi * delta * psi
            else:
                raise ValueError(f'unknown residual term {k}')
        return a

    def alpha_0(self, delta, tau):
        a = cmath.log(delta)
        for term in self.f['ideal']:
            k = term['kind']
            if k == 'lead':
                a += term['a1'] + term['a2'] * tau
            elif k == 'log-tau':
                a += term['a'] * cmath.log(tau)
            elif k == 'power':
                for n, t in zip(term['n'], term['t']):
                    a += n * tau**t
            elif k == 'planck-einstein':
                for n, g in zip(term['n'], term['gamma']):
                    a += n * cmath.log(1 - cmath.exp(-g * tau))
            else:
                raise ValueError(f'unknown ideal term {k}')
        return a

    def _d(self, fn, delta, tau, wrt):
        h = 1e-20 * max(abs(delta if wrt == 'delta' else tau), 1e-3)
        if wrt == 'delta':
            return (fn(complex(delta, h), tau)).imag / h
        return (fn(delta, complex(tau, h))).imag / h

    def props(self, T, rho):
        """P (Pa), h, s (shifted only by the file's published lead constants), g, for (T, ρ)."""
        delta, tau = rho / self.rhor, self.Tr / T
        ar = self.alpha_r(delta, tau).real
        a0 = self.alpha_0(delta, tau).real
        ar_d = self._d(self.alpha_r, delta, tau, 'delta')
        ar_t = self._d(self.alpha_r, delta, tau, 'tau')
        a0_t = self._d(self.alpha_0, delta, tau, 'tau')
        Z = 1 + delta * ar_d
        P = rho * self.R * T * Z
        h = self.R * T * (tau * (a0_t + ar_t) + Z)
        s = self.R * (tau * (a0_t + ar_t) - a0 - ar)
        g = self.R * T * (a0 + ar + Z)
        return {'P': P, 'h': h, 's': s, 'g': g, 'rho': rho, 'T': T}

    def pressure(self, T, rho):
        delta, tau = rho / self.rhor, self.Tr / T
        return rho * self.R * T * (1 + delta * self._d(self.alpha_r, delta, tau, 'delta'))

    def dp_drho(self, T, rho):
        h = 1e-6 * rho
        return (self.pressure(T, rho + h) - self.pressure(T, rho - h)) / (2 * h)

    def g_res(self, T, rho):
        """g/(RT) without the ideal-gas terms common to both phases at one T."""
        delta, tau = rho / self.rhor, self.Tr / T
        ar = self.alpha_r(delta, tau).real
        return math.log(delta) + ar + delta * self._d(self.alpha_r, delta, tau, 'delta')

    def rho_at_p(self, T, P, rho0):
        rho = rho0
        for _ in range(100):
            f = self.pressure(T, rho) - P
            df = self.dp_drho(T, rho)
            step = f / df
            if df <= 0:
                raise ArithmeticError('left the stable branch')
            rho_new = rho - step
            if rho_new <= 0:
                rho_new = rho / 2
            if abs(rho_new - rho) < 1e-13 * rho:
                return rho_new
            rho = rho_new
        raise ArithmeticError('no density for this pressure')

    def saturation(self, T, guess):
        """Solve P(ρ') = P(ρ'') and g(ρ') = g(ρ'') by Newton on (ln ρ', ln ρ'')."""
        rl, rv = guess
        for _ in range(200):
            F = np.array([
                (self.pressure(T, rl) - self.pressure(T, rv)) / (rl * self.R * T),
                self.g_res(T, rl) - self.g_res(T, rv),
            ])
            J = np.zeros((2, 2))
            for j, (x, y) in enumerate([(rl * (1 + 1e-7), rv), (rl, rv * (1 + 1e-7))]):
                Fj = np.array([
                    (self.pressure(T, x) - self.pressure(T, y)) / (rl * self.R * T),
                    self.g_res(T, x) - self.g_res(T, y),
                ])
                J[:, j] = (Fj - F) / 1e-7
            if max(abs(F)) < 1e-14:
                break
            step = np.linalg.solve(J, -F)
            step = np.clip(step, -0.2, 0.2)
            rl, rv = rl * math.exp(step[0]), rv * math.exp(step[1])
            if max(abs(step)) < 1e-13:
                break
        else:
            raise ArithmeticError(f'saturation did not converge at {T} K')
        return rl, rv, self.pressure(T, rl)

    def saturation_low_T(self, T, rho_liquid_hint):
        """Successive substitution on P at a low temperature (vapor close to ideal gas)."""
        rl = self.rho_at_p(T, 0.0, rho_liquid_hint)
        P = 1.0
        for _ in range(200):
            rl = self.rho_at_p(T, P, rl)
            rv = self.rho_at_p(T, P, P / (self.R * T))
            # at equal P the fugacity ratio f'/f'' is exp(g'/RT − g''/RT); g_res holds the part that differs
            P_new = P * math.exp(self.g_res(T, rl) - self.g_res(T, rv))
            if abs(P_new / P - 1) < 1e-13:
                return rl, rv, P_new
            P = P_new
        raise ArithmeticError('low-temperature saturation did not converge')


def saturation_table(eq, fluid, n=160):
    """Saturation states from the triple point to Tc·(1 − 1e-5), by continuation."""
    Tt, Tc = fluid['triple']['T'], fluid['critical']['T']
    # liquid hint: a density well above the critical one on the liquid branch
    rl, rv, P = eq.saturation_low_T(Tt, 3.2 * fluid['critical']['rho'])
    thetas = np.geomspace(1 - Tt / Tc, 1e-5, n)
    rows = []
    rhoc = fluid['critical']['rho']
    th_prev = 1 - Tt / Tc
    for th in thetas:
        T = Tc * (1 - th)
        # densities move away from ρc roughly as θ^0.35 near the critical point
        k = (th / th_prev)**0.35
        guess = (rhoc + (rl - rhoc) * k, rhoc + (rv - rhoc) * k) if th < 0.05 else (rl, rv)
        rl, rv, P = eq.saturation(T, guess)
        th_prev = th
        rows.append((T, P, rl, rv))
    return rows


def lstsq(A, y):
    coef, *_ = np.linalg.lstsq(A, y, rcond=None)
    return coef


def fit(fluid_id):
    fluid = load_fluid(fluid_id)
    eq = Equation(fluid)
    Tc, Pc, rhoc = fluid['critical']['T'], fluid['critical']['P'], fluid['critical']['rho']
    rows = saturation_table(eq, fluid)
    T = np.array([r[0] for r in rows])
    P = np.array([r[1] for r in rows])
    rl = np.array([r[2] for r in rows])
    rv = np.array([r[3] for r in rows])
    th = 1 - T / Tc

    A = np.array([[x**t for t in PSAT_T] for x in th]) * (Tc / T)[:, None]
    n_p = lstsq(A, np.log(P / Pc))
    near = np.geomspace(1e-9, 1e-3, 60)

    def best(sets, y, to_density, side):
        """Least-squares n for each exponent set; keep the smallest worst error with the right side of ρc."""
        chosen = None
        for ts in sets:
            A = np.array([[x**t for t in ts] for x in th])
            n = lstsq(A, y)
            worst = float(np.max(np.abs(to_density(A @ n) / to_density(y) - 1)))
            s_near = np.array([[x**t for t in ts] for x in near]) @ n
            if not np.all(side(s_near)):
                continue
            if chosen is None or worst < chosen[2]:
                chosen = (ts, n, worst)
        if chosen is None:
            raise ArithmeticError('no exponent set keeps the right side of the critical density')
        return chosen[0], chosen[1]

    RHOL_T, n_l = best(RHOL_SETS, rl / rhoc - 1, lambda z: rhoc * (1 + z), lambda z: z > 0)
    RHOV_T, n_v = best(RHOV_SETS, np.log(rv / rhoc), lambda z: rhoc * np.exp(z), lambda z: z < 0)

    def err(pred, ref):
        return float(np.max(np.abs(pred / ref - 1)))

    p_fit = Pc * np.exp(Tc / T * sum(n * th**t for n, t in zip(n_p, PSAT_T)))
    l_fit = rhoc * (1 + sum(n * th**t for n, t in zip(n_l, RHOL_T)))
    v_fit = rhoc * np.exp(sum(n * th**t for n, t in zip(n_v, RHOV_T)))
    away = th > 1e-3
    print(f'// {fluid_id}: fitted to {len(rows)} saturation states, {T[0]:.3f} to {T[-1]:.4f} K')
    print(f'\t\t// Fitted to this equation\u2019s own saturation states by tests/reference/fit-ancillaries.py (starting guesses only).')
    print(f'\t\t// worst relative deviation of the fit: pSat {err(p_fit, P):.1e}  rhoLiquid {err(l_fit[away], rl[away]):.1e} '
          f'(θ > 1e-3; {err(l_fit, rl):.1e} all)  rhoVapor {err(v_fit[away], rv[away]):.1e} (θ > 1e-3; {err(v_fit, rv):.1e} all)')

    def number(x):
        text = f'{x:.10e}'
        mant, exp = text.split('e')
        mant = mant.rstrip('0').rstrip('.')
        e = int(exp)
        return mant if e == 0 else f'{mant}e{e}'

    def ts(ns, ts_, form, yc, what):
        tt = ', '.join(EXPONENT_TEXT.get(t, repr(t)) for t in ts_)
        nn = ', '.join(number(n) for n in ns)
        return (f"\t\t{what}: {{\n\t\t\tform: '{form}',\n\t\t\tn: [{nn}],\n\t\t\tt: [{tt}],\n"
                f"\t\t\tyc: {yc!r},\n\t\t\tsource: FITTED_SOURCE\n\t\t}}")

    print(ts(n_p, PSAT_T, 'ln-ratio-tc-over-t', Pc, 'pSat') + ',')
    print(ts(n_l, RHOL_T, 'ratio-plus-one', rhoc, 'rhoLiquid') + ',')
    print(ts(n_v, RHOV_T, 'ln-ratio', rhoc, 'rhoVapor'))


if __name__ == '__main__':
    for fid in sys.argv[1:] or ['ammonia', 'r134a']:
        fit(fid)
