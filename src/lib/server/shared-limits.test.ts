import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { Kysely } from 'kysely';
import { createTestDb, disposeTestDb } from './db';
import type { Database } from './db/schema';
import { deleteStaleCounters } from './db/rate-limits';
import { createSharedBackoff, createSharedLimiter } from './rate-limit';

// The database-kept limits that app processes on one PostgreSQL share (on SQLite here too, where
// the same code runs). Two limiter objects stand for two processes: they share nothing but the
// database. Expected counts follow from the bucket arithmetic (burst, rate) — common practice.

let db: Kysely<Database>;
beforeEach(async () => {
	db = await createTestDb();
});
afterEach(async () => {
	await disposeTestDb(db);
});

function clock(start = 1_000_000) {
	let t = start;
	return { now: () => t, advance: (ms: number) => (t += ms) };
}

describe('shared token bucket', () => {
	it('counts takes from two processes against one budget, and refills at its rate', async () => {
		const c = clock();
		const options = { ratePerSecond: 1, burst: 3, now: c.now };
		const a = createSharedLimiter(() => db, 'probe', options);
		const b = createSharedLimiter(() => db, 'probe', options);
		expect((await a.take('k')).allowed).toBe(true);
		expect((await b.take('k')).allowed).toBe(true);
		expect((await a.take('k')).allowed).toBe(true);
		const refused = await b.take('k');
		expect(refused).toEqual({ allowed: false, retryAfterMs: 1000 });
		// another key and another limit name have budgets of their own
		expect((await b.take('other')).allowed).toBe(true);
		expect((await createSharedLimiter(() => db, 'else', options).take('k')).allowed).toBe(true);
		c.advance(1000);
		expect((await b.take('k')).allowed).toBe(true);
		expect((await a.take('k')).allowed).toBe(false);
		await a.refund('k');
		expect((await b.take('k')).allowed).toBe(true);
		await b.reset('k');
		expect((await a.take('k', 3)).allowed).toBe(true);
	});

	it('lets exactly the burst through when many takes arrive at once', async () => {
		const c = clock();
		const options = { ratePerSecond: 0.001, burst: 7, now: c.now };
		const processes = [0, 1, 2].map(() => createSharedLimiter(() => db, 'race', options));
		const answers = await Promise.all(
			Array.from({ length: 21 }, (_, i) => processes[i % 3].take('same client'))
		);
		expect(answers.filter((r) => r.allowed)).toHaveLength(7);
	});
});

describe('shared growing delays', () => {
	it('counts failures from two processes together and forgets a key on success', async () => {
		const c = clock();
		const options = { free: 2, baseMs: 1000, maxMs: 8000, forgetMs: 60_000, now: c.now };
		const a = createSharedBackoff(() => db, 'sign-in probe', options);
		const b = createSharedBackoff(() => db, 'sign-in probe', options);
		expect((await a.attempt('k')).allowed).toBe(true);
		expect((await b.attempt('k')).allowed).toBe(true);
		expect(await a.failures('k')).toBe(2);
		// two free failures spent: the next must wait baseMs, whichever process it reaches
		expect(await b.attempt('k')).toEqual({ allowed: false, retryAfterMs: 1000 });
		expect(await a.attempt('k')).toEqual({ allowed: false, retryAfterMs: 1000 });
		c.advance(1000);
		expect((await a.attempt('k')).allowed).toBe(true);
		expect(await b.attempt('k')).toEqual({ allowed: false, retryAfterMs: 2000 });
		await b.succeed('k');
		expect(await a.failures('k')).toBe(0);
		expect((await a.attempt('k')).allowed).toBe(true);
		c.advance(60_000);
		expect(await b.failures('k')).toBe(0);
	});

	it('deletes counters untouched for a day', async () => {
		const c = clock(Date.now() - 2 * 86_400_000);
		await createSharedLimiter(() => db, 'old', { ratePerSecond: 1, burst: 2, now: c.now }).take(
			'k'
		);
		await createSharedLimiter(() => db, 'new', { ratePerSecond: 1, burst: 2 }).take('k');
		expect(await deleteStaleCounters(db, Date.now() - 86_400_000)).toBe(1);
		const left = await db.selectFrom('rate_limits').select('name').execute();
		expect(left.map((r) => r.name)).toEqual(['new']);
	});
});
