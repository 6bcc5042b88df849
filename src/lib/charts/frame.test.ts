import { describe, expect, it } from 'vitest';
import { sameFrame, type ChartFrame } from './chart';
import { unitPrefs } from '$lib/units';

/** The chart's frame comparison (ProcessChart draws a frame again only when it differs). */
describe('sameFrame', () => {
	const isolines = [{ kind: 'isobar', value: 1e5, label: '100 kPa', points: [] }];
	const frame = (over: Partial<ChartFrame> = {}): ChartFrame => ({
		kind: 'T-v',
		pressureScale: 'log',
		width: 700,
		height: 380,
		units: unitPrefs(),
		isolines: isolines as unknown as ChartFrame['isolines'],
		limits: null,
		domain: null,
		fluidName: 'water',
		...over
	});

	it('is true for a frame built again from the same props, units copied', () => {
		const a = frame();
		expect(sameFrame(a, frame({ units: { ...a.units } }))).toBe(true);
	});

	it('is false when any field differs, nested data by identity', () => {
		const a = frame();
		expect(sameFrame(a, frame({ width: 701 }))).toBe(false);
		expect(sameFrame(a, frame({ kind: 'P-v' }))).toBe(false);
		expect(
			sameFrame(a, frame({ isolines: [...isolines] as unknown as ChartFrame['isolines'] }))
		).toBe(false);
		expect(sameFrame(a, frame({ limits: { designPressure: { value: 1e6 } } }))).toBe(false);
		expect(sameFrame(a, frame({ units: { ...a.units, pressureUnit: 'MPa' } }))).toBe(false);
		expect(sameFrame(a, frame({ units: { ...a.units, atmosphere: 95_000 } }))).toBe(false);
		const without: ChartFrame = { ...a };
		delete without.fluidName;
		expect(sameFrame(a, without)).toBe(false);
	});
});
