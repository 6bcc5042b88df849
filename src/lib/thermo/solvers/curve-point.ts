/**
 * A point of a process curve (leg-curve.ts) and the few ways one is made: a single-phase evaluation,
 * or a mixture of the two saturated phases with a quality. Shared by the curve and its per-process
 * strategies (leg-processes.ts).
 */
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point } from '../properties.ts';
import type { State } from '../types.ts';
import type { SatPoint } from './saturation.ts';

/** A point on a leg's curve: a single-phase evaluation, or a saturation with a quality. */
export interface CPt {
	T: number;
	rho: number;
	P: number;
	u: number;
	h: number;
	s: number;
	/** quality on or inside the dome, else null */
	x: number | null;
	/** the saturation at T for two-phase points and crossings */
	sat: SatPoint | null;
	/** the single-phase evaluation (order 2), for building the State */
	pt: Point | null;
	/** two-phase points: both saturated phases evaluated at order 2 (EOS pressure kept), for the State */
	L?: Point;
	V?: Point;
	/** cached public State */
	state?: State;
	/** single-phase points of a curve that fixes P (isobaric, isenthalpic, polytropic): the State keeps c.P */
	givenP?: boolean;
}

/** Which single-phase branch a segment lies on ('any' above the critical point or across it). */
export type Branch = 'liquid' | 'vapor' | 'any';

/** A segment's parameter: T, ln v or ln P (each monotone along the segments it parametrises). */
export type Param = 'T' | 'lnv' | 'lnP';

export function paramOf(kind: Param, c: CPt): number {
	return kind === 'T' ? c.T : kind === 'lnv' ? -Math.log(c.rho) : Math.log(c.P);
}

/** A two-phase point of quality x between the saturated phases L and V (mass-weighted). */
export function mixture(sat: SatPoint, x: number, L: Point, V: Point): CPt {
	const vL = 1 / sat.rhoL,
		vV = 1 / sat.rhoV;
	const v = vL + x * (vV - vL);
	return {
		T: sat.T,
		rho: 1 / v,
		P: sat.P,
		u: L.u + x * (V.u - L.u),
		h: L.h + x * (V.h - L.h),
		s: L.s + x * (V.s - L.s),
		x,
		sat,
		pt: null,
		L,
		V
	};
}

/** Both saturated phases at order 2 (u, h, s, cv and the pressure derivatives; the EOS pressure is kept). */
export function phases(fl: Fluid, sat: SatPoint): [Point, Point] {
	return [
		evalPoint(fl, sat.T, sat.rhoL, new Point(), 2),
		evalPoint(fl, sat.T, sat.rhoV, new Point(), 2)
	];
}

/** A single-phase curve point from an evaluation. */
export function singlePt(p: Point): CPt {
	return { T: p.T, rho: p.rho, P: p.P, u: p.u, h: p.h, s: p.s, x: null, sat: null, pt: p };
}
