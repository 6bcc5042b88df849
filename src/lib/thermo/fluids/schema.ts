import type { BandData } from '../pseudo-pure.ts';
/**
 * Shape of a fluid data file. Every coefficient of a reference equation of state is data:
 * the solvers hold no fluid-specific number. Each file names the publication its numbers
 * come from. Reduced variables: δ = ρ/ρr, τ = Tr/T with the equation's reducing values
 * (which for some fluids differ from the critical point).
 *
 * Reduced Helmholtz energy: α(δ, τ) = a/(R·T) = α⁰(δ, τ) + αʳ(δ, τ).
 */

/** Ideal-gas part α⁰ terms. */
export type IdealTerm =
	/** ln δ + a1 + a2·τ  (a1, a2 may be shifted at load time to the declared reference state) */
	| { kind: 'lead'; a1: number; a2: number }
	/** a·ln τ */
	| { kind: 'log-tau'; a: number }
	/** Σ nᵢ·τ^tᵢ */
	| { kind: 'power'; n: number[]; t: number[] }
	/** Σ nᵢ·ln(1 − exp(−γᵢ·τ)) */
	| { kind: 'planck-einstein'; n: number[]; gamma: number[] }
	/** Σ nᵢ·ln(cᵢ + exp(γᵢ·τ)), cᵢ > 0 (air, Lemmon et al. 2000: c = 2/3) */
	| { kind: 'log-c-plus-exp'; n: number[]; c: number[]; gamma: number[] };

/** Residual part αʳ terms. */
export type ResidualTerm =
	/** Σ nᵢ·δ^dᵢ·τ^tᵢ */
	| { kind: 'polynomial'; n: number[]; d: number[]; t: number[] }
	/** Σ nᵢ·δ^dᵢ·τ^tᵢ·exp(−δ^lᵢ) */
	| { kind: 'exponential'; n: number[]; d: number[]; t: number[]; l: number[] }
	/** Σ nᵢ·δ^dᵢ·τ^tᵢ·exp(−αᵢ(δ − εᵢ)² − βᵢ(τ − γᵢ)²) */
	| {
			kind: 'gaussian';
			n: number[];
			d: number[];
			t: number[];
			alpha: number[];
			beta: number[];
			gamma: number[];
			epsilon: number[];
	  }
	/**
	 * IAPWS-95 / Span–Wagner non-analytic near-critical terms:
	 * Σ nᵢ·Δ^bᵢ·δ·ψ with Δ = θ² + Bᵢ[(δ−1)²]^aᵢ, θ = (1−τ) + Aᵢ[(δ−1)²]^(1/(2βᵢ)),
	 * ψ = exp(−Cᵢ(δ−1)² − Dᵢ(τ−1)²).
	 */
	| {
			kind: 'non-analytic';
			n: number[];
			a: number[];
			b: number[];
			beta: number[];
			A: number[];
			B: number[];
			C: number[];
			D: number[];
	  };

/**
 * Ancillary equation (starting guesses only), θ = 1 − T/Tr, with reducing values Tr and yc:
 * - `ln-ratio-tc-over-t`: ln(y/yc) = (Tr/T)·Σ nᵢ·θ^tᵢ   (typical for vapor pressure)
 * - `ln-ratio`:           ln(y/yc) = Σ nᵢ·θ^tᵢ          (typical for vapor density)
 * - `ratio-plus-one`:     y/yc = 1 + Σ nᵢ·θ^tᵢ           (typical for liquid density)
 * Above Tr (θ ≤ 0) the sum is taken as 0.
 */
export interface Ancillary {
	form: 'ln-ratio-tc-over-t' | 'ln-ratio' | 'ratio-plus-one';
	n: number[];
	t: number[];
	/** reducing value of y (Pa or kg/m³) */
	yc: number;
	/**
	 * reducing temperature of θ and of the Tr/T factor, K (default: the fluid's critical.T).
	 * Some publications reduce their ancillaries with another value (R-134a: 374.18 K).
	 */
	Tr?: number;
	/** where these coefficients come from */
	source: string;
}

/** How the constants of the lead ideal-gas term are set. */
export type ReferenceStateSpec =
	/** use the published a1, a2 unchanged (water: IAPWS-95's own u = 0, s = 0 at the triple-point liquid) */
	| { kind: 'as-published'; label: string }
	/** shift a1, a2 so that the saturated liquid at T has enthalpy h and entropy s (IIR: 273.15 K, 200 kJ/kg, 1 kJ/(kg·K)) */
	| { kind: 'saturated-liquid-at-T'; label: string; T: number; h: number; s: number }
	/** shift a1, a2 so that the saturated liquid at P has enthalpy h and entropy s (NBP: 101325 Pa, 0, 0) */
	| { kind: 'saturated-liquid-at-P'; label: string; P: number; h: number; s: number }
	/** a mixture (pseudo-pure fluid): shift a1, a2 so that the liquid at its bubble point at P has h and s */
	| { kind: 'bubble-liquid-at-P'; label: string; P: number; h: number; s: number };

/**
 * The IIR convention for refrigerants: h = 200 kJ/kg and s = 1 kJ/(kg·K) for the saturated liquid
 * at 0 °C (used by the ammonia, R-134a and carbon dioxide equations' papers).
 */
export const IIR_REFERENCE_STATE: ReferenceStateSpec = {
	kind: 'saturated-liquid-at-T',
	label: 'IIR: h = 200 kJ/kg, s = 1 kJ/(kg·K) for saturated liquid at 0 °C',
	T: 273.15,
	h: 200e3,
	s: 1e3
};

/** What a fluid is used as, for grouping in the picker and the API: water and steam, refrigerants, hydrocarbons, cryogens and gases. */
export type FluidGroup = 'water' | 'refrigerant' | 'hydrocarbon' | 'cryogen';

/** The groups in display order, with their labels. */
export const FLUID_GROUPS: { id: FluidGroup; label: string }[] = [
	{ id: 'water', label: 'Water and steam' },
	{ id: 'refrigerant', label: 'Refrigerants' },
	{ id: 'hydrocarbon', label: 'Hydrocarbons' },
	{ id: 'cryogen', label: 'Cryogens and gases' }
];

export interface FluidData {
	id: string;
	name: string;
	formula: string;
	/** other names a user may type: R-numbers, formulae, trade and common names (matched case-insensitively) */
	aliases: string[];
	group: FluidGroup;
	formulation: {
		/** short name, e.g. "IAPWS-95" */
		name: string;
		/** full citation of the publication the coefficients are taken from */
		reference: string;
		/** where the numbers were transcribed from and how they were checked; licence note */
		provenance: string;
	};
	/** molar mass, kg/mol */
	molarMass: number;
	/** specific gas constant used by the equation, J/(kg·K) */
	R: number;
	/** reducing temperature and density of the equation */
	reducing: { T: number; rho: number };
	critical: { T: number; P: number; rho: number };
	triple: { T: number; P: number };
	/** range of validity of the formulation */
	limits: { Tmin: number; Tmax: number; Pmax: number };
	referenceState: ReferenceStateSpec;
	ideal: IdealTerm[];
	residual: ResidualTerm[];
	ancillaries: { pSat: Ancillary; rhoLiquid: Ancillary; rhoVapor: Ancillary };
	/** melting and sublimation curves (optional here; solid-lines.ts holds them for the first fluids) */
	solid?: SolidLines;
	/**
	 * Where the equation's own critical point is sought when it lies away from the published one
	 * (a pseudo-pure mixture's equation: its phases merge below the mixture's critical point).
	 */
	equationCriticalGuess?: { T: number; rho: number };
	/** A mixture's bubble and dew lines (pseudo-pure.ts): states between them are refused. */
	band?: BandData;
}

/**
 * One piece of a melting or sublimation curve, θ = T/Tref, P in Pa:
 * - `power-sum`:       P/Pref = 1 + Σ aᵢ·(θ^bᵢ − 1)
 * - `delta-power-sum`: P/Pref = 1 + Σ aᵢ·(θ − 1)^bᵢ
 * - `exp-sum`:         ln(P/Pref) = Σ aᵢ·(1 − θ^bᵢ)
 * - `log-theta`:       P/Pref = Σ aᵢ·(ln θ)^bᵢ
 * - `exp-theta-sum`:   ln(P/Pref) = θ⁻¹·Σ aᵢ·θ^bᵢ
 * - `exp-theta-delta`: ln(P/Pref) = θ⁻¹·Σ aᵢ·(1 − θ)^bᵢ
 * - `simon`:           P = Pref + Σ aᵢ·(θ^bᵢ − 1), aᵢ in Pa (Simon–Glatzel)
 * - `power-plain`:     P/Pref = Σ aᵢ·θ^bᵢ
 */
export interface SolidLinePiece {
	form:
		| 'power-sum'
		| 'delta-power-sum'
		| 'exp-sum'
		| 'log-theta'
		| 'exp-theta-sum'
		| 'exp-theta-delta'
		| 'simon'
		| 'power-plain';
	/** the solid phase on the other side (e.g. "ice VI"; "solid" where the publication names none) */
	solid: string;
	/** temperature range of this piece, K */
	Tmin: number;
	Tmax: number;
	Tref: number;
	Pref: number;
	a: number[];
	b: number[];
}

/**
 * Melting and sublimation curves of a fluid, each naming the publication its numbers come from.
 * A fluid whose equation's paper publishes no melting equation (and none is named) has an empty
 * `melting.pieces` with `source` saying so: its states are bounded only by the triple point.
 */
export interface SolidLines {
	melting: { pieces: SolidLinePiece[]; source: string };
	sublimation?: { pieces: SolidLinePiece[]; source: string };
}
