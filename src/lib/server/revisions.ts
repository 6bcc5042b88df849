import { z } from 'zod';
import { transaction } from './db/dialect';
import type { DB, SheetRevisionRow, SheetRow, SheetStatusValue } from './db/schema';
import { AppError } from './errors';
import { newId } from './secrets';
import type { TeamAccess } from './guard';
import { getSheet, writeDraft } from './db/sheets';
import {
	getRevision,
	insertRevision,
	latestRevision,
	listRevisionEvents,
	listRevisionRows,
	logRevisionEvent,
	syncSheetStatus,
	updateRevisionStatus,
	type RevisionListRow
} from './db/revisions';
import { listMembers, type Member } from './db/memberships';
import { countOpenNotes } from './db/notes';
import { checkDoc, DraftConflictError, SHEET_ID, type SaveResult } from './sheets';
import { approvedMail, checkedMail, returnedMail, submittedMail } from './mail-templates';
import {
	notify,
	revisionPath,
	sheetPath,
	SETTINGS_PATH,
	type NotifyContext,
	type Recipient
} from './notifications';
import { can, ROLE_LABEL, type Capability } from '$lib/roles';
import { STATUS, STEPS, type SignOffAction } from '$lib/revisions/steps';
import { computePath, ThermoError } from '$lib/thermo';
import type { PathResult } from '$lib/thermo/types';
import { engineSpec, sameDoc } from '$lib/sheets/doc';
import type { SheetDoc } from '$lib/sheets/types';
import { diffRevisions, type RevisionDiff } from '$lib/revisions/diff';
import type { SignOff } from '$lib/revisions/sign-off';
import type { RevisionEvent, RevisionFull, RevisionSummary, Signature } from '$lib/review/types';
import { plainText } from '$lib/plain-text';

export type { RevisionEvent, RevisionFull, RevisionSummary, Signature };

/*
 * Revisions and their sign-off. Saving the working draft creates an immutable revision (Rev 1,
 * 2, …) holding the document, the path computed from it, its author, time and message.
 *
 * Workflow (enforced here; the database locks content and approved rows by trigger; the steps, who
 * takes them and their words are defined once in $lib/revisions/steps):
 *
 *   draft ──submit──▶ in check ──check──▶ checked ──approve──▶ approved (locked)
 *     ▲                  │                   │
 *     └──return/withdraw─┴───────return──────┘
 *
 * - Designers and owners (`sheet:edit`) save revisions, submit them for checking and withdraw
 *   their submission.
 * - Checkers and owners (`sheet:check`) mark a revision in check as checked, or return it with
 *   a note. Nobody checks a revision they saved themselves (the checker must not be the author:
 *   common engineering practice for design calculations).
 * - Owners (`sheet:approve`) approve a checked revision (not one they saved themselves) or
 *   return it. An approved revision is locked; further edits start a new draft based on it.
 * - Only the newest revision moves through the workflow; saving a new one supersedes the others.
 *   While the newest revision is in check, no new revision is saved: the checker is looking at
 *   it. Withdraw it (or have it returned) first.
 * - A save names the revision it was based on (`baseRevision`, null before Rev 1). If someone
 *   saved in between, the save is refused with 409 and the would-be revision (document and
 *   message) comes back in the error, so nothing is lost and it can be compared and merged.
 */

export const messageSchema = plainText(
	'The revision message',
	'lines',
	'Describe what changed in this revision.'
)
	.transform((s) => s.trim())
	.pipe(
		z
			.string()
			.min(1, { error: 'Describe what changed in this revision (a line is enough).' })
			.max(2000, { error: 'Use at most 2000 characters for the revision message.' })
	);

export const noteSchema = plainText('The note', 'lines', 'note must be text.')
	.optional()
	.transform((s) => (s ?? '').trim())
	.pipe(z.string().max(2000, { error: 'Use at most 2000 characters for the note.' }));

export const overrideSchema = z
	.string()
	.optional()
	.transform((s) => (s === undefined ? undefined : s.trim()))
	.pipe(
		z
			.string()
			.min(1, {
				error:
					'Give the reason for signing off over the open review notes (a line is enough), or leave override out and resolve the notes first.'
			})
			.max(2000, { error: 'Use at most 2000 characters for the override reason.' })
			.optional()
	);

/** A check or approval refused because review notes are still open (409 open-notes). */
export class OpenNotesError extends AppError {
	readonly openNotes: number;
	constructor(number: number, action: 'check' | 'approve', openNotes: number) {
		super(
			409,
			'open-notes',
			`${openNotes === 1 ? '1 review note is' : `${openNotes} review notes are`} still open on this sheet, so Rev ${number} is not ${STEPS[action].done} yet. Resolve ${openNotes === 1 ? 'it' : 'them'} first, or ${STEPS[action].doTo(`Rev ${number}`)} over ${openNotes === 1 ? 'it' : 'them'} by giving the reason as override; the reason is recorded in the sign-off log.`
		);
		this.openNotes = openNotes;
	}
}

function sig(id: string | null, label: string | null, at: number | null): Signature | null {
	return label !== null && at !== null ? { id, name: label, at } : null;
}

export function summaryOf(r: RevisionListRow, latestNumber: number): RevisionSummary {
	const submitted = sig(r.submitted_by, r.submitted_by_label, r.submitted_at);
	return {
		number: r.number,
		basedOn: r.based_on,
		title: r.title,
		message: r.message,
		author: { id: r.author_id, name: r.author_label, at: r.created_at },
		status: r.status,
		submitted: submitted ? { ...submitted, checkerId: r.check_requested_from } : null,
		checked: sig(r.checked_by, r.checked_by_label, r.checked_at),
		approved: sig(r.approved_by, r.approved_by_label, r.approved_at),
		returned: sig(r.returned_by, r.returned_by_label, r.returned_at),
		latest: r.number === latestNumber
	};
}

/** Designer, checker and approver with their dates, for the title block. */
export function signOffOf(r: Pick<RevisionSummary, 'author' | 'checked' | 'approved'>): SignOff {
	return {
		designer: { name: r.author.name, at: r.author.at },
		checker: { name: r.checked?.name ?? null, at: r.checked?.at ?? null },
		approver: { name: r.approved?.name ?? null, at: r.approved?.at ?? null }
	};
}

const DOING: Partial<Record<Capability, string>> = {
	'sheet:edit': 'save or submit revisions (designers and owners can)',
	'sheet:check': 'check revisions (checkers and owners can)',
	'sheet:approve': 'approve revisions (owners can)'
};

function requireCap(access: TeamAccess, cap: Capability): void {
	if (!access.can(cap))
		throw new AppError(
			403,
			'forbidden',
			`Your role in this team is ${ROLE_LABEL[access.role].toLowerCase()}, which cannot ${DOING[cap] ?? cap}.`
		);
}

function sheetNotFound(): never {
	throw new AppError(
		404,
		'sheet-not-found',
		'There is no such sheet in this team. It may have been mistyped; the team page lists its sheets.'
	);
}

/** The sheet row of this team (404 otherwise). */
export async function loadSheet(db: DB, access: TeamAccess, sheetId: string): Promise<SheetRow> {
	if (!SHEET_ID.test(sheetId)) sheetNotFound();
	const row = await getSheet(db, access.team.id, sheetId);
	if (!row) sheetNotFound();
	return row;
}

function revisionNotFound(n: number): never {
	throw new AppError(
		404,
		'revision-not-found',
		`This sheet has no Rev ${n}. The history lists its revisions.`
	);
}

function parseJson<T>(text: string, what: string): T {
	try {
		return JSON.parse(text) as T;
	} catch {
		throw new AppError(
			422,
			'unreadable-revision',
			`The stored ${what} cannot be read. Please report it.`
		);
	}
}

/** The path computed from a document; 422 with the engine's reason if it cannot be. */
export function computeDoc(doc: SheetDoc): PathResult {
	try {
		return computePath(engineSpec(doc));
	} catch (e) {
		if (e instanceof ThermoError)
			throw new AppError(
				422,
				'path-not-computable',
				`A revision holds the computed path, and this one cannot be computed: ${e.message}${e.hint ? ` ${e.hint}` : ''}`
			);
		throw e;
	}
}

/** A refused save: someone saved a revision since the one this draft was based on. */
export class RevisionConflictError extends AppError {
	readonly latest: RevisionSummary;
	readonly yours: { doc: SheetDoc; message: string; baseRevision: number | null };
	constructor(
		latest: RevisionSummary,
		yours: { doc: SheetDoc; message: string; baseRevision: number | null }
	) {
		const when = new Date(latest.author.at).toISOString().replace('T', ' ').slice(0, 16);
		super(
			409,
			'revision-conflict',
			`${latest.author.name} saved Rev ${latest.number} (${when} UTC) after ${yours.baseRevision === null ? 'you started' : `Rev ${yours.baseRevision}, which your draft is based on`}. Nothing was saved over it: compare your draft with Rev ${latest.number}, merge by hand, and save again based on Rev ${latest.number}.`
		);
		this.latest = latest;
		this.yours = yours;
	}
}

export interface SaveRevisionInput {
	message: string;
	/** the newest revision when the draft was opened; null before Rev 1 */
	baseRevision: number | null;
	/** the document to freeze; without it, the sheet's stored working draft */
	doc?: unknown;
	/** with the stored draft: the draft version the client saw (409 if it moved) */
	draftVersion?: number;
}

/** Saves a new revision. */
export async function saveRevision(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	input: SaveRevisionInput,
	now = Date.now()
): Promise<RevisionFull> {
	requireCap(access, 'sheet:edit');
	const message = messageSchema.safeParse(input.message);
	if (!message.success)
		throw new AppError(400, 'invalid-message', message.error.issues[0].message, 'message');
	if (
		input.baseRevision !== null &&
		!(Number.isInteger(input.baseRevision) && input.baseRevision >= 1)
	)
		throw new AppError(
			400,
			'invalid-base',
			'baseRevision must be the number of the revision the draft started from, or null before Rev 1.',
			'baseRevision'
		);
	const sheet = await loadSheet(db, access, sheetId);
	let doc: SheetDoc;
	if (input.doc !== undefined) doc = checkDoc(input.doc, 'sent').doc;
	else {
		if (input.draftVersion !== undefined && input.draftVersion !== sheet.draft_version)
			throw new DraftConflictError(sheet);
		doc = checkDoc(parseJson(sheet.draft, 'draft')).doc;
	}
	const result = computeDoc(doc);
	const author = access.actor;

	return transaction(db, async (trx) => {
		const latest = await latestRevision(trx, sheet.id);
		const latestNumber = latest?.number ?? null;
		if (latestNumber !== input.baseRevision) {
			if (!latest)
				throw new AppError(
					409,
					'revision-conflict',
					`This sheet has no revisions yet, so the draft cannot be based on Rev ${input.baseRevision}. Save again with baseRevision null.`
				);
			throw new RevisionConflictError(summaryOf(latest, latest.number), {
				doc,
				message: message.data,
				baseRevision: input.baseRevision
			});
		}
		if (latest?.status === 'in-check')
			throw new AppError(
				409,
				'in-check',
				`Rev ${latest.number} is in check: no new revision is saved while a checker is looking at it. Withdraw it from checking (or ask the checker to return it), then save.`
			);
		if (latest) {
			const prev = await getRevision(trx, sheet.id, latest.number);
			if (prev && sameDoc(checkDoc(parseJson(prev.doc, 'revision')).doc, doc))
				throw new AppError(
					422,
					'unchanged',
					`The draft is the same as Rev ${latest.number}; there is nothing new to save. Edit the sheet first.`
				);
		}
		const number = (latestNumber ?? 0) + 1;
		const id = newId();
		await insertRevision(
			trx,
			{
				id,
				sheetId: sheet.id,
				teamId: access.team.id,
				number,
				basedOn: latestNumber,
				title: sheet.title,
				doc: JSON.stringify(doc),
				result: JSON.stringify(result),
				message: message.data,
				author
			},
			now
		);
		await logRevisionEvent(
			trx,
			{ revisionId: id, sheetId: sheet.id, kind: 'saved', actor: author, note: message.data },
			now
		);
		await syncSheetStatus(trx, sheet.id);
		const row = (await latestRevision(trx, sheet.id))!;
		return { ...summaryOf(row, number), doc, result };
	});
}

export async function listRevisions(
	db: DB,
	access: TeamAccess,
	sheetId: string
): Promise<{ revisions: RevisionSummary[]; events: RevisionEvent[] }> {
	return revisionsOf(db, await loadSheet(db, access, sheetId));
}

/** listRevisions for a sheet row already read (and scoped to the caller's team); `rows` if already listed. */
export async function revisionsOf(
	db: DB,
	sheet: { id: string },
	rows?: RevisionListRow[]
): Promise<{ revisions: RevisionSummary[]; events: RevisionEvent[] }> {
	rows ??= await listRevisionRows(db, sheet.id);
	const latest = rows[0]?.number ?? 0;
	const events = await listRevisionEvents(db, sheet.id);
	return {
		revisions: rows.map((r) => summaryOf(r, latest)),
		events: events.map((e) => ({
			number: e.number,
			kind: e.kind,
			actor: e.actor_label,
			note: e.note,
			override:
				e.override_reason !== null
					? { reason: e.override_reason, openNotes: e.open_notes ?? 0 }
					: null,
			at: e.created_at
		}))
	};
}

export function parseRevisionNumber(text: string): number {
	const n = Number(text);
	if (!/^[1-9]\d{0,8}$/.test(text) || !Number.isSafeInteger(n))
		throw new AppError(
			404,
			'revision-not-found',
			`"${text}" is not a revision number; revisions are numbered 1, 2, 3 …`
		);
	return n;
}

export async function readRevision(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	number: number
): Promise<RevisionFull> {
	const sheet = await loadSheet(db, access, sheetId);
	const row = await getRevision(db, sheet.id, number);
	if (!row) revisionNotFound(number);
	const latest = (await latestRevision(db, sheet.id))!.number;
	return fullOf(row, latest);
}

function fullOf(row: SheetRevisionRow, latest: number): RevisionFull {
	const doc = checkDoc(parseJson(row.doc, 'revision')).doc;
	return { ...summaryOf(row, latest), doc, result: parseJson<PathResult>(row.result, 'result') };
}

// ---- workflow ---------------------------------------------------------------------------------

type Action = SignOffAction;

/** A status in a refusal: "Rev 2 is in check, so …". */
const statusPhrase = (s: SheetStatusValue): string => STATUS[s].phrase;

export interface WorkflowInput {
	/** a note with the step (required to return a revision) */
	note?: string;
	/**
	 * check and approve only: the reason for signing off while review notes are still open. Without
	 * it such a step is refused (409 open-notes); with it the step goes ahead and the reason and the
	 * number of open notes are recorded in the sign-off log.
	 */
	override?: string;
	/** submit only: the member asked to check (default: every checker of the team) */
	checkerId?: string | null;
}

/** Moves the newest revision one step through sign-off, then mails the people concerned. */
export async function moveRevision(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	number: number,
	action: Action,
	input: WorkflowInput = {},
	ctx?: NotifyContext,
	now = Date.now()
): Promise<RevisionSummary> {
	const step = STEPS[action];
	requireCap(access, step.cap);
	const note = noteSchema.safeParse(input.note);
	if (!note.success) throw new AppError(400, 'invalid-note', note.error.issues[0].message, 'note');
	if (action === 'return' && !note.data)
		throw new AppError(
			400,
			'invalid-note',
			'Say why the revision goes back: the designer reads this note.',
			'note'
		);
	const override = overrideSchema.safeParse(input.override);
	if (!override.success)
		throw new AppError(400, 'invalid-override', override.error.issues[0].message, 'override');
	if (override.data !== undefined && action !== 'check' && action !== 'approve')
		throw new AppError(
			400,
			'invalid-override',
			'override applies only to check and approve (signing off over open review notes); leave it out for this step.',
			'override'
		);
	const sheet = await loadSheet(db, access, sheetId);
	const members = await listMembers(db, access.team.id);
	const by = access.actor;

	let overridden: { reason: string; openNotes: number } | null = null;
	const updated = await transaction(db, async (trx) => {
		const row = await getRevision(trx, sheet.id, number);
		if (!row) revisionNotFound(number);
		const latest = (await latestRevision(trx, sheet.id))!;
		if (latest.number !== number)
			throw new AppError(
				409,
				'not-latest',
				`Rev ${number} has been superseded by Rev ${latest.number}; only the newest revision moves through sign-off.`
			);
		if (!step.from.includes(row.status))
			throw new AppError(
				409,
				'wrong-status',
				`Rev ${number} is ${statusPhrase(row.status)}, so it cannot be ${step.done}: only a revision that is ${step.from.map(statusPhrase).join(' or ')} can.`
			);
		if (action === 'return' && row.status === 'checked') requireCap(access, 'sheet:approve');
		const isAuthor = access.actor.id !== null && access.actor.id === row.author_id;
		if (action === 'check' && isAuthor)
			throw new AppError(
				403,
				'self-check',
				`You saved Rev ${number}, so you cannot check it: a revision is checked by someone other than its designer.`
			);
		if (action === 'approve' && isAuthor)
			throw new AppError(
				403,
				'self-approve',
				`You saved Rev ${number}, so you cannot approve it: a revision is approved by someone other than its designer.`
			);
		if (action === 'return' && isAuthor)
			throw new AppError(
				403,
				'self-return',
				`You saved Rev ${number}; withdraw it from checking instead of returning it.`
			);

		// document control: no sign-off over open review notes without a recorded reason
		if (action === 'check' || action === 'approve') {
			const open = await countOpenNotes(trx, sheet.id);
			if (open > 0 && override.data === undefined) throw new OpenNotesError(number, action, open);
			if (open > 0) overridden = { reason: override.data!, openNotes: open };
		}

		let checkerId: string | null = null;
		if (action === 'submit' && input.checkerId) {
			const m = members.find((x) => x.user_id === input.checkerId);
			if (!m || !can(m.role, 'sheet:check'))
				throw new AppError(
					400,
					'invalid-checker',
					'Ask a member of this team who can check revisions (a checker or an owner).',
					'checkerId'
				);
			if (m.user_id === row.author_id)
				throw new AppError(
					400,
					'invalid-checker',
					`${m.name} saved Rev ${number}; ask someone else to check it.`,
					'checkerId'
				);
			checkerId = m.user_id;
		}

		const patch =
			action === 'submit'
				? {
						status: step.to,
						submitted_by: by.id,
						submitted_by_label: by.label,
						submitted_at: now,
						check_requested_from: checkerId,
						checked_by: null,
						checked_by_label: null,
						checked_at: null,
						returned_by: null,
						returned_by_label: null,
						returned_at: null
					}
				: action === 'check'
					? { status: step.to, checked_by: by.id, checked_by_label: by.label, checked_at: now }
					: action === 'approve'
						? { status: step.to, approved_by: by.id, approved_by_label: by.label, approved_at: now }
						: {
								status: step.to,
								returned_by: by.id,
								returned_by_label: by.label,
								returned_at: now,
								checked_by: null,
								checked_by_label: null,
								checked_at: null
							};
		if (!(await updateRevisionStatus(trx, row.id, row.status, patch)))
			throw new AppError(
				409,
				'wrong-status',
				`Rev ${number} changed while you were looking at it. Reload to see its status.`
			);
		const eventNote =
			action === 'withdraw'
				? `Withdrawn from checking${note.data ? `: ${note.data}` : ''}`
				: note.data || null;
		await logRevisionEvent(
			trx,
			{
				revisionId: row.id,
				sheetId: sheet.id,
				kind: step.event,
				actor: by,
				note: eventNote,
				override: overridden
			},
			now
		);
		await syncSheetStatus(trx, sheet.id);
		return (await getRevision(trx, sheet.id, number))!;
	});

	await mailFor(db, ctx, access, by.label, sheet, updated, action, note.data, members, overridden);
	return summaryOf(updated, number);
}

function recipient(m: Member): Recipient {
	return { id: m.user_id, name: m.name, email: m.email };
}

async function mailFor(
	db: DB,
	ctx: NotifyContext | undefined,
	access: TeamAccess,
	actorName: string,
	sheet: SheetRow,
	rev: SheetRevisionRow,
	action: Action,
	note: string,
	members: Member[],
	override: { reason: string; openNotes: number } | null
): Promise<void> {
	if (!ctx || action === 'withdraw') return;
	const base = {
		actorName,
		sheetTitle: sheet.title,
		teamName: access.team.name,
		revision: rev.number,
		settingsUrl: `${ctx.origin}${SETTINGS_PATH}`
	};
	const actorId = access.actor.id;
	if (action === 'submit') {
		let to = rev.check_requested_from
			? members.filter((m) => m.user_id === rev.check_requested_from)
			: members.filter((m) => m.role === 'checker');
		if (to.length === 0) to = members.filter((m) => m.role === 'owner');
		to = to.filter((m) => m.user_id !== rev.author_id);
		const url = `${ctx.origin}${revisionPath(access.team.slug, sheet.id, rev.number)}`;
		await notify(db, ctx, 'submitted', to.map(recipient), actorId, (r) =>
			submittedMail({ ...base, name: r.name, text: rev.message, url })
		);
		return;
	}
	const concerned = members
		.filter((m) => m.user_id === rev.author_id || m.user_id === rev.submitted_by)
		.map(recipient);
	if (action === 'check') {
		const url = `${ctx.origin}${revisionPath(access.team.slug, sheet.id, rev.number)}`;
		await notify(db, ctx, 'checked', concerned, actorId, (r) =>
			checkedMail({ ...base, name: r.name, text: note, url, override })
		);
	} else if (action === 'approve') {
		const url = `${ctx.origin}${revisionPath(access.team.slug, sheet.id, rev.number)}`;
		await notify(db, ctx, 'approved', concerned, actorId, (r) =>
			approvedMail({ ...base, name: r.name, text: note, url, override })
		);
	} else if (action === 'return') {
		const url = `${ctx.origin}${sheetPath(access.team.slug, sheet.id)}`;
		await notify(db, ctx, 'returned', concerned, actorId, (r) =>
			returnedMail({ ...base, name: r.name, text: note, url })
		);
	}
}

/**
 * Makes a revision's document the working draft again. `version` is the draft version the
 * editor holds (409 if the draft moved on). The next save is based on the newest revision, as
 * any save is; restoring changes no revision.
 */
export async function restoreRevision(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	number: number,
	version: number,
	now = Date.now()
): Promise<SaveResult & { doc: SheetDoc }> {
	requireCap(access, 'sheet:edit');
	if (!Number.isInteger(version) || version < 1)
		throw new AppError(
			400,
			'invalid-version',
			'version must be the whole number the sheet was read with (1 or more).',
			'version'
		);
	const sheet = await loadSheet(db, access, sheetId);
	const by = access.actor;
	return transaction(db, async (trx) => {
		const row = await getRevision(trx, sheet.id, number);
		if (!row) revisionNotFound(number);
		const doc = checkDoc(parseJson(row.doc, 'revision')).doc;
		const fresh = (await getSheet(trx, access.team.id, sheet.id))!;
		if (fresh.draft_version !== version) throw new DraftConflictError(fresh);
		const next = await writeDraft(
			trx,
			access.team.id,
			sheet.id,
			{
				draft: JSON.stringify(doc),
				fluid: doc.spec.fluid,
				systemKind: doc.spec.system.kind,
				baseVersion: version,
				actor: access.actor
			},
			now
		);
		if (next === null)
			throw new DraftConflictError((await getSheet(trx, access.team.id, sheet.id))!);
		await logRevisionEvent(
			trx,
			{
				revisionId: row.id,
				sheetId: sheet.id,
				kind: 'restored',
				actor: by,
				note: `Rev ${number} restored as the working draft`
			},
			now
		);
		return { version: next, updatedAt: now, updatedBy: access.actor.label, doc };
	});
}

/** One side of a comparison: a revision number, or the working draft. */
export type CompareSide = number | 'draft';

async function sideOf(
	db: DB,
	sheet: SheetRow,
	side: CompareSide
): Promise<{ label: string; doc: SheetDoc; result: PathResult | null }> {
	if (side === 'draft') {
		const doc = checkDoc(parseJson(sheet.draft, 'draft')).doc;
		let result: PathResult | null = null;
		try {
			result = computePath(engineSpec(doc));
		} catch (e) {
			if (!(e instanceof ThermoError)) throw e;
		}
		return { label: 'Working draft', doc, result };
	}
	const row = await getRevision(db, sheet.id, side);
	if (!row) revisionNotFound(side);
	return {
		label: `Rev ${side}`,
		doc: checkDoc(parseJson(row.doc, 'revision')).doc,
		result: parseJson<PathResult>(row.result, 'result')
	};
}

export function parseCompareSide(text: string | null, name: string): CompareSide {
	if (text === 'draft') return 'draft';
	if (text && /^[1-9]\d{0,8}$/.test(text)) return Number(text);
	throw new AppError(
		400,
		'invalid-compare',
		`${name} must be a revision number (1, 2, …) or "draft".`,
		name
	);
}

/** What changed from `a` to `b` (each a revision number or the working draft), with both paths. */
export async function compareRevisions(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	a: CompareSide,
	b: CompareSide
): Promise<{
	diff: RevisionDiff;
	before: { label: string; doc: SheetDoc; result: PathResult | null };
	after: { label: string; doc: SheetDoc; result: PathResult | null };
}> {
	const sheet = await loadSheet(db, access, sheetId);
	const before = await sideOf(db, sheet, a);
	const after = await sideOf(db, sheet, b);
	return { diff: diffRevisions(before, after), before, after };
}
