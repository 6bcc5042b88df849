#!/usr/bin/python3
"""Fixture for the water transport checks (src/lib/thermo/transport/transport.test.ts): viscosity,
thermal conductivity, Prandtl number and surface tension from python3-iapws's IAPWS97 class (Debian
package python3-iapws; it computes μ by IAPWS R12-08 without the critical enhancement, λ by IAPWS
R15-11 with the industrial critical enhancement, σ by IAPWS R1-76(2014)) at direct (P, T) points over
regions 1, 2, 3 and 5, and on the saturation line at (T, x = 0 / 1) up to 620 K; SI units.

Regenerate: /usr/bin/python3 tests/reference/make-water-transport.py
(writes tests/reference/water-transport.json beside this script).
"""
import json
import os
import iapws
from iapws import IAPWS97

points = []
for T in [275, 300, 350, 400, 450, 500, 550, 600, 640, 650, 660, 700, 800, 900, 1000, 1073.15]:
    for P in [0.001, 0.01, 0.1, 1, 5, 10, 20, 25, 30, 50, 100]:
        s = IAPWS97(P=P, T=T)
        if s.region == 4:
            continue
        points.append({'T': T, 'P': P * 1e6, 'region': s.region, 'mu': s.mu, 'k': s.k, 'Pr': s.Prandt})
saturated = []
for T in [273.16, 280, 300, 350, 373.15, 400, 450, 500, 550, 600, 620]:
    for x in (0, 1):
        s = IAPWS97(T=T, x=x)
        saturated.append({'T': T, 'x': x, 'P': s.P * 1e6, 'mu': s.mu, 'k': s.k, 'Pr': s.Prandt, 'sigma': s.sigma})
out = {
    'source': f'python3-iapws {iapws.__version__} (Debian), IAPWS97 class',
    'units': 'SI: K, Pa, Pa s, W/(m K), N/m',
    'points': points,
    'saturated': saturated,
}
here = os.path.dirname(os.path.abspath(__file__))
with open(os.path.join(here, 'water-transport.json'), 'w') as f:
    json.dump(out, f, indent=1)
print(len(points), 'points,', len(saturated), 'saturated states')
