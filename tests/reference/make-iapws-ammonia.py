#!/usr/bin/python3
"""Reference states of ammonia from python3-iapws (Debian), class iapws.ammonia.NH3.

NH3 implements the equation of Tillner-Roth, Harms-Watzenberg & Baehr (1993), the same
equation as src/lib/thermo/fluids/ammonia.ts. Only the library's direct calls are used:
NH3(T=…, rho=…) for single-phase and in-dome points, NH3(T=…, x=…) for saturation;
its inverse solvers ((P, h) and the like) are not used.

Regenerate (Debian's interpreter; the pyenv python3 on PATH does not see python3-iapws):
    apt-get install -y python3-iapws
    /usr/bin/python3 tests/reference/make-iapws-ammonia.py > tests/reference/iapws-ammonia.json

Units in the JSON are SI base units (Pa, m³/kg, J/kg, J/(kg·K)). Energies are on the
library's convention, i.e. the published ideal-gas constants a1, a2 unchanged; the
saturated liquid at 273.15 K is written out so a test can compute the constant offset
to the IIR convention itself.
"""
import json
import sys
import warnings

import iapws
from iapws.ammonia import NH3

warnings.filterwarnings('ignore')  # transport properties warn near the critical point


def row(call, st, region):
    out = {
        'call': call,
        'region': region,
        'T': st.T,
        'P': st.P * 1e6,
        'rho': st.rho,
        'v': 1 / st.rho,
        'u': st.u * 1e3,
        'h': st.h * 1e3,
        's': st.s * 1e3,
        'x': st.x if region in ('saturated', 'two-phase') else None,
    }
    if region not in ('saturated', 'two-phase'):
        out['cv'] = st.cv * 1e3
        out['cp'] = st.cp * 1e3
        out['w'] = st.w
    return out


def sat(T):
    return NH3(T=T, x=0), NH3(T=T, x=1)


points = []

# compressed liquid: densities a little to well above the saturated liquid
for T in (200.0, 250.0, 300.0, 350.0, 390.0):
    liq, _ = sat(T)
    for f in (1.002, 1.03, 1.12):
        points.append(row('T,rho', NH3(T=T, rho=liq.rho * f), 'compressed-liquid'))

# saturation lines and the dome, (T, x)
for T in (196.0, 220.0, 240.0, 273.15, 300.0, 330.0, 360.0, 390.0, 400.0, 404.0):
    for x in (0.0, 0.25, 0.7, 1.0):
        points.append(row('T,x', NH3(T=T, x=x), 'saturated'))

# inside the dome from (T, rho)
for T, rho in ((230.0, 50.0), (300.0, 100.0), (350.0, 300.0), (395.0, 250.0)):
    points.append(row('T,rho', NH3(T=T, rho=rho), 'two-phase'))

# superheated vapor
for T in (240.0, 300.0, 350.0, 390.0):
    _, vap = sat(T)
    for f in (0.95, 0.6, 0.1):
        points.append(row('T,rho', NH3(T=T, rho=vap.rho * f), 'superheated-vapor'))
for T, rho in ((450.0, 5.0), (550.0, 1.0), (650.0, 20.0), (700.0, 0.5)):
    points.append(row('T,rho', NH3(T=T, rho=rho), 'superheated-vapor'))

# supercritical
for T in (420.0, 480.0, 600.0, 700.0):
    for rho in (120.0, 260.0, 450.0, 600.0):
        points.append(row('T,rho', NH3(T=T, rho=rho), 'supercritical'))

# near the critical point (the equation's own critical point lies near 405.5 K, 224.8 kg/m³)
for T, rho in ((408.0, 225.0), (408.0, 180.0), (408.0, 270.0), (412.0, 240.0)):
    points.append(row('T,rho', NH3(T=T, rho=rho), 'near-critical'))

liq0 = NH3(T=273.15, x=0)
doc = {
    'source': f'python3-iapws {iapws.__version__} (Debian), iapws.ammonia.NH3 '
              '(Tillner-Roth, Harms-Watzenberg & Baehr 1993)',
    'generator': 'tests/reference/make-iapws-ammonia.py',
    'units': 'T K, P Pa, rho kg/m3, v m3/kg, u h J/kg, s cv cp J/(kg K), w m/s',
    'saturatedLiquidAt273_15': {'T': 273.15, 'P': liq0.P * 1e6, 'rho': liq0.rho,
                                'h': liq0.h * 1e3, 's': liq0.s * 1e3},
    'points': points,
}
json.dump(doc, sys.stdout, indent=1)
sys.stdout.write('\n')
