import { describe, expect, it } from 'vitest';
import { fixState } from '$lib/thermo';
import { vesselDoc } from '$lib/revisions/test-fixtures';
import * as edits from './edits';

const doc = () => vesselDoc();
const ok = (e: edits.Edit) => {
	if (!e.ok) throw new Error(e.message);
	return e.doc;
};

describe('document edits', () => {
	it('never change the document they are given', () => {
		const d = doc();
		const before = JSON.stringify(d);
		edits.setStartProperty(d, 'P', 3e5);
		edits.setTarget(d, 0, 'P', 3e5);
		edits.setLimits(d, {});
		edits.moveLeg(d, 0, 1);
		edits.deleteLeg(d, 1);
		edits.setUnits(d, { atmosphere: 9e4 });
		expect(JSON.stringify(d)).toBe(before);
	});

	it('fix S1 by the last two properties typed, v in place of rho, and drop a fill level', () => {
		const d = { ...doc(), startSpec: { kind: 'fill' as const, fraction: 0.5, T: 300 } };
		const a = edits.setStartProperty(d, 'P', 3e5);
		expect(a.spec.start).toEqual({ x: 0.02, P: 3e5 });
		expect(a.startSpec).toBeUndefined();
		const b = edits.setStartProperty(a, 'v', 0.2);
		expect(b.spec.start).toEqual({ P: 3e5, v: 0.2 });
		const c = edits.setStartProperty(
			{ ...d, spec: { ...d.spec, start: { T: 300, rho: 4 } } },
			'P',
			1e5
		);
		expect(c.spec.start).toEqual({ v: 0.25, P: 1e5 });
	});

	it('pick a start pair from the state S1 is now', () => {
		const s = fixState('water', { T: 353.15, x: 0.02 });
		const next = ok(edits.setStartPair(doc(), s, 'P', 'v'));
		expect(next.spec.start).toEqual({ P: s.P, v: s.v });
		expect(edits.setStartPair(doc(), s, 'P', 'P')).toMatchObject({ ok: false });
		expect(edits.setStartPair(doc(), undefined, 'P', 'T')).toMatchObject({ ok: false });
		const steam = fixState('water', { T: 600, P: 1e5 });
		expect(edits.setStartPair(doc(), steam, 'x', 'T')).toEqual({
			ok: false,
			message: 'S1 has no quality outside the vapor dome; pick other properties.'
		});
	});

	it('keep a fill level for a vessel only', () => {
		const fill = { kind: 'fill' as const, fraction: 0.4, T: 330 };
		const next = ok(edits.setStartFill(doc(), fill, { T: 330, v: 0.01 }));
		expect(next.startSpec).toEqual(fill);
		expect(next.spec.start).toEqual({ T: 330, v: 0.01 });
		const flow = edits.setSystem(doc(), { kind: 'flow', massFlow: 1 });
		expect(edits.setStartFill(flow, fill, { T: 330, v: 0.01 })).toMatchObject({ ok: false });
		expect(edits.setSystem(next, { kind: 'flow', massFlow: 1 }).startSpec).toBeUndefined();
	});

	it('set a target, refusing the property the process holds constant, and forget "to saturation"', () => {
		const d = ok(edits.setTargetSaturation(doc(), 0, 1));
		expect(d.spec.legs[0]).toMatchObject({ id: 'heat', target: { x: 1 }, to: 'saturation' });
		const t = ok(edits.setTarget(d, 0, 'P', 5e5));
		expect(t.spec.legs[0]).toEqual({ id: 'heat', process: 'isochoric', target: { P: 5e5 } });
		expect(edits.setTarget(d, 0, 'v', 0.1)).toMatchObject({ ok: false });
		expect(edits.setTarget(d, 7, 'P', 5e5)).toEqual({
			ok: false,
			message: 'That leg is no longer on the sheet.'
		});
	});

	it('change a process keeping the leg id, and move its end off the new invariant', () => {
		const d = doc();
		expect(ok(edits.setProcess(d, 0, 'isochoric', undefined, 1.3))).toBe(d);
		const iso = ok(edits.setProcess(d, 0, 'isobaric', undefined, 1.3));
		expect(iso.spec.legs[0]).toEqual({ id: 'heat', process: 'isobaric', target: { T: 453.15 } });
		// the vent leg ends at 200 kPa; as an isobar it cannot, so it ends at that state another way
		const end = fixState('water', { P: 2e5, h: 1.5e6 });
		const vent = ok(edits.setProcess(d, 1, 'isobaric', end, 1.3)).spec.legs[1];
		expect(vent.id).toBe('vent');
		expect(vent.target.P).toBeUndefined();
		const poly = ok(edits.setProcess(d, 0, 'polytropic', undefined, 1.25)).spec.legs[0];
		expect(poly.n).toBe(1.25);
	});

	it('set n on a polytropic leg only, within ±50', () => {
		const p = ok(edits.setProcess(doc(), 0, 'polytropic', undefined, 1.3));
		expect(ok(edits.setN(p, 0, 1.1)).spec.legs[0].n).toBe(1.1);
		expect(edits.setN(p, 0, 51)).toMatchObject({ ok: false });
		expect(edits.setN(p, 0, NaN)).toMatchObject({ ok: false });
		expect(edits.setN(doc(), 0, 1.1)).toEqual({
			ok: false,
			message: 'Only a polytropic leg has n.'
		});
	});

	it('delete and move legs by position; a move past either end changes nothing', () => {
		const d = doc();
		expect(ok(edits.deleteLeg(d, 0)).spec.legs.map((l) => l.id)).toEqual(['vent']);
		expect(edits.deleteLeg(d, 2)).toMatchObject({ ok: false });
		expect(edits.moveLeg(d, 1, -1).spec.legs.map((l) => l.id)).toEqual(['vent', 'heat']);
		expect(edits.moveLeg(d, 1, 1)).toBe(d);
		expect(edits.moveLeg(d, 0, -1)).toBe(d);
	});

	it('keep finite design limits only, and none as no set', () => {
		const d = edits.setLimits(doc(), { designPressure: 2e6, designTemperature: NaN });
		expect(d.spec.limits).toEqual({ designPressure: 2e6 });
		expect(edits.setLimits(d, {}).spec.limits).toBeUndefined();
	});

	it('carry the sheet atmosphere into the engine spec with the units', () => {
		const d = edits.setUnits(doc(), { atmosphere: 95_000 });
		expect(d.units.atmosphere).toBe(95_000);
		expect(d.spec.atmosphericPressure).toBe(95_000);
	});

	it('patch chart, title block and description', () => {
		const d = doc();
		expect(edits.setChart(d, { isolines: false }).chart).toEqual({ ...d.chart, isolines: false });
		expect(edits.setTitleBlock(d, { tag: 'V-9' }).titleBlock).toEqual({
			...d.titleBlock,
			tag: 'V-9'
		});
		expect(edits.setDescription(d, 'Cold start').description).toBe('Cold start');
	});

	it('move a sheet to another fluid, with the fill level’s start when there is one', () => {
		const d = doc();
		expect(edits.setFluid(d, 'water')).toBe(d);
		expect(edits.setFluid(d, 'r134a', { T: 1, v: 1 }).spec).toMatchObject({
			fluid: 'r134a',
			start: d.spec.start
		});
		const filled = { ...d, startSpec: { kind: 'fill' as const, fraction: 0.5, T: 300 } };
		expect(edits.setFluid(filled, 'r134a', { T: 300, v: 0.002 }).spec.start).toEqual({
			T: 300,
			v: 0.002
		});
	});
});
