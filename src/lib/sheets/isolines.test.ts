import { describe, expect, it } from 'vitest';
import { unitPrefs } from '$lib/units';
import { isobarValues, isothermValues, linearRoundValues, logRoundValues } from './isolines';

describe('isoline values', () => {
	it('1-2-5 per decade, thinned when the span is wide', () => {
		expect(logRoundValues(0.9, 110)).toEqual([1, 2, 5, 10, 20, 50, 100]);
		expect(logRoundValues(1, 1e6)).toEqual([1, 10, 100, 1000, 1e4, 1e5, 1e6]);
		expect(logRoundValues(1, 1e12).length).toBeLessThanOrEqual(9);
		expect(logRoundValues(5, 1)).toEqual([]);
	});

	it('round steps on a linear span', () => {
		expect(linearRoundValues(0, 370)).toEqual([0, 50, 100, 150, 200, 250, 300, 350]);
		expect(linearRoundValues(-28, 90)).toEqual([-20, 0, 20, 40, 60, 80]);
	});

	it('isobars are round in the display unit (kPa a, bar a, psia), returned in Pa absolute', () => {
		const si = isobarValues({ min: 1000, max: 3e7 }, unitPrefs({ pressureUnit: 'kPa' }));
		expect(si.length).toBeGreaterThan(3);
		for (const p of si)
			expect(
				Math.log10(p / 1000) % 1 === 0 ||
					[2, 5, 3].some(
						(m) => Math.abs(p / 1000 / (m * 10 ** Math.floor(Math.log10(p / 1000))) - 1) < 1e-9
					)
			).toBe(true);
		// psi is 6894.757 Pa (NIST SP 811, App. B.8): a 100 psia isobar
		const us = isobarValues({ min: 5e4, max: 2e6 }, unitPrefs({ system: 'us' }));
		expect(us.some((p) => Math.abs(p - 100 * 6894.757293168) < 1e-3)).toBe(true);
		// a gauge sheet gets round gauge readings (1, 2, 5, 10 bar g: the label is what the gauge shows), none below atmospheric
		const g = isobarValues(
			{ min: 5e4, max: 2e6 },
			unitPrefs({ pressureUnit: 'bar', pressureReference: 'gauge', atmosphere: 95_000 })
		);
		expect(g.map((p) => Math.round((p - 95_000) / 1e3) / 100)).toEqual([
			0.1, 0.2, 0.5, 1, 2, 5, 10, 20
		]);
	});

	it('isotherms are round °C or °F, returned in K', () => {
		const c = isothermValues({ min: 273.16, max: 647.1 }, unitPrefs());
		expect(c.map((k) => Math.round((k - 273.15) * 1e6) / 1e6).every((t) => t % 50 === 0)).toBe(
			true
		);
		const f = isothermValues({ min: 273.16, max: 647.1 }, unitPrefs({ system: 'us' }));
		expect(
			f
				.map((k) => Math.round((k * 1.8 - 459.67) * 1e6) / 1e6)
				.every((t) => t % 50 === 0 || t % 100 === 0)
		).toBe(true);
		expect(c.length).toBeLessThanOrEqual(7);
	});

	it('a zero isotherm converts back to exactly zero (a label reads 0 °F, not −4×10⁻¹³ °F)', () => {
		const us = unitPrefs({ system: 'us' });
		const f = isothermValues({ min: 220, max: 420 }, us);
		// °F = K × 1.8 − 459.67 (NIST SP 811, App. B.9)
		const back = f.map((k) => k * 1.8 - 459.67);
		expect(back).toContain(0);
		// elsewhere a few units in the last place remain, which the label's 4 significant figures hide
		for (const t of back) expect(Math.abs(t - Math.round(t))).toBeLessThan(1e-9);
	});
});
