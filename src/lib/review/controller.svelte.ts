/**
 * The review side of the sheet page: revisions and sign-off, review notes, measured traces and
 * the memo title block, as one reactive object the page creates next to its editor. Components
 * (RevisionHistory, ReviewNotes, TracePanel, SaveRevisionDialog, NoteMarkers, ExportMenu) read
 * and update it.
 */
import {
	reviewApi,
	type NoteView,
	type ReviewApi,
	type RevisionEvent,
	type RevisionFull,
	type RevisionSummary,
	type TraceSummary
} from './client';
import type { MeasuredTrace } from '$lib/charts/types';
import type { SheetDoc, SheetStatus } from '$lib/sheets/types';
import type { FluidInfo } from '$lib/thermo/types';
import { chartTrace } from '$lib/traces/chart';
import { sameContent } from '$lib/revisions/same';
import { memoTitle } from '$lib/export/title';
import { signOffOverrides } from '$lib/revisions/sign-off';
import type { MemoTitle } from '$lib/export/memo';

export interface ReviewInit {
	team: string;
	teamName: string;
	sheetId: string;
	revisions: RevisionSummary[];
	events: RevisionEvent[];
	notes: NoteView[];
	traces: TraceSummary[];
	members: Array<{ id: string; name: string; role: string }>;
	latestDoc: SheetDoc | null;
	me: string | null;
	canEdit: boolean;
	canCheck: boolean;
	canApprove: boolean;
	canWrite: boolean;
	/** a note to open (?note= from a mail link) */
	focus?: string | null;
}

export class SheetReview {
	readonly api: ReviewApi;
	readonly team: string;
	readonly teamName: string;
	readonly sheetId: string;
	readonly members: ReviewInit['members'];
	readonly me: string | null;
	readonly canEdit: boolean;
	readonly canCheck: boolean;
	readonly canApprove: boolean;
	readonly canWrite: boolean;

	revisions = $state<RevisionSummary[]>([]);
	events = $state<RevisionEvent[]>([]);
	notes = $state<NoteView[]>([]);
	traces = $state<TraceSummary[]>([]);
	/** ids of the traces drawn on the chart */
	shown = $state<string[]>([]);
	latestDoc = $state.raw<SheetDoc | null>(null);
	/** the newest revision the working draft is based on (sent with the next save) */
	baseRevision = $state<number | null>(null);
	focus = $state<string | null>(null);

	constructor(init: ReviewInit) {
		this.api = reviewApi(init.team, init.sheetId);
		this.team = init.team;
		this.teamName = init.teamName;
		this.sheetId = init.sheetId;
		this.members = init.members;
		this.me = init.me;
		this.canEdit = init.canEdit;
		this.canCheck = init.canCheck;
		this.canApprove = init.canApprove;
		this.canWrite = init.canWrite;
		this.revisions = init.revisions;
		this.events = init.events;
		this.notes = init.notes;
		this.traces = init.traces;
		this.shown = init.traces.filter((t) => !t.stale).map((t) => t.id);
		this.latestDoc = init.latestDoc;
		this.baseRevision = init.revisions.find((r) => r.latest)?.number ?? null;
		this.focus = init.focus ?? null;
	}

	get latest(): RevisionSummary | null {
		return this.revisions.find((r) => r.latest) ?? null;
	}

	get openNotes(): number {
		return this.notes.filter((n) => !n.resolved).length;
	}

	/** The sheet's status chip: the newest revision's status (draft without revisions). */
	get status(): SheetStatus {
		return this.latest?.status ?? 'draft';
	}

	/** The traces drawn over the path. */
	chartTraces(): MeasuredTrace[] {
		return this.traces
			.filter((t) => this.shown.includes(t.id) && !t.stale && t.points)
			.map((t) => chartTrace({ id: t.id, name: t.name, points: t.points ?? [] }));
	}

	/** Whether the working draft differs from the newest revision. */
	draftChanged(doc: SheetDoc): boolean {
		return this.latestDoc !== null && !sameContent(doc, this.latestDoc);
	}

	/** After a save: the new revision is the newest and the draft's base. */
	saved(r: RevisionFull): void {
		const { doc, result: _result, ...summary } = r;
		void _result;
		this.revisions = [summary, ...this.revisions.map((x) => ({ ...x, latest: false }))];
		this.latestDoc = doc;
		this.baseRevision = r.number;
		void this.refresh();
	}

	async refresh(): Promise<void> {
		const r = await this.api.revisions();
		this.revisions = r.revisions;
		this.events = r.events;
	}

	/** The memo title block for the working draft as it stands. */
	title(doc: SheetDoc, sheetName: string, fluid: FluidInfo): MemoTitle {
		const l = this.latest;
		const same = l && !this.draftChanged(doc);
		return memoTitle({
			sheetName,
			teamName: this.teamName,
			doc,
			fluid,
			revision: same ? { number: l.number, status: l.status } : null,
			basedOn: l?.number ?? null,
			overrides: same ? signOffOverrides(this.events, l.number) : [],
			signOff: same
				? {
						designer: { name: l.author.name, at: l.author.at },
						checker: { name: l.checked?.name ?? null, at: l.checked?.at ?? null },
						approver: { name: l.approved?.name ?? null, at: l.approved?.at ?? null }
					}
				: {
						designer: { name: null, at: null },
						checker: { name: null, at: null },
						approver: { name: null, at: null }
					},
			issued: Date.now()
		});
	}
}
