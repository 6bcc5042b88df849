import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { sql } from 'kysely';
import { reviewWorld, type ReviewWorld } from './revisions.test-support';
import { expectAppError } from './testing';
import { createSheet, renameTeamSheet, saveDraft, listTeamSheets, readSheet } from './sheets';
import { saveRevision, moveRevision } from './revisions';
import { createNote, replyToNote } from './notes';
import { uploadTrace, traceOptionsSchema } from './traces';
import { vesselDoc } from '$lib/revisions/test-fixtures';

// The seven places the reported NUL reached SQLite's CHECK constraints (sheet create and rename,
// revision message, note and reply bodies, trace name and file name), and their neighbours, at the
// service layer on a real migrated database: a 400 naming the control character, nothing stored.
// The same fields over HTTP, with the forms and pages, are in tests/control-chars.spec.ts.

let w: ReviewWorld;
let sheet: string;
const VALUES = ['\u0000abc', 'a\u0007b', 'c\u007f', '\u001b[0m'];
const csv = new TextEncoder().encode('time [s],P [kPa a],T [°C]\n0,150,20\n');

beforeEach(async () => {
	w = await reviewWorld();
	sheet = await w.newSheet();
	await saveRevision(w.env.db, await w.access(w.people.designer), sheet, {
		message: 'Rev 1',
		baseRevision: null
	});
});
afterEach(async () => {
	await w.env.close();
});

async function counts() {
	const one = async (table: string) =>
		Number(
			(await sql<{ n: number }>`select count(*) as n from ${sql.table(table)}`.execute(w.env.db))
				.rows[0].n
		);
	return {
		sheets: await one('sheets'),
		revisions: await one('sheet_revisions'),
		notes: await one('review_notes'),
		replies: await one('review_note_replies'),
		traces: await one('sheet_traces')
	};
}

describe('control characters at the services', () => {
	it('are refused with a 400 naming the character in every text the sheets, revisions, notes and traces store', async () => {
		const a = await w.access(w.people.designer);
		const db = w.env.db;
		const note = await createNote(
			db,
			a,
			sheet,
			{ anchor: { kind: 'sheet' }, body: 'thread' },
			w.ctx
		);
		const before = await counts();
		const { version } = await readSheet(db, a, sheet);
		for (const v of VALUES) {
			const cases: Array<[string, Promise<unknown>]> = [
				['create title', createSheet(db, a, { title: v, doc: vesselDoc() })],
				['rename', renameTeamSheet(db, a, sheet, v)],
				[
					'title block',
					saveDraft(db, a, sheet, {
						version,
						doc: { ...vesselDoc(), titleBlock: { ...vesselDoc().titleBlock, tag: v } }
					})
				],
				[
					'description',
					saveDraft(db, a, sheet, { version, doc: { ...vesselDoc(), description: v } })
				],
				['revision message', saveRevision(db, a, sheet, { message: v, baseRevision: 1 })],
				['sign-off note', moveRevision(db, a, sheet, 1, 'submit', { note: v }, w.ctx)],
				['note body', createNote(db, a, sheet, { anchor: { kind: 'sheet' }, body: v }, w.ctx)],
				['reply body', replyToNote(db, a, sheet, note.id, { body: v }, w.ctx)],
				['trace file name', uploadTrace(db, a, sheet, { bytes: csv, filename: `${v}.csv` })],
				['search text', listTeamSheets(db, a, { q: v })]
			];
			// all started at once: mark each handled now, so one refused while an earlier one is
			// still on its way (PostgreSQL answers over the network) is not an unhandled rejection
			for (const [, p] of cases) p.catch(() => {});
			for (const [what, p] of cases) {
				const e = await expectAppError(p, 400);
				expect(e.message, `${what} ← ${JSON.stringify(v)}`).toMatch(
					/control character U\+00[0-9A-F]{2}/
				);
			}
			const name = traceOptionsSchema.safeParse({ name: v });
			expect(name.success).toBe(false);
			expect(name.error?.issues[0].message).toMatch(
				/^The trace name contains the control character/
			);
		}
		expect(await counts()).toEqual(before);
		expect((await readSheet(db, a, sheet)).version).toBe(version);
	});

	it('keep line breaks and tabs in multi-line texts, and refuse them in one-line ones', async () => {
		const a = await w.access(w.people.designer);
		const r = await saveRevision(w.env.db, a, sheet, {
			message: 'Raised the end temperature\n\t- leg 1 only',
			baseRevision: 1,
			doc: { ...vesselDoc(), description: 'two\nlines' }
		});
		expect(r.message).toBe('Raised the end temperature\n\t- leg 1 only');
		await expectAppError(renameTeamSheet(w.env.db, a, sheet, 'two\nlines'), 400, 'invalid-title');
		await expectAppError(
			uploadTrace(w.env.db, a, sheet, { bytes: csv, filename: 'a\tb.csv' }),
			400,
			'invalid-filename'
		);
	});

	it('still open sheets whose stored draft holds control characters from before the rule, cleaned', async () => {
		const a = await w.access(w.people.designer);
		const legacy = {
			...vesselDoc(),
			description: 'old\u0000 text\nkept',
			titleBlock: { ...vesselDoc().titleBlock, tag: 'V-204\u0007', site: 'North\tyard' }
		};
		await w.env.db
			.updateTable('sheets')
			.set({ draft: JSON.stringify(legacy) })
			.where('id', '=', sheet)
			.execute();
		const read = await readSheet(w.env.db, a, sheet);
		expect(read.doc.description).toBe('old text\nkept');
		expect(read.doc.titleBlock.tag).toBe('V-204');
		expect(read.doc.titleBlock.site).toBe('North yard');
		// sent back as it was read, it saves; sent with the control characters, it is refused
		await expectAppError(
			saveDraft(w.env.db, a, sheet, { version: read.version, doc: legacy }),
			400,
			'invalid-sheet'
		);
		expect(
			(await saveDraft(w.env.db, a, sheet, { version: read.version, doc: read.doc })).version
		).toBe(read.version + 1);
	});
});
