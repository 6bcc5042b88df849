import { createHash } from 'node:crypto';
import { z } from 'zod';
import { transaction } from './db/dialect';
import type { DB, SheetRow } from './db/schema';
import {
	getSheet,
	insertSheet,
	listSheets,
	renameSheet,
	writeDraft,
	countSheets,
	deleteSheetRow,
	type SheetListItem
} from './db/sheets';
import { listRevisionRows } from './db/revisions';
import { logTeamEvent } from './db/team-events';
import { AppError } from './errors';
import { newId } from './secrets';
import type { TeamAccess } from './guard';
import { fixState, ThermoError } from '$lib/thermo';
import { startOptions } from '$lib/sheets/choice';
import { parseSheetDoc } from '$lib/sheets/schema';
import { workedExample } from '$lib/sheets/templates';
import type { SheetDoc, SheetStatus } from '$lib/sheets/types';
import { controlCharProblem, plainText } from '$lib/plain-text';

/*
 * Sheets: create (blank, from a worked example, or from a document a script sends), read, list
 * and search, rename, and save the working draft with optimistic concurrency. Every function
 * takes the caller's TeamAccess (from requireTeam) and scopes every id by its team. Writes need
 * `sheet:edit`; reads `read`. Errors are AppErrors (4xx with a message saying what to do).
 */

/** A sheet id as it appears in URLs: 16 symbols of the id alphabet. */
export const SHEET_ID = /^[a-z2-9]{16}$/;

export const titleSchema = plainText('The title', 'line', 'Enter a title for the sheet.')
	.transform((s) => s.replace(/\s+/g, ' ').trim())
	.pipe(
		z
			.string()
			.min(1, { error: 'Enter a title for the sheet.' })
			.max(120, { error: 'Use at most 120 characters for the title.' })
	);

export interface SheetMeta {
	id: string;
	number: number;
	title: string;
	fluid: string;
	systemKind: 'closed' | 'flow';
	status: SheetStatus;
	example: string | null;
	/** the draft's version: send it back with the next save */
	version: number;
	createdBy: string;
	createdAt: number;
	updatedBy: string;
	updatedAt: number;
}

export interface SheetWithDraft extends SheetMeta {
	doc: SheetDoc;
	/** set when the stored draft was in an older shape and has been brought forward on reading */
	migratedFrom: number | null;
}

export interface SheetSummary extends SheetMeta {
	tag: string;
	equipment: string;
	project: string;
	legCount: number;
}

function meta(row: SheetRow | SheetListItem): SheetMeta {
	return {
		id: row.id,
		number: row.number,
		title: row.title,
		fluid: row.fluid,
		systemKind: row.system_kind,
		status: row.status,
		example: row.example ?? null,
		version: row.draft_version,
		createdBy: row.created_by_label,
		createdAt: row.created_at,
		updatedBy: row.updated_by_label,
		updatedAt: row.updated_at
	};
}

export function summaryOf(row: SheetListItem): SheetSummary {
	return {
		...meta(row),
		tag: row.tag,
		equipment: row.equipment,
		project: row.project,
		legCount: Number(row.leg_count)
	};
}

function requireEdit(access: TeamAccess): void {
	if (!access.can('sheet:edit'))
		throw new AppError(
			403,
			'forbidden',
			`Your role in this team is ${access.role}, which cannot edit sheets (designers and owners can).`
		);
}

function notFound(): never {
	throw new AppError(
		404,
		'sheet-not-found',
		'There is no such sheet in this team. It may have been mistyped; the team page lists its sheets.'
	);
}

/**
 * The document checked and, if older, migrated; a 400 naming the first problem otherwise. `sent`
 * for a document a client sends (control characters refused); stored documents are read as they
 * were written (older text cleaned, see parseSheetDoc).
 */
export function checkDoc(
	raw: unknown,
	from: 'stored' | 'sent' = 'stored'
): { doc: SheetDoc; migratedFrom: number | null } {
	const r = parseSheetDoc(raw, { stored: from === 'stored' });
	if (!r.ok) throw new AppError(400, 'invalid-sheet', r.message, 'doc');
	return { doc: r.doc, migratedFrom: r.migratedFrom };
}

/** A stored document as read: checked (and migrated), with a key taken from its text. */
export interface StoredDoc {
	doc: SheetDoc;
	migratedFrom: number | null;
	/** 16 characters of the SHA-256 of the stored text: the same text, the same key */
	key: string;
}

/** Stored documents read lately, by their text (most recently used last). */
const storedDocs = new Map<string, StoredDoc>();
export const STORED_DOCS_KEPT = 500;

/**
 * A stored document (a draft or a revision's) from its JSON text, checked once per text: the
 * same text always gives the same document, so a page viewed again skips the JSON parse and
 * the schema check. Each caller gets its own copy (callers may change theirs). Throws
 * `unreadable` (a 422) when the text is not JSON; a 400 `invalid-sheet` like checkDoc.
 */
export function readStoredDoc(text: string, unreadable: () => never): StoredDoc {
	let kept = storedDocs.get(text);
	if (kept) storedDocs.delete(text);
	else {
		let raw: unknown;
		try {
			raw = JSON.parse(text);
		} catch {
			unreadable();
		}
		const { doc, migratedFrom } = checkDoc(raw);
		const key = createHash('sha256').update(text).digest('base64url').slice(0, 16);
		kept = { doc, migratedFrom, key };
		if (storedDocs.size >= STORED_DOCS_KEPT)
			storedDocs.delete(storedDocs.keys().next().value as string);
	}
	storedDocs.set(text, kept);
	return { ...kept, doc: structuredClone(kept.doc) };
}

/** The start state must exist, or the sheet could not even be opened: 422 with the engine's reason. */
export function checkStart(doc: SheetDoc): void {
	try {
		fixState(doc.spec.fluid, doc.spec.start, startOptions(doc.spec));
	} catch (e) {
		if (e instanceof ThermoError)
			throw new AppError(
				422,
				e.code,
				`The start state cannot be fixed: ${e.message}${e.hint ? ` ${e.hint}` : ''}`,
				'start'
			);
		throw e;
	}
}

/**
 * Whether the working draft of a sheet in this status may be saved. Every status may for now
 * (the sign-off workflow that locks approved revisions decides this later).
 */
export function assertDraftEditable(row: SheetRow): void {
	void row;
}

export interface CreateInput {
	title: string;
	/** a sheet document (any supported version) or a bare PathSpec */
	doc: unknown;
	example?: string | null;
}

/** Create a sheet from a document: validated, the start state checked, in one transaction. */
export async function createSheet(
	db: DB,
	access: TeamAccess,
	input: CreateInput,
	now = Date.now()
): Promise<SheetWithDraft> {
	requireEdit(access);
	const t = titleSchema.safeParse(input.title);
	if (!t.success) throw new AppError(400, 'invalid-title', t.error.issues[0].message, 'title');
	const { doc } = checkDoc(input.doc, 'sent');
	checkStart(doc);
	const row = await transaction(db, (trx) =>
		insertSheet(
			trx,
			{
				id: newId(),
				teamId: access.team.id,
				title: t.data,
				fluid: doc.spec.fluid,
				systemKind: doc.spec.system.kind,
				example: input.example ?? null,
				draft: JSON.stringify(doc),
				actor: access.actor
			},
			now
		)
	);
	return { ...meta(row), doc, migratedFrom: null };
}

/** Create a sheet from one of the worked examples (templates.ts). */
export async function createFromExample(
	db: DB,
	access: TeamAccess,
	exampleId: string,
	title?: string,
	now = Date.now()
): Promise<SheetWithDraft> {
	const ex = workedExample(exampleId);
	if (!ex)
		throw new AppError(
			400,
			'unknown-example',
			'There is no such worked example; pick one from the list.',
			'example'
		);
	return createSheet(
		db,
		access,
		{ title: title?.trim() ? title : ex.title, doc: ex.build(), example: ex.id },
		now
	);
}

function unreadableDraft(): never {
	throw new AppError(
		422,
		'unreadable-draft',
		'The stored draft of this sheet cannot be read. Please report it.'
	);
}

/** A sheet with its working draft (older drafts migrated on the way out). */
export async function readSheet(db: DB, access: TeamAccess, id: string): Promise<SheetWithDraft> {
	return (await readSheetDraft(db, access, id)).sheet;
}

/** readSheet, with the key of the stored draft's text (the sheet page caches by it) and its row. */
export async function readSheetDraft(
	db: DB,
	access: TeamAccess,
	id: string
): Promise<{ sheet: SheetWithDraft; draftKey: string; row: SheetRow }> {
	if (!SHEET_ID.test(id)) notFound();
	const row = await getSheet(db, access.team.id, id);
	if (!row) notFound();
	const { doc, migratedFrom, key } = readStoredDoc(row.draft, unreadableDraft);
	return { sheet: { ...meta(row), doc, migratedFrom }, draftKey: key, row };
}

export async function listTeamSheets(
	db: DB,
	access: TeamAccess,
	options: { q?: string; limit?: number; offset?: number } = {}
): Promise<{ sheets: SheetSummary[]; total: number }> {
	const q = (options.q ?? '').slice(0, 200);
	const problem = controlCharProblem(q, 'The search text (q)');
	if (problem) throw new AppError(400, 'invalid-query', problem, 'q');
	const [rows, total] = await Promise.all([
		listSheets(db, access.team.id, { ...options, q }),
		countSheets(db, access.team.id, q)
	]);
	return { sheets: rows.map(summaryOf), total };
}

export async function renameTeamSheet(
	db: DB,
	access: TeamAccess,
	id: string,
	title: string,
	now = Date.now()
): Promise<SheetMeta> {
	requireEdit(access);
	const t = titleSchema.safeParse(title);
	if (!t.success) throw new AppError(400, 'invalid-title', t.error.issues[0].message, 'title');
	if (!SHEET_ID.test(id)) notFound();
	return transaction(db, async (trx) => {
		if (!(await renameSheet(trx, access.team.id, id, t.data, access.actor, now))) notFound();
		return meta((await getSheet(trx, access.team.id, id))!);
	});
}

/**
 * Who may delete a sheet, and why not. An approved revision is a design record and is kept: a
 * sheet holding one is never deleted (it can be superseded by a new revision). Otherwise owners may
 * delete any sheet, and designers a sheet they started that has no revisions yet (a scratch sheet).
 */
export function deletion(
	access: TeamAccess,
	sheet: { created_by: string | null },
	revisions: ReadonlyArray<{ number: number; status: string }>
): { allowed: true } | { allowed: false; status: 403 | 409; code: string; message: string } {
	if (!access.can('sheet:edit'))
		return {
			allowed: false,
			status: 403,
			code: 'forbidden',
			message: `Your role in this team is ${access.role}, which cannot delete sheets.`
		};
	const approved = revisions.filter((r) => r.status === 'approved').map((r) => r.number);
	if (approved.length)
		return {
			allowed: false,
			status: 409,
			code: 'approved-record',
			message: `Rev ${approved.join(', Rev ')} of this sheet ${approved.length === 1 ? 'is' : 'are'} approved. Approved revisions are kept as the design record, so the sheet cannot be deleted; save a new revision to supersede it.`
		};
	if (access.role === 'owner') return { allowed: true };
	if (sheet.created_by !== access.actor.id)
		return {
			allowed: false,
			status: 403,
			code: 'forbidden',
			message: 'Designers delete only sheets they started; ask an owner to delete this one.'
		};
	if (revisions.length)
		return {
			allowed: false,
			status: 403,
			code: 'forbidden',
			message: 'This sheet has revisions, so only an owner can delete it.'
		};
	return { allowed: true };
}

/** The sheet, its revisions and the deletion verdict for this caller (404 for no such sheet). */
async function judgeDeletion(db: DB, access: TeamAccess, id: string) {
	const row = SHEET_ID.test(id) ? await getSheet(db, access.team.id, id) : undefined;
	if (!row) notFound();
	const revisions = await listRevisionRows(db, row.id);
	return { row, revisions, verdict: deletion(access, row, revisions) };
}

/** Deletes a sheet with its draft, revisions, notes and traces (rules in `deletion`), logged in the team's activity. */
export async function deleteTeamSheet(db: DB, access: TeamAccess, id: string): Promise<void> {
	requireEdit(access);
	await transaction(db, async (trx) => {
		const { row, revisions, verdict } = await judgeDeletion(trx, access, id);
		if (!verdict.allowed) throw new AppError(verdict.status, verdict.code, verdict.message);
		if (!(await deleteSheetRow(trx, access.team.id, id))) notFound();
		await logTeamEvent(trx, {
			teamId: access.team.id,
			actorId: access.actor.id,
			actorLabel: access.actor.label,
			kind: 'sheet.deleted',
			detail: { number: row.number, title: row.title, revisions: revisions.length }
		});
	});
}

/** A refused save: someone saved the draft since the version this editor started from. */
export class DraftConflictError extends AppError {
	readonly current: { version: number; updatedAt: number; updatedBy: string };
	constructor(row: SheetRow) {
		super(
			409,
			'draft-conflict',
			`${row.updated_by_label} saved this sheet since you opened it (now version ${row.draft_version}). Your edits were not saved over theirs: reload to see their draft, or compare and keep yours.`
		);
		this.current = {
			version: row.draft_version,
			updatedAt: row.updated_at,
			updatedBy: row.updated_by_label
		};
	}
}

export interface SaveResult {
	version: number;
	updatedAt: number;
	updatedBy: string;
}

/**
 * Save the working draft. `version` is the version the editor started from: if the stored draft
 * moved on since, nothing is written and a DraftConflictError (409) says who saved when.
 */
export async function saveDraft(
	db: DB,
	access: TeamAccess,
	id: string,
	input: { version: number; doc: unknown },
	now = Date.now()
): Promise<SaveResult> {
	requireEdit(access);
	if (!SHEET_ID.test(id)) notFound();
	if (!Number.isInteger(input.version) || input.version < 1)
		throw new AppError(
			400,
			'invalid-version',
			'version must be the whole number the sheet was read with (1 or more).',
			'version'
		);
	const { doc } = checkDoc(input.doc, 'sent');
	return transaction(db, async (trx) => {
		const row = await getSheet(trx, access.team.id, id);
		if (!row) notFound();
		assertDraftEditable(row);
		if (row.draft_version !== input.version) throw new DraftConflictError(row);
		const version = await writeDraft(
			trx,
			access.team.id,
			id,
			{
				draft: JSON.stringify(doc),
				fluid: doc.spec.fluid,
				systemKind: doc.spec.system.kind,
				baseVersion: input.version,
				actor: access.actor
			},
			now
		);
		if (version === null) throw new DraftConflictError((await getSheet(trx, access.team.id, id))!);
		return { version, updatedAt: now, updatedBy: access.actor.label };
	});
}
