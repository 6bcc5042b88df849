import { describe, expect, it } from 'vitest';
import { computePath, fixState, ThermoError } from '$lib/thermo';
import {
	startCandidatesOf,
	startOptions,
	withoutStartChoice,
	withStartChoice,
	withWindow
} from './choice';
import { engineSpec, makeDoc } from './doc';
import { parseSheetDoc } from './schema';

// python3-iapws 1.5 (Debian), IAPWS95: h and s of liquid water at 275 K, 1 MPa. (T, h) and (T, s)
// there meet a mixture near 700 Pa and the everyday liquid (issue 11 audit); (T, s) also a liquid
// near 20 MPa
const H_275 = 8768.151501519118;
const S_275 = 28.34316112492915;

const coldDoc = (start: { T: number; h?: number; s?: number }) =>
	makeDoc({
		spec: {
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start,
			legs: [{ id: 'Lheat', process: 'isobaric', target: { T: 300 } }]
		}
	});

function refusal(f: () => unknown): unknown {
	try {
		f();
	} catch (e) {
		return e;
	}
	throw new Error('expected a refusal');
}

describe('the sheet window', () => {
	it('sets, replaces and clears bounds; open sides are left out', () => {
		const d = coldDoc({ T: 275, s: S_275 });
		const r = withWindow(d, { Pmin: 1e5, Pmax: 1e7, Tmin: null });
		expect(r.ok && r.doc.spec.window).toEqual({ Pmin: 1e5, Pmax: 1e7 });
		expect(d.spec.window).toBeUndefined();
		const cleared = r.ok ? withWindow(r.doc, { Pmin: null, Pmax: null }) : r;
		expect(cleared.ok && cleared.doc.spec.window).toBeUndefined();
	});

	it('refuses bounds below zero or crossed, saying what to give', () => {
		const d = coldDoc({ T: 275, s: S_275 });
		expect(withWindow(d, { Pmin: -1 })).toEqual({
			ok: false,
			message: expect.stringMatching(/pressure bounds/)
		});
		expect(withWindow(d, { Tmin: 300, Tmax: 290 })).toEqual({
			ok: false,
			message: 'The lowest temperature must be below the highest.'
		});
		expect(withWindow(d, { Pmin: 2e5, Pmax: 1e5 }).ok).toBe(false);
	});

	it('travels to the engine and selects the everyday liquid of (T, s) in cold water', () => {
		const d = coldDoc({ T: 275, s: S_275 });
		expect((refusal(() => computePath(engineSpec(d))) as ThermoError).code).toBe('ambiguous-state');
		const r = withWindow(d, { Pmin: 1e5, Pmax: 1e7 });
		if (!r.ok) throw new Error(r.message);
		expect(engineSpec(r.doc).window).toEqual({ Pmin: 1e5, Pmax: 1e7 });
		const p = computePath(engineSpec(r.doc));
		expect(Math.abs(p.states[0].state.P - 1e6) / 1e6).toBeLessThan(1e-3);
	});

	it('is kept by the document schema, and a crossed or unknown bound is refused', () => {
		const r = withWindow(coldDoc({ T: 275, s: S_275 }), { Pmin: 1e5 });
		if (!r.ok) throw new Error(r.message);
		const parsed = parseSheetDoc(JSON.parse(JSON.stringify(r.doc)));
		expect(parsed.ok && parsed.doc.spec.window).toEqual({ Pmin: 1e5 });
		const bad = JSON.parse(JSON.stringify(r.doc));
		bad.spec.window = { Pmin: 2e5, Pmax: 1e5 };
		expect(parseSheetDoc(bad)).toMatchObject({ ok: false, message: /window is empty/ });
		bad.spec.window = { Pmin: 1e5, pmax: 1e7 };
		expect(parseSheetDoc(bad).ok).toBe(false);
	});
});

describe('picking among the start’s states', () => {
	it('reads the candidates of an ambiguous start from the engine and from the API shape', () => {
		const d = coldDoc({ T: 275, h: H_275 });
		const e = refusal(() => computePath(engineSpec(d)));
		const fromEngine = startCandidatesOf(e);
		expect(fromEngine?.map((c) => c.phase).sort()).toEqual([
			'compressed-liquid',
			'saturated-mixture'
		]);
		const api = {
			code: 'ambiguous-state',
			body: { code: 'ambiguous-state', candidates: (e as ThermoError).candidates }
		};
		expect(startCandidatesOf(api)).toEqual(fromEngine);
		// a leg's refusal (field legs[i]) and other codes are not about S1
		expect(startCandidatesOf({ ...api, body: { ...api.body, field: 'legs[0]' } })).toBeNull();
		expect(startCandidatesOf({ code: 'out-of-range', candidates: [] })).toBeNull();
		expect(startCandidatesOf(new Error('x'))).toBeNull();
	});

	it('picking the everyday liquid keeps it as startNear, and the sheet then solves to it', () => {
		const d = coldDoc({ T: 275, h: H_275 });
		const cands = startCandidatesOf(refusal(() => computePath(engineSpec(d))))!;
		const liquid = cands.find((c) => c.phase === 'compressed-liquid')!;
		const picked = withStartChoice(d, liquid);
		expect(picked.spec.startNear).toEqual({ T: liquid.T, P: liquid.P });
		expect(d.spec.startNear).toBeUndefined();
		expect(engineSpec(picked).startNear).toEqual({ T: liquid.T, P: liquid.P });
		const p = computePath(engineSpec(picked));
		expect(Math.abs(p.states[0].state.P - 1e6) / 1e6).toBeLessThan(1e-3);
		expect(p.states[0].state.phase).toBe('compressed-liquid');
		// the same choice fixes S1 on its own (a sheet without legs, the server's start check)
		expect(fixState('water', picked.spec.start, startOptions(picked.spec)).phase).toBe(
			'compressed-liquid'
		);
		const parsed = parseSheetDoc(JSON.parse(JSON.stringify(picked)));
		expect(parsed.ok && parsed.doc.spec.startNear).toEqual({ T: liquid.T, P: liquid.P });
	});

	it('a new start pair drops the choice; a document without one is returned as it is', () => {
		const d = coldDoc({ T: 275, h: H_275 });
		const picked = withStartChoice(d, { T: 275, P: 1e6 });
		const dropped = withoutStartChoice(picked);
		expect(dropped.spec.startNear).toBeUndefined();
		expect(picked.spec.startNear).toBeDefined();
		expect(withoutStartChoice(d)).toBe(d);
	});
});
