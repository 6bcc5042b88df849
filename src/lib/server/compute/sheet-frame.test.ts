import { describe, expect, it } from 'vitest';
import { computePath, if97Isolines } from '$lib/thermo';
import { vesselDoc } from '$lib/revisions/test-fixtures';
import { chartFrame, dome, draftResult } from './sheet-frame';

describe('the chart frame on the server', () => {
	it('frames a chart: dome, isolines in the sheet units, limit curves for both diagrams', () => {
		const doc = vesselDoc();
		const f = chartFrame(doc, [computePath(doc.spec)]);
		expect(f.fluid.id).toBe('water');
		expect(f.saturation?.liquid.length).toBeGreaterThan(50);
		// T–v and P–v (the default views) draw isobars and isotherms, nothing else
		expect(Object.keys(f.isolines).sort()).toEqual(['isobar', 'isotherm']);
		expect(f.isolines.isobar!.every((l) => l.kind === 'isobar')).toBe(true);
		expect(f.isolines.isotherm!.every((l) => l.kind === 'isotherm')).toBe(true);
		expect(f.isolines.isobar!.length).toBeGreaterThan(2);
		// a sheet on P–h and T–s gets those views' lines, each point with h and s
		const ph = chartFrame({ ...doc, chart: { ...doc.chart, view: 'P-h+T-s' } }, [null]);
		expect(Object.keys(ph.isolines).sort()).toEqual([
			'isenthalp',
			'isentrope',
			'isobar',
			'isotherm',
			'quality'
		]);
		expect(ph.isolines.quality!.map((l) => l.value)).toEqual([
			0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9
		]);
		for (const l of ph.isolines.isentrope!)
			expect(
				l.points.every((p) => Number.isFinite(p.h) && Math.abs(p.s / l.value - 1) < 1e-9)
			).toBe(true);
		// the design pressure (1 101 325 Pa a, set on the sheet) is drawn on T–v as its own isobar
		expect(f.limits.designPressure?.value).toBe(1_101_325);
		expect(f.limits.designPressure?.points?.length).toBeGreaterThan(10);
		const off = chartFrame({ ...doc, chart: { ...doc.chart, isolines: false } }, [null]);
		expect(off.isolines).toEqual({});
	});

	it('traces a fluid dome once', () => {
		expect(dome('water')).toBe(dome('water'));
	});

	it('frames a water sheet by IAPWS-IF97 with IF97’s dome, cached apart from IAPWS-95’s', () => {
		const doc = vesselDoc();
		const if97 = { ...doc, spec: { ...doc.spec, formulation: 'if97' as const } };
		const f = chartFrame(if97, [null]);
		expect(f.saturation?.formulation).toBe('if97');
		expect(f.saturation).toBe(dome('water', 'if97'));
		expect(dome('water', 'if97')).not.toBe(dome('water'));
		expect(chartFrame(doc, [null]).saturation?.formulation).toBeUndefined();
		// its first point: python3-iapws 1.5.2 IAPWS97(T=273.15, x=0).P = 611.212677 Pa
		expect(f.saturation!.liquid[0].T).toBe(273.15);
		expect(f.saturation!.liquid[0].P).toBeCloseTo(611.212677, 5);
		// and IF97's background lines (if97Isolines, checked against python3-iapws in if97/legs.test.ts)
		const isobars = f.isolines.isobar!;
		expect(isobars.length).toBeGreaterThan(2);
		expect(isobars).toEqual(
			if97Isolines(
				'isobar',
				isobars.map((l) => l.value),
				80
			)
		);
		expect(isobars).not.toEqual(chartFrame(doc, [null]).isolines.isobar);
	});
});

describe('draftResult', () => {
	it('computes a sheet without legs as its start state alone', () => {
		const { result, resultError } = draftResult(vesselDoc([]));
		expect(resultError).toBeNull();
		expect(result?.legs).toEqual([]);
		// the start as given on the sheet: 353.15 K, quality 0.02
		expect(result?.states[0].state.T).toBeCloseTo(353.15, 6);
		expect(result?.states[0].state.x).toBeCloseTo(0.02, 9);
	});

	it('says why a path cannot be computed, with leg labels instead of ids', () => {
		const doc = vesselDoc([{ id: 'Lbad', process: 'isobaric', target: { T: 1e5 } }]);
		const { result, resultError } = draftResult(doc);
		expect(result).toBeNull();
		expect(resultError).toMatch(/\S/);
		expect(resultError).not.toContain('Lbad');
	});
});
