/**
 * Public shapes of the Statewright property engine (see shared compute contract).
 * All quantities are SI base units: T K, P Pa, v m³/kg, rho kg/m³, u h J/kg,
 * s cv cp J/(kg·K), w m/s, x dimensionless quality 0…1.
 */

/** Names of the properties a state can be fixed from. `v` and `rho` are the same property. */
export type InputName = 'T' | 'P' | 'v' | 'rho' | 'u' | 'h' | 's' | 'x';

/** Exactly two of the properties (one of v / rho at most). */
export type Inputs = Partial<Record<InputName, number>>;

export type Phase =
	| 'compressed-liquid'
	| 'saturated-liquid'
	| 'saturated-mixture'
	| 'saturated-vapor'
	| 'superheated-vapor'
	| 'supercritical-fluid';

export interface State {
	fluid: string;
	phase: Phase;
	/** temperature, K */
	T: number;
	/** pressure, Pa */
	P: number;
	/** specific volume, m³/kg */
	v: number;
	/** density, kg/m³ */
	rho: number;
	/** specific internal energy, J/kg */
	u: number;
	/** specific enthalpy, J/kg */
	h: number;
	/** specific entropy, J/(kg·K) */
	s: number;
	/** quality (vapor mass fraction); a number only on or inside the dome */
	x: number | null;
	/** isobaric heat capacity, J/(kg·K); null inside the dome */
	cp: number | null;
	/** isochoric heat capacity, J/(kg·K) */
	cv: number | null;
	/** speed of sound, m/s; null inside the dome */
	w: number | null;
}

/**
 * Which root to return when a pair of inputs has two valid states (for example water's
 * density maximum near 4 °C for (P, v)). Without a hint such a pair is refused with both
 * candidates named in the error.
 * - `lower-T` / `higher-T`: the candidate with the lower / higher temperature;
 * - `lower-P` / `higher-P`: the candidate with the lower / higher pressure (e.g. two liquid states
 *   at the same T for (T, h));
 * - `liquid-side` / `vapor-side`: the denser / lighter candidate. For (T, P) exactly on the
 *   saturation line these also select the saturated liquid / saturated vapor.
 */
export type RootHint = 'lower-T' | 'higher-T' | 'lower-P' | 'higher-P' | 'liquid-side' | 'vapor-side';

export interface FixOptions {
	hint?: RootHint;
	/**
	 * Where several states have the inputs, return the one nearest this T (K) and/or P (Pa)
	 * (distance |ln T/T₀| + |ln P/P₀|). Used when no `hint` is given; useful to stay on the branch
	 * of a previous state (e.g. while dragging). Three or more candidates can only be told apart this way.
	 */
	near?: { T?: number; P?: number };
}

/** Saturation at one temperature: the saturated liquid and vapor states (phase saturated-liquid / -vapor). */
export interface Saturation {
	/** K */
	T: number;
	/** Pa */
	P: number;
	liquid: State;
	vapor: State;
}

/** Saturation curves for drawing the vapor dome (GET /api/v1/fluids/{id}/saturation). */
export interface SaturationCurve {
	/** saturated liquid from the triple point up toward the critical point */
	liquid: State[];
	/** saturated vapor, at the same temperatures */
	vapor: State[];
	critical: State;
}

export type Process = 'isobaric' | 'isochoric' | 'isothermal' | 'isentropic' | 'isenthalpic' | 'polytropic';

export type TargetName = 'T' | 'P' | 'v' | 'rho' | 'u' | 'h' | 's' | 'x';

export interface LegSpec {
	fluid: string;
	start: Inputs;
	process: Process;
	/** exactly one property for the leg's end, not the leg's invariant */
	target: Partial<Record<TargetName, number>>;
	/** polytropic exponent, P·vⁿ = const (polytropic legs only) */
	n?: number;
	/** minimum number of points along the leg (default 40; at least 20) */
	samples?: number;
}

export type SaturationLine = 'saturated-liquid' | 'saturated-vapor';

export interface Crossing {
	line: SaturationLine;
	state: State;
}

export interface Leg {
	process: Process;
	start: State;
	end: State;
	points: State[];
	crossings: Crossing[];
	/** boundary work by the fluid ∫P dv, J/kg */
	w: number;
	/** heat into the fluid, closed system, q = Δu + w, J/kg */
	q: number;
	du: number;
	dh: number;
	/** J/(kg·K) */
	ds: number;
	/** reversible steady-flow shaft work −∫v dP, J/kg */
	wShaft: number;
	/** heat into the fluid, steady flow, qFlow = Δh + wShaft, J/kg */
	qFlow: number;
	notes?: string[];
	n?: number;
}

/** Public metadata of a fluid, as served by GET /api/v1/fluids. */
export interface FluidInfo {
	id: string;
	name: string;
	formula: string;
	aliases: string[];
	formulation: { name: string; reference: string };
	critical: { T: number; P: number; rho: number };
	triple: { T: number; P: number };
	limits: { Tmin: number; Tmax: number; Pmax: number };
	referenceState: string;
	molarMass: number;
}
