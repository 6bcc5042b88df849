/**
 * Water states from IAPWS-IF97 (IAPWS R7-97(2012)), the industrial formulation, in the engine's State
 * shape and SI units: if97State(P, T), if97StatePh(P, h), if97StatePs(P, s).
 *
 * Range of validity (R7-97(2012), section 4): 273.15 K ≤ T ≤ 1073.15 K for 0 < P ≤ 100 MPa and
 * 1073.15 K < T ≤ 2273.15 K for 0 < P ≤ 50 MPa. Regions: 1 compressed liquid (T ≤ 623.15 K,
 * P ≥ Psat), 2 vapor (P ≤ Psat below 623.15 K; below B23 up to 1073.15 K), 3 the basic equation in
 * (ρ, T) between 623.15 K and B23 (here reached from (P, T) by a safeguarded Newton iteration on
 * density, to |Δρ| ≤ 1e−12·ρ), 4 the saturation line, 5 above 1073.15 K.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Phase, State } from '../types.ts';
import {
	PC,
	RHOC,
	R_IF97,
	TC,
	gibbs1,
	gibbs2,
	gibbs5,
	helmholtz3,
	pB23,
	pressure3,
	psat,
	t1ph,
	t1ps,
	t2ph,
	t2ps,
	tB23,
	tsat,
	type Gibbs
} from './regions.ts';

export type If97Region = 1 | 2 | 3 | 4 | 5;

/** A State computed with IF97, with the IF97 region it lies in (4: inside the dome or on its lines). */
export type If97State = State & { region: If97Region };

/** Which saturated phase (P, T) on the saturation line means; elsewhere ignored. */
export interface If97Options {
	side?: 'liquid' | 'vapor';
}

/** Specific gas constant, J/(kg·K) (IAPWS R7-97(2012), Eq. 1). */
const R = R_IF97 * 1000;
const T_MIN = 273.15;
const T_13 = 623.15;
const T_25 = 1073.15;
const T_MAX = 2273.15;
/** MPa */
const P_MAX = 100;
const P_MAX5 = 50;
/** Pa: IF97 saturation pressure at 273.15 K (Eq. 30) */
const P_SAT_MIN = psat(T_MIN) * 1e6;

/**
 * IAPWS-IF97 limits in SI: temperature K, pressure Pa, and the critical point of the formulation
 * (IAPWS R7-97(2012), Eqs. 2–4 and section 4).
 */
export const if97Limits = {
	Tmin: T_MIN,
	Tmax: T_MAX,
	Pmax: P_MAX * 1e6,
	PmaxAbove1073K: P_MAX5 * 1e6,
	Tc: TC,
	Pc: PC * 1e6,
	rhoc: RHOC
} as const;

function phaseOf(T: number, P: number, psatAtT: number | null): Phase {
	if (T >= TC) return P >= PC * 1e6 ? 'supercritical-fluid' : 'superheated-vapor';
	if (P >= PC * 1e6) return 'compressed-liquid';
	return psatAtT !== null && P < psatAtT ? 'superheated-vapor' : 'compressed-liquid';
}

function fromGibbs(gb: Gibbs, T: number, P: number, region: If97Region): If97State {
	const { g, gp, gpp, gt, gtt, gpt, pi, tau } = gb;
	const RT = R * T;
	const v = (pi * gp * RT) / P;
	const a = gp - tau * gpt;
	const cp = -R * tau * tau * gtt;
	return {
		fluid: 'water',
		phase: 'compressed-liquid',
		T,
		P,
		v,
		rho: 1 / v,
		u: RT * (tau * gt - pi * gp),
		h: RT * tau * gt,
		s: R * (tau * gt - g),
		x: null,
		cp,
		cv: R * (-tau * tau * gtt + (a * a) / gpp),
		w: Math.sqrt((RT * gp * gp) / ((a * a) / (tau * tau * gtt) - gpp)),
		region
	};
}

function fromHelmholtz(rho: number, T: number, P: number): If97State {
	const { f, fd, fdd, ft, ftt, fdt, delta, tau } = helmholtz3(rho, T);
	const RT = R * T;
	const cv = -R * tau * tau * ftt;
	const b = delta * fd - delta * tau * fdt;
	const c = 2 * delta * fd + delta * delta * fdd;
	return {
		fluid: 'water',
		phase: 'compressed-liquid',
		T,
		P,
		v: 1 / rho,
		rho,
		u: RT * tau * ft,
		h: RT * (tau * ft + delta * fd),
		s: R * (tau * ft - f),
		x: null,
		cp: cv + (R * b * b) / c,
		cv,
		w: Math.sqrt(RT * (c - (b * b) / (tau * tau * ftt))),
		region: 3
	};
}

/**
 * Density (kg/m³) of region 3 at p (MPa) and T (K), by Newton's method on p(ρ, T) = p, kept inside
 * a bracket that shrinks with every step (bisection where Newton would leave it or where ∂p/∂ρ ≤ 0).
 * Below Tc: `liquid` looks for the root above ρc, `vapor` below it.
 */
/**
 * Above every density of region 3 (its densest state, 623.15 K and 100 MPa, is near 700 kg/m³) and
 * below the densities where the region-3 polynomial, far outside its range, turns back (near 900 kg/m³).
 */
const RHO3_MAX = 820;

function rho3(p: number, T: number, side: 'liquid' | 'vapor'): number {
	let lo: number;
	let hi: number;
	let rho: number;
	if (T < TC) {
		if (side === 'liquid') {
			lo = RHOC;
			hi = RHO3_MAX;
			rho = 700;
		} else {
			lo = 1e-6;
			hi = RHOC;
			rho = Math.min((p * 1e6) / (R * T), RHOC * 0.9);
		}
	} else {
		lo = 1e-6;
		hi = RHO3_MAX;
		rho = Math.min(Math.max(((p * 1e6) / (R * T)) * 1.5, 1), 700);
	}
	let fPrev = Infinity;
	for (let k = 0; k < 200; k++) {
		const { p: pr, dpdrho } = pressure3(rho, T);
		const f = pr - p;
		if (f === 0) return rho;
		if (dpdrho <= 0) {
			// inside the van der Waals loop: the root of the requested side lies beyond it
			if (side === 'liquid' || T >= TC) lo = rho;
			else hi = rho;
		} else if (f > 0) hi = rho;
		else lo = rho;
		let next = dpdrho > 0 ? rho - f / dpdrho : NaN;
		if (!(next > lo && next < hi) || Math.abs(f) > 0.5 * fPrev) next = 0.5 * (lo + hi);
		fPrev = Math.abs(f);
		if (Math.abs(next - rho) <= 1e-13 * rho || hi - lo <= 1e-13 * rho) return next;
		rho = next;
	}
	throw new ThermoError(
		'no-convergence',
		`IF97 region 3: no density found at P = ${fmt(p * 1e6)} Pa, T = ${fmt(T)} K.`,
		'Please report these inputs.'
	);
}

function checkRange(P: number, T: number): void {
	for (const [name, value] of [
		['P', P],
		['T', T]
	] as const)
		if (typeof value !== 'number' || !Number.isFinite(value))
			throw new ThermoError(
				'non-finite-input',
				`${name} must be a finite number (got ${String(value)}).`,
				`Give ${name} as a finite number in SI units.`
			);
	if (!(P > 0))
		throw new ThermoError(
			'non-positive-input',
			`P must be positive (got ${fmt(P, 0)}).`,
			'Give an absolute pressure in Pa.'
		);
	if (T < T_MIN)
		throw new ThermoError(
			'below-triple-point',
			`T = ${fmt(T)} K is below IAPWS-IF97's lower limit of ${T_MIN} K.`,
			`Give a temperature from ${T_MIN} to ${T_MAX} K.`
		);
	if (T > T_MAX)
		throw new ThermoError(
			'out-of-range',
			`T = ${fmt(T)} K is above IAPWS-IF97's upper limit of ${T_MAX} K.`,
			`Give a temperature from ${T_MIN} to ${T_MAX} K.`
		);
	if (P > P_MAX * 1e6)
		throw new ThermoError(
			'out-of-range',
			`P = ${fmt(P)} Pa is above IAPWS-IF97's upper limit of 100 MPa.`,
			'Give a pressure up to 1e8 Pa.'
		);
	if (T > T_25 && P > P_MAX5 * 1e6)
		throw new ThermoError(
			'out-of-range',
			`Above ${T_25} K IAPWS-IF97 holds up to 50 MPa; P = ${fmt(P)} Pa.`,
			'Give a pressure up to 5e7 Pa, or a temperature up to 1073.15 K.'
		);
}

/**
 * (p, T) on the saturation line: p within 1e−12·psat(T) of Eq. 30 (the round trip of Eqs. 30 and 31
 * agrees to a few 1e−15), so a pressure from if97SaturationTemperature's inverse counts as saturated.
 */
function onLine(p: number, ps: number): boolean {
	return Math.abs(p - ps) <= 1e-12 * ps;
}

/** The IF97 region (1, 2, 3 or 5) of a single-phase (P, T) in SI; on the saturation line 1 or 2 by `side` (default liquid). */
export function if97Region(P: number, T: number, options: If97Options = {}): If97Region {
	checkRange(P, T);
	const p = P / 1e6;
	if (T > T_25) return 5;
	if (T <= T_13) {
		const ps = psat(T);
		if (onLine(p, ps)) return options.side === 'vapor' ? 2 : 1;
		return p > ps ? 1 : 2;
	}
	return p > pB23(T) ? 3 : 2;
}

/**
 * Water state from pressure P (Pa) and temperature T (K) with IAPWS-IF97 (IAPWS R7-97(2012)):
 * Gibbs equations of regions 1 (Eq. 7), 2 (Eq. 15) and 5 (Eq. 32), the Helmholtz equation of
 * region 3 (Eq. 28) solved for density. On the saturation line (P = Psat(T) of Eq. 30) the
 * saturated liquid unless `options.side` is `vapor`. Throws ThermoError outside the range of validity.
 */
export function if97State(P: number, T: number, options: If97Options = {}): If97State {
	const region = if97Region(P, T, options);
	const p = P / 1e6;
	const ps = T < TC ? psat(T) : null;
	let st: If97State;
	if (region === 1) st = fromGibbs(gibbs1(T, p), T, P, 1);
	else if (region === 2) st = fromGibbs(gibbs2(T, p), T, P, 2);
	else if (region === 5) st = fromGibbs(gibbs5(T, p), T, P, 5);
	else {
		const side =
			ps !== null && (onLine(p, ps) ? options.side === 'vapor' : p < ps) ? 'vapor' : 'liquid';
		st = fromHelmholtz(rho3(p, T, side), T, P);
	}
	if (ps !== null && onLine(p, ps)) {
		const vapor = region === 2 || (region === 3 && options.side === 'vapor');
		st.phase = vapor ? 'saturated-vapor' : 'saturated-liquid';
		st.x = vapor ? 1 : 0;
	} else st.phase = phaseOf(T, P, ps === null ? null : ps * 1e6);
	return st;
}

/**
 * Single-phase state at (P, T) on a given side of the saturation line (used while iterating): below
 * 623.15 K region 1 for `liquid` and region 2 for `vapor` whichever side of Eq. 30 (P, T) lies on.
 * The caller checks the range.
 */
export function onSide(P: number, T: number, side: 'liquid' | 'vapor'): If97State {
	const p = P / 1e6;
	if (T > T_25) return fromGibbs(gibbs5(T, p), T, P, 5);
	// the caller keeps T on its side of Tsat(P), so round-off of Eqs. 30/31 at the line cannot flip the region
	if (T <= T_13)
		return side === 'liquid' ? fromGibbs(gibbs1(T, p), T, P, 1) : fromGibbs(gibbs2(T, p), T, P, 2);
	if (p <= pB23(T)) return fromGibbs(gibbs2(T, p), T, P, 2);
	return fromHelmholtz(rho3(p, T, T < TC && side === 'vapor' ? 'vapor' : 'liquid'), T, P);
}

/** Saturated liquid and vapor at P (Pa), with T = Tsat(P) from Eq. 31. */
function saturatedAtP(P: number): { T: number; liquid: If97State; vapor: If97State } {
	const p = P / 1e6;
	const T = tsat(p);
	const liquid =
		T <= T_13 ? fromGibbs(gibbs1(T, p), T, P, 1) : fromHelmholtz(rho3(p, T, 'liquid'), T, P);
	const vapor =
		T <= T_13 ? fromGibbs(gibbs2(T, p), T, P, 2) : fromHelmholtz(rho3(p, T, 'vapor'), T, P);
	liquid.phase = 'saturated-liquid';
	liquid.x = 0;
	vapor.phase = 'saturated-vapor';
	vapor.x = 1;
	return { T, liquid, vapor };
}

type Target = 'h' | 's';

/** The saturated mixture of quality x at (P, T) between its saturated liquid and vapor. */
export function mixture(
	P: number,
	T: number,
	liquid: If97State,
	vapor: If97State,
	x: number
): If97State {
	const mix = (a: number, b: number) => a + x * (b - a);
	const v = mix(liquid.v, vapor.v);
	return {
		fluid: 'water',
		phase: 'saturated-mixture',
		T,
		P,
		v,
		rho: 1 / v,
		u: mix(liquid.u, vapor.u),
		h: mix(liquid.h, vapor.h),
		s: mix(liquid.s, vapor.s),
		x,
		cp: null,
		cv: null,
		w: null,
		region: 4
	};
}

/**
 * T on one branch at fixed P where the target property equals `value`: Newton with
 * d h/dT = cp and d s/dT = cp/T, kept in a bracket [Tlo, Thi] (bisection when a step leaves it).
 */
function solveT(
	P: number,
	key: Target,
	value: number,
	Tlo: number,
	Thi: number,
	guess: number,
	side: 'liquid' | 'vapor'
): If97State {
	let lo = Tlo;
	let hi = Thi;
	let T = Math.min(Math.max(guess, lo), hi);
	let st = onSide(P, T, side);
	let fPrev = Infinity;
	for (let k = 0; k < 200; k++) {
		const f = st[key] - value;
		if (f > 0) hi = T;
		else lo = T;
		const d = key === 'h' ? (st.cp as number) : (st.cp as number) / T;
		let next = T - f / d;
		// bisect where Newton would leave the bracket or does not halve the residual (oscillation)
		if (!(next >= lo && next <= hi) || !Number.isFinite(next) || Math.abs(f) > 0.5 * fPrev)
			next = 0.5 * (lo + hi);
		fPrev = Math.abs(f);
		if (Math.abs(next - T) <= 1e-12 * T) {
			st = onSide(P, next, side);
			return st;
		}
		T = next;
		st = onSide(P, T, side);
		if (Math.abs(st[key] - value) <= 1e-13 * Math.max(Math.abs(value), 1)) return st;
	}
	throw new ThermoError(
		'no-convergence',
		`IF97: no temperature found at P = ${fmt(P)} Pa, ${key} = ${fmt(value)}.`,
		'Please report these inputs.'
	);
}

/** Beyond a range end by more than round-off (1e−11 relative, floor 1e−6 in SI units). */
const slack = (x: number) => 1e-11 * Math.abs(x) + 1e-6;
const below = (value: number, end: number) => value < end - slack(end);
const above = (value: number, end: number) => value > end + slack(end);

function fromPressureAnd(P: number, key: Target, value: number): If97State {
	for (const [name, x] of [
		['P', P],
		[key, value]
	] as const)
		if (typeof x !== 'number' || !Number.isFinite(x))
			throw new ThermoError(
				'non-finite-input',
				`${name} must be a finite number (got ${String(x)}).`,
				`Give ${name} as a finite number in SI units.`
			);
	checkRange(P, T_MIN);
	const p = P / 1e6;
	const Tmax = P <= P_MAX5 * 1e6 ? T_MAX : T_25;
	const guessLiquid = (T: number) =>
		(key === 'h' ? t1ph(p, value / 1000) : t1ps(p, value / 1000)) || T;
	const guessVapor = (T: number) => {
		const g = key === 'h' ? t2ph(p, value / 1000) : t2ps(p, value / 1000);
		return Number.isFinite(g) ? g : T;
	};
	const rangeError = (lo: If97State, hi: If97State) =>
		new ThermoError(
			'out-of-range',
			`${key} = ${fmt(value)} at P = ${fmt(P)} Pa lies outside IAPWS-IF97's range (${fmt(lo[key])} to ${fmt(hi[key])} at this pressure, ${T_MIN} to ${Tmax} K).`,
			`Give ${key} from ${fmt(lo[key])} to ${fmt(hi[key])}.`
		);
	let out: If97State;
	let branch: 'liquid' | 'vapor' | null = null;
	if (P >= PC * 1e6 || P < P_SAT_MIN) {
		const side = P < P_SAT_MIN ? 'vapor' : 'liquid';
		const lo = onSide(P, T_MIN, side);
		const hi = onSide(P, Tmax, side);
		if (below(value, lo[key]) || above(value, hi[key])) throw rangeError(lo, hi);
		const guess =
			P < P_SAT_MIN
				? guessVapor(T_MIN)
				: value <= onSide(P, T_13, side)[key]
					? guessLiquid(T_13)
					: 0.5 * (T_13 + Tmax);
		out = solveT(P, key, value, T_MIN, Tmax, guess, side);
	} else {
		const sat = saturatedAtP(P);
		if (value >= sat.liquid[key] && value <= sat.vapor[key]) {
			const x = (value - sat.liquid[key]) / (sat.vapor[key] - sat.liquid[key]);
			// within round-off of a saturated state (the line's Eqs. 30/31 agree to ~1e−15): that state
			if (x <= 1e-11) return sat.liquid;
			if (x >= 1 - 1e-11) return sat.vapor;
			return mixture(P, sat.T, sat.liquid, sat.vapor, x);
		}
		if (value < sat.liquid[key]) {
			const lo = onSide(P, T_MIN, 'liquid');
			if (below(value, lo[key])) throw rangeError(lo, onSide(P, Tmax, 'vapor'));
			out = solveT(
				P,
				key,
				value,
				T_MIN,
				sat.T,
				sat.T <= T_13 ? guessLiquid(sat.T) : sat.T - 1,
				'liquid'
			);
			branch = 'liquid';
		} else {
			const hi = onSide(P, Tmax, 'vapor');
			if (above(value, hi[key])) throw rangeError(onSide(P, T_MIN, 'liquid'), hi);
			out = solveT(P, key, value, sat.T, Tmax, guessVapor(sat.T), 'vapor');
			branch = 'vapor';
		}
	}
	if (branch === null) {
		out.phase = phaseOf(out.T, P, out.T < TC ? psat(out.T) * 1e6 : null);
		return out;
	}
	// below Pc the branch (liquid below Tsat(P), vapor above) names the phase; on the line, within
	// round-off of Eqs. 30/31, the saturated phase of that branch
	const saturated = onLine(P / 1e6, psat(Math.min(out.T, TC)));
	if (branch === 'liquid') out.phase = saturated ? 'saturated-liquid' : 'compressed-liquid';
	else out.phase = saturated ? 'saturated-vapor' : 'superheated-vapor';
	if (saturated) out.x = branch === 'liquid' ? 0 : 1;
	return out;
}

/**
 * Water state from pressure P (Pa) and specific enthalpy h (J/kg) with IAPWS-IF97: the backward
 * equations T(p, h) of regions 1 (R7-97(2012), Eq. 11) and 2 (Eqs. 22–24) give the first guess,
 * Newton on the basic equations makes h exact (|Δh| ≤ 1e−13·|h|); inside the dome x from the
 * saturated states at Tsat(P) (Eq. 31). Throws ThermoError outside the range of validity.
 */
export function if97StatePh(P: number, h: number): If97State {
	return fromPressureAnd(P, 'h', h);
}

/**
 * Water state from pressure P (Pa) and specific entropy s (J/(kg·K)) with IAPWS-IF97: first guess
 * from the backward equations T(p, s) of regions 1 (R7-97(2012), Eq. 13) and 2 (Eqs. 25–27), then
 * as if97StatePh.
 */
export function if97StatePs(P: number, s: number): If97State {
	return fromPressureAnd(P, 's', s);
}

/** Saturation pressure at T (K), Pa: IAPWS R7-97(2012), Eq. 30, 273.15 K ≤ T ≤ 647.096 K. */
export function if97SaturationPressure(T: number): number {
	if (!(T >= T_MIN && T <= TC))
		throw new ThermoError(
			'out-of-range',
			`IAPWS-IF97's saturation line runs from ${T_MIN} to ${TC} K; T = ${fmt(T)} K.`,
			`Give a temperature from ${T_MIN} to ${TC} K.`
		);
	return psat(T) * 1e6;
}

/** Saturation temperature at P (Pa), K: IAPWS R7-97(2012), Eq. 31, 611.213 Pa ≤ P ≤ 22.064 MPa. */
export function if97SaturationTemperature(P: number): number {
	if (!(P >= P_SAT_MIN && P <= PC * 1e6))
		throw new ThermoError(
			'out-of-range',
			`IAPWS-IF97's saturation line runs from ${fmt(P_SAT_MIN)} to ${PC * 1e6} Pa; P = ${fmt(P)} Pa.`,
			`Give a pressure from ${fmt(P_SAT_MIN)} to ${PC * 1e6} Pa.`
		);
	return tsat(P / 1e6);
}

/**
 * Region 3 state straight from density ρ (kg/m³) and temperature T (K), IAPWS R7-97(2012), Eq. 28, for
 * 623.15 K ≤ T and p(ρ, T) above B23 (not checked here: the caller's (ρ, T) must lie in region 3).
 */
export function if97Region3State(rho: number, T: number): If97State {
	const { p } = pressure3(rho, T);
	const st = fromHelmholtz(rho, T, p * 1e6);
	st.phase = phaseOf(T, st.P, T < TC ? psat(T) * 1e6 : null);
	return st;
}

/** Re-export of the boundary equations (SI) for checks and charts. */
export const if97Boundaries = {
	/** B23: P(T), Pa (Eq. 5) */
	pB23: (T: number) => pB23(T) * 1e6,
	/** B23: T(P), K (Eq. 6) */
	tB23: (P: number) => tB23(P / 1e6)
};
