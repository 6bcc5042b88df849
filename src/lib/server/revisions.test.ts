import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { sql } from 'kysely';
import { expectAppError, linkIn } from './testing';
import { reviewWorld, type ReviewWorld } from './revisions.test-support';
import {
	compareRevisions,
	listRevisions,
	moveRevision,
	OpenNotesError,
	readRevision,
	restoreRevision,
	RevisionConflictError,
	saveRevision
} from './revisions';
import { createNote, setNoteState } from './notes';
import { readSheet, saveDraft } from './sheets';
import { getSheet } from './db/sheets';
import { setNotificationSettings, DEFAULT_NOTIFICATION_SETTINGS } from './db/notification-settings';
import { vesselDoc } from '$lib/revisions/test-fixtures';
import type { SessionUser } from './auth';

let w: ReviewWorld;
beforeEach(async () => {
	w = await reviewWorld();
});
afterEach(async () => {
	await w.env.close();
});

const db = () => w.env.db;
const edited = (T = 443.15) =>
	vesselDoc([
		{ id: 'heat', process: 'isochoric', target: { T } },
		{ id: 'vent', process: 'isenthalpic', target: { P: 200_000 } }
	]);

async function save(
	who: SessionUser,
	sheet: string,
	base: number | null,
	doc = edited(),
	message = 'Fire case per site survey'
) {
	return saveRevision(db(), await w.access(who), sheet, { message, baseRevision: base, doc });
}

async function step(
	who: SessionUser,
	sheet: string,
	n: number,
	action: Parameters<typeof moveRevision>[4],
	note?: string,
	checkerId?: string
) {
	return moveRevision(db(), await w.access(who), sheet, n, action, { note, checkerId }, w.ctx);
}

describe('saving revisions', () => {
	it('numbers revisions per sheet, freezes the document and the computed path, records who and when', async () => {
		const sheet = await w.newSheet();
		const r1 = await saveRevision(db(), await w.access(w.people.designer), sheet, {
			message: '  First issue  ',
			baseRevision: null
		});
		expect(r1).toMatchObject({
			number: 1,
			basedOn: null,
			message: 'First issue',
			status: 'draft',
			latest: true
		});
		expect(r1.author.name).toBe('Arlo Brandt');
		expect(r1.result.legs.map((l) => l.id)).toEqual(['heat', 'vent']);
		const r2 = await save(w.people.designer2, sheet, 1);
		expect(r2).toMatchObject({ number: 2, basedOn: 1 });
		const other = await w.newSheet();
		expect((await save(w.people.designer, other, null)).number).toBe(1);
		const { revisions } = await listRevisions(db(), await w.access(w.people.viewer), sheet);
		expect(revisions.map((r) => [r.number, r.latest])).toEqual([
			[2, true],
			[1, false]
		]);
		const read = await readRevision(db(), await w.access(w.people.viewer), sheet, 1);
		expect(read.doc.spec.legs[0].target).toEqual({ T: 453.15 });
		expect(read.result.states).toHaveLength(3);
	});

	it('keeps revisions immutable in the database itself, and locks approved ones', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null);
		await expect(
			sql`update sheet_revisions set doc = '{}' where number = 1`.execute(db())
		).rejects.toThrow(/immutable/);
		await expect(
			sql`update sheet_revisions set message = 'rewritten' where number = 1`.execute(db())
		).rejects.toThrow(/immutable/);
		await step(w.people.designer, sheet, 1, 'submit');
		await step(w.people.checker, sheet, 1, 'check');
		await step(w.people.owner, sheet, 1, 'approve');
		await expect(
			sql`update sheet_revisions set status = 'draft' where number = 1`.execute(db())
		).rejects.toThrow(/locked/);
		await expect(
			sql`update sheet_revisions set approved_at = 0 where number = 1`.execute(db())
		).rejects.toThrow(/locked/);
		// editing after approval starts a new draft: the working draft saves, Rev 2 is based on Rev 1
		const s = await readSheet(db(), await w.access(w.people.designer), sheet);
		await saveDraft(db(), await w.access(w.people.designer), sheet, {
			version: s.version,
			doc: edited(440)
		});
		const r2 = await saveRevision(db(), await w.access(w.people.designer), sheet, {
			message: 'Lower end temperature',
			baseRevision: 1
		});
		expect(r2).toMatchObject({ number: 2, basedOn: 1, status: 'draft' });
		expect((await readRevision(db(), await w.access(w.people.viewer), sheet, 1)).status).toBe(
			'approved'
		);
	});

	it('refuses a save based on an old revision with 409, stores nothing and hands the would-be revision back', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null, edited(450), 'Arlo first');
		const mine = edited(430);
		const e = (await expectAppError(
			save(w.people.designer2, sheet, null, mine, 'Mina at the same time'),
			409,
			'revision-conflict'
		)) as RevisionConflictError;
		expect(e).toBeInstanceOf(RevisionConflictError);
		expect(e.yours.doc.spec.legs[0].target).toEqual({ T: 430 });
		expect(e.yours.message).toBe('Mina at the same time');
		expect(e.latest).toMatchObject({ number: 1, message: 'Arlo first' });
		expect(e.message).toMatch(/Arlo Brandt saved Rev 1/);
		await expectAppError(save(w.people.designer2, sheet, 3, mine), 409, 'revision-conflict');
		const { revisions } = await listRevisions(db(), await w.access(w.people.viewer), sheet);
		expect(revisions).toHaveLength(1);
		// merged by hand and saved on top of Rev 1
		expect((await save(w.people.designer2, sheet, 1, mine, 'Mina, merged')).number).toBe(2);
	});

	it('refuses a stale draft version, an unchanged document, a path that cannot be computed and bad input', async () => {
		const sheet = await w.newSheet();
		await expectAppError(
			saveRevision(db(), await w.access(w.people.designer), sheet, {
				message: 'x',
				baseRevision: null,
				draftVersion: 7
			}),
			409,
			'draft-conflict'
		);
		await save(w.people.designer, sheet, null);
		await expectAppError(save(w.people.designer, sheet, 1), 422, 'unchanged');
		const impossible = vesselDoc([{ id: 'heat', process: 'isochoric', target: { T: 200 } }]);
		await expectAppError(save(w.people.designer, sheet, 1, impossible), 422);
		await expectAppError(
			save(w.people.designer, sheet, 1, edited(440), '   '),
			400,
			'invalid-message'
		);
		await expectAppError(
			saveRevision(db(), await w.access(w.people.designer), sheet, {
				message: 'x',
				baseRevision: 0
			}),
			400,
			'invalid-base'
		);
		await expectAppError(
			saveRevision(db(), await w.access(w.people.designer), sheet, {
				message: 'x',
				baseRevision: 1,
				doc: { spec: 'nonsense' }
			}),
			400,
			'invalid-sheet'
		);
		await expectAppError(
			saveRevision(db(), await w.access(w.people.designer), 'aaaaaaaaaaaaaaaa', {
				message: 'x',
				baseRevision: null
			}),
			404,
			'sheet-not-found'
		);
	});

	it('keeps sheets of other teams out of reach', async () => {
		const sheet = await w.newSheet();
		const { createTeamFor } = await import('./teams');
		const outsiderTeam = await createTeamFor(db(), w.people.outsider, { name: 'Elsewhere Ltd' });
		const { resolveTeamAccess } = await import('./guard');
		const a = (await resolveTeamAccess(
			db(),
			{ kind: 'user', user: w.people.outsider },
			outsiderTeam.slug
		))!;
		await expectAppError(
			saveRevision(db(), a, sheet, { message: 'x', baseRevision: null }),
			404,
			'sheet-not-found'
		);
		await expectAppError(listRevisions(db(), a, sheet), 404);
	});
});

describe('sign-off workflow', () => {
	type Who = 'owner' | 'designer' | 'checker' | 'viewer';
	// [action, status the newest revision must be in, roles allowed] — the designer is the author
	const matrix: Array<
		[Parameters<typeof moveRevision>[4], 'draft' | 'in-check' | 'checked', Who[]]
	> = [
		['submit', 'draft', ['owner', 'designer']],
		['withdraw', 'in-check', ['owner', 'designer']],
		['check', 'in-check', ['owner', 'checker']],
		['return', 'in-check', ['owner', 'checker']],
		['return', 'checked', ['owner']],
		['approve', 'checked', ['owner']]
	];
	for (const [action, from, allowed] of matrix) {
		for (const who of ['owner', 'designer', 'checker', 'viewer'] as const) {
			it(`${action} from ${from}: ${who} ${allowed.includes(who) ? 'may' : 'may not'}`, async () => {
				const sheet = await w.newSheet();
				await save(w.people.designer, sheet, null);
				if (from !== 'draft') await step(w.people.designer, sheet, 1, 'submit');
				if (from === 'checked') await step(w.people.checker2, sheet, 1, 'check');
				const p = step(w.people[who], sheet, 1, action, 'See the notes on L2.');
				if (allowed.includes(who)) {
					const r = await p;
					const to = {
						submit: 'in-check',
						withdraw: 'draft',
						check: 'checked',
						return: 'draft',
						approve: 'approved'
					}[action];
					expect(r.status).toBe(to);
					expect((await getSheet(db(), w.team.id, sheet))!.status).toBe(to);
				} else {
					const e = await expectAppError(p, 403);
					expect(['forbidden', 'self-return']).toContain(e.code);
				}
			});
		}
	}

	it('refuses a check or an approval by the revision’s own author', async () => {
		const sheet = await w.newSheet(undefined, w.people.owner);
		await save(w.people.owner, sheet, null);
		await step(w.people.owner, sheet, 1, 'submit');
		const e = await expectAppError(step(w.people.owner, sheet, 1, 'check'), 403, 'self-check');
		expect(e.message).toMatch(/someone other than its designer/);
		await step(w.people.checker, sheet, 1, 'check');
		await expectAppError(step(w.people.owner, sheet, 1, 'approve'), 403, 'self-approve');
		const r = await readRevision(db(), await w.access(w.people.viewer), sheet, 1);
		expect(r.status).toBe('checked');
		expect(r.checked?.name).toBe('Priya Nandakumar');
	});

	it('moves only the newest revision, one step at a time, and saves nothing new while in check', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null);
		await expectAppError(step(w.people.checker, sheet, 1, 'check'), 409, 'wrong-status');
		await expectAppError(step(w.people.owner, sheet, 1, 'approve'), 409, 'wrong-status');
		await step(w.people.designer, sheet, 1, 'submit');
		await expectAppError(step(w.people.designer, sheet, 1, 'submit'), 409, 'wrong-status');
		await expectAppError(save(w.people.designer, sheet, 1), 409, 'in-check');
		await expectAppError(step(w.people.checker, sheet, 1, 'return'), 400, 'invalid-note');
		await step(w.people.checker, sheet, 1, 'return', 'L2 ends above the design temperature.');
		await save(w.people.designer, sheet, 1, edited(440));
		await expectAppError(step(w.people.designer, sheet, 1, 'submit'), 409, 'not-latest');
		await expectAppError(step(w.people.designer, sheet, 9, 'submit'), 404, 'revision-not-found');
		const { events } = await listRevisions(db(), await w.access(w.people.viewer), sheet);
		expect(events.map((e) => [e.number, e.kind])).toEqual([
			[2, 'saved'],
			[1, 'returned'],
			[1, 'submitted'],
			[1, 'saved']
		]);
		expect(events[1].note).toBe('L2 ends above the design temperature.');
	});

	it('records designer, checker and approver with dates for the title block', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null);
		await step(w.people.designer, sheet, 1, 'submit', undefined, w.people.checker.id);
		await step(w.people.checker, sheet, 1, 'check', 'Checked against the site survey.');
		await step(w.people.owner, sheet, 1, 'approve');
		const r = await readRevision(db(), await w.access(w.people.viewer), sheet, 1);
		expect(r.status).toBe('approved');
		expect([r.author.name, r.checked?.name, r.approved?.name]).toEqual([
			'Arlo Brandt',
			'Priya Nandakumar',
			'Ines Hale'
		]);
		expect(r.submitted?.checkerId).toBe(w.people.checker.id);
		expect(r.approved!.at).toBeGreaterThanOrEqual(r.checked!.at);
		await expectAppError(
			step(w.people.checker, sheet, 1, 'return', 'too late'),
			409,
			'wrong-status'
		);
	});

	it('refuses a check or an approval over open review notes unless a reason is given, and logs the override', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null);
		await step(w.people.designer, sheet, 1, 'submit');
		const checker = await w.access(w.people.checker);
		const n1 = await createNote(db(), checker, sheet, {
			anchor: { kind: 'sheet' },
			body: 'Where does the design temperature come from?',
			revision: 1
		});
		await createNote(db(), checker, sheet, {
			anchor: { kind: 'sheet' },
			body: 'Name the relief valve datasheet.',
			revision: 1
		});
		const e = await expectAppError(
			moveRevision(db(), checker, sheet, 1, 'check', {}),
			409,
			'open-notes'
		);
		expect(e).toBeInstanceOf(OpenNotesError);
		expect((e as OpenNotesError).openNotes).toBe(2);
		expect(e.message).toMatch(/2 review notes are still open/);
		await expectAppError(
			moveRevision(db(), checker, sheet, 1, 'check', { override: '   ' }),
			400,
			'invalid-override'
		);
		await expectAppError(
			moveRevision(db(), await w.access(w.people.designer), sheet, 1, 'withdraw', {
				override: 'x'
			}),
			400,
			'invalid-override'
		);
		expect((await readRevision(db(), checker, sheet, 1)).status).toBe('in-check'); // nothing moved
		await moveRevision(
			db(),
			checker,
			sheet,
			1,
			'check',
			{ override: ' Both notes are for Rev 2; the figures of Rev 1 stand. ', note: 'Checked.' },
			w.ctx
		);
		// one note resolved: the approval still needs a reason, for the one left open
		await setNoteState(db(), checker, sheet, n1.id, true);
		const owner = await w.access(w.people.owner);
		await expectAppError(moveRevision(db(), owner, sheet, 1, 'approve'), 409, 'open-notes');
		await moveRevision(
			db(),
			owner,
			sheet,
			1,
			'approve',
			{ override: 'Datasheet follows with Rev 2.' },
			w.ctx
		);
		const { events } = await listRevisions(db(), await w.access(w.people.viewer), sheet);
		const by = (k: string) => events.find((x) => x.kind === k)!;
		expect(by('checked')).toMatchObject({
			note: 'Checked.',
			override: { reason: 'Both notes are for Rev 2; the figures of Rev 1 stand.', openNotes: 2 }
		});
		expect(by('approved').override).toEqual({
			reason: 'Datasheet follows with Rev 2.',
			openNotes: 1
		});
		expect(by('submitted').override).toBeNull();
		// the designer's mails say so too
		const mails = await w.mail(w.people.designer);
		const checked = mails.find((m) => m.subject === 'Rev 1 of V-204 fire case was checked')!;
		expect(checked.text).toContain('over 2 open review notes');
		expect(checked.text).toContain('Both notes are for Rev 2; the figures of Rev 1 stand.');
		expect(
			mails.find((m) => m.subject === 'Rev 1 of V-204 fire case was approved')?.text
		).toContain('over 1 open review note,');
	});

	it('signs off without a word when every note is resolved (an override given then is not recorded)', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null);
		await step(w.people.designer, sheet, 1, 'submit');
		const checker = await w.access(w.people.checker);
		const n = await createNote(db(), checker, sheet, {
			anchor: { kind: 'sheet' },
			body: 'Check the fill ratio.',
			revision: 1
		});
		await setNoteState(db(), checker, sheet, n.id, true);
		await moveRevision(db(), checker, sheet, 1, 'check', { override: 'not needed' });
		const { events } = await listRevisions(db(), checker, sheet);
		expect(events.find((x) => x.kind === 'checked')?.override).toBeNull();
	});

	it('refuses to ask a checker who cannot check, or the author', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null);
		await expectAppError(
			step(w.people.designer, sheet, 1, 'submit', undefined, w.people.viewer.id),
			400,
			'invalid-checker'
		);
		await expectAppError(
			step(w.people.designer, sheet, 1, 'submit', undefined, w.people.outsider.id),
			400,
			'invalid-checker'
		);
		await expectAppError(
			step(w.people.designer, sheet, 1, 'submit', undefined, w.people.designer2.id),
			400,
			'invalid-checker'
		);
	});
});

describe('sign-off mails', () => {
	it('asks the named checker, tells the designer when checked, approved or returned, with links', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null);
		await step(w.people.designer, sheet, 1, 'submit', undefined, w.people.checker.id);
		const [ask] = await w.mail(w.people.checker);
		expect(ask.subject).toBe('Rev 1 of V-204 fire case is ready for your check');
		expect(ask.text).toContain('Arlo Brandt submitted Rev 1');
		expect(ask.text).toContain('Fire case per site survey');
		expect(linkIn(ask.text, 'http://statewright.test/')).toBe(
			`http://statewright.test/t/${w.team.slug}/sheets/${sheet}/revisions/1`
		);
		expect(await w.mail(w.people.checker2)).toHaveLength(0);
		await step(
			w.people.checker,
			sheet,
			1,
			'return',
			'S3 is beyond the relief set pressure: add the vent leg first.'
		);
		const [returned] = await w.mail(w.people.designer);
		expect(returned.subject).toBe('Rev 1 of V-204 fire case was returned to you');
		expect(returned.text).toContain('S3 is beyond the relief set pressure');
		await save(w.people.designer, sheet, 1, edited(440));
		await step(w.people.designer, sheet, 2, 'submit');
		// no checker named: every checker of the team is asked
		expect((await w.mail(w.people.checker)).map((m) => m.subject)).toContain(
			'Rev 2 of V-204 fire case is ready for your check'
		);
		expect((await w.mail(w.people.checker2)).map((m) => m.subject)).toEqual([
			'Rev 2 of V-204 fire case is ready for your check'
		]);
		await step(w.people.checker2, sheet, 2, 'check');
		await step(w.people.owner, sheet, 2, 'approve', 'Issue with memo BTW-CALC-0417.');
		const subjects = (await w.mail(w.people.designer)).map((m) => m.subject);
		expect(subjects).toEqual([
			'Rev 1 of V-204 fire case was returned to you',
			'Rev 2 of V-204 fire case was checked',
			'Rev 2 of V-204 fire case was approved'
		]);
		const approved = (await w.mail(w.people.designer))[2];
		expect(approved.text).toContain('Issue with memo BTW-CALC-0417.');
		expect(approved.text).toContain('http://statewright.test/account#notifications');
		// nobody is mailed about their own step
		expect(await w.mail(w.people.owner)).toHaveLength(0);
	});

	it('honours each person’s settings', async () => {
		await setNotificationSettings(db(), w.people.checker.id, {
			...DEFAULT_NOTIFICATION_SETTINGS,
			submitted: false
		});
		await setNotificationSettings(db(), w.people.designer.id, {
			...DEFAULT_NOTIFICATION_SETTINGS,
			checked: false
		});
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null);
		await step(w.people.designer, sheet, 1, 'submit');
		expect(await w.mail(w.people.checker)).toHaveLength(0);
		expect(await w.mail(w.people.checker2)).toHaveLength(1);
		await step(w.people.checker, sheet, 1, 'check');
		expect(await w.mail(w.people.designer)).toHaveLength(0);
		await step(w.people.owner, sheet, 1, 'approve');
		expect((await w.mail(w.people.designer)).map((m) => m.subject)).toEqual([
			'Rev 1 of V-204 fire case was approved'
		]);
	});
});

describe('restore and compare', () => {
	it('restores a revision as the working draft, refusing a stale draft version', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null, edited(450));
		await save(w.people.designer, sheet, 1, edited(430));
		const before = await readSheet(db(), await w.access(w.people.designer), sheet);
		await expectAppError(
			restoreRevision(db(), await w.access(w.people.checker), sheet, 1, before.version),
			403,
			'forbidden'
		);
		const r = await restoreRevision(
			db(),
			await w.access(w.people.designer),
			sheet,
			1,
			before.version
		);
		expect(r.version).toBe(before.version + 1);
		const after = await readSheet(db(), await w.access(w.people.designer), sheet);
		expect(after.doc.spec.legs[0].target).toEqual({ T: 450 });
		await expectAppError(
			restoreRevision(db(), await w.access(w.people.designer), sheet, 2, before.version),
			409,
			'draft-conflict'
		);
		// the restored draft saves as Rev 3 on top of Rev 2
		expect(
			(
				await saveRevision(db(), await w.access(w.people.designer), sheet, {
					message: 'Back to Rev 1',
					baseRevision: 2
				})
			).number
		).toBe(3);
	});

	it('compares two revisions, and a revision with the working draft', async () => {
		const sheet = await w.newSheet();
		await save(w.people.designer, sheet, null, edited(450));
		await save(
			w.people.designer,
			sheet,
			1,
			vesselDoc([{ id: 'heat', process: 'isochoric', target: { T: 450 } }])
		);
		const c = await compareRevisions(db(), await w.access(w.people.viewer), sheet, 1, 2);
		expect(c.diff.legs.map((l) => [l.id, l.status])).toEqual([
			['heat', 'unchanged'],
			['vent', 'removed']
		]);
		expect(c.before.label).toBe('Rev 1');
		const d = await compareRevisions(db(), await w.access(w.people.viewer), sheet, 2, 'draft');
		expect(d.after.label).toBe('Working draft');
		expect(d.diff.summary.legsAdded).toBe(1);
		await expectAppError(
			compareRevisions(db(), await w.access(w.people.viewer), sheet, 1, 5),
			404,
			'revision-not-found'
		);
	});
});
