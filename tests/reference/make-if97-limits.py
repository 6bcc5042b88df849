#!/usr/bin/python3
"""Fixture for the design-limit events of water paths computed with IAPWS-IF97
(src/lib/thermo/if97/limits.test.ts): where a leg reaches a design pressure or temperature, the
state IF97 gives there, from python3-iapws's IAPWS97 class (Debian package python3-iapws). The
class takes (P, T), (P, h), (P, s), (h, s), (T, x) and (P, x); a state on an isentrope at a given
T is found by bisection in P on IAPWS97(P, s).T, and a state in the dome at a given v from the
saturated liquid and vapor volumes at that T or P. Written in SI (K, Pa, m³/kg, J/kg, J/(kg·K)).

Regenerate: apt-get install -y python3-iapws && /usr/bin/python3 tests/reference/make-if97-limits.py
(writes tests/reference/if97-limits.json beside this script).
"""
import json
import os
import iapws
from iapws import IAPWS97


def si(st, x=None):
    return {'T': st.T, 'P': st.P * 1e6, 'v': st.v, 'h': st.h * 1e3, 's': st.s * 1e3,
            'x': st.x if x is None else x}


def on_isentrope_at_T(s_kj, T):
    lo, hi = 1e-3, 100.0  # MPa: T rises with P along an isentrope
    for _ in range(200):
        mid = (lo * hi) ** 0.5
        if IAPWS97(P=mid, s=s_kj).T < T:
            lo = mid
        else:
            hi = mid
    return IAPWS97(P=(lo * hi) ** 0.5, s=s_kj)


def wet_at(v, **sat):
    L, V = IAPWS97(x=0, **sat), IAPWS97(x=1, **sat)
    x = (v - L.v) / (V.v - L.v)
    return {'T': L.T, 'P': L.P * 1e6, 'v': v, 'h': (L.h + x * (V.h - L.h)) * 1e3,
            's': (L.s + x * (V.s - L.s)) * 1e3, 'x': x}


paths = []

# a compressor: steam at 0.1 MPa, 423.15 K compressed isentropically to 3 MPa, past a design
# pressure of 2 MPa and a design temperature of 550 K
s1 = IAPWS97(P=0.1, T=423.15)
paths.append({
    'name': 'isentropic compression past a design pressure and a design temperature',
    'spec': {'fluid': 'water', 'system': {'kind': 'flow', 'massFlow': 1},
             'start': {'P': 1e5, 'T': 423.15},
             'legs': [{'process': 'isentropic', 'target': {'P': 3e6}}],
             'limits': {'designPressure': 2e6, 'designTemperature': 550}},
    'events': [
        {'limit': 'designPressure', 'leg': 'L1', 'state': si(IAPWS97(P=2, s=s1.s))},
        {'limit': 'designTemperature', 'leg': 'L1', 'state': si(on_isentrope_at_T(s1.s, 550))},
    ],
})

# a sealed vessel: wet steam at 373.15 K, x = 0.01, heated at constant volume to 520 K, past a design
# pressure of 1 MPa and a design temperature of 473.15 K, both reached inside the dome
v1 = IAPWS97(T=373.15, x=0.01).v
paths.append({
    'name': 'a sealed vessel heated past a design pressure and a design temperature in the dome',
    'spec': {'fluid': 'water', 'system': {'kind': 'closed', 'mass': 2},
             'start': {'T': 373.15, 'x': 0.01},
             'legs': [{'process': 'isochoric', 'target': {'T': 520}}],
             'limits': {'designPressure': 1e6, 'designTemperature': 473.15,
                        'minimumTemperature': 380}},
    'start_state': si(IAPWS97(T=373.15, x=0.01)),
    'events': [
        {'limit': 'minimumTemperature', 'leg': None, 'state': si(IAPWS97(T=373.15, x=0.01))},
        {'limit': 'designPressure', 'leg': 'L1', 'state': wet_at(v1, P=1.0)},
        {'limit': 'designTemperature', 'leg': 'L1', 'state': wet_at(v1, T=473.15)},
    ],
})

here = os.path.dirname(os.path.abspath(__file__))
with open(os.path.join(here, 'if97-limits.json'), 'w') as f:
    json.dump({'source': 'python3-iapws %s IAPWS97' % iapws.__version__, 'paths': paths}, f,
              indent=1)
    f.write('\n')
