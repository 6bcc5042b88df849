#!/usr/bin/python3
"""Reference END states and saturation crossings of process legs, from python3-iapws (Debian).

Water: iapws.IAPWS95 (IAPWS R6-95(2018)); ammonia: iapws.ammonia.NH3 (Tillner-Roth,
Harms-Watzenberg & Baehr 1993) -- the same equations as src/lib/thermo/fluids/.

Only the library's direct calls are used: F(T=, rho=), F(T=, P=) and F(T=, x=). Where a leg's end
or crossing is defined by an invariant (s, h, P*v^n, v on a saturation line, a saturation
pressure), it is found here by bisection over those direct calls; every property written out still
comes from a direct call at the bracketed temperature. The library's inverse solvers ((P, h),
(P, s), ...) are not used.

Regenerate (Debian's interpreter; the pyenv python3 on PATH does not see python3-iapws):
    apt-get install -y python3-iapws
    /usr/bin/python3 tests/reference/make-iapws-legs.py > tests/reference/iapws-legs.json

Units: SI base units (K, Pa, kg/m3, m3/kg, J/kg, J/(kg K)). Energies are on each library class's
own convention; for ammonia the saturated liquid at 273.15 K is written out so a test can shift
to the IIR convention (h = 200 kJ/kg, s = 1 kJ/(kg K) there). Tests compare T, P, rho, x and the
differences du, dh, ds between end and start, which no convention changes.
"""
import json
import sys
import warnings

import iapws
from iapws import IAPWS95
from iapws.ammonia import NH3

warnings.filterwarnings('ignore')  # transport properties warn near the critical point

FLUIDS = {'water': IAPWS95, 'ammonia': NH3}


def rec(st):
    x = st.x if 0 < st.x < 1 else None
    return {'T': st.T, 'P': st.P * 1e6, 'rho': st.rho, 'v': 1 / st.rho, 'u': st.u * 1e3,
            'h': st.h * 1e3, 's': st.s * 1e3, 'x': x}


def bisect(f, lo, hi, n=200):
    """Root of f on [lo, hi] (opposite signs at the ends), to the last bit of the float."""
    flo = f(lo)
    for _ in range(n):
        mid = 0.5 * (lo + hi)
        if mid in (lo, hi):
            break
        fm = f(mid)
        if (fm < 0) == (flo < 0):
            lo, flo = mid, fm
        else:
            hi = mid
    return 0.5 * (lo + hi)


def sat(F, T):
    return F(T=T, x=0), F(T=T, x=1)


def t_range(F):
    return F.Tt + 1e-6, F.Tc - 1e-3


def tsat_of_p(F, P):
    lo, hi = t_range(F)
    return bisect(lambda T: F(T=T, x=0).P * 1e6 - P, lo, hi)


def on_line(F, x, prop, value):
    """Temperature where the saturated liquid (x = 0) or vapor (x = 1) has prop = value."""
    lo, hi = t_range(F)
    return bisect(lambda T: getattr(F(T=T, x=x), prop) * (1 if prop == 'rho' else 1e3) - value, lo, hi)


def at_tp_prop(F, P, prop, value, lo, hi):
    """Single-phase T at pressure P with prop (h or s, J units) = value, by (T, P) calls."""
    return bisect(lambda T: getattr(F(T=T, P=P / 1e6), prop) * 1e3 - value, lo, hi)


def mixture_at_t(F, T, prop, value):
    """Two-phase state at T whose prop (v, h or s) = value, by (T, x) calls."""
    liq, vap = sat(F, T)
    if prop == 'v':
        a, b = 1 / liq.rho, 1 / vap.rho
    else:
        a, b = getattr(liq, prop) * 1e3, getattr(vap, prop) * 1e3
    return F(T=T, x=(value - a) / (b - a))


def crossing(line, st):
    return {'line': line, 'T': st.T, 'P': st.P * 1e6, 'rho': st.rho}


cases = []


def add(fluid, name, start_call, start, process, target, end, crossings, n=None, note=''):
    case = {'fluid': fluid, 'name': name, 'start': start, 'startCall': start_call, 'process': process,
            'target': target, 'startState': rec(start_st[0]), 'end': rec(end), 'crossings': crossings}
    if n is not None:
        case['n'] = n
    if note:
        case['note'] = note
    cases.append(case)


start_st = [None]


def begin(F, **kw):
    st = F(**({k: (v / 1e6 if k == 'P' else v) for k, v in kw.items()}))
    start_st[0] = st
    return st


W = IAPWS95
A = NH3

# ---- water ------------------------------------------------------------------------------------
# isobaric heating at 101325 Pa from compressed liquid at 300 K to superheated vapor at 500 K
P = 101325.0
s0 = begin(W, T=300.0, P=P)
Ts = tsat_of_p(W, P)
liq, vap = sat(W, Ts)
add('water', 'isobaric liquid to vapor', 'T,P', {'T': 300.0, 'P': P}, 'isobaric', {'T': 500.0},
    W(T=500.0, P=P / 1e6), [crossing('saturated-liquid', liq), crossing('saturated-vapor', vap)])

# isobaric cooling at 1 MPa from superheated 600 K to a quality of 0.5
P = 1e6
s0 = begin(W, T=600.0, P=P)
Ts = tsat_of_p(W, P)
add('water', 'isobaric vapor to wet', 'T,P', {'T': 600.0, 'P': P}, 'isobaric', {'x': 0.5},
    W(T=Ts, x=0.5), [crossing('saturated-vapor', W(T=Ts, x=1))])

# isochoric heating of a nearly liquid-full vessel (120 C, x = 1e-4) past the saturated-liquid line
s0 = begin(W, T=393.15, x=1e-4)
rho0 = s0.rho
Tx = on_line(W, 0, 'rho', rho0)
add('water', 'isochoric to liquid-full', 'T,x', {'T': 393.15, 'x': 1e-4}, 'isochoric', {'T': 493.15},
    W(T=493.15, rho=rho0), [crossing('saturated-liquid', W(T=Tx, x=0))])

# isochoric heating of wet steam (400 K, x = 0.5) until it dries out, to 600 K
s0 = begin(W, T=400.0, x=0.5)
rho0 = s0.rho
Tx = on_line(W, 1, 'rho', rho0)
add('water', 'isochoric dry-out', 'T,x', {'T': 400.0, 'x': 0.5}, 'isochoric', {'T': 600.0},
    W(T=600.0, rho=rho0), [crossing('saturated-vapor', W(T=Tx, x=1))])

# isothermal at 450 K from x = 0.5: expansion to 10 kPa, compression to 10 MPa
for Pend, line in ((1e4, 'saturated-vapor'), (1e7, 'saturated-liquid')):
    s0 = begin(W, T=450.0, x=0.5)
    add('water', f'isothermal to {Pend:g} Pa', 'T,x', {'T': 450.0, 'x': 0.5}, 'isothermal', {'P': Pend},
        W(T=450.0, P=Pend / 1e6), [crossing(line, W(T=450.0, x=1 if line == 'saturated-vapor' else 0))])

# isothermal above the critical temperature: 700 K, 0.1 MPa to 50 MPa, no crossing
s0 = begin(W, T=700.0, P=1e5)
add('water', 'supercritical isotherm', 'T,P', {'T': 700.0, 'P': 1e5}, 'isothermal', {'P': 5e7},
    W(T=700.0, P=50.0), [])

# isentropic expansion from 800 K, 10 MPa to 10 kPa (ends wet)
s0 = begin(W, T=800.0, P=1e7)
sv = s0.s * 1e3
Ts = tsat_of_p(W, 1e4)
Tx = on_line(W, 1, 's', sv)
add('water', 'isentropic expansion into the dome', 'T,P', {'T': 800.0, 'P': 1e7}, 'isentropic', {'P': 1e4},
    mixture_at_t(W, Ts, 's', sv), [crossing('saturated-vapor', W(T=Tx, x=1))])

# isentropic expansion from 700 K, 5 MPa to 350 K
s0 = begin(W, T=700.0, P=5e6)
sv = s0.s * 1e3
Tx = on_line(W, 1, 's', sv)
add('water', 'isentropic expansion to a temperature', 'T,P', {'T': 700.0, 'P': 5e6}, 'isentropic', {'T': 350.0},
    mixture_at_t(W, 350.0, 's', sv), [crossing('saturated-vapor', W(T=Tx, x=1))])

# isentropic compression of liquid: 300 K, 0.1 MPa to 20 MPa
s0 = begin(W, T=300.0, P=1e5)
sv = s0.s * 1e3
add('water', 'isentropic pump', 'T,P', {'T': 300.0, 'P': 1e5}, 'isentropic', {'P': 2e7},
    W(T=at_tp_prop(W, 2e7, 's', sv, 300.0, 302.0), P=20.0), [])

# throttling hot compressed liquid: 500 K, 3 MPa to 0.1 MPa (flashes)
s0 = begin(W, T=500.0, P=3e6)
hv = s0.h * 1e3
Ts = tsat_of_p(W, 1e5)
Tx = on_line(W, 0, 'h', hv)
add('water', 'throttling flash', 'T,P', {'T': 500.0, 'P': 3e6}, 'isenthalpic', {'P': 1e5},
    mixture_at_t(W, Ts, 'h', hv), [crossing('saturated-liquid', W(T=Tx, x=0))])

# throttling superheated steam: 600 K, 4 MPa to 0.2 MPa (stays superheated)
s0 = begin(W, T=600.0, P=4e6)
hv = s0.h * 1e3
add('water', 'throttling steam', 'T,P', {'T': 600.0, 'P': 4e6}, 'isenthalpic', {'P': 2e5},
    W(T=at_tp_prop(W, 2e5, 'h', hv, 500.0, 600.0), P=0.2), [])

# polytropic compression of superheated vapor, n = 1.3: 400 K, 0.1 MPa to 1 MPa
n = 1.3
s0 = begin(W, T=400.0, P=1e5)
rho_end = s0.rho * (1e6 / 1e5) ** (1 / n)
Tend = bisect(lambda T: W(T=T, rho=rho_end).P * 1e6 - 1e6, 450.0, 800.0)
add('water', 'polytropic compression', 'T,P', {'T': 400.0, 'P': 1e5}, 'polytropic', {'P': 1e6},
    W(T=Tend, rho=rho_end), [], n=n)

# ---- ammonia ----------------------------------------------------------------------------------
# isobaric at 0.4 MPa from liquid at 250 K to vapor at 320 K
P = 4e5
s0 = begin(A, T=250.0, P=P)
Ts = tsat_of_p(A, P)
liq, vap = sat(A, Ts)
add('ammonia', 'isobaric liquid to vapor', 'T,P', {'T': 250.0, 'P': P}, 'isobaric', {'T': 320.0},
    A(T=320.0, P=P / 1e6), [crossing('saturated-liquid', liq), crossing('saturated-vapor', vap)])

# isentropic compression of saturated vapor at 263.15 K to 1.2 MPa
s0 = begin(A, T=263.15, x=1)
sv = s0.s * 1e3
add('ammonia', 'isentropic compressor', 'T,x', {'T': 263.15, 'x': 1.0}, 'isentropic', {'P': 1.2e6},
    A(T=at_tp_prop(A, 1.2e6, 's', sv, 310.0, 420.0), P=1.2), [])

# throttling saturated liquid at 304 K down to 263.15 K
s0 = begin(A, T=304.0, x=0)
hv = s0.h * 1e3
add('ammonia', 'expansion valve', 'T,x', {'T': 304.0, 'x': 0.0}, 'isenthalpic', {'T': 263.15},
    mixture_at_t(A, 263.15, 'h', hv), [])

# isochoric heating of wet ammonia (300 K, x = 0.05) until it dries out, to 400 K
s0 = begin(A, T=300.0, x=0.05)
rho0 = s0.rho
Tx = on_line(A, 1, 'rho', rho0)
add('ammonia', 'isochoric dry-out', 'T,x', {'T': 300.0, 'x': 0.05}, 'isochoric', {'T': 400.0},
    A(T=400.0, rho=rho0), [crossing('saturated-vapor', A(T=Tx, x=1))])

# isothermal compression at 300 K from 0.2 MPa vapor to v = 0.01 m3/kg (wet)
s0 = begin(A, T=300.0, P=2e5)
add('ammonia', 'isothermal condensation', 'T,P', {'T': 300.0, 'P': 2e5}, 'isothermal', {'v': 0.01},
    mixture_at_t(A, 300.0, 'v', 0.01), [crossing('saturated-vapor', A(T=300.0, x=1))])

# ---- practitioner extras: saturation temperature at the state's pressure, volume fractions -------
extras = []


def extra(fluid, F, call, inputs):
    st = F(**({k: (v / 1e6 if k == 'P' else v) for k, v in inputs.items()}))
    out = {'fluid': fluid, 'call': call, 'inputs': inputs, 'T': st.T, 'P': st.P * 1e6}
    if 0 <= st.x <= 1 and call == 'T,x':
        liq, vap = sat(F, st.T)
        v = 1 / st.rho
        out['vaporVolumeFraction'] = st.x * (1 / vap.rho) / v
        out['liquidVolumeFraction'] = (1 - st.x) * (1 / liq.rho) / v
        out['Tsat'] = st.T
    else:
        out['Tsat'] = tsat_of_p(F, st.P * 1e6)
    extras.append(out)


extra('water', W, 'T,P', {'T': 500.0, 'P': 101325.0})
extra('water', W, 'T,P', {'T': 350.0, 'P': 1e6})
extra('water', W, 'T,x', {'T': 393.15, 'x': 1e-4})
extra('water', W, 'T,x', {'T': 450.0, 'x': 0.5})
extra('ammonia', A, 'T,x', {'T': 263.15, 'x': 0.3})
extra('ammonia', A, 'T,P', {'T': 320.0, 'P': 4e5})

liq0 = NH3(T=273.15, x=0)
doc = {
    'source': f'python3-iapws {iapws.__version__} (Debian): iapws.IAPWS95 and iapws.ammonia.NH3, direct calls only',
    'generator': 'tests/reference/make-iapws-legs.py',
    'units': 'T K, P Pa, rho kg/m3, v m3/kg, u h J/kg, s J/(kg K)',
    'ammoniaSaturatedLiquidAt273_15': {'T': 273.15, 'P': liq0.P * 1e6, 'rho': liq0.rho,
                                       'h': liq0.h * 1e3, 's': liq0.s * 1e3, 'u': liq0.u * 1e3},
    'cases': cases,
    'extras': extras,
}
json.dump(doc, sys.stdout, indent=1)
sys.stdout.write('\n')
