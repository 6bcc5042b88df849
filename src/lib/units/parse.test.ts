import { describe, expect, it } from 'vitest';
import { parseQuantity, type ParseResult } from './index';

function ok(r: ParseResult) {
	if (!r.ok) throw new Error(`expected a value, got ${r.error.code}: ${r.error.message}`);
	return r;
}
function err(r: ParseResult) {
	if (r.ok) throw new Error(`expected an error, got ${r.si}`);
	return r.error;
}

describe('parseQuantity: good input', () => {
	it('pressures, gauge and absolute, in many spellings', () => {
		const P = (t: string, atmosphere?: number) =>
			ok(parseQuantity(t, 'pressure', { atmosphere })).si;
		expect(P('250 kPa g')).toBeCloseTo(351325, 6);
		expect(P('250 kPag')).toBeCloseTo(351325, 6);
		expect(P('250 kPa(g)')).toBeCloseTo(351325, 6);
		expect(P('250 kpa gauge')).toBeCloseTo(351325, 6);
		expect(P('250 kPa a')).toBe(250000);
		expect(P('250 kPa abs')).toBe(250000);
		expect(P('3.5 bar g')).toBeCloseTo(451325, 6);
		expect(P('3.5 barg')).toBeCloseTo(451325, 6);
		expect(P('3.5 bara')).toBe(350000);
		expect(P('1.2e5 Pa')).toBe(120000);
		expect(P('1.2E+5 Pa a')).toBe(120000);
		expect(P('1.2×10⁵ Pa')).toBeCloseTo(120000, 6);
		expect(P('1.2 x10^5 Pa')).toBeCloseTo(120000, 6);
		expect(P('200 psig')).toBeCloseTo(200 * 6894.757293168 + 101325, 4); // NIST SP 811 (2008), App. B.8 (psi)
		expect(P('200 psia')).toBeCloseTo(200 * 6894.757293168, 4);
		expect(P('200 psi gage')).toBeCloseTo(200 * 6894.757293168 + 101325, 4);
		expect(P('1.5 Mpa')).toBe(1.5e6);
		expect(P('1 atm')).toBe(101325);
		expect(P('0 kPa g', 87000)).toBe(87000); // a site at altitude
	});

	it('a bare pressure unit is read as absolute by default and flagged', () => {
		const r = ok(parseQuantity('3.5 bar', 'pressure'));
		expect(r.si).toBe(350000);
		expect(r.unit.label).toBe('bar a');
		expect(r.assumed).toBe('reference');
		const g = ok(parseQuantity('3.5 bar', 'pressure', { bareReference: 'gauge' }));
		expect(g.si).toBeCloseTo(451325, 6);
		expect(g.unit.label).toBe('bar g');
		expect(ok(parseQuantity('14.7 psi', 'pressure')).unit.label).toBe('psia');
	});

	it('temperatures and temperature differences', () => {
		const T = (t: string) => ok(parseQuantity(t, 'temperature')).si;
		expect(T('120 °C')).toBeCloseTo(393.15, 12);
		expect(T('120°C')).toBeCloseTo(393.15, 12);
		expect(T('120 C')).toBeCloseTo(393.15, 12);
		expect(T('120 degC')).toBeCloseTo(393.15, 12);
		expect(T('120 ℃')).toBeCloseTo(393.15, 12);
		expect(T('−5 °C')).toBeCloseTo(268.15, 12);
		expect(T('212 °F')).toBeCloseTo(373.15, 12);
		expect(T('671.67 R')).toBeCloseTo(373.15, 12);
		expect(T('300 K')).toBe(300);
		const dT = (t: string) => ok(parseQuantity(t, 'temperatureDifference')).si;
		expect(dT('10 °C')).toBe(10); // a difference: no 273.15
		expect(dT('10 K')).toBe(10);
		expect(dT('18 °F')).toBeCloseTo(10, 12);
		expect(dT('-9 F')).toBeCloseTo(-5, 12);
	});

	it('property units in typed forms', () => {
		expect(ok(parseQuantity('0.1944 m³/kg', 'specificVolume')).si).toBe(0.1944);
		expect(ok(parseQuantity('0.1944 m3/kg', 'specificVolume')).si).toBe(0.1944);
		expect(ok(parseQuantity('3.1 ft^3/lb', 'specificVolume')).si).toBeCloseTo(
			3.1 * 0.0624279606,
			9
		);
		expect(ok(parseQuantity('59.8 lb/ft3', 'density')).si).toBeCloseTo(59.8 * 16.01846337, 6);
		expect(ok(parseQuantity('2778 kJ/kg', 'specificEnergy')).si).toBe(2778000);
		expect(ok(parseQuantity('1194 BTU/lb', 'specificEnergy')).si).toBe(1194 * 2326);
		expect(ok(parseQuantity('6.58 kJ/kg·K', 'specificEntropy')).si).toBeCloseTo(6580, 9);
		expect(ok(parseQuantity('6.58 kJ/(kg K)', 'specificEntropy')).si).toBeCloseTo(6580, 9);
		expect(ok(parseQuantity('6.58 kJ/kg-K', 'specificEntropy')).si).toBeCloseTo(6580, 9);
		expect(ok(parseQuantity('1.57 Btu/lbm-°R', 'specificEntropy')).si).toBeCloseTo(
			1.57 * 4186.8,
			9
		);
		expect(ok(parseQuantity('1.57 Btu/(lb·°F)', 'specificEntropy')).si).toBeCloseTo(
			1.57 * 4186.8,
			9
		);
		expect(ok(parseQuantity('500 L', 'volume')).si).toBeCloseTo(0.5, 12);
		expect(ok(parseQuantity('26 lb', 'mass')).si).toBeCloseTo(26 * 0.45359237, 12);
		expect(ok(parseQuantity('34 hp', 'power')).si).toBeCloseTo(34 * 745.69987158227, 6);
		expect(ok(parseQuantity('35 %', 'quality')).si).toBeCloseTo(0.35, 12);
		expect(ok(parseQuantity('0.35', 'quality')).si).toBe(0.35);
	});

	it('a bare number takes the field unit when one is given', () => {
		const r = ok(parseQuantity('180', 'temperature', { defaultUnit: 'degC' }));
		expect(r.si).toBeCloseTo(453.15, 12);
		expect(r.assumed).toBe('unit');
		expect(ok(parseQuantity('50', 'pressure', { defaultUnit: 'psi_g' })).si).toBeCloseTo(
			50 * 6894.757293168 + 101325,
			4
		);
	});
});

describe('parseQuantity: clear errors', () => {
	const cases: [string, Parameters<typeof parseQuantity>[1], string, RegExp][] = [
		['', 'pressure', 'empty', /Enter a pressure, for example 250 kPa g/],
		['   ', 'temperature', 'empty', /Enter a temperature/],
		['abc', 'pressure', 'not-a-number', /does not start with a number/],
		['kPa 250', 'pressure', 'not-a-number', /does not start with a number/],
		['1,5 bar', 'pressure', 'decimal-comma', /decimal point.*"1\.5 bar"/],
		['1,013 kPa', 'pressure', 'decimal-comma', /no thousands separators/],
		['250', 'pressure', 'no-unit', /Add a unit to 250, for example 250 kPa g/],
		['250 furlongs', 'pressure', 'unknown-unit', /"furlongs" is not a unit.*kPa g.*psig/],
		[
			'120 kPa',
			'temperature',
			'wrong-quantity',
			/kPa is a unit of pressure; this field takes a temperature/
		],
		[
			'120 °C',
			'pressure',
			'wrong-quantity',
			/°C is a unit of temperature; this field takes a pressure/
		],
		[
			'5 kJ',
			'specificEnergy',
			'wrong-quantity',
			/kJ is a unit of energy; this field takes an energy per unit mass/
		],
		['-300 °C', 'temperature', 'below-absolute-zero', /below absolute zero/],
		['0 K', 'temperature', 'below-absolute-zero', /absolute zero/],
		['-150 kPa g', 'pressure', 'below-vacuum', /perfect vacuum.*101\.325 kPa a.*−101\.325 kPa g/],
		['-20 psig', 'pressure', 'below-vacuum', /14\.6959 psia.*−14\.6959 psig/],
		['0 bar a', 'pressure', 'below-vacuum', /absolute pressure is above zero/],
		['-0.2 m3/kg', 'specificVolume', 'not-positive', /must be above zero/],
		['1.2', 'quality', 'out-of-range', /outside 0 to 1/],
		['120 %', 'quality', 'out-of-range', /outside 0 to 1/],
		['1e999 Pa', 'pressure', 'not-a-number', /too large/]
	];
	for (const [input, q, code, message] of cases) {
		it(`"${input}" as ${q} → ${code}`, () => {
			const e = err(parseQuantity(input, q));
			expect(e.code).toBe(code);
			expect(e.message).toMatch(message);
		});
	}
});
