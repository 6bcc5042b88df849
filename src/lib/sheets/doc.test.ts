import { describe, expect, it } from 'vitest';
import {
	allowedTargets,
	engineSpec,
	labelIds,
	makeDoc,
	newLegId,
	sameSpec,
	startPair,
	stateIndex,
	stateKey,
	targetOf,
	viewOf
} from './doc';
import { computePath } from '$lib/thermo';
import { WORKED_EXAMPLES } from './templates';

describe('sheet document helpers', () => {
	it('leg ids are fresh and never "start"', () => {
		const taken = new Set<string>();
		for (let i = 0; i < 500; i++) {
			const id = newLegId(taken);
			expect(id).toMatch(/^L[a-z2-9]{6}$/);
			expect(taken.has(id)).toBe(false);
			taken.add(id);
		}
	});

	it('states are keyed by the id of the leg ending there, and survive reordering', () => {
		const legs = [{ id: 'La' }, { id: 'Lb' }];
		expect([0, 1, 2].map((i) => stateKey(legs, i))).toEqual(['start', 'La', 'Lb']);
		expect(stateIndex([{ id: 'Lb' }, { id: 'La' }], 'La')).toBe(2);
		expect(stateIndex(legs, 'gone')).toBe(-1);
	});

	it('targets, start pairs and what a process allows', () => {
		expect(targetOf({ rho: 4 })).toEqual(['v', 0.25]);
		expect(startPair({ x: 0.5, T: 300 })).toEqual(['x', 'T']);
		expect(allowedTargets('isochoric')).not.toContain('v');
		expect(allowedTargets('isobaric')).toEqual(['T', 'v', 'u', 'h', 's', 'x']);
		expect(allowedTargets('polytropic')).toHaveLength(7);
	});

	it('the engine spec carries the atmosphere and only the engine’s fields', () => {
		const d = makeDoc({
			spec: {
				fluid: 'water',
				system: { kind: 'flow', massFlow: 1 },
				start: { T: 300, P: 1e5 },
				legs: [],
				limits: { designPressure: undefined }
			},
			units: { atmosphere: 97_000 }
		});
		const s = engineSpec(d);
		expect(s.atmosphericPressure).toBe(97_000);
		expect(s.limits).toBeUndefined();
		const e = { ...d, titleBlock: { ...d.titleBlock, tag: 'X' } };
		expect(sameSpec(d, e)).toBe(true);
		expect(sameSpec(d, { ...d, units: { ...d.units, atmosphere: 90_000 } })).toBe(false);
	});

	it('engine messages name legs by their labels, each id replaced once', () => {
		const legs = [{ id: 'L2' }, { id: 'Lx7k2mq' }];
		expect(labelIds('Leg L2 (isobaric) then Leg Lx7k2mq fails', legs)).toBe(
			'Leg L1 (isobaric) then Leg L2 fails'
		);
	});

	it('every worked example computes, and its chart marks are keyed by anchors', () => {
		for (const ex of WORKED_EXAMPLES) {
			const d = ex.build();
			const r = computePath(engineSpec(d));
			const view = viewOf(d.spec, r);
			expect(view.states.map((s) => s.id)).toEqual(['start', ...d.spec.legs.map((l) => l.id)]);
			expect(view.states.map((s) => s.label)).toEqual(
				d.spec.legs.map((_, i) => `S${i + 1}`).concat(`S${d.spec.legs.length + 1}`)
			);
			expect(
				view.legs.every((l, i) => l.from === view.states[i].id && l.to === view.states[i + 1].id)
			).toBe(true);
		}
	});
});
