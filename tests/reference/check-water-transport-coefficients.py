#!/usr/bin/python3
"""Cross-check src/lib/thermo/transport/water-coefficients.ts (transcribed from python3-iapws) against a
second public copy: IF97.h of the CoolProp/IF97 repository on GitHub (only its numbers are read).

Run: /usr/bin/python3 tests/reference/check-water-transport-coefficients.py path/to/IF97.h
Exits 1 on any term that differs by more than 1e-13 (relative) or is missing on either side.
"""
import os
import re
import sys

here = os.path.dirname(os.path.abspath(__file__))
ours = open(os.path.join(here, '..', '..', 'src', 'lib', 'thermo', 'transport', 'water-coefficients.ts')).read()
theirs = open(sys.argv[1]).read()
NUM = r'[-+]?\d*\.?\d+(?:[eE][-+]?\d+)?'


def our_list(expr):
    return [float(x) for x in re.search(expr, ours).group(1).split(',')]


def block(name):
    return re.sub(r'//[^\n]*', '', re.search(r'static const \w+ ' + name + r'\[\] = \{(.*?)\n\s*\};', theirs, re.S).group(1))


def triples(name):
    return sorted((float(a), float(b), float(c)) for a, b, c in re.findall(r'\{\s*(' + NUM + r')\s*,\s*(' + NUM + r')\s*,\s*(' + NUM + r')\s*\}', block(name)) if float(c) != 0)


def pairs(name):
    return [float(b) for a, b in re.findall(r'\{\s*(' + NUM + r')\s*,\s*(' + NUM + r')\s*\}', block(name))]


failed = False


def compare(label, a, b):
    global failed
    ok = len(a) == len(b) and all(abs(x - y) <= 1e-13 * abs(x) for x, y in zip(a, b))
    failed |= not ok
    print(f'{label}: {len(a)} values, {"agree" if ok else "DIFFER"}')


compare('R12-08 Table 1 (H_i)', our_list(r'viscosityH0 = \[([^\]]*)\]'), pairs('Hidealdata'))
I = our_list(r'viscosityH1 = \{ I: \[([^\]]*)\]')
J = our_list(r'viscosityH1 = \{ I: \[[^\]]*\], J: \[([^\]]*)\]')
H = our_list(r'viscosityH1 = \{ I: \[[^\]]*\], J: \[[^\]]*\], H: \[([^\]]*)\]')
t = triples('Hresiddata')
compare('R12-08 Table 2 (H_ij)', [x for tr in sorted(zip(I, J, H)) for x in tr], [x for tr in t for x in tr])
compare('R15-11 Table 1 (L_k)', our_list(r'conductivityL0 = \[([^\]]*)\]'), pairs('Lidealdata'))
I = our_list(r'conductivityL1 = \{ I: \[([^\]]*)\]')
J = our_list(r'conductivityL1 = \{ I: \[[^\]]*\], J: \[([^\]]*)\]')
L = our_list(r'conductivityL1 = \{ I: \[[^\]]*\], J: \[[^\]]*\], L: \[([^\]]*)\]')
t = triples('Lresiddata')
compare('R15-11 Table 2 (L_ij)', [x for tr in sorted(zip(I, J, L)) for x in tr], [x for tr in t for x in tr])
a = re.search(r'a: \[(.*)\] \} as const', ours).group(1)
cols = [[float(x) for x in c.split(',')] for c in re.findall(r'\[([^\[\]]*)\]', a)]
rows = [[float(x) for x in r.split(',')] for r in re.findall(r'\{([^{}]*)\}', re.search(r'static const double A\[6\]\[5\] = \{(.*?)\};', theirs, re.S).group(1))]
compare('R15-11 Table 6 (a_ij)', [x for c in cols for x in c], [rows[i][j] for j in range(5) for i in range(6)])
sys.exit(1 if failed else 0)
