import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import * as engine from '$lib/thermo';
import { cloneDoc, engineSpec, makeDoc, viewOf } from '$lib/sheets/doc';
import type { SheetDoc } from '$lib/sheets/types';
import { previewPath } from './preview';

// python3-iapws 1.5.2 (Debian), IAPWS95, direct calls: tests/reference/make-iapws-sketcher.py
const reference = JSON.parse(readFileSync('tests/reference/iapws-sketcher.json', 'utf8')) as {
	isochore: {
		v: number;
		points: { T: number; P: number; x: number | null }[];
		saturatedVapor: { T: number; P: number };
	};
};

/** Water at 100 °C, v = 0.5 m³/kg (wet); L1 isochoric to 150 °C; L2 isobaric to 250 °C. */
function baseDoc(): SheetDoc {
	return makeDoc({
		spec: {
			fluid: 'water',
			system: { kind: 'closed', volume: 0.5 },
			start: { T: 373.15, v: 0.5 },
			legs: [
				{ id: 'La', process: 'isochoric', target: { T: 423.15 } },
				{ id: 'Lb', process: 'isobaric', target: { T: 523.15 } }
			]
		}
	});
}

/** What POST /api/v1/paths answers for a drag of `doc` (the editor asks for 20 points a leg). */
function serverView(doc: SheetDoc, samples?: number) {
	const spec = engineSpec(doc);
	if (samples !== undefined) spec.samples = samples;
	return viewOf(doc.spec, engine.computePath(spec));
}

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('the drag preview (the browser engine, from the moved state on)', () => {
	const base = baseDoc();
	const baseView = serverView(base);

	it('puts the dragged end where IAPWS-95 puts it, and draws the legs the server would', () => {
		// S2 dragged up its isochore to 200 °C
		const next = cloneDoc(base);
		next.spec.legs[0].target = { T: 473.15 };
		const p = previewPath(engine, next.spec, baseView, 1, { samples: 20 });
		expect(p.partial).toBe(false);
		expect(p.states.map((s) => [s.id, s.label])).toEqual([
			['start', 'S1'],
			['La', 'S2'],
			['Lb', 'S3']
		]);
		// python3-iapws: IAPWS95(T=473.15, rho=2).P (tests/reference/iapws-sketcher.json)
		const at200 = reference.isochore.points[2];
		expect(rel(p.states[1].state.P, at200.P)).toBeLessThan(1e-7);
		expect(rel(p.states[1].state.v, reference.isochore.v)).toBeLessThan(1e-9);
		// the isochore leaves the dome where python3-iapws's saturated vapour has ρ'' = 2 kg/m³
		const crossing = p.legs[0].crossings.find((c) => c.line === 'saturated-vapor');
		expect(crossing).toBeDefined();
		expect(Math.abs(crossing!.state.T - reference.isochore.saturatedVapor.T)).toBeLessThan(1e-4);
		// L2 goes on from the moved S2 at its pressure, to 250 °C
		expect(rel(p.states[2].state.P, p.states[1].state.P)).toBeLessThan(1e-9);
		expect(p.states[2].state.T).toBeCloseTo(523.15, 6);
		// the same numbers as the server's path for that document at drag detail (same engine)
		const server = serverView(next, 20);
		expect(p.states.map((s) => s.state)).toEqual(server.states.map((s) => s.state));
		expect(p.legs.map((l) => [l.id, l.from, l.to, l.points, l.crossings])).toEqual(
			server.legs.map((l) => [l.id, l.from, l.to, l.points, l.crossings])
		);
		// each leg starts exactly at the state before it
		expect(p.legs[1].points[0]).toBe(p.states[1].state);
	});

	it('keeps the states and legs before the moved one as they were', () => {
		const next = cloneDoc(base);
		next.spec.legs[1].target = { T: 493.15 };
		const p = previewPath(engine, next.spec, baseView, 2, { samples: 20 });
		expect(p.states[0].state).toBe(baseView.states[0].state);
		expect(p.states[1].state).toBe(baseView.states[1].state);
		expect(p.legs[0].points).toBe(baseView.legs[0].points);
		expect(p.states[2].state.T).toBeCloseTo(493.15, 6);
		expect(p.legs[1].points.length).toBe(serverView(next, 20).legs[1].points.length);
	});

	it('re-fixes a dragged start and every leg after it', () => {
		const next = cloneDoc(base);
		next.spec.start = { T: 383.15, v: 0.5 };
		const p = previewPath(engine, next.spec, baseView, 0, { samples: 20 });
		const server = serverView(next, 20);
		expect(p.states.map((s) => s.state)).toEqual(server.states.map((s) => s.state));
		expect(p.legs.map((l) => l.points)).toEqual(server.legs.map((l) => l.points));
	});

	it('draws a new last leg pulled out of the last state', () => {
		const next = cloneDoc(base);
		next.spec.legs.push({ id: 'Lc', process: 'isothermal', target: { P: 2e5 } });
		const p = previewPath(engine, next.spec, baseView, 3, { samples: 20 });
		expect(p.states.map((s) => s.id)).toEqual(['start', 'La', 'Lb', 'Lc']);
		expect(p.legs[2]).toMatchObject({ id: 'Lc', from: 'Lb', to: 'Lc', process: 'isothermal' });
		expect(p.states[3].state.T).toBeCloseTo(523.15, 6);
		expect(p.states[3].state.P).toBeCloseTo(2e5, 3);
	});

	it('takes a leg’s or the path’s own number of points over the drag detail', () => {
		const next = cloneDoc(base);
		next.spec.samples = 60;
		const p = previewPath(engine, next.spec, baseView, 1, { samples: 20 });
		const server = serverView(next);
		expect(p.legs.map((l) => l.points.length)).toEqual(server.legs.map((l) => l.points.length));
		expect(p.legs[0].points.length).toBeGreaterThan(40);
	});

	it('throws the engine’s refusal (the editor keeps its last preview)', () => {
		const next = cloneDoc(base);
		// an isobaric leg cannot reach a quality above 1
		next.spec.legs[1] = { id: 'Lb', process: 'isobaric', target: { x: 1.5 } };
		expect(() => previewPath(engine, next.spec, baseView, 2, { samples: 20 })).toThrow(
			engine.ThermoError
		);
	});

	it('stops adding legs once the frame’s time is spent, and says so', () => {
		let t = 0;
		const now = () => (t += 11); // each reading of the clock 11 ms on
		const next = cloneDoc(base);
		next.spec.start = { T: 380, v: 0.5 };
		const p = previewPath(engine, next.spec, baseView, 0, { samples: 20, budgetMs: 10, now });
		expect(p.partial).toBe(true);
		expect(p.legs.length).toBe(1);
		expect(p.states.length).toBe(2);
		const whole = previewPath(engine, next.spec, baseView, 0, { samples: 20 });
		expect(whole.partial).toBe(false);
		expect(whole.legs.length).toBe(2);
	});

	it('refuses a state that is not on the path', () => {
		expect(() => previewPath(engine, base.spec, baseView, 5)).toThrow(RangeError);
	});
});
