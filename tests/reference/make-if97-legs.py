#!/usr/bin/python3
"""Fixture for the legs of a water path computed with IAPWS-IF97 (src/lib/thermo/if97/legs.test.ts):
leg points, crossings of the saturation lines and the IF97 vapor dome, from python3-iapws's IAPWS97
class (Debian package python3-iapws). SI units (K, Pa, m³/kg, J/kg, J/(kg·K)).

Leg points: the engine places a leg's points itself, so each leg is given here as the IF97 states
along its process curve on a fine grid of the leg's progress coordinate (h along an isobar, ln P
along an isentrope, T along an isochore), one grid per smooth piece (liquid, inside the dome,
vapor: the pieces meet at the crossings, where the properties have kinks). The test reads each of the
engine's points off that grid by 3-point (quadratic) interpolation in the coordinate, of each value
or (T, P, v: `mode` 'log') of its logarithm, whichever the script finds closer. `tol` is the
interpolation's own error, measured here at the midpoints between nodes, times 4 (with a floor);
it is far below the difference between IF97 and IAPWS-95 (~1e-4 relative), which the test also checks.

Crossings: the saturated state where the leg's invariant meets IF97's saturated liquid or vapor line
(bisection in T along IAPWS97(T=T, x=0 or 1)). Dome: IAPWS97(T=T, x=0 and 1) at temperatures of the
dome's spacing rule T_i = 643.15 − (643.15 − 273.15)(1 − i/99)³ for a 100-point dome.

A state at a given (T, v) outside the dome is found by bisection in ln P on IAPWS97(P, T).v.

Regenerate: apt-get install -y python3-iapws && /usr/bin/python3 tests/reference/make-if97-legs.py
(writes tests/reference/if97-legs.json beside this script).
"""
import json
import math
import os
import iapws
from iapws import IAPWS97

PROPS = ('T', 'P', 'v', 'h', 's')


def si(st):
    return {'T': st.T, 'P': st.P * 1e6, 'v': st.v, 'h': st.h * 1e3, 's': st.s * 1e3}


def w(**k):
    # IAPWS97 speaks MPa and kJ
    args = {}
    for key, val in k.items():
        args[key] = val / 1e6 if key == 'P' else val / 1e3 if key in ('h', 's') else val
    st = IAPWS97(**args)
    assert st.status, k
    return st


def bisect(f, a, b, n=80):
    fa = f(a)
    for _ in range(n):
        m = 0.5 * (a + b)
        fm = f(m)
        if (fm > 0) == (fa > 0):
            a, fa = m, fm
        else:
            b = m
    return 0.5 * (a + b)


def at_T_v(T, v):
    """Single-phase state at (T, v): bisection in ln P (v falls as P rises)."""
    top = 9.9e7 if T >= 647.096 else w(T=T, x=1).P * 1e6 * (1 - 1e-12)
    lnP = bisect(lambda m: w(P=math.exp(m), T=T).v - v, math.log(1e3), math.log(top))
    return w(P=math.exp(lnP), T=T)


def in_dome_T_v(T, v):
    f, g = w(T=T, x=0), w(T=T, x=1)
    return w(T=T, x=(v - f.v) / (g.v - f.v))


def interp3(xs, ys, x):
    """The test's rule: quadratic through the three nodes around x (the nearest node in the middle)."""
    n = len(xs)
    i = min(range(n), key=lambda k: abs(xs[k] - x))
    i = min(max(i, 1), n - 2)
    x0, x1, x2 = xs[i - 1], xs[i], xs[i + 1]
    return (ys[i - 1] * (x - x1) * (x - x2) / ((x0 - x1) * (x0 - x2))
            + ys[i] * (x - x0) * (x - x2) / ((x1 - x0) * (x1 - x2))
            + ys[i + 1] * (x - x0) * (x - x1) / ((x2 - x0) * (x2 - x1)))


def piece(name, a, b, state_at, n=101):
    """Nodes of one smooth piece from coordinate a to b; per property the reading (of the value, or for
    T, P and v of its logarithm) whose error at the midpoints between nodes is smaller, and that error."""
    xs = [a + (b - a) * k / (n - 1) for k in range(n)]
    nodes = [si(state_at(x)) for x in xs]
    mids = [si(state_at(0.5 * (xs[k] + xs[k + 1]))) for k in range(n - 1)]
    mode, tol = {}, {}
    floor = {'T': 1e-9, 'P': 1e-9, 'v': 1e-9, 'h': 1e-3, 's': 1e-6}
    for p in PROPS:
        best = None
        for m in (('lin', 'log') if p in ('T', 'P', 'v') else ('lin',)):
            f = math.log if m == 'log' else (lambda y: y)
            g = math.exp if m == 'log' else (lambda y: y)
            ys = [f(nd[p]) for nd in nodes]
            err = 0.0
            for k in range(n - 1):
                y = g(interp3(xs, ys, 0.5 * (xs[k] + xs[k + 1])))
                ref = mids[k][p]
                # relative for T, P and v; absolute (J/kg, J/(kg·K)) for h and s
                err = max(err, abs(y - ref) / abs(ref) if p in ('T', 'P', 'v') else abs(y - ref))
            if best is None or err < best[1]:
                best = (m, err)
        mode[p] = best[0]
        tol[p] = max(4 * best[1], floor[p])
    return {'name': name, 'x': xs, 'nodes': nodes, 'mode': mode, 'tol': tol}


legs = []

# isobaric at 1 MPa: compressed liquid at 300 K heated to superheated vapor at 600 K; coordinate h
P = 1e6
a, z = w(P=P, T=300), w(P=P, T=600)
f, g = w(P=P, x=0), w(P=P, x=1)
at = lambda h: w(P=P, h=h)
legs.append({
    'name': 'isobaric at 1 MPa, 300 K to 600 K',
    'spec': {'fluid': 'water', 'system': {'kind': 'flow', 'massFlow': 1}, 'start': {'P': P, 'T': 300},
             'legs': [{'process': 'isobaric', 'target': {'T': 600}}]},
    'coordinate': 'h',
    'start': si(a), 'end': si(z),
    'crossings': [{'line': 'saturated-liquid', 'state': si(f)}, {'line': 'saturated-vapor', 'state': si(g)}],
    'pieces': [piece('liquid', a.h * 1e3, f.h * 1e3, at), piece('dome', f.h * 1e3, g.h * 1e3, at),
               piece('vapor', g.h * 1e3, z.h * 1e3, at)],
})

# isentropic from 10 MPa, 800 K expanded to 10 kPa: superheated vapor into the dome; coordinate ln P
a = w(P=1e7, T=800)
s = a.s * 1e3
z = w(P=1e4, s=s)
Tx = bisect(lambda T: w(T=T, x=1).s * 1e3 - s, 300, 640)
g = w(T=Tx, x=1)
at = lambda lnP: w(P=math.exp(lnP), s=s)
legs.append({
    'name': 'isentropic from 10 MPa, 800 K to 10 kPa',
    'spec': {'fluid': 'water', 'system': {'kind': 'flow', 'massFlow': 1}, 'start': {'P': 1e7, 'T': 800},
             'legs': [{'process': 'isentropic', 'target': {'P': 1e4}}]},
    'coordinate': 'lnP',
    'start': si(a), 'end': si(z),
    'crossings': [{'line': 'saturated-vapor', 'state': si(g)}],
    'pieces': [piece('vapor', math.log(1e7), math.log(g.P * 1e6), at),
               piece('dome', math.log(g.P * 1e6), math.log(1e4), at)],
})

# isochoric at v = 0.1 m³/kg from 373.15 K (inside the dome) heated to 700 K; coordinate T
v = 0.1
a = in_dome_T_v(373.15, v)
z = at_T_v(700, v)
Tx = bisect(lambda T: w(T=T, x=1).v - v, 380, 640)
g = w(T=Tx, x=1)
legs.append({
    'name': 'isochoric at 0.1 m³/kg, 373.15 K to 700 K',
    'spec': {'fluid': 'water', 'system': {'kind': 'closed', 'mass': 1}, 'start': {'T': 373.15, 'v': v},
             'legs': [{'process': 'isochoric', 'target': {'T': 700}}]},
    'coordinate': 'T',
    'start': si(a), 'end': si(z),
    'crossings': [{'line': 'saturated-vapor', 'state': si(g)}],
    'pieces': [piece('dome', 373.15, Tx, lambda T: in_dome_T_v(T, v)),
               piece('vapor', Tx, 700, lambda T: g if T == Tx else at_T_v(T, v))],
})

# the dome: 100 points from 273.15 K to 643.15 K, denser toward the top
dome = []
for i in [0, 10, 30, 50, 70, 85, 95, 98, 99]:
    wgt = 1 - i / 99
    T = 643.15 if i == 99 else 643.15 - (643.15 - 273.15) * wgt ** 3
    dome.append({'index': i, 'T': T, 'liquid': si(w(T=T, x=0)), 'vapor': si(w(T=T, x=1))})

out = {
    'source': f'python3-iapws {iapws.__version__} IAPWS97 class (IAPWS R7-97(2012)); SI units',
    'legs': legs,
    'dome': dome,
}
path = os.path.join(os.path.dirname(os.path.abspath(__file__)), 'if97-legs.json')
with open(path, 'w') as fh:
    json.dump(out, fh, indent=1)
print(f'wrote {path}: {len(legs)} legs, {len(dome)} dome temperatures')
for lg in legs:
    for pc in lg['pieces']:
        print(lg['name'], pc['name'], {p: f"{t:.1e}" for p, t in pc['tol'].items()})
