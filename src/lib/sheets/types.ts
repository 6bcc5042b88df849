/**
 * The sheet document: what a designer edits, what autosave stores as the working draft and what a
 * revision freezes. Client-safe (no server imports). Everything physical is SI, as the engine speaks
 * (`spec` is exactly a PathSpec, so the draft can be sent to computePath / POST /api/v1/paths as is);
 * display units live in `units` and are applied only at the screen's edge.
 */
import type { PathLegSpec, PathSpec } from '$lib/thermo/types';
import type { UnitPrefs } from '$lib/units/prefs';

/** Bumped when the document's shape changes; readers migrate older documents forward. */
export const SHEET_DOC_VERSION = 1 as const;

/**
 * A leg as stored on a sheet: its id is required and never reused within the sheet. `to:
 * 'saturation'` marks a leg that ends where its process first meets the saturation line (chosen
 * with saturation-target.ts); its target is then { x: 0 } or { x: 1 }, which the engine reads.
 */
export type SheetLegSpec = PathLegSpec & { id: string; to?: 'saturation' };

/** The path spec as stored on a sheet (leg ids always present). */
export type SheetPathSpec = Omit<PathSpec, 'legs'> & { legs: SheetLegSpec[] };

/** Fields of the memo title block a designer fills in (who and when come from the workflow). */
export interface TitleBlockFields {
	/** project or job name */
	project: string;
	/** equipment described, e.g. "Kettle K-2 jacket" */
	equipment: string;
	/** equipment tag / item number */
	tag: string;
	/** memo or calculation number */
	documentNumber: string;
	/** site or client, free text */
	site: string;
}

/** The diagram views (T–v, P–v, P–h, T–s, h–s; described in $lib/charts/views). */
export type ChartKindId = 'T-v' | 'P-v' | 'P-h' | 'T-s' | 'h-s';

/**
 * The views a sheet shows: one, or two as "first+second" (e.g. "P-h+T-s"). "both" is T–v and P–v,
 * what every sheet showed before there were more views, and stays its name.
 */
export type ChartView = ChartKindId | 'both' | `${ChartKindId}+${ChartKindId}`;

/** Background line kinds a sheet may switch on (each drawn on the views where it is not an axis rule). */
export type LineKind = 'isobar' | 'isotherm' | 'isochore' | 'isentrope' | 'isenthalp' | 'quality';

export interface ChartPrefs {
	view: ChartView;
	pressureScale: 'log' | 'linear';
	/** background isolines drawn */
	isolines: boolean;
	/** which kinds of background line; absent: each view's own default set */
	lines?: LineKind[];
}

/**
 * How S1 was specified when it was not by two properties. `fill`: a vessel holding saturated
 * liquid and vapor, given by its liquid volume fraction φ = V_liquid / V (0…1, what a level gauge
 * shows) at a temperature T (K) or a pressure P (Pa absolute) — exactly one of them. The engine
 * still reads two properties: `spec.start` holds the T and v this gives (`fillStart` in fill.ts),
 * rewritten by the server from the fill whenever the document is saved.
 */
export type StartSpec = { kind: 'fill'; fraction: number; T?: number; P?: number };

export interface SheetDoc {
	version: typeof SHEET_DOC_VERSION;
	/** how S1 was given, when not by two properties (absent: `spec.start` is what was typed) */
	startSpec?: StartSpec;
	/** free-text design intent shown under the title */
	description: string;
	spec: SheetPathSpec;
	units: UnitPrefs;
	chart: ChartPrefs;
	titleBlock: TitleBlockFields;
}

/**
 * Stable anchors for review notes. They survive revisions and edits because they name leg ids,
 * never positions: the state at the end of a leg is anchored by that leg's id; the first state by
 * `start`. Display labels (S1, S2 …, L1 …) are derived from positions at render time.
 */
export type Anchor =
	| { kind: 'sheet' }
	| { kind: 'leg'; legId: string }
	| { kind: 'state'; /** 'start' or the id of the leg the state ends */ at: string };

/** Workflow status of a sheet or revision (its words and steps: $lib/revisions/steps). */
export type SheetStatus = 'draft' | 'in-check' | 'checked' | 'approved';
