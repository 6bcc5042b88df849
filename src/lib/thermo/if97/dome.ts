/**
 * The vapor dome of water by IAPWS-IF97 (IAPWS R7-97(2012)): at each temperature the saturation
 * pressure of Eq. 30 and the saturated liquid and vapor there by the basic equation of the region on
 * each side (1 and 2 up to 623.15 K, 3 above it, its density found by Newton's method on Eq. 28).
 *
 * Close to the critical point region 3's basic equation and Eq. 30 no longer agree well enough to
 * give the saturated densities: the isotherms flatten, and a pressure that Eq. 30 gives to 1e−9 moves
 * the density by percent. Above 643.15 K (21.04 MPa; where the near-critical subregions of region 3 in
 * the supplementary release IAPWS SR5-05 begin, from memory — python3-iapws's IAPWS97 departs from the
 * basic equation there, 1e−6 at 643 K, 5e−4 at 644 K) the release's own answer needs those backward
 * equations, which are not built, so the
 * curves stop there and the dome is closed by straight lines to IF97's critical point (647.096 K,
 * 22.064 MPa, 322 kg/m³). Below 643.15 K the densities agree with python3-iapws's IAPWS97 (which uses
 * the backward equations) to about 1e−6 (if97.test.ts, tests/reference/if97-legs.json).
 */
import { ThermoError } from '../errors.ts';
import type { SaturationCurve, State } from '../types.ts';
import { RHOC, TC, psat } from './regions.ts';
import { if97Limits, if97Region3State, if97State } from './state.ts';

/** The temperature (K) the IF97 dome's curves stop at, short of the critical point (module comment). */
export const IF97_DOME_TOP = 643.15;

/** What a chart says of the IF97 dome. */
export const IF97_DOME_NOTE =
	'Vapor dome by IAPWS-IF97 from 273.15 K up to 643.15 K, closed from there by straight lines to IAPWS-IF97’s critical point (647.096 K, 22.064 MPa).';

/** IF97's critical point: Eq. 28 at the release's ρc and Tc. */
export function if97CriticalState(): State {
	// cp and w diverge there, cv too in the real fluid: none is given (as the IAPWS-95 dome's)
	return {
		...if97Region3State(RHOC, TC),
		phase: 'supercritical-fluid',
		x: null,
		cp: null,
		cv: null,
		w: null
	};
}

/**
 * The IF97 dome: `points` saturated liquid and vapor states from 273.15 K to 643.15 K, closer
 * together toward the top (as the IAPWS-95 dome is spaced toward its critical point), and the
 * critical point. No melting line (IF97 starts at 273.15 K): the caller may add IAPWS-95's.
 */
export function if97SaturationCurve(points = 100): SaturationCurve {
	if (!Number.isInteger(points) || points < 2 || points > 5000)
		throw new ThermoError(
			'invalid-option',
			`The number of saturation points must be a whole number from 2 to 5000 (got ${points}).`,
			'Give points between 2 and 5000 (100 draws a smooth dome).'
		);
	const liquid: State[] = [];
	const vapor: State[] = [];
	const lo = if97Limits.Tmin;
	const span = IF97_DOME_TOP - lo;
	for (let i = 0; i < points; i++) {
		const w = 1 - i / (points - 1);
		const T = i === points - 1 ? IF97_DOME_TOP : IF97_DOME_TOP - span * w * w * w;
		const P = psat(T) * 1e6;
		liquid.push(if97State(P, T, { side: 'liquid' }));
		vapor.push(if97State(P, T, { side: 'vapor' }));
	}
	return {
		liquid,
		vapor,
		critical: if97CriticalState(),
		formulation: 'if97',
		stopsAt: IF97_DOME_TOP,
		note: IF97_DOME_NOTE
	};
}
