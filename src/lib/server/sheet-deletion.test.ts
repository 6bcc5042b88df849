import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { expectAppError } from './testing';
import { reviewWorld, type ReviewWorld } from './revisions.test-support';
import { deleteTeamSheet, readSheet } from './sheets';
import { moveRevision, saveRevision } from './revisions';
import { createNote, replyToNote } from './notes';
import { uploadTrace } from './traces';
import { listTeamEvents } from './db/team-events';

let w: ReviewWorld;
beforeEach(async () => {
	w = await reviewWorld();
});
afterEach(async () => {
	await w.env.close();
});
const db = () => w.env.db;

async function count(
	table:
		| 'sheet_revisions'
		| 'sheet_revision_events'
		| 'review_notes'
		| 'review_note_replies'
		| 'sheet_traces',
	sheetId?: string
): Promise<number> {
	let q = db()
		.selectFrom(table)
		.select((eb) => eb.fn.countAll<number>().as('n'));
	if (sheetId && table !== 'review_note_replies') q = q.where('sheet_id', '=', sheetId);
	return Number((await q.executeTakeFirstOrThrow()).n);
}

describe('deleting a sheet', () => {
	it('a designer deletes a scratch sheet they started; the activity log says so', async () => {
		const id = await w.newSheet();
		await deleteTeamSheet(db(), await w.access(w.people.designer), id);
		await expectAppError(
			readSheet(db(), await w.access(w.people.owner), id),
			404,
			'sheet-not-found'
		);
		const events = await listTeamEvents(db(), w.team.id);
		expect(events.find((e) => e.kind === 'sheet.deleted')).toMatchObject({
			actor_label: 'Arlo Brandt'
		});
	});

	it('designers do not delete other people’s sheets or sheets with revisions; checkers and viewers never; nothing is removed when refused', async () => {
		const other = await w.newSheet(undefined, w.people.designer2);
		await expectAppError(
			deleteTeamSheet(db(), await w.access(w.people.designer), other),
			403,
			'forbidden'
		);
		const own = await w.newSheet();
		await saveRevision(db(), await w.access(w.people.designer), own, {
			message: 'First issue',
			baseRevision: null
		});
		const e = await expectAppError(
			deleteTeamSheet(db(), await w.access(w.people.designer), own),
			403,
			'forbidden'
		);
		expect(e.message).toMatch(/only an owner/);
		for (const who of [w.people.checker, w.people.viewer])
			await expectAppError(deleteTeamSheet(db(), await w.access(who), own), 403, 'forbidden');
		expect(await count('sheet_revisions', own)).toBe(1);
		await expectAppError(
			deleteTeamSheet(db(), await w.access(w.people.owner), 'not-a-sheet-id!'),
			404,
			'sheet-not-found'
		);
	});

	it('an owner deletes a sheet with revisions, notes, replies and traces: all of it goes', async () => {
		const id = await w.newSheet();
		const designer = await w.access(w.people.designer);
		await saveRevision(db(), designer, id, { message: 'First issue', baseRevision: null });
		await moveRevision(db(), designer, id, 1, 'submit');
		const note = await createNote(db(), await w.access(w.people.checker), id, {
			anchor: { kind: 'sheet' },
			body: 'Which code governs this vessel?'
		});
		await replyToNote(db(), designer, id, note.id, { body: 'EN 13445.' });
		await uploadTrace(db(), designer, id, {
			bytes: new TextEncoder().encode('time [s],P [kPa a],T [°C]\n0,150,20\n60,160,40\n'),
			filename: 'log.csv'
		});
		const replies = await count('review_note_replies');
		expect(replies).toBe(1);
		await deleteTeamSheet(db(), await w.access(w.people.owner), id);
		for (const t of [
			'sheet_revisions',
			'sheet_revision_events',
			'review_notes',
			'sheet_traces'
		] as const)
			expect(await count(t, id)).toBe(0);
		expect(await count('review_note_replies')).toBe(0);
		const events = await listTeamEvents(db(), w.team.id);
		expect(events.find((e) => e.kind === 'sheet.deleted')?.detail).toMatchObject({ revisions: 1 });
	});

	it('a sheet with an approved revision is kept as the design record (409), even for owners', async () => {
		const id = await w.newSheet();
		const designer = await w.access(w.people.designer);
		await saveRevision(db(), designer, id, { message: 'First issue', baseRevision: null });
		await moveRevision(db(), designer, id, 1, 'submit');
		await moveRevision(db(), await w.access(w.people.checker), id, 1, 'check');
		await moveRevision(db(), await w.access(w.people.owner), id, 1, 'approve');
		const e = await expectAppError(
			deleteTeamSheet(db(), await w.access(w.people.owner), id),
			409,
			'approved-record'
		);
		expect(e.message).toMatch(/Rev 1 of this sheet is approved/);
		expect(await count('sheet_revisions', id)).toBe(1);
	});
});
