/**
 * Public shapes of the Statewright property engine (see shared compute contract).
 * All quantities are SI base units: T K, P Pa, v m³/kg, rho kg/m³, u h J/kg,
 * s cv cp J/(kg·K), w m/s, x dimensionless quality 0…1.
 */
import type { Transport } from './transport/index.ts';

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

/** Each phase in running text, as every table, chart and export names it. */
export const PHASE_NAME: Readonly<Record<Phase, string>> = {
	'compressed-liquid': 'compressed liquid',
	'saturated-liquid': 'saturated liquid',
	'saturated-mixture': 'saturated mixture',
	'saturated-vapor': 'saturated vapor',
	'superheated-vapor': 'superheated vapor',
	'supercritical-fluid': 'supercritical fluid'
};

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
	// Derived properties (from the same Helmholtz derivatives; properties.ts). The engine always
	// sets them; they are optional in the type only so that states stored before they existed
	// (revisions, fixtures) still type-check.
	/** compressibility factor Z = P·v/(R·T), dimensionless */
	Z?: number | null;
	/** isothermal compressibility κ_T = −(1/v)(∂v/∂P)_T = 1/(ρ·(∂P/∂ρ)_T), 1/Pa; null inside the dome */
	kappaT?: number | null;
	/** volume expansivity α_V = (1/v)(∂v/∂T)_P = (∂P/∂T)_ρ/(ρ·(∂P/∂ρ)_T), 1/K; null inside the dome */
	alphaV?: number | null;
	/** Joule–Thomson coefficient μ_JT = (∂T/∂P)_h = (T·α_V − 1)/(ρ·cp), K/Pa; null inside the dome */
	muJT?: number | null;
	/** isentropic exponent γ_s = −(v/P)(∂P/∂v)_s = ρ·w²/P (cp/cv for an ideal gas), dimensionless; null inside the dome */
	gammaS?: number | null;
	/** (∂P/∂T)_v, Pa/K; inside the dome the slope of the saturation curve dPs/dT (Clapeyron) */
	dPdT?: number | null;
	/** latent heat of vaporization h'' − h' at the state's temperature, J/kg; only on and inside the dome, else null */
	hfg?: number | null;
	/**
	 * How well the two inputs determine the state (fixState answers only): the relative
	 * uncertainty of T, P and v that the pair's conditioning implies in double precision
	 * (solvers/precision.ts). 2.2e−16 for a perfectly conditioned pair; up to 1.
	 */
	precision?: Precision;
	/**
	 * On a leg point or crossing of a path computed with IAPWS-IF97: 'iapws95' where IF97 could not
	 * give it, so it is the IAPWS-95 point (a warning `if97-state-unavailable` counts them); absent
	 * on every other state.
	 */
	formulation?: Formulation;
}

/** Relative uncertainties (dimensionless) of T, P and v; see State.precision. */
export interface Precision {
	T: number;
	P: number;
	v: number;
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
export type RootHint =
	'lower-T' | 'higher-T' | 'lower-P' | 'higher-P' | 'liquid-side' | 'vapor-side';

export interface FixOptions {
	hint?: RootHint;
	/**
	 * Where several states have the inputs, return the one nearest this T (K) and/or P (Pa)
	 * (distance |ln T/T₀| + |ln P/P₀|). Used when no `hint` is given; useful to stay on the branch
	 * of a previous state (e.g. while dragging). Three or more candidates can only be told apart this way.
	 */
	near?: { T?: number; P?: number };
	/**
	 * Where to look: candidates outside these bounds (T in K, P in Pa, each optional) are not
	 * answers. The default is the formulation's whole range, so nothing is excluded silently; a
	 * window that excludes every state is refused with `outside-window` naming what lies outside.
	 */
	window?: StateWindow;
}

/** Bounds on the answer of fixState (see FixOptions.window). */
export interface StateWindow {
	Tmin?: number;
	Tmax?: number;
	Pmin?: number;
	Pmax?: number;
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
	/** the equation's own critical point (FluidInfo.equationCritical), where both curves end */
	critical: State;
	/** the liquid along the melting curve from the triple point up to the formulation's Pmax, for drawing; empty for a fluid without one */
	melting?: State[];
	/** absent: the fluid's own equation; 'if97': water by IAPWS-IF97 (if97/dome.ts) */
	formulation?: Formulation;
	/**
	 * Set where the curves stop short of the critical point: the temperature (K) of their last
	 * points, from which the dome is joined to `critical` by straight lines; `note` says so in words.
	 */
	stopsAt?: number;
	/** what a chart's description says of this dome beyond its shape (its formulation, where it stops) */
	note?: string;
}

export type Process =
	'isobaric' | 'isochoric' | 'isothermal' | 'isentropic' | 'isenthalpic' | 'polytropic';

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
	/** which state `start` means where its pair has several (as FixOptions.hint / near) */
	startHint?: RootHint;
	startNear?: FixOptions['near'];
	/**
	 * Bounds (T K, P Pa) on the start state and on the end: a start outside is not an answer (as
	 * FixOptions.window), and a place where the target is reached outside it is not the leg's end.
	 */
	window?: StateWindow;
	/**
	 * Which end, where the target is reached both ways along the process curve from the start:
	 * the one `endNear` is nearest, or the one `endHint` selects. Without either the nearer along
	 * the curve is taken and a note names the other.
	 */
	endHint?: RootHint;
	endNear?: FixOptions['near'];
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
	/** what the fluid is used as: 'water' (water and steam), 'refrigerant', 'hydrocarbon', 'cryogen' (cryogens and gases) */
	group: 'water' | 'refrigerant' | 'hydrocarbon' | 'cryogen';
	formulation: { name: string; reference: string };
	/** the published critical point (K, Pa, kg/m³), as listed with the formulation (often rounded) */
	critical: { T: number; P: number; rho: number };
	/**
	 * The equation's own critical point, where (∂P/∂ρ)_T = (∂²P/∂ρ²)_T = 0 (K, Pa, kg/m³): the
	 * saturation curve ends here (saturationCurve().critical). It can differ from `critical`, e.g.
	 * ammonia's equation has 405.50 K, 11.359 MPa against the published 405.40 K, 11.333 MPa.
	 */
	equationCritical: { T: number; P: number; rho: number };
	triple: { T: number; P: number };
	limits: { Tmin: number; Tmax: number; Pmax: number };
	referenceState: string;
	molarMass: number;
}

// ---- Paths (computePath; POST /api/v1/paths) --------------------------------------------------

/**
 * The system a path belongs to. A closed system (vessel, piston–cylinder) holds a fixed mass:
 * give `mass` (kg) or `volume` (m³, the volume at the start: mass = V / v₁), not both; with neither
 * the totals are per 1 kg. A steady-flow device carries `massFlow` (kg/s).
 */
export type PathSystem =
	{ kind: 'closed'; mass?: number; volume?: number } | { kind: 'flow'; massFlow: number };

/** One leg of a path: the process, one target property for its end, n for polytropic legs. */
export interface PathLegSpec {
	/** stable id for review notes (default L1, L2, …); unique within the path */
	id?: string;
	process: Process;
	target: Partial<Record<TargetName, number>>;
	n?: number;
	/** points along this leg (default: the path's `samples`, else 40) */
	samples?: number;
	/** which end where the target is reached both ways (LegSpec.endHint / endNear) */
	endHint?: RootHint;
	endNear?: FixOptions['near'];
}

/** Design limits drawn on the chart and checked along every leg (Pa, K; absolute pressure). */
export interface DesignLimits {
	designPressure?: number;
	designTemperature?: number;
	reliefSetPressure?: number;
	minimumTemperature?: number;
}

export type DesignLimitName = keyof DesignLimits;

/** The design limits in the order every table, diff and message lists them. */
export const DESIGN_LIMIT_NAMES: readonly DesignLimitName[] = [
	'designPressure',
	'reliefSetPressure',
	'designTemperature',
	'minimumTemperature'
];

/** Each design limit's name in running text (lower case: "reaches the design pressure"). */
export const DESIGN_LIMIT_LABEL: Readonly<Record<DesignLimitName, string>> = {
	designPressure: 'design pressure',
	reliefSetPressure: 'relief set pressure',
	designTemperature: 'design temperature',
	minimumTemperature: 'minimum temperature'
};

/** The quantity each design limit is (for units and formatting). */
export const DESIGN_LIMIT_QUANTITY: Readonly<Record<DesignLimitName, 'pressure' | 'temperature'>> =
	{
		designPressure: 'pressure',
		reliefSetPressure: 'pressure',
		designTemperature: 'temperature',
		minimumTemperature: 'temperature'
	};

/** A whole path: the sheet's spec (docs/compute-api.md, "A path"). */
export interface PathSpec {
	fluid: string;
	system: PathSystem;
	/** exactly two properties of the first state */
	start: Inputs;
	/** at least one leg, in order (at most 50) */
	legs: PathLegSpec[];
	limits?: DesignLimits;
	/** the site's atmospheric pressure, Pa, for gauge readings on the screen (default 101 325); carried through */
	atmosphericPressure?: number;
	/** points per leg unless a leg says otherwise (default 40) */
	samples?: number;
	/** which state `start` means where its pair has several (FixOptions.hint / near) */
	startHint?: RootHint;
	startNear?: FixOptions['near'];
	/** bounds (T K, P Pa) on the start and every leg's end (LegSpec.window) */
	window?: StateWindow;
	/**
	 * Water only: which formulation gives the path's states and the legs' q and w. Absent or
	 * 'iapws95': IAPWS-95 (R6-95(2018)). 'if97': IAPWS-IF97 (R7-97(2012)); see Formulation.
	 */
	formulation?: Formulation;
}

/**
 * The formulations a water path may be computed with. With 'if97' every state of the path is fixed
 * by IF97 from the same pair the IAPWS-95 path fixes it by, each leg's q and w follow from those
 * states, and each leg's points and crossings of the saturation lines are IF97's too (if97/path.ts).
 */
export type Formulation = 'iapws95' | 'if97';

/** Each formulation's name, as tables, title blocks and exports print it. */
export const FORMULATION_NAME: Readonly<Record<Formulation, string>> = {
	iapws95: 'IAPWS-95',
	if97: 'IAPWS-IF97'
};

/** What practitioners read beside T, P, v (null where not meaningful). */
export interface StateExtras {
	/** saturation temperature at the state's pressure, K (triple-point pressure ≤ P < Pc), else null */
	Tsat: number | null;
	/** degrees of superheat T − Tsat(P), K: superheated vapor (0 for saturated vapor) below Pc */
	superheat: number | null;
	/** degrees of subcooling Tsat(P) − T, K: compressed liquid (0 for saturated liquid) below Pc */
	subcooling: number | null;
	/** liquid volume fraction (1 − x)·v′/v on and inside the dome: what a level gauge shows */
	liquidVolumeFraction: number | null;
	/** vapor volume fraction x·v″/v on and inside the dome */
	vaporVolumeFraction: number | null;
}

/** A state of the path: S1 (the start), S2 (end of the first leg), … */
export interface PathState {
	id: string;
	state: State;
	extras: StateExtras;
	/** viscosity, conductivity, Prandtl number and surface tension (transport/index.ts); POST /api/v1/paths adds it to every state */
	transport?: Transport;
	/** on a path computed with IAPWS-IF97: the IAPWS-95 state of the same inputs, for the difference */
	iapws95?: State;
	/** on a path computed with IAPWS-IF97: 'iapws95' where IF97 could not give this state (a warning says why) */
	formulation?: Formulation;
}

/** Totals of a leg or path: per-kg values × mass (J) for a closed system, × mass flow (W) for a device. */
export interface PathTotals {
	/** 'J' for a closed system, 'W' for a steady-flow device */
	unit: 'J' | 'W';
	/** heat in, closed system: m·q */
	Q: number;
	/** boundary work by the fluid: m·w */
	W: number;
	/** shaft work by the fluid, steady flow: ṁ·wShaft (or m·wShaft) */
	WShaft: number;
	/** heat in, steady flow: ṁ·qFlow (or m·qFlow) */
	QFlow: number;
}

export interface PathLeg {
	id: string;
	/** ids of the states at its ends */
	from: string;
	to: string;
	leg: Leg;
	totals: PathTotals;
}

/**
 * A path that ends where it started (every property within 1 part in 10⁶: |ΔT| ≤ 10⁻⁶·T and
 * |Δρ| ≤ 10⁻⁶·ρ) is a cycle. Per kg, with q and w of the system kind (closed: q, w; flow: qFlow,
 * wShaft): net work = Σw; heat added = Σ of the legs' positive q, heat rejected = Σ of the negative
 * q (as positive numbers). Net work > 0: a power cycle, efficiency = net work / heat added.
 * Net work < 0: a reverse (refrigeration or heat-pump) cycle, COP cooling = heat added / |net work|,
 * COP heating = heat rejected / |net work|.
 */
export interface CycleAnalysis {
	kind: 'power' | 'reverse' | 'no-net-work';
	/** J/kg */
	netWork: number;
	heatAdded: number;
	heatRejected: number;
	/** the same three × mass (J) or × mass flow (W) */
	totals: { unit: 'J' | 'W'; netWork: number; heatAdded: number; heatRejected: number };
	thermalEfficiency: number | null;
	copCooling: number | null;
	copHeating: number | null;
}

/**
 * A design limit met along a leg: the first state along the leg where the property reaches the limit
 * coming from the safe side (found by root-finding along the leg, not the nearest point), or the
 * path's start when it already lies beyond.
 */
export interface LimitEvent {
	limit: DesignLimitName;
	/** the limit, Pa or K */
	value: number;
	/** the leg's id; null for the path's start */
	leg: string | null;
	kind: 'reached' | 'start-beyond';
	/** the leg (or the start) goes beyond the limit, not only up to it */
	exceeded: boolean;
	state: State;
}

/** Stable warning codes of a path (see path.ts for the conditions). */
export type PathWarningCode =
	| 'pressure-equipment-caution'
	| 'design-pressure-reached'
	| 'design-pressure-exceeded'
	| 'relief-set-pressure-reached'
	| 'relief-set-pressure-exceeded'
	| 'design-temperature-reached'
	| 'design-temperature-exceeded'
	| 'below-minimum-temperature'
	| 'relief-set-above-design-pressure'
	| 'liquid-full'
	| 'liquid-full-ahead'
	| 'throttling-irreversible'
	| 'per-kg-totals'
	| 'if97-state-unavailable';

export interface PathWarning {
	code: PathWarningCode;
	/** 'caution': safety; 'warning': a limit or hazard met; 'info': how to read the numbers */
	severity: 'caution' | 'warning' | 'info';
	message: string;
	/** the leg and state concerned, if any */
	leg?: string;
	state?: string;
	/** the state where it happens (e.g. where the vessel goes liquid-full) */
	at?: State;
	/** liquid-full: the pressure rise per kelvin at constant volume, (∂P/∂T)ᵥ at `at`, in Pa/K */
	dPdT?: number;
	/** liquid-full: the leg crosses the saturated-liquid line ('crossing') or heats a liquid that is compressed from the leg's start ('start') */
	onset?: 'crossing' | 'start';
}

export interface PathResult {
	fluid: string;
	system: { kind: 'closed'; mass: number; volume: number } | { kind: 'flow'; massFlow: number };
	atmosphericPressure: number;
	limits: DesignLimits;
	states: PathState[];
	legs: PathLeg[];
	/** sums over the legs: per kg (J/kg; ds J/(kg·K)) and totals */
	perKg: {
		q: number;
		w: number;
		wShaft: number;
		qFlow: number;
		du: number;
		dh: number;
		ds: number;
	};
	totals: PathTotals;
	/** null unless the path closes into a cycle */
	cycle: CycleAnalysis | null;
	limitEvents: LimitEvent[];
	warnings: PathWarning[];
	/** the formulation of the states and legs' q and w; absent: IAPWS-95 (the fluid's own equation) */
	formulation?: Formulation;
}

// ---- Isolines (GET /api/v1/fluids/{id}/isolines) ------------------------------------------------

export type IsolineKind =
	'isobar' | 'isotherm' | 'isochore' | 'isentrope' | 'isenthalp' | 'quality';

/** A point of an isoline: T K, P Pa, v m³/kg, h J/kg, s J/(kg·K). */
export interface IsolinePoint {
	T: number;
	P: number;
	v: number;
	h: number;
	s: number;
}

/**
 * A background line of constant P (isobar), T (isotherm), v (isochore), s (isentrope), h
 * (isenthalp) across the fluid's drawable range, through the dome (flat in T for an isobar, flat in
 * P for an isotherm below the critical point), in order of rising T (isobar, isochore) or rising v
 * (isotherm, isentrope), or rising P (isenthalp); or a line of constant quality x inside the dome,
 * from the triple point to the critical point in rising T.
 */
export interface Isoline {
	kind: IsolineKind;
	/** Pa, K, m³/kg, J/(kg·K), J/kg or 1 (quality) */
	value: number;
	points: IsolinePoint[];
}
