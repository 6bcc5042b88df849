import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { answerCache, resetComputeLimiter } from '$lib/server/compute/http';
import { callRoute } from '$lib/server/compute/testing';
import { POST as paths } from './+server';

const saved = process.env.COMPUTE_RATE_LIMIT;
beforeAll(() => {
	process.env.COMPUTE_RATE_LIMIT = '0';
	resetComputeLimiter();
});
afterAll(() => {
	if (saved === undefined) delete process.env.COMPUTE_RATE_LIMIT;
	else process.env.COMPUTE_RATE_LIMIT = saved;
	resetComputeLimiter();
	answerCache.clear();
});

describe('POST /api/v1/paths: every state carries transport', () => {
	it('a water heating path: μ on the liquid state, σ on the saturated vapor, none on leg points', async () => {
		const r = await callRoute(paths, '/api/v1/paths', {
			body: JSON.stringify({
				fluid: 'water',
				start: { T: 298.15, P: 101325 },
				system: { kind: 'flow', massFlow: 1 },
				legs: [{ process: 'isobaric', target: { x: 1 } }]
			})
		});
		expect(r.status).toBe(200);
		const { path } = r.body as {
			path: {
				states: { transport: { mu: number | null; sigma: number | null } }[];
				legs: { leg: { points: Record<string, unknown>[] } }[];
			};
		};
		expect(path.states).toHaveLength(2);
		// python3-iapws 1.5.2 (Debian), IAPWS95(T=298.15, P=0.101325).mu
		expect(Math.abs(path.states[0].transport.mu! / 0.0008900224890776772 - 1)).toBeLessThan(1e-8);
		expect(path.states[0].transport.sigma).toBeNull();
		// IAPWS R1-76(2014) at the normal boiling point, 58.91 mN/m (from memory of the release's table)
		expect(Math.abs(path.states[1].transport.sigma! - 0.05891)).toBeLessThan(1e-4);
		expect(path.legs[0].leg.points[0]).not.toHaveProperty('transport');
	});
});
