import { hash, verify } from '@node-rs/argon2';
import { isUniqueViolation, transaction } from './db/dialect';
import {
	Lucia,
	TimeSpan,
	generateIdFromEntropySize,
	type Adapter,
	type DatabaseSession
} from 'lucia';
import type { Cookies } from '@sveltejs/kit';
import type { DB, SessionRow, User } from './db/schema';
import * as sessions from './db/sessions';
import {
	createUser,
	getUserByEmail,
	getUserById,
	markEmailVerified,
	normalizeEmail,
	setPasswordHash
} from './db/users';
import {
	getEmailToken,
	insertEmailToken,
	markEmailTokenUsed,
	retireEmailTokens
} from './db/email-tokens';
import { AppError } from './errors';
import { newSecret, sha256 } from './secrets';
import {
	addressKey,
	mailLimits,
	retryAfterSeconds,
	signInLimits,
	takeAll,
	type AnyBackoff,
	type AnyLimiter
} from './rate-limit';
import { afterResponse } from './background';
import {
	passwordChangedMail,
	resetPasswordMail,
	signUpAttemptMail,
	verifyEmailMail
} from './mail-templates';
import type { MailMessage } from './mail';

/*
 * Accounts and sessions. Lucia v3 is used only here. Sessions live 30 days and are renewed for
 * another 30 when used in their second half. The cookie carries a random token; the database
 * keeps only its SHA-256 (the custom adapter below hashes on the way in), so a leaked database
 * cannot be replayed as cookies.
 */

export const SESSION_DAYS = 30;
export const RESET_LINK_MINUTES = 60;
export const VERIFY_LINK_HOURS = 48;
export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 256;

// OWASP's argon2id baseline: 19 MiB, 2 passes, 1 lane
const ARGON2 = { memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 };

export function hashPassword(password: string): Promise<string> {
	return hash(password, ARGON2);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
	try {
		return await verify(passwordHash, password);
	} catch {
		return false;
	}
}

let dummyHash: Promise<string> | undefined;
/** Verifies against a throwaway hash so unknown e-mails take as long as wrong passwords. */
async function burnTime(password: string): Promise<void> {
	dummyHash ??= hashPassword(newSecret());
	await verifyPassword(await dummyHash, password);
}

/** Why a password is unacceptable, or null. */
export function passwordProblem(password: string, email?: string): string | null {
	if (password.length < PASSWORD_MIN)
		return `Use at least ${PASSWORD_MIN} characters for the password.`;
	if (password.length > PASSWORD_MAX)
		return `Use at most ${PASSWORD_MAX} characters for the password.`;
	if (email && password.trim().toLowerCase() === normalizeEmail(email))
		return 'The password must not be your e-mail address.';
	if (/^(.)\1*$/.test(password)) return 'The password must not be one character repeated.';
	return null;
}

// ---------------------------------------------------------------- lucia

interface SessionAttributes {
	created_at: number;
	last_seen_at: number;
	ip: string | null;
	user_agent: string | null;
}

function adapterFor(db: DB): Adapter {
	const toLucia = (row: SessionRow): DatabaseSession => ({
		id: row.id,
		userId: row.user_id,
		expiresAt: new Date(row.expires_at),
		attributes: {
			created_at: row.created_at,
			last_seen_at: row.last_seen_at,
			ip: row.ip,
			user_agent: row.user_agent
		}
	});
	return {
		async getSessionAndUser(token) {
			const { session, user } = await sessions.getSessionAndUser(db, sha256(token));
			if (!session) return [null, null];
			if (!user) return [toLucia(session), null];
			return [
				toLucia(session),
				{
					id: user.id,
					attributes: {
						email: user.email,
						name: user.name,
						email_verified_at: user.email_verified_at
					}
				}
			];
		},
		async getUserSessions(userId) {
			return (await sessions.listUserSessions(db, userId)).map(toLucia);
		},
		async setSession(s) {
			const a = s.attributes;
			await sessions.insertSession(db, {
				id: sha256(s.id),
				user_id: s.userId,
				expires_at: s.expiresAt.getTime(),
				created_at: a.created_at,
				last_seen_at: a.last_seen_at,
				ip: a.ip,
				user_agent: a.user_agent
			});
		},
		async updateSessionExpiration(token, expiresAt) {
			await sessions.setSessionExpiry(db, sha256(token), expiresAt.getTime());
		},
		async deleteSession(token) {
			await sessions.deleteSession(db, sha256(token));
		},
		async deleteUserSessions(userId) {
			await sessions.deleteUserSessions(db, userId);
		},
		async deleteExpiredSessions() {
			await sessions.deleteExpiredSessions(db);
		}
	};
}

function makeLucia(db: DB) {
	return new Lucia(adapterFor(db), {
		sessionExpiresIn: new TimeSpan(SESSION_DAYS, 'd'),
		sessionCookie: { attributes: { sameSite: 'lax', path: '/' } },
		getSessionAttributes: (a) => a,
		getUserAttributes: (a) => ({
			email: a.email,
			name: a.name,
			emailVerified: a.email_verified_at !== null
		})
	});
}

declare module 'lucia' {
	interface Register {
		Lucia: ReturnType<typeof makeLucia>;
		DatabaseSessionAttributes: SessionAttributes;
		DatabaseUserAttributes: { email: string; name: string; email_verified_at: number | null };
	}
}

const instances = new WeakMap<DB, ReturnType<typeof makeLucia>>();
function lucia(db: DB) {
	let l = instances.get(db);
	if (!l) instances.set(db, (l = makeLucia(db)));
	return l;
}

// ---------------------------------------------------------------- sessions

export interface SessionUser {
	id: string;
	email: string;
	name: string;
	emailVerified: boolean;
}

export interface SessionInfo {
	/** SHA-256 of the cookie token: what the sessions table and the account page use */
	id: string;
	expiresAt: number;
	/** the expiry moved forward on this request: the cookie must be set again */
	renewed: boolean;
}

export interface ClientMeta {
	ip: string | null;
	userAgent: string | null;
}

export async function createSession(
	db: DB,
	userId: string,
	meta: ClientMeta
): Promise<{ token: string; expiresAt: number }> {
	const now = Date.now();
	const token = generateIdFromEntropySize(25);
	const s = await lucia(db).createSession(
		userId,
		{
			created_at: now,
			last_seen_at: now,
			ip: meta.ip,
			user_agent: meta.userAgent?.slice(0, 300) ?? null
		},
		{ sessionId: token }
	);
	return { token, expiresAt: s.expiresAt.getTime() };
}

const TOUCH_EVERY_MS = 5 * 60_000;

/** The user and session for a cookie token, renewing it when due; null if invalid or expired. */
export async function validateSession(
	db: DB,
	token: string
): Promise<{ user: SessionUser; session: SessionInfo } | null> {
	if (!/^[a-z0-9]{20,64}$/.test(token)) return null;
	const { user, session } = await lucia(db).validateSession(token);
	if (!user || !session) return null;
	const id = sha256(token);
	if (Date.now() - session.last_seen_at > TOUCH_EVERY_MS) await sessions.touchSession(db, id);
	return {
		user: { id: user.id, email: user.email, name: user.name, emailVerified: user.emailVerified },
		session: { id, expiresAt: session.expiresAt.getTime(), renewed: session.fresh }
	};
}

export async function invalidateSession(db: DB, token: string): Promise<void> {
	await lucia(db).invalidateSession(token);
}

/** Signs a user out everywhere, or everywhere but the session `exceptId` (a session row id). */
export async function invalidateUserSessions(
	db: DB,
	userId: string,
	exceptId?: string
): Promise<number> {
	if (exceptId) return sessions.deleteUserSessions(db, userId, exceptId);
	await lucia(db).invalidateUserSessions(userId);
	return 0;
}

/**
 * Cookie name and flags follow the origin: on https the cookie is `Secure` with the `__Host-`
 * prefix (no Domain, Path=/); on plain http (a laptop, `npm start` on a LAN address) it cannot
 * be Secure or browsers would drop it, so it is set without — always HttpOnly, SameSite=Lax.
 */
export function sessionCookieName(url: URL): string {
	return url.protocol === 'https:' ? '__Host-statewright_session' : 'statewright_session';
}

export function setSessionCookie(
	cookies: Cookies,
	url: URL,
	token: string,
	expiresAt: number
): void {
	cookies.set(sessionCookieName(url), token, {
		path: '/',
		httpOnly: true,
		sameSite: 'lax',
		secure: url.protocol === 'https:',
		expires: new Date(expiresAt)
	});
}

/**
 * Signs a user in on this request: ends the session the browser still carried (no fixation),
 * creates a new one and sets its cookie.
 */
export async function startSession(
	db: DB,
	event: { cookies: Cookies; url: URL },
	userId: string,
	meta: ClientMeta
): Promise<void> {
	const previous = event.cookies.get(sessionCookieName(event.url));
	if (previous) await invalidateSession(db, previous);
	const { token, expiresAt } = await createSession(db, userId, meta);
	setSessionCookie(event.cookies, event.url, token, expiresAt);
}

export function clearSessionCookie(cookies: Cookies, url: URL): void {
	cookies.delete(sessionCookieName(url), {
		path: '/',
		httpOnly: true,
		sameSite: 'lax',
		secure: url.protocol === 'https:'
	});
}

// ---------------------------------------------------------------- account flows

export type SendMail = (message: MailMessage) => Promise<unknown>;

export interface FlowContext {
	/** where links in mails point, e.g. https://statewright.example.org */
	origin: string;
	send: SendMail;
	ip: string | null;
}

function tooMany(r: { retryAfterMs: number }, what: string): AppError {
	const s = Number(retryAfterSeconds(r));
	const wait = s >= 90 ? `${Math.ceil(s / 60)} minutes` : `${s} seconds`;
	return new AppError(429, 'rate-limited', `Too many ${what}. Try again in ${wait}.`, undefined, {
		retryAfterMs: r.retryAfterMs
	});
}

/** Sends through the context; an unreachable mail server is a 503 the user can retry, not a crash. */
async function deliver(ctx: FlowContext, message: MailMessage): Promise<void> {
	try {
		await ctx.send(message);
	} catch (e) {
		console.error('[statewright] mail to', message.to, 'failed:', e);
		throw new AppError(
			503,
			'mail-unavailable',
			'The mail could not be sent just now. Try again in a few minutes.'
		);
	}
}

async function limitMail(email: string, ip: string | null, what: string): Promise<void> {
	const r = await takeAll([
		[mailLimits.perAddress, normalizeEmail(email)],
		[mailLimits.perIp, addressKey(ip)]
	]);
	if (!r.allowed) throw tooMany(r, what);
}

/**
 * What a sign-up did. The caller answers both alike ("check your mail"), so the form never tells
 * whether an address has an account: a new address gets an account and a confirmation link; a
 * taken one gets a mail telling its owner that someone tried, with a way to reset the password.
 */
export type SignUpOutcome = { created: true; user: User } | { created: false; user: null };

export async function signUp(
	db: DB,
	input: { name: string; email: string; password: string },
	ctx: FlowContext,
	options: { verified?: boolean } = {}
): Promise<SignUpOutcome> {
	const problem = passwordProblem(input.password, input.email);
	if (problem) throw new AppError(400, 'weak-password', problem, 'password');
	await limitMail(input.email, ctx.ip, 'sign-ups from this address');
	// hashed either way, so a taken address answers in the time a new one takes
	const passwordHash = await hashPassword(input.password);
	const existing = await getUserByEmail(db, input.email);
	let user: User | undefined;
	if (!existing) {
		try {
			user = await createUser(db, {
				email: input.email,
				name: input.name,
				passwordHash,
				emailVerified: options.verified
			});
		} catch (e) {
			// two sign-ups racing for one address: the unique index decides, the loser is told by mail
			if (!isUniqueViolation(e)) throw e;
		}
	}
	if (user) {
		const created = user;
		// the account stands even if the mail does not go out: the user can ask for it again
		if (!options.verified)
			afterResponse('confirmation mail', () =>
				sendVerification(db, created, ctx, { limited: false })
			);
		return { created: true, user };
	}
	const email = input.email;
	afterResponse('sign-up notice', async () => {
		const owner = await getUserByEmail(db, email);
		if (owner)
			await deliver(ctx, {
				to: owner.email,
				...signUpAttemptMail({ name: owner.name, url: `${ctx.origin}/reset` })
			});
	});
	return { created: false, user: null };
}

export interface SignInLimits {
	perAccountAndIp: AnyBackoff;
	perIp: AnyLimiter;
}

/**
 * Checks e-mail and password. Failures slow down this account from this client address only
 * (growing delays), and this client address across accounts; never the account as a whole, so
 * nobody can keep its owner out by guessing wrong on purpose.
 */
export async function signIn(
	db: DB,
	input: { email: string; password: string },
	ip: string | null,
	limits: SignInLimits = signInLimits
): Promise<User> {
	const client = addressKey(ip);
	const pairKey = `${normalizeEmail(input.email)} ${client}`;
	const fromIp = await limits.perIp.take(client);
	if (!fromIp.allowed) throw tooMany(fromIp, 'sign-in attempts from this address');
	const pair = await limits.perAccountAndIp.attempt(pairKey);
	if (!pair.allowed) {
		await limits.perIp.refund(client);
		throw tooMany(pair, 'sign-in attempts');
	}
	const user = await getUserByEmail(db, input.email);
	if (!user) {
		await burnTime(input.password);
	} else if (await verifyPassword(user.password_hash, input.password)) {
		await limits.perAccountAndIp.succeed(pairKey);
		await limits.perIp.refund(client);
		return user;
	}
	throw new AppError(
		400,
		'wrong-credentials',
		'That e-mail address and password do not match an account. Check both, or reset the password.'
	);
}

export async function sendVerification(
	db: DB,
	user: Pick<User, 'id' | 'email' | 'name'>,
	ctx: FlowContext,
	options: { limited?: boolean } = {}
): Promise<void> {
	if (options.limited !== false) await limitMail(user.email, ctx.ip, 'verification mails');
	const token = newSecret();
	const expiresAt = Date.now() + VERIFY_LINK_HOURS * 3600_000;
	await transaction(db, async (trx) => {
		await retireEmailTokens(trx, user.id, 'verify-email');
		await insertEmailToken(trx, {
			userId: user.id,
			purpose: 'verify-email',
			tokenHash: sha256(token),
			email: user.email,
			expiresAt
		});
	});
	const url = `${ctx.origin}/verify?token=${encodeURIComponent(token)}`;
	await deliver(ctx, { to: user.email, ...verifyEmailMail({ name: user.name, url, expiresAt }) });
}

/** Confirms an address from its link. Returns the user; throws when the link is unusable. */
export async function verifyEmail(
	db: DB,
	token: string
): Promise<{ user: User; alreadyVerified: boolean }> {
	const row = await getEmailToken(db, 'verify-email', sha256(token));
	const unusable = new AppError(
		400,
		'link-invalid',
		'This confirmation link is not valid. Ask for a new one from your account page.'
	);
	if (!row) throw unusable;
	const user = await getUserById(db, row.user_id);
	if (!user) throw unusable;
	if (row.used_at !== null) {
		if (user.email_verified_at !== null && user.email === row.email)
			return { user, alreadyVerified: true };
		throw new AppError(
			400,
			'link-used',
			'This confirmation link was already used or replaced by a newer one. Ask for a new one from your account page.'
		);
	}
	if (row.expires_at <= Date.now())
		throw new AppError(
			400,
			'link-expired',
			'This confirmation link has expired. Ask for a new one from your account page.'
		);
	if (row.email !== user.email) throw unusable;
	await transaction(db, async (trx) => {
		await markEmailTokenUsed(trx, row.id);
		await markEmailVerified(trx, user.id, user.email);
	});
	return { user: (await getUserById(db, user.id))!, alreadyVerified: false };
}

/**
 * Answers alike whether or not the address has an account: only the limits (keyed by the address
 * as typed, never by whether it exists) run on the request. Looking the account up, making the
 * link and sending the mail happen after the answer has gone out, so neither the answer nor its
 * timing tells a caller anything. A mail that fails is logged; the person can ask again.
 */
export async function requestPasswordReset(db: DB, email: string, ctx: FlowContext): Promise<void> {
	await limitMail(email, ctx.ip, 'reset requests');
	afterResponse('reset mail', () => sendResetLink(db, email, ctx));
}

async function sendResetLink(db: DB, email: string, ctx: FlowContext): Promise<void> {
	const user = await getUserByEmail(db, email);
	if (!user) return;
	const token = newSecret();
	const expiresAt = Date.now() + RESET_LINK_MINUTES * 60_000;
	await transaction(db, async (trx) => {
		await retireEmailTokens(trx, user.id, 'reset-password');
		await insertEmailToken(trx, {
			userId: user.id,
			purpose: 'reset-password',
			tokenHash: sha256(token),
			email: user.email,
			expiresAt
		});
	});
	const url = `${ctx.origin}/reset?token=${encodeURIComponent(token)}`;
	await deliver(ctx, { to: user.email, ...resetPasswordMail({ name: user.name, url, expiresAt }) });
}

/** The account a reset link belongs to, if the link can still be used. */
export async function checkResetToken(db: DB, token: string): Promise<User> {
	const row = await getEmailToken(db, 'reset-password', sha256(token));
	if (!row)
		throw new AppError(400, 'link-invalid', 'This reset link is not valid. Ask for a new one.');
	if (row.used_at !== null)
		throw new AppError(
			400,
			'link-used',
			'This reset link was already used or replaced by a newer one. Ask for a new one.'
		);
	if (row.expires_at <= Date.now())
		throw new AppError(
			400,
			'link-expired',
			`This reset link has expired (links last ${RESET_LINK_MINUTES} minutes). Ask for a new one.`
		);
	const user = await getUserById(db, row.user_id);
	if (!user || user.email !== row.email)
		throw new AppError(400, 'link-invalid', 'This reset link is not valid. Ask for a new one.');
	return user;
}

/**
 * Sets a new password from a reset link: the link is used up, every other reset link retired,
 * every session of the account ended, and the address counts as confirmed (the mail arrived).
 */
export async function resetPassword(db: DB, token: string, password: string): Promise<User> {
	const user = await checkResetToken(db, token);
	const problem = passwordProblem(password, user.email);
	if (problem) throw new AppError(400, 'weak-password', problem, 'password');
	const passwordHash = await hashPassword(password);
	await transaction(db, async (trx) => {
		const row = await getEmailToken(trx, 'reset-password', sha256(token));
		if (!row || !(await markEmailTokenUsed(trx, row.id))) {
			throw new AppError(400, 'link-used', 'This reset link was already used. Ask for a new one.');
		}
		await setPasswordHash(trx, user.id, passwordHash);
		await retireEmailTokens(trx, user.id, 'reset-password');
		await sessions.deleteUserSessions(trx, user.id);
		await markEmailVerified(trx, user.id, user.email);
	});
	return user;
}

/** Changes the password of a signed-in user and signs out their other sessions. */
export async function changePassword(
	db: DB,
	user: SessionUser,
	input: { current: string; next: string; keepSessionId: string },
	ctx: FlowContext
): Promise<number> {
	const row = await getUserById(db, user.id);
	if (!row) throw new AppError(404, 'not-found', 'Your account no longer exists.');
	if (!(await verifyPassword(row.password_hash, input.current))) {
		throw new AppError(400, 'wrong-password', 'The current password is not right.', 'current');
	}
	const problem = passwordProblem(input.next, row.email);
	if (problem) throw new AppError(400, 'weak-password', problem, 'next');
	const passwordHash = await hashPassword(input.next);
	const ended = await transaction(db, async (trx) => {
		await setPasswordHash(trx, row.id, passwordHash);
		await retireEmailTokens(trx, row.id, 'reset-password');
		return sessions.deleteUserSessions(trx, row.id, input.keepSessionId);
	});
	await deliver(ctx, {
		to: row.email,
		...passwordChangedMail({ name: row.name, url: `${ctx.origin}/reset` })
	}).catch(() => {});
	return ended;
}
