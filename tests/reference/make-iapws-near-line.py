#!/usr/bin/python3
"""Single-phase states of water and ammonia just off their saturation lines, from python3-iapws
(Debian): classes iapws.IAPWS95 (IAPWS R6-95(2018)) and iapws.ammonia.NH3 (Tillner-Roth,
Harms-Watzenberg & Baehr 1993), the equations of src/lib/thermo/fluids/water.ts and ammonia.ts.

For each temperature, the library's saturation pressure Psat(T) (direct call (T, x = 0)) is
offset by +/-1 Pa, +/-0.01 % and +/-1 % (+ on the liquid side, - on the vapor side), and the
density at (T, P) on that side is found here by a secant iteration over the library's direct
(T, rho) calls, started at the saturated density of that side (the library's own (T, P) solver
is not used). Every property of a row is the library's at that (T, rho); P is the requested
pressure (the library's pressure at rho agrees to its round-off, listed as P_eos).

Regenerate (Debian's interpreter; the pyenv python3 on PATH does not see python3-iapws):
    apt-get install -y python3-iapws
    /usr/bin/python3 tests/reference/make-iapws-near-line.py > tests/reference/iapws-near-line.json

Units: SI base units (K, Pa, kg/m3, J/kg, J/(kg K)). Ammonia's energies are on the library's
convention; its saturated liquid at 273.15 K is written out so a test can shift them to IIR.
"""
import json
import sys
import warnings

import iapws
from iapws import IAPWS95
from iapws.ammonia import NH3

warnings.filterwarnings('ignore')  # transport properties warn near the critical point

MPa = 1e6
KJ = 1e3


def density_at(cls, T, P, rho0, side):
    """rho with cls(T, rho).P = P (Pa) on one side of the line: secant from the saturated density."""
    f = lambda r: cls(T=T, rho=r).P * MPa - P
    a = rho0
    b = rho0 * (1 + (1e-6 if side == 'liquid' else -1e-3) * (1 if P > 0 else 1))
    fa, fb = f(a), f(b)
    for _ in range(200):
        if fb == fa:
            break
        c = b - fb * (b - a) / (fb - fa)
        a, fa = b, fb
        b, fb = c, f(c)
        if abs(b - a) <= 1e-15 * abs(b):
            break
    return b


def rows(name, cls, temperatures):
    out = []
    for T in temperatures:
        liq, vap = cls(T=T, x=0), cls(T=T, x=1)
        Psat = liq.P * MPa
        for side, rho0, sign in (('liquid', liq.rho, 1), ('vapor', vap.rho, -1)):
            for label, dP in (('1 Pa', 1.0), ('0.01 %', 1e-4 * Psat), ('1 %', 1e-2 * Psat)):
                P = Psat + sign * dP
                rho = density_at(cls, T, P, rho0, side)
                st = cls(T=T, rho=rho)
                out.append({
                    'fluid': name, 'side': side, 'offset': label, 'T': T, 'Psat': Psat, 'P': P,
                    'P_eos': st.P * MPa, 'rho': rho, 'u': st.u * KJ, 'h': st.h * KJ, 's': st.s * KJ,
                })
    return out


water_T = (273.17, 275.0, 300.0, 373.124, 450.0, 550.0, 620.0, 640.0, 646.0)
ammonia_T = (195.6, 220.0, 273.15, 330.0, 380.0, 400.0, 404.0)
nh3_ref = NH3(T=273.15, x=0)
json.dump({
    'source': f'python3-iapws {iapws.__version__} (Debian): IAPWS95 and ammonia.NH3, direct (T, rho) and (T, x) calls',
    'ammoniaSaturatedLiquidAt273_15': {'h': nh3_ref.h * KJ, 's': nh3_ref.s * KJ},
    'points': rows('water', IAPWS95, water_T) + rows('ammonia', NH3, ammonia_T),
}, sys.stdout, indent=1)
sys.stdout.write('\n')
