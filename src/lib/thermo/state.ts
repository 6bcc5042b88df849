/**
 * Building public State objects, and the phase rules.
 *
 * Phase rules (documented contract):
 * - Below Tc a state is placed against the saturation at its own temperature. It lies ON a
 *   saturation line when its density is within SAT_TOL (1 part in 10⁹; wider within a few mK of
 *   Tc, see lineTol) of the saturated density, or when a two-phase solution has a quality less
 *   than X_SNAP (1e−12) from 0 or 1 (inside); it is then `saturated-liquid` (x = 0) or
 *   `saturated-vapor` (x = 1).
 * - Inside the dome it is a `saturated-mixture` with x = (v − v')/(v'' − v'); no metastable states.
 * - Denser than the saturated liquid: `compressed-liquid` (this includes T < Tc with P ≥ Pc).
 * - Lighter than the saturated vapor: `superheated-vapor`.
 * - T ≥ Tc: `supercritical-fluid` if P ≥ Pc, else `superheated-vapor` (a gas above Tc below Pc);
 *   the critical point itself is reported as `supercritical-fluid` (P within 1e−9 of Pc counts as Pc).
 * - Within 1 part in 10⁹ below Tc (CRITICAL_BAND) T counts as Tc.
 * cp and w are null inside the dome; at the critical point cv, cp and w diverge (w → 0) and are null.
 */
import { ThermoError, fmt } from './errors.ts';
import type { Fluid } from './fluid.ts';
import { evalPoint, Point } from './properties.ts';
import { CRITICAL_BAND, type SatPoint } from './solvers/saturation.ts';
import type { Phase, State } from './types.ts';

/** Relative density tolerance for "on the saturation line". */
export const SAT_TOL = 1e-9;

/** A two-phase solution whose quality lies within X_SNAP inside 0 or 1 is put on that line (solver round-off). */
export const X_SNAP = 1e-12;

/**
 * Relative density tolerance for "on a saturation line" at T: SAT_TOL, widened within a few
 * millikelvin of Tc by the round-off of the saturation solve there (≈ 1e−16·θ^−1.5, θ = 1 − T/Tc).
 */
export function lineTol(fl: Fluid, T: number): number {
	const th = Math.max(1 - T / fl.Tc, 1e-12);
	return SAT_TOL + 1e-16 / (th * Math.sqrt(th));
}

function finiteOrNull(x: number): number | null {
	return Number.isFinite(x) ? x : null;
}

function assertFinite(fl: Fluid, s: State): State {
	for (const k of ['T', 'P', 'v', 'rho', 'u', 'h', 's'] as const) {
		if (!Number.isFinite(s[k]))
			throw new ThermoError(
				'no-convergence',
				`The ${fl.id} state could not be evaluated (${k} is not finite).`,
				'Please report the inputs; try values a little away from the critical point.'
			);
	}
	return s;
}

/** True when (T, ρ) is the fluid's critical point to within round-off. */
export function isCriticalPoint(fl: Fluid, T: number, rho: number): boolean {
	return Math.abs(T / fl.Tc - 1) <= CRITICAL_BAND && Math.abs(rho / fl.rhoc - 1) <= 1e-7;
}

/** State of a single-phase point (evaluated at order 2). */
export function singleState(fl: Fluid, p: Point, phase: Phase, x: number | null = null): State {
	const crit = isCriticalPoint(fl, p.T, p.rho);
	const cp = crit || !(p.cp > 0) ? null : finiteOrNull(p.cp);
	const w = crit ? null : finiteOrNull(p.w);
	return assertFinite(fl, {
		fluid: fl.id,
		phase,
		T: p.T,
		P: p.P,
		v: 1 / p.rho,
		rho: p.rho,
		u: p.u,
		h: p.h,
		s: p.s,
		x,
		cp,
		cv: crit ? null : finiteOrNull(p.cv),
		w
	});
}

/** Phase of a single-phase state at or above Tc, or at P ≥ Pc (see the rules above). */
export function phaseAboveCritical(fl: Fluid, T: number, P: number): Phase {
	if (T >= fl.Tc * (1 - CRITICAL_BAND)) return P >= fl.Pc * (1 - 1e-9) ? 'supercritical-fluid' : 'superheated-vapor';
	return 'compressed-liquid';
}

/** The critical state (T, P, ρ of the equation's critical point; cv, cp, w null). */
export function criticalState(fl: Fluid): State {
	const p = evalPoint(fl, fl.Tc, fl.rhoc, new Point(), 2);
	return singleState(fl, p, 'supercritical-fluid');
}

const pL = new Point();
const pV = new Point();

/**
 * State on or inside the dome at a solved saturation point, quality x ∈ [0, 1]:
 * v, u, h, s mass-weighted; P = Psat. cv of the two-phase system (Δ = vapor − liquid,
 * dPs/dT = Δs/Δv, dρ_k/dT = (dPs/dT − (∂P/∂T)_ρ)/(∂P/∂ρ)_T along each saturation line):
 *   cv = (1−x)·du'/dT + x·du''/dT − (Δu/Δv)·[(1−x)·dv'/dT + x·dv''/dT].
 * x = 0 or 1 give the saturated liquid or vapor with its single-phase cp, cv, w.
 */
export function saturatedState(fl: Fluid, sat: SatPoint, x: number): State {
	if (sat.rhoL === sat.rhoV) {
		const s = criticalState(fl);
		return s;
	}
	const T = sat.T;
	if (x <= 0) {
		evalPoint(fl, T, sat.rhoL, pL, 2);
		pL.P = sat.P;
		return singleState(fl, pL, 'saturated-liquid', 0);
	}
	if (x >= 1) {
		evalPoint(fl, T, sat.rhoV, pV, 2);
		pV.P = sat.P;
		return singleState(fl, pV, 'saturated-vapor', 1);
	}
	evalPoint(fl, T, sat.rhoL, pL, 2);
	evalPoint(fl, T, sat.rhoV, pV, 2);
	const vL = 1 / sat.rhoL, vV = 1 / sat.rhoV;
	const v = vL + x * (vV - vL);
	const u = pL.u + x * (pV.u - pL.u);
	const h = pL.h + x * (pV.h - pL.h);
	const s = pL.s + x * (pV.s - pL.s);
	const dPs = (pV.s - pL.s) / (vV - vL);
	const slope = (p: Point) => {
		const drho = (dPs - p.dPdT) / p.dPdrho;
		const du = p.cv + ((p.P - T * p.dPdT) / (p.rho * p.rho)) * drho;
		const dv = -drho / (p.rho * p.rho);
		return [du, dv];
	};
	const [duL, dvL] = slope(pL);
	const [duV, dvV] = slope(pV);
	const cv = (1 - x) * duL + x * duV - ((pV.u - pL.u) / (vV - vL)) * ((1 - x) * dvL + x * dvV);
	return assertFinite(fl, {
		fluid: fl.id,
		phase: 'saturated-mixture',
		T,
		P: sat.P,
		v,
		rho: 1 / v,
		u,
		h,
		s,
		x,
		cp: null,
		cv: finiteOrNull(cv),
		w: null
	});
}

/** Describe a state briefly for messages: "T = 300 K, P = 101325 Pa". */
export function describe(T: number, P: number): string {
	return `T = ${fmt(T)} K, P = ${fmt(P)} Pa`;
}
