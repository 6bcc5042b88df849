#!/usr/bin/python3
"""Fixture for the IAPWS-IF97 checks (src/lib/thermo/if97/if97.test.ts): python3-iapws's IAPWS-IF97
code (iapws.iapws97, Debian package python3-iapws) on a grid over regions 1, 2, 3, 5 and the
saturation line, through the library's direct calls only (its region functions in (T, p) and, for
region 3, in (rho, T)); written in SI (K, Pa, m³/kg, J/kg, J/(kg·K), m/s).

Regenerate: apt-get install -y python3-iapws && /usr/bin/python3 tests/reference/make-if97.py
(writes tests/reference/if97-water.json beside this script).
"""
import json
import os
import iapws
from iapws import iapws97 as m


def si(prop, region, P=None):
    return {
        'region': region,
        'T': prop['T'],
        'P': P if P is not None else prop['P'] * 1e6,
        'v': prop['v'],
        'h': prop['h'] * 1e3,
        's': prop['s'] * 1e3,
        'cp': prop['cp'] * 1e3,
        'cv': prop['cv'] * 1e3,
        'w': prop['w'],
    }


points = []
for T in [273.15, 280, 300, 325, 350, 373.15, 400, 450, 500, 550, 600, 623.15]:
    for P in [0.001, 0.01, 0.1, 1, 5, 10, 16.5, 20, 30, 50, 75, 100]:
        ps = m._PSat_T(T)
        if P > ps * 1.0001:
            points.append(si(m._Region1(T, P), 1, P * 1e6))
        elif P < ps * 0.9999:
            points.append(si(m._Region2(T, P), 2, P * 1e6))
for T in [650, 700, 750, 800, 863.15, 900, 1000, 1073.15]:
    for P in [0.001, 0.1, 1, 5, 10, 16.5, 20, 30, 50, 75, 100]:
        if T > 863.15 or P < m._P23_T(T) * 0.999:
            points.append(si(m._Region2(T, P), 2, P * 1e6))
for T in [625, 635, 640, 645, 647, 650, 660, 680, 700, 750, 800]:
    for rho in [100, 150, 200, 250, 300, 322, 350, 400, 450, 500, 550, 600, 650, 700]:
        prop = m._Region3(rho, T)
        P = prop['P']
        if not (P <= 100 and P > m._P23_T(T) * 1.001 and prop['kt'] > 0):
            continue
        if T < m.Tc:
            ps = m._PSat_T(T)
            if not ((rho > m.rhoc and P > ps * 1.0001) or (rho < m.rhoc and P < ps * 0.9999)):
                continue
        d = si(prop, 3)
        d['rho'] = rho
        points.append(d)
for T in [1100, 1300, 1500, 1800, 2000, 2273.15]:
    for P in [0.001, 0.1, 0.5, 1, 10, 30, 50]:
        points.append(si(m._Region5(T, P), 5, P * 1e6))

saturation = [{'given': 'T', 'T': T, 'P': m._PSat_T(T) * 1e6} for T in [273.15, 280, 300, 350, 373.15, 400, 450, 500, 550, 600, 623.15, 640, 647]]
saturation += [{'given': 'P', 'P': P * 1e6, 'T': m._TSat_P(P)} for P in [0.001, 0.01, 0.101325, 0.5, 1, 5, 10, 15, 20, 22]]

out = {
    'source': f'python3-iapws {iapws.__version__} (Debian), iapws.iapws97 region functions',
    'units': 'SI: K, Pa, m3/kg, J/kg, J/(kg K), m/s',
    'points': points,
    'saturation': saturation,
}
here = os.path.dirname(os.path.abspath(__file__))
with open(os.path.join(here, 'if97-water.json'), 'w') as f:
    json.dump(out, f, indent=1)
print(len(points), 'points,', len(saturation), 'saturation values')
