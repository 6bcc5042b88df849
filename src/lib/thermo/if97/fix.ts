/**
 * Water states from IAPWS-IF97 fixed by any pair the sheet uses: T, P, v (or ρ), u, h, s, x.
 *
 * (P, T), (P, h) and (P, s) go straight to state.ts. A pair holding x is a saturated state (IF97's
 * saturation line, Eqs. 30/31). Every other pair is solved by Newton's method started from a seed
 * (the IAPWS-95 state of the same inputs, which differs from IF97's by about 1e−4): inside the dome in
 * T along IF97's saturation line with x from one of the two properties; outside it in (T, ln P) on the
 * basic equations (one unknown where T or P is given). The answer is checked to give back both inputs.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Inputs, Phase, State } from '../types.ts';
import { PC, TC, psat, tsat } from './regions.ts';
import {
	if97Limits,
	if97State,
	if97StatePh,
	if97StatePs,
	mixture,
	onSide,
	type If97State
} from './state.ts';

type Prop = 'T' | 'P' | 'v' | 'u' | 'h' | 's' | 'x';

/** Where to start Newton's method: T (K), P (Pa) and whether the seed lies inside the dome. */
export interface If97Seed {
	T: number;
	P: number;
	/** the seed's quality: a number on or inside the dome */
	x?: number | null;
	/** the seed's phase: which side of the saturation line to look on */
	phase?: Phase;
}

const PCPa = PC * 1e6;
const P_SAT_MIN = psat(if97Limits.Tmin) * 1e6;

/** The two inputs as [name, value] with ρ read as v; throws the engine's refusals for bad pairs. */
function pairOf(inputs: Inputs): [[Prop, number], [Prop, number]] {
	const entries = Object.entries(inputs).filter(([, x]) => x !== undefined) as [string, number][];
	if (entries.length !== 2)
		throw new ThermoError(
			'wrong-input-count',
			`A state needs exactly two properties (got ${entries.length}).`,
			'Give two of T, P, v, rho, u, h, s, x.'
		);
	const out = entries.map(([k, x]): [Prop, number] => {
		if (typeof x !== 'number' || !Number.isFinite(x))
			throw new ThermoError(
				'non-finite-input',
				`${k} must be a finite number (got ${String(x)}).`,
				`Give ${k} as a finite number in SI units.`
			);
		if (k === 'rho') return ['v', 1 / x];
		if (!['T', 'P', 'v', 'u', 'h', 's', 'x'].includes(k))
			throw new ThermoError(
				'unknown-input',
				`Unknown property "${k}".`,
				'Give two of T, P, v, rho, u, h, s, x.'
			);
		return [k as Prop, x];
	}) as [[Prop, number], [Prop, number]];
	if (out[0][0] === out[1][0])
		throw new ThermoError(
			'duplicate-property',
			`Both inputs are ${out[0][0]} (v and rho are one property).`,
			'Give two different properties.'
		);
	for (const [k, x] of out)
		if ((k === 'T' || k === 'P' || k === 'v') && !(x > 0))
			throw new ThermoError(
				'non-positive-input',
				`${k} must be positive (got ${fmt(x, 0)}).`,
				`Give ${k} as a positive number in SI units.`
			);
	return out;
}

/** Saturated liquid and vapor of IF97 at T (K), on the line of Eq. 30. */
function saturationAtT(T: number): { P: number; liquid: If97State; vapor: If97State } {
	if (!(T >= if97Limits.Tmin && T < TC))
		throw new ThermoError(
			'out-of-range',
			`IAPWS-IF97's saturation line runs from ${if97Limits.Tmin} K to its critical temperature ${TC} K; T = ${fmt(T)} K.`,
			`Give a temperature from ${if97Limits.Tmin} to ${TC} K for a saturated state.`
		);
	const P = psat(T) * 1e6;
	return {
		P,
		liquid: if97State(P, T, { side: 'liquid' }),
		vapor: if97State(P, T, { side: 'vapor' })
	};
}

/** Saturated mixture of quality x between two saturated states (x 0 and 1 give the states themselves). */
function mixOf(liquid: If97State, vapor: If97State, x: number): If97State {
	if (x === 0) return liquid;
	if (x === 1) return vapor;
	return mixture(liquid.P, liquid.T, liquid, vapor, x);
}

function checkQuality(x: number): void {
	if (!(x >= 0 && x <= 1))
		throw new ThermoError(
			'quality-out-of-range',
			`x must lie from 0 to 1 (got ${fmt(x)}).`,
			'Give a quality from 0 (saturated liquid) to 1 (saturated vapor).'
		);
}

/** Quality of `key` = value between the saturated states, or null when it lies outside them. */
function qualityOf(liquid: State, vapor: State, key: Prop, value: number): number | null {
	const a = liquid[key] as number;
	const b = vapor[key] as number;
	const x = (value - a) / (b - a);
	const tol = 1e-12;
	if (x < -tol || x > 1 + tol) return null;
	return Math.min(1, Math.max(0, x));
}

const valueOf = (st: State, key: Prop) => st[key] as number;

/** Residual of one property, scaled so that 1e−12 means agreement to round-off. */
function residual(st: State, key: Prop, value: number): number {
	if (key === 'v') return Math.log(st.v / value);
	if (key === 'T') return (st.T - value) / value;
	if (key === 'P') return Math.log(st.P / value);
	if (key === 's') return (st.s - value) / (Math.abs(value) + 100);
	return (valueOf(st, key) - value) / (Math.abs(value) + 1e4);
}

const TOL = 1e-11;

/** 1-D Newton (secant-safeguarded by step halving) on f(y) = 0 from y0; f returns null off the range. */
function newton1(f: (y: number) => number | null, y0: number, dy: number): number | null {
	let y = y0;
	let fy = f(y);
	if (fy === null) return null;
	for (let k = 0; k < 60; k++) {
		if (Math.abs(fy) <= TOL) return y;
		const h = dy * Math.max(1e-7, Math.min(1e-3, Math.abs(fy)));
		const f1 = f(y + h);
		if (f1 === null || f1 === fy) return null;
		let step = (-fy * h) / (f1 - fy);
		let next: number | null = null;
		for (let j = 0; j < 30; j++) {
			const t = f(y + step);
			if (t !== null && Math.abs(t) < Math.abs(fy)) {
				next = t;
				break;
			}
			step /= 2;
		}
		if (next === null) return Math.abs(fy) <= 1e3 * TOL ? y : null;
		y += step;
		fy = next;
	}
	return Math.abs(fy) <= 1e3 * TOL ? y : null;
}

/** Single-phase state at (P, T) on `side` (metastable beyond the line while iterating), or null outside IF97's range. */
function tryState(P: number, T: number, side: 'liquid' | 'vapor'): If97State | null {
	if (!(P > 0 && T >= if97Limits.Tmin && T <= if97Limits.Tmax && P <= if97Limits.Pmax)) return null;
	if (T > 1073.15 && P > if97Limits.PmaxAbove1073K) return null;
	try {
		return onSide(P, T, side);
	} catch (e) {
		if (e instanceof ThermoError) return null;
		throw e;
	}
}

/** The converged single-phase state with its phase and region named (if97State), when on `side`. */
function labelled(st: If97State | null, side: 'liquid' | 'vapor'): If97State | null {
	if (!st || !consistent(st, side)) return null;
	return if97State(st.P, st.T, { side });
}

/** 2-D Newton in (T, ln P) on two residuals, from the seed; null when it does not converge. */
function newton2(
	a: [Prop, number],
	b: [Prop, number],
	seed: If97Seed,
	side: 'liquid' | 'vapor'
): If97State | null {
	let T = seed.T;
	let lnP = Math.log(seed.P);
	const F = (T: number, lnP: number): [number, number, If97State] | null => {
		const st = tryState(Math.exp(lnP), T, side);
		if (!st) return null;
		return [residual(st, a[0], a[1]), residual(st, b[0], b[1]), st];
	};
	let cur = F(T, lnP);
	if (!cur) return null;
	for (let k = 0; k < 60; k++) {
		const norm = Math.max(Math.abs(cur[0]), Math.abs(cur[1]));
		if (norm <= TOL) return cur[2];
		const hT = 1e-6 * T;
		const hP = 1e-4;
		const fT = F(T + hT, lnP);
		const fP = F(T, lnP + hP);
		if (!fT || !fP) return null;
		const j11 = (fT[0] - cur[0]) / hT;
		const j21 = (fT[1] - cur[1]) / hT;
		const j12 = (fP[0] - cur[0]) / hP;
		const j22 = (fP[1] - cur[1]) / hP;
		const det = j11 * j22 - j12 * j21;
		if (!Number.isFinite(det) || det === 0) return null;
		let dT = (-cur[0] * j22 + cur[1] * j12) / det;
		let dlnP = (-cur[1] * j11 + cur[0] * j21) / det;
		// keep a step within 20 % in T and a factor e in P
		const scale = Math.max(Math.abs(dT) / (0.2 * T), Math.abs(dlnP), 1);
		dT /= scale;
		dlnP /= scale;
		let next: [number, number, If97State] | null = null;
		for (let j = 0; j < 30; j++) {
			const t = F(T + dT, lnP + dlnP);
			if (t && Math.max(Math.abs(t[0]), Math.abs(t[1])) < norm) {
				next = t;
				break;
			}
			dT /= 2;
			dlnP /= 2;
		}
		if (!next) return norm <= 1e3 * TOL ? cur[2] : null;
		T += dT;
		lnP += dlnP;
		cur = next;
	}
	return Math.max(Math.abs(cur[0]), Math.abs(cur[1])) <= 1e3 * TOL ? cur[2] : null;
}

/** Inside the dome: T on IF97's line where the pair holds, x from the property that sets it best. */
function twoPhase(a: [Prop, number], b: [Prop, number], seedT: number): If97State | null {
	// x from v when v is given (the phases differ most in it), else from the first property
	const [xp, other] = b[0] === 'v' ? [b, a] : [a, b];
	const at = (T: number): If97State | null => {
		if (!(T >= if97Limits.Tmin && T < TC)) return null;
		const sat = saturationAtT(T);
		const x = qualityOf(sat.liquid, sat.vapor, xp[0], xp[1]);
		return x === null ? null : mixOf(sat.liquid, sat.vapor, x);
	};
	const T0 = Math.min(Math.max(seedT, if97Limits.Tmin), TC - 1e-6);
	const T = newton1(
		(T) => {
			const st = at(T);
			return st ? residual(st, other[0], other[1]) : null;
		},
		T0,
		T0
	);
	return T === null ? null : at(T);
}

function insideDomeAt(st: If97State): boolean {
	return st.T < TC && st.P < PCPa && st.P >= P_SAT_MIN;
}

/** A single-phase answer lies on the side of the saturation line its phase says (within round-off). */
function consistent(st: If97State, side: 'liquid' | 'vapor'): boolean {
	if (!insideDomeAt(st)) return true;
	const ps = psat(st.T) * 1e6;
	return side === 'liquid' ? st.P >= ps * (1 - 1e-9) : st.P <= ps * (1 + 1e-9);
}

function solved(a: [Prop, number], b: [Prop, number], st: If97State | null): If97State | null {
	if (!st) return null;
	for (const [k, x] of [a, b]) {
		if (k === 'x') {
			if (st.x === null || Math.abs(st.x - x) > 1e-9) return null;
		} else if (Math.abs(residual(st, k, x)) > 1e-8) return null;
	}
	return st;
}

/**
 * A water state by IAPWS-IF97 from any two of T, P, v, rho, u, h, s, x (SI). `seed` is where
 * Newton's method starts for pairs that need it (e.g. the IAPWS-95 state of the same inputs); the
 * engine's entry `if97Fix` in index.ts supplies it. Throws ThermoError outside IF97's range or where
 * no IF97 state has both inputs near the seed.
 */
export function if97FixFrom(inputs: Inputs, seedOrGet: If97Seed | (() => If97Seed)): If97State {
	const [a, b] = pairOf(inputs);
	let seedValue: If97Seed | undefined;
	const seedOf = () => (seedValue ??= typeof seedOrGet === 'function' ? seedOrGet() : seedOrGet);
	const has = (k: Prop) => (a[0] === k ? a[1] : b[0] === k ? b[1] : undefined);
	const otherOf = (k: Prop): [Prop, number] => (a[0] === k ? b : a);
	const T = has('T');
	const P = has('P');
	const x = has('x');
	if (T !== undefined && P !== undefined) {
		const ps = T < TC ? psat(T) * 1e6 : null;
		const onLine = ps !== null && Math.abs(P - ps) <= 1e-9 * ps;
		return if97State(onLine ? (ps as number) : P, T, {
			side: seedOf().phase === 'saturated-vapor' || seedOf().x === 1 ? 'vapor' : 'liquid'
		});
	}
	if (P !== undefined && has('h') !== undefined) return if97StatePh(P, has('h') as number);
	if (P !== undefined && has('s') !== undefined) return if97StatePs(P, has('s') as number);
	if (x !== undefined) {
		checkQuality(x);
		if (T !== undefined) {
			const sat = saturationAtT(T);
			return mixOf(sat.liquid, sat.vapor, x);
		}
		if (P !== undefined) {
			if (!(P >= P_SAT_MIN && P < PCPa))
				throw new ThermoError(
					'out-of-range',
					`IAPWS-IF97's saturation line runs from ${fmt(P_SAT_MIN)} Pa to its critical pressure ${PCPa} Pa; P = ${fmt(P)} Pa.`,
					`Give a pressure from ${fmt(P_SAT_MIN)} to ${PCPa} Pa for a saturated state.`
				);
			// the saturated states at the given P itself, each on its own side of the line
			const Ts = tsat(P / 1e6);
			const liquid = onSide(P, Ts, 'liquid');
			const vapor = onSide(P, Ts, 'vapor');
			liquid.phase = 'saturated-liquid';
			liquid.x = 0;
			vapor.phase = 'saturated-vapor';
			vapor.x = 1;
			return mixOf(liquid, vapor, x);
		}
		const o = otherOf('x');
		const T0 = Math.min(Math.max(seedOf().T, if97Limits.Tmin), TC - 1e-6);
		const Tx = newton1(
			(T) => {
				if (!(T >= if97Limits.Tmin && T < TC)) return null;
				const sat = saturationAtT(T);
				return residual(mixOf(sat.liquid, sat.vapor, x), o[0], o[1]);
			},
			T0,
			T0
		);
		const st =
			Tx === null
				? null
				: solved(a, b, mixOf(saturationAtT(Tx).liquid, saturationAtT(Tx).vapor, x));
		if (!st) throw noState(inputs);
		return st;
	}
	const seed = seedOf();
	const seedInside =
		seed.phase !== undefined
			? seed.phase === 'saturated-mixture'
			: seed.x !== null && seed.x !== undefined && seed.x > 0 && seed.x < 1;
	const side: 'liquid' | 'vapor' =
		seed.phase !== undefined
			? seed.phase === 'superheated-vapor' || seed.phase === 'saturated-vapor'
				? 'vapor'
				: 'liquid'
			: seed.x === 1 ||
				  (!seedInside && seed.T < TC && seed.P < psat(Math.max(seed.T, if97Limits.Tmin)) * 1e6)
				? 'vapor'
				: 'liquid';
	const tries: (() => If97State | null)[] = [];
	if (T !== undefined) {
		// at fixed T: inside the dome when the other property lies between the saturated ones
		const o = otherOf('T');
		const dome = () => {
			if (!(T < TC && T >= if97Limits.Tmin)) return null;
			const sat = saturationAtT(T);
			const xq = qualityOf(sat.liquid, sat.vapor, o[0], o[1]);
			return xq === null ? null : mixOf(sat.liquid, sat.vapor, xq);
		};
		if (seedInside) tries.push(dome);
		tries.push(() => {
			const lnP = newton1(
				(y) => {
					const st = tryState(Math.exp(y), T, side);
					return st ? residual(st, o[0], o[1]) : null;
				},
				Math.log(seed.P),
				1
			);
			return labelled(lnP === null ? null : tryState(Math.exp(lnP), T, side), side);
		});
		if (!seedInside) tries.push(dome);
	} else if (P !== undefined) {
		const o = otherOf('P');
		const dome = () => {
			if (!(P < PCPa && P >= P_SAT_MIN)) return null;
			const sat = saturationAtT(tsat(P / 1e6));
			const xq = qualityOf(sat.liquid, sat.vapor, o[0], o[1]);
			return xq === null ? null : mixOf(sat.liquid, sat.vapor, xq);
		};
		if (seedInside) tries.push(dome);
		tries.push(() => {
			const Tp = newton1(
				(T) => {
					const st = tryState(P, T, side);
					return st ? residual(st, o[0], o[1]) : null;
				},
				seed.T,
				seed.T
			);
			return labelled(Tp === null ? null : tryState(P, Tp, side), side);
		});
		if (!seedInside) tries.push(dome);
	} else {
		const single = () => labelled(newton2(a, b, seed, side), side);
		// a pair holding h or s: one unknown, P, with the state at (P, h) or (P, s) from state.ts
		// (either phase, and the dome), the other property the residual
		const key = has('s') !== undefined ? 's' : has('h') !== undefined ? 'h' : null;
		if (key !== null) {
			const value = has(key) as number;
			const o = otherOf(key);
			const at = (y: number): If97State | null => {
				try {
					const P = Math.exp(y);
					return key === 's' ? if97StatePs(P, value) : if97StatePh(P, value);
				} catch (e) {
					if (e instanceof ThermoError) return null;
					throw e;
				}
			};
			tries.push(() => {
				const y = newton1(
					(y) => {
						const st = at(y);
						return st ? residual(st, o[0], o[1]) : null;
					},
					Math.log(seed.P),
					1
				);
				return y === null ? null : at(y);
			});
		}
		const dome = () => twoPhase(a, b, seed.T);
		if (seedInside) tries.push(dome, single);
		else tries.push(single, dome);
	}
	for (const t of tries) {
		const st = solved(a, b, t());
		if (st) return st;
	}
	throw noState(inputs);
}

function noState(inputs: Inputs): ThermoError {
	const pair = Object.entries(inputs)
		.filter(([, x]) => x !== undefined)
		.map(([k, x]) => `${k} = ${fmt(x as number)}`)
		.join(', ');
	return new ThermoError(
		'out-of-range',
		`IAPWS-IF97 has no water state with ${pair} within its range of validity (273.15 to 1073.15 K up to 100 MPa, to 2273.15 K up to 50 MPa) near the IAPWS-95 state of the same inputs.`,
		'Keep the state within IAPWS-IF97’s range, or use IAPWS-95 for this sheet.'
	);
}
