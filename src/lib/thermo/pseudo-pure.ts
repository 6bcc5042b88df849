/**
 * The two-phase band of a pseudo-pure mixture (air, Lemmon et al. 2000).
 *
 * A pseudo-pure equation treats a mixture of fixed composition as one fluid. It describes the gas,
 * the liquid and the supercritical fluid, but not the states between the mixture's bubble line
 * (where the first vapor forms from the liquid) and its dew line (where the first liquid forms
 * from the vapor): there liquid and vapor of different compositions coexist, and no equation of a
 * fixed-composition fluid gives their amounts or properties. This module places a state with
 * respect to that band (from the paper's ancillary equations for the bubble- and dew-point
 * pressures, and the equation's own densities at those pressures) and refuses states inside it.
 *
 * Phase labels for such a fluid: below the maxcondentherm temperature Tj, a state above the bubble
 * line is a `compressed-liquid`, one below the dew line a `superheated-vapor`; at or above Tj a
 * state at or above the maxcondentherm pressure is a `supercritical-fluid`, else a
 * `superheated-vapor`.
 *
 * How the engine serves such a fluid (`FluidData.band`): the pure-fluid flashes run on the equation
 * (its own phase equilibrium lies inside the band), and every answer is held to the band here
 * (`holdOutsideBand`): a state between the lines is refused, one outside is relabelled. Quality
 * inputs mean a line: x = 0 the bubble point, x = 1 the dew point (`fixOnLine`); other x refused.
 */
import { ThermoError, fmt } from './errors.ts';
import { AncillaryEq, type Fluid } from './fluid.ts';
import type { BubbleDensityEq } from './fluids/air.ts';
import type { Ancillary } from './fluids/schema.ts';
import { evalPoint, Point } from './properties.ts';
import { densityAtTP } from './solvers/density.ts';
import { singleState } from './state.ts';
import type { Leg, Phase, SaturationCurve, State } from './types.ts';

export interface BandData {
	maxcondentherm: { T: number; P: number; rho: number };
	bubblePressure: Ancillary;
	dewPressure: Ancillary;
	bubbleDensity: BubbleDensityEq;
	dewDensity: Ancillary;
}

export class MixtureBand {
	/** maxcondentherm temperature (K) and pressure (Pa): the band's top */
	readonly Tj: number;
	readonly Pj: number;
	/** maxcondentherm density, kg/m³ */
	readonly rhoj: number;
	private readonly pb: AncillaryEq;
	private readonly pd: AncillaryEq;
	private readonly rd: AncillaryEq;

	constructor(
		private readonly fl: Fluid,
		private readonly band: BandData
	) {
		this.Tj = band.maxcondentherm.T;
		this.Pj = band.maxcondentherm.P;
		this.rhoj = band.maxcondentherm.rho;
		this.pb = new AncillaryEq(band.bubblePressure, this.Tj);
		this.pd = new AncillaryEq(band.dewPressure, this.Tj);
		this.rd = new AncillaryEq(band.dewDensity, this.Tj);
	}

	/** bubble-point pressure at T < Tj, Pa (the paper's ancillary equation) */
	bubbleP(T: number): number {
		return this.pb.value(T);
	}

	/** dew-point pressure at T < Tj, Pa */
	dewP(T: number): number {
		return this.pd.value(T);
	}

	/** the paper's bubble-point density equation at T ≤ Tj, kg/m³ (a starting guess) */
	bubbleDensityGuess(T: number): number {
		const e = this.band.bubbleDensity;
		const theta = Math.max(0, 1 - T / e.Tr);
		let s = 1 + e.nLog * Math.log(Math.min(T, e.Tr) / e.Tr);
		for (let i = 0; i < e.n.length; i++) s += e.n[i] * theta ** e.t[i];
		return e.yc * s;
	}

	/** the equation's liquid density at the bubble point (T, bubble P), kg/m³ */
	bubbleRho(T: number): number {
		return branchRoot(this.fl, T, this.bubbleP(T), this.bubbleDensityGuess(T), 'liquid');
	}

	/** the equation's vapor density at the dew point (T, dew P), kg/m³ */
	dewRho(T: number): number {
		return branchRoot(this.fl, T, this.dewP(T), this.rd.value(T), 'vapor');
	}

	/** whether (T, P) lies between the dew and bubble lines (edges included) */
	insideTP(T: number, P: number): boolean {
		return T < this.Tj && P >= this.dewP(T) && P <= this.bubbleP(T);
	}

	/** whether (T, ρ) lies between the dew- and bubble-point densities (edges excluded: they are the lines' own states) */
	insideTRho(T: number, rho: number): boolean {
		return T < this.Tj && rho > this.dewRho(T) && rho < this.bubbleRho(T);
	}

	/** phase label of a single-phase state outside the band (see the module's comment) */
	phase(T: number, P: number): Phase {
		if (T >= this.Tj) return P >= this.Pj ? 'supercritical-fluid' : 'superheated-vapor';
		return P > this.bubbleP(T) ? 'compressed-liquid' : 'superheated-vapor';
	}

	/** The refusal of a state inside the band at T (K), with what to give instead. */
	refusal(T: number): ThermoError {
		const name = this.fl.data.name.toLowerCase();
		return new ThermoError(
			'mixture-two-phase',
			`${this.fl.data.name} is a mixture: between its bubble and dew lines (at T = ${fmt(T)} K: bubble P = ${fmt(this.bubbleP(T))} Pa, ` +
				`dew P = ${fmt(this.dewP(T))} Pa) it is two-phase, with liquid and vapor of different compositions, ` +
				`which the pseudo-pure equation of ${name} cannot describe.`,
			`Give a state outside that band: a pressure above ${fmt(this.bubbleP(T))} Pa (liquid) or below ${fmt(this.dewP(T))} Pa (gas) at this T, ` +
				`or a temperature at or above ${fmt(this.Tj)} K (the maxcondentherm), where ${name} is single-phase at every pressure.`
		);
	}
}

/**
 * Density at (T, P) on one branch of the isotherm: from `guess`, walk away from the other branch
 * (down in density for the liquid, up for the vapor) in 2 % steps until the pressure crosses P while
 * (∂P/∂ρ)_T stays positive, then solve inside that bracket. NaN if the branch has no such root.
 */
export function branchRoot(
	fl: Fluid,
	T: number,
	P: number,
	guess: number,
	branch: 'liquid' | 'vapor'
): number {
	const tau = fl.Tr / T,
		RT = fl.R * T;
	const f = (rho: number) => {
		const r = fl.residualAt(rho / fl.rhor, tau, 2);
		return { f: rho * RT * (1 + r.d1) - P, df: RT * (1 + 2 * r.d1 + r.d2) };
	};
	const step = branch === 'liquid' ? 0.98 : 1 / 0.98;
	let a = guess;
	let fa = f(a);
	// first make sure the guess itself is on the far side of P for its branch (liquid: P(ρ) > P; vapor: P(ρ) < P)
	for (let i = 0; i < 200 && (branch === 'liquid' ? fa.f <= 0 : fa.f >= 0); i++) {
		a /= step;
		fa = f(a);
	}
	let b = a;
	for (let i = 0; i < 400; i++) {
		const nb = b * step;
		const fb = f(nb);
		if (!(fb.df > 0)) return NaN;
		b = nb;
		if (branch === 'liquid' ? fb.f < 0 : fb.f > 0) break;
		if (i === 399) return NaN;
	}
	const lo = Math.min(a, b),
		hi = Math.max(a, b);
	return densityAtTP(fl, T, P, 0.5 * (lo + hi), lo, hi);
}

/** The fluid's band, if it is a mixture (FluidData.band); built once per compiled fluid. */
export function bandOf(fl: Fluid): MixtureBand | null {
	const data = fl.data.band;
	if (!data) return null;
	let b = fl.cache.band as MixtureBand | undefined;
	if (!b) {
		b = new MixtureBand(fl, data);
		fl.cache.band = b;
	}
	return b;
}

export type BandLine = 'bubble' | 'dew';

/** Temperature (K) where a line reaches P (Pa), below the maxcondentherm; null above its range. */
export function lineTemperature(
	fl: Fluid,
	band: MixtureBand,
	line: BandLine,
	P: number
): number | null {
	const pOf = (T: number) => (line === 'bubble' ? band.bubbleP(T) : band.dewP(T));
	let lo = fl.Tt,
		hi = band.Tj;
	if (!(P >= pOf(lo) && P <= pOf(hi))) return null;
	// both lines rise monotonically with T up to the maxcondentherm
	for (let k = 0; k < 100 && hi - lo > 1e-12 * hi; k++) {
		const m = 0.5 * (lo + hi);
		if (pOf(m) < P) lo = m;
		else hi = m;
	}
	return 0.5 * (lo + hi);
}

/** The state on a line at T (Tt ≤ T < Tj): liquid at its bubble point (x = 0) or vapor at its dew point (x = 1). */
export function lineState(fl: Fluid, band: MixtureBand, line: BandLine, T: number): State {
	const P = line === 'bubble' ? band.bubbleP(T) : band.dewP(T);
	const rho = line === 'bubble' ? band.bubbleRho(T) : band.dewRho(T);
	if (!Number.isFinite(rho))
		throw new ThermoError(
			'no-convergence',
			`The ${line} point of ${fl.id} at T = ${fmt(T)} K could not be placed on its equation.`,
			`Give a temperature below ${fmt(band.Tj)} K, or a state off the line.`
		);
	const p = evalPoint(fl, T, rho, new Point(), 2);
	return singleState(
		fl,
		p,
		line === 'bubble' ? 'saturated-liquid' : 'saturated-vapor',
		line === 'bubble' ? 0 : 1,
		P
	);
}

function qualityRefusal(fl: Fluid, x: number): ThermoError {
	return new ThermoError(
		'mixture-two-phase',
		`${fl.data.name} is a mixture: a quality x = ${fmt(x, 0, 1)} lies between its bubble and dew lines, where liquid and vapor of different compositions coexist, which its pseudo-pure equation cannot describe.`,
		'Give x = 0 (the liquid at its bubble point) or x = 1 (the vapor at its dew point), or a state outside the band by two other properties.'
	);
}

type LineKey = 'T' | 'P' | 'rho' | 'u' | 'h' | 's';

/**
 * A state on the bubble (x = 0) or dew (x = 1) line fixed by one more property: T and P directly
 * (P by bisection on the line's pressure), ρ, u, h or s by a scan of the line from the lowest
 * temperature to the maxcondentherm and bisection on the first bracket.
 */
export function fixOnLine(
	fl: Fluid,
	band: MixtureBand,
	key: LineKey,
	value: number,
	x: number
): State {
	if (x !== 0 && x !== 1) throw qualityRefusal(fl, x);
	const line: BandLine = x === 0 ? 'bubble' : 'dew';
	const Tlo = fl.Tt,
		Thi = band.Tj * (1 - 1e-9);
	const name = `${line} line of ${fl.id}`;
	if (key === 'T') {
		if (!(value < band.Tj))
			throw new ThermoError(
				'inconsistent-inputs',
				`There is no ${name} at or above the maxcondentherm temperature ${fmt(band.Tj)} K; T = ${fmt(value)} K.`,
				`Give a temperature from ${fmt(Tlo)} to below ${fmt(band.Tj)} K.`
			);
		return lineState(fl, band, line, value);
	}
	if (key === 'P') {
		const T = lineTemperature(fl, band, line, value);
		if (T === null)
			throw new ThermoError(
				'inconsistent-inputs',
				`The ${name} spans ${fmt(line === 'bubble' ? band.bubbleP(Tlo) : band.dewP(Tlo))} to ${fmt(line === 'bubble' ? band.bubbleP(Thi) : band.dewP(Thi))} Pa; P = ${fmt(value)} Pa is outside it.`,
				'Give a pressure on that range, or the state by two other properties.'
			);
		const st = lineState(fl, band, line, T);
		return { ...st, P: value };
	}
	const N = 120;
	const f = (T: number) => (lineState(fl, band, line, T)[key] as number) - value;
	let a = Tlo,
		fa = f(a);
	for (let i = 1; i <= N; i++) {
		const b = Tlo + ((Thi - Tlo) * i) / N;
		const fb = f(b);
		if (fa === 0) return lineState(fl, band, line, a);
		if (fa * fb < 0) {
			let lo = a,
				hi = b,
				flo = fa;
			for (let k = 0; k < 80 && hi - lo > 1e-13 * hi; k++) {
				const m = 0.5 * (lo + hi);
				const fm = f(m);
				if (fm * flo <= 0) hi = m;
				else {
					lo = m;
					flo = fm;
				}
			}
			return lineState(fl, band, line, 0.5 * (lo + hi));
		}
		a = b;
		fa = fb;
	}
	throw new ThermoError(
		'inconsistent-inputs',
		`No state on the ${name} (from ${fmt(Tlo)} K to the maxcondentherm ${fmt(band.Tj)} K) has ${key} = ${fmt(value)}.`,
		'Give a value the line reaches, or the state by two other properties.'
	);
}

/** Whether a state from the pure-fluid solvers lies in the band (or on the equation's own dome, inside it). */
export function inBand(band: MixtureBand, st: State): boolean {
	if (st.x !== null && st.x !== undefined) return true;
	if (!(st.T < band.Tj)) return false;
	// the lines themselves (a bubble or dew point re-fixed from other properties) are not inside.
	// Pressure decides: the pure-fluid solvers answer a state inside the equation's own dome as
	// two-phase (above), and a single-phase state of theirs with a density between the dew- and
	// bubble-point densities has a pressure between the two lines' (its isotherm rises there).
	const tol = 1e-7;
	return st.P > band.dewP(st.T) * (1 + tol) && st.P < band.bubbleP(st.T) * (1 - tol);
}

/** The line a state outside the band lies on (within 1e−7 in pressure), or null. */
function onLine(band: MixtureBand, st: State): BandLine | null {
	if (!(st.T < band.Tj)) return null;
	if (Math.abs(st.P / band.bubbleP(st.T) - 1) <= 1e-7) return 'bubble';
	if (Math.abs(st.P / band.dewP(st.T) - 1) <= 1e-7) return 'dew';
	return null;
}

/**
 * Hold a state the pure-fluid solvers returned to the band: refused if it lies between the lines
 * (in pressure, or in density at its temperature) or is two-phase on the equation's own dome,
 * else relabelled (compressed liquid above the bubble line, vapor below the dew line).
 */
export function holdOutsideBand(fl: Fluid, band: MixtureBand, st: State): State {
	if (inBand(band, st)) throw band.refusal(st.T);
	const line = onLine(band, st);
	if (line === 'bubble') return { ...st, phase: 'saturated-liquid', x: 0 };
	if (line === 'dew') return { ...st, phase: 'saturated-vapor', x: 1 };
	const phase = band.phase(st.T, st.P);
	return phase === st.phase ? st : { ...st, phase };
}

/** Both lines for drawing: the bubble line as `liquid`, the dew line as `vapor`, up to the maxcondentherm. */
export function bandCurve(fl: Fluid, band: MixtureBand, points: number): SaturationCurve {
	const liquid: State[] = [],
		vapor: State[] = [];
	const span = band.Tj - fl.Tt;
	for (let i = 0; i < points; i++) {
		const w = 1 - i / points;
		const T = i === 0 ? fl.Tt : band.Tj - span * w * w * w;
		liquid.push(lineState(fl, band, 'bubble', T));
		vapor.push(lineState(fl, band, 'dew', T));
	}
	const top = evalPoint(fl, band.Tj, band.rhoj, new Point(), 2);
	return {
		liquid,
		vapor,
		critical: singleState(fl, top, 'supercritical-fluid', null, band.Pj),
		melting: []
	};
}

/**
 * Refuse a leg that enters the band: a point between the lines or on the equation's own dome, or a
 * crossing of its saturation line (which lies inside the band). The leg's id is added by paths.
 */
export function holdLegOutsideBand(fl: Fluid, band: MixtureBand, leg: Leg): void {
	if (leg.start.x !== null)
		throw new ThermoError(
			'mixture-two-phase',
			`A leg of ${fl.id} cannot start on its ${leg.start.x === 0 ? 'bubble' : 'dew'} line: from there any process either stays outside the band or enters it at once, and ${fl.id} is a mixture whose two-phase states its equation cannot describe.`,
			`Start the leg from a state given by two properties other than x, just off the line (for example T and a pressure ${leg.start.x === 0 ? 'above the bubble' : 'below the dew'} pressure ${fmt(leg.start.P)} Pa).`
		);
	const bad =
		leg.crossings.length > 0
			? (leg.points.find((p) => p.x !== null || band.insideTP(p.T, p.P)) ?? leg.crossings[0].state)
			: leg.points.find(
					(p) => p.x !== null || band.insideTP(p.T, p.P) || band.insideTRho(p.T, p.rho)
				);
	if (bad) {
		const e = band.refusal(bad.T);
		throw new ThermoError(
			'mixture-two-phase',
			`This ${leg.process} leg from T = ${fmt(leg.start.T)} K, P = ${fmt(leg.start.P)} Pa enters the two-phase band of ${fl.id} at T = ${fmt(bad.T)} K, P = ${fmt(bad.P)} Pa. ${e.message}`,
			`End the leg before it reaches the band (on the ${leg.start.P > band.bubbleP(Math.min(bad.T, band.Tj * (1 - 1e-9))) ? 'bubble' : 'dew'} line: x = ${leg.start.P > band.bubbleP(Math.min(bad.T, band.Tj * (1 - 1e-9))) ? 0 : 1} as a state), or go around it above ${fmt(band.Tj)} K.`
		);
	}
	for (const p of leg.points) p.phase = band.phase(p.T, p.P);
	leg.start = holdOutsideBand(fl, band, leg.start);
	leg.end = holdOutsideBand(fl, band, leg.end);
}
