/**
 * (u, h) roots between the contour scan's last sample and Tmax (plane.ts, contourRootsUH). Along
 * the curve u = U the scan samples R = P/ρ − (h − u) in ln ρ; where the curve leaves [Tmin, Tmax]
 * between two samples, the sample beyond Tmax is undefined. R-1234ze(E) 0.12 K below its Tmax at
 * 6.38 MPa has the same u and h as a state at 415.69 K, both within one sample step of the edge
 * (R turns between them): before the scan located the edge and sampled up to it, neither root was
 * bracketed and the 415.69 K state came back alone (found by scripts/region-mix.ts, seed 11).
 * Expected values: the generating states' own T and P (inputs of the test); every candidate is
 * held to reproduce u and h (an identity).
 */
// Source of the check values: a round-trip identity — the states are fixed from (T, P) and must come
// back from their own (u, h); 415.69 K is the second state's T as the region-mix run printed it. The
// root-finder cases check roots placed in the test's own function. Tolerances 1e−9 in T and u, h,
// 1e−8 in P: common practice.
import { describe, expect, it } from 'vitest';
import { ThermoError } from '../errors.ts';
import { fixState, getFluid } from '../index.ts';
import { getCompiledFluid } from '../registry.ts';
import { domainEdge, scanRoots, type FD } from './roots.ts';
import { contourRootsUH } from './plane.ts';

describe('(u, h) next to Tmax', () => {
	it('R-1234ze(E) at 419.88 K, 6.38 MPa: both states with its u and h are named', () => {
		const ref = fixState('r1234ze-e', { T: 419.88259668616115, P: 6376900.754697356 });
		const inputs = { u: ref.u, h: ref.h };
		let err: unknown = null;
		try {
			fixState('r1234ze-e', inputs);
		} catch (e) {
			err = e;
		}
		expect(err).toBeInstanceOf(ThermoError);
		const e = err as ThermoError;
		expect(e.code).toBe('ambiguous-state');
		const cands = e.candidates ?? [];
		expect(cands.length).toBe(2);
		const Ts = cands.map((c) => c.T).sort((a, b) => a - b);
		expect(Ts[0]).toBeCloseTo(415.69, 2);
		expect(Math.abs(Ts[1] / ref.T - 1)).toBeLessThan(1e-9);
		for (const c of cands) {
			const st = fixState('r1234ze-e', inputs, { near: { T: c.T, P: c.P } });
			expect(Math.abs(st.u - ref.u)).toBeLessThan(1e-9 * Math.abs(ref.u));
			expect(Math.abs(st.h - ref.h)).toBeLessThan(1e-9 * Math.abs(ref.h));
		}
		const near = fixState('r1234ze-e', inputs, { near: { T: ref.T, P: ref.P } });
		expect(Math.abs(near.P / ref.P - 1)).toBeLessThan(1e-8);
	});

	it('the contour scan brackets both roots of that pair', () => {
		const ref = fixState('r1234ze-e', { T: 419.88259668616115, P: 6376900.754697356 });
		const roots = contourRootsUH(getCompiledFluid('r1234ze-e'), ref.u, ref.h);
		expect(roots.length).toBe(2);
		expect(roots.some(([T]) => Math.abs(T / ref.T - 1) < 1e-9)).toBe(true);
	});

	// states a few tenths of a kelvin below Tmax, supercritical, from (u, h): the generating state
	// must come back when asked for near it, whatever other state shares its u and h
	for (const id of ['r1234ze-e', 'propane', 'carbon-dioxide'])
		it(`${id}: states 0.05 to 0.5 K below Tmax come back from (u, h)`, () => {
			const { Tmax } = getFluid(id).limits;
			const Pc = getFluid(id).critical.P;
			for (const dT of [0.05, 0.12, 0.5])
				for (const f of [1.2, 1.5, 1.67, 2, 3]) {
					const ref = fixState(id, { T: Tmax - dT, P: f * Pc });
					const got = fixState(id, { u: ref.u, h: ref.h }, { near: { T: ref.T, P: ref.P } });
					const where = `${id} at T = ${ref.T}, P = ${ref.P}`;
					expect(Math.abs(got.T / ref.T - 1), where).toBeLessThan(1e-9);
					expect(Math.abs(got.P / ref.P - 1), where).toBeLessThan(1e-8);
				}
		});
});

describe('scanRoots where the function is defined on part of the interval', () => {
	// f(z) = (z − 0.3)(z − 0.5), defined for z < 0.6 only; samples at 0, 1 (n = 1): both roots lie
	// between the last defined sample and the domain's edge
	const fn = (z: number, out: FD) => {
		out.f = z < 0.6 ? (z - 0.3) * (z - 0.5) : NaN;
		out.df = z < 0.6 ? 2 * z - 0.8 : NaN;
	};
	it('finds both roots with edge samples and none without', () => {
		expect(scanRoots(fn, 0, 1, 1, 1e-12)).toEqual([]);
		const r = scanRoots(fn, 0, 1, 1, 1e-12, { samples: 4 }).sort((a, b) => a - b);
		expect(r.length).toBe(2);
		expect(r[0]).toBeCloseTo(0.3, 10);
		expect(r[1]).toBeCloseTo(0.5, 10);
	});
	it('domainEdge stops at the last defined point', () => {
		const e = domainEdge(fn, 0, 1, 1e-12);
		expect(e).toBeLessThan(0.6);
		expect(e).toBeGreaterThan(0.6 - 2e-12);
	});
});
