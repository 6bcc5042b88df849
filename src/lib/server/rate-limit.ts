import type { DB } from './db/schema';
import { deleteCounters, stepCounter, type CounterRow } from './db/rate-limits';

/**
 * In-memory token-bucket rate limiting, one bucket per key (an IP, an e-mail, a token id…).
 *
 * A bucket holds at most `burst` tokens and refills continuously at `ratePerSecond`. Each
 * request `take`s one token (or `cost`); with none left the answer says how long until one is
 * back. `ratePerSecond <= 0` switches a limiter off (every take is allowed), which is what
 * `COMPUTE_RATE_LIMIT=0` means.
 *
 * State lives in this process only: a restart forgets it, and several processes would each
 * keep their own (the app's own limits move to the database with shareLimitsThrough, below). Idle keys are dropped once their bucket has refilled, and at most `maxKeys`
 * are kept (least recently used go first), so an attacker cycling keys cannot grow memory.
 *
 * Usage:
 *   const limiter = createLimiter({ ratePerSecond: 100, burst: 200 });
 *   const r = limiter.take(clientAddress);
 *   if (!r.allowed) return new Response(..., { status: 429, headers: { 'retry-after': retryAfterSeconds(r) } });
 */

export type TakeResult =
	{ allowed: true; remaining: number } | { allowed: false; retryAfterMs: number };

export interface LimiterOptions {
	/** tokens added per second; <= 0 turns the limiter off */
	ratePerSecond: number;
	/** bucket size: how many requests may come at once after a quiet spell */
	burst: number;
	/** keys kept at most (default 50 000) */
	maxKeys?: number;
	/** clock in ms, for tests */
	now?: () => number;
}

export interface Limiter {
	take(key: string, cost?: number): TakeResult;
	/** gives tokens back, e.g. after a successful sign-in so only failures count */
	refund(key: string, amount?: number): void;
	/** tokens available now, without taking any */
	available(key: string): number;
	/** forgets one key, or every key */
	reset(key?: string): void;
	readonly size: number;
	readonly enabled: boolean;
}

interface Bucket {
	tokens: number;
	at: number;
}

export function createLimiter(options: LimiterOptions): Limiter {
	const { ratePerSecond, burst } = options;
	if (!(burst >= 1) || !Number.isFinite(burst))
		throw new RangeError('burst must be a finite number >= 1');
	if (!Number.isFinite(ratePerSecond)) throw new RangeError('ratePerSecond must be finite');
	const enabled = ratePerSecond > 0;
	const maxKeys = options.maxKeys ?? 50_000;
	const now = options.now ?? Date.now;
	const perMs = ratePerSecond / 1000;
	const buckets = new Map<string, Bucket>();
	const fullAfterMs = enabled ? burst / perMs : 0;
	let takesSinceSweep = 0;

	function level(b: Bucket, t: number): number {
		return Math.min(burst, b.tokens + (t - b.at) * perMs);
	}

	function sweep(t: number) {
		for (const [k, b] of buckets) if (t - b.at >= fullAfterMs) buckets.delete(k);
	}

	function store(key: string, b: Bucket) {
		buckets.delete(key); // re-insert so Map order is least-recently-used first
		buckets.set(key, b);
		if (buckets.size > maxKeys) buckets.delete(buckets.keys().next().value as string);
	}

	return {
		get size() {
			return buckets.size;
		},
		enabled,
		take(key, cost = 1) {
			if (!enabled) return { allowed: true, remaining: burst };
			const t = now();
			if (++takesSinceSweep >= 1000) {
				takesSinceSweep = 0;
				sweep(t);
			}
			const b = buckets.get(key);
			const tokens = b ? level(b, t) : burst;
			if (tokens >= cost) {
				store(key, { tokens: tokens - cost, at: t });
				return { allowed: true, remaining: Math.floor(tokens - cost) };
			}
			store(key, { tokens, at: t });
			return { allowed: false, retryAfterMs: Math.ceil((cost - tokens) / perMs) };
		},
		refund(key, amount = 1) {
			const b = buckets.get(key);
			if (!enabled || !b) return;
			const t = now();
			b.tokens = Math.min(burst, level(b, t) + amount);
			b.at = t;
		},
		available(key) {
			if (!enabled) return burst;
			const b = buckets.get(key);
			return b ? Math.floor(level(b, now())) : burst;
		},
		reset(key) {
			if (key === undefined) buckets.clear();
			else buckets.delete(key);
		}
	};
}

/** Whole seconds for a Retry-After header (at least 1). */
export function retryAfterSeconds(r: { retryAfterMs: number }): string {
	return String(Math.max(1, Math.ceil(r.retryAfterMs / 1000)));
}

/**
 * Takes one token from each (limiter, key) pair, or none: if any refuses, the tokens already
 * taken are given back and the longest wait is returned.
 */
export async function takeAll(
	pairs: ReadonlyArray<readonly [AnyLimiter, string]>
): Promise<TakeResult> {
	const taken: Array<readonly [AnyLimiter, string]> = [];
	let wait = 0;
	for (const pair of pairs) {
		const r = await pair[0].take(pair[1]);
		if (r.allowed) taken.push(pair);
		else wait = Math.max(wait, r.retryAfterMs);
	}
	if (wait > 0) {
		for (const [l, k] of taken) await l.refund(k);
		return { allowed: false, retryAfterMs: wait };
	}
	return { allowed: true, remaining: 0 };
}

export async function refundAll(
	pairs: ReadonlyArray<readonly [AnyLimiter, string]>
): Promise<void> {
	for (const [l, k] of pairs) await l.refund(k);
}

/**
 * The key a client address is counted under. IPv4 as it is (also when written IPv4-mapped);
 * IPv6 by its /64 prefix, since one subscriber or host usually holds a whole /64 and could
 * otherwise step to a fresh address, and a fresh budget, at will.
 */
export function addressKey(ip: string | null): string {
	if (!ip) return 'unknown';
	const mapped = /^::ffff:(\d{1,3}(?:\.\d{1,3}){3})$/i.exec(ip);
	if (mapped) return mapped[1];
	if (!ip.includes(':')) return ip;
	const bare = ip.split('%')[0].toLowerCase();
	const [head, tail] = bare.split('::');
	const h = head ? head.split(':') : [];
	const t = tail === undefined ? [] : tail ? tail.split(':') : [];
	const groups =
		tail === undefined
			? h
			: [...h, ...Array<string>(Math.max(0, 8 - h.length - t.length)).fill('0'), ...t];
	return `${groups
		.slice(0, 4)
		.map((g) => (parseInt(g, 16) || 0).toString(16))
		.join(':')}::/64`;
}

export interface BackoffOptions {
	/** failures allowed before any wait */
	free: number;
	/** the first wait; each further failure doubles it */
	baseMs: number;
	/** the longest wait */
	maxMs: number;
	/** a key quiet this long starts afresh */
	forgetMs: number;
	/** keys kept at most (default 50 000; least recently used go first) */
	maxKeys?: number;
	/** clock in ms, for tests */
	now?: () => number;
}

export interface Backoff {
	/**
	 * Counts one attempt for `key` as a failure, or refuses it while the key must wait. The failure
	 * is counted up front, so attempts sent at once cannot slip past it; `succeed` forgets the key.
	 */
	attempt(key: string): TakeResult;
	/** a successful attempt: the key starts afresh */
	succeed(key: string): void;
	/** failures counted for a key (0 once forgotten) */
	failures(key: string): number;
	reset(key?: string): void;
	readonly size: number;
}

/**
 * Growing delays per key: `free` failures cost nothing, then each failure makes the key wait
 * `baseMs`, 2·`baseMs`, 4·`baseMs`, … up to `maxMs` before its next attempt. Refused attempts do
 * not count. A key never gets locked for good: it waits at most `maxMs`.
 */
export function createBackoff(options: BackoffOptions): Backoff {
	const { free, baseMs, maxMs, forgetMs } = options;
	const maxKeys = options.maxKeys ?? 50_000;
	const now = options.now ?? Date.now;
	const entries = new Map<string, { failures: number; at: number }>();

	const waitAfter = (failures: number) =>
		failures < free ? 0 : Math.min(maxMs, baseMs * 2 ** Math.min(failures - free, 40));
	function current(key: string, t: number) {
		const e = entries.get(key);
		if (e && t - e.at >= forgetMs) {
			entries.delete(key);
			return undefined;
		}
		return e;
	}

	return {
		get size() {
			return entries.size;
		},
		attempt(key) {
			const t = now();
			const e = current(key, t);
			const failures = e?.failures ?? 0;
			if (e) {
				const readyAt = e.at + waitAfter(failures);
				if (t < readyAt) return { allowed: false, retryAfterMs: readyAt - t };
			}
			entries.delete(key);
			entries.set(key, { failures: failures + 1, at: t });
			if (entries.size > maxKeys) entries.delete(entries.keys().next().value as string);
			return { allowed: true, remaining: Math.max(0, free - failures - 1) };
		},
		succeed(key) {
			entries.delete(key);
		},
		failures(key) {
			return current(key, now())?.failures ?? 0;
		},
		reset(key) {
			if (key === undefined) entries.clear();
			else entries.delete(key);
		}
	};
}

type MaybePromise<T> = T | Promise<T>;

/** A token bucket kept in memory (createLimiter) or in the database (createSharedLimiter). */
export interface AnyLimiter {
	take(key: string, cost?: number): MaybePromise<TakeResult>;
	refund(key: string, amount?: number): MaybePromise<void>;
	reset(key?: string): MaybePromise<void>;
	readonly enabled: boolean;
}

/** Growing delays kept in memory (createBackoff) or in the database (createSharedBackoff). */
export interface AnyBackoff {
	attempt(key: string): MaybePromise<TakeResult>;
	succeed(key: string): MaybePromise<void>;
	failures(key: string): MaybePromise<number>;
	reset(key?: string): MaybePromise<void>;
}

/**
 * A token bucket per key in the `rate_limits` table, so every app process on one database
 * counts against the same budget. Same arithmetic as createLimiter.
 */
export function createSharedLimiter(
	db: () => DB,
	name: string,
	options: Omit<LimiterOptions, 'maxKeys'>
): AnyLimiter {
	const { ratePerSecond, burst } = options;
	const now = options.now ?? Date.now;
	const perMs = ratePerSecond / 1000;
	const enabled = ratePerSecond > 0;
	const level = (row: CounterRow | undefined, t: number) =>
		row ? Math.min(burst, row.tokens + Math.max(0, t - row.at) * perMs) : burst;
	return {
		enabled,
		take(key, cost = 1) {
			if (!enabled) return { allowed: true, remaining: burst };
			const t = now();
			return stepCounter<TakeResult>(db(), name, key, (row) => {
				const tokens = level(row, t);
				if (tokens >= cost)
					return {
						next: { tokens: tokens - cost, failures: 0, at: t },
						result: { allowed: true, remaining: Math.floor(tokens - cost) }
					};
				return {
					next: { tokens, failures: 0, at: t },
					result: { allowed: false, retryAfterMs: Math.ceil((cost - tokens) / perMs) }
				};
			});
		},
		async refund(key, amount = 1) {
			if (!enabled) return;
			const t = now();
			await stepCounter(db(), name, key, (row) => ({
				next: row ? { tokens: Math.min(burst, level(row, t) + amount), failures: 0, at: t } : null,
				result: undefined
			}));
		},
		reset: (key) => deleteCounters(db(), name, key)
	};
}

/** Growing delays per key in the `rate_limits` table, shared by every app process; as createBackoff. */
export function createSharedBackoff(
	db: () => DB,
	name: string,
	options: Omit<BackoffOptions, 'maxKeys'>
): AnyBackoff {
	const { free, baseMs, maxMs, forgetMs } = options;
	const now = options.now ?? Date.now;
	const waitAfter = (failures: number) =>
		failures < free ? 0 : Math.min(maxMs, baseMs * 2 ** Math.min(failures - free, 40));
	const live = (row: CounterRow | undefined, t: number) =>
		row && t - row.at < forgetMs ? row : undefined;
	return {
		attempt(key) {
			const t = now();
			return stepCounter<TakeResult>(db(), name, key, (found) => {
				const row = live(found, t);
				const failures = row?.failures ?? 0;
				if (row) {
					const readyAt = row.at + waitAfter(failures);
					if (t < readyAt)
						return { next: row, result: { allowed: false, retryAfterMs: readyAt - t } };
				}
				return {
					next: { tokens: 0, failures: failures + 1, at: t },
					result: { allowed: true, remaining: Math.max(0, free - failures - 1) }
				};
			});
		},
		succeed: (key) => deleteCounters(db(), name, key),
		failures(key) {
			const t = now();
			return stepCounter(db(), name, key, (found) => ({
				next: found ?? null,
				result: live(found, t)?.failures ?? 0
			}));
		},
		reset: (key) => deleteCounters(db(), name, key)
	};
}

let sharedDb: DB | undefined;

/**
 * Keeps the app's limits (sign-in, mail, invitations, compute) in this database from now on, so
 * that several app processes on one PostgreSQL count together; `undefined` goes back to memory
 * (one process on SQLite, the default, where a database write per request would buy nothing).
 */
export function shareLimitsThrough(db: DB | undefined): void {
	sharedDb = db;
}

function appLimiter(name: string, options: LimiterOptions): AnyLimiter {
	const memory = createLimiter(options);
	const shared = createSharedLimiter(() => sharedDb as DB, name, options);
	const pick = () => (sharedDb ? shared : memory);
	return {
		enabled: memory.enabled,
		take: (key, cost) => pick().take(key, cost),
		refund: (key, amount) => pick().refund(key, amount),
		reset: (key) => pick().reset(key)
	};
}

function appBackoff(name: string, options: BackoffOptions): AnyBackoff {
	const memory = createBackoff(options);
	const shared = createSharedBackoff(() => sharedDb as DB, name, options);
	const pick = () => (sharedDb ? shared : memory);
	return {
		attempt: (key) => pick().attempt(key),
		succeed: (key) => pick().succeed(key),
		failures: (key) => pick().failures(key),
		reset: (key) => pick().reset(key)
	};
}

/** A limit of the app's: in memory, or shared through the database after shareLimitsThrough. */
export const appLimits = { limiter: appLimiter, backoff: appBackoff };

/**
 * Sign-in attempts. Failures count per (account, client address) with growing delays: five free,
 * then 1 s, 2 s, 4 s, … up to 15 minutes between tries from that address for that account. The
 * account itself is never locked: its owner signing in from another address is not slowed at all
 * by someone guessing elsewhere. Each client address also has a budget across all accounts (thirty
 * failures, then one try every ten seconds), which bounds guessing at many accounts from one place.
 * The account key is the normalised e-mail whether or not such an account exists, so the limits
 * reveal nothing.
 */
export const signInLimits = {
	perAccountAndIp: appBackoff('sign-in', {
		free: 5,
		baseMs: 1000,
		maxMs: 15 * 60_000,
		forgetMs: 24 * 3600_000
	}),
	perIp: appLimiter('sign-in-ip', { ratePerSecond: 1 / 10, burst: 30 })
};

/** Mail-sending actions a stranger can trigger (reset links, verification resends, sign-ups). */
export const mailLimits = {
	perAddress: appLimiter('mail-address', { ratePerSecond: 1 / 120, burst: 3 }),
	perIp: appLimiter('mail-ip', { ratePerSecond: 1 / 30, burst: 30 })
};

/** Invitations sent per team. */
export const inviteLimits = appLimiter('invite', { ratePerSecond: 1 / 60, burst: 30 });
