import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
	changePassword,
	createSession,
	hashPassword,
	invalidateSession,
	invalidateUserSessions,
	passwordProblem,
	requestPasswordReset,
	resetPassword,
	sendVerification,
	SESSION_DAYS,
	sessionCookieName,
	signIn,
	signUp,
	startSession,
	validateSession,
	verifyEmail,
	verifyPassword
} from './auth';
import { createBackoff, createLimiter, mailLimits } from './rate-limit';
import { backgroundSettled } from './background';
import { expectAppError, linkIn, setupIntegration } from './testing';
import { getUserByEmail } from './db/users';
import { listUserSessions } from './db/sessions';
import { sha256 } from './secrets';

let env: Awaited<ReturnType<typeof setupIntegration>>;
beforeEach(async () => {
	env = await setupIntegration();
});
afterEach(async () => {
	await env.close();
});

const meta = { ip: '192.0.2.1', userAgent: 'vitest' };
const freshLimits = (now: () => number = Date.now) => ({
	perAccountAndIp: createBackoff({
		free: 5,
		baseMs: 1000,
		maxMs: 15 * 60_000,
		forgetMs: 24 * 3600_000,
		now
	}),
	perIp: createLimiter({ ratePerSecond: 1 / 10, burst: 30, now })
});

/** Signs up an address that must be new; returns its account. */
async function newAccount(...args: Parameters<typeof signUp>) {
	const outcome = await signUp(...args);
	if (!outcome.created) throw new Error(`${args[1].email} was not new`);
	return outcome.user;
}

describe('passwords', () => {
	it('hashes with argon2id and verifies only the right password', async () => {
		const h = await hashPassword('correct horse battery');
		expect(h).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
		expect(await verifyPassword(h, 'correct horse battery')).toBe(true);
		expect(await verifyPassword(h, 'correct horse batterY')).toBe(false);
		expect(await verifyPassword('not a hash', 'x')).toBe(false);
	});

	it('says what is wrong with a weak password', () => {
		expect(passwordProblem('short')).toMatch(/at least 10/);
		expect(passwordProblem('a'.repeat(257))).toMatch(/at most 256/);
		expect(passwordProblem('aaaaaaaaaaaa')).toMatch(/repeated/);
		expect(passwordProblem('me@example.com', 'ME@example.com')).toMatch(/e-mail/);
		expect(passwordProblem('a sensible passphrase')).toBeNull();
	});
});

describe('sign-up and sign-in', () => {
	it('signs up, mails a confirmation link, and signs in', async () => {
		const u = await newAccount(
			env.db,
			{ name: 'Ines Duarte', email: 'Ines@Example.com', password: 'long enough pass' },
			env.ctx
		);
		expect(u.email).toBe('ines@example.com');
		expect(u.email_verified_at).toBeNull();
		expect(u.password_hash).not.toContain('long enough pass');
		const [mail] = await env.mailTo('ines@example.com');
		expect(mail.subject).toBe('Confirm your e-mail address for Statewright');
		expect(
			(
				await signIn(
					env.db,
					{ email: 'INES@example.com', password: 'long enough pass' },
					'192.0.2.1',
					freshLimits()
				)
			).id
		).toBe(u.id);
	});

	it('answers a taken address as a new one and tells its owner by mail, changing nothing', async () => {
		const a = await newAccount(
			env.db,
			{ name: 'Ada Owner', email: 'a@example.com', password: 'long enough pass' },
			env.ctx
		);
		expect((await env.mailTo('a@example.com')).map((m) => m.subject)).toEqual([
			'Confirm your e-mail address for Statewright'
		]);
		const again = await signUp(
			env.db,
			{ name: 'Mallory', email: 'A@example.com', password: 'another long one' },
			env.ctx
		);
		expect(again).toEqual({ created: false, user: null });
		const [notice] = await env.mailTo('a@example.com');
		expect(notice.subject).toBe('Someone tried to sign up to Statewright with your address');
		expect(notice.text).toContain('Hello Ada Owner');
		expect(linkIn(notice.text, 'http://statewright.test/reset')).toBe(
			'http://statewright.test/reset'
		);
		// the account is untouched: same id, name and password
		const row = await getUserByEmail(env.db, 'a@example.com');
		expect(row?.id).toBe(a.id);
		expect(row?.name).toBe('Ada Owner');
		expect(await verifyPassword(row!.password_hash, 'long enough pass')).toBe(true);
		expect(await verifyPassword(row!.password_hash, 'another long one')).toBe(false);
	});

	it('refuses a weak password and a wrong password', async () => {
		await newAccount(
			env.db,
			{ name: 'A', email: 'a@example.com', password: 'long enough pass' },
			env.ctx
		);
		const weak = await expectAppError(
			signUp(env.db, { name: 'C', email: 'c@example.com', password: 'short' }, env.ctx),
			400,
			'weak-password'
		);
		expect(weak.field).toBe('password');
		expect(await getUserByEmail(env.db, 'c@example.com')).toBeUndefined();
		const wrong = await expectAppError(
			signIn(
				env.db,
				{ email: 'a@example.com', password: 'not the password' },
				'192.0.2.1',
				freshLimits()
			),
			400,
			'wrong-credentials'
		);
		// the same answer for an unknown address: no account probing
		const unknown = await expectAppError(
			signIn(
				env.db,
				{ email: 'nobody@example.com', password: 'not the password' },
				'192.0.2.1',
				freshLimits()
			),
			400,
			'wrong-credentials'
		);
		expect(unknown.message).toBe(wrong.message);
	});

	it('slows guessing per account and client address with growing delays, never locking the owner out elsewhere', async () => {
		await newAccount(
			env.db,
			{ name: 'R', email: 'r@example.com', password: 'the right password' },
			env.ctx
		);
		let t = 1_000_000;
		const limits = freshLimits(() => t);
		const attacker = '203.0.113.66';
		const owner = '192.0.2.1';
		// successes count nothing: ten good sign-ins never slow anyone
		for (let i = 0; i < 10; i++)
			await signIn(
				env.db,
				{ email: 'r@example.com', password: 'the right password' },
				owner,
				limits
			);
		// five free failures from the attacker's address
		for (let i = 0; i < 5; i++)
			await expectAppError(
				signIn(env.db, { email: 'r@example.com', password: `guess ${i}` }, attacker, limits),
				400,
				'wrong-credentials'
			);
		// then each failure doubles the wait: 1 s, 2 s, 4 s, 8 s, …
		const waits: number[] = [];
		for (let i = 0; i < 6; i++) {
			const refused = await expectAppError(
				signIn(env.db, { email: 'r@example.com', password: 'another guess' }, attacker, limits),
				429,
				'rate-limited'
			);
			waits.push(refused.retryAfterMs!);
			expect(refused.message).toMatch(/Try again in \d+ seconds/);
			t += refused.retryAfterMs!;
			await expectAppError(
				signIn(env.db, { email: 'r@example.com', password: 'another guess' }, attacker, limits),
				400,
				'wrong-credentials'
			);
			// the owner, from their own address, signs in at once every time
			expect(
				(
					await signIn(
						env.db,
						{ email: 'r@example.com', password: 'the right password' },
						owner,
						limits
					)
				).email
			).toBe('r@example.com');
		}
		expect(waits).toEqual([1000, 2000, 4000, 8000, 16_000, 32_000]);
		// refused tries do not count: hammering while waiting does not make the wait longer
		for (let i = 0; i < 20; i++)
			await expectAppError(
				signIn(env.db, { email: 'r@example.com', password: 'x' }, attacker, limits),
				429,
				'rate-limited'
			);
		expect(limits.perAccountAndIp.failures(`r@example.com ${attacker}`)).toBe(11);
		// the wait never exceeds 15 minutes, and a day's quiet forgets the failures
		for (let i = 0; i < 10; i++) {
			t += 15 * 60_000;
			await expectAppError(
				signIn(env.db, { email: 'r@example.com', password: 'x' }, attacker, limits),
				400,
				'wrong-credentials'
			);
		}
		const capped = await expectAppError(
			signIn(env.db, { email: 'r@example.com', password: 'x' }, attacker, limits),
			429,
			'rate-limited'
		);
		expect(capped.retryAfterMs).toBe(15 * 60_000);
		t += 24 * 3600_000;
		await expectAppError(
			signIn(env.db, { email: 'r@example.com', password: 'x' }, attacker, limits),
			400,
			'wrong-credentials'
		);
		expect(limits.perAccountAndIp.failures(`r@example.com ${attacker}`)).toBe(1);
	});

	it('the right password from the guessing address waits too, and a success starts that address afresh', async () => {
		await newAccount(
			env.db,
			{ name: 'R', email: 'r@example.com', password: 'the right password' },
			env.ctx
		);
		let t = 5_000_000;
		const limits = freshLimits(() => t);
		for (let i = 0; i < 5; i++)
			await expectAppError(
				signIn(env.db, { email: 'r@example.com', password: 'wrong' }, '192.0.2.9', limits),
				400,
				'wrong-credentials'
			);
		const waiting = await expectAppError(
			signIn(
				env.db,
				{ email: 'r@example.com', password: 'the right password' },
				'192.0.2.9',
				limits
			),
			429,
			'rate-limited'
		);
		t += waiting.retryAfterMs!;
		await signIn(
			env.db,
			{ email: 'r@example.com', password: 'the right password' },
			'192.0.2.9',
			limits
		);
		expect(limits.perAccountAndIp.failures('r@example.com 192.0.2.9')).toBe(0);
	});

	it('limits one address trying many accounts', async () => {
		// a stopped clock: thirty slow password checks on a loaded machine must not refill the bucket
		const t = Date.now();
		const limits = freshLimits(() => t);
		for (let i = 0; i < 30; i++)
			await expectAppError(
				signIn(env.db, { email: `u${i}@example.com`, password: 'x' }, '198.51.100.7', limits),
				400,
				'wrong-credentials'
			);
		await expectAppError(
			signIn(env.db, { email: 'fresh@example.com', password: 'x' }, '198.51.100.7', limits),
			429,
			'rate-limited'
		);
		// another address is unaffected
		await expectAppError(
			signIn(env.db, { email: 'fresh@example.com', password: 'x' }, '198.51.100.8', limits),
			400,
			'wrong-credentials'
		);
	});
});

describe('sessions', () => {
	it('stores only a hash of the token and validates it', async () => {
		const u = await newAccount(
			env.db,
			{ name: 'S', email: 's@example.com', password: 'long enough pass' },
			env.ctx
		);
		const { token, expiresAt } = await createSession(env.db, u.id, meta);
		expect(token).toMatch(/^[a-z0-9]{40}$/);
		expect(expiresAt - Date.now()).toBeGreaterThan((SESSION_DAYS - 1) * 86_400_000);
		const [row] = await listUserSessions(env.db, u.id);
		expect(row.id).toBe(sha256(token));
		expect(row.id).not.toBe(token);
		expect(row.ip).toBe('192.0.2.1');
		const v = await validateSession(env.db, token);
		expect(v?.user).toEqual({ id: u.id, email: 's@example.com', name: 'S', emailVerified: false });
		expect(v?.session.renewed).toBe(false);
		// the stored hash is not itself a valid cookie value
		expect(await validateSession(env.db, row.id)).toBeNull();
		expect(await validateSession(env.db, 'garbage!')).toBeNull();
	});

	it('renews a session used in its second half and drops an expired one', async () => {
		const u = await newAccount(
			env.db,
			{ name: 'S', email: 's@example.com', password: 'long enough pass' },
			env.ctx
		);
		const { token } = await createSession(env.db, u.id, meta);
		const id = sha256(token);
		await env.db
			.updateTable('sessions')
			.set({ expires_at: Date.now() + 10 * 86_400_000 })
			.where('id', '=', id)
			.execute();
		const v = await validateSession(env.db, token);
		expect(v?.session.renewed).toBe(true);
		expect(v!.session.expiresAt - Date.now()).toBeGreaterThan(29 * 86_400_000);
		await env.db
			.updateTable('sessions')
			.set({ expires_at: Date.now() - 1 })
			.where('id', '=', id)
			.execute();
		expect(await validateSession(env.db, token)).toBeNull();
		expect(await listUserSessions(env.db, u.id)).toEqual([]);
	});

	it('signs out one session, the others, or everywhere', async () => {
		const u = await newAccount(
			env.db,
			{ name: 'S', email: 's@example.com', password: 'long enough pass' },
			env.ctx
		);
		const a = await createSession(env.db, u.id, meta);
		const b = await createSession(env.db, u.id, meta);
		const c = await createSession(env.db, u.id, meta);
		await invalidateSession(env.db, a.token);
		expect(await validateSession(env.db, a.token)).toBeNull();
		expect(await invalidateUserSessions(env.db, u.id, sha256(b.token))).toBe(1);
		expect(await validateSession(env.db, b.token)).not.toBeNull();
		expect(await validateSession(env.db, c.token)).toBeNull();
		await invalidateUserSessions(env.db, u.id);
		expect(await validateSession(env.db, b.token)).toBeNull();
	});

	it('starting a session on sign-in ends the one the browser still carried', async () => {
		const u = await newAccount(
			env.db,
			{ name: 'F', email: 'f@example.com', password: 'long enough pass' },
			env.ctx
		);
		const jar = new Map<string, string>();
		const cookies = {
			get: (name: string) => jar.get(name),
			set: (name: string, value: string, opts: { secure?: boolean; httpOnly?: boolean }) => {
				expect(opts).toMatchObject({ secure: false, httpOnly: true });
				jar.set(name, value);
			}
		} as unknown as import('@sveltejs/kit').Cookies;
		const url = new URL('http://statewright.test/signin');
		const first = await createSession(env.db, u.id, meta);
		jar.set('statewright_session', first.token);
		await startSession(env.db, { cookies, url }, u.id, meta);
		const second = jar.get('statewright_session')!;
		expect(second).not.toBe(first.token);
		expect(await validateSession(env.db, first.token)).toBeNull();
		expect(await validateSession(env.db, second)).not.toBeNull();
	});

	it('names the cookie by the origin: __Host- and Secure only on https', () => {
		expect(sessionCookieName(new URL('https://sw.example.org/'))).toBe(
			'__Host-statewright_session'
		);
		expect(sessionCookieName(new URL('http://192.168.1.20:3000/'))).toBe('statewright_session');
	});
});

describe('e-mail verification', () => {
	it('confirms the address from the mailed link, once', async () => {
		const u = await newAccount(
			env.db,
			{ name: 'V', email: 'v@example.com', password: 'long enough pass' },
			env.ctx
		);
		const [mail] = await env.mailTo('v@example.com');
		const token = new URL(
			linkIn(mail.text, 'http://statewright.test/verify?token=')
		).searchParams.get('token')!;
		const first = await verifyEmail(env.db, token);
		expect(first.alreadyVerified).toBe(false);
		expect(first.user.email_verified_at).not.toBeNull();
		expect((await verifyEmail(env.db, token)).alreadyVerified).toBe(true);
		await expectAppError(verifyEmail(env.db, 'made-up'), 400, 'link-invalid');
		expect(u.id).toBe(first.user.id);
	});

	it('retires the old link when a new one is sent, and refuses an expired one', async () => {
		const u = await newAccount(
			env.db,
			{ name: 'V', email: 'v@example.com', password: 'long enough pass' },
			env.ctx
		);
		await backgroundSettled();
		await sendVerification(env.db, u, env.ctx);
		const mails = await env.mailTo('v@example.com');
		expect(mails).toHaveLength(2);
		const newest = new URL(
			linkIn(mails[0].text, 'http://statewright.test/verify')
		).searchParams.get('token')!;
		const oldest = new URL(
			linkIn(mails[1].text, 'http://statewright.test/verify')
		).searchParams.get('token')!;
		await expectAppError(verifyEmail(env.db, oldest), 400, 'link-used');
		await env.db
			.updateTable('email_tokens')
			.set({ expires_at: Date.now() - 1 })
			.where('token_hash', '=', sha256(newest))
			.execute();
		await expectAppError(verifyEmail(env.db, newest), 400, 'link-expired');
	});
});

describe('password reset by e-mail', () => {
	it('mails a one-time link that sets a new password and ends every session', async () => {
		const u = await newAccount(
			env.db,
			{ name: 'P', email: 'p@example.com', password: 'old password here' },
			env.ctx
		);
		// the confirmation mail goes out first (on PostgreSQL the two background mails could race)
		await backgroundSettled();
		const s = await createSession(env.db, u.id, meta);
		await requestPasswordReset(env.db, 'P@example.com', env.ctx);
		// the sign-up's confirmation and the reset link go out at once, in either order
		const mail = (await env.mailTo('p@example.com')).find((m) => m.subject.startsWith('Reset'));
		expect(mail?.subject).toBe('Reset your Statewright password');
		const token = new URL(
			linkIn(mail!.text, 'http://statewright.test/reset?token=')
		).searchParams.get('token')!;
		await expectAppError(resetPassword(env.db, token, 'short'), 400, 'weak-password');
		await resetPassword(env.db, token, 'brand new password');
		expect(await validateSession(env.db, s.token)).toBeNull();
		await expectAppError(
			signIn(
				env.db,
				{ email: 'p@example.com', password: 'old password here' },
				null,
				freshLimits()
			),
			400,
			'wrong-credentials'
		);
		await signIn(
			env.db,
			{ email: 'p@example.com', password: 'brand new password' },
			null,
			freshLimits()
		);
		// the mail proved the address
		expect((await getUserByEmail(env.db, 'p@example.com'))?.email_verified_at).not.toBeNull();
		// used up
		await expectAppError(resetPassword(env.db, token, 'another new password'), 400, 'link-used');
	});

	it('answers alike when the mail server cannot be reached (the failure is logged), and sign-up still stands', async () => {
		const down = { ...env.ctx, send: async () => Promise.reject(new Error('ECONNREFUSED')) };
		const logged = vi.spyOn(console, 'error').mockImplementation(() => {});
		try {
			const u = await newAccount(
				env.db,
				{ name: 'D', email: 'd@example.com', password: 'long enough pass' },
				down
			);
			expect(u.email).toBe('d@example.com');
			await requestPasswordReset(env.db, 'd@example.com', down);
			await backgroundSettled();
			expect(logged.mock.calls.map((c) => String(c[0]))).toEqual(
				expect.arrayContaining([
					expect.stringContaining('reset mail failed'),
					expect.stringContaining('confirmation mail failed')
				])
			);
		} finally {
			logged.mockRestore();
		}
		expect(await getUserByEmail(env.db, 'd@example.com')).toBeDefined();
	});

	it('says nothing for an unknown address and refuses an expired link', async () => {
		await requestPasswordReset(env.db, 'ghost@example.com', env.ctx);
		expect(await env.mailTo('ghost@example.com')).toEqual([]);
		await newAccount(
			env.db,
			{ name: 'P', email: 'p@example.com', password: 'old password here' },
			env.ctx
		);
		await requestPasswordReset(env.db, 'p@example.com', env.ctx);
		// the sign-up's confirmation and the reset link go out at once, in either order
		const mail = (await env.mailTo('p@example.com')).find((m) => m.subject.startsWith('Reset'));
		expect(mail?.subject).toBe('Reset your Statewright password');
		const token = new URL(linkIn(mail!.text, 'http://statewright.test/reset')).searchParams.get(
			'token'
		)!;
		await env.db
			.updateTable('email_tokens')
			.set({ expires_at: Date.now() - 1 })
			.where('token_hash', '=', sha256(token))
			.execute();
		await expectAppError(resetPassword(env.db, token, 'brand new password'), 400, 'link-expired');
	});

	it('answers before looking anything up: the mail goes out after the answer', async () => {
		await newAccount(
			env.db,
			{ name: 'P', email: 'p@example.com', password: 'old password here' },
			env.ctx
		);
		await backgroundSettled();
		const sent: string[] = [];
		const watched = {
			...env.ctx,
			send: async (m: { to: string; subject: string; text: string }) => (
				sent.push(m.to),
				env.ctx.send(m)
			)
		};
		const tokens = () =>
			env.db
				.selectFrom('email_tokens')
				.select('id')
				.where('purpose', '=', 'reset-password')
				.execute();
		await requestPasswordReset(env.db, 'p@example.com', watched);
		// the answer is back: no link made, no mail sent yet
		expect(sent).toEqual([]);
		expect(await tokens()).toHaveLength(0);
		await backgroundSettled();
		expect(sent).toEqual(['p@example.com']);
		expect(await tokens()).toHaveLength(1);
	});

	it('takes as long for an unknown address as for a known one (ratio of medians, no absolute times)', async () => {
		const hash = await hashPassword('a known password');
		const known: string[] = [];
		for (let i = 0; i < 9; i++) {
			const email = `known${i}@example.com`;
			await env.db
				.insertInto('users')
				.values({
					id: `k${i}`.padEnd(16, 'x'),
					email,
					name: `K${i}`,
					password_hash: hash,
					email_verified_at: null,
					created_at: 1,
					updated_at: 1
				})
				.execute();
			known.push(email);
		}
		const unknown = known.map((_, i) => `unknown${i}@example.com`);
		// one request's time on the request path; the per-address limit is reset first, as for a fresh address
		const time = async (email: string) => {
			mailLimits.perAddress.reset();
			mailLimits.perIp.reset();
			const start = performance.now();
			await requestPasswordReset(env.db, email, env.ctx);
			return performance.now() - start;
		};
		const k: number[] = [];
		const u: number[] = [];
		// known and unknown interleaved (alternating which goes first), after a warm-up that is not counted
		for (let i = -10; i < 101; i++) {
			const [a, b] =
				i % 2 === 0
					? [known[Math.abs(i) % known.length], unknown[Math.abs(i) % known.length]]
					: [unknown[Math.abs(i) % known.length], known[Math.abs(i) % known.length]];
			const ta = await time(a);
			const tb = await time(b);
			if (i < 0) continue;
			(a.startsWith('known') ? k : u).push(ta);
			(b.startsWith('known') ? k : u).push(tb);
		}
		await backgroundSettled();
		const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
		const ratio = median(k) / median(u);
		expect(ratio).toBeGreaterThan(0.5);
		expect(ratio).toBeLessThan(2);
		// and the known addresses did get their links
		expect((await env.mailTo(known[0])).map((m) => m.subject)).toContain(
			'Reset your Statewright password'
		);
		expect(await env.mailTo(unknown[0])).toEqual([]);
	});

	it('limits reset mails per address', async () => {
		await newAccount(
			env.db,
			{ name: 'P', email: 'p@example.com', password: 'old password here' },
			env.ctx
		);
		// sign-up used one of the three; two more are allowed
		await requestPasswordReset(env.db, 'p@example.com', env.ctx);
		await requestPasswordReset(env.db, 'p@example.com', env.ctx);
		await expectAppError(
			requestPasswordReset(env.db, 'p@example.com', env.ctx),
			429,
			'rate-limited'
		);
	});
});

describe('changing the password', () => {
	it('needs the current password, keeps this session, ends the others and sends a notice', async () => {
		const u = await newAccount(
			env.db,
			{ name: 'C', email: 'c@example.com', password: 'first password' },
			env.ctx
		);
		const keep = await createSession(env.db, u.id, meta);
		const other = await createSession(env.db, u.id, meta);
		const user = (await validateSession(env.db, keep.token))!.user;
		await expectAppError(
			changePassword(
				env.db,
				user,
				{ current: 'nope', next: 'second password', keepSessionId: sha256(keep.token) },
				env.ctx
			),
			400,
			'wrong-password'
		);
		expect(
			await changePassword(
				env.db,
				user,
				{ current: 'first password', next: 'second password', keepSessionId: sha256(keep.token) },
				env.ctx
			)
		).toBe(1);
		expect(await validateSession(env.db, keep.token)).not.toBeNull();
		expect(await validateSession(env.db, other.token)).toBeNull();
		expect((await env.mailTo('c@example.com')).map((m) => m.subject)).toContain(
			'Your Statewright password was changed'
		);
	});
});
