/**
 * Transport and interface properties of a state: viscosity, thermal conductivity, Prandtl number and
 * surface tension, in SI (Pa·s, W/(m·K), –, N/m), each either a number or absent with a reason.
 * Correlations exist so far for water (water.ts); for any other fluid every value is absent with
 * `no-correlation`. The state may come from IAPWS-95 (fixState) or IAPWS-IF97 (if97State…): the
 * correlations take its ρ and T, and its cp, cv and speed of sound for the conductivity's critical
 * enhancement ((∂ρ/∂p)_T = (cp/cv)/w²).
 */
import type { State } from '../types.ts';
import {
	waterConductivity,
	waterSurfaceTension,
	waterTensionRange,
	waterTransportRange,
	waterViscosity
} from './water.ts';

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

/**
 * Viscosity, thermal conductivity, Prandtl number and surface tension of a state (SI), or each
 * absent with a reason: no correlation for the fluid; outside a correlation's range (water: 273.15 K
 * to 1173.15 K, P ≤ 1000 MPa); μ, k and Pr inside the dome (they belong to one phase: ask for the
 * saturated liquid or vapor); σ off the saturation line.
 */
export function transport(state: State): Transport {
	const out: Transport = { mu: null, k: null, Pr: null, sigma: null, absent: {}, sources: {} };
	const all: TransportName[] = ['mu', 'k', 'Pr', 'sigma'];
	if (state.fluid !== 'water') {
		for (const name of all)
			out.absent[name] = {
				code: 'no-correlation',
				reason: `No published ${describe(name)} correlation for ${state.fluid} is built into the engine yet.`
			};
		return out;
	}
	const { T, P, rho } = state;
	const onDome =
		state.phase === 'saturated-liquid' ||
		state.phase === 'saturated-vapor' ||
		state.phase === 'saturated-mixture';
	if (onDome && T >= waterTensionRange.Tmin - 0.01 && T <= waterTensionRange.Tmax) {
		out.sigma = waterSurfaceTension(T);
		out.sources.sigma = SOURCES.sigma;
	} else if (onDome)
		out.absent.sigma = {
			code: 'out-of-range',
			reason: `IAPWS R1-76(2014) holds from ${waterTensionRange.Tmin} K to ${waterTensionRange.Tmax} K; T = ${T} K.`
		};
	else
		out.absent.sigma = {
			code: 'not-on-saturation-line',
			reason:
				'Surface tension is given only on the saturation line (a saturated liquid, vapor or mixture).'
		};

	if (state.phase === 'saturated-mixture') {
		for (const name of ['mu', 'k', 'Pr'] as const)
			out.absent[name] = {
				code: 'two-phase',
				reason: `A two-phase mixture has no single ${describe(name)}: ask for the saturated liquid (x = 0) or vapor (x = 1) at this temperature.`
			};
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
				reason: `Water's ${describe(name)} correlation holds from ${waterTransportRange.Tmin} K to ${waterTransportRange.Tmax} K up to ${waterTransportRange.Pmax / 1e6} MPa; this state is at ${T} K, ${P} Pa.`
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
