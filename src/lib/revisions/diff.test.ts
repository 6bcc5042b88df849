import { describe, expect, it } from 'vitest';
import { computePath } from '$lib/thermo';
import type { PathResult } from '$lib/thermo/types';
import { unitPrefs } from '$lib/units';
import { diffRevisions, isEmptyDiff, mergedLegOrder, type DiffSide } from './diff';
import { formatDelta, formatRelative, formatValue } from './format';
import { vesselDoc } from './test-fixtures';

const side = (label: string, doc = vesselDoc()): DiffSide => ({
	label,
	doc,
	result: computePath(doc.spec)
});

describe('mergedLegOrder', () => {
	it('keeps the later order and puts removed legs after their old predecessor', () => {
		expect(mergedLegOrder(['a', 'b', 'c'], ['a', 'c'])).toEqual(['a', 'b', 'c']);
		expect(mergedLegOrder(['a', 'b'], ['x', 'a', 'y', 'b'])).toEqual(['x', 'a', 'y', 'b']);
		expect(mergedLegOrder(['a', 'b'], ['b'])).toEqual(['a', 'b']);
		expect(mergedLegOrder(['a', 'b', 'c'], ['c', 'a'])).toEqual(['c', 'a', 'b']);
		expect(mergedLegOrder([], ['a'])).toEqual(['a']);
	});
});

describe('diffRevisions', () => {
	it('finds nothing between a revision and itself', () => {
		const a = side('Rev 1');
		const d = diffRevisions(a, { ...a, label: 'Rev 1 again' });
		expect(isEmptyDiff(d)).toBe(true);
		expect(d.legs.map((l) => l.status)).toEqual(['unchanged', 'unchanged']);
		expect(d.states.map((s) => s.anchor)).toEqual(['start', 'heat', 'vent']);
	});

	it('shows a changed leg target with the knock-on changes in states downstream, keyed by leg id', () => {
		const a = side('Rev 1');
		const b = side(
			'Rev 2',
			vesselDoc([
				{ id: 'heat', process: 'isochoric', target: { T: 443.15 } },
				{ id: 'vent', process: 'isenthalpic', target: { P: 200_000 } }
			])
		);
		const d = diffRevisions(a, b);
		const heat = d.legs.find((l) => l.id === 'heat')!;
		expect(heat.status).toBe('changed');
		const target = heat.spec.find((c) => c.key === 'target.T')!;
		expect(target).toMatchObject({ before: 453.15, after: 443.15, changed: true });
		expect(target.delta).toBeCloseTo(-10, 9);
		// the heat into the vessel falls when the end temperature does (q = Δu at constant v)
		const q = heat.energy.find((c) => c.key === 'q')!;
		expect(q.changed).toBe(true);
		expect(q.delta!).toBeLessThan(0);
		expect(q.delta).toBe((q.after as number) - (q.before as number));
		expect(d.states.find((s) => s.anchor === 'start')!.status).toBe('unchanged');
		expect(d.states.find((s) => s.anchor === 'heat')!.status).toBe('changed');
		expect(d.summary).toMatchObject({ legsChanged: 2, legsAdded: 0, legsRemoved: 0, spec: 0 });
	});

	it('shows inserted and removed legs as such, with their position labels on each side', () => {
		const a = side('Rev 1');
		const b = side(
			'Rev 2',
			vesselDoc([
				{ id: 'warm', process: 'isochoric', target: { T: 373.15 } },
				{ id: 'heat', process: 'isochoric', target: { T: 453.15 } }
			])
		);
		const d = diffRevisions(a, b);
		expect(d.legs.map((l) => [l.id, l.status, l.before, l.after])).toEqual([
			['warm', 'added', null, 'L1'],
			['heat', 'changed', 'L1', 'L2'],
			['vent', 'removed', 'L2', null]
		]);
		// same spec, but it now starts where the inserted leg ends, so its heat differs
		const heat = d.legs[1];
		expect(heat.spec.every((c) => !c.changed)).toBe(true);
		expect(heat.energy.find((c) => c.key === 'q')!.changed).toBe(true);
		const vent = d.states.find((s) => s.anchor === 'vent')!;
		expect(vent.status).toBe('removed');
		expect(vent.props.find((p) => p.key === 'T')!.after).toBeNull();
		expect(d.states.find((s) => s.anchor === 'warm')!).toMatchObject({
			status: 'added',
			before: null,
			after: 'S2'
		});
		expect(d.summary).toMatchObject({ legsAdded: 1, legsRemoved: 1 });
	});

	it('lists spec fields and presentation changes separately', () => {
		const a = side('Rev 1');
		const doc = vesselDoc();
		doc.spec = {
			...doc.spec,
			system: { kind: 'closed', volume: 0.6 },
			limits: { designPressure: 1_201_325, reliefSetPressure: 1_101_325 }
		};
		doc.titleBlock = { ...doc.titleBlock, tag: 'V-204A' };
		const d = diffRevisions(a, side('Rev 2', doc));
		expect(d.spec.filter((c) => c.changed).map((c) => c.key)).toEqual([
			'system.volume',
			'limits.designPressure'
		]);
		expect(d.presentation.map((c) => [c.key, c.before, c.after])).toEqual([
			['titleBlock.tag', 'V-204', 'V-204A']
		]);
		// the same per-kg path in a larger vessel: per-kg values equal, totals scale with the mass
		const heat = d.legs.find((l) => l.id === 'heat')!;
		expect(heat.energy.find((c) => c.key === 'q')!.changed).toBe(false);
		const Q = heat.energy.find((c) => c.key === 'Q')!;
		expect((Q.after as number) / (Q.before as number)).toBeCloseTo(0.6 / 0.5, 9);
	});

	it('copes with a side whose spec could not be computed', () => {
		const a = side('Rev 1');
		const d = diffRevisions(a, {
			label: 'Working draft',
			doc: vesselDoc(),
			result: null as PathResult | null
		});
		expect(d.states[1].props.find((p) => p.key === 'T')!.after).toBeNull();
		expect(d.states[1].status).toBe('changed');
	});
});

describe('formatting differences in display units', () => {
	const prefs = unitPrefs({ pressureReference: 'gauge' });
	it('gives temperature differences in K and pressure differences without a or g', () => {
		const t = {
			key: 'T',
			label: 'T',
			quantity: 'temperature' as const,
			before: 453.15,
			after: 443.15,
			delta: -10,
			changed: true
		};
		expect(formatValue(t, 'before', prefs)).toBe('180.00\u00a0°C');
		expect(formatDelta(t, prefs)).toBe('−10.00\u00a0K');
		const p = {
			key: 'P',
			label: 'P',
			quantity: 'pressure' as const,
			before: 201_325,
			after: 301_325,
			delta: 100_000,
			changed: true
		};
		// shown gauge on the sheet: 201 325 Pa a − 101 325 Pa = 100 kPa g (definition of gauge pressure)
		expect(formatValue(p, 'before', prefs)).toBe('100.00\u00a0kPa g');
		expect(formatDelta(p, prefs)).toBe('+100.0\u00a0kPa');
		expect(formatRelative(p)).toBe('+49.7 %');
		expect(formatDelta({ ...p, changed: false }, prefs)).toBe('');
		expect(
			formatValue(
				{
					key: 'phase',
					label: 'phase',
					quantity: null,
					before: 'saturated-mixture',
					after: null,
					delta: null,
					changed: true
				},
				'before',
				prefs
			)
		).toBe('saturated mixture');
	});
});

describe('pathOverlay', () => {
	it('follows every leg in order without repeating the shared end points', async () => {
		const { pathOverlay } = await import('./overlay');
		const r = computePath(vesselDoc().spec);
		const o = pathOverlay(r, 'rev-1', 'Rev 1');
		const total = r.legs.reduce((n, l) => n + l.leg.points.length, 0);
		expect(o.points.length).toBe(total - (r.legs.length - 1));
		expect(o.points[0].T).toBe(r.states[0].state.T);
		expect(o.points[o.points.length - 1].v).toBe(r.states[r.states.length - 1].state.v);
		expect(o.label).toBe('Rev 1');
	});

	it('is a revision overlay, keyed by its label and not as a measured trace', async () => {
		const { pathOverlay } = await import('./overlay');
		const { keyEntries } = await import('$lib/charts/key');
		const o = pathOverlay(computePath(vesselDoc().spec), 'rev-1', 'Rev 1');
		expect(o.kind).toBe('revision');
		const entries = keyEntries([], { limits: false, traces: false, revisions: [o.label] });
		expect(entries).toEqual([{ kind: 'revision', text: 'Rev 1' }]);
	});
});

describe('sameContent', () => {
	it('ignores key order and sees any changed value', async () => {
		const { sameContent } = await import('./same');
		const a = vesselDoc();
		const b = JSON.parse(
			JSON.stringify({
				titleBlock: a.titleBlock,
				chart: a.chart,
				units: a.units,
				spec: a.spec,
				description: a.description,
				version: a.version
			})
		);
		expect(sameContent(a, b)).toBe(true);
		b.spec.legs[0].target.T = 450;
		expect(sameContent(a, b)).toBe(false);
	});
});
