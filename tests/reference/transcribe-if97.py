#!/usr/bin/python3
"""Write src/lib/thermo/if97/coefficients.ts: the IAPWS-IF97 coefficients (IAPWS R7-97(2012)) as
transcribed in python3-iapws (Debian, iapws/iapws97.py), read from that file's syntax tree so no
number is retyped by hand. The tables are then cross-checked against a second public copy
by tests/reference/check-if97-coefficients.py.

Regenerate: apt-get install -y python3-iapws && /usr/bin/python3 tests/reference/transcribe-if97.py
"""
import ast
import os
import iapws
import iapws.iapws97 as m

SRC = open(m.__file__).read()
TREE = ast.parse(SRC)
FUNCS = {f.name: f for f in TREE.body if isinstance(f, ast.FunctionDef)}


def lists(fn):
    out = {}
    for node in ast.walk(FUNCS[fn]):
        if isinstance(node, ast.Assign) and isinstance(node.value, ast.List):
            out[node.targets[0].id] = [ast.literal_eval(e) for e in node.value.elts]
    return out


def num(x):
    return repr(float(x)) if isinstance(x, float) else repr(x)


def arr(xs):
    return '[' + ', '.join(num(x) for x in xs) + ']'


# (export name, python function, I name, J name, n name, table of R7-97(2012) — numbering from memory)
BLOCKS = [
    ('region1', '_Region1', 'I', 'J', 'n', 'Table 2'),
    ('region1TPh', '_Backward1_T_Ph', 'I', 'J', 'n', 'Table 6'),
    ('region1TPs', '_Backward1_T_Ps', 'I', 'J', 'n', 'Table 8'),
    ('region2Ideal', 'Region2_cp0', None, 'Jo', 'no', 'Table 10'),
    ('region2', '_Region2', 'Ir', 'Jr', 'nr', 'Table 11'),
    ('region2aTPh', '_Backward2a_T_Ph', 'I', 'J', 'n', 'Table 20'),
    ('region2bTPh', '_Backward2b_T_Ph', 'I', 'J', 'n', 'Table 21'),
    ('region2cTPh', '_Backward2c_T_Ph', 'I', 'J', 'n', 'Table 22'),
    ('region2aTPs', '_Backward2a_T_Ps', 'I', 'J', 'n', 'Table 25'),
    ('region2bTPs', '_Backward2b_T_Ps', 'I', 'J', 'n', 'Table 26'),
    ('region2cTPs', '_Backward2c_T_Ps', 'I', 'J', 'n', 'Table 27'),
    ('region3', '_Region3', 'I', 'J', 'n', 'Table 30 (n2…n40; n1 is region3LogCoefficient)'),
    ('region5Ideal', 'Region5_cp0', None, 'Jo', 'no', 'Table 37'),
    ('region5', '_Region5', 'Ir', 'Jr', 'nr', 'Table 38'),
]

out = ['/**',
       ' * IAPWS-IF97 coefficients: IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997',
       ' * for the Thermodynamic Properties of Water and Steam. Each block names the release\'s table (table',
       ' * numbers from memory of the release\'s layout). Transcribed by tests/reference/transcribe-if97.py from',
       f' * python3-iapws {iapws.__version__} (Debian) and cross-checked against a second public copy by',
       ' * tests/reference/check-if97-coefficients.py. Generated: do not edit by hand.',
       ' */',
       '',
       '/** Σ n·(π-form)^I·(τ-form)^J: exponents I, J and coefficients n of one table. */',
       'export interface If97Table {',
       '\treadonly I: readonly number[];',
       '\treadonly J: readonly number[];',
       '\treadonly n: readonly number[];',
       '}',
       '']
for name, fn, iname, jname, nname, table in BLOCKS:
    ls = lists(fn)
    J = ls[jname]
    n = ls[nname]
    I = ls[iname] if iname else [0] * len(J)
    assert len(I) == len(J) == len(n), name
    out.append(f'/** IAPWS R7-97(2012), {table}; {len(n)} terms. */')
    out.append(f'export const {name}: If97Table = {{')
    out.append(f'\tI: {arr(I)},')
    out.append(f'\tJ: {arr(J)},')
    out.append(f'\tn: {arr(n)}')
    out.append('};')
    out.append('')

sat = lists('_PSat_T')['n'][1:]
b23 = lists('_P23_T')['n'] + [lists('_t_P')['n'][1], lists('_t_P')['n'][2]]
# python3-iapws 1.5.2 writes B23's n5 as 0.1391883977870e2 (a digit dropped); IAPWS R7-97(2012),
# Table 1 and every other public copy seen (CoolProp's IF97.h among them) give 0.13918839778870e2.
assert b23[4] == 0.1391883977870e2
b23[4] = 0.13918839778870e2
out.append('/** Saturation-pressure equation (region 4), IAPWS R7-97(2012), Table 34: n1…n10. */')
out.append(f'export const region4 = {arr(sat)} as const;')
out.append('')
out.append('/** B23 boundary between regions 2 and 3, IAPWS R7-97(2012), Table 1: n1…n5 (n5 corrected: python3-iapws drops a digit). */')
out.append(f'export const b23 = {arr(b23)} as const;')
out.append('')
# B2bc (Eq. 20, 21) and region 3's n1 are written inline in python3-iapws: read them from the text
import re
FLOAT = r'[-+]?\d+\.\d+(?:[eE][-+]?\d+)?'
p2bc = [float(x) for x in re.findall(FLOAT, ast.get_source_segment(SRC, FUNCS['_P_2bc']).split('"""')[2])]
hbc = [float(x) for x in re.findall(FLOAT, ast.get_source_segment(SRC, FUNCS['_hbc_P']).split('"""')[2])]
# 905.84278514723-0.67955786399241*h+1.2809002730136e-4*h**2 ; 0.26526571908428e4+((P-0.45257578905948e1)/n3)**0.5
b2bc = [p2bc[0], p2bc[1], p2bc[2], hbc[0], -hbc[1]]  # the text reads (P-n5)
assert hbc[2] == p2bc[2] and hbc[3] == 0.5, (p2bc, hbc)
out.append('/** B2bc boundary between subregions 2b and 2c, IAPWS R7-97(2012), Table 19: n1…n5. */')
out.append(f'export const b2bc = {arr(b2bc)} as const;')
out.append('')
r3 = re.findall(r'g = (' + FLOAT + r')\*log\(d\)', ast.get_source_segment(SRC, FUNCS['_Region3']))
out.append('/** n1 of region 3 (the coefficient of ln δ), IAPWS R7-97(2012), Table 30. */')
out.append(f'export const region3LogCoefficient = {num(float(r3[0]))};')
out.append('')
here = os.path.dirname(os.path.abspath(__file__))
dst = os.path.join(here, '..', '..', 'src', 'lib', 'thermo', 'if97', 'coefficients.ts')
open(dst, 'w').write('\n'.join(out))
print('wrote', os.path.normpath(dst))
