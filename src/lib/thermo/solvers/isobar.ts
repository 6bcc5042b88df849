/**
 * States at fixed P: with u, h or s (unique: along an isobar h and s rise with T, dh = cp·dT,
 * ds = cp/T·dT, and u with du = (cp − Pvβ)dT), and with v (several roots possible where
 * (∂P/∂T)_ρ changes sign, e.g. water's density maximum).
 * Below Pc the saturation at P decides the branch: the mixture if y' ≤ y ≤ y'', compressed liquid
 * for T ≤ Tsat, superheated vapor for T ≥ Tsat. Along the isobar the density at each T comes from
 * densityAtTP on the branch, and T by Newton with dy/dT|P = (∂y/∂T)_ρ − (∂y/∂ρ)_T·(∂P/∂T)_ρ/(∂P/∂ρ)_T
 * kept inside a bracket.
 */
import { fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point, propDT, propDrho, propValue, type EnergyProp } from '../properties.ts';
import { P_ROUNDOFF, saturatedState } from '../state.ts';
import type { RootHint, State } from '../types.ts';
import { choose } from './choose.ts';
import { densityAtTP } from './density.ts';
import { evalSatLine, SatLine } from './dome.ts';
import { locate, locateWithSat, placedState, twoPhaseAt } from './locate.ts';
import { noStateInRange } from './range.ts';
import { isobarStart } from './plane.ts';
import { newtonBracket, scanRoots, type FD } from './roots.ts';
import { TABLE_ACCURACY, satAtP, satGuess, triplePressure, type SatGuess } from './saturation.ts';

const IDX: Record<EnergyProp, number> = { u: 1, h: 2, s: 3 };
const UNIT: Record<EnergyProp, string> = { u: 'J/kg', h: 'J/kg', s: 'J/(kg·K)' };
const M = 10 * TABLE_ACCURACY;

type Branch = 'liquid' | 'vapor' | 'any';

/** Density on a branch at (T, P), warm-started from `guess`; NaN if none. */
function rhoOnBranch(
	fl: Fluid,
	T: number,
	P: number,
	branch: Branch,
	guess: number,
	g: SatGuess
): number {
	if (T < fl.Tc && branch !== 'any') {
		satGuess(fl, T, g);
		if (branch === 'liquid')
			return densityAtTP(fl, T, P, Math.max(guess, g.rhoL), g.rhoL * (1 - M));
		return densityAtTP(fl, T, P, Math.min(guess, g.rhoV), 0, g.rhoV * (1 + M));
	}
	if (T < fl.Tc) {
		satGuess(fl, T, g);
		return densityAtTP(fl, T, P, Math.max(guess, g.rhoL), g.rhoL * (1 - M));
	}
	return densityAtTP(fl, T, P, guess);
}

/**
 * Solve y(T, ρ(T, P)) = y for T in [Ta, Tb] on one branch. fa = f(Ta) and fb = f(Tb) may be NaN
 * (unknown; evaluated if Newton needs the bracket). Returns the evaluated point or null.
 */
function solveAlongIsobar(
	fl: Fluid,
	P: number,
	which: EnergyProp,
	y: number,
	branch: Branch,
	Ta: number,
	fa: number,
	Tb: number,
	fb: number,
	T0: number,
	rho0: number,
	start?: number,
	/** a start (T, ρ) for the fast path to try before (T0, start) */
	first?: [number, number] | null
): Point | null {
	const p = new Point();
	const g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };
	let rho = rho0;
	const evalAt = (T: number): number => {
		const r = rhoOnBranch(fl, T, P, branch, rho, g);
		if (!(r > 0)) return NaN;
		rho = r;
		evalPoint(fl, T, r, p, 2);
		return propValue(p, which) - y;
	};
	const slope = () => propDT(p, which) - (propDrho(p, which) * p.dPdT) / p.dPdrho;
	const fast =
		(first ? newtonTRho(fl, P, which, y, branch, Ta, Tb, first[0], first[1], p, g, true) : null) ??
		newtonTRho(fl, P, which, y, branch, Ta, Tb, T0, start ?? rho0, p, g, start !== undefined);
	if (fast) return fast;
	let T = T0;
	// rtsafe rule (Numerical Recipes): bisect when Newton leaves the bracket or stops halving
	let dxOld = Tb - Ta,
		dx = dxOld;
	for (let it = 0; it < 100; it++) {
		const f = evalAt(T);
		if (!Number.isFinite(f)) return null;
		if (f < 0) {
			Ta = T;
			fa = f;
		} else {
			Tb = T;
			fb = f;
		}
		let next = T - f / slope();
		const slow = Math.abs(next - T) > 0.5 * Math.abs(dxOld);
		dxOld = dx;
		dx = next - T;
		if (!(next > Ta && next < Tb) || (slow && !Number.isNaN(fa) && !Number.isNaN(fb))) {
			// a step outside the bracket: make sure the far end really brackets the root
			if (next >= Tb && Number.isNaN(fb)) {
				const rhoKeep = rho;
				fb = evalAt(Tb);
				if (!(fb >= 0)) return null;
				rho = rhoKeep;
			} else if (next <= Ta && Number.isNaN(fa)) {
				const rhoKeep = rho;
				fa = evalAt(Ta);
				if (!(fa <= 0)) return null;
				rho = rhoKeep;
			}
			next = 0.5 * (Ta + Tb);
			dx = next - T;
		}
		if (Math.abs(next - T) <= 1e-12 * T) {
			evalAt(next);
			return p;
		}
		T = next;
	}
	return null;
}

/**
 * Fast path along an isobar: Newton in (T, ln ρ) on P(T, ρ) = P and y(T, ρ) = y at once (one
 * evaluation per step), from the density at T0 (solved from rho0 on the branch), or from (T0, rho0)
 * itself when `atStart` (an estimate off the isobar: the first steps bring it onto it). Gives up
 * (null) if T leaves [Ta, Tb], the density leaves the branch, or it does not settle in 30 steps;
 * the bracketed search then takes over.
 */
function newtonTRho(
	fl: Fluid,
	P: number,
	which: EnergyProp,
	y: number,
	branch: Branch,
	Ta: number,
	Tb: number,
	T0: number,
	rho0: number,
	p: Point,
	g: SatGuess,
	atStart = false
): Point | null {
	let T = T0;
	const r0 = atStart ? rho0 : rhoOnBranch(fl, T, P, branch, rho0, g);
	if (!(r0 > 0)) return null;
	let z = Math.log(r0);
	const sy = which === 's' ? fl.R : fl.R * fl.Tc;
	let lastT = Infinity,
		lastZ = Infinity,
		noisy = 0;
	for (let it = 0; it < 30; it++) {
		const rho = Math.exp(z);
		evalPoint(fl, T, rho, p, 2);
		const r1 = p.P / P - 1;
		const r2 = (propValue(p, which) - y) / sy;
		const j11 = p.dPdT / P,
			j12 = (p.dPdrho * rho) / P;
		const j21 = propDT(p, which) / sy,
			j22 = (propDrho(p, which) * rho) / sy;
		const det = j11 * j22 - j12 * j21;
		if (!Number.isFinite(det) || det === 0 || !(p.dPdrho > 0)) return null;
		let dT = -(r1 * j22 - j12 * r2) / det;
		let dz = -(j11 * r2 - r1 * j21) / det;
		const m = Math.max(1, Math.abs(dT) / (0.1 * T), Math.abs(dz) / 0.5);
		dT /= m;
		dz /= m;
		const tiny = Math.abs(dT) <= 1e-14 * T && Math.abs(dz) <= 1e-14;
		noisy =
			Math.abs(r1) < 1e-11 &&
			Math.abs(r2) < 1e-11 &&
			Math.abs(dT) >= 0.5 * lastT &&
			Math.abs(dz) >= 0.5 * lastZ
				? noisy + 1
				: 0;
		lastT = Math.abs(dT);
		lastZ = Math.abs(dz);
		T += dT;
		z += dz;
		if (!(T >= Ta && T <= Tb)) return null;
		if (branch !== 'any' && T < fl.Tc) {
			satGuess(fl, T, g);
			const r = Math.exp(z);
			if (branch === 'liquid' ? r < g.rhoL * (1 - M) : r > g.rhoV * (1 + M)) return null;
		}
		if (tiny || noisy >= 2) {
			evalPoint(fl, T, Math.exp(z), p, 2);
			return Math.abs(p.P / P - 1) < 1e-9 ? p : null;
		}
	}
	return null;
}

/**
 * The density at T on the isobar through an evaluated point, estimated from the point's slope
 * (∂ln ρ/∂ln T)_P = −T(∂P/∂T)_ρ/(ρ(∂P/∂ρ)_T), exact for an ideal gas: a start for the Newton in
 * (T, ln ρ) that spares solving the density at T first.
 */
function alongIsobar(p: Point, T: number): number {
	const slope = -(p.T * p.dPdT) / (p.rho * p.dPdrho);
	return p.rho * Math.exp(slope * Math.log(T / p.T));
}

export function flashPY(fl: Fluid, P: number, which: EnergyProp, y: number): State {
	// the inputs in words, for a refusal only (not built on the way to an answer)
	const what = () => `P = ${fmt(P)} Pa and ${which} = ${fmt(y)} ${UNIT[which]}`;
	const none = () => noStateInRange(fl, what());
	let result: Point | null;
	if (P < fl.Pc && P >= triplePressure(fl) * (1 - 1e-9)) {
		const sat = satAtP(fl, P);
		const line = evalSatLine(fl, sat.T, new SatLine(), sat);
		const b = IDX[which];
		const yL = line.yL[b],
			yV = line.yV[b];
		// a value equal to y' or y'' within round-off of the input is the saturated state itself
		const eps = 1e-12 * (Math.abs(y) + (which === 's' ? fl.R : fl.R * sat.T));
		if (Math.abs(y - yL) <= eps) return saturatedState(fl, sat, 0);
		if (Math.abs(y - yV) <= eps) return saturatedState(fl, sat, 1);
		const mix = twoPhaseAt(fl, sat, (y - yL) / (yV - yL));
		if (mix) return mix;
		if (y < yL) {
			const pL = line.pL;
			const dy = propDT(pL, which) - (propDrho(pL, which) * pL.dPdT) / pL.dPdrho;
			const T0 = Math.max(fl.Tmin, sat.T + (y - yL) / dy);
			result = solveAlongIsobar(
				fl,
				P,
				which,
				y,
				'liquid',
				fl.Tmin * (1 - 1e-7),
				NaN,
				sat.T,
				yL - y,
				T0,
				sat.rhoL,
				alongIsobar(pL, T0)
			);
		} else {
			const pV = line.pV;
			const dy = propDT(pV, which) - (propDrho(pV, which) * pV.dPdT) / pV.dPdrho;
			const T0 = Math.min(fl.Tmax, sat.T + (y - yV) / dy);
			result = solveAlongIsobar(
				fl,
				P,
				which,
				y,
				'vapor',
				sat.T,
				yV - y,
				fl.Tmax * (1 + 1e-7),
				NaN,
				T0,
				sat.rhoV,
				alongIsobar(pV, T0),
				// far from the saturated vapor (an isobar just below Pc, where cp is large at the line
				// and the extrapolation falls short) the state grid's start
				isobarStart(fl, P, which, y, true)
			);
		}
	} else {
		const branch: Branch = P < fl.Pc ? 'vapor' : 'any';
		const p = new Point();
		const g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };
		// at or above Pc: straight to the Newton in (T, ln ρ) from the state grid's estimate, when y rises
		// along the isobar there (one root); the bracket from both ends of the range only if that fails
		const start = isobarStart(fl, P, which, y);
		result = start
			? newtonTRho(
					fl,
					P,
					which,
					y,
					branch,
					fl.Tmin * (1 - 1e-7),
					fl.Tmax * (1 + 1e-7),
					start[0],
					start[1],
					p,
					g,
					true
				)
			: null;
	}
	if (!result && !(P < fl.Pc && P >= triplePressure(fl) * (1 - 1e-9))) {
		const branch: Branch = P < fl.Pc ? 'vapor' : 'any';
		const p = new Point();
		const g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };
		const ends = [fl.Tmin * (1 - 1e-7), fl.Tmax * (1 + 1e-7)].map((T) => {
			const r = rhoOnBranch(fl, T, P, branch, branch === 'vapor' ? P / (fl.R * T) : 2 * fl.rhoc, g);
			evalPoint(fl, T, r, p, 2);
			return { T, rho: r, f: propValue(p, which) - y };
		});
		const [a, b] = ends;
		if (!(a.f <= 0 && b.f >= 0)) {
			// y above the target at both ends yet falling at the low end: cp < 0 there (the equation
			// outside its physical domain, e.g. hydrogen near 14 K above ~0.2 GPa), so the isobar
			// turns and may cross the target twice: scanned, every root listed
			if (a.f > 0 && b.f > 0) {
				evalPoint(fl, a.T, a.rho, p, 2);
				if (propDT(p, which) - (propDrho(p, which) * p.dPdT) / p.dPdrho < 0)
					return choose(
						fl,
						scanIsobar(fl, P, which, y, branch, a.T, b.T, a.rho),
						undefined,
						what(),
						none
					);
			}
			throw none();
		}
		const T0 = a.T - (a.f * (b.T - a.T)) / (b.f - a.f);
		result = solveAlongIsobar(
			fl,
			P,
			which,
			y,
			branch,
			a.T,
			a.f,
			b.T,
			b.f,
			T0,
			T0 < fl.Tc ? a.rho : b.rho
		);
	}
	if (!result) throw none();
	result.P = P;
	const loc = locate(fl, result);
	if (!loc.sat && (result.T < fl.Tmin * (1 - 1e-9) || result.T > fl.Tmax * (1 + 1e-9)))
		throw none();
	return placedState(fl, result, loc, true);
}

/** Every state on the isobar (one branch) with y, from a scan in T (for an isobar along which y turns). */
function scanIsobar(
	fl: Fluid,
	P: number,
	which: EnergyProp,
	y: number,
	branch: Branch,
	Ta: number,
	Tb: number,
	rho0: number
): State[] {
	const p = new Point();
	const g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };
	let rho = rho0;
	const fn = (T: number, out: FD) => {
		const r = rhoOnBranch(fl, T, P, branch, rho, g);
		if (!(r > 0)) {
			out.f = NaN;
			out.df = NaN;
			return;
		}
		rho = r;
		evalPoint(fl, T, r, p, 2);
		out.f = propValue(p, which) - y;
		out.df = propDT(p, which) - (propDrho(p, which) * p.dPdT) / p.dPdrho;
	};
	const out: FD = { f: 0, df: 0 };
	const found: State[] = [];
	for (const T of scanRoots(fn, Ta, Tb, 48, 1e-13 * Tb)) {
		fn(T, out);
		if (!Number.isFinite(out.f)) continue;
		if (T < fl.Tmin * (1 - 1e-9) || T > fl.Tmax * (1 + 1e-9)) continue;
		p.P = P;
		const loc = locate(fl, p);
		if (loc.phase === 'saturated-mixture') continue;
		found.push(placedState(fl, p, loc, true));
	}
	return found;
}

/** States at fixed P and ρ: the mixture if ρ'' ≤ ρ ≤ ρ', else every root of P(T, ρ) = P on the branch. */
export function flashPRho(fl: Fluid, P: number, rho: number, hint?: RootHint): State {
	const what = `P = ${fmt(P)} Pa and ρ = ${fmt(rho)} kg/m³`;
	const p = new Point();
	const fn = (T: number, out: FD) => {
		evalPoint(fl, T, rho, p, 2);
		out.f = p.P - P;
		out.df = p.dPdT;
	};
	const found: State[] = [];
	const add = (T: number) => {
		evalPoint(fl, T, rho, p, 2);
		// within 1e-7 of P, or within the round-off of P(T, ρ) itself (a liquid at a few pascals: propane near Tt)
		if (Math.abs(p.P - P) > 1e-7 * P + P_ROUNDOFF * rho * fl.R * T) return;
		p.P = P;
		const loc = locate(fl, p);
		if (loc.phase === 'saturated-mixture') return; // inside the dome: covered by the saturation at P
		if (!loc.sat && (T < fl.Tmin * (1 - 1e-9) || T > fl.Tmax * (1 + 1e-9))) return;
		found.push(placedState(fl, p, loc, true));
	};
	let Ta = fl.Tmin * (1 - 1e-7),
		Tb = fl.Tmax * (1 + 1e-7);
	let monotone = false;
	if (P < fl.Pc && P >= triplePressure(fl) * (1 - 1e-9)) {
		const sat = satAtP(fl, P);
		const loc = locateWithSat(fl, sat.T, rho, P, sat);
		// vapor at P is never denser than ρ''(P); liquid at P is denser than ρ'(P) except where the
		// density has a maximum (water near 4 °C): a two-phase state and liquid ones may share (P, ρ)
		if (loc.sat) found.push(saturatedState(fl, sat, loc.x ?? 0));
		if (rho < sat.rhoV) {
			Ta = sat.T;
			monotone = true;
		} else Tb = sat.T;
	} else if (P >= fl.Pc && rho <= fl.rhoc) {
		// at or above Pc no state at ρ ≤ ρc lies below Tc (vapor there is below Pc, liquid denser
		// than ρc); scanning from Tmin would meet the equation's loops inside the dome, whose
		// spurious roots can hide the real one
		Ta = fl.Tc;
		monotone = true;
	}
	if (monotone) {
		const out: FD = { f: 0, df: 0 };
		fn(Ta, out);
		const fa = out.f;
		fn(Tb, out);
		const fb = out.f;
		// a root on the saturation end (round-off decides its sign) sits at Ta
		if (Math.abs(fa) <= 1e-9 * P) add(Ta);
		else if (fa < 0 !== fb < 0) add(newtonBracket(fn, Ta, fa, Tb, fb, 1e-15 * Tb));
	} else {
		for (const T of scanRoots(fn, Ta, Tb, 16, 1e-15 * Tb)) add(T);
	}
	return choose(fl, found, hint, what, () => noStateInRange(fl, what));
}
