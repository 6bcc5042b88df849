/**
 * How well a pair of inputs determines T, P and v: the relative uncertainty that the pair's
 * conditioning implies in double precision — the Jacobian of the inputs with respect to the
 * state's own variables, inverted, times each input's rounding:
 *   single phase, variables (T, ρ):   δy = |∂y/∂a|·δa + |∂y/∂b|·δb,  ∂(T, ρ)/∂(a, b) = J⁻¹,
 *   J = [[∂a/∂T, ∂a/∂ρ], [∂b/∂T, ∂b/∂ρ]] from the state's own derivatives:
 *   (∂u/∂T)_ρ = cv, (∂u/∂ρ)_T = (P − T(∂P/∂T)_ρ)/ρ², h = u + P/ρ, (∂s/∂T)_ρ = cv/T, (∂s/∂ρ)_T = −(∂P/∂T)_ρ/ρ²;
 *   on and inside the dome, variables (T, x): ∂y/∂T along the saturation lines (Clapeyron slope,
 *   as dome.ts) and ∂y/∂x = y'' − y'.
 * Rounding of an input: one ulp of T, P, ρ (relative 2⁻⁵²); for u, h, s one ulp of the value or
 * of the terms the equation sums to make it (u, h: R·T·ENERGY_TERMS; s: R·ENTROPY_TERMS), whichever
 * is larger — a liquid's u is a difference of terms far larger than itself; for x, 2⁻⁵².
 * A relative uncertainty is at least 2⁻⁵² and at most 1 (a pair that fixes nothing).
 */
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point, propDT, propDrho } from '../properties.ts';
import type { Precision, Process, State } from '../types.ts';
import type { Key } from './fix-state.ts';
import { lastSaturatedPhases, P_ROUNDOFF } from '../state.ts';
import { satGuess, type SatGuess } from './saturation.ts';

const EPS = Number.EPSILON;
/**
 * Size of the sum behind u, h (in R·T) and s (in R) relative to which its round-off is reckoned.
 * An estimate (the ideal and residual parts of α and their τ-derivatives reach tens of R·T in a
 * dense liquid); the round-trip tests check that answers stay within the stated precision.
 */
const ENERGY_TERMS = 256;
/**
 * The same for s, whose sum (τα_τ − α) cancels harder in a cold liquid: a larger allowance, set so
 * that the seeded region-mix runs (125,000 re-fixes) stay within their stated precision.
 */
const ENTROPY_TERMS = 1024;

const p = new Point();
const pL = new Point();
const pV = new Point();
const g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };
/** derivative rows [∂y/∂T, ∂y/∂z] of T, P, ρ, u, h, s, x (in that order) in the state's variables */
const D = new Float64Array(16);
const ENERGY = ['u', 'h', 's'] as const;
/** a leg's point is also fixed by 'poly', ln(P·vⁿ) of a polytropic leg (row 7, n in polyN) */
type RowKey = Key | 'poly';
const ORDER: Record<RowKey, number> = { T: 0, P: 1, rho: 2, u: 3, h: 4, s: 5, x: 6, poly: 7 };
let polyN = 0;

function inputRounding(fl: Fluid, k: RowKey, value: number, T: number): number {
	switch (k) {
		case 'poly':
			// ln P + n·ln v from P and v each rounded once
			return EPS * (1 + Math.abs(polyN));
		case 'u':
		case 'h':
			return EPS * Math.max(Math.abs(value), ENERGY_TERMS * fl.R * T);
		case 's':
			return EPS * Math.max(Math.abs(value), ENTROPY_TERMS * fl.R);
		case 'x':
			return EPS;
		default:
			return EPS * Math.abs(value);
	}
}

function clamp(r: number): number {
	return Number.isFinite(r) ? Math.min(1, Math.max(EPS, r)) : 1;
}

/** Rows in (T, ρ) from the state (re-evaluated only where it lacks cv, (∂P/∂T)_ρ or κ_T). */
function singleRows(fl: Fluid, s: State): void {
	let cv = s.cv,
		dPdT = s.dPdT ?? null,
		dPdrho = s.kappaT ? 1 / (s.rho * s.kappaT) : null;
	if (cv === null || dPdT === null || dPdrho === null) {
		evalPoint(fl, s.T, s.rho, p, 2);
		cv = p.cv;
		dPdT = p.dPdT;
		dPdrho = p.dPdrho;
	}
	singleRowsAt(s.T, s.rho, s.P, cv, dPdT, dPdrho);
}

function singleRowsAt(
	T: number,
	rho: number,
	P: number,
	cv: number,
	dPdT: number,
	dPdrho: number
): void {
	const r2 = rho * rho;
	const duDrho = (P - T * dPdT) / r2;
	D[0] = 1;
	D[1] = 0;
	D[2] = dPdT;
	D[3] = dPdrho;
	D[4] = 0;
	D[5] = 1;
	D[6] = cv;
	D[7] = duDrho;
	D[8] = cv + dPdT / rho;
	D[9] = duDrho + dPdrho / rho - P / r2;
	D[10] = cv / T;
	D[11] = -dPdT / r2;
	D[12] = 0;
	D[13] = 0;
}

/** Rows in (T, x) along the saturation lines (table densities: slopes need no more accuracy). */
function twoPhaseRows(fl: Fluid, s: State): boolean {
	if (s.T >= fl.Tc * (1 - 1e-6)) return false;
	// the phases the state was just built from, else the table's densities (slopes need no more)
	const last = lastSaturatedPhases(fl, s.T);
	let L = pL,
		V = pV;
	if (last) [L, V] = last;
	else {
		satGuess(fl, s.T, g);
		evalPoint(fl, s.T, g.rhoL, pL, 2);
		evalPoint(fl, s.T, g.rhoV, pV, 2);
	}
	const rL = L.rho,
		rV = V.rho;
	const x = s.x ?? 0;
	const vL = 1 / rL,
		vV = 1 / rV;
	const dPs = (V.s - L.s) / (vV - vL);
	const dL = (dPs - L.dPdT) / L.dPdrho,
		dV = (dPs - V.dPdT) / V.dPdrho;
	const vm = vL + x * (vV - vL);
	const dvT = -(1 - x) * dL * vL * vL - x * dV * vV * vV,
		dvx = vV - vL;
	D[0] = 1;
	D[1] = 0;
	D[2] = dPs;
	D[3] = 0;
	D[4] = -dvT / (vm * vm);
	D[5] = -dvx / (vm * vm);
	let i = 6;
	for (const k of ENERGY) {
		D[i] =
			(1 - x) * (propDT(L, k) + propDrho(L, k) * dL) + x * (propDT(V, k) + propDrho(V, k) * dV);
		D[i + 1] = V[k] - L[k];
		i += 2;
	}
	D[12] = 0;
	D[13] = 1;
	return true;
}

const UNKNOWN: Precision = { T: 1, P: 1, v: 1 };

/**
 * Relative uncertainty of T, P and v of a state fixed from inputs ka = a, kb = b. A saturated
 * liquid or vapor (x = 0 or 1) fixed without x borders its single phase: the pair's uncertainty
 * there counts too (u and s of a liquid at a few mPa leave P unresolved on both sides of the line).
 */
export function precisionOf(
	fl: Fluid,
	s: State,
	ka: Key,
	a: number,
	kb: RowKey,
	b: number
): Precision {
	const own = precisionIn(fl, s, ka, a, kb, b, false);
	if ((s.x === 0 || s.x === 1) && ka !== 'x' && kb !== 'x') {
		const side = precisionIn(fl, s, ka, a, kb, b, true);
		return { T: Math.max(own.T, side.T), P: Math.max(own.P, side.P), v: Math.max(own.v, side.v) };
	}
	return own;
}

/** Uncertainty of the quantity in rows i, i + 1 of D from the inputs' roundings da, db. */
function spread(
	i: number,
	Ta: number,
	Tb: number,
	za: number,
	zb: number,
	da: number,
	db: number
): number {
	return Math.abs(D[i] * Ta + D[i + 1] * za) * da + Math.abs(D[i] * Tb + D[i + 1] * zb) * db;
}

function precisionIn(
	fl: Fluid,
	s: State,
	ka: Key,
	a: number,
	kb: RowKey,
	b: number,
	singleSide: boolean
): Precision {
	if (singleSide) {
		evalPoint(fl, s.T, s.rho, p, 2);
		singleRowsAt(s.T, s.rho, s.P, p.cv, p.dPdT, p.dPdrho);
	} else if (s.x !== null) {
		if (!twoPhaseRows(fl, s)) return { ...UNKNOWN };
	} else singleRows(fl, s);
	if (kb === 'poly') {
		// d ln(P·vⁿ) = dP/P − n·dρ/ρ
		D[14] = D[2] / s.P - (polyN * D[4]) / s.rho;
		D[15] = D[3] / s.P - (polyN * D[5]) / s.rho;
	}
	const ia = 2 * ORDER[ka],
		ib = 2 * ORDER[kb];
	const a1 = D[ia],
		a2 = D[ia + 1],
		b1 = D[ib],
		b2 = D[ib + 1];
	const det = a1 * b2 - a2 * b1;
	if (!(det !== 0 && Number.isFinite(det))) return { ...UNKNOWN };
	// ∂(T, z)/∂a and ∂(T, z)/∂b
	const Ta = b2 / det,
		Tb = -a2 / det,
		za = -b1 / det,
		zb = a1 / det;
	const da = inputRounding(fl, ka, a, s.T),
		db = inputRounding(fl, kb, b, s.T);
	// a single phase's P carries the equation's own round-off (state.ts P_ROUNDOFF·ρRT): in a cold
	// liquid at mPa (propane near its triple point) that alone is a few per cent of P
	// (P given: exact)
	const floorP =
		kb !== 'P' && (singleSide || s.x === null) ? (P_ROUNDOFF * s.rho * fl.R * s.T) / s.P : 0;
	return {
		T: ka === 'T' ? EPS : clamp(spread(0, Ta, Tb, za, zb, da, db) / s.T),
		P: ka === 'P' ? EPS : clamp(Math.max(spread(2, Ta, Tb, za, zb, da, db) / s.P, floorP)),
		v: clamp(spread(4, Ta, Tb, za, zb, da, db) / s.rho)
	};
}

const LEG_INVARIANT: Record<Exclude<Process, 'polytropic'>, Key> = {
	isobaric: 'P',
	isochoric: 'rho',
	isothermal: 'T',
	isentropic: 's',
	isenthalpic: 'h'
};

function valueAt(s: State, k: Key): number {
	return k === 'x' ? (s.x as number) : s[k];
}

/**
 * Precision of a point along a leg: the state the leg's invariant and its target property fix
 * there (a leg's end is exactly that pair). Where the pair fixes nothing at the point — T or P
 * with the other inside the dome, a quality outside it — the point's quality, or its T (P on an
 * isotherm), stands in for the target.
 */
export function legPointPrecision(
	fl: Fluid,
	s: State,
	process: Process,
	n: number | undefined,
	target: Key
): Precision {
	const dome = s.x !== null && s.phase !== 'supercritical-fluid';
	const inv: Key | 'poly' =
		process === 'polytropic' ? (n === 0 ? 'P' : 'poly') : LEG_INVARIANT[process];
	let k: Key = target;
	if (k === 'x' && !dome) k = inv === 'T' ? 'P' : 'T';
	if (dome && ((inv === 'P' && k === 'T') || (inv === 'T' && k === 'P'))) k = 'x';
	if (inv === 'poly') {
		polyN = n as number;
		return precisionOf(fl, s, k, valueAt(s, k), 'poly', Math.log(s.P) + polyN * Math.log(s.v));
	}
	const [ka, kb] = ORDER[inv] < ORDER[k] ? [inv, k] : [k, inv];
	return precisionOf(fl, s, ka, valueAt(s, ka), kb, valueAt(s, kb));
}
