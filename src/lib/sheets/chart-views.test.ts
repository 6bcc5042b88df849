import { describe, expect, it } from 'vitest';
import { DEFAULT_CHART } from './doc';
import { parseSheetDoc } from './schema';
import {
	CHART_VIEW_VALUES,
	chartKinds,
	chartViewOf,
	offeredLines,
	shownLines,
	toggleLine,
	toggleView,
	viewLines
} from './chart-views';
import { lineSpans, lineValues } from './isolines';
import { DEFAULT_UNIT_PREFS } from '$lib/units/prefs';
import { getFluid, saturationCurve, fixState } from '$lib/thermo';

describe('which views a sheet shows', () => {
	it('reads "both" as T–v and P–v and a pair as its two views, in order', () => {
		expect(chartKinds('both')).toEqual(['T-v', 'P-v']);
		expect(chartKinds('P-h+T-s')).toEqual(['P-h', 'T-s']);
		expect(chartKinds('h-s')).toEqual(['h-s']);
		expect(chartViewOf(['T-v', 'P-v'])).toBe('both');
		expect(chartViewOf(['T-s'])).toBe('T-s');
		// 5 single views, "both" and 20 ordered pairs
		expect(CHART_VIEW_VALUES.length).toBe(26);
	});

	it('pressing a view shows it beside the last chosen, or hides it; one always stays', () => {
		expect(toggleView('both', 'P-h')).toBe('P-v+P-h');
		expect(toggleView('P-v+P-h', 'P-v')).toBe('P-h');
		expect(toggleView('P-h', 'P-h')).toBe('P-h');
		expect(toggleView('P-h', 'T-s')).toBe('P-h+T-s');
	});

	it('draws each view’s default lines until the sheet chooses, then the chosen kinds where they are not axis rules', () => {
		const chart = { ...DEFAULT_CHART };
		expect(viewLines(chart, 'T-v')).toEqual(['isobar']);
		expect(viewLines(chart, 'P-v')).toEqual(['isotherm']);
		expect(viewLines(chart, 'P-h')).toEqual(['isotherm', 'isentrope', 'quality']);
		expect(shownLines(chart)).toEqual(['isobar', 'isotherm']);
		expect(offeredLines(chart)).toEqual([
			'isobar',
			'isotherm',
			'isentrope',
			'isenthalp',
			'quality'
		]);
		const lines = toggleLine(chart, 'quality', true);
		expect(lines).toEqual(['isobar', 'isotherm', 'quality']);
		const chosen = { ...chart, lines };
		expect(viewLines(chosen, 'T-v')).toEqual(['isobar', 'quality']);
		expect(viewLines({ ...chosen, isolines: false }, 'T-v')).toEqual([]);
	});
});

describe('the document keeps the choice', () => {
	const base = {
		version: 1,
		description: '',
		spec: {
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: 300, P: 101325 },
			legs: []
		},
		units: DEFAULT_UNIT_PREFS,
		titleBlock: { project: '', equipment: '', tag: '', documentNumber: '', site: '' }
	};
	it('loads an old sheet unchanged (T–v and P–v) and stores a pair and line kinds', () => {
		const old = parseSheetDoc({
			...base,
			chart: { view: 'both', pressureScale: 'log', isolines: true }
		});
		expect(old.ok && old.doc.chart).toEqual({ view: 'both', pressureScale: 'log', isolines: true });
		const next = parseSheetDoc({
			...base,
			chart: {
				view: 'P-h+T-s',
				pressureScale: 'log',
				isolines: true,
				lines: ['isentrope', 'quality']
			}
		});
		expect(next.ok && next.doc.chart.view).toBe('P-h+T-s');
		expect(next.ok && next.doc.chart.lines).toEqual(['isentrope', 'quality']);
	});
	it('refuses an unknown view or line kind, saying what to give', () => {
		const bad = parseSheetDoc({
			...base,
			chart: { view: 'P-x', pressureScale: 'log', isolines: true }
		});
		expect(bad.ok).toBe(false);
		expect(!bad.ok && bad.message).toMatch(/"P-h\+T-s"/);
		const badLine = parseSheetDoc({
			...base,
			chart: { view: 'T-s', pressureScale: 'log', isolines: true, lines: ['isoclines'] }
		});
		expect(!badLine.ok && badLine.message).toMatch(/isentrope/);
	});
});

describe('values of the new background lines', () => {
	it('isentropes and isenthalps at round kJ steps across the dome; isochores at 1-2-5 steps', () => {
		const f = getFluid('ammonia');
		const dome = saturationCurve('ammonia', 40);
		const spans = lineSpans(f, dome, [fixState('ammonia', { T: 330, P: 1.2e6 })]);
		const s = lineValues('isentrope', spans, DEFAULT_UNIT_PREFS);
		expect(s.length).toBeGreaterThan(3);
		expect(s.length).toBeLessThanOrEqual(8);
		for (const v of s) {
			expect(v).toBeGreaterThan(spans.s.min);
			expect(v).toBeLessThan(spans.s.max);
			// round in kJ/(kg·K): a whole number of tenths at most
			expect(Math.abs(v / 100 - Math.round(v / 100))).toBeLessThan(1e-9);
		}
		const h = lineValues('isenthalp', spans, DEFAULT_UNIT_PREFS);
		for (const v of h) expect(Math.abs(v / 1e4 - Math.round(v / 1e4))).toBeLessThan(1e-9);
		const v = lineValues('isochore', spans, DEFAULT_UNIT_PREFS);
		expect(v.length).toBeGreaterThan(2);
		for (const x of v) expect(x).toBeGreaterThanOrEqual(spans.v.min);
		expect(lineValues('quality', spans, DEFAULT_UNIT_PREFS)).toHaveLength(9);
	});
});
