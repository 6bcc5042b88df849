import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { answerCache, resetComputeLimiter, workUnits, WORK_UNIT_POINTS } from './http';
import { API_ISOLINE_POINTS_MAX, API_PATH_POINTS_MAX } from './schemas';
import { callRoute } from './testing';
/* eslint-disable no-restricted-imports -- the routes' own handlers, called as SvelteKit calls them */
import { POST as states } from '../../../routes/api/v1/states/+server';
import { POST as legs } from '../../../routes/api/v1/legs/+server';
import { POST as paths } from '../../../routes/api/v1/paths/+server';
import { GET as isolines } from '../../../routes/api/v1/fluids/[id=fluid]/isolines/+server';
import { GET as saturation } from '../../../routes/api/v1/fluids/[id=fluid]/saturation/+server';
/* eslint-enable no-restricted-imports */

/*
 * The compute routes' work caps and their cost-charged rate limit, through the real handlers. The
 * limiter runs on a fake clock: nothing here depends on how fast the machine is.
 */
const STATE = JSON.stringify({ fluid: 'water', inputs: { T: 450, P: 1e6 } });
const path = (legCount: number, samples?: number) =>
	JSON.stringify({
		fluid: 'water',
		system: { kind: 'closed', mass: 1 },
		start: { T: 400, P: 1e5 },
		legs: Array.from({ length: legCount }, (_, i) => ({
			process: 'isobaric',
			target: { T: i % 2 ? 400 : 450 }
		})),
		...(samples ? { samples } : {})
	});
const isobars = (n: number, points: number) =>
	`/api/v1/fluids/water/isolines?kind=isobar&values=${Array.from({ length: n }, (_, i) => 1e4 * (i + 1)).join(',')}&points=${points}`;

let t = 1_000_000;
const advance = (ms: number) => (t += ms);
const saved = process.env.COMPUTE_RATE_LIMIT;

beforeEach(() => {
	process.env.COMPUTE_RATE_LIMIT = '10'; // 10 units a second, bursts of 20
	resetComputeLimiter(() => t);
	answerCache.clear();
});
afterAll(() => {
	if (saved === undefined) delete process.env.COMPUTE_RATE_LIMIT;
	else process.env.COMPUTE_RATE_LIMIT = saved;
	resetComputeLimiter();
});

describe('work units', () => {
	it('one per 100 points begun, at least one', () => {
		expect(WORK_UNIT_POINTS).toBe(100);
		expect([0, 1, 40, 100, 101, 200, 2000, 4000].map(workUnits)).toEqual([
			1, 1, 1, 1, 2, 2, 20, 40
		]);
	});
});

describe('work caps (400 naming the cap)', () => {
	it('refuses isolines past values × points, naming the cap and what fits', async () => {
		const r = await callRoute(isolines, isobars(40, 2000));
		expect(r.status).toBe(400);
		const error = (r.body as { error: { code: string; message: string } }).error;
		expect(error.code).toBe('invalid-input');
		expect(error.message).toContain(
			`at most ${API_ISOLINE_POINTS_MAX} per request (values × points)`
		);
		expect(error.message).toContain('40 lines × 2000 points = 80000 points');
		expect(error.message).toContain('points=100 or less for 40 lines');
		// exactly at the cap is answered
		process.env.COMPUTE_RATE_LIMIT = '0';
		resetComputeLimiter();
		expect((await callRoute(isolines, isobars(40, 100))).status).toBe(200);
		expect((await callRoute(isolines, isobars(2, 2000))).status).toBe(200);
		expect((await callRoute(isolines, isobars(3, 1334))).status).toBe(400);
	});

	it('refuses paths past legs × points, naming the cap and the samples that fit', async () => {
		const r = await callRoute(paths, '/api/v1/paths', { body: path(50, 200) });
		expect(r.status).toBe(400);
		const message = (r.body as { error: { message: string } }).error.message;
		expect(message).toContain(`at most ${API_PATH_POINTS_MAX} per request (legs × points)`);
		expect(message).toContain('50 legs, at most 80 each');
		process.env.COMPUTE_RATE_LIMIT = '0';
		resetComputeLimiter();
		// the sheet page's largest request: 50 legs at the default 40 points
		expect((await callRoute(paths, '/api/v1/paths', { body: path(50) })).status).toBe(200);
	});
});

describe('rate limit charged by cost', () => {
	it('a path of 50 legs × 40 points costs 20 units: the bucket (20) is then empty, with Retry-After', async () => {
		expect((await callRoute(paths, '/api/v1/paths', { body: path(50) })).status).toBe(200);
		const r = await callRoute(states, '/api/v1/states', { body: STATE });
		expect(r.status).toBe(429);
		expect(r.headers.get('retry-after')).toBe('1');
		const error = (r.body as { error: { code: string; message: string } }).error;
		expect(error.code).toBe('rate-limited');
		expect(error.message).toMatch(
			/at most 10 units of work per second .*bursts of 20.*Retry after 1 s/
		);
		advance(100); // one unit back
		expect((await callRoute(states, '/api/v1/states', { body: STATE })).status).toBe(200);
		expect((await callRoute(states, '/api/v1/states', { body: STATE })).status).toBe(429);
	});

	it('small requests cost one unit each: 20 states pass, the 21st waits', async () => {
		for (let i = 0; i < 20; i++)
			expect((await callRoute(states, '/api/v1/states', { body: STATE })).status).toBe(200);
		expect((await callRoute(states, '/api/v1/states', { body: STATE })).status).toBe(429);
	});

	it('a costly request waits for enough units and says what it costs; other clients are unaffected', async () => {
		for (let i = 0; i < 15; i++) await callRoute(states, '/api/v1/states', { body: STATE });
		const leg = JSON.stringify({
			fluid: 'water',
			start: { T: 300, P: 1e5 },
			process: 'isobaric',
			target: { T: 500 },
			samples: 1000
		});
		const r = await callRoute(legs, '/api/v1/legs', { body: leg });
		expect(r.status).toBe(429);
		expect((r.body as { error: { message: string } }).error.message).toContain(
			'This request costs 10 units'
		);
		// it had 5 units: one was taken on arrival, 9 more are due, 4 remain, so 0.5 s at 10 units/s
		expect(r.headers.get('retry-after')).toBe('1');
		expect((await callRoute(legs, '/api/v1/legs', { body: leg, client: '10.0.0.2' })).status).toBe(
			200
		);
		advance(1000);
		expect((await callRoute(legs, '/api/v1/legs', { body: leg })).status).toBe(200);
	});

	it('a request costing more than the burst is charged the burst, so it can pass', async () => {
		process.env.COMPUTE_RATE_LIMIT = '5'; // bursts of 10; this isolines request is 40 units
		resetComputeLimiter(() => t);
		expect((await callRoute(isolines, isobars(40, 100))).status).toBe(200);
		expect((await callRoute(states, '/api/v1/states', { body: STATE })).status).toBe(429);
	});

	it('an answer served from the cache is charged what it cost to compute', async () => {
		const url = isobars(9, 80); // the sheet page's isobars: 720 points, 8 units
		const first = await callRoute(isolines, url);
		expect(first.status).toBe(200);
		const second = await callRoute(isolines, url);
		expect(second.status).toBe(200);
		expect(second.text).toBe(first.text);
		expect(answerCache.size).toBe(1);
		// 16 of 20 spent: 4 left
		for (let i = 0; i < 4; i++)
			expect((await callRoute(states, '/api/v1/states', { body: STATE })).status).toBe(200);
		expect((await callRoute(isolines, url)).status).toBe(429);
	});

	it('saturation is charged for both branches of the dome', async () => {
		expect(
			(await callRoute(saturation, '/api/v1/fluids/water/saturation?points=1000')).status
		).toBe(200); // 2000 points, 20 units
		expect((await callRoute(states, '/api/v1/states', { body: STATE })).status).toBe(429);
	});

	it('COMPUTE_RATE_LIMIT=0 turns the limit off', async () => {
		process.env.COMPUTE_RATE_LIMIT = '0';
		resetComputeLimiter(() => t);
		for (let i = 0; i < 5; i++)
			expect((await callRoute(paths, '/api/v1/paths', { body: path(50) })).status).toBe(200);
	});
});
