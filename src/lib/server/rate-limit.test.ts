import { describe, expect, it } from 'vitest';
import {
	addressKey,
	createBackoff,
	createLimiter,
	refundAll,
	retryAfterSeconds,
	takeAll
} from './rate-limit';

function clock(start = 1_000_000) {
	let t = start;
	return { now: () => t, advance: (ms: number) => (t += ms) };
}

describe('token bucket', () => {
	it('allows a burst, then refuses with the time until the next token', () => {
		const c = clock();
		const l = createLimiter({ ratePerSecond: 2, burst: 3, now: c.now });
		expect(l.take('a')).toEqual({ allowed: true, remaining: 2 });
		expect(l.take('a')).toEqual({ allowed: true, remaining: 1 });
		expect(l.take('a')).toEqual({ allowed: true, remaining: 0 });
		// 2 tokens per second: the next one is 500 ms away
		expect(l.take('a')).toEqual({ allowed: false, retryAfterMs: 500 });
		c.advance(499);
		expect(l.take('a').allowed).toBe(false);
		c.advance(1);
		expect(l.take('a').allowed).toBe(true);
	});

	it('keeps keys apart', () => {
		const l = createLimiter({ ratePerSecond: 1, burst: 1, now: clock().now });
		expect(l.take('x').allowed).toBe(true);
		expect(l.take('x').allowed).toBe(false);
		expect(l.take('y').allowed).toBe(true);
	});

	it('refills continuously but never above the burst', () => {
		const c = clock();
		const l = createLimiter({ ratePerSecond: 10, burst: 5, now: c.now });
		for (let i = 0; i < 5; i++) l.take('k');
		expect(l.available('k')).toBe(0);
		c.advance(250);
		expect(l.available('k')).toBe(2);
		c.advance(60_000);
		expect(l.available('k')).toBe(5);
	});

	it('takes a cost larger than one', () => {
		const c = clock();
		const l = createLimiter({ ratePerSecond: 1, burst: 4, now: c.now });
		expect(l.take('k', 3).allowed).toBe(true);
		expect(l.take('k', 3)).toEqual({ allowed: false, retryAfterMs: 2000 });
	});

	it('gives tokens back on refund, capped at the burst', () => {
		const c = clock();
		const l = createLimiter({ ratePerSecond: 0.001, burst: 2, now: c.now });
		l.take('k');
		l.take('k');
		expect(l.take('k').allowed).toBe(false);
		l.refund('k');
		expect(l.take('k').allowed).toBe(true);
		l.refund('k', 10);
		expect(l.available('k')).toBe(2);
	});

	it('is off when the rate is 0 (COMPUTE_RATE_LIMIT=0)', () => {
		const l = createLimiter({ ratePerSecond: 0, burst: 1 });
		expect(l.enabled).toBe(false);
		for (let i = 0; i < 1000; i++) expect(l.take('k').allowed).toBe(true);
		expect(l.size).toBe(0);
	});

	it('refuses nonsense options', () => {
		expect(() => createLimiter({ ratePerSecond: 1, burst: 0 })).toThrow(RangeError);
		expect(() => createLimiter({ ratePerSecond: Number.NaN, burst: 1 })).toThrow(RangeError);
	});

	it('keeps at most maxKeys keys, dropping the least recently used', () => {
		const c = clock();
		const l = createLimiter({ ratePerSecond: 0.001, burst: 1, maxKeys: 3, now: c.now });
		for (const k of ['a', 'b', 'c']) l.take(k);
		l.take('a'); // refused, but touches a
		l.take('d'); // evicts b, the least recently used
		expect(l.size).toBe(3);
		expect(l.take('b').allowed).toBe(true); // b was forgotten: a full bucket again
		expect(l.take('a').allowed).toBe(false); // a is remembered as empty
	});

	it('drops idle keys whose buckets have refilled', () => {
		const c = clock();
		const l = createLimiter({ ratePerSecond: 1, burst: 1, now: c.now });
		for (let i = 0; i < 500; i++) l.take(`k${i}`);
		c.advance(1000); // every bucket is full again
		for (let i = 0; i < 500; i++) l.take('hot');
		expect(l.size).toBeLessThan(10);
	});

	it('retryAfterSeconds rounds up to whole seconds, at least 1', () => {
		expect(retryAfterSeconds({ retryAfterMs: 1 })).toBe('1');
		expect(retryAfterSeconds({ retryAfterMs: 1001 })).toBe('2');
	});
});

describe('takeAll', () => {
	it('takes from every bucket or from none', async () => {
		const c = clock();
		const a = createLimiter({ ratePerSecond: 0.001, burst: 5, now: c.now });
		const b = createLimiter({ ratePerSecond: 0.001, burst: 1, now: c.now });
		expect(
			(
				await takeAll([
					[a, 'x'],
					[b, 'y']
				])
			).allowed
		).toBe(true);
		const r = await takeAll([
			[a, 'x'],
			[b, 'y']
		]);
		expect(r.allowed).toBe(false);
		// a's token was given back because b refused
		expect(a.available('x')).toBe(4);
		await refundAll([[b, 'y']]);
		expect(b.available('y')).toBe(1);
	});
});

describe('createBackoff', () => {
	const options = { free: 3, baseMs: 500, maxMs: 4000, forgetMs: 60_000 };

	it('lets the free failures through, then doubles the wait after each further one, up to the cap', () => {
		const c = clock();
		const b = createBackoff({ ...options, now: c.now });
		for (let i = 0; i < 3; i++) expect(b.attempt('k').allowed).toBe(true);
		const waits: number[] = [];
		for (let i = 0; i < 6; i++) {
			const r = b.attempt('k');
			expect(r.allowed).toBe(false);
			const wait = (r as { retryAfterMs: number }).retryAfterMs;
			waits.push(wait);
			c.advance(wait - 1);
			expect(b.attempt('k').allowed).toBe(false);
			c.advance(1);
			expect(b.attempt('k').allowed).toBe(true);
		}
		expect(waits).toEqual([500, 1000, 2000, 4000, 4000, 4000]);
	});

	it('keeps keys apart, forgets a success at once and a quiet key after forgetMs', () => {
		const c = clock();
		const b = createBackoff({ ...options, now: c.now });
		for (let i = 0; i < 3; i++) expect(b.attempt('guessed from A').allowed).toBe(true);
		expect(b.attempt('guessed from A').allowed).toBe(false);
		expect(b.attempt('guessed from B').allowed).toBe(true);
		b.succeed('guessed from B');
		expect(b.failures('guessed from B')).toBe(0);
		expect(b.failures('guessed from A')).toBe(3);
		c.advance(60_000);
		expect(b.failures('guessed from A')).toBe(0);
		expect(b.attempt('guessed from A').allowed).toBe(true);
	});

	it('counts attempts up front, so a burst sent at once cannot all slip through', () => {
		const b = createBackoff({ ...options, now: () => 0 });
		const allowed = Array.from({ length: 20 }, () => b.attempt('k')).filter(
			(r) => r.allowed
		).length;
		expect(allowed).toBe(options.free);
	});

	it('keeps at most maxKeys keys', () => {
		const b = createBackoff({ ...options, maxKeys: 100, now: () => 0 });
		for (let i = 0; i < 1000; i++) b.attempt(`k${i}`);
		expect(b.size).toBe(100);
	});
});

describe('addressKey', () => {
	it('keeps IPv4 as it is, unwraps IPv4-mapped IPv6, and counts IPv6 by its /64', () => {
		expect(addressKey('198.51.100.7')).toBe('198.51.100.7');
		expect(addressKey('::ffff:198.51.100.7')).toBe('198.51.100.7');
		expect(addressKey(null)).toBe('unknown');
		// two addresses of one /64 are one client; the next /64 is another
		expect(addressKey('2001:db8:1:2:aaaa::1')).toBe('2001:db8:1:2::/64');
		expect(addressKey('2001:DB8:1:2:bbbb:cccc:dddd:eeee')).toBe('2001:db8:1:2::/64');
		expect(addressKey('2001:db8:1:3::1')).toBe('2001:db8:1:3::/64');
		expect(addressKey('2001:db8::1')).toBe('2001:db8:0:0::/64');
		expect(addressKey('::1')).toBe('0:0:0:0::/64');
		expect(addressKey('fe80::1%eth0')).toBe('fe80:0:0:0::/64');
		expect(addressKey('2001:0db8:0001:0002::')).toBe('2001:db8:1:2::/64');
	});
});
