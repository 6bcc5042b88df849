/**
 * Transport and interface properties of a state: viscosity, thermal conductivity, Prandtl number and
 * surface tension, in SI (Pa·s, W/(m·K), –, N/m), each either a number or absent with a reason.
 * Water: IAPWS releases (water.ts). Nitrogen, argon, oxygen, air, carbon dioxide, R-134a; ammonia's
 * viscosity: fluids.ts. R-1234yf and R-1234ze(E): refrigerants.ts. Propane; isobutane's viscosity:
 * hydrocarbons.ts. Hydrogen and methane: gases.ts. R-32 has none (NOT_BUILT says why). Surface
 * tension of the other fluids: data/surface-tension.ts. A value without a correlation is absent with
 * `no-correlation` and a reason. The state may come from IAPWS-95 (fixState) or IAPWS-IF97 (if97State…): the
 * correlations take its ρ and T, and its cp, cv and speed of sound for the conductivity's critical
 * enhancement ((∂ρ/∂p)_T = (cp/cv)/w²).
 */
import { fmt } from '../errors.ts';
import type { State } from '../types.ts';
import {
	waterConductivity,
	waterSurfaceTension,
	waterTensionRange,
	waterTransportRange,
	waterViscosity
} from './water.ts';
import { muleroSource, muleroTension } from './data/surface-tension.ts';
import { fluidCorrelations, type TransportRange } from './fluids.ts';
import { tensionSum } from './forms.ts';

export type TransportName = 'mu' | 'k' | 'Pr' | 'sigma';

/** Why a transport value is absent. */
export interface TransportAbsence {
	code: 'no-correlation' | 'out-of-range' | 'two-phase' | 'not-on-saturation-line';
	reason: string;
}

export interface Transport {
	/** dynamic viscosity, Pa·s */
	mu: number | null;
	/** thermal conductivity, W/(m·K) */
	k: number | null;
	/** Prandtl number μ·cp/k */
	Pr: number | null;
	/** surface tension of the liquid against its vapor, N/m; only on or inside the dome */
	sigma: number | null;
	/** for each absent value, why */
	absent: Partial<Record<TransportName, TransportAbsence>>;
	/** the publication of each value given */
	sources: Partial<Record<TransportName, string>>;
}

const SOURCES = {
	mu: 'IAPWS R12-08 (critical enhancement only near the critical point, as for industrial use)',
	k: 'IAPWS R15-11 (critical enhancement with the industrial reference of Eq. 25)',
	Pr: 'μ·cp/k',
	sigma: 'IAPWS R1-76(2014)'
} as const;

/** Why μ and k are absent for the fluids without a built correlation. */
const NOT_BUILT: Record<string, string> = {
	r32: 'No viscosity or thermal conductivity correlation for R-32 is built into the engine: its fluid-specific viscosity correlation (Velliadou et al. 2022) has only one public copy of its coefficients, and its conductivity is published only as an extended corresponding-states model.'
};

/**
 * Viscosity, thermal conductivity, Prandtl number and surface tension of a state (SI), or each
 * absent with a reason: no correlation for the fluid; outside a correlation's range (water: 273.15 K
 * to 1173.15 K, P ≤ 1000 MPa; carbon dioxide's conductivity: to 1100 K and 200 MPa); μ, k and Pr
 * inside the dome (they belong to one phase: ask for the saturated liquid or vapor); σ off the
 * saturation line.
 */
export function transport(state: State): Transport {
	if (state.fluid === 'water') return waterTransport(state);
	const out: Transport = { mu: null, k: null, Pr: null, sigma: null, absent: {}, sources: {} };
	const { T, P, rho } = state;
	const tension = muleroTension[state.fluid];
	if (!tension)
		out.absent.sigma = {
			code: 'no-correlation',
			reason:
				state.fluid === 'r1234ze-e'
					? 'The public copies of the surface-tension coefficients for R-1234ze(E) disagree in sign (two against one) and none prints a check value to settle it; it is left out until the paper is read.'
					: state.fluid === 'air'
						? 'Air is a mixture: the surface-tension correlations built here (Mulero et al. 2012) are for pure fluids, and no published correlation for air is built.'
						: `No published surface-tension correlation for ${state.fluid} is built into the engine.`
		};
	else if (!onDome(state))
		out.absent.sigma = {
			code: 'not-on-saturation-line',
			reason:
				'Surface tension is given only on the saturation line (a saturated liquid, vapor or mixture).'
		};
	else if (T >= tension.Tc)
		out.absent.sigma = {
			code: 'out-of-range',
			reason: `The correlation ends at its critical temperature, ${fmt(tension.Tc)} K; T = ${fmt(T, tension.Tc)} K.`
		};
	else {
		out.sigma = tensionSum(tension, T);
		out.sources.sigma = muleroSource;
	}

	const corr = fluidCorrelations[state.fluid];
	if (!corr) {
		const why =
			NOT_BUILT[state.fluid] ??
			`No published viscosity or thermal conductivity correlation for ${state.fluid} is built into the engine.`;
		for (const name of ['mu', 'k', 'Pr'] as const)
			out.absent[name] = {
				code: 'no-correlation',
				reason: name === 'Pr' ? `The Prandtl number needs μ and k. ${why}` : why
			};
		return out;
	}
	if (state.phase === 'saturated-mixture') {
		twoPhase(out);
		return out;
	}
	const inRange = (r: TransportRange) =>
		(r.Tmin === undefined || T >= r.Tmin) &&
		(r.Tmax === undefined || T <= r.Tmax) &&
		(r.Pmax === undefined || P <= r.Pmax);
	const mu = corr.mu(T, rho);
	if (inRange(corr.range.mu) && Number.isFinite(mu) && mu > 0) {
		out.mu = mu;
		out.sources.mu = corr.sources.mu;
	} else
		out.absent.mu = { code: 'out-of-range', reason: rangeReason('viscosity', corr.range.mu, T, P) };
	const k = corr.k ? corr.k(T, rho, mu) : NaN;
	if (!corr.k)
		out.absent.k = {
			code: 'no-correlation',
			reason: corr.noK ?? 'No thermal conductivity correlation is built for this fluid.'
		};
	else if (inRange(corr.range.k) && Number.isFinite(k) && k > 0) {
		out.k = k;
		out.sources.k = corr.sources.k;
	} else
		out.absent.k = {
			code: 'out-of-range',
			reason: rangeReason('thermal conductivity', corr.range.k, T, P)
		};
	if (out.mu !== null && out.k !== null && state.cp !== null) {
		out.Pr = (out.mu * state.cp) / out.k;
		out.sources.Pr = SOURCES.Pr;
	} else
		out.absent.Pr = {
			code: out.absent.k?.code === 'no-correlation' ? 'no-correlation' : 'out-of-range',
			reason: 'The Prandtl number needs μ, k and cp, and one of them is absent at this state.'
		};
	return out;
}

/**
 * μ (Pa·s) and k (W/(m·K)) of a fluid other than water at T (K) and ρ (kg/m³) straight from its
 * correlations, without range checks; null for a fluid without them. For checks against printed
 * (T, ρ) tables.
 */
export function transportAt(
	fluid: string,
	T: number,
	rho: number
): { mu: number; k: number | null } | null {
	const corr = fluidCorrelations[fluid];
	if (!corr) return null;
	const mu = corr.mu(T, rho);
	return { mu, k: corr.k ? corr.k(T, rho, mu) : null };
}

function rangeReason(what: string, r: TransportRange, T: number, P: number): string {
	const temperature =
		r.Tmin !== undefined && r.Tmax !== undefined
			? `from ${fmt(r.Tmin)} K to ${fmt(r.Tmax)} K`
			: r.Tmin !== undefined
				? `from ${fmt(r.Tmin)} K`
				: r.Tmax !== undefined
					? `up to ${fmt(r.Tmax)} K`
					: '';
	const lim = [temperature, r.Pmax !== undefined ? `up to ${fmt(r.Pmax / 1e6)} MPa` : '']
		.filter(Boolean)
		.join(' and ');
	return `The ${what} correlation holds ${lim || 'within the equation of state'}; this state is at ${fmt(T, r.Tmin ?? T, r.Tmax ?? T)} K, ${fmt(P, r.Pmax ?? P)} Pa.`;
}

function onDome(state: State): boolean {
	return (
		state.phase === 'saturated-liquid' ||
		state.phase === 'saturated-vapor' ||
		state.phase === 'saturated-mixture'
	);
}

function twoPhase(out: Transport): void {
	for (const name of ['mu', 'k', 'Pr'] as const)
		out.absent[name] = {
			code: 'two-phase',
			reason: `A two-phase mixture has no single ${describe(name)}: ask for the saturated liquid (x = 0) or vapor (x = 1) at this temperature.`
		};
}

function waterTransport(state: State): Transport {
	const out: Transport = { mu: null, k: null, Pr: null, sigma: null, absent: {}, sources: {} };
	const { T, P, rho } = state;
	if (onDome(state) && T >= waterTensionRange.Tmin - 0.01 && T <= waterTensionRange.Tmax) {
		out.sigma = waterSurfaceTension(T);
		out.sources.sigma = SOURCES.sigma;
	} else if (onDome(state))
		out.absent.sigma = {
			code: 'out-of-range',
			reason: `IAPWS R1-76(2014) holds from ${fmt(waterTensionRange.Tmin)} K to ${fmt(waterTensionRange.Tmax)} K; T = ${fmt(T, waterTensionRange.Tmin, waterTensionRange.Tmax)} K.`
		};
	else
		out.absent.sigma = {
			code: 'not-on-saturation-line',
			reason:
				'Surface tension is given only on the saturation line (a saturated liquid, vapor or mixture).'
		};

	if (state.phase === 'saturated-mixture') {
		twoPhase(out);
		return out;
	}
	if (
		T < waterTransportRange.Tmin ||
		T > waterTransportRange.Tmax ||
		P > waterTransportRange.Pmax
	) {
		for (const name of ['mu', 'k', 'Pr'] as const)
			out.absent[name] = {
				code: 'out-of-range',
				reason: `Water's ${describe(name)} correlation holds from ${fmt(waterTransportRange.Tmin)} K to ${fmt(waterTransportRange.Tmax)} K up to ${fmt(waterTransportRange.Pmax / 1e6)} MPa; this state is at ${fmt(T, waterTransportRange.Tmin, waterTransportRange.Tmax)} K, ${fmt(P, waterTransportRange.Pmax)} Pa.`
			};
		return out;
	}
	const { cp, cv, w } = state;
	const thermo = cp !== null && cv !== null && w !== null && cp > 0 && cv > 0 && w > 0;
	// (∂ρ/∂p)_T = ρ κ_T = (cp/cv)/w², for both critical enhancements
	const drhodP = thermo ? cp / cv / (w * w) : undefined;
	const mu = waterViscosity(rho, T, drhodP);
	out.mu = mu;
	out.sources.mu = SOURCES.mu;
	if (!thermo) {
		for (const name of ['k', 'Pr'] as const)
			out.absent[name] = {
				code: 'out-of-range',
				reason: `This state has no cp, cv or speed of sound, which the ${describe(name)} needs.`
			};
		return out;
	}
	const k = waterConductivity(rho, T, cp as number, cv as number, drhodP as number, mu);
	out.k = k;
	out.sources.k = SOURCES.k;
	out.Pr = (mu * cp) / k;
	out.sources.Pr = SOURCES.Pr;
	return out;
}

function describe(name: TransportName): string {
	return {
		mu: 'viscosity',
		k: 'thermal conductivity',
		Pr: 'Prandtl number',
		sigma: 'surface tension'
	}[name];
}
