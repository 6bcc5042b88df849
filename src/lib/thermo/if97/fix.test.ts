/**
 * IAPWS-IF97 states fixed by property pairs (fix.ts, index.ts if97Fix).
 * - Spot values: python3-iapws 1.5.2's IAPWS97 class for (P, h), (P, s), (h, s), (T, x), (P, x)
 *   (tests/reference/if97-fix.json, made by tests/reference/make-if97-fix.py).
 * - Round trips: a state by if97State(P, T) (itself checked against the release's verification
 *   tables in if97.test.ts) fixed again from every other pair of its properties gives back its T and P.
 */
import { describe, expect, it } from 'vitest';
import fixture from '../../../../tests/reference/if97-fix.json';
import {
	fixState,
	if97Fix,
	ThermoError,
	type InputName,
	type Inputs,
	type State
} from '../index.ts';
import { if97State } from './state.ts';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe('if97Fix against python3-iapws IAPWS97', () => {
	for (const { inputs, state } of fixture.pairs) {
		const name = Object.entries(inputs)
			.map(([k, x]) => `${k}=${x}`)
			.join(', ');
		it(name, () => {
			// source: python3-iapws 1.5.2 IAPWS97(**inputs), tests/reference/if97-fix.json
			const st = if97Fix(inputs as Inputs);
			// python3-iapws's own backward (h, s) and (P, h) iterations stop near 1e−9 relative
			const tol = 'h' in inputs && 's' in inputs ? 1e-6 : 1e-8;
			expect(rel(st.T, state.T), `T ${st.T} vs ${state.T}`).toBeLessThan(tol);
			expect(rel(st.P, state.P), `P ${st.P} vs ${state.P}`).toBeLessThan(tol);
			expect(rel(st.v, state.v), `v ${st.v} vs ${state.v}`).toBeLessThan(10 * tol);
			expect(Math.abs(st.h - state.h), `h ${st.h} vs ${state.h}`).toBeLessThan(
				1e-3 + tol * state.h
			);
			expect(Math.abs(st.s - state.s), `s ${st.s} vs ${state.s}`).toBeLessThan(
				1e-6 + tol * state.s
			);
			expect(Math.abs(st.u - state.u), `u ${st.u} vs ${state.u}`).toBeLessThan(
				1e-3 + tol * state.u
			);
			if (state.x > 0 && state.x < 1) expect(st.x).toBeCloseTo(state.x, 8);
		});
	}
});

const PAIRS: [InputName, InputName][] = [
	['T', 'v'],
	['P', 'v'],
	['T', 'u'],
	['T', 'h'],
	['T', 's'],
	['P', 'u'],
	['P', 'h'],
	['P', 's'],
	['v', 'u'],
	['v', 'h'],
	['v', 's'],
	['u', 'h'],
	['u', 's'],
	['h', 's']
];

describe('if97Fix round trips: (P, T) → pair → state', () => {
	// single-phase states over regions 1, 2, 3 and 5, away from the saturation line by at least 1 K
	const grid: [number, number][] = [];
	for (const T of [280, 320, 400, 500, 600, 640, 660, 700, 800, 1000, 1200])
		for (const P of [2e3, 1e5, 1e6, 5e6, 2e7, 4e7, 9e7]) {
			if (T > 1073.15 && P > 5e7) continue;
			grid.push([P, T]);
		}
	for (const [P, T] of grid)
		for (const [a, b] of PAIRS)
			it(`${a},${b} at P=${P} Pa, T=${T} K`, () => {
				const ref = if97State(P, T);
				// (u, s) of a liquid: both follow T nearly alone, P is not pinned to round-off by them
				if (a === 'u' && b === 's' && ref.region === 1) return;
				const inputs: Inputs = { [a]: ref[a] as number, [b]: ref[b] as number };
				let seed: State;
				try {
					seed = fixState('water', inputs, { near: { T, P } });
				} catch {
					// beyond IAPWS-95's range (e.g. above 1273 K) or where it has no such state: start near
					seed = { ...ref, T: T * (1 + 1e-4), P: P * (1 + 1e-3) };
				}
				const st = if97Fix(inputs, seed);
				// the answer gives back both inputs
				for (const k of [a, b])
					expect(rel(st[k] as number, ref[k] as number), k).toBeLessThan(1e-9);
				// where the pair pins the state (the IAPWS-95 state of the same inputs lies near: their
				// difference is ~1e−4), the same state; pairs such as (u, h) of a near-ideal gas or (u, s)
				// of a liquid barely depend on P and have other IF97 states with both values
				if (Math.abs(seed.T / T - 1) < 1e-3 && Math.abs(Math.log(seed.P / P)) < 1e-2) {
					expect(rel(st.T, T), `T ${st.T} vs ${T}`).toBeLessThan(1e-7);
					// the pair's conditioning (IAPWS-95's precision estimate for the same pair) bounds P
					const tolP = seed.precision ? 1e-7 + 1e3 * seed.precision.P : 1e-5; // no estimate: an ideal gas's (T, u) or (T, h) barely holds P
					expect(rel(st.P, P), `P ${st.P} vs ${P}`).toBeLessThan(tolP);
					expect(st.region).toBe(ref.region);
				}
			});
	it('inside the dome: (v, u), (h, s), (v, h) give back T and x', () => {
		for (const T of [300, 400, 500, 600, 640])
			for (const x of [0.05, 0.5, 0.95]) {
				const ref = if97Fix({ T, x });
				for (const [a, b] of [
					['v', 'u'],
					['h', 's'],
					['v', 'h'],
					['u', 's']
				] as const) {
					const st = if97Fix({ [a]: ref[a], [b]: ref[b] });
					expect(rel(st.T, T), `${a},${b} T=${T} x=${x}: T ${st.T}`).toBeLessThan(1e-8);
					expect(st.x, `${a},${b} T=${T} x=${x}`).toBeCloseTo(x, 8);
					expect(st.phase).toBe('saturated-mixture');
				}
			}
	});
});

describe('if97Fix outside its range', () => {
	it('refuses above 100 MPa and names IF97', () => {
		expect(() => if97Fix({ T: 400, P: 2e8 })).toThrow(/IAPWS-IF97/);
		expect(() => if97Fix({ T: 1100, P: 6e7 })).toThrow(ThermoError);
	});
	it('refuses a saturated state above the critical pressure', () => {
		expect(() => if97Fix({ P: 2.5e7, x: 0.5 })).toThrow(ThermoError);
	});
	it('refuses a quality outside 0…1', () => {
		expect(() => if97Fix({ T: 400, x: 1.5 })).toThrow(ThermoError);
	});
});
