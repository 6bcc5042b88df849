/**
 * POST /api/v1/legs and /api/v1/paths through their handlers: startHint / startNear, endHint /
 * endNear and window reach the engine; every point carries precision; unknown fields, also inside
 * the new objects, and any query parameter are refused with a 400 naming them.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resetComputeLimiter } from '$lib/server/compute/http';
import { callRoute, type Handler } from '$lib/server/compute/testing';
import { POST as legs } from './+server';
import { POST as paths } from '../paths/+server';

const saved = process.env.COMPUTE_RATE_LIMIT;
beforeAll(() => {
	process.env.COMPUTE_RATE_LIMIT = '0';
	resetComputeLimiter();
});
afterAll(() => {
	if (saved === undefined) delete process.env.COMPUTE_RATE_LIMIT;
	else process.env.COMPUTE_RATE_LIMIT = saved;
	resetComputeLimiter();
});

type Err = { error: { code: string; message: string; candidates?: unknown[] } };
type LegAnswer = {
	leg: {
		start: { T: number; P: number; precision: Record<string, number> };
		end: { T: number; P: number; precision: Record<string, number> };
		points: { precision: Record<string, number> }[];
	};
};
type PathAnswer = { path: { states: { state: { T: number; P: number } }[] } };

const post = (handler: Handler, url: string, body: unknown) =>
	callRoute(handler, url, { body: JSON.stringify(body) });

// python3-iapws 1.5 (Debian), IAPWS95: v(279 K, 0.1 MPa), met again at 275.29277 K on the same isobar
const V279 = 0.001000053186614213;
const T_COLD = 275.2927727537598;
// python3-iapws 1.5 (Debian), IAPWS95: s of liquid water at 275 K, 1 MPa; (T, s) has three
// states there (issue 11 audit)
const S_275 = 28.34316112492915;

describe('POST /api/v1/legs', () => {
	const leg = {
		fluid: 'water',
		start: { T: 277, P: 1e5 },
		process: 'isobaric',
		target: { v: V279 }
	};

	it('takes endHint, endNear and window for the end, and states precision on every point', async () => {
		const byHint = await post(legs, '/api/v1/legs', { ...leg, endHint: 'lower-T' });
		expect(byHint.status).toBe(200);
		const a = byHint.body as LegAnswer;
		expect(a.leg.end.T).toBeCloseTo(T_COLD, 6);
		for (const p of a.leg.points) expect(p.precision.T).toBeGreaterThan(0);
		const byNear = (await post(legs, '/api/v1/legs', { ...leg, endNear: { T: 280 } }))
			.body as LegAnswer;
		expect(byNear.leg.end.T).toBeCloseTo(279, 6);
		const byWindow = (await post(legs, '/api/v1/legs', { ...leg, window: { Tmax: 277 } }))
			.body as LegAnswer;
		expect(byWindow.leg.end.T).toBeCloseTo(T_COLD, 6);
		const none = await post(legs, '/api/v1/legs', { ...leg, window: { Tmin: 276.5, Tmax: 278 } });
		expect(none.status).toBe(422);
		expect((none.body as Err).error.code).toBe('outside-window');
		expect((none.body as Err).error.candidates).toHaveLength(2);
	});

	it('names every candidate of an ambiguous start, and startNear or startHint choose', async () => {
		const start = { T: 275, s: S_275 };
		const amb = await post(legs, '/api/v1/legs', { ...leg, start, target: { T: 300 } });
		expect(amb.status).toBe(422);
		expect((amb.body as Err).error.code).toBe('ambiguous-state');
		expect((amb.body as Err).error.candidates).toHaveLength(3);
		const near = await post(legs, '/api/v1/legs', {
			...leg,
			start,
			startNear: { P: 1e6 },
			target: { T: 300 }
		});
		expect(near.status).toBe(200);
		expect((near.body as LegAnswer).leg.start.P).toBeGreaterThan(5e5);
		expect((near.body as LegAnswer).leg.start.P).toBeLessThan(2e6);
		const hint = await post(legs, '/api/v1/legs', {
			...leg,
			start,
			startHint: 'higher-P',
			target: { T: 300 }
		});
		expect((hint.body as LegAnswer).leg.start.P).toBeGreaterThan(1e7);
	});

	it('refuses unknown and malformed choice fields with a 400 naming them', async () => {
		const unknown = await post(legs, '/api/v1/legs', { ...leg, near: { T: 280 } });
		expect(unknown.status).toBe(400);
		expect((unknown.body as Err).error.message).toMatch(/"near"/);
		const inner = await post(legs, '/api/v1/legs', { ...leg, endNear: { T: 280, p: 1 } });
		expect(inner.status).toBe(400);
		expect((inner.body as Err).error.message).toMatch(/"p"/);
		const hint = await post(legs, '/api/v1/legs', { ...leg, endHint: 'colder' });
		expect(hint.status).toBe(400);
		expect((hint.body as Err).error.message).toMatch(/endHint must be one of/);
		const win = await post(legs, '/api/v1/legs', { ...leg, window: { Pmin: 2e5, Pmax: 1e5 } });
		expect(win.status).toBe(400);
	});
});

describe('POST /api/v1/paths', () => {
	const path = {
		fluid: 'water',
		system: { kind: 'closed', mass: 1 },
		start: { T: 275, s: S_275 },
		legs: [{ process: 'isobaric', target: { T: 300 } }]
	};

	it('takes startNear, window and each leg’s endHint', async () => {
		expect((await post(paths, '/api/v1/paths', path)).status).toBe(422);
		const r = await post(paths, '/api/v1/paths', { ...path, window: { Pmin: 1e5, Pmax: 1e7 } });
		expect(r.status).toBe(200);
		const s = (r.body as PathAnswer).path.states;
		expect(s[0].state.P).toBeGreaterThan(5e5);
		expect(s[1].state.T).toBeCloseTo(300, 9);
		const two = await post(paths, '/api/v1/paths', {
			...path,
			start: { T: 277, P: 1e5 },
			legs: [{ process: 'isobaric', target: { v: V279 }, endHint: 'lower-T' }]
		});
		expect((two.body as PathAnswer).path.states[1].state.T).toBeCloseTo(T_COLD, 6);
	});

	it('refuses an unknown field in a leg by name', async () => {
		const r = await post(paths, '/api/v1/paths', {
			...path,
			startNear: { P: 1e6 },
			legs: [{ process: 'isobaric', target: { T: 300 }, hint: 'lower-T' }]
		});
		expect(r.status).toBe(400);
		expect((r.body as Err).error.message).toMatch(/"hint"/);
	});
});
