#!/usr/bin/python3
"""Derived properties of water and ammonia from python3-iapws (Debian): compressibility factor Z,
isothermal compressibility, volume expansivity, Joule-Thomson coefficient, isentropic exponent,
(dP/dT) at constant volume, and the latent heat of vaporization on the saturation line.

Classes: iapws.IAPWS95 (IAPWS-95, the same equation as src/lib/thermo/fluids/water.ts) and
iapws.ammonia.NH3 (Tillner-Roth, Harms-Watzenberg & Baehr 1993, as fluids/ammonia.ts). Only the
library's direct calls are used: (T, rho) for single-phase points and (T, x) for saturation.

Regenerate (Debian's interpreter; the pyenv python3 on PATH does not see python3-iapws):
    apt-get install -y python3-iapws
    /usr/bin/python3 tests/reference/make-iapws-derived.py > tests/reference/iapws-derived.json

Units in the JSON are SI base units: kappaT 1/Pa, alphaV 1/K, muJT K/Pa, dPdT Pa/K, hfg J/kg.
The library's own units (1/MPa, K/MPa, MPa/K, kJ/kg) are converted here.
"""
import json
import warnings

import iapws
from iapws import IAPWS95
from iapws.ammonia import NH3

warnings.filterwarnings('ignore')


def single(fluid, cls, T, rho, region):
    st = cls(T=T, rho=rho)
    return {
        'fluid': fluid,
        'region': region,
        'T': T,
        'rho': rho,
        'P': st.P * 1e6,
        'Z': st.Z,
        'kappaT': st.kappa * 1e-6,
        'alphaV': st.alfav,
        'muJT': st.joule * 1e-6,
        'gammaS': st.gamma,
        'dPdT': st.dpdT_rho * 1e6,
    }


def saturation(fluid, cls, T):
    liq = cls(T=T, x=0)
    vap = cls(T=T, x=1)
    # the latent heat from the two saturated phases (h'' - h'), and the library's own Hvap where it has one
    out = {'fluid': fluid, 'region': 'saturation', 'T': T, 'P': liq.P * 1e6, 'hfg': (vap.h - liq.h) * 1e3}
    hv = getattr(cls(T=T, x=0.5), 'Hvap', None)
    if hv is not None:
        out['Hvap'] = hv * 1e3
    return out


points = []
for T, rho, region in [
    (300.0, 1000.0, 'compressed-liquid'),
    (350.0, 980.0, 'compressed-liquid'),
    (500.0, 850.0, 'compressed-liquid'),
    (400.0, 1.0, 'superheated-vapor'),
    (600.0, 10.0, 'superheated-vapor'),
    (900.0, 50.0, 'superheated-vapor'),
    (700.0, 300.0, 'supercritical-fluid'),
    (1000.0, 100.0, 'supercritical-fluid'),
]:
    points.append(single('water', IAPWS95, T, rho, region))
for T in (300.0, 373.15, 500.0, 600.0, 640.0):
    points.append(saturation('water', IAPWS95, T))

for T, rho, region in [
    (250.0, 680.0, 'compressed-liquid'),
    (300.0, 620.0, 'compressed-liquid'),
    (300.0, 2.0, 'superheated-vapor'),
    (400.0, 20.0, 'superheated-vapor'),
    (450.0, 250.0, 'supercritical-fluid'),
]:
    points.append(single('ammonia', NH3, T, rho, region))
for T in (240.0, 300.0, 380.0):
    points.append(saturation('ammonia', NH3, T))

print(json.dumps({'source': f'python3-iapws {iapws.__version__} (Debian)', 'points': points}, indent=1))
