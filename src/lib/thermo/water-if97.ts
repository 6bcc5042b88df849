/**
 * Water by IAPWS-IF97 beside the engine: a state from any pair, background lines and the dome
 * (re-exported by index.ts). Kept out of index.ts so that a bundle that does not use them (the
 * browser's engine for a sheet that is not IF97, browser.ts) leaves IF97 out.
 */
import { curveOf } from './solvers/curve.ts';
import { fixStateOf } from './solvers/fix-state.ts';
import { getCompiledFluid } from './registry.ts';
import { if97FixFrom, type If97Seed } from './if97/fix.ts';
import { if97SaturationCurve as if97Dome } from './if97/dome.ts';
import { if97IsolinesOf } from './if97/isolines.ts';
import { isolines as isolinesOf } from './solvers/isolines.ts';
import type { If97State } from './if97/state.ts';
import type { FixOptions, Inputs, Isoline, IsolineKind, SaturationCurve } from './types.ts';

const fixWater = (inputs: Inputs, options: FixOptions) =>
	fixStateOf(getCompiledFluid('water'), inputs, options);

/**
 * A water state by IAPWS-IF97 (IAPWS R7-97(2012)) from any two of T, P, v, rho, u, h, s, x (SI), as
 * fixState takes them (if97/fix.ts). Pairs other than (P, T), (P, h), (P, s) and those holding x are
 * solved by Newton's method from `seed`; without one, from the IAPWS-95 state of the same inputs
 * (fixWater(inputs, options)). Throws ThermoError outside IF97's range (below 273.15 K,
 * above 100 MPa, above 50 MPa beyond 1073.15 K, above 2273.15 K) or where IF97 has no such state.
 */
export function if97Fix(inputs: Inputs, seed?: If97Seed, options: FixOptions = {}): If97State {
	return if97FixFrom(inputs, seed ?? (() => fixWater(inputs, options)));
}

/**
 * Background lines of water by IAPWS-IF97 (if97/isolines.ts): `isolines('water', …)` with each point
 * re-fixed by IF97 from the line's value and the point's progress coordinate; points outside IF97's
 * range (and quality lines above 643.15 K, where the IF97 dome stops) left out.
 */
export function if97Isolines(kind: IsolineKind, values: number[], points = 80): Isoline[] {
	return if97IsolinesOf(isolinesOf('water', kind, values, points));
}

/**
 * The vapor dome of water by IAPWS-IF97 (if97/dome.ts): IF97's saturated liquid and vapor from
 * 273.15 K up to 643.15 K (spaced denser toward the top), closed by straight lines to IF97's critical
 * point, with IAPWS-95's melting line (IF97 starts at 273.15 K). `note` says so for a chart.
 */
export function if97SaturationCurve(points = 100): SaturationCurve {
	return { ...if97Dome(points), melting: curveOf(getCompiledFluid('water'), 2).melting };
}
