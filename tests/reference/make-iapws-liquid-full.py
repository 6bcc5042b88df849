#!/usr/bin/python3
"""Compressed-liquid water heated at constant volume (a sealed vessel that starts liquid-full),
from python3-iapws (Debian), class iapws.IAPWS95 (IAPWS R6-95(2018)), the equation of
src/lib/thermo/fluids/water.ts.

For each case the start density is the library's at (T, P) (its own (T, P) call), the pressure
rise per kelvin at constant volume (dP/dT)_v is taken two ways, the library's derivative
deriv('P', 'T', 'rho') (in kPa/K, as the library's pressures are MPa and derivatives kJ-based)
and a central difference of the library's direct (T, rho) calls (Pa/K), and the end state of an
isochoric leg is the library's (T_end, rho_start) call.

Regenerate (Debian's interpreter; the pyenv python3 on PATH does not see python3-iapws):
    /usr/bin/python3 tests/reference/make-iapws-liquid-full.py > tests/reference/iapws-liquid-full.json

Units: SI base units (K, Pa, kg/m3, Pa/K).
"""
import json
import warnings

import iapws
from iapws import IAPWS95

warnings.filterwarnings('ignore')

MPa = 1e6
CASES = [
    # name, T start (K), P start (Pa, absolute), T end of the isochoric leg (K)
    ('20 C at 1 atm heated to 40 C', 293.15, 101325.0, 313.15),
    ('100 C at 1 MPa heated to 110 C', 373.15, 1.0e6, 383.15),
]

out = {'source': f'python3-iapws {iapws.__version__} (Debian), IAPWS95', 'cases': []}
for name, T, P, T_end in CASES:
    s = IAPWS95(T=T, P=P / MPa)
    rho = s.rho
    dT = 1e-3
    fd = (IAPWS95(T=T + dT, rho=rho).P - IAPWS95(T=T - dT, rho=rho).P) * MPa / (2 * dT)
    lib = s.derivative('P', 'T', 'rho', s.Liquid) * 1e3
    end = IAPWS95(T=T_end, rho=rho)
    e_fd = (IAPWS95(T=T_end + dT, rho=rho).P - IAPWS95(T=T_end - dT, rho=rho).P) * MPa / (2 * dT)
    out['cases'].append({
        'name': name,
        'phase': s.phase,
        'start': {'T': T, 'P': P, 'rho': rho},
        'dPdT_v': lib,
        'dPdT_v_difference': fd,
        'end': {'T': T_end, 'P': end.P * MPa, 'rho': rho, 'dPdT_v_difference': e_fd},
    })
print(json.dumps(out, indent=1))
