import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { answerCache, resetComputeLimiter } from '$lib/server/compute/http';
import { callRoute } from '$lib/server/compute/testing';
import { POST as states } from './+server';

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

interface Answer {
	state: { phase: string };
	transport: {
		mu: number | null;
		k: number | null;
		Pr: number | null;
		sigma: number | null;
		absent: Record<string, { code: string; reason: string }>;
	};
}

describe('POST /api/v1/states answers carry transport', () => {
	it('liquid water: μ, k and Pr; σ absent off the saturation line', async () => {
		const r = await callRoute(states, '/api/v1/states', {
			body: JSON.stringify({ fluid: 'water', inputs: { T: 298.15, P: 101325 } })
		});
		expect(r.status).toBe(200);
		const { transport } = r.body as Answer;
		// python3-iapws 1.5.2 (Debian), IAPWS95(T=298.15, P=0.101325): mu, k, Prandt (its k adds the scientific
		// critical enhancement, negligible at 25 °C)
		expect(Math.abs(transport.mu! / 0.0008900224890776772 - 1)).toBeLessThan(1e-8);
		expect(Math.abs(transport.k! / 0.6065160802198907 - 1)).toBeLessThan(1e-6);
		expect(Math.abs(transport.Pr! / 6.135804963902393 - 1)).toBeLessThan(1e-6);
		expect(transport.sigma).toBeNull();
		expect(transport.absent.sigma.code).toBe('not-on-saturation-line');
	});
	it('a wet state: σ given, μ absent with a reason; a fluid without μ and k correlations says why', async () => {
		const wet = (
			await callRoute(states, '/api/v1/states', {
				body: JSON.stringify({ fluid: 'water', inputs: { T: 450, x: 0.5 } })
			})
		).body as Answer;
		// IAPWS R1-76(2014), as transcribed in python3-iapws 1.5.2 (_Tension docstring): σ(450 K) = 42.8914992 mN/m
		expect(Math.abs(wet.transport.sigma! - 0.0428914992)).toBeLessThan(1e-10);
		expect(wet.transport.mu).toBeNull();
		expect(wet.transport.absent.mu.code).toBe('two-phase');
		const r32 = (
			await callRoute(states, '/api/v1/states', {
				body: JSON.stringify({ fluid: 'r32', inputs: { T: 300, P: 1e5 } })
			})
		).body as Answer;
		expect(r32.transport.k).toBeNull();
		expect(r32.transport.absent.k.code).toBe('no-correlation');
		expect(r32.transport.absent.k.reason).toMatch(/R-32/);
	});
	it('nitrogen gas: μ and k from Lemmon & Jacobsen (2004), near its dilute-gas check value', async () => {
		const r = await callRoute(states, '/api/v1/states', {
			body: JSON.stringify({ fluid: 'nitrogen', inputs: { T: 300, P: 1e4 } })
		});
		expect(r.status).toBe(200);
		const { transport } = r.body as Answer & { transport: { sources: Record<string, string> } };
		// Lemmon & Jacobsen (2004), check values at 300 K and ρ → 0: 17.8771 μPa·s and 25.9361 mW/(m·K)
		// (read from CoolProp's CoolProp-Tests.cpp); at 10 kPa the density terms add under 0.05 %
		expect(Math.abs(transport.mu! / 17.8771e-6 - 1)).toBeLessThan(5e-4);
		expect(Math.abs(transport.k! / 25.9361e-3 - 1)).toBeLessThan(5e-4);
		expect(transport.sources.mu).toMatch(/Lemmon & Jacobsen \(2004\)/);
	});
});
