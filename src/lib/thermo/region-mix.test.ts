/**
 * The seeded region-mix round trip (region-mix.ts): per fluid 2,000 states — 40 % single phase,
 * 20 % two-phase, 15 % within 1 % of Tc, 12.5 % near the triple point, 12.5 % gas from 1 Pa to the
 * triple-point pressure — each re-fixed from one input pair drawn at random (every pair is drawn
 * ~95 times per fluid). No failures: each answer is the reference within 1e−6 or within its stated
 * precision, each ambiguity lists the reference and only candidates that reproduce the inputs, and
 * the only refusal is the true one ((T, P) of a mixture). The larger run (every pair of every state)
 * is scripts/region-mix.ts.
 */
import { describe, expect, it } from 'vitest';
import { listFluids } from './index.ts';
import { runMix } from './region-mix.ts';
import { fluidData } from './fluids/index.ts';

const PER_FLUID = 2000;
const CHUNK = 500;

describe('seeded region-mix round trip through every pair', () => {
	// air (a mixture) is held to its band in fluids/air-served.test.ts
	for (const f of listFluids().filter(({ id }) => !fluidData.find((d) => d.id === id)?.band))
		for (let c = 0; c < PER_FLUID / CHUNK; c++)
			it(`${f.id}, states ${c * CHUNK + 1}–${(c + 1) * CHUNK}`, () => {
				const { tried, failures } = runMix(1000 + c, CHUNK, false, f.id);
				expect(tried).toBeGreaterThan(0.95 * CHUNK);
				expect(failures.map((x) => JSON.stringify(x))).toEqual([]);
			});
});
