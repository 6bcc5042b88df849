/**
 * Seeded fuzzing of the IF97 entries over their whole range (fast-check): every (P, T) gives finite
 * properties consistent with the inputs (or a ThermoError, never NaN or another error); (P, h) and
 * (P, s) of each such state give it back. Also dense near the critical point and the saturation line.
 * And water paths of one leg by IF97 from random starts, processes and targets: points in order along
 * the leg, each crossing on IF97's line and among the points, anything IF97 cannot give counted.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ThermoError } from '../errors.ts';
import { computePath, fixState } from '../index.ts';
import type { PathSpec, Process, State } from '../types.ts';
import {
	if97SaturationPressure,
	if97State,
	if97StatePh,
	if97StatePs,
	type If97State
} from './state.ts';
import { COORD } from './path.ts';

const SEED = Number(process.env.FUZZ_SEED ?? 97);
const RUNS = Number(process.env.FUZZ_RUNS ?? 400);

function finiteState(st: If97State): void {
	for (const key of ['T', 'P', 'v', 'rho', 'u', 'h', 's', 'cp', 'cv', 'w'] as const) {
		const x = st[key];
		if (x !== null)
			expect(Number.isFinite(x), `${key} = ${x} at P = ${st.P}, T = ${st.T}`).toBe(true);
	}
	expect(st.v).toBeGreaterThan(0);
	if (st.cp !== null) expect(st.cp).toBeGreaterThan(0);
	if (st.w !== null) expect(st.w).toBeGreaterThan(0);
}

function roundTrip(P: number, T: number): void {
	let st: If97State;
	try {
		st = if97State(P, T);
	} catch (e) {
		expect(e).toBeInstanceOf(ThermoError);
		return;
	}
	finiteState(st);
	expect(st.P).toBe(P);
	expect(st.T).toBe(T);
	const a = if97StatePh(P, st.h);
	const b = if97StatePs(P, st.s);
	// the same state back, unless (P, T) lies where two IF97 regions' equations meet (a few tenths of a kelvin)
	const tol = 0.3;
	expect(Math.abs(a.T - T), `T(P, h) at P = ${P}, T = ${T}: ${a.T}`).toBeLessThan(tol);
	expect(Math.abs(b.T - T), `T(P, s) at P = ${P}, T = ${T}: ${b.T}`).toBeLessThan(tol);
	expect(Math.abs(a.h - st.h)).toBeLessThan(1e-9 * Math.max(Math.abs(st.h), 1e5));
	expect(Math.abs(b.s - st.s)).toBeLessThan(1e-9 * Math.max(Math.abs(st.s), 1e3));
}

describe('IF97 fuzz (seeded)', () => {
	it('(P, T) anywhere in the range: finite, consistent, and (P, h), (P, s) give it back', () => {
		fc.assert(
			fc.property(
				fc.double({ min: Math.log(700), max: Math.log(100e6), noNaN: true }),
				fc.double({ min: 273.15, max: 2273.15, noNaN: true }),
				(lnP, T) => {
					roundTrip(Math.exp(lnP), T);
				}
			),
			{ seed: SEED, numRuns: RUNS }
		);
	});
	it('near the critical point and in region 3', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 16.6e6, max: 40e6, noNaN: true }),
				fc.double({ min: 623.16, max: 700, noNaN: true }),
				(P, T) => {
					roundTrip(P, T);
				}
			),
			{ seed: SEED + 1, numRuns: RUNS }
		);
	});
	it('within 1e−6 of the saturation line on either side', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 273.2, max: 647.09, noNaN: true }),
				fc.double({ min: -1e-6, max: 1e-6, noNaN: true }),
				(T, eps) => {
					const P = if97SaturationPressure(T) * (1 + eps);
					const st = if97State(P, T);
					finiteState(st);
					// above Psat a liquid, below it a vapor; within 1e−12·Psat the saturated liquid
					expect(
						eps >= 0
							? ['compressed-liquid', 'saturated-liquid']
							: ['superheated-vapor', 'saturated-liquid']
					).toContain(st.phase);
					roundTrip(P, T);
				}
			),
			{ seed: SEED + 2, numRuns: RUNS }
		);
	});
	it('(P, h) over the whole enthalpy range at a pressure: never NaN, only ThermoError', () => {
		fc.assert(
			fc.property(
				fc.double({ min: Math.log(700), max: Math.log(100e6), noNaN: true }),
				fc.double({ min: -1e5, max: 8e6, noNaN: true }),
				(lnP, h) => {
					try {
						finiteState(if97StatePh(Math.exp(lnP), h));
					} catch (e) {
						expect(e).toBeInstanceOf(ThermoError);
						expect((e as ThermoError).code).toBe('out-of-range');
					}
				}
			),
			{ seed: SEED + 3, numRuns: RUNS }
		);
	});
});

describe('IF97 (P, h), (P, s) at a saturated state', () => {
	it('give the saturated phase back, not the other side of the line by round-off', () => {
		for (const T of [300, 373.124, 456.50794085554276, 600, 640]) {
			const P = if97SaturationPressure(T);
			for (const side of ['liquid', 'vapor'] as const) {
				const st = if97State(P, T, { side });
				for (const back of [if97StatePh(P, st.h), if97StatePs(P, st.s)]) {
					expect(back.phase, `${side} at ${T} K`).toBe(
						side === 'liquid' ? 'saturated-liquid' : 'saturated-vapor'
					);
					expect(back.x).toBe(side === 'liquid' ? 0 : 1);
					expect(Math.abs(back.T - T)).toBeLessThan(1e-9);
				}
			}
		}
	});
});

const PROCESSES: Process[] = [
	'isobaric',
	'isochoric',
	'isothermal',
	'isentropic',
	'isenthalpic',
	'polytropic'
];

describe('IF97 legs (seeded)', () => {
	it('points in order, crossings on IF97’s line and among the points, failures counted', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 280, max: 980, noNaN: true }),
				fc.double({ min: Math.log(1e3), max: Math.log(9e7), noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.boolean(),
				fc.constantFrom(...PROCESSES),
				fc.constantFrom('T', 'P', 'v', 'h', 's', 'x'),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0.5, max: 1.7, noNaN: true }),
				(T, lnP, x, inDome, process, key, u, n) => {
					const start = inDome ? { T: Math.min(T, 646.9), x } : { T, P: Math.exp(lnP) };
					let s0: State;
					try {
						s0 = fixState('water', start);
					} catch {
						return;
					}
					const target = {
						T: { T: 280 + u * 700 },
						P: { P: Math.exp(Math.log(1e3) + u * 11) },
						v: { v: s0.v * Math.exp((u - 0.5) * 6) },
						h: { h: s0.h + (u - 0.5) * 2e6 },
						s: { s: s0.s + (u - 0.5) * 4e3 },
						x: { x: u }
					}[key];
					const spec: PathSpec = {
						fluid: 'water',
						system: { kind: 'flow', massFlow: 1 },
						start,
						legs: [{ process, target, ...(process === 'polytropic' && { n }) }],
						formulation: 'if97'
					};
					let r;
					try {
						r = computePath(spec);
					} catch (e) {
						expect(e).toBeInstanceOf(ThermoError);
						return;
					}
					const leg = r.legs[0].leg;
					const marked =
						leg.points.some((p) => p.formulation) || leg.crossings.some((c) => c.state.formulation);
					if (marked)
						expect(r.warnings.some((w) => w.code === 'if97-state-unavailable')).toBe(true);
					if (r.states.some((s) => s.formulation === 'iapws95')) return;
					const k = COORD[process];
					const d = Math.sign(leg.end[k] - leg.start[k]);
					// in order wherever the IAPWS-95 leg's points are (those of a leg whose ends coincide
					// need not be), within the solvers' tolerance (1e−8 in v at a polytropic end in the liquid)
					const p95 = computePath({ ...spec, formulation: undefined }).legs[0].leg.points;
					const d95 = Math.sign(p95[p95.length - 1][k] - p95[0][k]);
					const tol = (y: number) => 1e-7 * Math.abs(y);
					if (
						leg.points.length === p95.length &&
						d95 === d &&
						p95.every((p, i) => i === 0 || (p[k] - p95[i - 1][k]) * d >= -tol(p[k]))
					)
						leg.points.forEach((p, i) => {
							if (i > 0)
								expect((p[k] - leg.points[i - 1][k]) * d, `point ${i}`).toBeGreaterThanOrEqual(
									-tol(p[k])
								);
						});
					for (const c of leg.crossings) {
						if (c.state.formulation) continue;
						expect(leg.points).toContain(c.state);
						expect(Math.abs(c.state.P / if97SaturationPressure(c.state.T) - 1)).toBeLessThan(1e-12);
					}
				}
			),
			{ seed: SEED + 4, numRuns: RUNS }
		);
	});
});
