import { describe, expect, it } from 'vitest';
import { getFluid } from '$lib/thermo';
import { vesselDoc } from '$lib/revisions/test-fixtures';
import { frameLimits, frameLines } from './frame';

const water = getFluid('water');
const byKind = (want: ReturnType<typeof frameLines>, kind: string) =>
	want.lines.find(([k]) => k === kind)?.[1] ?? [];

describe('frameLines', () => {
	it('keeps background and limit lines inside the fluid range, limit values as set', () => {
		const doc = vesselDoc();
		doc.spec.limits = {
			designPressure: 1_101_325,
			reliefSetPressure: 10 * water.limits.Pmax,
			designTemperature: 500,
			minimumTemperature: 1
		};
		const want = frameLines(water, doc, [], null);
		const isobars = byKind(want, 'isobar');
		const isotherms = byKind(want, 'isotherm');
		expect(isobars.length).toBeGreaterThan(2);
		expect(isobars.every((p) => p <= water.limits.Pmax)).toBe(true);
		expect(isotherms.every((t) => t >= water.limits.Tmin && t <= water.limits.Tmax)).toBe(true);
		// a relief pressure above the fluid's range and a temperature below its triple point have no curve
		expect(want.limitIsobars).toEqual([1_101_325]);
		expect(want.limitIsotherms).toEqual([500]);
	});

	it('draws no background lines when the sheet hides them, but keeps the limit curves', () => {
		const doc = vesselDoc();
		const want = frameLines(water, { ...doc, chart: { ...doc.chart, isolines: false } }, [], null);
		expect(want.lines.flatMap(([, values]) => values)).toEqual([]);
		expect(want.limitIsobars).toEqual([1_101_325, 1_101_325]);
	});

	it('widens the isobar range to the states of the path', () => {
		const doc = vesselDoc();
		const high = { ...water.critical, P: 2 * water.critical.P };
		const plain = frameLines(water, doc, [], null);
		const wide = frameLines(water, doc, [high as never], null);
		expect(Math.max(...byKind(wide, 'isobar'))).toBeGreaterThan(
			Math.max(...byKind(plain, 'isobar'))
		);
	});
});

describe('frameLimits', () => {
	const isobar = (value: number) => ({
		kind: 'isobar',
		value,
		points: [{ T: 400, P: value, v: 0.1 }]
	});

	it('gives each limit its own curve when one was traced, none otherwise', () => {
		const limits = frameLimits(
			{ designPressure: 1e6, reliefSetPressure: 2e6, designTemperature: 450 },
			{ isobars: [isobar(2e6), isobar(1e6 * (1 + 1e-12))], isotherms: [] }
		);
		expect(limits.designPressure?.value).toBe(1e6);
		expect(limits.designPressure?.points?.[0].P).toBeCloseTo(1e6, 0);
		expect(limits.reliefSetPressure?.points?.[0].P).toBe(2e6);
		expect(limits.designTemperature).toEqual({ value: 450, points: undefined });
		expect(limits.minimumTemperature).toBeUndefined();
	});

	it('has nothing to draw for a sheet without limits', () => {
		expect(frameLimits(undefined, { isobars: [], isotherms: [] })).toEqual({});
	});
});
