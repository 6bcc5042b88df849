/**
 * Every input pair for every fluid that keeps published check values beside it (checked-fluids.ts):
 * a grid of states is fixed from (T, ρ), (T, x) and (T, P) — single phase, ±1 mK around saturation at
 * fixed P, on and inside the dome, near the critical point — and each is fixed again from each pair
 * of its own properties (21 pairs; x only on and inside the dome) and must come back.
 */
import { describe, expect, it } from 'vitest';
import { fixState } from '../index.ts';
import { ThermoError } from '../errors.ts';
import { fluidData } from './index.ts';
import { checkedFluids } from './checked-fluids.ts';
import { INPUT_PAIRS, fixFromPair, grid } from './round-trip.test-helper.ts';

describe.each(checkedFluids.map((c) => [c.fluid]))('%s round trips', (id) => {
	it('returns every reference state through all 21 input pairs', () => {
		const data = fluidData.find((f) => f.id === id)!;
		const failures: string[] = [];
		const seen = new Set<string>();
		for (const { label, ref } of grid(id, data.critical.T, data.critical.rho, data.triple.T, data.limits.Tmax)) {
			const inDome = ref.x !== null;
			const rel = inDome ? 1e-5 : 1e-6;
			for (const pair of INPUT_PAIRS) {
				const [a, b] = pair;
				if (!inDome && (a === 'x' || b === 'x')) continue; // x exists only on and inside the dome
				seen.add(`${a},${b}`);
				if (inDome && a === 'T' && b === 'P') {
					// on the dome T and P are one property
					expect(() => fixState(id, { T: ref.T, P: ref.P })).toThrowError(ThermoError);
					continue;
				}
				const out = fixFromPair(id, ref, pair, rel);
				if (out.failure) failures.push(`${label} from (${a}, ${b}): ${out.failure}`);
			}
		}
		expect(failures).toEqual([]);
		expect(seen.size).toBe(21);
	});
});
