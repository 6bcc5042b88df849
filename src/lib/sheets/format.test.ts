import { describe, expect, it } from 'vitest';
import { unitPrefs } from '$lib/units';
import {
	cellText,
	columnUnitLabel,
	compactQuantity,
	precisionNotes,
	specificEnergy,
	specificEntropy,
	tidy,
	total,
	totalUnit
} from './format';
import type { State } from '$lib/thermo/types';

const state: State = {
	fluid: 'water',
	phase: 'superheated-vapor',
	T: 453.15,
	P: 1e6,
	v: 0.19444,
	rho: 5.143,
	u: 2583.9e3,
	h: 2778.3e3,
	s: 6.5864e3,
	x: null,
	cp: 2.6e3,
	cv: 1.7e3,
	w: 500
};

describe('table formatting', () => {
	it('cells in display units with 5 significant figures, temperatures to 0.01', () => {
		const si = unitPrefs();
		expect(cellText(state, 'T', si)).toBe('180.00');
		expect(cellText(state, 'P', si)).toBe('1000.0');
		expect(cellText(state, 'v', si)).toBe('0.19444');
		expect(cellText(state, 'h', si)).toBe('2778.3');
		expect(cellText(state, 'x', si)).toBe('—');
		expect(
			columnUnitLabel('P', unitPrefs({ pressureUnit: 'bar', pressureReference: 'gauge' }))
		).toBe('bar g');
		// 1 bar = 10⁵ Pa exactly (NIST SP 811): 1000 kPa a against 101.325 kPa is 8.9868 bar g
		expect(
			cellText(state, 'P', unitPrefs({ pressureUnit: 'bar', pressureReference: 'gauge' }))
		).toBe('8.9868');
		// 180 °C = 356 °F exactly
		expect(cellText(state, 'T', unitPrefs({ system: 'us' }))).toBe('356.00');
	});

	it('round-off noise from the quadrature reads as zero, real values do not', () => {
		expect(tidy(4.5e-10, 'specificEnergy')).toBe(0);
		expect(specificEnergy(4.5e-10, unitPrefs()).full).toBe('0\u00a0kJ/kg');
		expect(specificEntropy(-4.5e-12, unitPrefs()).text).toBe('0');
		expect(specificEnergy(-2085.5e3, unitPrefs()).full).toBe('−2085.5\u00a0kJ/kg');
		expect(specificEntropy(0.031218e3, unitPrefs()).text).toBe('0.031218');
		const kw = totalUnit('W', [83_419], unitPrefs());
		expect(total(2.3e-14, 'W', kw, unitPrefs())).toBe('0\u00a0kW');
	});

	it('prose quantities drop trailing zeros', () => {
		expect(compactQuantity(0.5, 'volume', unitPrefs())).toBe('0.5\u00a0m³');
		expect(compactQuantity(0.04, 'massFlow', unitPrefs())).toBe('0.04\u00a0kg/s');
	});
});

describe('precisionNotes', () => {
	it('says how loosely the inputs fix T, P or v only past 1 ppm', () => {
		expect(precisionNotes(undefined)).toEqual([]);
		expect(precisionNotes({ T: 2e-16, P: 5e-7, v: 1e-9 })).toEqual([]);
		expect(precisionNotes({ T: 4.9e-11, P: 0.011175, v: 4.5e-9 })).toEqual([
			'P uncertain by ±1.1 % (the given pair barely fixes it)'
		]);
		expect(precisionNotes({ T: 2e-6, P: 1, v: 3e-5 }).map((s) => s.split(' ')[0])).toEqual([
			'T',
			'P',
			'v'
		]);
	});
});
