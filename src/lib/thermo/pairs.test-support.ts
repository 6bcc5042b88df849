/**
 * Shared by the engine tests: the 21 input pairs, building inputs from a reference state, solving
 * with the hint that selects the reference where a pair has several states, and tolerances.
 */
import { expect } from 'vitest';
import { ThermoError } from './errors.ts';
import { fixState } from './index.ts';
import type { InputName, Inputs, RootHint, State } from './types.ts';

/** The 21 independent pairs of T, P, v (= 1/rho), u, h, s, x. */
export const PAIRS: [InputName, InputName][] = [];
const NAMES: InputName[] = ['T', 'P', 'v', 'u', 'h', 's', 'x'];
for (let i = 0; i < NAMES.length; i++) for (let j = i + 1; j < NAMES.length; j++) PAIRS.push([NAMES[i], NAMES[j]]);

export const HINTS: RootHint[] = ['lower-T', 'higher-T', 'lower-P', 'higher-P', 'liquid-side', 'vapor-side'];

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
	const pick = (k: InputName): number => (k === 'x' ? (ref.x as number) : k === 'rho' ? 1 / ref.v : ref[k]);
	return { [a]: pick(a), [b]: pick(b) } as Inputs;
}

/** Same state: T within 1e−7 and P within 1e−4 (candidates of one pair differ far more). */
function matches(c: { T: number; P: number }, ref: RefState): boolean {
	return Math.abs(c.T / ref.T - 1) < 1e-7 && Math.abs(c.P / ref.P - 1) < 1e-4;
}

/**
 * Fix the state from `inputs`; where the pair has several states, the reference must be among
 * the candidates the error names, and a hint (or, for a middle one of three, `near`) must return
 * it. Returns the state and whether a hint was needed.
 */
export function solveLike(fluid: string, inputs: Inputs, ref: RefState): { state: State; hinted: boolean } {
	try {
		return { state: fixState(fluid, inputs), hinted: false };
	} catch (e) {
		if (!(e instanceof ThermoError) || e.code !== 'ambiguous-state') throw e;
		const cands = e.candidates ?? [];
		expect(cands.length, `${e.message}`).toBeGreaterThanOrEqual(2);
		if (!cands.some((c) => matches(c, ref))) throw new Error(`reference not among candidates: ${e.message}`);
		for (const hint of HINTS) {
			try {
				const st = fixState(fluid, inputs, { hint });
				if (matches(st, ref)) return { state: st, hinted: true };
			} catch {
				// this hint cannot separate them; try the next
			}
		}
		// three or more candidates: only `near` tells the middle ones apart
		const st = fixState(fluid, inputs, { near: { T: ref.T, P: ref.P } });
		if (matches(st, ref)) return { state: st, hinted: true };
		throw new Error(`neither a hint nor near returns the reference: ${e.message}`);
	}
}

/**
 * Relative difference, against the magnitude of the value or, for u, h, s near the reference
 * state's zero, against a floor (0.1 % of R·T for u and h, 0.1 % of R for s).
 */
export function relErr(key: 'T' | 'P' | 'v' | 'u' | 'h' | 's', got: number, want: number, R: number, T: number): number {
	const floor = key === 'u' || key === 'h' ? 1e-3 * R * T : key === 's' ? 1e-3 * R : 0;
	return Math.abs(got - want) / Math.max(Math.abs(want), floor);
}

/** Every number of a state is finite (or null where the contract allows null). */
export function expectFinite(s: State): void {
	for (const k of ['T', 'P', 'v', 'rho', 'u', 'h', 's'] as const) expect(Number.isFinite(s[k]), `${k} = ${s[k]}`).toBe(true);
	for (const k of ['x', 'cp', 'cv', 'w'] as const) expect(s[k] === null || Number.isFinite(s[k]), `${k} = ${s[k]}`).toBe(true);
}
