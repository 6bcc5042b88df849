import { describe, expect, it } from 'vitest';
import { computePath } from '$lib/thermo';
import { vesselDoc } from '$lib/revisions/test-fixtures';
import { chartFrame, dome, draftResult } from './sheet-frame';

describe('the chart frame on the server', () => {
	it('frames a chart: dome, isolines in the sheet units, limit curves for both diagrams', () => {
		const doc = vesselDoc();
		const f = chartFrame(doc, [computePath(doc.spec)]);
		expect(f.fluid.id).toBe('water');
		expect(f.saturation?.liquid.length).toBeGreaterThan(50);
		expect(f.isolines.tv.every((l) => l.kind === 'isobar')).toBe(true);
		expect(f.isolines.pv.every((l) => l.kind === 'isotherm')).toBe(true);
		expect(f.isolines.tv.length).toBeGreaterThan(2);
		// the design pressure (1 101 325 Pa a, set on the sheet) is drawn on T–v as its own isobar
		expect(f.limits.designPressure?.value).toBe(1_101_325);
		expect(f.limits.designPressure?.points?.length).toBeGreaterThan(10);
		const off = chartFrame({ ...doc, chart: { ...doc.chart, isolines: false } }, [null]);
		expect(off.isolines.tv).toEqual([]);
	});

	it('traces a fluid dome once', () => {
		expect(dome('water')).toBe(dome('water'));
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
