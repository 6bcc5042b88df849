#!/usr/bin/python3
"""
Read the published check values that pychemqt's tests transcribe from an equation's paper (its
`Test.test_<eq>` method in lib/mEoS/<file>.py: `st = Fluid(T=…, rhom=…)` followed by
`assertEqual(round(st.<property>.<unit>, n), value)`) and print them as Statewright check tables
(src/lib/thermo/fluids/checks.ts), one per (comment, input kind). Each value keeps the digits the
test states (n decimals), which is how that copy records the printed table.

Usage: transcribe-pychemqt-checks.py <pychemqt lib/mEoS/X.py> <method name> <class name> <source prefix>
Only reads the file as text (Python's ast); runs none of it. Rows computed with another equation
(`eq=` or `**kw` arguments) are skipped.
"""
import ast, sys, json, re

path, method, cls, prefix = sys.argv[1:5]
src = open(path).read()
tree = ast.parse(src)
lines = src.splitlines()

consts = {}
for node in ast.walk(tree):
    if isinstance(node, ast.ClassDef) and node.name == cls:
        for st in node.body:
            if isinstance(st, ast.Assign) and len(st.targets) == 1 and isinstance(st.targets[0], ast.Name):
                v = st.value
                if isinstance(v, ast.Call) and v.args and isinstance(v.args[0], ast.Constant):
                    consts[st.targets[0].id] = v.args[0].value
                elif isinstance(v, ast.Constant) and isinstance(v.value, (int, float)):
                    consts[st.targets[0].id] = v.value

def ev(e):
    if isinstance(e, ast.Constant): return e.value
    if isinstance(e, ast.UnaryOp) and isinstance(e.op, ast.USub): return -ev(e.operand)
    if isinstance(e, ast.BinOp):
        a, b = ev(e.left), ev(e.right)
        return {ast.Add: lambda: a + b, ast.Sub: lambda: a - b, ast.Mult: lambda: a * b, ast.Div: lambda: a / b}[type(e.op)]()
    if isinstance(e, ast.Attribute) and isinstance(e.value, ast.Name) and e.value.id == cls: return consts[e.attr]
    if isinstance(e, ast.Attribute) and e.attr in ('Tc', 'Tt', 'Tb'): return consts[e.attr]
    raise ValueError(ast.dump(e))

UNITS = {'MPa': 'MPa', 'kPa': 'kPa', 'bar': 'bar', 'kJkg': 'kJ/kg', 'kJkgK': 'kJ/(kg K)', 'kJmol': 'kJ/mol',
         'Jmol': 'J/mol', 'kJkmol': 'J/mol', 'JmolK': 'J/(mol K)', 'kJkmolK': 'J/(mol K)', 'kJmolK': 'kJ/(mol K)', 'C': 'degC'}
def prop(e):
    """(column name, unit) of st.<...> or None."""
    chain = []
    while isinstance(e, ast.Attribute):
        chain.append(e.attr); e = e.value
    if not (isinstance(e, ast.Name) and e.id == 'st'): return None
    chain.reverse()
    phase = ''
    if chain and chain[0] in ('Liquido', 'Gas'):
        phase = 'L' if chain[0] == 'Liquido' else 'V'; chain = chain[1:]
    if not chain: return None
    p, unit = chain[0], (chain[1] if len(chain) > 1 else None)
    molar = p.endswith('M') and p[:-1] in ('rho', 'h', 's', 'u', 'cv', 'cp')
    base = p[:-1] if molar else p
    if base not in ('T', 'P', 'rho', 'h', 's', 'u', 'cv', 'cp', 'w'): return None
    if base == 'rho': u = 'mol/dm3' if molar else 'kg/m3'
    elif base == 'w': u = 'm/s'
    elif base == 'T': u = 'degC' if unit == 'C' else ('K' if unit in (None, 'K') else None)
    elif base == 'P': u = UNITS.get(unit) if unit else 'Pa'
    else: u = UNITS.get(unit)
    if u is None: return None
    return base + phase, u

def text(v, n):
    if n >= 0: return f'{v:.{n}f}'
    return f'{round(v / 10 ** -n)}e{-n}'

def kin(v):
    return repr(round(float(v), 9)).rstrip('0').rstrip('.') if '.' in repr(round(float(v), 9)) else repr(v)

fn = next(n for n in ast.walk(tree) if isinstance(n, ast.FunctionDef) and n.name == method)
doc = ast.get_docstring(fn) or ''
label = doc.strip().splitlines()[0] if doc else method
tables = {}
cur = None
last_line = fn.body[0].lineno
for st in fn.body:
    # comments between the previous statement and this one rename the table
    for ln in lines[last_line:st.lineno - 1]:
        m = re.match(r'\s*#\s*(.+)', ln)
        if m and re.search(r'[Tt]able|[Pp]ag|[Ss]aturat|[Ss]ingle|[Pp]oint', m.group(1)): label = m.group(1).strip()
    last_line = getattr(st, 'end_lineno', st.lineno)
    if isinstance(st, ast.Assign) and isinstance(st.value, ast.Call) and getattr(st.value.func, 'id', None) == cls:
        kw = {}
        skip = False
        for k in st.value.keywords:
            if k.arg is None or k.arg in ('eq', 'visco', 'thermal'): skip = True; continue
            kw[k.arg] = ev(k.value)
        if skip or set(kw) not in ({'T', 'x'}, {'P', 'x'}, {'T', 'rho'}, {'T', 'rhom'}, {'T', 'P'}):
            cur = None; continue
        if 'x' in kw: kind = 'T-sat' if 'T' in kw else 'P-sat'
        elif 'P' in kw: kind = 'T-P'
        else: kind = 'T-rho'
        row = {}
        if 'T' in kw: row[('T', 'K')] = kin(kw['T'])
        if 'P' in kw: row[('P', 'Pa')] = kin(kw['P'])
        if 'rho' in kw: row[('rho', 'kg/m3')] = kin(kw['rho'])
        if 'rhom' in kw: row[('rho', 'mol/dm3')] = kin(kw['rhom'])
        t = tables.setdefault((label, kind), {'cols': list(row), 'rows': []})
        t['rows'].append(row)
        cur = (t, row, set(c[0] for c in row))
        continue
    if cur and isinstance(st, ast.Expr) and isinstance(st.value, ast.Call) and getattr(st.value.func, 'attr', '') == 'assertEqual':
        a, b = st.value.args[:2]
        if not (isinstance(a, ast.Call) and getattr(a.func, 'id', '') == 'round'): continue
        pu = prop(a.args[0])
        if pu is None or pu[0] in cur[2]: continue
        n = ev(a.args[1]) if len(a.args) > 1 else 0
        t, row, _ = cur
        if pu not in t['cols']: t['cols'].append(pu)
        row[pu] = text(ev(b), n)

out = []
for (label, kind), t in tables.items():
    cols = t['cols']
    rows = [[r.get(c, '') for c in cols] for r in t['rows']]
    out.append({'source': f'{prefix}, {label}', 'input': kind, 'columns': [f'{c} [{u}]' for c, u in cols], 'rows': rows})
for o in out:
    print('\t\t{')
    print(f"\t\t\tsource: {json.dumps(o['source'], ensure_ascii=False)},")
    print(f"\t\t\tinput: '{o['input']}',")
    print("\t\t\tenergies: 'absolute',")
    print(f"\t\t\tcolumns: {json.dumps(o['columns'])},")
    print('\t\t\trows: [')
    for r in o['rows']: print('\t\t\t\t' + json.dumps(r) + ',')
    print('\t\t\t]')
    print('\t\t},')
