import type { Formulation, Inputs, Process, State, TargetName } from '$lib/thermo/types';
import type { UnitPrefs } from '$lib/units/prefs';
import { cloneDoc, INVARIANT, targetOf, type EditableProp } from '$lib/sheets/doc';
import type { FillSpec } from '$lib/sheets/fill';
import type { ChartPrefs, SheetDoc, SheetLegSpec, TitleBlockFields } from '$lib/sheets/types';
import { targetFor, valueOf } from './targets';

/*
 * The sketcher's edits as plain functions of the document: each takes the current document (and
 * what the engine already knows about it) and returns the next one, or why there is none. The
 * editor (state.svelte.ts) computes the next document and commits it; nothing here talks to the
 * network or the engine, so each edit is checked by a unit test of its own.
 */

/** The next document, or a sentence for the person editing. `doc` is the same object when nothing changes. */
export type Edit = { ok: true; doc: SheetDoc } | { ok: false; message: string };

const fail = (message: string): Edit => ({ ok: false, message });
const GONE = 'That leg is no longer on the sheet.';

/**
 * S1 by a typed property. Typing one of its two properties changes that value; typing another
 * replaces the older of the two (the one set first), so the last two typed fix it.
 */
export function setStartProperty(doc: SheetDoc, prop: EditableProp, si: number): SheetDoc {
	const next = cloneDoc(doc);
	const start: Record<string, number> = {};
	// rho is shown and typed as v
	for (const [k, v] of Object.entries(next.spec.start))
		if (v !== undefined) start[k === 'rho' ? 'v' : k] = k === 'rho' ? 1 / v : v;
	const [older, newer] = Object.keys(start);
	const keep = prop === newer ? older : newer;
	next.spec.start = { [keep]: start[keep], [prop]: si };
	delete next.startSpec;
	return next;
}

/** S1 by two other properties of the state it is now (the table's "fixed by" picker). */
export function setStartPair(
	doc: SheetDoc,
	state: State | undefined,
	a: EditableProp,
	b: EditableProp
): Edit {
	if (!state || a === b) return fail('Pick two different properties.');
	const va = valueOf(state, a);
	const vb = valueOf(state, b);
	if (va === null || vb === null)
		return fail('S1 has no quality outside the vapor dome; pick other properties.');
	const next = cloneDoc(doc);
	next.spec.start = { [a]: va, [b]: vb };
	delete next.startSpec;
	return { ok: true, doc: next };
}

/** S1 by a fill level (fill.ts): the document keeps the fill and the state `start` it gives. */
export function setStartFill(doc: SheetDoc, fill: FillSpec, start: Inputs): Edit {
	if (doc.spec.system.kind !== 'closed')
		return fail(
			'A start by fill level is for a closed system (a vessel); set the system to closed first.'
		);
	const next = cloneDoc(doc);
	next.spec.start = start;
	next.startSpec = { ...fill };
	return { ok: true, doc: next };
}

/** End leg `index` exactly on a typed property of its end state. */
export function setTarget(doc: SheetDoc, index: number, prop: EditableProp, si: number): Edit {
	const leg = doc.spec.legs[index];
	if (!leg) return fail(GONE);
	if (INVARIANT[leg.process] === prop)
		return fail(
			`An ${leg.process} leg keeps ${prop} constant; type another property of this state.`
		);
	const next = cloneDoc(doc);
	next.spec.legs[index] = {
		...leg,
		target: { [prop]: si } as Partial<Record<TargetName, number>>
	};
	delete next.spec.legs[index].to;
	return { ok: true, doc: next };
}

/** End leg `index` on a saturation line (x = 0 or 1), marked as ending there. */
export function setTargetSaturation(doc: SheetDoc, index: number, x: 0 | 1): Edit {
	const leg = doc.spec.legs[index];
	if (!leg) return fail(GONE);
	const next = cloneDoc(doc);
	next.spec.legs[index] = { ...leg, target: { x }, to: 'saturation' };
	return { ok: true, doc: next };
}

/**
 * Another process for leg `index`, keeping its id (so its review notes stay on it) and, where it
 * can, its end (`end`, the state the leg ends at now): a target the new process holds constant is
 * replaced by one through that end state; a polytropic leg gets `n` (its own, else `defaultN`).
 */
export function setProcess(
	doc: SheetDoc,
	index: number,
	process: Process,
	end: State | undefined,
	defaultN: number
): Edit {
	const leg = doc.spec.legs[index];
	if (!leg) return fail(GONE);
	if (leg.process === process) return { ok: true, doc };
	const [kind, value] = targetOf(leg.target);
	let target: Partial<Record<TargetName, number>> = { [kind]: value };
	if (INVARIANT[process] === kind && end)
		target = targetFor(
			process,
			end,
			kind,
			'T-v',
			process === 'polytropic' ? defaultN : undefined
		).target;
	else if (INVARIANT[process] === kind) target = { T: value };
	const next = cloneDoc(doc);
	const changed: SheetLegSpec = { id: leg.id, process, target };
	if (process === 'polytropic') changed.n = leg.n ?? defaultN;
	next.spec.legs[index] = changed;
	return { ok: true, doc: next };
}

/** The polytropic exponent of leg `index`. */
export function setN(doc: SheetDoc, index: number, n: number): Edit {
	const leg = doc.spec.legs[index];
	if (!leg || leg.process !== 'polytropic') return fail('Only a polytropic leg has n.');
	if (!Number.isFinite(n) || Math.abs(n) > 50)
		return fail('n must be a number from −50 to 50, e.g. 1.3.');
	const next = cloneDoc(doc);
	next.spec.legs[index] = { ...leg, n };
	return { ok: true, doc: next };
}

export function deleteLeg(doc: SheetDoc, index: number): Edit {
	if (!doc.spec.legs[index]) return fail(GONE);
	const next = cloneDoc(doc);
	next.spec.legs.splice(index, 1);
	return { ok: true, doc: next };
}

/** Leg `index` one place earlier (-1) or later (+1); past either end nothing changes. */
export function moveLeg(doc: SheetDoc, index: number, by: -1 | 1): SheetDoc {
	const to = index + by;
	if (index < 0 || to < 0 || to >= doc.spec.legs.length) return doc;
	const next = cloneDoc(doc);
	const [leg] = next.spec.legs.splice(index, 1);
	next.spec.legs.splice(to, 0, leg);
	return next;
}

export function setSystem(doc: SheetDoc, system: SheetDoc['spec']['system']): SheetDoc {
	const next = cloneDoc(doc);
	next.spec.system = system;
	// a fill level belongs to a vessel: a flow device keeps the start's two properties
	if (system.kind !== 'closed') delete next.startSpec;
	return next;
}

/** Design limits; those not given as finite numbers are dropped, and none at all removes the set. */
export function setLimits(
	doc: SheetDoc,
	limits: NonNullable<SheetDoc['spec']['limits']>
): SheetDoc {
	const next = cloneDoc(doc);
	const clean = Object.fromEntries(
		Object.entries(limits).filter(([, v]) => typeof v === 'number' && Number.isFinite(v))
	);
	if (Object.keys(clean).length) next.spec.limits = clean;
	else delete next.spec.limits;
	return next;
}

/** Display units; the engine's atmosphere follows the sheet's (gauge readings depend on it). */
export function setUnits(doc: SheetDoc, patch: Partial<UnitPrefs>): SheetDoc {
	const next = cloneDoc(doc);
	next.units = { ...next.units, ...patch };
	next.spec.atmosphericPressure = next.units.atmosphere;
	return next;
}

export function setChart(doc: SheetDoc, patch: Partial<ChartPrefs>): SheetDoc {
	const next = cloneDoc(doc);
	next.chart = { ...next.chart, ...patch };
	return next;
}

export function setTitleBlock(doc: SheetDoc, patch: Partial<TitleBlockFields>): SheetDoc {
	const next = cloneDoc(doc);
	next.titleBlock = { ...next.titleBlock, ...patch };
	return next;
}

export function setDescription(doc: SheetDoc, text: string): SheetDoc {
	const next = cloneDoc(doc);
	next.description = text;
	return next;
}

/** The same path in fluid `id`; a start by fill level takes `start`, the same fill in that fluid. */
export function setFluid(doc: SheetDoc, id: string, start?: Inputs): SheetDoc {
	if (id === doc.spec.fluid) return doc;
	const next = cloneDoc(doc);
	next.spec.fluid = id;
	// IAPWS-IF97 is water's alone: another fluid takes its own equation of state
	if (id !== 'water') delete next.spec.formulation;
	if (next.startSpec && start) next.spec.start = start;
	return next;
}

/** Water's formulation for the sheet: IAPWS-95 (the default, kept as no field) or IAPWS-IF97. */
export function setFormulation(doc: SheetDoc, formulation: Formulation): Edit {
	if (formulation === 'if97' && doc.spec.fluid !== 'water')
		return {
			ok: false,
			message: 'IAPWS-IF97 is for water only; make the sheet’s fluid water first.'
		};
	if ((doc.spec.formulation ?? 'iapws95') === formulation) return { ok: true, doc };
	const next = cloneDoc(doc);
	if (formulation === 'if97') next.spec.formulation = 'if97';
	else delete next.spec.formulation;
	return { ok: true, doc: next };
}
