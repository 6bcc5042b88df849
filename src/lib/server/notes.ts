import { z } from 'zod';
import { transaction } from './db/dialect';
import type { DB, ReviewNoteReplyRow, ReviewNoteRow } from './db/schema';
import { AppError } from './errors';
import { newId } from './secrets';
import type { TeamAccess } from './guard';
import {
	getNoteRow,
	insertMentions,
	insertNote,
	insertReply,
	listMentionRows,
	listNoteRows,
	listReplyRows,
	setNoteResolved
} from './db/notes';
import { getRevisionDoc } from './db/revisions';
import { listMembers, type Member } from './db/memberships';
import { readStoredDoc } from './sheets';
import { loadSheet } from './revisions';
import { mentionMail, replyMail } from './mail-templates';
import {
	notePath,
	notify,
	SETTINGS_PATH,
	type NotifyContext,
	type Recipient
} from './notifications';
import { ROLE_LABEL } from '$lib/roles';
import { mentionedIds } from '$lib/notes/mentions';
import { processText } from '$lib/sheets/format';
import type { Anchor, SheetDoc } from '$lib/sheets/types';
import type { NoteView, ReplyView } from '$lib/review/types';
import { plainText } from '$lib/plain-text';

export type { NoteView, ReplyView };

/*
 * Review notes: threads anchored to a leg, a state or the sheet as a whole, by stable ids (a
 * leg's id; a state by 'start' or the id of the leg that ends there), so they follow the leg
 * through edits and revisions. A note whose leg a later revision removed stays readable, flagged
 * outdated where it is shown against a document that no longer has that leg. Anyone with
 * `note:write` (owners, designers, checkers) writes, replies, resolves and reopens; checkers
 * write notes but cannot edit the path. @mentions of team members and replies are mailed.
 */

export const bodySchema = plainText('The text', 'lines', 'Write the note.')
	.transform((s) => s.replace(/\r\n?/g, '\n').trim())
	.pipe(
		z
			.string()
			.min(1, { error: 'Write the note (it cannot be empty).' })
			.max(4000, { error: 'Use at most 4000 characters for a note.' })
	);

const idText = plainText(
	'The anchor’s id',
	'line',
	'Give the id as a string, e.g. "L4k9xq2" for a leg or "start" for the start state.'
)
	.min(1, { error: 'The id is empty; give a leg id, or "start" for the start state.' })
	.max(40, { error: 'Ids are at most 40 characters.' });
export const anchorSchema = z.discriminatedUnion(
	'kind',
	[
		z.strictObject({ kind: z.literal('sheet') }),
		z.strictObject({ kind: z.literal('leg'), legId: idText }),
		z.strictObject({ kind: z.literal('state'), at: idText })
	],
	{
		error:
			'anchor must be { "kind": "sheet" }, { "kind": "leg", "legId": "…" } or { "kind": "state", "at": "start" | "<leg id>" }.'
	}
);

/** The label an anchor has in a document, or null when the document does not have it. */
export function anchorLabel(doc: SheetDoc, anchor: Anchor): string | null {
	if (anchor.kind === 'sheet') return 'Sheet';
	const legs = doc.spec.legs;
	if (anchor.kind === 'leg') {
		const i = legs.findIndex((l) => l.id === anchor.legId);
		return i < 0 ? null : `L${i + 1}`;
	}
	if (anchor.at === 'start') return 'S1';
	const i = legs.findIndex((l) => l.id === anchor.at);
	return i < 0 ? null : `S${i + 2}`;
}

/** "leg L2 (isochoric)", "state S3", "the sheet as a whole". */
export function anchorText(doc: SheetDoc | null, anchor: Anchor, fallback: string): string {
	if (anchor.kind === 'sheet') return 'the sheet as a whole';
	const label = doc ? (anchorLabel(doc, anchor) ?? fallback) : fallback;
	if (anchor.kind === 'leg') {
		const leg = doc?.spec.legs.find((l) => l.id === anchor.legId);
		return leg ? `leg ${label} (${processText(leg.process, leg.n)})` : `leg ${label}`;
	}
	return `state ${label}`;
}

/** The `revision` query parameter: a number, or the working draft (absent, empty or "draft"). */
export function noteContextOf(url: URL): number | null {
	const r = url.searchParams.get('revision');
	if (r === null || r === '' || r === 'draft') return null;
	if (!/^[1-9]\d{0,8}$/.test(r))
		throw new AppError(
			400,
			'invalid-revision',
			'revision must be a revision number (1, 2, …) or "draft".'
		);
	return Number(r);
}

function anchorOf(row: ReviewNoteRow): Anchor {
	if (row.anchor_kind === 'sheet') return { kind: 'sheet' };
	if (row.anchor_kind === 'leg') return { kind: 'leg', legId: row.anchor_id! };
	return { kind: 'state', at: row.anchor_id! };
}

function parseDoc(text: string): SheetDoc {
	try {
		return readStoredDoc(text, () => {
			throw new Error('not JSON');
		}).doc;
	} catch {
		throw new AppError(
			422,
			'unreadable-draft',
			'The stored sheet cannot be read. Please report it.'
		);
	}
}

/** The document notes are written against or shown against: a revision, or the working draft. */
async function contextDoc(
	db: DB,
	sheet: { id: string; draft: string },
	revision: number | null
): Promise<SheetDoc> {
	if (revision === null) return parseDoc(sheet.draft);
	const text = await getRevisionDoc(db, sheet.id, revision);
	if (text === undefined)
		throw new AppError(404, 'revision-not-found', `This sheet has no Rev ${revision}.`);
	return parseDoc(text);
}

function requireWrite(access: TeamAccess): void {
	if (!access.can('note:write'))
		throw new AppError(
			403,
			'forbidden',
			`Your role in this team is ${ROLE_LABEL[access.role].toLowerCase()}, which cannot write review notes (owners, designers and checkers can).`
		);
}

function noteNotFound(): never {
	throw new AppError(404, 'note-not-found', 'There is no such review note on this sheet.');
}

function view(
	row: ReviewNoteRow,
	replies: ReviewNoteReplyRow[],
	mentions: Array<{ note_id: string; reply_id: string | null; user_id: string }>,
	doc: SheetDoc
): NoteView {
	const anchor = anchorOf(row);
	const label = anchorLabel(doc, anchor);
	return {
		id: row.id,
		anchor,
		writtenAt: row.anchor_label,
		label,
		outdated: label === null,
		revision: row.revision_number,
		body: row.body,
		author: { id: row.author_id, name: row.author_label },
		at: row.created_at,
		mentions: mentions
			.filter((m) => m.note_id === row.id && m.reply_id === null)
			.map((m) => m.user_id),
		resolved:
			row.resolved_at !== null ? { by: row.resolved_by_label ?? '', at: row.resolved_at } : null,
		replies: replies
			.filter((r) => r.note_id === row.id)
			.map((r) => ({
				id: r.id,
				kind: r.kind,
				body: r.body,
				author: { id: r.author_id, name: r.author_label },
				at: r.created_at,
				mentions: mentions.filter((m) => m.reply_id === r.id).map((m) => m.user_id)
			})),
		lastActivityAt: row.last_activity_at
	};
}

/**
 * The sheet's review notes, shown against `context` (a revision number, or null for the working
 * draft): each says whether its anchor still exists there.
 */
export async function listNotes(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	context: number | null = null
): Promise<{ notes: NoteView[]; open: number; outdated: number }> {
	return notesOf(db, await loadSheet(db, access, sheetId), context);
}

/** listNotes for a sheet row already read (and scoped to the caller's team). */
export async function notesOf(
	db: DB,
	sheet: { id: string; draft: string },
	context: number | null = null
): Promise<{ notes: NoteView[]; open: number; outdated: number }> {
	const doc = await contextDoc(db, sheet, context);
	const rows = await listNoteRows(db, sheet.id);
	const ids = rows.map((r) => r.id);
	const [replies, mentions] = await Promise.all([listReplyRows(db, ids), listMentionRows(db, ids)]);
	const notes = rows.map((r) => view(r, replies, mentions, doc));
	return {
		notes,
		open: notes.filter((n) => !n.resolved).length,
		outdated: notes.filter((n) => n.outdated).length
	};
}

export async function getNote(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	noteId: string,
	context: number | null = null
): Promise<NoteView> {
	const sheet = await loadSheet(db, access, sheetId);
	const row = await getNoteRow(db, sheet.id, noteId);
	if (!row) noteNotFound();
	const [replies, mentions] = await Promise.all([
		listReplyRows(db, [row.id]),
		listMentionRows(db, [row.id])
	]);
	return view(row, replies, mentions, await contextDoc(db, sheet, context));
}

export interface NewNoteInput {
	anchor: Anchor;
	body: string;
	/** the revision the author is viewing (null or absent: the working draft) */
	revision?: number | null;
}

function mentionable(members: Member[]) {
	return members.map((m) => ({ id: m.user_id, name: m.name }));
}

function recipient(m: Member): Recipient {
	return { id: m.user_id, name: m.name, email: m.email };
}

/** Writes a new thread; mails the members it mentions. */
export async function createNote(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	input: NewNoteInput,
	ctx?: NotifyContext,
	now = Date.now()
): Promise<NoteView> {
	requireWrite(access);
	const body = bodySchema.safeParse(input.body);
	if (!body.success) throw new AppError(400, 'invalid-body', body.error.issues[0].message, 'body');
	const anchor = anchorSchema.safeParse(input.anchor);
	if (!anchor.success)
		throw new AppError(400, 'invalid-anchor', anchor.error.issues[0].message, 'anchor');
	const sheet = await loadSheet(db, access, sheetId);
	const revision = input.revision ?? null;
	const doc = await contextDoc(db, sheet, revision);
	const label = anchorLabel(doc, anchor.data);
	if (label === null)
		throw new AppError(
			400,
			'unknown-anchor',
			anchor.data.kind === 'leg'
				? `This ${revision ? `revision (Rev ${revision})` : 'sheet'} has no leg with id "${anchor.data.legId}". Anchor the note to one of its legs, states or the sheet.`
				: `This ${revision ? `revision (Rev ${revision})` : 'sheet'} has no state at "${(anchor.data as { at: string }).at}". Use "start" or the id of the leg that ends at the state.`,
			'anchor'
		);
	const members = await listMembers(db, access.team.id);
	const mentioned = mentionedIds(body.data, mentionable(members));
	const author = access.actor;
	const id = newId();
	const row = await transaction(db, async (trx) => {
		const r = await insertNote(
			trx,
			{
				id,
				sheetId: sheet.id,
				teamId: access.team.id,
				anchorKind: anchor.data.kind,
				anchorId:
					anchor.data.kind === 'leg'
						? anchor.data.legId
						: anchor.data.kind === 'state'
							? anchor.data.at
							: null,
				anchorLabel: label,
				revisionNumber: revision,
				draftVersion: revision === null ? sheet.draft_version : null,
				body: body.data,
				author
			},
			now
		);
		await insertMentions(trx, id, null, mentioned, now);
		return r;
	});
	if (ctx) {
		const url = `${ctx.origin}${notePath(access.team.slug, sheet.id, id)}`;
		const where = anchorText(doc, anchor.data, label);
		await notify(
			db,
			ctx,
			'mention',
			members.filter((m) => mentioned.includes(m.user_id)).map(recipient),
			access.actor.id,
			(r) =>
				mentionMail({
					name: r.name,
					authorName: author.label,
					sheetTitle: sheet.title,
					teamName: access.team.name,
					anchorText: where,
					body: body.data,
					url,
					settingsUrl: `${ctx.origin}${SETTINGS_PATH}`
				})
		);
	}
	return view(
		row,
		[],
		mentioned.map((u) => ({ note_id: id, reply_id: null, user_id: u })),
		doc
	);
}

/** Replies in a thread; mails the thread's author (a reply) and anyone mentioned (a mention). */
export async function replyToNote(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	noteId: string,
	input: { body: string },
	ctx?: NotifyContext,
	now = Date.now()
): Promise<NoteView> {
	requireWrite(access);
	const body = bodySchema.safeParse(input.body);
	if (!body.success) throw new AppError(400, 'invalid-body', body.error.issues[0].message, 'body');
	const sheet = await loadSheet(db, access, sheetId);
	const note = await getNoteRow(db, sheet.id, noteId);
	if (!note) noteNotFound();
	const members = await listMembers(db, access.team.id);
	const mentioned = mentionedIds(body.data, mentionable(members));
	const author = access.actor;
	const replyId = newId();
	await transaction(db, async (trx) => {
		await insertReply(
			trx,
			{ id: replyId, noteId: note.id, kind: 'reply', body: body.data, author },
			now
		);
		await insertMentions(trx, note.id, replyId, mentioned, now);
	});
	if (ctx) {
		const doc = parseDoc(sheet.draft);
		const anchor = anchorOf(note);
		const common = {
			authorName: author.label,
			sheetTitle: sheet.title,
			teamName: access.team.name,
			anchorText: anchorText(doc, anchor, note.anchor_label),
			body: body.data,
			url: `${ctx.origin}${notePath(access.team.slug, sheet.id, note.id)}`,
			settingsUrl: `${ctx.origin}${SETTINGS_PATH}`
		};
		const mentionedMembers = members.filter((m) => mentioned.includes(m.user_id));
		await notify(db, ctx, 'mention', mentionedMembers.map(recipient), access.actor.id, (r) =>
			mentionMail({ ...common, name: r.name })
		);
		// the thread's author gets one mail: the mention if they were mentioned, else the reply
		const threadAuthor = members.filter(
			(m) => m.user_id === note.author_id && !mentioned.includes(m.user_id)
		);
		await notify(db, ctx, 'reply', threadAuthor.map(recipient), access.actor.id, (r) =>
			replyMail({ ...common, name: r.name })
		);
	}
	return getNote(db, access, sheetId, noteId);
}

/** Resolves or reopens a thread (a line in the thread records who and when). */
export async function setNoteState(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	noteId: string,
	resolved: boolean,
	now = Date.now()
): Promise<NoteView> {
	requireWrite(access);
	const sheet = await loadSheet(db, access, sheetId);
	const note = await getNoteRow(db, sheet.id, noteId);
	if (!note) noteNotFound();
	const by = access.actor;
	await transaction(db, async (trx) => {
		const changed = await setNoteResolved(trx, note.id, resolved ? by : null, now);
		if (!changed)
			throw new AppError(
				409,
				resolved ? 'already-resolved' : 'already-open',
				resolved ? 'This thread is already resolved.' : 'This thread is already open.'
			);
		await insertReply(
			trx,
			{
				id: newId(),
				noteId: note.id,
				kind: resolved ? 'resolved' : 'reopened',
				body: '',
				author: by
			},
			now
		);
	});
	return getNote(db, access, sheetId, noteId);
}
