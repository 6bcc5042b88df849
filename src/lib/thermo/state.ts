/**
 * Building public State objects, and the phase rules.
 *
 * Phase rules (documented contract):
 * - Below Tc a state is placed against the saturation at its own temperature (Psat, ρ', ρ'').
 *   It lies ON a saturation line only when it matches the saturated phase in both density and
 *   pressure: |ρ/ρsat − 1| ≤ lineTol (SAT_TOL = 1e−9, wider within a few mK of Tc) AND
 *   |P − Psat| ≤ pressureTol = P_LINE_TOL·Psat + P_ROUNDOFF·ρRT (1e−9 relative, plus the
 *   round-off of a liquid's equation-of-state pressure, 2.5e−4 Pa for water at 0 °C). A liquid
 *   a pascal above saturation is therefore a compressed liquid at every temperature; a state is
 *   also put on a line when a two-phase solution has a quality within X_SNAP (1e−12) of 0 or 1.
 *   It is then `saturated-liquid` (x = 0) or `saturated-vapor` (x = 1).
 * - Inside the dome it is a `saturated-mixture` with x = (v − v')/(v'' − v'); no metastable states.
 * - Denser than the saturated liquid (or at higher pressure, beyond those bands): `compressed-liquid`
 *   (this includes T < Tc with P ≥ Pc).
 * - Lighter than the saturated vapor (or at lower pressure): `superheated-vapor`.
 * - T ≥ Tc: `supercritical-fluid` if P ≥ Pc, else `superheated-vapor` (a gas above Tc below Pc);
 *   the critical point itself is reported as `supercritical-fluid` (P within 1e−9 of Pc counts as Pc).
 * - Within 1 part in 10⁹ below Tc (CRITICAL_BAND) T counts as Tc.
 * - A returned state carries the inputs it was fixed from: a state given with P keeps that P even
 *   when it is placed on a line (its other values are then the saturated phase's, within the bands).
 * cp and w are null inside the dome; at the critical point cv, cp and w diverge (w → 0) and are null.
 */
import { ThermoError, fmt } from './errors.ts';
import type { Fluid } from './fluid.ts';
import { evalPoint, Point } from './properties.ts';
import { CRITICAL_BAND, type SatPoint } from './solvers/saturation.ts';
import type { Phase, State } from './types.ts';

/** Relative density tolerance for "on the saturation line". */
export const SAT_TOL = 1e-9;

/** Relative pressure tolerance for "on the saturation line" (also T and P given on the line, flash-t-p.ts). */
export const P_LINE_TOL = 1e-9;

/**
 * Round-off of the equation-of-state pressure of a liquid, relative to ρRT: P = ρRT(1 + δαʳ_δ)
 * cancels to a few parts in 10⁵ of ρRT in a cold liquid (measured ≤ 4e−13·ρRT along the saturated
 * liquid of every registered fluid, water the worst; saturation.test.ts holds it below 1e−12).
 */
export const P_ROUNDOFF = 2e-12;

/**
 * Pressure band (Pa) of a saturation line at T for a point of density ρ: a state within it of Psat
 * (and within lineTol in density) is on the line. P_LINE_TOL·Psat + P_ROUNDOFF·ρ·R·T.
 */
export function pressureTol(fl: Fluid, T: number, rho: number, Psat: number): number {
	return P_LINE_TOL * Psat + P_ROUNDOFF * rho * fl.R * T;
}

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

const FINITE_KEYS = ['T', 'P', 'v', 'rho', 'u', 'h', 's'] as const;

function assertFinite(fl: Fluid, s: State): State {
	// x − x is 0 for a finite x and NaN otherwise: one test for all seven on the common path
	if (
		s.T -
			s.T +
			(s.P - s.P) +
			(s.v - s.v) +
			(s.rho - s.rho) +
			(s.u - s.u) +
			(s.h - s.h) +
			(s.s - s.s) ===
		0
	)
		return s;
	const k = FINITE_KEYS.find((key) => !Number.isFinite(s[key]));
	throw new ThermoError(
		'no-convergence',
		`The ${fl.id} state could not be evaluated (${k} is not finite).`,
		'Please report the inputs; try values a little away from the critical point.'
	);
}

/** True when (T, ρ) is the fluid's critical point to within round-off. */
export function isCriticalPoint(fl: Fluid, T: number, rho: number): boolean {
	return Math.abs(T / fl.Tc - 1) <= CRITICAL_BAND && Math.abs(rho / fl.rhoc - 1) <= 1e-7;
}

/**
 * State of a single-phase point (evaluated at order 2). Derived properties (types.ts State):
 *   Z = P/(ρRT),  κ_T = 1/(ρ(∂P/∂ρ)_T),  α_V = (∂P/∂T)_ρ/(ρ(∂P/∂ρ)_T),
 *   μ_JT = (T·α_V − 1)/(ρ·cp),  γ_s = ρw²/P,  (∂P/∂T)_v = (∂P/∂T)_ρ
 * (IAPWS R6-95(2018), Table 3 relations). `hfg` is set by saturatedState on the lines.
 */
export function singleState(
	fl: Fluid,
	p: Point,
	phase: Phase,
	x: number | null = null,
	P = p.P
): State {
	const crit = isCriticalPoint(fl, p.T, p.rho);
	const cp = crit || !(p.cp > 0) ? null : finiteOrNull(p.cp);
	const w = crit ? null : finiteOrNull(p.w);
	const stable = !crit && p.dPdrho > 0;
	const kappaT = stable ? finiteOrNull(1 / (p.rho * p.dPdrho)) : null;
	const alphaV = stable ? finiteOrNull(p.dPdT / (p.rho * p.dPdrho)) : null;
	return assertFinite(fl, {
		fluid: fl.id,
		phase,
		T: p.T,
		P,
		v: 1 / p.rho,
		rho: p.rho,
		u: p.u,
		h: p.h,
		s: p.s,
		x,
		cp,
		cv: crit ? null : finiteOrNull(p.cv),
		w,
		Z: finiteOrNull(P / (p.rho * fl.R * p.T)),
		kappaT,
		alphaV,
		muJT: alphaV !== null && cp !== null ? finiteOrNull((p.T * alphaV - 1) / (p.rho * cp)) : null,
		gammaS: w !== null && P > 0 ? finiteOrNull((p.rho * w * w) / P) : null,
		dPdT: crit ? null : finiteOrNull(p.dPdT),
		hfg: null
	});
}

/** Phase of a single-phase state at or above Tc, or at P ≥ Pc (see the rules above). */
export function phaseAboveCritical(fl: Fluid, T: number, P: number): Phase {
	if (T >= fl.Tc * (1 - CRITICAL_BAND))
		return P >= fl.Pc * (1 - 1e-9) ? 'supercritical-fluid' : 'superheated-vapor';
	return 'compressed-liquid';
}

/** The critical state (T, P, ρ of the equation's critical point; cv, cp, w null). */
export function criticalState(fl: Fluid): State {
	const p = evalPoint(fl, fl.Tc, fl.rhoc, new Point(), 2);
	// the same Pc as FluidInfo.equationCritical (solvers/critical.ts), not a re-rounded one
	return singleState(fl, p, 'supercritical-fluid', null, fl.Pc);
}

const sL = new Point();
const sV = new Point();
/** what sL and sV hold (saturatedState) */
let memoFluid: Fluid | null = null;
let memoT = 0,
	memoL = 0,
	memoV = 0;

/** The saturated liquid and vapor points (order 2) the last saturatedState call evaluated at T, if that was for this fluid and T. */
export function lastSaturatedPhases(fl: Fluid, T: number): [Point, Point] | null {
	return memoFluid === fl && memoT === T ? [sL, sV] : null;
}

/**
 * State on or inside the dome at a solved saturation point, quality x ∈ [0, 1]:
 * v, u, h, s mass-weighted; P = Psat. cv of the two-phase system (Δ = vapor − liquid,
 * dPs/dT = Δs/Δv, dρ_k/dT = (dPs/dT − (∂P/∂T)_ρ)/(∂P/∂ρ)_T along each saturation line):
 *   cv = (1−x)·du'/dT + x·du''/dT − (Δu/Δv)·[(1−x)·dv'/dT + x·dv''/dT].
 * x = 0 or 1 give the saturated liquid or vapor with its single-phase cp, cv, w.
 * `pL`, `pV`: the saturated phases already evaluated at order 2 (T, ρ', ρ''), e.g. by a leg; they
 * are read, not changed, and give the same State as evaluating them here.
 */
export function saturatedState(fl: Fluid, sat: SatPoint, x: number, pL?: Point, pV?: Point): State {
	if (sat.rhoL === sat.rhoV) return criticalState(fl);
	const T = sat.T;
	// both phases are needed on either line (hfg); the liquid and vapor of one saturation asked
	// for one after the other (saturationAtT, a leg's crossings) are evaluated once
	const again =
		!pL && !pV && memoFluid === fl && memoT === T && memoL === sat.rhoL && memoV === sat.rhoV;
	const L = pL ?? (again ? sL : evalPoint(fl, T, sat.rhoL, sL, 2));
	const V = pV ?? (again ? sV : evalPoint(fl, T, sat.rhoV, sV, 2));
	if (!pL && !pV) {
		memoFluid = fl;
		memoT = T;
		memoL = sat.rhoL;
		memoV = sat.rhoV;
	} else memoFluid = null;
	const hfg = finiteOrNull(V.h - L.h);
	if (x <= 0) return { ...singleState(fl, L, 'saturated-liquid', 0, sat.P), hfg };
	if (x >= 1) return { ...singleState(fl, V, 'saturated-vapor', 1, sat.P), hfg };
	const vL = 1 / sat.rhoL,
		vV = 1 / sat.rhoV;
	const v = vL + x * (vV - vL);
	const dPs = (V.s - L.s) / (vV - vL);
	// d(u, v)/dT along each saturation line
	const drhoL = (dPs - L.dPdT) / L.dPdrho,
		drhoV = (dPs - V.dPdT) / V.dPdrho;
	const duL = L.cv + ((L.P - T * L.dPdT) / (L.rho * L.rho)) * drhoL,
		dvL = -drhoL / (L.rho * L.rho);
	const duV = V.cv + ((V.P - T * V.dPdT) / (V.rho * V.rho)) * drhoV,
		dvV = -drhoV / (V.rho * V.rho);
	const cv = (1 - x) * duL + x * duV - ((V.u - L.u) / (vV - vL)) * ((1 - x) * dvL + x * dvV);
	return assertFinite(fl, {
		fluid: fl.id,
		phase: 'saturated-mixture',
		T,
		P: sat.P,
		v,
		rho: 1 / v,
		u: L.u + x * (V.u - L.u),
		h: L.h + x * (V.h - L.h),
		s: L.s + x * (V.s - L.s),
		x,
		cp: null,
		cv: finiteOrNull(cv),
		w: null,
		Z: finiteOrNull((sat.P * v) / (fl.R * T)),
		kappaT: null,
		alphaV: null,
		muJT: null,
		gammaS: null,
		dPdT: finiteOrNull(dPs),
		hfg
	});
}

/** Describe a state briefly for messages: "T = 300 K, P = 101325 Pa". */
export function describe(T: number, P: number): string {
	return `T = ${fmt(T)} K, P = ${fmt(P)} Pa`;
}
