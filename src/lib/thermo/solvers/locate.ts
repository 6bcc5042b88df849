/**
 * Where a single-phase evaluation (T, ρ) lies against the dome (rules in state.ts). A fast path
 * reads the saturation table (accurate to TABLE_ACCURACY) and decides with margins of ten times
 * that, using the density and, near the lines, the pressure: on a stable branch P rises with ρ, so
 * P above Psat on the liquid side means ρ above ρ' (and below Psat on the vapor side, ρ below ρ'').
 * Only states within those margins of a line pay for a full saturation solve.
 */
import type { Fluid } from '../fluid.ts';
import type { Point } from '../properties.ts';
import { SAT_TOL, X_SNAP, lineTol, phaseAboveCritical, saturatedState } from '../state.ts';
import type { State } from '../types.ts';
import type { Phase } from '../types.ts';
import { CRITICAL_BAND, TABLE_ACCURACY, satAtT, satGuess, type SatGuess, type SatPoint } from './saturation.ts';

export interface Located {
	phase: Phase;
	/** the saturation at T when the state is on or inside the dome */
	sat: SatPoint | null;
	/** quality on or inside the dome, else null */
	x: number | null;
}

const g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };
const M = 10 * TABLE_ACCURACY;

/** Place (T, ρ) against a known saturation at T (tolerances: state.ts lineTol, X_SNAP). */
export function locateWithSat(fl: Fluid, T: number, rho: number, sat: SatPoint): Located {
	const tol = lineTol(fl, T);
	if (rho > sat.rhoL * (1 + tol)) return { phase: 'compressed-liquid', sat: null, x: null };
	if (rho >= sat.rhoL * (1 - tol)) return { phase: 'saturated-liquid', sat, x: 0 };
	if (rho < sat.rhoV * (1 - tol)) return { phase: 'superheated-vapor', sat: null, x: null };
	if (rho <= sat.rhoV * (1 + tol)) return { phase: 'saturated-vapor', sat, x: 1 };
	const x = (1 / rho - 1 / sat.rhoL) / (1 / sat.rhoV - 1 / sat.rhoL);
	if (x <= X_SNAP) return { phase: 'saturated-liquid', sat, x: 0 };
	if (x >= 1 - X_SNAP) return { phase: 'saturated-vapor', sat, x: 1 };
	return { phase: 'saturated-mixture', sat, x };
}

/**
 * The state at quality x of a solved saturation, placed by the same rules as any (T, ρ): returns
 * null when the density lies outside the dome beyond the line tolerance (not two-phase).
 */
export function twoPhaseAt(fl: Fluid, sat: SatPoint, x: number): State | null {
	// a quality just outside 0…1 is judged by the density rule alone (a compressed liquid a few Pa
	// above the line has x ≈ −1e−12 at low T); just inside, round-off snaps to the line
	const v = 1 / sat.rhoL + x * (1 / sat.rhoV - 1 / sat.rhoL);
	if (!(v > 0)) return null;
	const loc = locateWithSat(fl, sat.T, 1 / v, sat);
	return loc.sat ? saturatedState(fl, sat, loc.x ?? 0) : null;
}

/** Place an evaluated point p (order 2: P and (∂P/∂ρ)_T set) against the dome. */
export function locate(fl: Fluid, p: Point): Located {
	const T = p.T, rho = p.rho;
	if (T >= fl.Tc * (1 - CRITICAL_BAND)) return { phase: phaseAboveCritical(fl, T, p.P), sat: null, x: null };
	if (T < 0.999 * fl.Tc) {
		satGuess(fl, T, g);
		const K = 2 * SAT_TOL * rho * p.dPdrho;
		if (rho > g.rhoL * (1 + M + 2 * SAT_TOL)) return { phase: 'compressed-liquid', sat: null, x: null };
		if (rho >= g.rhoL * (1 - M) && p.dPdrho > 0 && p.P - g.P * (1 + M) > K)
			return { phase: 'compressed-liquid', sat: null, x: null };
		if (rho < g.rhoV * (1 - M - 2 * SAT_TOL)) return { phase: 'superheated-vapor', sat: null, x: null };
		if (rho <= g.rhoV * (1 + M) && p.dPdrho > 0 && g.P * (1 - M) - p.P > K)
			return { phase: 'superheated-vapor', sat: null, x: null };
	}
	return locateWithSat(fl, T, rho, satAtT(fl, T));
}
