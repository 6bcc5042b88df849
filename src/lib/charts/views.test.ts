import { describe, expect, it } from 'vitest';
import { fixState } from '$lib/thermo';
import type { Inputs } from '$lib/thermo/types';
import { DEFAULT_UNIT_PREFS } from '$lib/units';
import { clampCoords } from './clamp';
import { fitDomain, xScaleType, yScaleType } from './scales';
import { pairInputs, VIEWS, VIEW_ORDER } from './views';
import { projectOntoLeg, type ScreenMetric } from '$lib/editor/targets';

describe('the five views as data', () => {
	it('names each view’s axes, scales and drag pair', () => {
		expect(VIEW_ORDER.map((k) => VIEWS[k].pair.join(','))).toEqual([
			'v,T',
			'v,P',
			'h,P',
			's,T',
			's,h'
		]);
		expect(VIEWS['P-h'].name).toBe('Pressure–specific enthalpy');
		expect(VIEWS['h-s'].name).toBe('Specific enthalpy–specific entropy');
		// P–h reads log P whatever the sheet's P–v choice; P–v follows it
		expect(yScaleType('P-h', 'linear')).toBe('log');
		expect(yScaleType('P-v', 'linear')).toBe('linear');
		expect(xScaleType('T-s', 'log')).toBe('linear');
		expect(xScaleType('T-v', 'linear')).toBe('log');
	});

	it('no view offers a background line that is a straight rule of its own axis', () => {
		const axisLine = { T: 'isotherm', P: 'isobar', v: 'isochore', h: 'isenthalp', s: 'isentrope' };
		for (const k of VIEW_ORDER) {
			const v = VIEWS[k];
			expect(v.lines).not.toContain(axisLine[v.x.prop]);
			expect(v.lines).not.toContain(axisLine[v.y.prop]);
			for (const l of v.defaultLines) expect(v.lines).toContain(l);
		}
	});

	it('a position becomes the engine inputs of the view’s pair', () => {
		expect(pairInputs('P-h', { P: 1e6, h: 2e5, T: 300 })).toEqual({ P: 1e6, h: 2e5 });
		expect(pairInputs('h-s', { h: 2e6, s: 6000 })).toEqual({ h: 2e6, s: 6000 });
	});

	it('fits P–h and T–s windows around the dome in h and s', () => {
		// the dome's own states carry h and s; the window holds them all
		const liquid = [300, 400, 500, 600].map((T) => fixState('water', { T, x: 0 }));
		const vapor = [300, 400, 500, 600].map((T) => fixState('water', { T, x: 1 }));
		const critical = fixState('water', { T: 647.0, x: 0 });
		const sat = { liquid, vapor, critical };
		const ph = fitDomain('P-h', 'linear', { saturation: sat });
		for (const s of [...liquid, ...vapor]) {
			expect(s.h).toBeGreaterThan(ph.x[0]);
			expect(s.h).toBeLessThan(ph.x[1]);
			expect(s.P).toBeGreaterThan(ph.y[0]);
			expect(s.P).toBeLessThan(ph.y[1]);
		}
		// log P: padded by a fraction of a decade below the lowest pressure, not down to zero
		expect(ph.y[0]).toBeGreaterThan(liquid[0].P / 10);
		const ts = fitDomain('T-s', 'log', { saturation: sat });
		expect(ts.x[0]).toBeLessThan(liquid[0].s);
		expect(ts.x[1]).toBeGreaterThan(vapor[0].s);
	});

	it('clamps temperature on T–s and pressure on P–h as on T–v and P–v', () => {
		const bounds = {
			triple: { T: 273.16, P: 611.657 },
			range: { Tmin: 273.16, Tmax: 1273, Pmax: 1e9 }
		};
		const ts = clampCoords('T-s', { T: 200, s: 1000 }, bounds, DEFAULT_UNIT_PREFS);
		expect(ts.coords).toEqual({ T: 273.16, s: 1000 });
		expect(ts.reason).toMatch(/triple point/);
		const ph = clampCoords('P-h', { P: 2e9, h: 1e6 }, bounds, DEFAULT_UNIT_PREFS);
		expect(ph.coords).toEqual({ P: 1e9, h: 1e6 });
		const hs = clampCoords('h-s', { h: 1e6, s: 3000 }, bounds, DEFAULT_UNIT_PREFS);
		expect(hs.reason).toBeNull();
	});
});

describe('dragging along a leg on the new views', () => {
	const fix = (inputs: Inputs) => fixState('water', inputs);
	const PH: ScreenMetric = {
		kind: 'P-h',
		pressureScale: 'log',
		ySpan: [500, 3e7],
		vSpan: [0, 3.5e6],
		aspect: 1.6
	};
	const TS: ScreenMetric = {
		kind: 'T-s',
		pressureScale: 'log',
		ySpan: [263, 700],
		vSpan: [0, 9000],
		aspect: 1.6
	};

	it('an isobaric end on P–h lands at the pointer’s h (the isobar is a level line there)', () => {
		const from = fix({ P: 1e6, T: 300 });
		const end = projectOntoLeg('isobaric', from, { P: 1.3e6, h: 2.9e6 }, PH, fix)!;
		expect(end.P).toBeCloseTo(1e6, 0);
		// identity: the nearest point of a level line is straight below the pointer
		expect(end.h / 2.9e6).toBeCloseTo(1, 3);
	});

	it('an isentropic end on T–s lands at the pointer’s T (a vertical line there)', () => {
		const from = fix({ P: 1e7, T: 773.15 });
		const end = projectOntoLeg('isentropic', from, { T: 400, s: from.s + 300 }, TS, fix)!;
		expect(end.s / from.s).toBeCloseTo(1, 9);
		expect(end.T).toBeCloseTo(400, 1);
	});

	it('an isochoric end on P–h keeps v and takes the pointer’s P', () => {
		const from = fix({ T: 400, v: 0.5 });
		const end = projectOntoLeg('isochoric', from, { P: 2e5, h: 1e6 }, PH, fix)!;
		expect(end.v / 0.5).toBeCloseTo(1, 9);
		expect(end.P / 2e5).toBeCloseTo(1, 9);
	});
});
