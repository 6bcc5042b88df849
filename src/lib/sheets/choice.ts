/**
 * Which state a sheet means where its inputs meet several, and where it looks for them. A sheet's
 * `spec.window` (T K, P Pa bounds) is the range every state of the sheet is solved within; where
 * S1's pair still meets several states the engine refuses with every candidate named, and picking
 * one sets `spec.startNear` to its T and P. Typing a new start pair drops that choice: it was made
 * for the old pair, and nothing is chosen silently. Client-safe, pure document edits.
 */
import type { FixOptions, Phase, StateWindow } from '$lib/thermo/types';
import { cloneDoc } from './doc';
import type { SheetDoc } from './types';

/** A state the start's pair meets (as the engine's `ambiguous-state` refusal lists them). */
export interface StateCandidate {
	T: number;
	P: number;
	rho: number;
	phase: Phase;
}

/** The options the engine fixes S1 with: the sheet's window and the picked candidate. */
export function startOptions(spec: SheetDoc['spec']): FixOptions {
	const o: FixOptions = {};
	if (spec.startHint !== undefined) o.hint = spec.startHint;
	if (spec.startNear !== undefined) o.near = { ...spec.startNear };
	if (spec.window !== undefined) o.window = { ...spec.window };
	return o;
}

function isCandidate(c: unknown): c is StateCandidate {
	if (typeof c !== 'object' || c === null) return false;
	const r = c as Record<string, unknown>;
	return (
		typeof r.T === 'number' &&
		typeof r.P === 'number' &&
		typeof r.rho === 'number' &&
		typeof r.phase === 'string'
	);
}

/**
 * The candidates of an `ambiguous-state` refusal of S1 — from the API (`{ code, body: { candidates,
 * field? } }`) or the engine (`{ code, candidates, field? }`) — or null for any other error (a
 * leg's refusal names its leg in `field` and is not about S1).
 */
export function startCandidatesOf(e: unknown): StateCandidate[] | null {
	if (typeof e !== 'object' || e === null) return null;
	const r = e as { code?: unknown; candidates?: unknown; field?: unknown; body?: unknown };
	if (r.code !== 'ambiguous-state') return null;
	const body = (typeof r.body === 'object' && r.body !== null ? r.body : r) as {
		candidates?: unknown;
		field?: unknown;
	};
	if (body.field !== undefined && body.field !== 'start') return null;
	const list = body.candidates;
	if (!Array.isArray(list) || list.length < 2 || !list.every(isCandidate)) return null;
	return list.map((c) => ({ T: c.T, P: c.P, rho: c.rho, phase: c.phase }));
}

/** The document with S1 pinned to the candidate picked (its T and P as `startNear`). */
export function withStartChoice(doc: SheetDoc, picked: { T: number; P: number }): SheetDoc {
	const next = cloneDoc(doc);
	delete next.spec.startHint;
	next.spec.startNear = { T: picked.T, P: picked.P };
	return next;
}

/** The document without a choice among S1's states (its start pair changed). */
export function withoutStartChoice(doc: SheetDoc): SheetDoc {
	if (doc.spec.startNear === undefined && doc.spec.startHint === undefined) return doc;
	const next = cloneDoc(doc);
	delete next.spec.startNear;
	delete next.spec.startHint;
	return next;
}

const BOUNDS = ['Tmin', 'Tmax', 'Pmin', 'Pmax'] as const;

/**
 * The document with the sheet's window set (bounds that are null or missing are open; all open
 * removes it), or why not: every bound a positive number, each lower one below its upper one.
 */
export function withWindow(
	doc: SheetDoc,
	window: Partial<Record<keyof StateWindow, number | null>>
): { ok: true; doc: SheetDoc } | { ok: false; message: string } {
	const w: StateWindow = {};
	for (const k of BOUNDS) {
		const v = window[k];
		if (v === undefined || v === null) continue;
		if (!(typeof v === 'number' && Number.isFinite(v) && v > 0))
			return {
				ok: false,
				message: `The window's ${k.startsWith('T') ? 'temperature' : 'pressure'} bounds must be above absolute zero.`
			};
		w[k] = v;
	}
	if (w.Tmin !== undefined && w.Tmax !== undefined && w.Tmin > w.Tmax)
		return { ok: false, message: 'The lowest temperature must be below the highest.' };
	if (w.Pmin !== undefined && w.Pmax !== undefined && w.Pmin > w.Pmax)
		return { ok: false, message: 'The lowest pressure must be below the highest.' };
	const next = cloneDoc(doc);
	if (Object.keys(w).length) next.spec.window = w;
	else delete next.spec.window;
	return { ok: true, doc: next };
}
