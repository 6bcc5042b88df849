import { describe, expect, it } from 'vitest';
import { formatNumber, formatQuantity, parseQuantity, unitPrefs, NBSP } from './index';

const si = unitPrefs();
const us = unitPrefs({ system: 'us' });

describe('formatNumber', () => {
	it('significant figures in plain notation for ordinary magnitudes', () => {
		expect(formatNumber(0.19436, { sig: 4 })).toBe('0.1944');
		expect(formatNumber(2778.1234)).toBe('2778.1');
		expect(formatNumber(1000)).toBe('1000.0');
		expect(formatNumber(123456.7)).toBe('123460');
		expect(formatNumber(0.0010435)).toBe('0.0010435');
		expect(formatNumber(9.99996, { sig: 5 })).toBe('10.000');
		expect(formatNumber(-12.5)).toBe('−12.500');
		expect(formatNumber(-12.5, { style: 'ascii' })).toBe('-12.500');
		expect(formatNumber(0)).toBe('0');
	});

	it('an exponent only outside 10⁻⁴ … 10⁷', () => {
		expect(formatNumber(1.23456e-5)).toBe('1.2346×10⁻⁵');
		expect(formatNumber(2.5e9, { sig: 3 })).toBe('2.50×10⁹');
		expect(formatNumber(1.23456e-5, { style: 'ascii' })).toBe('1.2346e-5');
		expect(formatNumber(9_999_999.7, { sig: 5 })).toBe('1.0000×10⁷');
	});

	it('fixed decimals, with no negative zero', () => {
		expect(formatNumber(0.35, { decimals: 4 })).toBe('0.3500');
		expect(formatNumber(-0.00001, { decimals: 2 })).toBe('0.00');
		expect(formatNumber(NaN)).toBe('—');
	});
});

describe('formatQuantity', () => {
	it('uses the display unit and sensible precision', () => {
		expect(formatQuantity(453.15, 'temperature', si).full).toBe(`180.00${NBSP}°C`);
		expect(formatQuantity(453.15, 'temperature', us).full).toBe(`356.00${NBSP}°F`);
		expect(formatQuantity(1e6, 'pressure', unitPrefs({ pressureUnit: 'MPa' })).full).toBe(
			`1.0000${NBSP}MPa a`
		);
		expect(
			formatQuantity(
				1e6,
				'pressure',
				unitPrefs({ pressureUnit: 'MPa', pressureReference: 'gauge' })
			).full
		).toBe(`0.89868${NBSP}MPa g`);
		expect(formatQuantity(0.35, 'quality', si).full).toBe('0.3500');
		expect(formatQuantity(0.625, 'fraction', si).full).toBe(`62.50${NBSP}%`);
		expect(formatQuantity(5, 'temperatureDifference', us).full).toBe(`9.00${NBSP}°F`);
		expect(formatQuantity(2.7781e6, 'specificEnergy', si).full).toBe(`2778.1${NBSP}kJ/kg`);
		expect(formatQuantity(1e6, 'pressure', si, { unit: 'bar_g' }).full).toBe(`8.9868${NBSP}bar g`);
	});

	it('what is formatted parses back to the same value within the shown precision', () => {
		const cases: [number, Parameters<typeof formatQuantity>[1], ReturnType<typeof unitPrefs>][] = [
			[453.15, 'temperature', si],
			[253.15, 'temperature', us],
			[351325, 'pressure', unitPrefs({ pressureReference: 'gauge' })],
			[1.2e5, 'pressure', us],
			[0.19436, 'specificVolume', us],
			[1.2345e-5, 'specificVolume', si],
			[2.7781e6, 'specificEnergy', us],
			[6585.3, 'specificEntropy', us]
		];
		for (const [value, q, p] of cases) {
			const f = formatQuantity(value, q, p);
			const r = parseQuantity(f.full, q, { atmosphere: p.atmosphere });
			expect(r.ok, f.full).toBe(true);
			if (r.ok) expect(Math.abs(r.si - value) / Math.abs(value), f.full).toBeLessThan(1e-4);
		}
	});
});
