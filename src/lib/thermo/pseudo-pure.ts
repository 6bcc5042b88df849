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
 * `superheated-vapor`. (Not yet used by the solvers: air is not registered; see docs/fluids.md.)
 */
import { ThermoError, fmt } from './errors.ts';
import { AncillaryEq, type Fluid } from './fluid.ts';
import type { BubbleDensityEq } from './fluids/air.ts';
import type { Ancillary } from './fluids/schema.ts';
import { densityAtTP } from './solvers/density.ts';
import type { Phase } from './types.ts';

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
	private readonly pb: AncillaryEq;
	private readonly pd: AncillaryEq;
	private readonly rd: AncillaryEq;

	constructor(
		private readonly fl: Fluid,
		private readonly band: BandData
	) {
		this.Tj = band.maxcondentherm.T;
		this.Pj = band.maxcondentherm.P;
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
