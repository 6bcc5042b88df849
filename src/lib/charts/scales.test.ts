import { describe, expect, it } from 'vitest';
import { unitById, unitPrefs } from '$lib/units';
import {
	axisTicks,
	axisUnit,
	compactNumber,
	decadeLabel,
	fitDomain,
	linearTicks,
	logTicks,
	makeXScale,
	makeYScale,
	thinLabels,
	yScaleType
} from './scales';
import { chartState } from './test-fixtures';
import type { SaturationCurve } from './types';

const atm = 101325;
const si = unitPrefs();
const us = unitPrefs({ system: 'us' });

// A coarse dome shape for domain tests only (values rounded, from memory: handbook steam table).
const dome: SaturationCurve = {
	liquid: [
		chartState(273.16, 611.7, 0.001, 'saturated-liquid'),
		chartState(473.15, 1.555e6, 0.001157, 'saturated-liquid')
	],
	vapor: [
		chartState(273.16, 611.7, 206, 'saturated-vapor'),
		chartState(473.15, 1.555e6, 0.1272, 'saturated-vapor')
	],
	critical: chartState(647.096, 22.064e6, 1 / 322, 'supercritical-fluid') // IAPWS R6-95(2018): Tc, pc, ρc
};

describe('domains', () => {
	it('log v covers the dome with a fraction of a decade to spare', () => {
		const d = fitDomain('T-v', 'log', { saturation: dome });
		expect(d.x[0]).toBeLessThan(0.001);
		expect(d.x[0]).toBeGreaterThan(0.0005);
		expect(d.x[1]).toBeGreaterThan(206);
		expect(d.x[1]).toBeLessThan(400);
	});

	it('T is linear, padded, and does not start far below the triple point', () => {
		const d = fitDomain('T-v', 'log', { saturation: dome, triple: { T: 273.16, P: 611.7 } });
		expect(d.y[0]).toBeGreaterThanOrEqual(263.16);
		expect(d.y[0]).toBeLessThan(273.16);
		expect(d.y[1]).toBeGreaterThan(647.096);
	});

	it('log P spans the dome; linear P starts at zero absolute', () => {
		const log = fitDomain('P-v', 'log', { saturation: dome });
		expect(log.y[0]).toBeLessThan(611.7);
		expect(log.y[1]).toBeGreaterThan(22.064e6);
		const lin = fitDomain('P-v', 'linear', { saturation: dome });
		expect(lin.y[0]).toBe(0);
		expect(lin.y[1]).toBeGreaterThan(22.064e6);
	});

	it('includes the path and the design limits', () => {
		const d = fitDomain('T-v', 'log', {
			saturation: dome,
			states: [{ id: 'a', label: 'S1', state: chartState(900, 1e5, 4.2) }],
			limits: { designTemperature: { value: 1000 } }
		});
		expect(d.y[1]).toBeGreaterThan(1000);
		const p = fitDomain('P-v', 'log', {
			saturation: dome,
			limits: { reliefSetPressure: { value: 40e6 } }
		});
		expect(p.y[1]).toBeGreaterThan(40e6);
	});

	it('without data a sensible window, not NaN', () => {
		const d = fitDomain('P-v', 'log', {});
		expect(d.x.every(Number.isFinite) && d.y.every(Number.isFinite)).toBe(true);
	});

	it('scale types: v always log, P log or linear, T linear', () => {
		expect(yScaleType('T-v', 'log')).toBe('linear');
		expect(yScaleType('P-v', 'log')).toBe('log');
		expect(yScaleType('P-v', 'linear')).toBe('linear');
		const d = { x: [1e-3, 10] as [number, number], y: [1e3, 1e7] as [number, number] };
		const x = makeXScale(d, 400);
		expect(x(1e-2)).toBeCloseTo(100, 9); // one decade of four
		const y = makeYScale('P-v', 'log', d, 400);
		expect(y(1e5)).toBeCloseTo(200, 9);
		expect(makeYScale('P-v', 'linear', d, 400)(1e3)).toBeCloseTo(400, 9);
	});
});

describe('log ticks', () => {
	it('decades labelled plainly, 2…9 as minor ticks', () => {
		const t = logTicks([1e-3, 10], unitById('m3/kg'), atm);
		const majors = t.filter((x) => x.major);
		expect(majors.map((x) => x.label)).toEqual(['0.001', '0.01', '0.1', '1', '10']);
		expect(majors.map((x) => x.value)).toEqual([0.001, 0.01, 0.1, 1, 10]);
		expect(t.filter((x) => !x.major)).toHaveLength(4 * 8);
		expect(t.filter((x) => !x.major).every((x) => x.label === '')).toBe(true);
	});

	it('ticks at round numbers of the display unit, placed in SI', () => {
		const unit = unitById('ft3/lbm');
		const t = logTicks([1e-3, 10], unit, atm);
		const majors = t.filter((x) => x.major);
		// 1e-3 m³/kg = 0.016 ft³/lbm, 10 m³/kg = 160 ft³/lbm
		expect(majors.map((x) => x.label)).toEqual(['0.1', '1', '10', '100']);
		// NIST SP 811 (2008), App. B.8: 1 ft³/lb = 6.242 796 E-02 m³/kg (from memory; exact from ft and lb)
		for (const m of majors)
			expect(m.value / m.display).toBeCloseTo(0.028316846592 / 0.45359237, 12);
	});

	it('a narrow window labels 2 and 5, or every tick', () => {
		const one = logTicks([0.05, 0.9], unitById('m3/kg'), atm).filter((t) => t.major);
		expect(one.map((t) => t.label)).toEqual(['0.05', '0.1', '0.2', '0.5']);
		const narrow = logTicks([0.15, 0.42], unitById('m3/kg'), atm).filter((t) => t.major);
		expect(narrow.map((t) => t.label)).toEqual(['0.2', '0.3', '0.4']);
	});

	it('powers of ten beyond 10⁻⁴…10⁵ as exponents', () => {
		expect(decadeLabel(-6)).toBe('10⁻⁶');
		expect(decadeLabel(7)).toBe('10⁷');
		expect(decadeLabel(6, 2)).toBe('2×10⁶');
		expect(decadeLabel(-3)).toBe('0.001');
		expect(decadeLabel(4)).toBe('10000');
	});

	it('log pressure axis in kPa a from Pa', () => {
		const t = logTicks([611.7, 22.064e6], axisUnit('P', si, 'log'), atm).filter((x) => x.major);
		expect(t.map((x) => x.label)).toEqual(['1', '10', '100', '1000', '10000']);
		expect(t.map((x) => x.value)).toEqual([1e3, 1e4, 1e5, 1e6, 1e7]);
	});
});

describe('linear ticks', () => {
	it('temperature ticks at round °C, placed in kelvin', () => {
		const t = linearTicks([273.15, 673.15], unitById('degC'), atm, 8);
		const majors = t.filter((x) => x.major);
		expect(majors.map((x) => x.label)).toEqual([
			'0',
			'50',
			'100',
			'150',
			'200',
			'250',
			'300',
			'350',
			'400'
		]);
		expect(majors[2].value).toBeCloseTo(373.15, 9);
		expect(t.filter((x) => !x.major).length).toBeGreaterThan(majors.length * 3); // minors between
	});

	it('°F ticks are round in °F', () => {
		const t = linearTicks([273.15, 373.15], unitById('degF'), atm, 5).filter((x) => x.major);
		expect(t.map((x) => x.label)).toEqual(['50', '100', '150', '200']); // 32…212 °F
		expect(t[0].value).toBeCloseTo((50 + 459.67) / 1.8, 9); // NIST SP 811 (2008), App. B.9
	});

	it('decimals follow the step', () => {
		const t = linearTicks([300, 301], unitById('K'), atm, 5).filter((x) => x.major);
		expect(t.map((x) => x.label)).toEqual(['300.0', '300.2', '300.4', '300.6', '300.8', '301.0']);
	});

	it('linear pressure in gauge units starts below zero gauge at vacuum', () => {
		const unit = axisUnit('P', unitPrefs({ pressureReference: 'gauge' }), 'linear');
		expect(unit.label).toBe('kPa g');
		const t = linearTicks([0, 2e6], unit, atm, 5).filter((x) => x.major);
		expect(t[0].label).toBe('0');
		expect(t[0].value).toBeCloseTo(101325, 6); // 0 kPa g at 101.325 kPa a
		expect(t.map((x) => x.label)).toContain('1500');
	});

	it('a log pressure axis is absolute even when the sheet shows gauge', () => {
		expect(axisUnit('P', unitPrefs({ pressureReference: 'gauge' }), 'log').label).toBe('kPa a');
		expect(
			axisUnit('P', unitPrefs({ system: 'us', pressureReference: 'gauge' }), 'log').label
		).toBe('psia');
		expect(axisUnit('P', unitPrefs({ pressureUnit: 'auto' }), 'log', [600, 22e6]).label).toBe(
			'MPa a'
		);
	});

	it('axis units follow the system', () => {
		expect(axisUnit('v', us, 'log').label).toBe('ft³/lbm');
		expect(axisUnit('T', us, 'log').label).toBe('°F');
		expect(axisUnit('T', si, 'log').label).toBe('°C');
		expect(
			axisTicks('linear', [273.15, 373.15], axisUnit('T', us, 'log'), atm, 5).filter(
				(t) => t.major
			)[0].label
		).toBe('50');
	});
});

describe('label thinning and compact numbers', () => {
	it('drops labels that would touch their neighbours', () => {
		const ticks = logTicks([1e-3, 1e3], unitById('m3/kg'), atm);
		const wide = thinLabels(
			ticks,
			(v) => Math.log10(v) * 100,
			8,
			(l) => l.length * 6
		);
		expect(wide.filter((t) => t.label).length).toBe(7);
		const tight = thinLabels(
			ticks,
			(v) => Math.log10(v) * 20,
			8,
			(l) => l.length * 6
		);
		const kept = tight.filter((t) => t.label);
		expect(kept.length).toBeLessThan(7);
		expect(kept.length).toBeGreaterThan(1);
		expect(tight).toHaveLength(ticks.length); // ticks stay, only labels go
	});

	it('compactNumber trims trailing zeros', () => {
		expect(compactNumber(500)).toBe('500');
		expect(compactNumber(0.25)).toBe('0.25');
		expect(compactNumber(1234.5)).toBe('1235');
		expect(compactNumber(-5)).toBe('−5');
	});
});
