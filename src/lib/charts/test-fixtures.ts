import type { Phase, State } from '$lib/thermo/types';

/**
 * A State with only what the chart reads filled in meaningfully, for tests of pure chart
 * functions (geometry, scales, labels). Not thermodynamically consistent and never used as a
 * check value of a property.
 */
export function chartState(
	T: number,
	P: number,
	v: number,
	phase: Phase = 'superheated-vapor',
	x: number | null = null
): State {
	return {
		fluid: 'water',
		phase,
		T,
		P,
		v,
		rho: 1 / v,
		u: 0,
		h: 0,
		s: 0,
		x,
		cp: null,
		cv: null,
		w: null
	};
}
