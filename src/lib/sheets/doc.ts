/**
 * Helpers around the sheet document (types.ts): defaults, stable ids and labels, the spec the
 * engine reads, and the view of a computed path that the chart and the table draw. Client-safe.
 */
import type { ChartLeg, ChartState } from '$lib/charts/types';
import type {
	FixOptions,
	Inputs,
	PathResult,
	PathSpec,
	Process,
	State,
	StateExtras,
	TargetName
} from '$lib/thermo/types';
import { DEFAULT_UNIT_PREFS, type UnitPrefs } from '$lib/units/prefs';
import {
	SHEET_DOC_VERSION,
	type ChartPrefs,
	type SheetDoc,
	type SheetLegSpec,
	type SheetPathSpec,
	type TitleBlockFields
} from './types';

export const DEFAULT_CHART: Readonly<ChartPrefs> = Object.freeze({
	view: 'both',
	pressureScale: 'log',
	isolines: true
});

export const EMPTY_TITLE_BLOCK: Readonly<TitleBlockFields> = Object.freeze({
	project: '',
	equipment: '',
	tag: '',
	documentNumber: '',
	site: ''
});

export const TITLE_BLOCK_LABELS: Record<keyof TitleBlockFields, string> = {
	project: 'Project',
	equipment: 'Equipment',
	tag: 'Tag',
	documentNumber: 'Document no.',
	site: 'Site'
};

/** Most legs on one sheet (the engine's limit for one path). */
export const MAX_SHEET_LEGS = 50;

/** The anchor key of the first state (review notes anchor states by `start` or the id of the leg ending there). */
export const START = 'start';

/** Leg ids: "L" and six random symbols, never reused within a sheet (so notes on a deleted leg never attach to a new one). */
export const LEG_ID_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_.-]{0,39}$/;

const ID_ALPHABET = 'abcdefghijkmnpqrstuvwxyz23456789';

function randomSymbols(n: number): string {
	const bytes = new Uint8Array(n);
	globalThis.crypto.getRandomValues(bytes);
	let out = '';
	for (const b of bytes) out += ID_ALPHABET[b % 32];
	return out;
}

/** A fresh leg id not in `taken`. */
export function newLegId(taken: Iterable<string> = []): string {
	const used = new Set(taken);
	for (;;) {
		const id = `L${randomSymbols(6)}`;
		if (!used.has(id) && id !== START) return id;
	}
}

/** What each process holds constant: a leg cannot end on it (polytropic holds P·vⁿ, no single property). */
export const INVARIANT: Record<Process, TargetName | null> = {
	isobaric: 'P',
	isochoric: 'v',
	isothermal: 'T',
	isentropic: 's',
	isenthalpic: 'h',
	polytropic: null
};

/** Properties a state can be fixed by on the screen (rho is shown as v). */
export const EDITABLE_PROPS = ['T', 'P', 'v', 'u', 'h', 's', 'x'] as const;
export type EditableProp = (typeof EDITABLE_PROPS)[number];

/** Target properties a leg of this process may end on. */
export function allowedTargets(process: Process): EditableProp[] {
	const inv = INVARIANT[process];
	return EDITABLE_PROPS.filter((p) => p !== inv);
}

/** The one property of a target object, e.g. { T: 450 } → ['T', 450]; rho is reported as v. */
export function targetOf(target: Partial<Record<TargetName, number>>): [EditableProp, number] {
	const [k, v] = Object.entries(target).find(([, x]) => x !== undefined) as [TargetName, number];
	if (k === 'rho') return ['v', 1 / v];
	return [k, v];
}

/** The two properties of a start state, in the order they were set (the first is the older). */
export function startPair(start: Inputs): [EditableProp, EditableProp] {
	const keys = Object.keys(start).filter(
		(k) => start[k as keyof Inputs] !== undefined
	) as (keyof Inputs)[];
	return keys.map((k) => (k === 'rho' ? 'v' : k)) as [EditableProp, EditableProp];
}

/** S1, S2 … by position. */
export function stateLabel(index: number): string {
	return `S${index + 1}`;
}

/** L1, L2 … by position. */
export function legLabel(index: number): string {
	return `L${index + 1}`;
}

/** The anchor key of the state at a position: `start`, or the id of the leg ending there. */
export function stateKey(legs: readonly { id: string }[], index: number): string {
	return index === 0 ? START : legs[index - 1].id;
}

/** The position of a state by its key (-1 when gone). */
export function stateIndex(legs: readonly { id: string }[], key: string): number {
	if (key === START) return 0;
	const i = legs.findIndex((l) => l.id === key);
	return i < 0 ? -1 : i + 1;
}

/** The spec as the engine and POST /api/v1/paths read it: the sheet's atmosphere travels with it. */
export function engineSpec(doc: SheetDoc): PathSpec {
	const s = doc.spec;
	const spec: PathSpec = {
		fluid: s.fluid,
		system: { ...s.system },
		start: { ...s.start },
		legs: s.legs.map((l) => {
			const leg: SheetLegSpec = { id: l.id, process: l.process, target: { ...l.target } };
			if (l.n !== undefined) leg.n = l.n;
			if (l.samples !== undefined) leg.samples = l.samples;
			if (l.endHint !== undefined) leg.endHint = l.endHint;
			if (l.endNear !== undefined) leg.endNear = { ...l.endNear };
			return leg;
		}),
		atmosphericPressure: doc.units.atmosphere
	};
	const limits = Object.fromEntries(
		Object.entries(s.limits ?? {}).filter(([, v]) => v !== undefined && v !== null)
	);
	if (Object.keys(limits).length) spec.limits = limits;
	if (s.samples !== undefined) spec.samples = s.samples;
	if (s.startHint !== undefined) spec.startHint = s.startHint;
	if (s.startNear !== undefined) spec.startNear = { ...s.startNear };
	if (s.window !== undefined) spec.window = { ...s.window };
	if (s.formulation === 'if97') spec.formulation = 'if97';
	return spec;
}

export interface NewDocInput {
	spec: SheetPathSpec;
	units?: Partial<UnitPrefs>;
	chart?: Partial<ChartPrefs>;
	titleBlock?: Partial<TitleBlockFields>;
	description?: string;
}

/** A document with defaults filled in; the spec's atmosphere follows the units. */
export function makeDoc(input: NewDocInput): SheetDoc {
	const units: UnitPrefs = { ...DEFAULT_UNIT_PREFS, ...(input.units ?? {}) };
	return {
		version: SHEET_DOC_VERSION,
		description: input.description ?? '',
		spec: { ...input.spec, atmosphericPressure: units.atmosphere },
		units,
		chart: { ...DEFAULT_CHART, ...(input.chart ?? {}) },
		titleBlock: { ...EMPTY_TITLE_BLOCK, ...(input.titleBlock ?? {}) }
	};
}

/** A deep copy (documents are plain JSON). */
export function cloneDoc(doc: SheetDoc): SheetDoc {
	return JSON.parse(JSON.stringify(doc)) as SheetDoc;
}

/** Same content (key order of `start` counts: it says which property was set last). */
export function sameDoc(a: SheetDoc, b: SheetDoc): boolean {
	return JSON.stringify(a) === JSON.stringify(b);
}

/** Same physics: only the spec and the atmosphere change what the engine answers. */
export function sameSpec(a: SheetDoc, b: SheetDoc): boolean {
	return JSON.stringify(engineSpec(a)) === JSON.stringify(engineSpec(b));
}

// ---- the computed view ---------------------------------------------------------------------

/** A computed path as the screen uses it: the engine's result plus chart marks keyed by anchor. */
export interface PathView {
	result: PathResult;
	/** chart states: id = anchor key (`start` or the id of the leg ending there), label S1 … */
	states: ChartState[];
	legs: ChartLeg[];
}

/** Chart marks for a result of `spec` (the result's legs are in the spec's order). */
export function viewOf(spec: SheetPathSpec, result: PathResult): PathView {
	const keys = result.states.map((_, i) => stateKey(spec.legs, i));
	const states: ChartState[] = result.states.map((s, i) => ({
		id: keys[i],
		label: stateLabel(i),
		state: s.state
	}));
	const legs: ChartLeg[] = result.legs.map((l, i) => {
		const leg: ChartLeg = {
			id: l.id,
			process: l.leg.process,
			points: l.leg.points,
			crossings: l.leg.crossings,
			from: keys[i],
			to: keys[i + 1]
		};
		const n = spec.legs[i]?.n;
		if (n !== undefined) leg.n = n;
		return leg;
	});
	return { result, states, legs };
}

/** The engine's calls a first state needs (the server's engine, or the one loaded in the browser). */
export interface StartEngine {
	fixState(fluid: string, inputs: Inputs, options?: FixOptions): State;
	stateExtras(state: State): StateExtras;
	/** for a sheet of water by IAPWS-IF97 (thermo's if97Fix and if97Extras) */
	if97Fix?(inputs: Inputs, seed?: State): State;
	if97Extras?(state: State): StateExtras;
}

/** The path of a sheet without legs: its start state fixed by `engine`, with `startOnlyResult`. */
export function firstStateResult(
	doc: SheetDoc,
	engine: StartEngine,
	options?: FixOptions
): PathResult {
	const start = engine.fixState(doc.spec.fluid, doc.spec.start, options);
	if (doc.spec.formulation !== 'if97' || !engine.if97Fix || !engine.if97Extras)
		return startOnlyResult(doc, start, engine.stateExtras(start));
	// IAPWS-IF97 from the same pair, started from the IAPWS-95 state; where IF97 cannot give it, the
	// IAPWS-95 state with a warning (as computePath does for a path's states)
	let st: State;
	try {
		st = engine.if97Fix(doc.spec.start, start);
	} catch (e) {
		const r = startOnlyResult(doc, start, engine.stateExtras(start));
		r.formulation = 'if97';
		r.states[0] = { ...r.states[0], iapws95: start, formulation: 'iapws95' };
		r.warnings.push({
			code: 'if97-state-unavailable',
			severity: 'warning',
			message: `S1: IAPWS-IF97 cannot give this state, so it is shown by IAPWS-95. ${e instanceof Error ? e.message : String(e)}`,
			state: 'S1'
		});
		return r;
	}
	const r = startOnlyResult(doc, st, engine.if97Extras(st));
	r.formulation = 'if97';
	r.states[0] = { ...r.states[0], iapws95: start, formulation: 'if97' };
	return r;
}

/**
 * The result of a sheet without legs (POST /api/v1/paths needs at least one): the start state and
 * its extras, fixed by the engine in the browser, with the limits the start already meets.
 */
export function startOnlyResult(doc: SheetDoc, start: State, extras: StateExtras): PathResult {
	const s = doc.spec;
	const limits = Object.fromEntries(
		Object.entries(s.limits ?? {}).filter(([, v]) => typeof v === 'number')
	) as PathResult['limits'];
	const m =
		s.system.kind === 'closed'
			? (s.system.mass ?? (s.system.volume !== undefined ? s.system.volume / start.v : 1))
			: s.system.massFlow;
	const unit: 'J' | 'W' = s.system.kind === 'closed' ? 'J' : 'W';
	const limitEvents: PathResult['limitEvents'] = [];
	const beyond = {
		designPressure: (v: number) => start.P - v,
		reliefSetPressure: (v: number) => start.P - v,
		designTemperature: (v: number) => start.T - v,
		minimumTemperature: (v: number) => v - start.T
	} as const;
	for (const [k, g] of Object.entries(beyond) as [keyof typeof beyond, (v: number) => number][]) {
		const v = limits[k];
		if (v === undefined) continue;
		const d = g(v);
		if (d >= -1e-9 * v)
			limitEvents.push({
				limit: k,
				value: v,
				leg: null,
				kind: 'start-beyond',
				exceeded: d > 1e-9 * v,
				state: start
			});
	}
	const warnings: PathResult['warnings'] = [];
	if (Object.keys(limits).length)
		warnings.push({ code: 'pressure-equipment-caution', severity: 'caution', message: '' });
	if (s.system.kind === 'closed' && s.system.mass === undefined && s.system.volume === undefined)
		warnings.push({
			code: 'per-kg-totals',
			severity: 'info',
			message: 'No mass or volume is given for this closed system: the totals are for 1 kg.'
		});
	return {
		fluid: s.fluid,
		system:
			s.system.kind === 'closed'
				? { kind: 'closed', mass: m, volume: m * start.v }
				: { kind: 'flow', massFlow: m },
		atmosphericPressure: doc.units.atmosphere,
		limits,
		states: [{ id: 'S1', state: start, extras }],
		legs: [],
		perKg: { q: 0, w: 0, wShaft: 0, qFlow: 0, du: 0, dh: 0, ds: 0 },
		totals: { unit, Q: 0, W: 0, WShaft: 0, QFlow: 0 },
		cycle: null,
		limitEvents,
		warnings
	};
}

/** Replace leg ids in an engine message by their labels ("Leg Lk3m9qx" → "Leg L2"). */
export function labelIds(message: string, legs: readonly { id: string }[]): string {
	if (legs.length === 0) return message;
	const label = new Map(legs.map((l, i) => [l.id, legLabel(i)]));
	const ids = [...label.keys()]
		.sort((a, b) => b.length - a.length)
		.map((id) => id.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'));
	// one pass, so an id that looks like another leg's label is never replaced twice
	return message.replace(
		new RegExp(`(?<![\\w.-])(?:${ids.join('|')})(?![\\w-])`, 'g'),
		(m) => label.get(m) ?? m
	);
}
