import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Kysely } from 'kysely';
import { createTestDb, disposeTestDb } from './db';
import type { Database } from './db/schema';
import { caughtSummary, createMailer, startFakeSmtp, type Mailer } from './mail';
import { getOutboxMessage, listOutboxMessages } from './db/outbox';
import { inviteMail } from './mail-templates';

let db: Kysely<Database>;
let mailer: Mailer | undefined;
afterEach(async () => {
	await mailer?.close();
	mailer = undefined;
	await disposeTestDb(db);
});

describe('mail through the local fake SMTP server', () => {
	it('prints each caught message on the console: recipients, subject and its links', async () => {
		db = await createTestDb();
		const logged = vi.spyOn(console, 'log').mockImplementation(() => {});
		try {
			// the app's default: no printer given, so the console
			mailer = await createMailer({ db, from: 'Statewright <no-reply@statewright.test>' });
			await mailer.send({
				to: 'Someone@Example.com',
				subject: 'Reset your Statewright password',
				text: 'Follow https://statewright.test/reset?token=abc_DEF-123 within the hour.\nOr https://statewright.test/signin.'
			});
			const printed = logged.mock.calls.map((c) => String(c[0])).join('\n');
			expect(printed).toContain(
				'[statewright] mail caught for someone@example.com: Reset your Statewright password'
			);
			expect(printed).toContain('  link: https://statewright.test/reset?token=abc_DEF-123');
			expect(printed).toMatch(/ {2}link: https:\/\/statewright.test\/signin$/m);
		} finally {
			logged.mockRestore();
		}
	});

	it('summarises a message for the console, each link once', () => {
		expect(
			caughtSummary({
				envelopeTo: ['a@x.example', 'b@x.example'],
				subject: 'Hi',
				text: 'see http://h/a and http://h/a, then <http://h/b>'
			})
		).toBe(
			[
				'[statewright] mail caught for a@x.example, b@x.example: Hi',
				'  link: http://h/a',
				'  link: http://h/b'
			].join('\n')
		);
	});

	it('delivers over SMTP and stores the parsed message before send() resolves', async () => {
		db = await createTestDb();
		mailer = await createMailer({ db, from: 'Statewright <no-reply@statewright.test>' });
		expect(mailer.catching).toBe(true);
		expect(mailer.port).toBeGreaterThan(0);
		const { messageId } = await mailer.send({
			to: 'Engineer@Example.com',
			subject: 'Überdruck – 10 bar g ✓',
			text: 'Plain body with a link https://statewright.test/reset?token=abc_DEF-123\nand a second line',
			html: '<p>HTML <strong>body</strong></p>'
		});
		const [m] = await listOutboxMessages(db, { to: 'engineer@example.com' });
		expect(m).toBeDefined();
		expect(m.message_id).toBe(messageId);
		expect(m.subject).toBe('Überdruck – 10 bar g ✓');
		expect(m.text).toContain('https://statewright.test/reset?token=abc_DEF-123');
		expect(JSON.parse(m.envelope_to)).toEqual(['engineer@example.com']);
		expect(m.envelope_from).toBe('no-reply@statewright.test');
		expect(m.from_header).toContain('Statewright');
		const full = await getOutboxMessage(db, m.id);
		expect(full?.html).toContain('<strong>body</strong>');
		// the raw message is real MIME, as any SMTP server would receive it
		expect(full?.raw).toMatch(/^Content-Type: multipart\/alternative/m);
	});

	it('sends through SMTP_URL when it is set (here: a second local server)', async () => {
		db = await createTestDb();
		const target = await startFakeSmtp(db);
		try {
			mailer = await createMailer({
				db,
				from: 'no-reply@statewright.test',
				smtpUrl: `smtp://127.0.0.1:${target.port}`
			});
			expect(mailer.catching).toBe(false);
			await mailer.send({ to: 'x@example.com', subject: 'via url', text: 'hello' });
			expect((await listOutboxMessages(db, { to: 'x@example.com' }))[0]?.subject).toBe('via url');
		} finally {
			await target.close();
		}
	});

	it('keeps plain and HTML versions of a template in step and escapes names', () => {
		const m = inviteMail({
			teamName: 'A <b> & Co',
			inviterName: 'Eve "E"',
			role: 'checker',
			url: 'https://s.test/invite/abc',
			expiresAt: Date.UTC(2030, 0, 2, 3, 4)
		});
		expect(m.subject).toBe('Eve "E" invited you to A <b> & Co on Statewright');
		expect(m.html).toContain('A &lt;b&gt; &amp; Co');
		expect(m.html).not.toContain('<b> &');
		expect(m.text).toContain('https://s.test/invite/abc');
		// plain text carries the names as typed, without markup
		expect(m.text).toContain('to the team A <b> & Co as checker.');
		expect(m.text).toContain('2030-01-02 03:04 UTC');
		expect(m.text).not.toContain('<strong>');
	});
});
