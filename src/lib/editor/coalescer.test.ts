import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createCoalescer } from './coalescer';

/** A fake server: each request resolves after `latency` ms of fake time with its input doubled. */
function fakeServer(latency: number) {
	const calls: number[] = [];
	const run = (input: number) => {
		calls.push(input);
		return new Promise<number>((resolve, reject) =>
			setTimeout(
				() => (input < 0 ? reject(new Error(`bad ${input}`)) : resolve(input * 2)),
				latency
			)
		);
	};
	return { calls, run };
}

/** A coalescer spacing its requests 100 ms apart, on a fake server answering in 20 ms. */
function spacedCoalescer() {
	const server = fakeServer(20);
	const results: number[] = [];
	const c = createCoalescer(
		server.run,
		{ result: (o) => results.push(o), error: () => {} },
		{ minIntervalMs: 100 }
	);
	return { server, results, c };
}

beforeEach(() => {
	vi.useFakeTimers();
});
afterEach(() => {
	vi.useRealTimers();
});

describe('request coalescer', () => {
	it('sends at most one request at a time; moves meanwhile collapse to the newest', async () => {
		const server = fakeServer(30);
		const results: Array<[number, number]> = [];
		const c = createCoalescer(server.run, {
			result: (o, i) => results.push([i, o]),
			error: () => {}
		});
		for (let i = 1; i <= 10; i++) {
			c.submit(i);
			await vi.advanceTimersByTimeAsync(5); // pointer moves every 5 ms, the server takes 30
		}
		// 1 landed at t = 30 ms, when 6 was the newest move; 7…10 arrived while 6 was in flight
		expect(server.calls).toEqual([1, 6]);
		await vi.advanceTimersByTimeAsync(100);
		expect(server.calls).toEqual([1, 6, 10]);
		expect(results).toEqual([
			[1, 2],
			[6, 12],
			[10, 20]
		]);
		expect(c.stats).toMatchObject({ sent: 3, delivered: 3, dropped: 0 });
		expect(c.stats.replaced).toBe(7);
		expect(c.busy).toBe(false);
	});

	it('delivers each answer the moment it lands, in order', async () => {
		const server = fakeServer(20);
		const seen: Array<[number, number]> = [];
		const c = createCoalescer(server.run, {
			result: (o) => seen.push([Date.now(), o]),
			error: () => {}
		});
		const t0 = Date.now();
		c.submit(1);
		c.submit(2);
		await vi.advanceTimersByTimeAsync(20);
		expect(seen).toEqual([[t0 + 20, 2]]);
		await vi.advanceTimersByTimeAsync(20);
		expect(seen).toEqual([
			[t0 + 20, 2],
			[t0 + 40, 4]
		]);
	});

	it('drops the answer in flight after cancel (stale), and the waiting input with it', async () => {
		const server = fakeServer(30);
		const results: number[] = [];
		const c = createCoalescer(server.run, { result: (o) => results.push(o), error: () => {} });
		c.submit(1);
		c.submit(2);
		c.cancel();
		await vi.advanceTimersByTimeAsync(100);
		expect(server.calls).toEqual([1]);
		expect(results).toEqual([]);
		expect(c.stats.dropped).toBe(1);
		c.submit(3);
		await vi.advanceTimersByTimeAsync(30);
		expect(results).toEqual([6]);
	});

	it('reports failures for their input and keeps going; idle() resolves when drained', async () => {
		const server = fakeServer(10);
		const errors: number[] = [];
		const results: number[] = [];
		const c = createCoalescer(server.run, {
			result: (o) => results.push(o),
			error: (_e, i) => errors.push(i)
		});
		c.submit(-1);
		c.submit(5);
		let idle = false;
		void c.idle().then(() => (idle = true));
		await vi.advanceTimersByTimeAsync(10);
		expect(errors).toEqual([-1]);
		expect(idle).toBe(false);
		await vi.advanceTimersByTimeAsync(10);
		expect(results).toEqual([10]);
		expect(idle).toBe(true);
	});

	it('a handler that throws does not stall the queue', async () => {
		const server = fakeServer(10);
		const spy = vi.spyOn(console, 'error').mockImplementation(() => {});
		let n = 0;
		const c = createCoalescer(server.run, {
			result: () => {
				n++;
				if (n === 1) throw new Error('boom');
			},
			error: () => {}
		});
		c.submit(1);
		c.submit(2);
		await vi.advanceTimersByTimeAsync(50);
		expect(n).toBe(2);
		spy.mockRestore();
	});

	it('with a spacing, starts requests at least that far apart, the newest input winning; flush sends at once', async () => {
		const { server, results, c } = spacedCoalescer();
		const t0 = Date.now();
		const starts: number[] = [];
		const calls = () => server.calls.length;
		let seen = 0;
		// pointer moves every 10 ms for 350 ms; the server answers in 20
		for (let i = 1; i <= 35; i++) {
			c.submit(i);
			await vi.advanceTimersByTimeAsync(10);
			if (calls() > seen) {
				seen = calls();
				starts.push(Date.now() - t0);
			}
		}
		// starts at 0 (seen after the first step), then every 100 ms with the newest move then
		expect(server.calls).toEqual([1, 10, 20, 30]);
		expect(starts).toEqual([10, 100, 200, 300]);
		// a move 50 ms after the last start waits for the spacing…
		c.submit(99);
		await vi.advanceTimersByTimeAsync(20);
		expect(server.calls).toHaveLength(4);
		// …unless flushed (the release of a drag): sent at once
		c.flush();
		expect(server.calls).toEqual([1, 10, 20, 30, 99]);
		await vi.advanceTimersByTimeAsync(20);
		expect(results.at(-1)).toBe(198);
		expect(c.busy).toBe(false);
		// cancel drops an input waiting out the spacing
		c.submit(5);
		c.submit(6);
		c.cancel();
		await vi.advanceTimersByTimeAsync(200);
		expect(server.calls).toHaveLength(5);
		expect(c.stats.replaced).toBeGreaterThan(0);
	});

	it('with a spacing, an input started once the spacing is over replaces the one waiting for its timer', async () => {
		const { server, results, c } = spacedCoalescer();
		c.submit(1); // starts at 0, lands at 20
		await vi.advanceTimersByTimeAsync(30);
		c.submit(2); // waits for the spacing: its timer is due at 100
		// the clock passes 100 before that timer has run (a busy page runs timers late), and a newer
		// move comes: it starts at once, and the older one waiting must not be sent after it
		vi.setSystemTime(Date.now() + 90);
		c.submit(3);
		expect(server.calls).toEqual([1, 3]);
		await vi.advanceTimersByTimeAsync(500);
		expect(server.calls).toEqual([1, 3]);
		expect(results).toEqual([2, 6]);
		expect(c.busy).toBe(false);
	});
});
