#!/usr/bin/python3
"""Reference states of water from python3-iapws (Debian), class iapws.IAPWS95.

IAPWS95 implements IAPWS R6-95(2018), the same equation as src/lib/thermo/fluids/water.ts,
with the same reference state (u = 0, s = 0 for saturated liquid at the triple point).
Only the library's direct calls are used:
  - single-phase: IAPWS95(T=…, P=…) locates the density, then IAPWS95(T=…, rho=…) evaluates
    every property at that (T, rho), so each row is consistent to round-off (P is the value
    the equation gives at that density, not the requested one);
  - near the critical point some rows are given directly as IAPWS95(T=…, rho=…);
  - saturation and mixtures: IAPWS95(T=…, x=…).
Its inverse solvers ((P, h), (h, s) and the like) are not used.

Regenerate (Debian's interpreter; the pyenv python3 on PATH does not see python3-iapws):
    apt-get install -y python3-iapws
    /usr/bin/python3 tests/reference/make-iapws-water.py > tests/reference/iapws-water.json

Units in the JSON are SI base units: T K, P Pa, rho kg/m3, v m3/kg, u h J/kg,
s cv cp J/(kg K), w m/s.
"""
import json
import sys
import warnings

import iapws
from iapws import IAPWS95

warnings.filterwarnings('ignore')  # transport properties warn near the critical point

MPa = 1e6


def single(st, call, region):
    return {
        'call': call,
        'region': region,
        'T': st.T,
        'rho': st.rho,
        'P': st.P * MPa,
        'v': 1 / st.rho,
        'u': st.u * 1e3,
        'h': st.h * 1e3,
        's': st.s * 1e3,
        'cv': st.cv * 1e3,
        'cp': st.cp * 1e3,
        'w': st.w,
    }


def psat(T):
    return IAPWS95(T=T, x=0).P * MPa


rows = []


def inside_dome(st):
    return st.phase == 'Two phases' or (st.x is not None and 0 < st.x < 1)


def add_tp(T, P, region):
    located = IAPWS95(T=T, P=P / MPa)
    if not located.status:
        return
    st = IAPWS95(T=T, rho=located.rho)
    # drop a density that does not give back the pressure (a root inside the dome)
    if inside_dome(st) or not st.status or abs(st.P * MPa / P - 1) > 1e-6:
        return
    rows.append(single(st, 'T,P then T,rho', region))


def add_trho(T, rho, region):
    st = IAPWS95(T=T, rho=rho)
    if inside_dome(st) or not st.status:
        return
    rows.append(single(st, 'T,rho', region))


Tc = 647.096
Pc = 22.064e6

# compressed liquid (P above the vapor pressure)
for T in [273.16, 275.0, 277.0, 280.0, 300.0, 350.0, 400.0, 450.0, 500.0, 550.0, 600.0, 620.0, 640.0]:
    ps = psat(T)
    for P in [0.1e6, 1e6, 5e6, 10e6, 20e6, 50e6, 100e6, 300e6, 700e6, 1000e6]:
        if P > ps * 1.01:
            add_tp(T, P, 'compressed-liquid')

# superheated vapor (below the vapor pressure, or below Pc above Tc)
for T in [280.0, 300.0, 350.0, 400.0, 450.0, 500.0, 550.0, 600.0, 640.0, 700.0, 800.0, 1000.0, 1273.0]:
    ps = psat(T) if T < Tc else Pc
    for P in [100.0, 1e3, 10e3, 0.1e6, 1e6, 5e6, 10e6, 20e6]:
        if P < ps * 0.99:
            add_tp(T, P, 'superheated-vapor')

# supercritical fluid
for T in [650.0, 700.0, 800.0, 1000.0, 1273.0]:
    for P in [22.5e6, 25e6, 30e6, 50e6, 100e6, 500e6, 1000e6]:
        add_tp(T, P, 'supercritical-fluid')

# near the critical point
for T in [645.0, 646.5, 647.0]:
    ps = psat(T)
    for P in [20e6, 21.5e6, 22.0e6, 22.1e6, 22.5e6, 23e6]:
        if abs(P / ps - 1) > 2e-3:
            add_tp(T, P, 'near-critical')
for T in [647.2, 648.0, 650.0]:
    for P in [21.5e6, 22.0e6, 22.1e6, 22.5e6, 23e6]:
        add_tp(T, P, 'near-critical')
for T in [647.15, 647.3, 648.0, 650.0]:
    for rho in [250.0, 300.0, 322.0, 350.0, 400.0]:
        add_trho(T, rho, 'near-critical')

sat = []
for T in [273.16, 275.0, 300.0, 373.15, 450.0, 500.0, 550.0, 600.0, 625.0, 640.0, 645.0, 646.5, 647.0]:
    for x in [0.0, 0.1, 0.5, 0.9, 1.0]:
        st = IAPWS95(T=T, x=x)
        if not st.status:
            continue
        sat.append({
            'call': 'T,x',
            'T': st.T,
            'x': x,
            'P': st.P * MPa,
            'rho': st.rho,
            'v': 1 / st.rho,
            'u': st.u * 1e3,
            'h': st.h * 1e3,
            's': st.s * 1e3,
            'rhoL': IAPWS95(T=T, x=0.0).rho,
            'rhoV': IAPWS95(T=T, x=1.0).rho,
        })

json.dump({
    'source': 'python3-iapws %s (Debian), iapws.IAPWS95 (IAPWS R6-95(2018))' % iapws.__version__,
    'generator': 'tests/reference/make-iapws-water.py',
    'units': 'T K, P Pa, rho kg/m3, v m3/kg, u h J/kg, s cv cp J/(kg K), w m/s',
    'singlePhase': rows,
    'saturation': sat,
}, sys.stdout, indent=1)
sys.stdout.write('\n')
