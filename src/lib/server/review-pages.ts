import type { DB, SheetRow } from './db/schema';
import { AppError } from './errors';
import type { TeamAccess } from './guard';
import { listMembers } from './db/memberships';
import { getRevisionDoc, latestRevision, listRevisionRows } from './db/revisions';
import {
	compareRevisions,
	listRevisions,
	loadSheet,
	revisionsOf,
	readRevision,
	signOffOf,
	type CompareSide,
	type RevisionSummary
} from './revisions';
import { listNotes, notesOf } from './notes';
import { listTraces, tracesOf } from './traces';
import { checkDoc, deletion, readStoredDoc } from './sheets';
import { getSheet } from './db/sheets';
import { chartFrame, draftResult } from './compute/sheet-frame';
import { signOffOverrides } from '$lib/revisions/sign-off';

export type { ChartFrame } from '$lib/review/types';

export async function sheetContext(db: DB, access: TeamAccess, sheetId: string) {
	const sheet = await loadSheet(db, access, sheetId);
	const members = await listMembers(db, access.team.id);
	const latest = await latestRevision(db, sheet.id);
	return {
		sheet: {
			id: sheet.id,
			number: sheet.number,
			title: sheet.title,
			status: sheet.status,
			version: sheet.draft_version
		},
		members: members.map((m) => ({ id: m.user_id, name: m.name, role: m.role })),
		latest: latest ? { number: latest.number, status: latest.status } : null
	};
}

/** `?rev=N` or `?rev=draft` (default: the newest revision, else the draft). */
export function revisionParam(value: string | null, latest: number | null): number | 'draft' {
	if (value === null || value === '') return latest ?? 'draft';
	if (value === 'draft') return 'draft';
	if (/^[1-9]\d{0,8}$/.test(value)) return Number(value);
	throw new AppError(
		400,
		'invalid-revision',
		'rev must be a revision number (1, 2, …) or "draft".'
	);
}

function unreadableRevision(): never {
	throw new AppError(
		422,
		'unreadable-revision',
		'The stored revision cannot be read. Please report it.'
	);
}

// ---- page data -----------------------------------------------------------------------------------

function capabilities(access: TeamAccess) {
	return {
		canEdit: access.can('sheet:edit'),
		canCheck: access.can('sheet:check'),
		canApprove: access.can('sheet:approve'),
		canWrite: access.can('note:write')
	};
}

/** The read-only page of one revision: its path, notes shown against it, sign-off and history. */
export async function revisionPageData(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	number: number
) {
	const ctx = await sheetContext(db, access, sheetId);
	const revision = await readRevision(db, access, sheetId, number);
	const [{ notes }, traces, history] = await Promise.all([
		listNotes(db, access, sheetId, number),
		listTraces(db, access, sheetId, { points: 'chart' }),
		listRevisions(db, access, sheetId)
	]);
	return {
		...ctx,
		revision,
		frame: chartFrame(revision.doc, [revision.result]),
		notes,
		traces,
		revisions: history.revisions,
		events: history.events,
		signOff: signOffOf(revision),
		me: access.actor.id,
		...capabilities(access)
	};
}

/** The comparison page: both sides with their paths, the diff, and the revision list for the pickers. */
export async function comparePageData(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	a: CompareSide,
	b: CompareSide
) {
	const ctx = await sheetContext(db, access, sheetId);
	const c = await compareRevisions(db, access, sheetId, a, b);
	const history = await listRevisions(db, access, sheetId);
	return {
		...ctx,
		a,
		b,
		...c,
		frame: chartFrame(c.after.doc, [c.after.result, c.before.result]),
		revisions: history.revisions.map((r: RevisionSummary) => ({
			number: r.number,
			status: r.status,
			message: r.message
		}))
	};
}

/** The print view of a revision or of the working draft. */
export async function printPageData(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	rev: number | 'draft'
) {
	const ctx = await sheetContext(db, access, sheetId);
	let doc;
	let result;
	let revision: RevisionSummary | null = null;
	if (rev === 'draft') {
		const row = (await getSheet(db, access.team.id, ctx.sheet.id))!;
		doc = checkDoc(JSON.parse(row.draft)).doc;
		result = draftResult(doc).result;
	} else {
		const {
			doc: frozen,
			result: computed,
			...summary
		} = await readRevision(db, access, sheetId, rev);
		doc = frozen;
		result = computed;
		revision = summary;
	}
	const [{ notes }, traces, { events }] = await Promise.all([
		listNotes(db, access, sheetId, rev === 'draft' ? null : rev),
		listTraces(db, access, sheetId, { points: 'chart' }),
		listRevisions(db, access, sheetId)
	]);
	return {
		...ctx,
		rev,
		overrides: revision ? signOffOverrides(events, revision.number) : [],
		doc,
		result,
		revision,
		signOff: revision
			? signOffOf(revision)
			: {
					designer: { name: null, at: null },
					checker: { name: null, at: null },
					approver: { name: null, at: null }
				},
		frame: chartFrame(doc, [result]),
		notes,
		traces,
		teamName: access.team.name
	};
}

/**
 * What the sheet page adds for review: revisions and the sign-off log, review notes against the
 * working draft, measured traces (thinned for the chart), members (mentions, checkers), the newest
 * revision's document (to tell whether the draft changed since), the viewer's capabilities, and
 * whether the viewer may delete the sheet. `sheet` is the sheet's row as the page read it (scoped
 * to the caller's team), so each table is read once.
 */
export async function sheetReviewData(db: DB, access: TeamAccess, sheet: SheetRow) {
	const [rows, members, { notes }, traces] = await Promise.all([
		listRevisionRows(db, sheet.id),
		listMembers(db, access.team.id),
		notesOf(db, sheet, null),
		tracesOf(db, sheet, { points: 'chart' })
	]);
	const history = await revisionsOf(db, sheet, rows);
	// only the newest revision's document (not its stored result, a full state at every point)
	const latestText = rows[0] ? await getRevisionDoc(db, sheet.id, rows[0].number) : undefined;
	const latestDoc =
		latestText !== undefined ? readStoredDoc(latestText, unreadableRevision).doc : null;
	const verdict = deletion(access, sheet, rows);
	return {
		review: {
			revisions: history.revisions,
			events: history.events,
			notes,
			traces,
			members: members.map((m) => ({ id: m.user_id, name: m.name, role: m.role })),
			latestDoc,
			me: access.actor.id,
			...capabilities(access)
		},
		deletion: verdict.allowed
			? { allowed: true, message: null }
			: { allowed: false, message: verdict.message }
	};
}
