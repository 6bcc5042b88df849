import { spawn } from 'node:child_process';
import { mkdirSync, rmSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import {
	BASE,
	DEMO,
	FORM,
	TEAM,
	freshEmail,
	lastMailId,
	linkIn,
	mailTo,
	ownPort,
	postFrom,
	signedInRequest,
	signedUpRequest,
	signInPage,
	waitForMail
} from './helpers';

/*
 * The probes an outsider ran against the default configuration (no NODE_ENV, no SMTP_URL), kept as
 * journeys: the account-takeover chain through the mail outbox, account enumeration through
 * sign-up and reset requests, and lock-out used as a weapon. Each step that used to work for the
 * attacker is shown to fail. Client addresses other than 127.0.0.1 are real: the requests leave
 * from another loopback source address, and the server sees that as the client's address.
 */

/** A page as sent, less what differs on every answer anyway (the address typed, the script nonce). */
const sameness = (html: string, email: string) =>
	html.replaceAll(email, '<address>').replace(/nonce="[^"]*"/g, 'nonce');

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

test.describe('hardening: mail, enumeration, lock-out', () => {
	test('the takeover chain fails: sign up, start a team, ask a reset for someone else, read it, set their password', async ({
		page
	}) => {
		const victim = freshEmail('victim');
		const victimCtx = await signedUpRequest('Vic Tim', victim, 'the victim password');
		await victimCtx.dispose();

		// 1. the attacker signs up; the confirmation mail is theirs, so their own outbox shows it
		const attacker = freshEmail('attacker');
		await page.goto('/signup');
		await page.getByLabel('Name').fill('Mal Lory');
		await page.getByLabel('E-mail').fill(attacker);
		await page.getByLabel('Password').fill('the attacker password');
		await page.getByRole('button', { name: 'Create account' }).click();
		await expect(page.getByText('Check your mail')).toBeVisible();
		await waitForMail(attacker, 'Confirm your e-mail address');
		await signInPage(page, attacker, 'the attacker password');
		await page.getByRole('link', { name: 'Outbox' }).click();
		await expect(page.getByRole('heading', { name: 'Your outbox' })).toBeVisible();
		await page.getByRole('link', { name: 'Confirm your e-mail address for Statewright' }).click();
		await page
			.getByTestId('mail-text')
			.getByRole('link', { name: new RegExp(`^${BASE}/verify\\?token=`) })
			.click();
		await expect(page.getByText('Address confirmed')).toBeVisible();

		// 2. … and becomes the owner of a team of their own
		await page.goto('/');
		await page.getByLabel('Team name').fill(`Mallory Works ${Date.now().toString(36)}`);
		await page.getByRole('button', { name: 'Create team' }).click();
		await expect(page.getByTestId('member-summary')).toContainText('Owner');

		// 3. asks for a reset link for the victim's address; the link is mailed to the victim
		const before = await lastMailId(victim);
		await page.goto('/reset');
		await page.getByLabel('E-mail').fill(victim);
		await page.getByRole('button', { name: 'Send reset link' }).click();
		await expect(page.getByText('Check your mail')).toBeVisible();
		const resetMail = await waitForMail(victim, 'Reset your Statewright password', before);

		// 4. the attacker's outbox, page and JSON, filtered or not, holds none of it
		await page.goto('/dev/outbox');
		await expect(page.getByTestId('outbox')).toBeVisible();
		await expect(page.getByText('Reset your Statewright password')).toHaveCount(0);
		await expect(page.getByText(victim)).toHaveCount(0);
		for (const path of ['/dev/outbox.json', `/dev/outbox.json?to=${encodeURIComponent(victim)}`]) {
			const res = await page.request.get(path);
			expect(res.status()).toBe(200);
			const { address, messages } = (await res.json()) as {
				address: string;
				messages: Array<{ id: number; to: string[]; text: string }>;
			};
			expect(address).toBe(attacker);
			expect(messages.length).toBeGreaterThan(0);
			for (const m of messages) expect(m.to).toEqual([attacker]);
			expect(messages.some((m) => m.text.includes('/reset?token='))).toBe(false);
		}
		// nor does guessing message ids: the victim's message, and every other id up to it, is absent unless it is the attacker's own
		expect((await page.request.get(`/dev/outbox/${resetMail.id}`)).status()).toBe(404);
		const own = new Set(mailTo(attacker).map((m) => m.id));
		for (let id = Math.max(1, resetMail.id - 40); id <= resetMail.id + 2; id++) {
			expect((await page.request.get(`/dev/outbox/${id}`)).status(), `message ${id}`).toBe(
				own.has(id) ? 200 : 404
			);
		}

		// 5. emptying the outbox empties only the attacker's own mail
		const cleared = await page.request.post('/dev/outbox?/clear', { form: {}, headers: FORM });
		expect(cleared.status()).toBe(200);
		expect(mailTo(victim).map((m) => m.id)).toContain(resetMail.id);
		expect(mailTo(attacker)).toEqual([]);

		// 6. without the link there is no way to set the victim's password
		const link = linkIn(resetMail, `${BASE}/reset?token=`);
		const guessed = await page.request.post('/reset?/set', {
			form: { token: 'A'.repeat(43), password: 'taken over now', confirm: 'taken over now' },
			headers: FORM,
			maxRedirects: 0
		});
		expect(guessed.status()).toBe(400);
		expect(await guessed.text()).toContain('This reset link is not valid');
		expect(link).toMatch(/token=[A-Za-z0-9_-]{20,}/);
		const asVictim = await postFrom('127.0.0.1', '/signin', {
			email: victim,
			password: 'taken over now'
		});
		expect(asVictim.status).toBe(400);
		const victimAgain = await postFrom('127.0.0.1', '/signin', {
			email: victim,
			password: 'the victim password'
		});
		expect(victimAgain.status).toBe(303);

		// 7. an owner of the demo team, a long-standing owner, sees none of it either
		const owner = await signedInRequest(DEMO.owner);
		const { messages } = (await (
			await owner.get(`/dev/outbox.json?to=${encodeURIComponent(victim)}`)
		).json()) as { messages: Array<{ to: string[] }> };
		for (const m of messages) expect(m.to).toEqual([DEMO.owner]);
		expect((await owner.get(`/dev/outbox/${resetMail.id}`)).status()).toBe(404);
		await owner.dispose();
	});

	test('mail sent to an address before its account existed is not shown to whoever signs up with it', async ({
		page
	}) => {
		const address = freshEmail('invitee');
		// an owner invites the address; nobody holds it yet
		const owner = await signedInRequest(DEMO.owner);
		const invited = await owner.post(`/t/${TEAM}/settings?/invite`, {
			form: { email: address, role: 'designer' },
			headers: FORM
		});
		expect(invited.status()).toBe(200);
		const invitation = await waitForMail(address, 'invited you to');
		await owner.dispose();

		// someone signs up with that address directly (not through the invitation) and signs in
		await page.goto('/signup');
		await page.getByLabel('Name').fill('Early Bird');
		await page.getByLabel('E-mail').fill(address);
		await page.getByLabel('Password').fill('an early password');
		await page.getByRole('button', { name: 'Create account' }).click();
		await expect(page.getByText('Check your mail')).toBeVisible();
		await waitForMail(address, 'Confirm your e-mail address', invitation.id);
		await signInPage(page, address, 'an early password');
		const { messages } = (await (await page.request.get('/dev/outbox.json')).json()) as {
			messages: Array<{ id: number; subject: string }>;
		};
		expect(messages.map((m) => m.subject)).toEqual(['Confirm your e-mail address for Statewright']);
		expect((await page.request.get(`/dev/outbox/${invitation.id}`)).status()).toBe(404);
	});

	test('sign-up with a taken address answers exactly as for a new one, and tells the owner by mail', async ({
		playwright
	}) => {
		const taken = freshEmail('taken');
		const ctx = await signedUpRequest('Tak En', taken, 'the owner password');
		await ctx.dispose();
		const fresh = freshEmail('fresh');
		const before = await lastMailId(taken);

		const answers = [];
		for (const email of [taken, fresh]) {
			const anon = await playwright.request.newContext({ baseURL: BASE });
			const res = await anon.post('/signup', {
				form: { name: 'Some One', email, password: 'a sign-up password' },
				headers: FORM,
				maxRedirects: 0
			});
			answers.push({
				status: res.status(),
				cookie: res.headers()['set-cookie'],
				body: sameness(await res.text(), email)
			});
			await anon.dispose();
		}
		expect(answers[0].status).toBe(200);
		expect(answers[0].body).toContain('Check your mail');
		expect(answers[0].cookie).toBeUndefined();
		expect(answers[1]).toEqual(answers[0]);

		const notice = await waitForMail(taken, 'Someone tried to sign up', before);
		expect(notice.text).toContain('Hello Tak En');
		expect(linkIn(notice, `${BASE}/reset`)).toBe(`${BASE}/reset`);
		await waitForMail(fresh, 'Confirm your e-mail address');
		// nothing about the existing account changed
		expect(
			(await postFrom('127.0.0.1', '/signin', { email: taken, password: 'the owner password' }))
				.status
		).toBe(303);
		expect(
			(await postFrom('127.0.0.1', '/signin', { email: taken, password: 'a sign-up password' }))
				.status
		).toBe(400);
	});

	test('a reset request answers alike, in like time, for known and unknown addresses', async () => {
		// six accounts, made from one client address; the requests come from another
		const known: string[] = [];
		for (let i = 0; i < 6; i++) {
			const email = freshEmail(`known${i}`);
			const made = await postFrom('127.0.0.31', '/signup', {
				name: `Known ${i}`,
				email,
				password: 'a known password'
			});
			expect(made.status).toBe(200);
			known.push(email);
		}
		const k: number[] = [];
		const u: number[] = [];
		const bodies = new Set<string>();
		for (let i = 0; i < 12; i++) {
			const pair = [
				{ email: known[i % known.length], times: k },
				{ email: freshEmail(`unknown${i}`), times: u }
			];
			if (i % 2 === 1) pair.reverse();
			for (const { email, times } of pair) {
				const after = await lastMailId(email);
				const res = await postFrom('127.0.0.32', '/reset?/request', { email });
				expect(res.status).toBe(200);
				bodies.add(sameness(res.body, email));
				times.push(res.ms);
				// let a known address's mail go out before the next request, so it slows neither kind
				if (times === k) await waitForMail(email, 'Reset your Statewright password', after);
			}
		}
		expect([...bodies]).toHaveLength(1);
		expect([...bodies][0]).toContain('a reset link is on its way');
		const ratio = median(k) / median(u);
		console.log(
			`reset request: median known ${median(k).toFixed(1)} ms, unknown ${median(u).toFixed(1)} ms, ratio ${ratio.toFixed(2)}`
		);
		expect(ratio).toBeGreaterThan(0.5);
		expect(ratio).toBeLessThan(2);
	});

	test('guessing a password slows only the guesser: its owner signs in at once from elsewhere', async ({
		page
	}) => {
		const email = freshEmail('guarded');
		expect(
			(
				await postFrom('127.0.0.41', '/signup', {
					name: 'Gu Arded',
					email,
					password: 'the right password'
				})
			).status
		).toBe(200);

		// the guesser, from 127.0.0.66: five wrong passwords are answered as wrong, then the waits begin
		const statuses: number[] = [];
		let refused: Awaited<ReturnType<typeof postFrom>> | undefined;
		for (let i = 0; i < 12 && !refused; i++) {
			const r = await postFrom('127.0.0.66', '/signin', { email, password: `guess number ${i}` });
			statuses.push(r.status);
			if (r.status === 429) refused = r;
		}
		expect(statuses.slice(0, 5)).toEqual([400, 400, 400, 400, 400]);
		expect(refused, `statuses ${statuses.join(' ')}`).toBeDefined();
		expect(Number(refused!.headers['retry-after'])).toBeGreaterThanOrEqual(1);
		expect(refused!.body).toContain('Too many sign-in attempts. Try again in');

		// the owner, from their own addresses, is let in at once with the right password
		expect(
			(await postFrom('127.0.0.67', '/signin', { email, password: 'the right password' })).status
		).toBe(303);
		await signInPage(page, email, 'the right password');
		// and one wrong try of the owner's is just a wrong password, not a lock
		expect(
			(await postFrom('127.0.0.68', '/signin', { email, password: 'a typo of mine' })).status
		).toBe(400);
	});

	test('whoever runs the server reads every caught message on its console: recipient, subject, links', async ({
		playwright
	}) => {
		// a second copy of the built app, started as the README's `npm start` runs it (scripts/start.mjs):
		// no NODE_ENV, no SMTP_URL, no ORIGIN — plain http on whatever address it is reached by
		const port = ownPort(800);
		const base = `http://127.0.0.1:${port}`;
		const dir = `tmp/e2e-console-${port}`;
		rmSync(dir, { recursive: true, force: true });
		mkdirSync(dir, { recursive: true });
		const env: Record<string, string | undefined> = {
			...process.env,
			PORT: String(port),
			HOST: '127.0.0.1',
			DATABASE_PATH: `${dir}/statewright.db`,
			SEED_DEMO: '0'
		};
		for (const k of ['NODE_ENV', 'SMTP_URL', 'STATEWRIGHT_DEV_TOOLS', 'ORIGIN', 'PROTOCOL_HEADER'])
			delete env[k];
		const child = spawn(process.execPath, ['scripts/start.mjs'], {
			env,
			stdio: ['ignore', 'pipe', 'pipe']
		});
		let out = '';
		child.stdout!.on('data', (c: Buffer) => (out += c.toString('utf8')));
		child.stderr!.on('data', (c: Buffer) => (out += c.toString('utf8')));
		const api = await playwright.request.newContext({ baseURL: base });
		try {
			await expect
				.poll(async () => (await api.get('/healthz').catch(() => null))?.status(), {
					timeout: 30_000
				})
				.toBe(200);
			expect(out).toContain('printed here, each message with its links');
			const email = freshEmail('operator');
			const form = { name: 'Op Erator', email, password: 'an operator password' };
			expect(
				(
					await api.post('/signup', { form, headers: { origin: base, accept: 'text/html' } })
				).status()
			).toBe(200);
			await expect
				.poll(() => out, { timeout: 20_000 })
				.toContain(
					`[statewright] mail caught for ${email}: Confirm your e-mail address for Statewright`
				);
			expect(out).toMatch(
				new RegExp(`\\n  link: ${base.replace(/[.]/g, '\\.')}/verify\\?token=[A-Za-z0-9_-]{43}\\n`)
			);
			expect(
				(
					await api.post('/reset?/request', {
						form: { email },
						headers: { origin: base, accept: 'text/html' }
					})
				).status()
			).toBe(200);
			await expect
				.poll(() => out, { timeout: 20_000 })
				.toContain(`[statewright] mail caught for ${email}: Reset your Statewright password`);
			const printed = out.match(/\n {2}link: (\S+\/reset\?token=\S+)\n/)?.[1];
			expect(printed).toBeDefined();
			// the printed link is the real one: it opens the form to choose a new password
			const page = await api.get(printed!);
			expect(await page.text()).toContain('Choose a new password');
			// plain http without ORIGIN: a browser's own form post is not taken for a cross-site one, and
			// the session cookie is not marked Secure (a browser would drop it on http)
			const signin = await api.post('/signin', {
				form: { email, password: form.password },
				headers: { origin: base, accept: 'text/html' },
				maxRedirects: 0
			});
			expect(signin.status()).toBe(303);
			const cookie = signin.headers()['set-cookie'] ?? '';
			expect(cookie).toMatch(/^statewright_session=/);
			expect(cookie).not.toMatch(/;\s*Secure/i);
			// a client cannot talk the server into https by sending the header itself
			const spoofed = await api.post('/signin', {
				form: { email, password: form.password },
				headers: { origin: base, accept: 'text/html', 'x-statewright-scheme': 'https' },
				maxRedirects: 0
			});
			expect(spoofed.headers()['set-cookie'] ?? '').toMatch(/^statewright_session=/);
		} finally {
			await api.dispose();
			if (child.exitCode === null) await new Promise((r) => child.once('exit', r).kill('SIGTERM'));
			rmSync(dir, { recursive: true, force: true });
		}
	});
});
