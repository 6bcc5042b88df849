/**
 * Seeded fuzzing of the IF97 entries over their whole range (fast-check): every (P, T) gives finite
 * properties consistent with the inputs (or a ThermoError, never NaN or another error); (P, h) and
 * (P, s) of each such state give it back. Also dense near the critical point and the saturation line.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ThermoError } from '../errors.ts';
import {
	if97SaturationPressure,
	if97State,
	if97StatePh,
	if97StatePs,
	type If97State
} from './state.ts';

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
