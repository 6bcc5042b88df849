#!/usr/bin/python3
"""Reference states for the sketcher's checks, from python3-iapws (Debian), class iapws.IAPWS95
(IAPWS R6-95(2018), the equation of src/lib/thermo/fluids/water.ts).

The sketcher's journey heats a wet water state at constant volume (v = 0.5 m3/kg, wet at 100 C)
across the saturated-vapor line; the end state is then typed exactly. Written out here:
- the isochore v = 0.5 m3/kg at 100, 150, 200, 250 C: P and x (direct calls F(T=, rho=));
- where it meets the saturated-vapor line (bisection in T over F(T=, x=1) until rho'' = 2 kg/m3);
- the isobar P = 1 MPa at 120, 180, 250 C (direct calls F(T=, P=)) and its saturation T;
- the worked example V-204 (v = 0.00125 m3/kg heated at constant volume): where it goes
  liquid-full (bisection in T over F(T=, x=0) until rho' = 800 kg/m3) and P at 250 C.

Only direct calls are used ((T, rho), (T, P), (T, x)); the library's inverse solvers are not.

Regenerate (Debian's interpreter; the pyenv python3 on PATH does not see python3-iapws):
    apt-get install -y python3-iapws
    /usr/bin/python3 tests/reference/make-iapws-sketcher.py > tests/reference/iapws-sketcher.json

Units: SI base units (K, Pa, kg/m3, m3/kg).
"""
import json
import warnings

import iapws
from iapws import IAPWS95

warnings.filterwarnings('ignore')


def bisect(f, lo, hi, n=200):
    flo = f(lo)
    for _ in range(n):
        mid = 0.5 * (lo + hi)
        if mid in (lo, hi):
            break
        fm = f(mid)
        if (fm < 0) == (flo < 0):
            lo, flo = mid, fm
        else:
            hi = mid
    return 0.5 * (lo + hi)


V = 0.5
isochore = []
for t in (100, 150, 200, 250):
    T = 273.15 + t
    st = IAPWS95(T=T, rho=1 / V)
    x = st.x if 0 < st.x < 1 else None
    isochore.append({'T': T, 'P': st.P * 1e6, 'x': x})

Tg = bisect(lambda T: IAPWS95(T=T, x=1).rho - 1 / V, 380.0, 480.0)
g = IAPWS95(T=Tg, x=1)

isobar = []
for t in (120, 180, 250):
    T = 273.15 + t
    st = IAPWS95(T=T, P=1.0)
    isobar.append({'T': T, 'P': 1e6, 'v': 1 / st.rho})
Tsat1MPa = bisect(lambda T: IAPWS95(T=T, x=0).P - 1.0, 400.0, 500.0)

VV = 0.00125
Tfull = bisect(lambda T: IAPWS95(T=T, x=0).rho - 1 / VV, 480.0, 540.0)
full = IAPWS95(T=Tfull, x=0)
hot = IAPWS95(T=523.15, rho=1 / VV)

print(json.dumps({
    'source': f'python3-iapws {getattr(iapws, "__version__", "1.5.2")} (Debian): iapws.IAPWS95, direct calls only',
    'generator': 'tests/reference/make-iapws-sketcher.py',
    'units': 'T K, P Pa, v m3/kg',
    'isochore': {'v': V, 'points': isochore, 'saturatedVapor': {'T': Tg, 'P': g.P * 1e6}},
    'isobar': {'P': 1e6, 'Tsat': Tsat1MPa, 'points': isobar},
    'vesselV204': {'v': VV, 'liquidFull': {'T': Tfull, 'P': full.P * 1e6}, 'at523_15': {'T': 523.15, 'P': hot.P * 1e6}},
}, indent=1))
