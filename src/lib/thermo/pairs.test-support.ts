/**
 * Shared by the engine tests: the 21 input pairs, building inputs from a reference state, solving
 * with the hint that selects the reference where a pair has several states, and tolerances.
 */
import { expect } from 'vitest';
import { ThermoError } from './errors.ts';
import { fixState } from './index.ts';
import { evalPoint, Point } from './properties.ts';
import { getCompiledFluid } from './registry.ts';
import type { InputName, Inputs, RootHint, State } from './types.ts';

/** The 21 independent pairs of T, P, v (= 1/rho), u, h, s, x. */
export const PAIRS: [InputName, InputName][] = [];
const NAMES: InputName[] = ['T', 'P', 'v', 'u', 'h', 's', 'x'];
for (let i = 0; i < NAMES.length; i++)
	for (let j = i + 1; j < NAMES.length; j++) PAIRS.push([NAMES[i], NAMES[j]]);

export const HINTS: RootHint[] = [
	'lower-T',
	'higher-T',
	'lower-P',
	'higher-P',
	'liquid-side',
	'vapor-side'
];

export interface RefState {
	T: number;
	P: number;
	v: number;
	u: number;
	h: number;
	s: number;
	x?: number | null;
}

export function inputsFrom(ref: RefState, a: InputName, b: InputName): Inputs {
	const pick = (k: InputName): number =>
		k === 'x' ? (ref.x as number) : k === 'rho' ? 1 / ref.v : ref[k];
	return { [a]: pick(a), [b]: pick(b) } as Inputs;
}

/**
 * Fix the state from `inputs`; where the pair has several states, the reference must be among
 * the candidates the error names (the nearest one in T, P and ρ, within 1e−6 in T and 1e−3 in P),
 * and a hint (or, for a middle one of three, `near`) must return exactly that candidate. Returns
 * the state and whether a hint was needed.
 */
export function solveLike(
	fluid: string,
	inputs: Inputs,
	ref: RefState
): { state: State; hinted: boolean } {
	try {
		return { state: fixState(fluid, inputs), hinted: false };
	} catch (e) {
		if (!(e instanceof ThermoError) || e.code !== 'ambiguous-state') throw e;
		const cands = e.candidates ?? [];
		expect(cands.length, `${e.message}`).toBeGreaterThanOrEqual(2);
		const dist = (c: { T: number; P: number; rho: number }) =>
			Math.abs(Math.log(c.T / ref.T)) +
			Math.abs(Math.log(c.P / ref.P)) +
			Math.abs(Math.log(c.rho * ref.v));
		const best = [...cands].sort((a, b) => dist(a) - dist(b))[0];
		if (!(Math.abs(best.T / ref.T - 1) < 1e-6 && Math.abs(best.P / ref.P - 1) < 1e-3))
			throw new Error(`reference not among candidates: ${e.message}`, { cause: e });
		const same = (st: State) =>
			Math.abs(st.T / best.T - 1) < 1e-12 && Math.abs(st.rho / best.rho - 1) < 1e-9;
		for (const hint of HINTS) {
			try {
				const st = fixState(fluid, inputs, { hint });
				if (same(st)) return { state: st, hinted: true };
			} catch {
				// this hint cannot separate them; try the next
			}
		}
		// three or more candidates: only `near` tells the middle ones apart
		const st = fixState(fluid, inputs, { near: { T: best.T, P: best.P } });
		if (same(st)) return { state: st, hinted: true };
		throw new Error(`neither a hint nor near returns the reference: ${e.message}`, {
			cause: e
		});
	}
}

/**
 * Relative difference, against the magnitude of the value or, for u, h, s near the reference
 * state's zero, against a floor (0.1 % of R·T for u and h, 0.1 % of R for s).
 */
export function relErr(
	key: 'T' | 'P' | 'v' | 'u' | 'h' | 's',
	got: number,
	want: number,
	R: number,
	T: number
): number {
	const floor = key === 'u' || key === 'h' ? 1e-3 * R * T : key === 's' ? 1e-3 * R : 0;
	return Math.abs(got - want) / Math.max(Math.abs(want), floor);
}

/** Every number of a state is finite (or null where the contract allows null). */
export function expectFinite(s: State): void {
	for (const k of ['T', 'P', 'v', 'rho', 'u', 'h', 's'] as const)
		expect(Number.isFinite(s[k]), `${k} = ${s[k]}`).toBe(true);
	for (const k of ['x', 'cp', 'cv', 'w'] as const)
		expect(s[k] === null || Number.isFinite(s[k]), `${k} = ${s[k]}`).toBe(true);
}

/**
 * How well a pair can fix the state at all. Some pairs carry little information in places —
 * (u, s) in a liquid (at constant s, du = −P·dv and a liquid's dv is tiny), (u, h) in dilute vapor
 * (h − u = ZRT with Z ≈ 1, and the u and Pv lines nearly parallel) — so a small difference in the
 * inputs (δ: our value minus the reference's at the reference (T, ρ), plus the round-off of each
 * input) moves the answer by J⁻¹·δ, J the Jacobian of the pair with respect to (T, ln ρ) (central
 * differences of our own single-phase equation: an error bound, not an expected value).
 * Returns, for T, P and v, ten times that propagated spread, relative.
 */
export function spread(
	fluid: string,
	r: { T: number; rho: number; P: number; v: number; u: number; h: number; s: number },
	a: InputName,
	b: InputName
): Record<'T' | 'P' | 'v', number> {
	const fl = getCompiledFluid(fluid);
	const R = fl.R;
	const pt = new Point();
	const val = (T: number, rho: number, k: InputName): number => {
		evalPoint(fl, T, rho, pt, 2);
		return k === 'T'
			? T
			: k === 'P'
				? pt.P
				: k === 'v'
					? 1 / rho
					: k === 'u'
						? pt.u
						: k === 'h'
							? pt.h
							: pt.s;
	};
	const dT = 1e-6 * r.T,
		dz = 1e-6;
	const d = (k: InputName): [number, number] => [
		(val(r.T + dT, r.rho, k) - val(r.T - dT, r.rho, k)) / (2 * dT),
		(val(r.T, r.rho * Math.exp(dz), k) - val(r.T, r.rho * Math.exp(-dz), k)) / (2 * dz)
	];
	const [Ja, Jb, JP] = [d(a), d(b), d('P')];
	// round-off of u, h, s is set by their terms (about R·T, R), not by their value, which can be
	// near the reference zero
	const noise = (k: InputName): number => {
		const ours = val(r.T, r.rho, k);
		const ref = k === 'v' ? r.v : (r[k as 'T' | 'P' | 'u' | 'h' | 's'] as number);
		const floor =
			k === 'u' || k === 'h'
				? 1e-14 * (Math.abs(ours) + R * r.T)
				: k === 's'
					? 1e-14 * (Math.abs(ours) + R)
					: 1e-15 * Math.abs(ours);
		return Math.abs(ours - ref) + floor;
	};
	const da = noise(a),
		db = noise(b);
	const det = Ja[0] * Jb[1] - Ja[1] * Jb[0];
	const eT = (Math.abs(Jb[1]) * da + Math.abs(Ja[1]) * db) / Math.abs(det);
	const ez = (Math.abs(Jb[0]) * da + Math.abs(Ja[0]) * db) / Math.abs(det);
	return {
		T: (10 * eT) / r.T,
		P: (10 * (Math.abs(JP[0]) * eT + Math.abs(JP[1]) * ez)) / r.P,
		v: 10 * ez
	};
}
