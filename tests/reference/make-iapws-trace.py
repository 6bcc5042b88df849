#!/usr/bin/python3
"""Water check values for the measured-trace reader (src/lib/traces), from python3-iapws (Debian),
class iapws.IAPWS95 (IAPWS R6-95(2018), the formulation Statewright uses for water).

Only the library's direct calls are used:
  - saturation: IAPWS95(T=..., x=0) and IAPWS95(T=..., x=1) give p_s(T), v' and v'';
  - single phase near saturation: IAPWS95(T=..., P=...) at T = T_s +/- offset and p = p_s(T_s),
    i.e. a logger pair a few kelvin off the saturation line, with its specific volume, enthalpy
    and entropy (the point's place on the P-h, T-s and h-s views).

Regenerate (Debian's interpreter; the pyenv python3 on PATH does not see python3-iapws):
    apt-get install -y python3-iapws
    /usr/bin/python3 tests/reference/make-iapws-trace.py > tests/reference/iapws-trace.json

Units: T K, P Pa (absolute), v m3/kg, h J/kg, s J/(kg K).
"""
import json
import warnings

import iapws
from iapws import IAPWS95

warnings.filterwarnings('ignore')
MPa = 1e6

saturation = []
for T in (303.15, 343.15, 373.15, 393.15, 423.15, 453.15):
    liq = IAPWS95(T=T, x=0)
    vap = IAPWS95(T=T, x=1)
    saturation.append({'T': T, 'P': liq.P * MPa, 'vl': 1 / liq.rho, 'vv': 1 / vap.rho})

offsets = []
for s in saturation:
    for dT in (-3.0, -1.0, 1.0, 3.0):
        st = IAPWS95(T=s['T'] + dT, P=s['P'] / MPa)
        offsets.append({'Tsat': s['T'], 'T': s['T'] + dT, 'P': s['P'], 'v': 1 / st.rho,
                        'h': st.h * 1e3, 's': st.s * 1e3, 'phase': st.phase})

print(json.dumps({
    'source': f'python3-iapws {iapws.__version__} (Debian), IAPWS95',
    'saturation': saturation,
    'offsets': offsets,
}, indent=1))
