/**
 * Picking among several states that satisfy the same pair of inputs. Without a hint the pair is
 * refused (`ambiguous-state`) with every candidate named; with a hint the matching one is returned.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import type { FixOptions, RootHint, State } from '../types.ts';
import { isSolid, solidError } from './solid.ts';

/** The `near` option of the fixState call in progress (set by fixStateOf; engine calls are synchronous). */
let currentNear: FixOptions['near'] | undefined;
export function setNear(near: FixOptions['near'] | undefined): void {
	currentNear = near;
}

/** Hints accepted by fixState (see RootHint in types.ts). */
export const ROOT_HINTS: readonly RootHint[] = ['lower-T', 'higher-T', 'lower-P', 'higher-P', 'liquid-side', 'vapor-side'];

/**
 * Same state to within solver round-off. Pressure is compared too: two liquid states can differ by
 * hundreds of pascals while their T and ρ agree to 1e−7.
 */
function same(a: State, b: State): boolean {
	return (
		Math.abs(a.T - b.T) <= 1e-8 * a.T &&
		Math.abs(a.rho - b.rho) <= 1e-7 * a.rho &&
		Math.abs(a.P - b.P) <= 1e-4 * Math.max(a.P, b.P)
	);
}

/** Remove duplicates (kept in input order). */
export function dedupe(states: State[]): State[] {
	const out: State[] = [];
	for (const s of states) if (!out.some((o) => same(o, s))) out.push(s);
	return out;
}

function key(hint: RootHint): (s: State) => number {
	switch (hint) {
		case 'lower-T':
			return (s) => s.T;
		case 'higher-T':
			return (s) => -s.T;
		case 'lower-P':
			return (s) => s.P;
		case 'higher-P':
			return (s) => -s.P;
		case 'liquid-side':
			return (s) => -s.rho;
		case 'vapor-side':
			return (s) => s.rho;
	}
}

/**
 * One state from the candidates: the only one, or the one the hint selects. Throws `ambiguous-state`
 * (candidates listed) when there are several and no hint, or the hint cannot tell them apart;
 * throws `noneError()` when there are none.
 */
export function choose(fl: Fluid, found: State[], hint: RootHint | undefined, what: string, noneError: () => ThermoError): State {
	const all = dedupe(found);
	if (all.length === 0) throw noneError();
	// candidates beyond the melting curve are solid, not states of the fluid (solid.ts)
	const c = all.filter((s) => !isSolid(fl, s.T, s.P));
	if (c.length === 0) throw solidError(fl, all[0].T, all[0].P, what);
	if (c.length === 1) return c[0];
	const near = currentNear;
	if (!hint && near && (near.T !== undefined || near.P !== undefined)) {
		const d = (s: State) =>
			(near.T !== undefined ? Math.abs(Math.log(s.T / near.T)) : 0) + (near.P !== undefined ? Math.abs(Math.log(s.P / near.P)) : 0);
		return [...c].sort((a, b) => d(a) - d(b))[0];
	}
	const list = c.map((s) => `${s.phase} at T = ${fmt(s.T)} K, P = ${fmt(s.P)} Pa`).join('; ');
	const candidates = c.map((s) => ({ T: s.T, P: s.P, rho: s.rho, phase: s.phase }));
	if (hint) {
		const k = key(hint);
		const sorted = [...c].sort((a, b) => k(a) - k(b));
		const best = sorted[0], next = sorted[1];
		if (Math.abs(k(best) - k(next)) > 1e-9 * Math.abs(k(best))) return best;
		throw new ThermoError(
			'ambiguous-state',
			`${c.length} ${fl.id} states have ${what}, and the hint "${hint}" does not tell them apart: ${list}.`,
			'Use a hint that differs between them (lower-T, higher-T, lower-P, higher-P, liquid-side, vapor-side), or give a different pair of properties.',
			{ candidates }
		);
	}
	throw new ThermoError(
		'ambiguous-state',
		`${c.length} ${fl.id} states have ${what}: ${list}.`,
		'Choose one with options.hint (lower-T, higher-T, lower-P, higher-P, liquid-side or vapor-side), or give a different pair of properties.',
		{ candidates }
	);
}
