import type { DesignLimits as ChartLimits } from '$lib/charts/types';
import type {
	FluidInfo,
	Isoline,
	IsolineKind,
	PathResult,
	SaturationCurve
} from '$lib/thermo/types';
import type { Anchor, SheetDoc, SheetStatus } from '$lib/sheets/types';
import type { RejectedLine, TraceColumn, TracePoint } from '$lib/traces/types';
import type { SignOffEventKind } from '$lib/revisions/steps';

/** What a read-only chart needs besides the path: the dome, background isolines, design limits. */
export interface ChartFrame {
	fluid: FluidInfo;
	saturation: SaturationCurve | null;
	/** background lines by kind: the kinds the sheet's shown views draw (sheets/chart-views.ts) */
	isolines: Partial<Record<IsolineKind, Isoline[]>>;
	limits: ChartLimits;
}

/*
 * What the review API answers (revisions, notes, traces): one definition for the server that
 * builds these and the browser that reads them.
 */

export interface Signature {
	/** user id (null for a removed account) */
	id: string | null;
	name: string;
	at: number;
}

export interface RevisionSummary {
	number: number;
	basedOn: number | null;
	title: string;
	message: string;
	author: Signature;
	status: SheetStatus;
	submitted: (Signature & { checkerId: string | null }) | null;
	checked: Signature | null;
	approved: Signature | null;
	returned: Signature | null;
	/** the newest revision of the sheet (the only one that moves through sign-off) */
	latest: boolean;
}

export interface RevisionFull extends RevisionSummary {
	doc: SheetDoc;
	result: PathResult;
}

/** A revision back in draft because someone other than its author returned it (a withdrawal is the author's own). */
export function wasReturned(r: Pick<RevisionSummary, 'status' | 'returned' | 'author'>): boolean {
	return r.status === 'draft' && r.returned !== null && r.returned.id !== r.author.id;
}

export interface RevisionEvent {
	number: number;
	kind: SignOffEventKind;
	actor: string;
	note: string | null;
	/** checked or approved over open review notes: the reason given and how many were open */
	override?: { reason: string; openNotes: number } | null;
	at: number;
}

export interface ReplyView {
	id: string;
	kind: 'reply' | 'resolved' | 'reopened';
	body: string;
	author: { id: string | null; name: string };
	at: number;
	mentions: string[];
}

export interface NoteView {
	id: string;
	anchor: Anchor;
	/** the label the anchor had where the note was written (L2, S3, Sheet) */
	writtenAt: string;
	/** the anchor's label in the document the notes are shown against; null when it is gone */
	label: string | null;
	/** the anchor (a leg or the state it ends) is not in that document */
	outdated: boolean;
	/** the revision the author was viewing (null: the working draft) */
	revision: number | null;
	body: string;
	author: { id: string | null; name: string };
	at: number;
	mentions: string[];
	resolved: { by: string; at: number } | null;
	replies: ReplyView[];
	lastActivityAt: number;
}

export interface TraceSummary {
	id: string;
	name: string;
	filename: string;
	fluid: string;
	columns: TraceColumn[];
	atmosphere: number;
	tolerance: number;
	pointCount: number;
	inDomeCount: number;
	rejectedCount: number;
	rejected: RejectedLine[];
	notes: string[];
	startedAt: string | null;
	uploadedBy: string;
	uploadedAt: number;
	/** the points were fixed for another fluid than the sheet's current one */
	stale: boolean;
	/** present where the answer carries the points (a single trace, or a list asked with points) */
	points?: TracePoint[];
}

export interface TraceWithPoints extends TraceSummary {
	points: TracePoint[];
}
