/**
 * How well a pair of inputs determines T, P and v: the relative uncertainty that the pair's
 * conditioning implies in double precision — the Jacobian of the inputs with respect to the
 * state's own variables, inverted, times each input's rounding:
 *   single phase, variables (T, ρ):   δy = |∂y/∂a|·δa + |∂y/∂b|·δb,  ∂(T, ρ)/∂(a, b) = J⁻¹,
 *   J = [[∂a/∂T, ∂a/∂ρ], [∂b/∂T, ∂b/∂ρ]] from the Helmholtz derivatives (properties.ts);
 *   on and inside the dome, variables (T, x): ∂y/∂T along the saturation lines (Clapeyron slope,
 *   as dome.ts) and ∂y/∂x = y'' − y'.
 * Rounding of an input: one ulp of T, P, ρ (relative 2⁻⁵²); for u, h, s one ulp of the value or
 * of the terms the equation sums to make it (u, h: R·T·ENERGY_TERMS; s: R·ENERGY_TERMS), whichever
 * is larger — a liquid's u is a difference of terms far larger than itself; for x, 2⁻⁵².
 * A relative uncertainty is at least 2⁻⁵² and at most 1 (a pair that fixes nothing).
 */
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point, propDT, propDrho } from '../properties.ts';
import type { Precision, State } from '../types.ts';
import type { Key } from './fix-state.ts';
import { satGuess, type SatGuess } from './saturation.ts';

const EPS = Number.EPSILON;
/**
 * Size of the sum behind u, h (in R·T) and s (in R) relative to which its round-off is reckoned.
 * An estimate (the ideal and residual parts of α and their τ-derivatives reach tens of R·T in a
 * dense liquid); the round-trip tests check that answers stay within the stated precision.
 */
const ENERGY_TERMS = 64;

const p = new Point();
const pL = new Point();
const pV = new Point();
const g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };

function inputRounding(fl: Fluid, k: Key, value: number, T: number): number {
	switch (k) {
		case 'u':
		case 'h':
			return EPS * Math.max(Math.abs(value), ENERGY_TERMS * fl.R * T);
		case 's':
			return EPS * Math.max(Math.abs(value), ENERGY_TERMS * fl.R);
		case 'x':
			return EPS;
		default:
			return EPS * Math.abs(value);
	}
}

function clamp(r: number): number {
	return Number.isFinite(r) ? Math.min(1, Math.max(EPS, r)) : 1;
}

/** Rows [∂y/∂T, ∂y/∂z] of T, P, ρ, u, h, s, x in the state's variables z (ρ single-phase, x two-phase). */
type Rows = Record<Key, [number, number]>;

function singleRows(fl: Fluid, s: State): Rows {
	// the state already carries what the rows need: cv, (∂P/∂T)_ρ and, through κ_T, (∂P/∂ρ)_T
	let cv = s.cv, dPdT = s.dPdT, dPdrho = s.kappaT ? 1 / (s.rho * s.kappaT) : null;
	if (cv === null || dPdT === null || dPdT === undefined || dPdrho === null) {
		evalPoint(fl, s.T, s.rho, p, 2);
		cv = p.cv;
		dPdT = p.dPdT;
		dPdrho = p.dPdrho;
	}
	const T = s.T, rho = s.rho, P = s.P, r2 = rho * rho;
	// (∂u/∂ρ)_T = (P − T(∂P/∂T)_ρ)/ρ², h = u + P/ρ, (∂s/∂ρ)_T = −(∂P/∂T)_ρ/ρ²
	const duDrho = (P - T * dPdT) / r2;
	return {
		T: [1, 0],
		P: [dPdT, dPdrho],
		rho: [0, 1],
		u: [cv, duDrho],
		h: [cv + dPdT / rho, duDrho + dPdrho / rho - P / r2],
		s: [cv / T, -dPdT / r2],
		x: [0, 0]
	};
}

function twoPhaseRows(fl: Fluid, s: State): Rows | null {
	if (s.T >= fl.Tc * (1 - 1e-6)) return null;
	satGuess(fl, s.T, g);
	evalPoint(fl, s.T, g.rhoL, pL, 2);
	evalPoint(fl, s.T, g.rhoV, pV, 2);
	const x = s.x ?? 0;
	const vL = 1 / g.rhoL, vV = 1 / g.rhoV;
	const dPs = (pV.s - pL.s) / (vV - vL);
	const dL = (dPs - pL.dPdT) / pL.dPdrho, dV = (dPs - pV.dPdT) / pV.dPdrho;
	const along = (yL: number, yV: number, dyL: number, dyV: number): [number, number] => [(1 - x) * dyL + x * dyV, yV - yL];
	const v = along(vL, vV, -dL * vL * vL, -dV * vV * vV);
	const vm = vL + x * (vV - vL);
	const row = (k: 'u' | 'h' | 's') => along(pL[k], pV[k], propDT(pL, k) + propDrho(pL, k) * dL, propDT(pV, k) + propDrho(pV, k) * dV);
	return {
		T: [1, 0],
		P: [dPs, 0],
		rho: [-v[0] / (vm * vm), -v[1] / (vm * vm)],
		u: row('u'),
		h: row('h'),
		s: row('s'),
		x: [0, 1]
	};
}

/** Relative uncertainty of T, P and v of a state fixed from inputs ka = a, kb = b. */
export function precisionOf(fl: Fluid, s: State, ka: Key, a: number, kb: Key, b: number): Precision {
	const rows = s.x !== null ? twoPhaseRows(fl, s) : singleRows(fl, s);
	if (!rows) return { T: 1, P: 1, v: 1 };
	const [a1, a2] = rows[ka], [b1, b2] = rows[kb];
	const det = a1 * b2 - a2 * b1;
	if (!(det !== 0 && Number.isFinite(det))) return { T: 1, P: 1, v: 1 };
	// ∂(T, z)/∂a and ∂(T, z)/∂b
	const Ta = b2 / det, Tb = -a2 / det, za = -b1 / det, zb = a1 / det;
	const da = inputRounding(fl, ka, a, s.T), db = inputRounding(fl, kb, b, s.T);
	const spread = (row: [number, number]) => Math.abs(row[0] * Ta + row[1] * za) * da + Math.abs(row[0] * Tb + row[1] * zb) * db;
	return {
		T: ka === 'T' ? EPS : clamp(spread(rows.T) / s.T),
		P: ka === 'P' ? EPS : clamp(spread(rows.P) / s.P),
		v: clamp(spread(rows.rho) / s.rho)
	};
}
