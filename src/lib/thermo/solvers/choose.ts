/**
 * Picking among several states that satisfy the same pair of inputs. Without a hint the pair is
 * refused (`ambiguous-state`) with every candidate named; with a hint the matching one is returned.
 */
import { bandOf, inBand } from '../pseudo-pure.ts';
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import type { FixOptions, RootHint, State, StateWindow } from '../types.ts';
import { isSolid, solidError } from './solid.ts';

/** The `near` and `window` options of the fixState call in progress (set by fixStateOf; engine calls are synchronous). */
let currentNear: FixOptions['near'] | undefined;
let currentWindow: StateWindow | undefined;
export function setNear(near: FixOptions['near'] | undefined, window?: StateWindow): void {
	currentNear = near;
	currentWindow = window;
}

/** Whether a state lies inside a window (bounds inclusive, to round-off). */
export function inWindow(s: { T: number; P: number }, w: StateWindow | undefined): boolean {
	if (!w) return true;
	const tol = 1e-12;
	return (
		(w.Tmin === undefined || s.T >= w.Tmin * (1 - tol)) &&
		(w.Tmax === undefined || s.T <= w.Tmax * (1 + tol)) &&
		(w.Pmin === undefined || s.P >= w.Pmin * (1 - tol)) &&
		(w.Pmax === undefined || s.P <= w.Pmax * (1 + tol))
	);
}

export function windowText(w: StateWindow): string {
	const part = (lo: number | undefined, hi: number | undefined, name: string, unit: string) =>
		lo !== undefined && hi !== undefined
			? `${fmt(lo)}–${fmt(hi)} ${unit}`
			: lo !== undefined
				? `${name} ≥ ${fmt(lo)} ${unit}`
				: hi !== undefined
					? `${name} ≤ ${fmt(hi)} ${unit}`
					: '';
	const t = part(w.Tmin, w.Tmax, 'T', 'K'),
		p = part(w.Pmin, w.Pmax, 'P', 'Pa');
	return [t && (t.startsWith('T') ? t : `T ${t}`), p && (p.startsWith('P') ? p : `P ${p}`)]
		.filter(Boolean)
		.join(', ');
}

/** The refusal when every state with the inputs lies outside the window. */
export function outsideWindow(
	fl: Fluid,
	what: string,
	outside: State[],
	w: StateWindow
): ThermoError {
	const list = outside.map((s) => `${s.phase} at T = ${fmt(s.T)} K, P = ${fmt(s.P)} Pa`).join('; ');
	return new ThermoError(
		'outside-window',
		`No ${fl.id} state with ${what} lies in the requested window (${windowText(w)}); outside it: ${list}.`,
		'Widen the window (or leave it out to search the whole range), or give a different pair of properties.',
		{ candidates: outside.map((s) => ({ T: s.T, P: s.P, rho: s.rho, phase: s.phase })) }
	);
}

/** Hints accepted by fixState (see RootHint in types.ts). */
export const ROOT_HINTS: readonly RootHint[] = [
	'lower-T',
	'higher-T',
	'lower-P',
	'higher-P',
	'liquid-side',
	'vapor-side'
];

/** Check hint, near and window of a fixState call (or a leg's start/end choice); `what` names the option's owner in messages. */
export function checkOptions(options: FixOptions, what = 'options'): void {
	if (options.hint !== undefined && !ROOT_HINTS.includes(options.hint))
		throw new ThermoError(
			'invalid-option',
			`Unknown hint "${String(options.hint)}" in ${what}.`,
			`Use one of: ${ROOT_HINTS.join(', ')}.`
		);
	const ok = (v: unknown) =>
		v === undefined || (typeof v === 'number' && Number.isFinite(v) && v > 0);
	const near = options.near;
	if (near !== undefined) {
		if (typeof near !== 'object' || near === null || !ok(near.T) || !ok(near.P))
			throw new ThermoError(
				'invalid-option',
				`${what}.near must hold a positive T (K) and/or P (Pa).`,
				'Give near as { T, P } of the state to stay close to, or leave it out.'
			);
	}
	const win = options.window;
	if (win !== undefined) {
		if (
			typeof win !== 'object' ||
			win === null ||
			!ok(win.Tmin) ||
			!ok(win.Tmax) ||
			!ok(win.Pmin) ||
			!ok(win.Pmax)
		)
			throw new ThermoError(
				'invalid-option',
				`${what}.window must hold positive Tmin, Tmax (K) and/or Pmin, Pmax (Pa).`,
				'Give window as { Tmin, Tmax, Pmin, Pmax } (any of them), or leave it out to search the whole range.'
			);
		if (
			(win.Tmin !== undefined && win.Tmax !== undefined && win.Tmin > win.Tmax) ||
			(win.Pmin !== undefined && win.Pmax !== undefined && win.Pmin > win.Pmax)
		)
			throw new ThermoError(
				'invalid-option',
				`${what}.window is empty: ${windowText(win)}.`,
				'Give each lower bound below its upper bound.'
			);
	}
}

/** Distance of a state from `near` (|ln T/T₀| + |ln P/P₀|). */
function nearDistance(
	near: NonNullable<FixOptions['near']>
): (s: { T: number; P: number }) => number {
	return (s) =>
		(near.T !== undefined ? Math.abs(Math.log(s.T / near.T)) : 0) +
		(near.P !== undefined ? Math.abs(Math.log(s.P / near.P)) : 0);
}

/**
 * Index of the candidate `near` or `hint` selects (near first), or −1 when neither is given or
 * the hint does not tell the candidates apart.
 */
export function pickIndex(
	c: readonly State[],
	hint: RootHint | undefined,
	near: FixOptions['near'] | undefined
): number {
	if (near && (near.T !== undefined || near.P !== undefined)) {
		const d = nearDistance(near);
		let best = 0;
		for (let i = 1; i < c.length; i++) if (d(c[i]) < d(c[best])) best = i;
		return best;
	}
	if (!hint) return -1;
	const k = key(hint);
	const order = c.map((_, i) => i).sort((a, b) => k(c[a]) - k(c[b]));
	const best = c[order[0]],
		next = c[order[1]];
	if (next === undefined || Math.abs(k(best) - k(next)) > 1e-9 * Math.abs(k(best))) return order[0];
	return -1;
}

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
export function choose(
	fl: Fluid,
	found: State[],
	hint: RootHint | undefined,
	what: string,
	noneError: () => ThermoError
): State {
	const all = dedupe(found);
	if (all.length === 0) throw noneError();
	// candidates beyond the melting curve are solid, not states of the fluid (solid.ts)
	const solidFree = all.filter((s) => !isSolid(fl, s.T, s.P));
	if (solidFree.length === 0) throw solidError(fl, all[0].T, all[0].P, what);
	// a mixture's candidates between its bubble and dew lines are not states it has (pseudo-pure.ts)
	const band = bandOf(fl);
	const fluid = band ? solidFree.filter((s) => !inBand(band, s)) : solidFree;
	if (band && fluid.length === 0) throw band.refusal(solidFree[0].T);
	// the requested window excludes roots outside it
	const win = currentWindow;
	const c = win ? fluid.filter((s) => inWindow(s, win)) : fluid;
	if (c.length === 0 && win) throw outsideWindow(fl, what, fluid, win);
	if (c.length === 1) return c[0];
	const near = currentNear;
	if (!hint && near && (near.T !== undefined || near.P !== undefined))
		return c[pickIndex(c, undefined, near)];
	const list = c.map((s) => `${s.phase} at T = ${fmt(s.T)} K, P = ${fmt(s.P)} Pa`).join('; ');
	const candidates = c.map((s) => ({ T: s.T, P: s.P, rho: s.rho, phase: s.phase }));
	if (hint) {
		const k = key(hint);
		const sorted = [...c].sort((a, b) => k(a) - k(b));
		const best = sorted[0],
			next = sorted[1];
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
