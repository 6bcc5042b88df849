import type {
	DB,
	NoteAnchorKind,
	NoteReplyKind,
	ReviewNoteReplyRow,
	ReviewNoteRow
} from './schema';

export interface NewNote {
	id: string;
	sheetId: string;
	teamId: string;
	anchorKind: NoteAnchorKind;
	anchorId: string | null;
	anchorLabel: string;
	revisionNumber: number | null;
	draftVersion: number | null;
	body: string;
	author: { id: string | null; label: string };
}

export async function insertNote(db: DB, n: NewNote, now = Date.now()): Promise<ReviewNoteRow> {
	const row: ReviewNoteRow = {
		id: n.id,
		sheet_id: n.sheetId,
		team_id: n.teamId,
		anchor_kind: n.anchorKind,
		anchor_id: n.anchorId,
		anchor_label: n.anchorLabel,
		revision_number: n.revisionNumber,
		draft_version: n.draftVersion,
		body: n.body,
		author_id: n.author.id,
		author_label: n.author.label,
		created_at: now,
		edited_at: null,
		resolved_at: null,
		resolved_by: null,
		resolved_by_label: null,
		last_activity_at: now
	};
	await db.insertInto('review_notes').values(row).execute();
	return row;
}

export async function getNoteRow(
	db: DB,
	sheetId: string,
	id: string
): Promise<ReviewNoteRow | undefined> {
	return db
		.selectFrom('review_notes')
		.selectAll()
		.where('sheet_id', '=', sheetId)
		.where('id', '=', id)
		.executeTakeFirst();
}

export async function listNoteRows(db: DB, sheetId: string): Promise<ReviewNoteRow[]> {
	return db
		.selectFrom('review_notes')
		.selectAll()
		.where('sheet_id', '=', sheetId)
		.orderBy('created_at', 'asc')
		.orderBy('id', 'asc')
		.execute();
}

export async function insertReply(
	db: DB,
	r: {
		id: string;
		noteId: string;
		kind: NoteReplyKind;
		body: string;
		author: { id: string | null; label: string };
	},
	now = Date.now()
): Promise<ReviewNoteReplyRow> {
	const row: ReviewNoteReplyRow = {
		id: r.id,
		note_id: r.noteId,
		kind: r.kind,
		body: r.body,
		author_id: r.author.id,
		author_label: r.author.label,
		created_at: now
	};
	await db.insertInto('review_note_replies').values(row).execute();
	await db
		.updateTable('review_notes')
		.set({ last_activity_at: now })
		.where('id', '=', r.noteId)
		.execute();
	return row;
}

export async function listReplyRows(
	db: DB,
	noteIds: readonly string[]
): Promise<ReviewNoteReplyRow[]> {
	if (noteIds.length === 0) return [];
	return db
		.selectFrom('review_note_replies')
		.selectAll()
		.where('note_id', 'in', noteIds)
		.orderBy('created_at', 'asc')
		.orderBy('id', 'asc')
		.execute();
}

/** Marks a thread resolved (actor set) or open again (actor null); false if it already was. */
export async function setNoteResolved(
	db: DB,
	id: string,
	actor: { id: string | null; label: string } | null,
	now = Date.now()
): Promise<boolean> {
	const q = db
		.updateTable('review_notes')
		.set(
			actor
				? {
						resolved_at: now,
						resolved_by: actor.id,
						resolved_by_label: actor.label,
						last_activity_at: now
					}
				: { resolved_at: null, resolved_by: null, resolved_by_label: null, last_activity_at: now }
		)
		.where('id', '=', id);
	const r = await (
		actor ? q.where('resolved_at', 'is', null) : q.where('resolved_at', 'is not', null)
	).executeTakeFirst();
	return Number(r.numUpdatedRows) === 1;
}

export async function insertMentions(
	db: DB,
	noteId: string,
	replyId: string | null,
	userIds: readonly string[],
	now = Date.now()
): Promise<void> {
	if (userIds.length === 0) return;
	await db
		.insertInto('review_note_mentions')
		.values(
			userIds.map((u) => ({ note_id: noteId, reply_id: replyId, user_id: u, created_at: now }))
		)
		.execute();
}

export async function listMentionRows(
	db: DB,
	noteIds: readonly string[]
): Promise<Array<{ note_id: string; reply_id: string | null; user_id: string }>> {
	if (noteIds.length === 0) return [];
	return db
		.selectFrom('review_note_mentions')
		.select(['note_id', 'reply_id', 'user_id'])
		.where('note_id', 'in', noteIds)
		.execute();
}

/** How many threads of a sheet are open (for list badges). */
export async function countOpenNotes(db: DB, sheetId: string): Promise<number> {
	const r = await db
		.selectFrom('review_notes')
		.select((eb) => eb.fn.countAll<number>().as('n'))
		.where('sheet_id', '=', sheetId)
		.where('resolved_at', 'is', null)
		.executeTakeFirst();
	return Number(r?.n ?? 0);
}
