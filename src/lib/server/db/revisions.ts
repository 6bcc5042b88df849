import type {
	DB,
	RevisionEventKind,
	SheetRevisionEvent,
	SheetRevisionRow,
	SheetRevisionsTable,
	SheetStatusValue
} from './schema';
import type { Updateable } from 'kysely';

/** Revision columns without the two JSON bodies, for lists. */
const LIGHT = [
	'id',
	'sheet_id',
	'team_id',
	'number',
	'based_on',
	'title',
	'message',
	'author_id',
	'author_label',
	'created_at',
	'status',
	'submitted_by',
	'submitted_by_label',
	'submitted_at',
	'check_requested_from',
	'checked_by',
	'checked_by_label',
	'checked_at',
	'approved_by',
	'approved_by_label',
	'approved_at',
	'returned_by',
	'returned_by_label',
	'returned_at'
] as const;

export type RevisionListRow = Omit<SheetRevisionRow, 'doc' | 'result'>;

export interface NewRevision {
	id: string;
	sheetId: string;
	teamId: string;
	number: number;
	basedOn: number | null;
	title: string;
	doc: string;
	result: string;
	message: string;
	author: { id: string | null; label: string };
}

export async function insertRevision(db: DB, r: NewRevision, now = Date.now()): Promise<void> {
	await db
		.insertInto('sheet_revisions')
		.values({
			id: r.id,
			sheet_id: r.sheetId,
			team_id: r.teamId,
			number: r.number,
			based_on: r.basedOn,
			title: r.title,
			doc: r.doc,
			result: r.result,
			message: r.message,
			author_id: r.author.id,
			author_label: r.author.label,
			created_at: now,
			submitted_by: null,
			submitted_by_label: null,
			submitted_at: null,
			check_requested_from: null,
			checked_by: null,
			checked_by_label: null,
			checked_at: null,
			approved_by: null,
			approved_by_label: null,
			approved_at: null,
			returned_by: null,
			returned_by_label: null,
			returned_at: null
		})
		.execute();
}

/** The newest revision of a sheet (without the JSON bodies), or undefined before Rev 1. */
export async function latestRevision(
	db: DB,
	sheetId: string
): Promise<RevisionListRow | undefined> {
	return db
		.selectFrom('sheet_revisions')
		.select(LIGHT)
		.where('sheet_id', '=', sheetId)
		.orderBy('number', 'desc')
		.limit(1)
		.executeTakeFirst();
}

/** One revision with its document and result. */
/** A revision's stored document alone (not its stored result, the bulk of the row). */
export async function getRevisionDoc(
	db: DB,
	sheetId: string,
	number: number
): Promise<string | undefined> {
	const row = await db
		.selectFrom('sheet_revisions')
		.select('doc')
		.where('sheet_id', '=', sheetId)
		.where('number', '=', number)
		.executeTakeFirst();
	return row?.doc;
}

export async function getRevision(
	db: DB,
	sheetId: string,
	number: number
): Promise<SheetRevisionRow | undefined> {
	return db
		.selectFrom('sheet_revisions')
		.selectAll()
		.where('sheet_id', '=', sheetId)
		.where('number', '=', number)
		.executeTakeFirst();
}

export async function listRevisionRows(db: DB, sheetId: string): Promise<RevisionListRow[]> {
	return db
		.selectFrom('sheet_revisions')
		.select(LIGHT)
		.where('sheet_id', '=', sheetId)
		.orderBy('number', 'desc')
		.execute();
}

/**
 * Moves a revision's workflow on, only if it is still in `from` (a concurrent sign-off makes
 * this a no-op). Returns whether the row was updated.
 */
export async function updateRevisionStatus(
	db: DB,
	id: string,
	from: SheetStatusValue,
	patch: Omit<
		Updateable<SheetRevisionsTable>,
		'id' | 'doc' | 'result' | 'number' | 'sheet_id' | 'team_id'
	>
): Promise<boolean> {
	const r = await db
		.updateTable('sheet_revisions')
		.set(patch)
		.where('id', '=', id)
		.where('status', '=', from)
		.executeTakeFirst();
	return Number(r.numUpdatedRows) === 1;
}

export async function logRevisionEvent(
	db: DB,
	e: {
		revisionId: string;
		sheetId: string;
		kind: RevisionEventKind;
		actor: { id: string | null; label: string };
		note?: string | null;
		/** signed off over open review notes: the reason and how many were open */
		override?: { reason: string; openNotes: number } | null;
	},
	now = Date.now()
): Promise<void> {
	await db
		.insertInto('sheet_revision_events')
		.values({
			revision_id: e.revisionId,
			sheet_id: e.sheetId,
			kind: e.kind,
			actor_id: e.actor.id,
			actor_label: e.actor.label,
			note: e.note ?? null,
			override_reason: e.override?.reason ?? null,
			open_notes: e.override?.openNotes ?? null,
			created_at: now
		})
		.execute();
}

export async function listRevisionEvents(
	db: DB,
	sheetId: string
): Promise<Array<SheetRevisionEvent & { number: number }>> {
	return db
		.selectFrom('sheet_revision_events as e')
		.innerJoin('sheet_revisions as r', 'r.id', 'e.revision_id')
		.selectAll('e')
		.select('r.number')
		.where('e.sheet_id', '=', sheetId)
		.orderBy('e.id', 'desc')
		.execute();
}

/** The sheet's status chip follows its newest revision (draft when it has none). */
export async function syncSheetStatus(db: DB, sheetId: string): Promise<SheetStatusValue> {
	const latest = await latestRevision(db, sheetId);
	const status = latest?.status ?? 'draft';
	await db.updateTable('sheets').set({ status }).where('id', '=', sheetId).execute();
	return status;
}
