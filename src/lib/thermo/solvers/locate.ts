/**
 * Where a single-phase evaluation (T, ρ, P) lies against the dome (rules in state.ts: on a line
 * only within the density band AND the pressure band of the saturated phase). A fast path reads
 * the saturation table (accurate to TABLE_ACCURACY) and decides with margins of ten times that,
 * using the density and, near the lines, the pressure: on a stable branch P rises with ρ, so P
 * above Psat on the liquid side means ρ above ρ' (and below Psat on the vapor side, ρ below ρ'').
 * Only states within those margins of a line pay for a full saturation solve.
 */
import type { Fluid } from '../fluid.ts';
import type { Point } from '../properties.ts';
import {
	P_LINE_TOL,
	P_ROUNDOFF,
	X_SNAP,
	lineTol,
	phaseAboveCritical,
	pressureTol,
	saturatedState,
	singleState
} from '../state.ts';
import type { State } from '../types.ts';
import type { Phase } from '../types.ts';
import {
	CRITICAL_BAND,
	TABLE_ACCURACY,
	satAtT,
	satGuess,
	type SatGuess,
	type SatPoint
} from './saturation.ts';

export interface Located {
	phase: Phase;
	/** the saturation at T when the state is on or inside the dome */
	sat: SatPoint | null;
	/** quality on or inside the dome, else null */
	x: number | null;
}

const g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };
const M = 10 * TABLE_ACCURACY;

/**
 * Place (T, ρ) at pressure P against a known saturation at T (tolerances: state.ts lineTol,
 * pressureTol, X_SNAP). P is the state's pressure: the given one when P was an input, else the
 * equation's; a two-phase point passes sat.P.
 */
export function locateWithSat(
	fl: Fluid,
	T: number,
	rho: number,
	P: number,
	sat: SatPoint
): Located {
	const tol = lineTol(fl, T);
	const dP = P - sat.P;
	if (rho > sat.rhoL * (1 + tol)) return { phase: 'compressed-liquid', sat: null, x: null };
	if (rho >= sat.rhoL * (1 - tol)) {
		const band = pressureTol(fl, T, rho, sat.P);
		if (dP > band) return { phase: 'compressed-liquid', sat: null, x: null };
		// below the band yet at or above ρ' is round-off on the line; below ρ' it is inside (x from v)
		if (dP >= -band || rho >= sat.rhoL) return { phase: 'saturated-liquid', sat, x: 0 };
	}
	if (rho < sat.rhoV * (1 - tol)) return { phase: 'superheated-vapor', sat: null, x: null };
	if (rho <= sat.rhoV * (1 + tol)) {
		const band = pressureTol(fl, T, rho, sat.P);
		if (dP < -band) return { phase: 'superheated-vapor', sat: null, x: null };
		if (dP <= band || rho <= sat.rhoV) return { phase: 'saturated-vapor', sat, x: 1 };
	}
	const x = (1 / rho - 1 / sat.rhoL) / (1 / sat.rhoV - 1 / sat.rhoL);
	if (x <= X_SNAP) return { phase: 'saturated-liquid', sat, x: 0 };
	if (x >= 1 - X_SNAP) return { phase: 'saturated-vapor', sat, x: 1 };
	return { phase: 'saturated-mixture', sat, x };
}

/**
 * The state at quality x of a solved saturation, placed like a two-phase point (pressure Psat):
 * null when its density lies outside the dome beyond the line's density band (not two-phase; the
 * caller's single-phase search finds it). A quality reckoned from u, h or s just outside 0…1
 * within that band is on the line: far from Tc the band is |x| ≲ 1e−14, which only pairs that
 * cannot resolve pascals at all reach (u and s of a liquid: at constant s, du = −P·dv); near Tc it
 * absorbs the quality's round-off (up to ~1e−6). Just inside 0…1, round-off snaps (X_SNAP).
 */
export function twoPhaseAt(fl: Fluid, sat: SatPoint, x: number): State | null {
	const v = 1 / sat.rhoL + x * (1 / sat.rhoV - 1 / sat.rhoL);
	if (!(v > 0)) return null;
	const loc = locateWithSat(fl, sat.T, 1 / v, sat.P, sat);
	return loc.sat ? saturatedState(fl, sat, loc.x ?? 0) : null;
}

/**
 * Place an evaluated point p (order 2: P and (∂P/∂ρ)_T set; p.P the given pressure when P was an
 * input) against the dome.
 */
export function locate(fl: Fluid, p: Point): Located {
	const T = p.T,
		rho = p.rho,
		P = p.P;
	if (T >= fl.Tc * (1 - CRITICAL_BAND))
		return { phase: phaseAboveCritical(fl, T, P), sat: null, x: null };
	if (T < 0.999 * fl.Tc) {
		satGuess(fl, T, g);
		// the table's Psat and densities are within M/10; the line's bands are far narrower than M
		const hiP = g.P * (1 + M) * (1 + P_LINE_TOL) + P_ROUNDOFF * rho * fl.R * T;
		const loP = g.P * (1 - M) * (1 - P_LINE_TOL) - P_ROUNDOFF * rho * fl.R * T;
		if (rho > g.rhoL * (1 + M)) return { phase: 'compressed-liquid', sat: null, x: null };
		if (rho >= g.rhoL * (1 - M) && p.dPdrho > 0 && P > hiP)
			return { phase: 'compressed-liquid', sat: null, x: null };
		if (rho < g.rhoV * (1 - M)) return { phase: 'superheated-vapor', sat: null, x: null };
		if (rho <= g.rhoV * (1 + M) && p.dPdrho > 0 && P < loP)
			return { phase: 'superheated-vapor', sat: null, x: null };
	}
	return locateWithSat(fl, T, rho, P, satAtT(fl, T));
}

/**
 * The public State of an evaluated single-phase point placed by `loc`: on a line, the saturated
 * phase at the point's temperature — with the point's own P when `givenP` (P was an input: a
 * returned state carries its inputs) — else the point itself.
 */
export function placedState(fl: Fluid, p: Point, loc: Located, givenP = false): State {
	if (!loc.sat) return singleState(fl, p, loc.phase);
	return givenP ? onLineAt(fl, loc.sat, loc.x ?? 0, p.P) : saturatedState(fl, loc.sat, loc.x ?? 0);
}

/** The saturated liquid (x = 0) or vapor (x = 1) at `sat`, carrying the given pressure P (within the line's band of Psat). */
export function onLineAt(fl: Fluid, sat: SatPoint, x: number, P: number): State {
	const st = saturatedState(fl, sat, x);
	if (st.phase !== 'supercritical-fluid') st.P = P;
	return st;
}
