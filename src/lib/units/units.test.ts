import { describe, expect, it } from 'vitest';
import {
	UNITS,
	SI_BASE,
	chooseUnit,
	convert,
	displayUnit,
	fromUnit,
	toUnit,
	unitById,
	unitPrefs,
	type Quantity
} from './index';

const si = unitPrefs({ system: 'si' });
const us = unitPrefs({ system: 'us' });

describe('conversions to and from SI', () => {
	it('temperatures convert with their offsets', () => {
		// NIST SP 811 (2008), App. B.9: t/°C = T/K − 273.15; t/°F = 1.8 t/°C + 32
		expect(toUnit(373.15, 'degC')).toBeCloseTo(100, 12);
		expect(toUnit(373.15, 'degF')).toBeCloseTo(212, 12);
		expect(toUnit(273.15, 'degF')).toBeCloseTo(32, 12);
		expect(toUnit(0, 'degF')).toBeCloseTo(-459.67, 12);
		expect(toUnit(373.15, 'degR')).toBeCloseTo(671.67, 12);
		expect(fromUnit(-40, 'degF')).toBeCloseTo(fromUnit(-40, 'degC'), 12); // −40 °F = −40 °C
	});

	it('temperature differences convert without the offset', () => {
		expect(toUnit(10, 'dK')).toBe(10);
		expect(toUnit(10, 'dC')).toBe(10);
		expect(toUnit(10, 'dF')).toBeCloseTo(18, 12); // a 10 K superheat is 18 °F
		expect(fromUnit(9, 'dF')).toBeCloseTo(5, 12);
		expect(fromUnit(9, 'dR')).toBeCloseTo(5, 12);
		expect(displayUnit('temperatureDifference', si).label).toBe('K');
		expect(displayUnit('temperatureDifference', us).label).toBe('°F');
	});

	it('gauge and absolute pressures use the sheet atmosphere', () => {
		expect(fromUnit(250, 'kPa_g')).toBeCloseTo(351325, 9); // 250 kPa g at 101.325 kPa a
		expect(fromUnit(250, 'kPa_a')).toBe(250000);
		expect(toUnit(101325, 'kPa_g')).toBeCloseTo(0, 12);
		expect(toUnit(101325, 'psi_g')).toBeCloseTo(0, 12);
		expect(toUnit(101325, 'psi_a')).toBeCloseTo(14.6959487755, 9); // 101325 / 6894.757293168
		// a site at altitude: 90 kPa a atmosphere
		expect(fromUnit(0, 'bar_g', 90000)).toBe(90000);
		expect(toUnit(190000, 'bar_g', 90000)).toBeCloseTo(1, 12);
		expect(convert(200, 'psi_g', 'psi_a')).toBeCloseTo(214.6959487755, 9);
		expect(convert(1, 'bar_g', 'kPa_g')).toBeCloseTo(100, 12);
	});

	it('US customary property units', () => {
		expect(toUnit(1, 'ft3/lbm')).toBeCloseTo(16.0184633739601, 10); // 1 m³/kg in ft³/lbm = 1/0.0624279606
		expect(toUnit(1000, 'lbm/ft3')).toBeCloseTo(62.4279605761, 9);
		expect(toUnit(2326, 'Btu/lbm')).toBeCloseTo(1, 12);
		expect(toUnit(4186.8, 'Btu/(lbm·°R)')).toBeCloseTo(1, 12);
		expect(toUnit(1055.05585262, 'Btu')).toBeCloseTo(1, 12);
		expect(toUnit(1, 'lbm/h')).toBeCloseTo(3600 / 0.45359237, 9);
		expect(toUnit(745.69987158227, 'hp')).toBeCloseTo(1, 10);
	});

	it('every unit round-trips through SI', () => {
		const samples = [-250, -1, 1e-6, 0.35, 1, 373.15, 2.5e6, 3e8];
		for (const u of Object.values(UNITS)) {
			for (const x of samples) {
				for (const atm of [101325, 87000]) {
					const back = u.fromSI(u.toSI(x, atm), atm);
					// gauge units carry the atmosphere through the sum: allow for its size in the unit
					const atmInUnit = u.reference === 'gauge' ? Math.abs(u.fromSI(2 * atm, atm)) : 0;
					expect(Math.abs(back - x), `${u.id} at ${x}`).toBeLessThanOrEqual(
						1e-12 * (Math.max(1, Math.abs(x)) + atmInUnit)
					);
				}
			}
		}
	});

	it('each quantity has one SI base unit with factor 1', () => {
		for (const [q, id] of Object.entries(SI_BASE)) {
			const u = unitById(id);
			expect(u.quantity).toBe(q as Quantity);
			expect(u.toSI(7, 101325)).toBe(7);
		}
	});

	it('converting across quantities is refused', () => {
		expect(() => convert(1, 'kPa_a', 'degC')).toThrow(/cannot convert/);
	});
});

describe('display units', () => {
	it('SI engineering set and US customary set', () => {
		const pick = (q: Quantity, p = si) => displayUnit(q, p).label;
		expect([
			pick('temperature'),
			pick('pressure'),
			pick('specificVolume'),
			pick('density'),
			pick('specificEnergy'),
			pick('specificEntropy')
		]).toEqual(['°C', 'kPa a', 'm³/kg', 'kg/m³', 'kJ/kg', 'kJ/(kg·K)']);
		expect([
			pick('temperature', us),
			pick('pressure', us),
			pick('specificVolume', us),
			pick('density', us),
			pick('specificEnergy', us),
			pick('specificEntropy', us)
		]).toEqual(['°F', 'psia', 'ft³/lbm', 'lbm/ft³', 'Btu/lbm', 'Btu/(lbm·°R)']);
		expect([pick('mass'), pick('volume'), pick('energy'), pick('power'), pick('massFlow')]).toEqual(
			['kg', 'm³', 'kJ', 'kW', 'kg/s']
		);
		expect([
			pick('mass', us),
			pick('volume', us),
			pick('energy', us),
			pick('power', us),
			pick('massFlow', us)
		]).toEqual(['lbm', 'ft³', 'Btu', 'Btu/h', 'lbm/h']);
		expect(displayUnit('power', unitPrefs({ system: 'us', usPower: 'hp' })).label).toBe('hp');
	});

	it('pressure labels always say absolute or gauge', () => {
		for (const pressureUnit of ['kPa', 'MPa', 'bar'] as const) {
			expect(displayUnit('pressure', unitPrefs({ pressureUnit })).label).toBe(`${pressureUnit} a`);
			expect(
				displayUnit('pressure', unitPrefs({ pressureUnit, pressureReference: 'gauge' })).label
			).toBe(`${pressureUnit} g`);
		}
		expect(
			displayUnit('pressure', unitPrefs({ system: 'us', pressureReference: 'gauge' })).label
		).toBe('psig');
		for (const u of Object.values(UNITS).filter((u) => u.quantity === 'pressure')) {
			expect(u.reference, u.id).toBeDefined();
			expect(u.label, u.id).toMatch(u.reference === 'gauge' ? /(\sg|psig)$/ : /(\sa|psia|atm)$/);
		}
		// a log axis asks for absolute even when the sheet shows gauge
		expect(
			displayUnit('pressure', unitPrefs({ pressureReference: 'gauge' }), { reference: 'absolute' })
				.label
		).toBe('kPa a');
	});

	it('chooseUnit picks a unit that suits the magnitude', () => {
		const auto = unitPrefs({ pressureUnit: 'auto' });
		expect(chooseUnit('pressure', 250e3, auto).label).toBe('kPa a');
		expect(chooseUnit('pressure', 4.2e6, auto).label).toBe('MPa a');
		expect(chooseUnit('pressure', [300e3, 22.064e6], auto).label).toBe('MPa a'); // one unit per column
		expect(chooseUnit('pressure', 4.2e6, si).label).toBe('kPa a'); // a fixed preference wins
		expect(chooseUnit('volume', 0.05, si).label).toBe('L');
		expect(chooseUnit('volume', 2.5, si).label).toBe('m³');
		expect(chooseUnit('energy', 2.5e6, si).label).toBe('MJ');
		expect(chooseUnit('energy', 500, si).label).toBe('kJ');
		expect(chooseUnit('energy', 3e9, us).label).toBe('MMBtu');
		expect(chooseUnit('power', 7.5e6, si).label).toBe('MW');
		expect(chooseUnit('mass', 2500, si).label).toBe('t');
		expect(chooseUnit('specificEnergy', 2.5e6, si).label).toBe('kJ/kg');
	});
});
