/**
 * Every input pair, for ammonia, carbon dioxide, R-134a and nitrogen: a state is fixed, then fixed
 * again from each pair of its own properties (21 pairs; x only on and inside the dome), and must
 * come back. Ammonia's states are python3-iapws 1.5.2's (Debian, iapws.ammonia.NH3, direct calls
 * only, tests/reference/iapws-ammonia.json); the others are a grid built with the engine from
 * (T, ρ), (T, x) and (T, P), including ±1 mK around saturation and the near-critical region.
 */
import { describe, expect, it } from 'vitest';
import { fixState, isSolidAt } from '../index.ts';
import { ThermoError } from '../errors.ts';
import { ammonia } from './ammonia.ts';
import { carbonDioxide } from './carbon-dioxide.ts';
import { nitrogen } from './nitrogen.ts';
import { r134a } from './r134a.ts';
import { INPUT_PAIRS, fixFromPair, gridPairFailures } from './round-trip.test-helper.ts';
import fixture from '../../../../tests/reference/iapws-ammonia.json';

interface Point {
	region: string;
	T: number;
	P: number;
	rho: number;
	v: number;
	u: number;
	h: number;
	s: number;
	x: number | null;
}

describe('ammonia: python3-iapws 1.5.2 (Debian) states from every input pair', () => {
	// the two energy conventions differ by constants (see ammonia-iapws.test.ts)
	const dh = 200e3 - fixture.saturatedLiquidAt273_15.h;
	const ds = 1e3 - fixture.saturatedLiquidAt273_15.s;
	// rows beyond the melting curve are solid (refused; ammonia-iapws.test.ts)
	const points = (fixture.points as Point[])
		.filter((p) => !isSolidAt('ammonia', p.T, p.P))
		.map((p) => ({ ...p, u: p.u + dh, h: p.h + dh, s: p.s + ds }));

	it('recovers every fixture state: ≤ 1e-6 single-phase, ≤ 1e-5 on and in the dome', () => {
		const failures: string[] = [];
		let tried = 0;
		for (const p of points) {
			const inDome = p.x !== null;
			const rel = inDome ? 1e-5 : 1e-6;
			for (const pair of INPUT_PAIRS) {
				const [a, b] = pair;
				if (!inDome && (a === 'x' || b === 'x')) continue; // x exists only on and inside the dome
				if (inDome && a === 'T' && b === 'P') {
					// on the dome T and P are one property
					expect(() => fixState('ammonia', { T: p.T, P: p.P })).toThrowError(ThermoError);
					continue;
				}
				tried++;
				const out = fixFromPair('ammonia', p, pair, rel);
				if (out.failure)
					failures.push(`${p.region} T=${p.T} rho=${p.rho} from (${a}, ${b}): ${out.failure}`);
			}
		}
		expect(failures).toEqual([]);
		expect(tried).toBeGreaterThan(1000);
	});
});

describe.each([
	['ammonia', ammonia],
	['carbon-dioxide', carbonDioxide],
	['r134a', r134a],
	['nitrogen', nitrogen]
])('%s round trips', (id, data) => {
	it('returns every reference state through all 21 input pairs', () => {
		const { failures, pairsTried } = gridPairFailures(id, data);
		expect(failures).toEqual([]);
		expect(pairsTried).toBe(21);
	});
});
