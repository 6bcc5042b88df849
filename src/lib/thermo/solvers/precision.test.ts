/**
 * precision: how well the pair determines T, P and v, stated on every fixState answer.
 */
import { describe, expect, it } from 'vitest';
import { fixState } from '../index.ts';

const EPS = Number.EPSILON;

describe('State.precision', () => {
	it('states the ill-conditioning of (u, s) in a cold liquid at a few hundred pascals', () => {
		// issue 11 audit: this (u, s) came from the liquid at 797.82 Pa; the answer reproduces u and s
		// to 1e−12 yet lands at another P — the pair barely determines P there
		const st = fixState('water', { u: 10894.916874166041, s: 39.69731165753033 });
		const off = Math.abs(st.P - 797.82) / 797.82;
		expect(off).toBeGreaterThan(1e-3);
		const pr = st.precision!;
		expect(pr.P).toBeGreaterThanOrEqual(off);
		expect(pr.P).toBeLessThan(0.2);
		// T and v are still well determined
		expect(pr.T).toBeLessThan(1e-9);
		expect(pr.v).toBeLessThan(1e-6);
	});

	it('is round-off for a well-conditioned pair, and an input is exact', () => {
		const st = fixState('water', { T: 300, P: 1e5 });
		expect(st.precision).toEqual({ T: EPS, P: EPS, v: expect.any(Number) });
		expect(st.precision!.v).toBeLessThan(1e-14);
		const ph = fixState('water', { P: 1e5, h: 2e6 });
		expect(ph.precision!.P).toBe(EPS);
		expect(ph.precision!.T).toBeLessThan(1e-14);
	});

	it('grows toward the critical point for (T, P) → v', () => {
		const far = fixState('water', { T: 700, P: 22e6 }).precision!.v;
		const near = fixState('water', { T: 647.2, P: 22.07e6 }).precision!.v;
		expect(near).toBeGreaterThan(10 * far);
	});

	it('matches a perturbation of the inputs for (u, h) in dilute gas', () => {
		// (u, h) in dilute vapor: h − u = Pv ≈ RT fixes T but hardly P
		const ref = fixState('water', { T: 500, P: 50 });
		const st = fixState('water', { u: ref.u, h: ref.h }, { near: { T: 500, P: 50 } });
		expect(st.precision!.P).toBeGreaterThan(1e-9);
		// the answer is within its stated precision of the generating state
		expect(Math.abs(st.P - 50) / 50).toBeLessThanOrEqual(Math.max(1e-9, 10 * st.precision!.P));
	});

	it('never exceeds 1 and is a number on every pair', () => {
		const ref = fixState('water', { T: 400, x: 0.4 });
		for (const inputs of [
			{ T: 400, x: 0.4 },
			{ P: ref.P, x: 0.4 },
			{ v: ref.v, x: 0.4 },
			{ u: ref.u, h: ref.h },
			{ h: ref.h, s: ref.s },
			{ T: 400, v: ref.v }
		]) {
			const pr = fixState('water', inputs, { near: { T: 400 } }).precision!;
			for (const k of ['T', 'P', 'v'] as const) {
				expect(Number.isFinite(pr[k])).toBe(true);
				expect(pr[k]).toBeGreaterThanOrEqual(EPS);
				expect(pr[k]).toBeLessThanOrEqual(1);
			}
		}
	});
});
