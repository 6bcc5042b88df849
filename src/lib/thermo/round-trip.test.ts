/**
 * Internal consistency of water: states fixed from (T, P) or (T, x) come back through every one of
 * the 21 input pairs — on a grid over every region, at ±1 mK around the saturation temperature,
 * and near the critical point. Tolerances as for the reference fixture (1e−6 single-phase, 1e−5 on
 * and inside the dome), plus the pair's own conditioning (spread).
 */
import { describe, expect, it } from 'vitest';
import { ThermoError } from './errors.ts';
import { fixState, saturationAtP, saturationAtT } from './index.ts';
import {
	PAIRS,
	expectFinite,
	inputsFrom,
	relErr,
	solveLike,
	spread
} from './pairs.test-support.ts';
import type { Inputs, State } from './types.ts';

const R = 461.51805; // IAPWS R6-95(2018)
const KEYS = ['T', 'P', 'v', 'u', 'h', 's'] as const;

/** The saturation line next to a single-phase state's side of the dome. */
function adjacentLine(ref: State): string {
	return ref.phase === 'compressed-liquid' ? 'saturated-liquid' : 'saturated-vapor';
}

/**
 * Whether a single-phase state lies closer to its saturation line (in pressure, at its T) than the
 * pair can resolve (`spreadP`, relative): then the pair cannot tell it from the line, and the line
 * is an answer as good as the state. Only (u, s) in a cold liquid gets there: at constant s,
 * du = −P·dv (the Gibbs relation; IAPWS R6-95(2018) Table 3 relations), and a liquid's dv is
 * ~κ·v·dP, so u moves by only P·v·κ per pascal — below the round-off of u at a few kPa.
 */
function nearLine(ref: State, spreadP: number): boolean {
	if (ref.phase !== 'compressed-liquid' && ref.phase !== 'superheated-vapor') return false;
	if (ref.T >= 647.096) return false;
	return Math.abs(ref.P - saturationAtT('water', ref.T).P) <= spreadP * ref.P;
}

function roundTrip(seed: Inputs): number {
	const ref = fixState('water', seed);
	const dome = ref.x !== null;
	let checked = 0;
	for (const [a, b] of PAIRS) {
		if ((a === 'x' || b === 'x') && !dome) continue;
		const inputs = inputsFrom(ref, a, b);
		const where = `${ref.phase} T=${ref.T} P=${ref.P} from (${a}, ${b})`;
		if (a === 'T' && b === 'P' && dome) {
			expect(() => fixState('water', inputs), where).toThrowError(ThermoError);
			continue;
		}
		let st: State;
		try {
			st = solveLike('water', inputs, ref).state;
		} catch (e) {
			throw new Error(`${where}: ${(e as Error).message}`, { cause: e });
		}
		expectFinite(st);
		// the converse of nearLine: a state on a line answered as the single phase beside it, nearer
		// the line than the pair resolves there (again (u, s) in a cold liquid), is as good an answer
		const offLine = dome && (ref.x === 0 || ref.x === 1) && st.x === null;
		if (offLine) {
			const spAt = spread('water', st, a, b);
			expect(st.phase, where).toBe(ref.x === 0 ? 'compressed-liquid' : 'superheated-vapor');
			expect(nearLine(st, spAt.P), `${where}: off the line by more than the pair resolves`).toBe(
				true
			);
		}
		const sp = dome
			? offLine
				? spread('water', st, a, b)
				: { T: 0, P: 0, v: 0 }
			: spread('water', ref, a, b);
		const base = dome ? 1e-5 : 1e-6;
		for (const k of KEYS) {
			const tol = base + (k === 'T' || k === 'P' || k === 'v' ? sp[k] : 0);
			expect(
				relErr(k, st[k], ref[k], R, ref.T),
				`${where} ${k}: ${st[k]} vs ${ref[k]}`
			).toBeLessThan(tol);
		}
		if (!dome)
			expect(st.phase, where).toBe(
				nearLine(ref, sp.P) && st.phase === adjacentLine(ref) ? adjacentLine(ref) : ref.phase
			);
		checked++;
	}
	return checked;
}

describe('water round trips through all 21 pairs', () => {
	it('over every region', () => {
		let n = 0;
		for (const T of [280, 330, 420, 520, 610, 700, 950, 1250])
			for (const P of [2e3, 0.5e6, 8e6, 30e6, 200e6, 900e6]) {
				let ok = true;
				try {
					fixState('water', { T, P });
				} catch {
					ok = false;
				}
				if (ok) n += roundTrip({ T, P });
			}
		for (const T of [290, 420, 560, 640])
			for (const x of [0, 0.02, 0.5, 1]) n += roundTrip({ T, x });
		expect(n).toBeGreaterThan(900);
	});

	it('at ±1 mK around the saturation temperature', () => {
		let n = 0;
		for (const P of [1e3, 5e3, 0.1e6, 1e6, 10e6, 20e6]) {
			const Ts = saturationAtP('water', P).T;
			const liq = fixState('water', { T: Ts - 1e-3, P });
			const vap = fixState('water', { T: Ts + 1e-3, P });
			// even at 1 kPa, where this liquid is only 0.07 Pa above Psat(T) and within 1e−9 of ρ' in
			// density, it is a compressed liquid (state.ts: on a line only within the pressure band too)
			expect(liq.phase).toBe('compressed-liquid');
			expect(liq.P).toBe(P);
			expect(vap.phase).toBe('superheated-vapor');
			n += roundTrip({ T: Ts - 1e-3, P }) + roundTrip({ T: Ts + 1e-3, P });
		}
		expect(n).toBeGreaterThan(150);
	});

	it('near the critical point', () => {
		let n = 0;
		for (const [T, P] of [
			[647.096 + 1e-3, 22.07e6],
			[647.2, 22.05e6],
			[647.0, 22.1e6],
			[650, 22.064e6],
			[646.9, 21.9e6]
		])
			n += roundTrip({ T, P });
		for (const T of [647.096 - 1e-3, 647.0]) for (const x of [0, 0.3, 1]) n += roundTrip({ T, x });
		expect(n).toBeGreaterThan(150);
	});
});
