import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	createAnswerCache,
	entryBytes,
	ENTRY_OVERHEAD_BYTES,
	type CachedAnswer
} from './answer-cache';

const utf8 = new TextEncoder();
const answer = (text: string): CachedAnswer => ({ body: utf8.encode(text), etag: '"e"', units: 1 });

describe('the compute answer cache', () => {
	it('counts UTF-8 bytes of the body, the key and a per-entry allowance', () => {
		// "m³/kg": the superscript three is two bytes in UTF-8
		expect(entryBytes('/k', answer('m³/kg'))).toBe(6 + 2 * 2 + 3 + ENTRY_OVERHEAD_BYTES);
	});

	it('drops the least recently used answers to stay within its bytes', () => {
		const c = createAnswerCache({
			maxBytes: 4 * (1000 + ENTRY_OVERHEAD_BYTES + 10),
			maxEntries: 100
		});
		const body = 'x'.repeat(1000);
		for (const k of ['a', 'b', 'c', 'd']) expect(c.set(k, answer(body))).toBe(true);
		expect(c.size).toBe(4);
		c.get('a'); // a is now the most recently used
		c.set('e', answer(body));
		expect(c.get('b')).toBeUndefined();
		expect(c.get('a')).toBeDefined();
		expect(c.bytes).toBeLessThanOrEqual(c.maxBytes);
	});

	it('keeps at most maxEntries answers', () => {
		const c = createAnswerCache({ maxBytes: 1e9, maxEntries: 3 });
		for (const k of ['a', 'b', 'c', 'd']) c.set(k, answer('{}'));
		expect(c.size).toBe(3);
		expect(c.get('a')).toBeUndefined();
	});

	it('does not keep an answer larger than a quarter of its bytes', () => {
		const c = createAnswerCache({ maxBytes: 4000, maxEntries: 10 });
		c.set('small', answer('{}'));
		expect(c.set('big', answer('x'.repeat(1000)))).toBe(false);
		expect(c.get('big')).toBeUndefined();
		expect(c.get('small')).toBeDefined();
	});

	it('replacing a key does not count it twice', () => {
		const c = createAnswerCache({ maxBytes: 1e6, maxEntries: 10 });
		c.set('a', answer('x'.repeat(100)));
		const once = c.bytes;
		c.set('a', answer('x'.repeat(100)));
		expect(c.bytes).toBe(once);
		expect(c.size).toBe(1);
	});

	it('never holds more than its bounds, whatever is stored (seeded fuzz)', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 2000, max: 50_000 }),
				fc.integer({ min: 1, max: 20 }),
				fc.array(
					fc.tuple(
						fc.constantFrom('set', 'get'),
						fc.string({ maxLength: 30 }),
						fc.nat({ max: 20_000 }),
						fc.boolean()
					),
					{ maxLength: 200 }
				),
				(maxBytes, maxEntries, ops) => {
					const c = createAnswerCache({ maxBytes, maxEntries });
					const model = new Map<string, number>();
					for (const [op, key, n, wide] of ops) {
						if (op === 'set') {
							const a = answer((wide ? 'ü' : 'x').repeat(n));
							const kept = c.set(key, a);
							expect(kept).toBe(entryBytes(key, a) <= maxBytes / 4);
							if (kept) model.set(key, entryBytes(key, a));
							else model.delete(key);
						} else c.get(key);
						expect(c.bytes).toBeLessThanOrEqual(maxBytes);
						expect(c.size).toBeLessThanOrEqual(maxEntries);
					}
					// what it reports is what the entries it still holds weigh
					let held = 0;
					for (const [key, size] of model) if (c.get(key)) held += size;
					expect(c.bytes).toBe(held);
				}
			),
			{ seed: 20261202, numRuns: 200 }
		);
	});
});
