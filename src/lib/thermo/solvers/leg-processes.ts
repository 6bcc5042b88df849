/**
 * One strategy object per process for the leg curve (leg-curve.ts): what each process holds fixed,
 * how its curve is parametrised, how a point of it is found, and what it knows about the dome. The
 * curve dispatches through PROCESS_CURVES and never asks which process it follows.
 *
 * | process     | invariant       | single phase: parameter, solve                  | two-phase: parameter, saturation, quality |
 * | ----------- | --------------- | ----------------------------------------------- | ----------------------------------------- |
 * | isobaric    | P               | T; ρ from P(T, ρ) = P on the segment's branch   | ln v; fixed at P (P < Pc); x from v       |
 * | isochoric   | v               | T; direct (T, ρ)                                | T; at T; x from v                         |
 * | isothermal  | T               | ln v; direct (T, ρ)                             | ln v; fixed at T (T < Tc); x from v       |
 * | isentropic  | s               | ln v; T from s(T, ρ) = s (ds/dT = cv/T > 0)     | T; at T; x from s                         |
 * | isenthalpic | h               | ln P; (T, ρ) from P and h by 2-D Newton         | ln P; at P; x from h                      |
 * | polytropic  | ln P + n·ln v   | ln v; P = C·v⁻ⁿ, T from P(T, ρ) = P             | ln v; at P = C·v⁻ⁿ; x from v              |
 *
 * The canonical direction along each curve (what `key` rises with): rising T for isobaric and
 * isochoric curves, rising v for isothermal, isentropic and polytropic ones, rising P for
 * isenthalpic ones. Crossings of the saturation lines are either the two ends of a fixed saturation
 * (isobaric below Pc, isothermal below Tc) or the roots of the process's residual along each line
 * (crossings.ts lineRoots).
 */
import { evalPoint, Point, propDT, propDrho } from '../properties.ts';
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import type { Inputs, Process, State } from '../types.ts';
import type { LineFn } from './crossings.ts';
import { singlePt, type Branch, type CPt, type Param } from './curve-point.ts';
import { densityAtTP } from './density.ts';
import {
	CRITICAL_BAND,
	TABLE_ACCURACY,
	satAtP,
	satAtT,
	satGuess,
	triplePressure,
	type SatGuess,
	type SatPoint
} from './saturation.ts';

const M = 10 * TABLE_ACCURACY;

/** The process's fixed quantity and its parameters. */
export interface Invariant {
	process: Process;
	P?: number;
	rho?: number;
	T?: number;
	s?: number;
	h?: number;
	/** polytropic: n and ln C = ln P + n·ln v */
	n?: number;
	lnC?: number;
}

/** What the curve lends a strategy to find a single-phase point. */
export interface PointSolver {
	readonly fl: Fluid;
	readonly inv: Invariant;
	/** the curve's lowest pressure, Pa */
	readonly Pfloor: number;
	/** scratch saturation guess */
	readonly g: SatGuess;
	/** T at fixed ρ with f(point) = [residual, d residual/dT] = 0 by Newton from the guess; else the general flash of `pair` + ρ. */
	tAtRho(
		rho: number,
		guess: CPt | null,
		branch: Branch,
		f: (p: Point) => [number, number],
		pair: Inputs
	): CPt | null;
	/** the engine's general flash of the pair (nearest the guess among several), or null */
	fallback(inputs: Inputs, guess: CPt | null, branch: Branch): CPt | null;
}

/** The strategy of one process's curve. */
export interface ProcessCurve {
	// ---- its invariant
	/** the invariant of a leg from its start (a polytropic leg with n = 0 is an isobaric curve) */
	invariant(start: State, n: number | undefined): Invariant;
	/** the invariant in words, for messages ("at P = … Pa") */
	describe(inv: Invariant, n: number | undefined): string;

	// ---- its parametrisation
	/** parameter of single-phase segments and of two-phase segments */
	readonly singleParam: Param;
	readonly domeParam: Param;
	/** +1 when the two-phase parameter rises along the canonical direction, −1 when it falls */
	readonly domeSign: 1 | -1;
	/** a key rising along the canonical direction (orders crossings, places the start) */
	key(c: CPt): number;
	/** hard bounds of an outer single-phase piece's parameter (beyond them no state of the domain) */
	singleBounds(s: PointSolver): [number, number];

	// ---- how it finds a point
	/** single-phase point at parameter t on a branch, from a nearby guess; null when none solves */
	single(s: PointSolver, t: number, guess: CPt | null, branch: Branch): CPt | null;
	/** single-phase points carry the invariant's P like a given input (the State keeps it) */
	readonly fixesP: boolean;

	// ---- what it knows about the dome
	/**
	 * Present for processes meeting the dome at one saturation (isobaric, isothermal): that
	 * saturation, or null where the curve misses the dome (above Pc or Tc; below the triple point).
	 */
	fixedSaturation?(fl: Fluid, inv: Invariant): SatPoint | null;
	/** Present for the others: the residual whose roots along each saturation line are the crossings. */
	lineResidual?(fl: Fluid, inv: Invariant): LineFn;
	/** one piece (no fixed saturation met): the branch it lies on, for fixed-saturation processes */
	lonePieceBranch?(fl: Fluid, inv: Invariant): Branch;
	/** the saturation at two-phase parameter t (critical point within its round-off), null outside the dome's range */
	domeSaturation(fl: Fluid, inv: Invariant, t: number): SatPoint | null;
	/** the quality of a two-phase point follows from its specific volume at t ... */
	domeVolume?(inv: Invariant, t: number): number;
	/** ... or from the invariant energy */
	domeEnergy?: 's' | 'h';
	/** two-phase parameter range (unordered) of an outer two-phase piece; `fixed` the fixed saturation */
	domeBounds(fl: Fluid, inv: Invariant, fixed: SatPoint | null): [number, number];

	// ---- its work
	/**
	 * Boundary work w = ∫P dv and shaft work wShaft = −∫v dP from start to end; `integral` gives w by
	 * quadrature along the pieces (leg-integrals.ts) for processes without a closed form.
	 */
	work(
		start: State,
		end: State,
		inv: Invariant,
		integral: () => number
	): { w: number; wShaft: number };
	/** a two-phase piece's w: exact P·Δv at the fixed pressure, by its shaft-work integrand, or by quadrature of P·v in ln v */
	readonly domeWork: 'exact' | 'shaft' | 'quadrature';
	/** the shaft-work integrand −v·dPs/dT of a two-phase piece in parameter T (domeWork 'shaft') */
	domeShaftIntegrand?(fl: Fluid, inv: Invariant, t: number, pL: Point, pV: Point): number;
}

// ---- shared pieces ---------------------------------------------------------------------------

/** Within round-off of the critical point the saturation solvers may fail: it is the critical point. */
function critical(fl: Fluid, e: unknown, near: boolean): SatPoint {
	if (!(e instanceof ThermoError) || !near) throw e;
	return { T: fl.Tc, P: fl.Pc, rhoL: fl.rhoc, rhoV: fl.rhoc };
}

/** Saturation at T on a two-phase piece parametrised by T. */
function satOnT(fl: Fluid, T: number): SatPoint | null {
	if (!(T >= fl.Tmin * (1 - 1e-12) && T <= fl.Tc * (1 + 1e-9))) return null;
	try {
		return satAtT(fl, Math.min(T, fl.Tc));
	} catch (e) {
		return critical(fl, e, T > fl.Tc * (1 - 1e-6));
	}
}

/** Saturation at P on a two-phase piece whose parameter gives P. */
function satOnP(fl: Fluid, P: number): SatPoint | null {
	if (!(P >= triplePressure(fl) * (1 - 1e-12) && P <= fl.Pc * (1 + 1e-6))) return null;
	try {
		return satAtP(fl, Math.min(P, fl.Pc));
	} catch (e) {
		return critical(fl, e, P > fl.Pc * (1 - 1e-5));
	}
}

/** Two-phase pieces parametrised by T end at the triple point and just below the critical point. */
function domeTRange(fl: Fluid): [number, number] {
	return [fl.Tmin, fl.Tc * (1 - 2 * CRITICAL_BAND)];
}

/** ln v bounds of a single-phase piece: from denser than the densest liquid to the ideal gas at Tmax and Pfloor. */
function lnvRange(s: PointSolver): [number, number] {
	const fl = s.fl;
	const rhoTop = densityAtTP(fl, fl.Tmin, fl.Pmax, 3 * fl.rhoc);
	return [
		-Math.log(1.2 * (rhoTop > 0 ? rhoTop : 5 * fl.rhoc)),
		Math.log((1.2 * fl.R * fl.Tmax) / s.Pfloor)
	];
}

const noMixture = (): null => null;

/** w − wShaft = Δ(Pv): the shaft work from the boundary work. */
function byQuadrature(start: State, end: State, integral: () => number) {
	const w = integral();
	return { w, wShaft: w - (end.P * end.v - start.P * start.v) };
}

// ---- the strategies ----------------------------------------------------------------------------

const isobaric: ProcessCurve = {
	invariant: (start) => ({
		process: 'isobaric',
		P: start.P,
		rho: start.rho,
		T: start.T,
		s: start.s,
		h: start.h
	}),
	describe: (inv) => `at P = ${fmt(inv.P as number)} Pa`,
	singleParam: 'T',
	domeParam: 'lnv',
	domeSign: 1,
	key: (c) => c.h,
	singleBounds: (s) => [s.fl.Tmin, s.fl.Tmax],
	single(s, T, guess, branch) {
		const fl = s.fl,
			g = s.g;
		const P = s.inv.P as number;
		let rho: number;
		if (T < fl.Tc && branch !== 'any') {
			satGuess(fl, T, g);
			if (branch === 'liquid')
				rho = densityAtTP(fl, T, P, Math.max(guess?.rho ?? 0, g.rhoL * 1.001), g.rhoL * (1 - M));
			else
				rho = densityAtTP(
					fl,
					T,
					P,
					Math.min(guess?.rho ?? P / (fl.R * T), g.rhoV),
					0,
					g.rhoV * (1 + M)
				);
		} else if (T < fl.Tc) {
			satGuess(fl, T, g);
			rho = densityAtTP(fl, T, P, Math.max(guess?.rho ?? 0, g.rhoL), g.rhoL * (1 - M));
		} else rho = densityAtTP(fl, T, P, guess?.rho ?? (P < fl.Pc ? P / (fl.R * T) : 2 * fl.rhoc));
		if (!(rho > 0)) return null;
		const p = evalPoint(fl, T, rho, new Point(), 2);
		p.P = P;
		return singlePt(p);
	},
	fixesP: true,
	fixedSaturation(fl, inv) {
		const P = inv.P as number;
		return P >= triplePressure(fl) * (1 - 1e-12) && P < fl.Pc ? satAtP(fl, P) : null;
	},
	// below the triple-point pressure all vapor (Psat(T) ≥ Pt there); above Pc either side
	lonePieceBranch: (fl, inv) => ((inv.P as number) < triplePressure(fl) ? 'vapor' : 'any'),
	domeSaturation: noMixture,
	domeVolume: (_inv, t) => Math.exp(t),
	domeBounds: (_fl, _inv, sat) => (sat ? [-Math.log(sat.rhoL), -Math.log(sat.rhoV)] : [NaN, NaN]),
	work: (start, end, inv) => ({ w: (inv.P as number) * (end.v - start.v), wShaft: 0 }),
	domeWork: 'exact'
};

const isochoric: ProcessCurve = {
	invariant: (start) => ({
		process: 'isochoric',
		P: start.P,
		rho: start.rho,
		T: start.T,
		s: start.s,
		h: start.h
	}),
	describe: (inv) => `at v = ${fmt(1 / (inv.rho as number))} m³/kg`,
	singleParam: 'T',
	domeParam: 'T',
	domeSign: 1,
	key: (c) => c.T,
	singleBounds: (s) => [s.fl.Tmin, s.fl.Tmax],
	single: (s, t) => singlePt(evalPoint(s.fl, t, s.inv.rho as number, new Point(), 2)),
	fixesP: false,
	lineResidual(_fl, inv) {
		const v0 = 1 / (inv.rho as number);
		return (_P, y, _dP, dy) => [y[0] / v0 - 1, dy[0] / v0];
	},
	domeSaturation: (fl, _inv, t) => satOnT(fl, t),
	domeVolume: (inv) => 1 / (inv.rho as number),
	domeBounds: (fl) => domeTRange(fl),
	work: (start, end) => ({ w: 0, wShaft: -start.v * (end.P - start.P) }),
	domeWork: 'quadrature'
};

const isothermal: ProcessCurve = {
	invariant: (start) => ({
		process: 'isothermal',
		P: start.P,
		rho: start.rho,
		T: start.T,
		s: start.s,
		h: start.h
	}),
	describe: (inv) => `at T = ${fmt(inv.T as number)} K`,
	singleParam: 'lnv',
	domeParam: 'lnv',
	domeSign: 1,
	key: (c) => -Math.log(c.rho),
	singleBounds(s) {
		// from the density at Pmax to the density at the pressure floor, each on its own branch
		const fl = s.fl,
			T = s.inv.T as number;
		const g = T < fl.Tc ? satGuess(fl, T, { P: 0, rhoL: 0, rhoV: 0 }) : null;
		const rMax = densityAtTP(
			fl,
			T,
			fl.Pmax,
			g ? g.rhoL * 1.1 : 3 * fl.rhoc,
			g ? g.rhoL * (1 - M) : 0
		);
		const rMin = densityAtTP(
			fl,
			T,
			s.Pfloor,
			s.Pfloor / (fl.R * T),
			0,
			g ? g.rhoV * (1 + M) : Infinity
		);
		return [-Math.log(rMax), -Math.log(rMin)];
	},
	single: (s, t) => singlePt(evalPoint(s.fl, s.inv.T as number, Math.exp(-t), new Point(), 2)),
	fixesP: false,
	fixedSaturation(fl, inv) {
		const T = inv.T as number;
		return T < fl.Tc * (1 - CRITICAL_BAND) ? satAtT(fl, T) : null;
	},
	lonePieceBranch: () => 'any',
	domeSaturation: noMixture,
	domeVolume: (_inv, t) => Math.exp(t),
	domeBounds: (_fl, _inv, sat) => (sat ? [-Math.log(sat.rhoL), -Math.log(sat.rhoV)] : [NaN, NaN]),
	work: (start, end, _inv, integral) => byQuadrature(start, end, integral),
	domeWork: 'exact'
};

const isentropic: ProcessCurve = {
	invariant: (start) => ({
		process: 'isentropic',
		P: start.P,
		rho: start.rho,
		T: start.T,
		s: start.s,
		h: start.h
	}),
	describe: (inv) => `at s = ${fmt(inv.s as number)} J/(kg·K)`,
	singleParam: 'lnv',
	domeParam: 'T',
	domeSign: -1,
	key: (c) => -Math.log(c.rho),
	singleBounds: lnvRange,
	single(s, t, guess, branch) {
		const s0 = s.inv.s as number;
		return s.tAtRho(Math.exp(-t), guess, branch, (p) => [p.s - s0, p.cv / p.T], { s: s0 });
	},
	fixesP: false,
	lineResidual(fl, inv) {
		const s0 = inv.s as number;
		const sc = Math.max(Math.abs(s0), fl.R);
		return (_P, y, _dP, dy) => [(y[3] - s0) / sc, dy[3] / sc];
	},
	domeSaturation: (fl, _inv, t) => satOnT(fl, t),
	domeEnergy: 's',
	domeBounds: (fl) => domeTRange(fl),
	work: (start, end, _inv, integral) => byQuadrature(start, end, integral),
	domeWork: 'shaft',
	domeShaftIntegrand(fl, inv, t, pL, pV) {
		// −v·dPs/dT with Clapeyron's dPs/dT = Δs/Δv
		const sat = satAtT(fl, t);
		const L = evalPoint(fl, t, sat.rhoL, pL, 1);
		const V = evalPoint(fl, t, sat.rhoV, pV, 1);
		const x = ((inv.s as number) - L.s) / (V.s - L.s);
		const vL = 1 / sat.rhoL,
			vV = 1 / sat.rhoV;
		const dPs = (V.s - L.s) / (vV - vL);
		return -(vL + x * (vV - vL)) * dPs;
	}
};

const isenthalpic: ProcessCurve = {
	invariant: (start) => ({
		process: 'isenthalpic',
		P: start.P,
		rho: start.rho,
		T: start.T,
		s: start.s,
		h: start.h
	}),
	describe: (inv) => `at h = ${fmt(inv.h as number)} J/kg`,
	singleParam: 'lnP',
	domeParam: 'lnP',
	domeSign: 1,
	key: (c) => Math.log(c.P),
	singleBounds: (s) => [Math.log(s.Pfloor), Math.log(s.fl.Pmax)],
	single(s, t, guess, branch) {
		// (T, ln ρ) from P and h by 2-D Newton
		const fl = s.fl;
		const P = Math.exp(t);
		const h0 = s.inv.h as number;
		const sh = fl.R * fl.Tc;
		let T = guess ? guess.T : fl.Tc;
		let z = Math.log(guess ? guess.rho : P / (fl.R * fl.Tc));
		const p = new Point();
		for (let it = 0; it < 50; it++) {
			const rho = Math.exp(z);
			evalPoint(fl, T, rho, p, 2);
			const r1 = p.P / P - 1,
				r2 = (p.h - h0) / sh;
			const j11 = p.dPdT / P,
				j12 = (rho * p.dPdrho) / P;
			const j21 = propDT(p, 'h') / sh,
				j22 = (rho * propDrho(p, 'h')) / sh;
			const det = j11 * j22 - j12 * j21;
			if (!Number.isFinite(det) || det === 0 || !(p.dPdrho > 0)) break;
			let dT = -(r1 * j22 - j12 * r2) / det;
			let dz = -(j11 * r2 - r1 * j21) / det;
			const m = Math.max(1, Math.abs(dT) / (0.2 * T), Math.abs(dz) / 0.5);
			dT /= m;
			dz /= m;
			T += dT;
			z += dz;
			if (!(T > 0.5 * fl.Tmin && T < 2 * fl.Tmax)) break;
			if (Math.abs(dT) <= 1e-12 * T && Math.abs(dz) <= 1e-12) {
				evalPoint(fl, T, Math.exp(z), p, 2);
				p.P = P;
				return singlePt(p);
			}
		}
		return s.fallback({ P, h: h0 }, guess, branch);
	},
	fixesP: true,
	lineResidual(fl, inv) {
		const h0 = inv.h as number;
		const sc = Math.max(Math.abs(h0), fl.R * fl.Tc);
		return (_P, y, _dP, dy) => [(y[2] - h0) / sc, dy[2] / sc];
	},
	domeSaturation: (fl, _inv, t) => satOnP(fl, Math.exp(t)),
	domeEnergy: 'h',
	domeBounds: (fl) => [Math.log(triplePressure(fl)), Math.log(fl.Pc * (1 - 1e-9))],
	// throttling is irreversible: no work is exchanged
	work: () => ({ w: 0, wShaft: 0 }),
	domeWork: 'quadrature'
};

/** P = C·v⁻ⁿ at parameter ln v. */
const polyP = (inv: Invariant, t: number) => Math.exp((inv.lnC as number) - (inv.n as number) * t);
/** ln v at pressure P. */
const polyLnv = (inv: Invariant, P: number) =>
	((inv.lnC as number) - Math.log(P)) / (inv.n as number);

const polytropic: ProcessCurve = {
	invariant: (start, n) =>
		n === 0
			? { process: 'isobaric', P: start.P }
			: { process: 'polytropic', n, lnC: Math.log(start.P) + (n as number) * Math.log(start.v) },
	describe: (_inv, n) => `with P·vⁿ constant, n = ${fmt(n as number)}`,
	singleParam: 'lnv',
	domeParam: 'lnv',
	domeSign: 1,
	key: (c) => -Math.log(c.rho),
	singleBounds(s) {
		let [lo, hi] = lnvRange(s);
		if (s.inv.n !== 0) {
			const a = polyLnv(s.inv, s.fl.Pmax),
				b = polyLnv(s.inv, s.Pfloor);
			lo = Math.max(lo, Math.min(a, b));
			hi = Math.min(hi, Math.max(a, b));
		}
		return [lo, hi];
	},
	single(s, t, guess, branch) {
		const P = polyP(s.inv, t);
		const c = s.tAtRho(Math.exp(-t), guess, branch, (p) => [p.P / P - 1, p.dPdT / P], { P });
		if (c) c.P = P;
		return c;
	},
	fixesP: true,
	lineResidual(_fl, inv) {
		const n = inv.n as number,
			lnC = inv.lnC as number;
		return (P, y, dP, dy) => [Math.log(P) + n * Math.log(y[0]) - lnC, dP / P + (n * dy[0]) / y[0]];
	},
	domeSaturation: (fl, inv, t) => satOnP(fl, polyP(inv, t)),
	domeVolume: (_inv, t) => Math.exp(t),
	domeBounds: (fl, inv) => [polyLnv(inv, triplePressure(fl)), polyLnv(inv, fl.Pc * (1 - 1e-9))],
	work: (start, end, _inv, integral) => byQuadrature(start, end, integral),
	domeWork: 'quadrature'
};

/** The strategy of each process: the leg curve dispatches through this table. */
export const PROCESS_CURVES: Record<Process, ProcessCurve> = {
	isobaric,
	isochoric,
	isothermal,
	isentropic,
	isenthalpic,
	polytropic
};
