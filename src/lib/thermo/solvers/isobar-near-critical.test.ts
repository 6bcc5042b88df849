/**
 * (P, v) just above the critical point on the vapor side of ρc: the isochore's root lies above Tc,
 * and the equation's loops inside the dome (where P(T) at that ρ swings above P again) must not
 * hide it. Identities: a state re-fixed from its own P and v.
 */
import { describe, expect, it } from 'vitest';
import { fixState, listFluids } from '../index.ts';
import { fluidData } from '../fluids/index.ts';

describe('(P, v) above Pc at ρ ≤ ρc', () => {
	it('argon at 152.15 K, 5.121 MPa (ρ = 489 kg/m³), the state the region-mix script missed', () => {
		const ref = fixState('argon', { T: 152.15073237879048, P: 5121067.500159608 });
		const got = fixState('argon', { P: ref.P, v: ref.v });
		expect(Math.abs(got.T / ref.T - 1)).toBeLessThan(1e-9);
		expect(got.phase).toBe('supercritical-fluid');
	});

	const pure = listFluids().filter(({ id }) => !fluidData.find((d) => d.id === id)?.band);
	it.each(pure.map((f) => [f.id, f.equationCritical.T, f.equationCritical.rho]))(
		'%s at 1.01 Tc and 0.8, 0.9, 1.0 ρc',
		(id, Tc, rhoc) => {
			for (const k of [0.8, 0.9, 1]) {
				const ref = fixState(id, { T: 1.01 * Tc, rho: k * rhoc });
				const got = fixState(id, { P: ref.P, v: ref.v });
				expect(Math.abs(got.T / ref.T - 1), `${k}`).toBeLessThan(1e-9);
			}
		}
	);
});
