/**
 * Legs and paths choose their start and end like fixState: startHint / startNear for a start pair
 * with several states, endHint / endNear where the target is reached both ways along the process
 * curve, and a window (T, P bounds) on both. Every point carries a precision.
 */
import { describe, expect, it } from 'vitest';
import { ThermoError } from '../errors.ts';
import { computeLeg, computePath, fixState } from '../index.ts';
import type { LegSpec } from '../types.ts';

function thrown(f: () => unknown): ThermoError {
	try {
		f();
	} catch (e) {
		return e as ThermoError;
	}
	throw new Error('expected a refusal');
}

// python3-iapws 1.5 (Debian), IAPWS95: v(279 K, 0.1 MPa) and the colder T with the same v
// (water's density maximum near 277 K lies between them)
const V279 = 0.001000053186614213;
const T_COLD = 275.2927727537598;

const twoWays: LegSpec = {
	fluid: 'water',
	start: { T: 277, P: 1e5 },
	process: 'isobaric',
	target: { v: V279 }
};

describe('leg end where the target is reached both ways', () => {
	it('takes the nearer without a choice and names the other in a note', () => {
		const leg = computeLeg(twoWays);
		expect(leg.end.T).toBeCloseTo(279, 6);
		expect(leg.notes?.join(' ')).toMatch(/also reached the other way.*275\.293 K/);
	});

	it('endHint and endNear pick either end', () => {
		expect(computeLeg({ ...twoWays, endHint: 'lower-T' }).end.T).toBeCloseTo(T_COLD, 6);
		expect(computeLeg({ ...twoWays, endHint: 'higher-T' }).end.T).toBeCloseTo(279, 6);
		expect(computeLeg({ ...twoWays, endNear: { T: 275 } }).end.T).toBeCloseTo(T_COLD, 6);
		expect(computeLeg({ ...twoWays, endNear: { T: 280 } }).end.T).toBeCloseTo(279, 6);
	});

	it('a window keeps the end inside it, and refuses naming both ends when it holds neither', () => {
		expect(computeLeg({ ...twoWays, window: { Tmax: 277 } }).end.T).toBeCloseTo(T_COLD, 6);
		expect(computeLeg({ ...twoWays, window: { Tmin: 276 } }).end.T).toBeCloseTo(279, 6);
		const e = thrown(() => computeLeg({ ...twoWays, window: { Tmin: 276.5, Tmax: 278 } }));
		expect(e.code).toBe('outside-window');
		expect(e.candidates?.map((c) => c.T).sort()).toEqual([
			expect.closeTo(T_COLD, 6),
			expect.closeTo(279, 6)
		]);
	});

	it('refuses a malformed end choice as invalid-option', () => {
		expect(thrown(() => computeLeg({ ...twoWays, endHint: 'sideways' as 'lower-T' })).code).toBe(
			'invalid-option'
		);
		expect(thrown(() => computeLeg({ ...twoWays, endNear: { T: -1 } })).code).toBe(
			'invalid-option'
		);
	});
});

describe('leg and path start with several states', () => {
	// (T, s) in cold water has three states (issue 11 audit): a mixture near 700 Pa, the everyday
	// liquid and one near 20 MPa; s is that of the liquid at 275 K, 1 MPa
	const s = fixState('water', { T: 275, P: 1e6 }).s;
	const leg: LegSpec = {
		fluid: 'water',
		start: { T: 275, s },
		process: 'isobaric',
		target: { T: 300 }
	};

	it('is refused naming every candidate, and startNear, startHint or a window choose', () => {
		const e = thrown(() => computeLeg(leg));
		expect(e.code).toBe('ambiguous-state');
		expect(e.candidates).toHaveLength(3);
		for (const spec of [
			{ ...leg, startNear: { P: 1e6 } },
			{ ...leg, window: { Pmin: 1e5, Pmax: 1e7 } }
		]) {
			const l = computeLeg(spec);
			expect(Math.abs(l.start.P - 1e6) / 1e6).toBeLessThan(
				Math.max(1e-6, 8 * l.start.precision!.P)
			);
			expect(l.end.P).toBe(l.start.P);
		}
		expect(computeLeg({ ...leg, startHint: 'lower-P' }).start.phase).toBe('saturated-mixture');
	});

	it('a path chooses its start, and its window bounds every leg end', () => {
		const path = {
			fluid: 'water',
			system: { kind: 'closed' as const, mass: 1 },
			start: { T: 275, s },
			legs: [{ process: 'isobaric' as const, target: { T: 300 } }]
		};
		expect(thrown(() => computePath(path)).code).toBe('ambiguous-state');
		const p = computePath({ ...path, startNear: { T: 275, P: 1e6 } });
		expect(p.states[1].state.T).toBeCloseTo(300, 9);
		expect(Math.abs(p.states[0].state.P - 1e6) / 1e6).toBeLessThan(1e-6);
		const w = thrown(() =>
			computePath({
				...path,
				startNear: { P: 1e6 },
				window: { Tmax: 290 }
			})
		);
		expect(w.code).toBe('outside-window');
		expect(w.message).toMatch(/^Leg L1/);
		const two = computePath({
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: 277, P: 1e5 },
			legs: [{ process: 'isobaric', target: { v: V279 }, endHint: 'lower-T' }]
		});
		expect(two.states[1].state.T).toBeCloseTo(T_COLD, 6);
	});
});

describe('precision on every leg point', () => {
	it('every point, end and crossing carries one; the end states what its pair fixes', () => {
		const leg = computeLeg({
			fluid: 'water',
			start: { T: 300, P: 1e5 },
			process: 'isobaric',
			target: { T: 500 }
		});
		for (const p of [...leg.points, ...leg.crossings.map((c) => c.state)]) {
			expect(p.precision).toBeDefined();
			for (const k of ['T', 'P', 'v'] as const) {
				expect(p.precision![k]).toBeGreaterThanOrEqual(Number.EPSILON);
				expect(p.precision![k]).toBeLessThan(1e-9);
			}
		}
		// (P, T) ends the leg: the end's precision is that of fixState from the same pair (to the
		// round-off of the end's density, which the leg reaches from its own start)
		const direct = fixState('water', { T: 500, P: 1e5 }).precision!;
		for (const k of ['T', 'P', 'v'] as const)
			expect(Math.abs(leg.end.precision![k] / direct[k] - 1), k).toBeLessThan(1e-9);
	});

	it('an isentrope ending on u in a cold liquid at a few hundred pascals states its poor P', () => {
		// issue 11 audit: (u, s) of the liquid at 797.82 Pa fixes P only to about 1 %
		const leg = computeLeg({
			fluid: 'water',
			start: { P: 1e6, s: 39.69731165753033 },
			process: 'isentropic',
			target: { u: 10894.916874166041 }
		});
		const off = Math.abs(leg.end.P - 797.82) / 797.82;
		expect(leg.end.precision!.P).toBeGreaterThan(1e-3);
		expect(off).toBeLessThanOrEqual(leg.end.precision!.P);
		expect(leg.end.precision!.T).toBeLessThan(1e-6);
	});

	it('a polytropic leg states it too', () => {
		const leg = computeLeg({
			fluid: 'nitrogen',
			start: { T: 300, P: 1e5 },
			process: 'polytropic',
			n: 1.3,
			target: { P: 1e6 }
		});
		for (const p of leg.points) expect(p.precision!.T).toBeLessThan(1e-12);
	});
});
