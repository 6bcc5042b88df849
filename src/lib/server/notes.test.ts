import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { expectAppError, linkIn } from './testing';
import { reviewWorld, type ReviewWorld } from './revisions.test-support';
import { createNote, getNote, listNotes, replyToNote, setNoteState } from './notes';
import { saveRevision } from './revisions';
import { readSheet, saveDraft } from './sheets';
import { DEFAULT_NOTIFICATION_SETTINGS, setNotificationSettings } from './db/notification-settings';
import { vesselDoc } from '$lib/revisions/test-fixtures';
import type { SessionUser } from './auth';
import type { Anchor } from '$lib/sheets/types';

let w: ReviewWorld;
let sheet: string;
beforeEach(async () => {
	w = await reviewWorld();
	sheet = await w.newSheet();
});
afterEach(async () => {
	await w.env.close();
});
const db = () => w.env.db;

async function note(
	who: SessionUser,
	anchor: Anchor,
	body: string,
	revision: number | null = null
) {
	return createNote(db(), await w.access(who), sheet, { anchor, body, revision }, w.ctx);
}

async function edit(who: SessionUser, legs: Parameters<typeof vesselDoc>[0]) {
	const s = await readSheet(db(), await w.access(who), sheet);
	await saveDraft(db(), await w.access(who), sheet, { version: s.version, doc: vesselDoc(legs) });
}

describe('writing review notes', () => {
	it('anchors a note to a leg, a state or the sheet, labelled by position', async () => {
		const a = await note(
			w.people.checker,
			{ kind: 'leg', legId: 'vent' },
			'Throttling to 200 kPa a: check the vent line size.'
		);
		expect(a).toMatchObject({
			writtenAt: 'L2',
			label: 'L2',
			outdated: false,
			revision: null,
			resolved: null
		});
		expect(a.author.name).toBe('Priya Nandakumar');
		expect(
			(
				await note(
					w.people.checker,
					{ kind: 'state', at: 'heat' },
					'S2 is above the design temperature.'
				)
			).label
		).toBe('S2');
		expect(
			(await note(w.people.designer, { kind: 'state', at: 'start' }, 'Start from the fill record.'))
				.label
		).toBe('S1');
		expect(
			(await note(w.people.owner, { kind: 'sheet' }, 'Use for memo BTW-CALC-0417.')).label
		).toBe('Sheet');
		const list = await listNotes(db(), await w.access(w.people.viewer), sheet);
		expect(list.notes).toHaveLength(4);
		expect(list.open).toBe(4);
	});

	it('lets checkers write but not viewers; refuses empty notes and anchors the sheet does not have', async () => {
		await expectAppError(note(w.people.viewer, { kind: 'sheet' }, 'hello'), 403, 'forbidden');
		await expectAppError(
			note(w.people.checker, { kind: 'leg', legId: 'nope' }, 'hello'),
			400,
			'unknown-anchor'
		);
		await expectAppError(
			note(w.people.checker, { kind: 'state', at: 'nope' }, 'hello'),
			400,
			'unknown-anchor'
		);
		await expectAppError(note(w.people.checker, { kind: 'sheet' }, '   '), 400, 'invalid-body');
		await expectAppError(
			note(w.people.checker, { kind: 'sheet' }, 'x'.repeat(4001)),
			400,
			'invalid-body'
		);
		await expectAppError(
			note(w.people.checker, { kind: 'leg' } as unknown as Anchor, 'x'),
			400,
			'invalid-anchor'
		);
		await expectAppError(
			note(w.people.checker, { kind: 'sheet' }, 'on a revision that is not there', 4),
			404,
			'revision-not-found'
		);
	});
});

describe('anchoring across edits and revisions', () => {
	it('follows a leg by id when legs are inserted before it, and flags notes whose leg was removed', async () => {
		await saveRevision(db(), await w.access(w.people.designer), sheet, {
			message: 'Rev 1',
			baseRevision: null
		});
		const onVent = await note(
			w.people.checker,
			{ kind: 'leg', legId: 'vent' },
			'Is throttling to 200 kPa right?',
			1
		);
		const onVentEnd = await note(w.people.checker, { kind: 'state', at: 'vent' }, 'S3 quality?', 1);
		expect(onVent.revision).toBe(1);
		// Rev 2: a warming leg inserted first; the vent leg is now L3
		await edit(w.people.designer, [
			{ id: 'warm', process: 'isochoric', target: { T: 373.15 } },
			{ id: 'heat', process: 'isochoric', target: { T: 453.15 } },
			{ id: 'vent', process: 'isenthalpic', target: { P: 200_000 } }
		]);
		await saveRevision(db(), await w.access(w.people.designer), sheet, {
			message: 'Rev 2',
			baseRevision: 1
		});
		let list = await listNotes(db(), await w.access(w.people.viewer), sheet, 2);
		expect(list.notes.find((n) => n.id === onVent.id)).toMatchObject({
			writtenAt: 'L2',
			label: 'L3',
			outdated: false
		});
		expect(list.notes.find((n) => n.id === onVentEnd.id)).toMatchObject({
			writtenAt: 'S3',
			label: 'S4',
			outdated: false
		});
		// Rev 3: the vent leg deleted
		await edit(w.people.designer, [
			{ id: 'warm', process: 'isochoric', target: { T: 373.15 } },
			{ id: 'heat', process: 'isochoric', target: { T: 453.15 } }
		]);
		await saveRevision(db(), await w.access(w.people.designer), sheet, {
			message: 'Rev 3: no vent',
			baseRevision: 2
		});
		list = await listNotes(db(), await w.access(w.people.viewer), sheet, 3);
		const gone = list.notes.find((n) => n.id === onVent.id)!;
		expect(gone).toMatchObject({
			outdated: true,
			label: null,
			writtenAt: 'L2',
			body: 'Is throttling to 200 kPa right?'
		});
		expect(list.outdated).toBe(2);
		// still there, not outdated, when shown against the revision it was written on
		const onRev1 = await listNotes(db(), await w.access(w.people.viewer), sheet, 1);
		expect(onRev1.notes.every((n) => !n.outdated)).toBe(true);
		// and against the working draft (which has no vent leg either)
		expect((await getNote(db(), await w.access(w.people.viewer), sheet, onVent.id)).outdated).toBe(
			true
		);
		// replies still work on an outdated thread
		const replied = await replyToNote(
			db(),
			await w.access(w.people.designer),
			sheet,
			onVent.id,
			{ body: 'Vent leg removed in Rev 3.' },
			w.ctx
		);
		expect(replied.replies.map((r) => r.body)).toEqual(['Vent leg removed in Rev 3.']);
	});
});

describe('threads and mails', () => {
	it('mails a mention with a link to the exact note, and not the author or outsiders', async () => {
		const n = await note(
			w.people.checker,
			{ kind: 'leg', legId: 'heat' },
			'@Arlo Brandt S2 passes the design temperature; @Ines please confirm the limit. @Otto Sider, @Priya'
		);
		expect(n.mentions.sort()).toEqual(
			[w.people.designer.id, w.people.owner.id, w.people.checker.id].sort()
		);
		const [mail] = await w.mail(w.people.designer);
		expect(mail.subject).toBe('Priya Nandakumar mentioned you on V-204 fire case');
		expect(mail.text).toContain('leg L1 (isochoric)');
		expect(mail.text).toContain('S2 passes the design temperature');
		expect(linkIn(mail.text, 'http://statewright.test/')).toBe(
			`http://statewright.test/t/${w.team.slug}/sheets/${sheet}?note=${n.id}#note-${n.id}`
		);
		expect(await w.mail(w.people.owner)).toHaveLength(1);
		expect(await w.mail(w.people.checker)).toHaveLength(0);
		expect(await w.mail(w.people.outsider)).toHaveLength(0);
	});

	it('mails the thread’s author on a reply (once, as a mention, when also mentioned)', async () => {
		const n = await note(w.people.checker, { kind: 'leg', legId: 'heat' }, 'Why 180 °C?');
		await replyToNote(
			db(),
			await w.access(w.people.designer),
			sheet,
			n.id,
			{ body: 'From the burner data sheet.' },
			w.ctx
		);
		let mails = await w.mail(w.people.checker);
		expect(mails.map((m) => m.subject)).toEqual([
			'Arlo Brandt replied to your note on V-204 fire case'
		]);
		expect(mails[0].text).toContain('From the burner data sheet.');
		expect(linkIn(mails[0].text, 'http://statewright.test/')).toContain(
			`?note=${n.id}#note-${n.id}`
		);
		await replyToNote(
			db(),
			await w.access(w.people.designer),
			sheet,
			n.id,
			{ body: '@Priya see the attachment list.' },
			w.ctx
		);
		mails = await w.mail(w.people.checker);
		expect(mails.map((m) => m.subject)).toEqual([
			'Arlo Brandt replied to your note on V-204 fire case',
			'Arlo Brandt mentioned you on V-204 fire case'
		]);
		// the author replying in their own thread mails nobody
		await replyToNote(
			db(),
			await w.access(w.people.checker),
			sheet,
			n.id,
			{ body: 'Thanks.' },
			w.ctx
		);
		expect(await w.mail(w.people.checker)).toHaveLength(2);
		const thread = await getNote(db(), await w.access(w.people.viewer), sheet, n.id);
		expect(thread.replies.map((r) => [r.author.name, r.body])).toEqual([
			['Arlo Brandt', 'From the burner data sheet.'],
			['Arlo Brandt', '@Priya see the attachment list.'],
			['Priya Nandakumar', 'Thanks.']
		]);
		expect(thread.replies[1].mentions).toEqual([w.people.checker.id]);
	});

	it('honours a person’s choice to get no mention or reply mails', async () => {
		await setNotificationSettings(db(), w.people.designer.id, {
			...DEFAULT_NOTIFICATION_SETTINGS,
			mention: false
		});
		await setNotificationSettings(db(), w.people.checker.id, {
			...DEFAULT_NOTIFICATION_SETTINGS,
			reply: false
		});
		const n = await note(w.people.checker, { kind: 'sheet' }, '@Arlo check the units');
		expect(n.mentions).toEqual([w.people.designer.id]);
		expect(await w.mail(w.people.designer)).toHaveLength(0);
		await replyToNote(
			db(),
			await w.access(w.people.designer),
			sheet,
			n.id,
			{ body: 'Done.' },
			w.ctx
		);
		expect(await w.mail(w.people.checker)).toHaveLength(0);
	});

	it('resolves and reopens with who and when, once each', async () => {
		const n = await note(w.people.checker, { kind: 'leg', legId: 'vent' }, 'Vent to 200 kPa a?');
		const r = await setNoteState(db(), await w.access(w.people.designer), sheet, n.id, true);
		expect(r.resolved?.by).toBe('Arlo Brandt');
		await expectAppError(
			setNoteState(db(), await w.access(w.people.checker), sheet, n.id, true),
			409,
			'already-resolved'
		);
		await expectAppError(
			setNoteState(db(), await w.access(w.people.viewer), sheet, n.id, false),
			403,
			'forbidden'
		);
		const o = await setNoteState(db(), await w.access(w.people.checker), sheet, n.id, false);
		expect(o.resolved).toBeNull();
		expect(o.replies.map((x) => [x.kind, x.author.name])).toEqual([
			['resolved', 'Arlo Brandt'],
			['reopened', 'Priya Nandakumar']
		]);
		expect((await listNotes(db(), await w.access(w.people.viewer), sheet)).open).toBe(1);
		await expectAppError(
			setNoteState(db(), await w.access(w.people.checker), sheet, 'aaaaaaaaaaaaaaaa', true),
			404,
			'note-not-found'
		);
	});
});

describe('mail content', () => {
	it('escapes what people wrote in the HTML part and keeps the plain text readable', async () => {
		const { getOutboxMessage, listOutboxMessages } = await import('./db/outbox');
		await note(
			w.people.checker,
			{ kind: 'sheet' },
			'@Arlo Brandt see <script>alert(1)</script> & the "vent" line'
		);
		const [summary] = await listOutboxMessages(db(), { to: w.people.designer.email });
		const full = (await getOutboxMessage(db(), summary.id))!;
		expect(full.html).toContain(
			'&lt;script&gt;alert(1)&lt;/script&gt; &amp; the &quot;vent&quot; line'
		);
		expect(full.html).not.toContain('<script>');
		expect(full.html).toContain(`?note=`);
		expect(full.text).toContain('<script>alert(1)</script> & the "vent" line');
		expect(full.to_header).toContain(w.people.designer.email);
	});
});
