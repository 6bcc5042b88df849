#!/usr/bin/python3
"""Cross-check src/lib/thermo/if97/coefficients.ts (transcribed from python3-iapws) against a second,
independent public copy of IAPWS R7-97(2012): IF97.h of the CoolProp/IF97 repository on
GitHub (MIT licence; only its numbers are read here, nothing of it is copied into the project).

Run: /usr/bin/python3 tests/reference/check-if97-coefficients.py path/to/IF97.h
(get IF97.h with `git clone https://github.com/CoolProp/IF97`). Prints every table with its term
count and the largest relative difference, and exits 1 if any term differs by more than 1e-13
(relative) or any term is missing on either side.
"""
import os
import re
import sys

here = os.path.dirname(os.path.abspath(__file__))
ours_text = open(os.path.join(here, '..', '..', 'src', 'lib', 'thermo', 'if97', 'coefficients.ts')).read()
theirs = open(sys.argv[1]).read()
NUM = r'[-+]?\d*\.?\d+(?:[eE][-+]?\d+)?'


def ours_table(name):
    m = re.search(r'export const ' + name + r': If97Table = \{\s*I: \[([^\]]*)\],\s*J: \[([^\]]*)\],\s*n: \[([^\]]*)\]', ours_text)
    I, J, n = ([float(x) for x in g.split(',')] for g in m.groups())
    return list(zip(I, J, n))


def ours_list(name):
    m = re.search(r'export const ' + name + r'(?:: [^=]*)? = \[([^\]]*)\]', ours_text)
    return [float(x) for x in m.group(1).split(',')]


def block(name):
    m = re.search(r'static const \w+ ' + name + r'\[\] = \{(.*?)\n\s*\};', theirs, re.S)
    body = re.sub(r'//[^\n]*', '', m.group(1))
    return body


def theirs_triples(name):
    return [tuple(float(v) for v in t) for t in re.findall(r'\{\s*(' + NUM + r')\s*,\s*(' + NUM + r')\s*,\s*(' + NUM + r')\s*\}', block(name))]


def theirs_pairs(name):
    return [tuple(float(v) for v in t) for t in re.findall(r'\{\s*(' + NUM + r')\s*,\s*(' + NUM + r')\s*\}', block(name))]


def theirs_doubles(name):
    return [float(x) for x in re.findall(NUM, re.sub(r'//[^\n]*', '', block(name)))]


worst = 0.0
failed = False


def compare(label, a, b):
    """a, b: lists of (I, J, n) terms, compared as multisets keyed by (I, J) in order of appearance."""
    global worst, failed
    if len(a) != len(b):
        print(f'{label}: {len(a)} terms here, {len(b)} in IF97.h — MISMATCH')
        failed = True
        return
    rest = list(b)
    big = 0.0
    for I, J, n in a:
        hit = next((t for t in rest if t[0] == I and t[1] == J and abs(t[2] - n) <= 1e-13 * max(abs(n), abs(t[2]))), None)
        if hit is None:
            hit = next((t for t in rest if t[0] == I and t[1] == J), None)
            print(f'{label}: term I={I:g} J={J:g} n={n!r} — IF97.h has {hit}')
            failed = True
            if hit is None:
                continue
        rest.remove(hit)
        big = max(big, abs(hit[2] - n) / abs(n))
    worst = max(worst, big)
    print(f'{label}: {len(a)} terms, largest relative difference {big:.1e}')


# region 1: IF97.h stores n·(−1)^I (its terms use (π − 7.1)^I rather than (7.1 − π)^I)
compare('region 1 (Table 2)', [(I, J, n * (-1) ** int(I)) for I, J, n in ours_table('region1')], theirs_triples('Region1residdata'))
compare('region 1 T(p,h) (Table 6)', ours_table('region1TPh'), theirs_triples('Coeff1H'))
compare('region 1 T(p,s) (Table 8)', ours_table('region1TPs'), theirs_triples('Coeff1S'))
compare('region 2 ideal (Table 10)', [(0, J, n) for I, J, n in ours_table('region2Ideal')], [(0, J, n) for J, n in theirs_pairs('Region2idealdata')])
compare('region 2 residual (Table 11)', ours_table('region2'), theirs_triples('Region2residdata'))
for sub, t in (('a', 20), ('b', 21), ('c', 22)):
    compare(f'region 2{sub} T(p,h) (Table {t})', ours_table(f'region2{sub}TPh'), theirs_triples(f'Coeff2{sub}H'))
for sub, t in (('a', 25), ('b', 26), ('c', 27)):
    compare(f'region 2{sub} T(p,s) (Table {t})', ours_table(f'region2{sub}TPs'), theirs_triples(f'Coeff2{sub}S'))
r3 = theirs_triples('Region3residdata')
compare('region 3 (Table 30)', [(0, 0, float(re.search(r'region3LogCoefficient = (' + NUM + ')', ours_text).group(1)))] + ours_table('region3'), r3)
compare('region 4 (Table 34)', [(0, i + 1, n) for i, n in enumerate(ours_list('region4'))], [(0, i, n) for i, n in theirs_pairs('sat')])
compare('region 5 ideal (Table 37)', [(0, J, n) for I, J, n in ours_table('region5Ideal')], [(0, J, n) for J, n in theirs_pairs('Region5idealdata')])
compare('region 5 residual (Table 38)', ours_table('region5'), theirs_triples('Region5residdata'))
compare('B23 (Table 1)', [(0, i, n) for i, n in enumerate(ours_list('b23'))], [(0, i, n) for i, n in enumerate(theirs_doubles('Region23data'))])
compare('B2bc (Table 19)', [(0, i, n) for i, n in enumerate(ours_list('b2bc'))], [(0, i, n) for i, n in enumerate(theirs_doubles('Region2b2cdata'))])
print(f'largest relative difference over all tables: {worst:.1e}')
sys.exit(1 if failed else 0)
