#!/usr/bin/python3
"""Fixture for IAPWS-IF97 states fixed by property pairs and for water paths computed with IF97
(src/lib/thermo/if97/fix.test.ts, path.test.ts): python3-iapws's IAPWS97 class (Debian package
python3-iapws), which takes (P, T), (P, h), (P, s), (h, s), (T, x) and (P, x). A state at a given
(T, v) is found here by bisection in P on IAPWS97(P, T).v; written in SI (K, Pa, m³/kg, J/kg,
J/(kg·K)).

Regenerate: apt-get install -y python3-iapws && /usr/bin/python3 tests/reference/make-if97-fix.py
(writes tests/reference/if97-fix.json beside this script).
"""
import json
import os
import iapws
from iapws import IAPWS97


def si(st):
    return {
        'T': st.T, 'P': st.P * 1e6, 'v': st.v, 'u': st.u * 1e3, 'h': st.h * 1e3,
        's': st.s * 1e3, 'x': st.x, 'region': st.region,
    }


def w(**k):
    # IAPWS97 speaks MPa and kJ
    args = {}
    for key, val in k.items():
        args[key] = val / 1e6 if key == 'P' else val / 1e3 if key in ('h', 's') else val
    return IAPWS97(**args)


pairs = []
for P in [5e3, 1e5, 1e6, 1e7, 3e7]:
    for h in [2e5, 1.2e6, 2.8e6, 3.5e6]:
        st = w(P=P, h=h)
        if st.status:
            pairs.append({'inputs': {'P': P, 'h': h}, 'state': si(st)})
    for s in [1e3, 4e3, 6.5e3, 8e3]:
        st = w(P=P, s=s)
        if st.status:
            pairs.append({'inputs': {'P': P, 's': s}, 'state': si(st)})
for h, s in [(2.8e6, 6.5e3), (3.2e6, 7e3), (1e6, 3e3), (2e6, 5e3), (3.6e6, 7.5e3)]:
    st = w(h=h, s=s)
    if st.status:
        pairs.append({'inputs': {'h': h, 's': s}, 'state': si(st)})
for T in [300, 373.15, 450, 550, 620]:
    for x in [0, 0.3, 1]:
        pairs.append({'inputs': {'T': T, 'x': x}, 'state': si(w(T=T, x=x))})
for P in [1e4, 1e6, 1.5e7]:
    for x in [0, 0.6, 1]:
        pairs.append({'inputs': {'P': P, 'x': x}, 'state': si(w(P=P, x=x))})


def at_T_v(T, v, lo, hi):
    """Single-phase state at (T, v): bisection in ln P on IAPWS97(P, T).v between lo and hi (Pa)."""
    import math
    a, b = math.log(lo), math.log(hi)
    for _ in range(200):
        m = 0.5 * (a + b)
        if w(P=math.exp(m), T=T).v > v:
            a = m
        else:
            b = m
    return w(P=math.exp(0.5 * (a + b)), T=T)


def leg(process, a, b, mass):
    du, dh, ds = b.u - a.u, b.h - a.h, b.s - a.s
    if process == 'isobaric':
        q = dh
    elif process == 'isochoric':
        q = du
    elif process == 'isothermal':
        q = a.T * ds
    else:
        q = 0.0
    wk = 0.0 if process == 'isenthalpic' else q - du
    return {'Q': mass * q * 1e3, 'W': mass * wk * 1e3}


paths = []
# closed, 2 kg: heat at 1 MPa from 300 K to 500 K, expand isentropically to 0.1 MPa
s1 = w(P=1e6, T=300)
s2 = w(P=1e6, T=500)
s3 = w(P=1e5, s=s2.s * 1e3)
paths.append({
    'name': 'isobaric then isentropic, closed 2 kg',
    'spec': {'fluid': 'water', 'system': {'kind': 'closed', 'mass': 2}, 'start': {'T': 300, 'P': 1e6},
             'legs': [{'process': 'isobaric', 'target': {'T': 500}},
                      {'process': 'isentropic', 'target': {'P': 1e5}}]},
    'states': [si(s1), si(s2), si(s3)],
    'legs': [leg('isobaric', s1, s2, 2), leg('isentropic', s2, s3, 2)],
})
# closed, 1 kg: sealed vessel at 400 K, x = 0.1 heated to 450 K (still inside the dome), then
# isothermal at 450 K to x = 1
a = w(T=400, x=0.1)
f, g = w(T=450, x=0), w(T=450, x=1)
b = w(T=450, x=(a.v - f.v) / (g.v - f.v))
c = w(T=450, x=1)
paths.append({
    'name': 'isochoric then isothermal inside the dome, closed 1 kg',
    'spec': {'fluid': 'water', 'system': {'kind': 'closed', 'mass': 1}, 'start': {'T': 400, 'x': 0.1},
             'legs': [{'process': 'isochoric', 'target': {'T': 450}},
                      {'process': 'isothermal', 'target': {'x': 1}}]},
    'states': [si(a), si(b), si(c)],
    'legs': [leg('isochoric', a, b, 1), leg('isothermal', b, c, 1)],
})
# closed, 1 kg: compressed liquid at 350 K, 5 MPa heated in a sealed vessel to 360 K
a = w(P=5e6, T=350)
b = at_T_v(360, a.v, 1e6, 1e8)
paths.append({
    'name': 'isochoric compressed liquid, closed 1 kg',
    'spec': {'fluid': 'water', 'system': {'kind': 'closed', 'mass': 1}, 'start': {'T': 350, 'P': 5e6},
             'legs': [{'process': 'isochoric', 'target': {'T': 360}}]},
    'states': [si(a), si(b)],
    'legs': [leg('isochoric', a, b, 1)],
})
# steady flow 3 kg/s: throttle from 5 MPa, 550 K to 0.5 MPa
a = w(P=5e6, T=550)
b = w(P=5e5, h=a.h * 1e3)
paths.append({
    'name': 'throttling, flow 3 kg/s',
    'spec': {'fluid': 'water', 'system': {'kind': 'flow', 'massFlow': 3}, 'start': {'T': 550, 'P': 5e6},
             'legs': [{'process': 'isenthalpic', 'target': {'P': 5e5}}]},
    'states': [si(a), si(b)],
    'legs': [{'Q': 0.0, 'W': 0.0}],
})

out = {
    'source': f'python3-iapws {iapws.__version__} IAPWS97 class (IAPWS R7-97(2012)); SI units',
    'pairs': pairs,
    'paths': paths,
}
path = os.path.join(os.path.dirname(os.path.abspath(__file__)), 'if97-fix.json')
with open(path, 'w') as fh:
    json.dump(out, fh, indent=1)
print(f'wrote {path}: {len(pairs)} pairs, {len(paths)} paths')
