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
import type { State } from '../types.ts';
import { ammonia } from './ammonia.ts';
import { carbonDioxide } from './carbon-dioxide.ts';
import { nitrogen } from './nitrogen.ts';
import { r134a } from './r134a.ts';
import { INPUT_PAIRS, fixFromPair } from './round-trip.test-helper.ts';
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
	const points = (fixture.points as Point[]).filter((p) => !isSolidAt('ammonia', p.T, p.P)).map((p) => ({ ...p, u: p.u + dh, h: p.h + dh, s: p.s + ds }));

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
				if (out.failure) failures.push(`${p.region} T=${p.T} rho=${p.rho} from (${a}, ${b}): ${out.failure}`);
			}
		}
		expect(failures).toEqual([]);
		expect(tried).toBeGreaterThan(1000);
	});
});

/** Reference states: single-phase from (T, ρ), ±1 mK around saturation at fixed P, in and on the dome, near critical. */
function grid(id: string, Tc: number, rhoc: number, Tt: number, Tmax: number): { ref: State; label: string }[] {
	const out: { ref: State; label: string }[] = [];
	const add = (label: string, ref: State) => out.push({ label, ref });
	const T1 = Tt + 0.3 * (Tc - Tt);
	const T2 = Tt + 0.8 * (Tc - Tt);
	for (const T of [T1, T2]) {
		const P = fixState(id, { T, x: 0 }).P;
		add(`liquid 1 mK below saturation at ${P.toPrecision(4)} Pa`, fixState(id, { T: T - 1e-3, P }));
		add(`vapor 1 mK above saturation at ${P.toPrecision(4)} Pa`, fixState(id, { T: T + 1e-3, P }));
		add(`saturated liquid at ${T.toFixed(2)} K`, fixState(id, { T, x: 0 }));
		add(`saturated vapor at ${T.toFixed(2)} K`, fixState(id, { T, x: 1 }));
		add(`mixture x = 0.4 at ${T.toFixed(2)} K`, fixState(id, { T, x: 0.4 }));
	}
	add('compressed liquid', fixState(id, { T: T1, rho: 1.05 * fixState(id, { T: T1, x: 0 }).rho }));
	const Thot = Math.min(1.4 * Tc, Tc + 0.8 * (Tmax - Tc));
	add('superheated vapor', fixState(id, { T: Thot, rho: 0.2 * rhoc }));
	add('supercritical, dense', fixState(id, { T: Math.min(1.2 * Tc, Thot), rho: 2 * rhoc }));
	add('near critical, above', fixState(id, { T: 1.005 * Tc, rho: 1.1 * rhoc }));
	add('near critical, in the dome', fixState(id, { T: 0.995 * Tc, x: 0.5 }));
	return out;
}

describe.each([
	['ammonia', ammonia],
	['carbon-dioxide', carbonDioxide],
	['r134a', r134a],
	['nitrogen', nitrogen]
])('%s round trips', (id, data) => {
	it('returns every reference state through all 21 input pairs', () => {
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
