/**
 * The sheet document: what a designer edits, what autosave stores as the working draft and what a
 * revision freezes. Client-safe (no server imports). Everything physical is SI, as the engine speaks
 * (`spec` is exactly a PathSpec, so the draft can be sent to computePath / POST /api/v1/paths as is);
 * display units live in `units` and are applied only at the screen's edge.
 */
import type { PathLegSpec, PathSpec } from '../thermo/types';
import type { UnitPrefs } from '../units/prefs';

/** Bumped when the document's shape changes; readers migrate older documents forward. */
export const SHEET_DOC_VERSION = 1 as const;

/** A leg as stored on a sheet: its id is required and never reused within the sheet. */
export type SheetLegSpec = PathLegSpec & { id: string };

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

export type ChartView = 'T-v' | 'P-v' | 'both';

export interface ChartPrefs {
	view: ChartView;
	pressureScale: 'log' | 'linear';
	/** background isolines drawn */
	isolines: boolean;
}

export interface SheetDoc {
	version: typeof SHEET_DOC_VERSION;
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

/** Workflow status of a sheet or revision (chip on the sheet header). */
export type SheetStatus = 'draft' | 'in-check' | 'checked' | 'approved';

export const STATUS_LABEL: Record<SheetStatus, string> = {
	draft: 'Draft',
	'in-check': 'In check',
	checked: 'Checked',
	approved: 'Approved'
};
