/**
 * Statewright property engine: reference multiparameter Helmholtz equations of state.
 * Pure TypeScript (no DOM, no Node built-ins, no packages); this file is the only entry.
 * Units everywhere: SI base units — T K, P Pa, v m³/kg, rho kg/m³, u h J/kg, s cv cp J/(kg·K),
 * w m/s, x 0…1.
 *
 * Every property derives from the reduced Helmholtz energy α(δ, τ) = a/(RT) = α⁰ + αʳ with
 * δ = ρ/ρr, τ = Tr/T (e.g. IAPWS R6-95(2018) for water), see properties.ts.
 */
import { ThermoError } from './errors.ts';
import { allFluidInfo, fluidIds, fluidInfo, getCompiledFluid } from './registry.ts';
import { fluidData } from './fluids/index.ts';
import { saturatedState } from './state.ts';
import { curveOf } from './solvers/curve.ts';
import { fixStateOf } from './solvers/fix-state.ts';
import { computePath as computePathBase } from './solvers/path.ts';
import { if97Path } from './if97/path.ts';
import { computeLeg as computeLegImpl } from './solvers/legs.ts';
import { stateExtras as stateExtrasOf } from './solvers/path.ts';
import { checkSaturationP } from './solvers/range.ts';
import { satAtP, satAtT } from './solvers/saturation.ts';
import { isSolid, meltingAt, meltingLine, sublimationAt } from './solvers/solid.ts';
import { fmt } from './errors.ts';
import type { Fluid } from './fluid.ts';
import { bandOf } from './pseudo-pure.ts';
import type {
	FixOptions,
	FluidInfo,
	Inputs,
	Leg,
	LegSpec,
	PathResult,
	PathSpec,
	Saturation,
	SaturationCurve,
	State
} from './types.ts';

export type * from './types.ts';
export type { FluidData } from './fluids/schema.ts';
export { ThermoError } from './errors.ts';
export { FORMULATION_NAME } from './types.ts';
/** Water by IAPWS-IF97 (IAPWS R7-97(2012)), the industrial formulation: see if97/state.ts. */
export {
	if97State,
	if97StatePh,
	if97StatePs,
	if97Region,
	if97Region3State,
	if97SaturationPressure,
	if97SaturationTemperature,
	if97Limits,
	if97Boundaries
} from './if97/state.ts';
export type { If97State, If97Region, If97Options } from './if97/state.ts';
/** Viscosity, thermal conductivity, Prandtl number and surface tension of a state (water so far): see transport/index.ts. */
export { transport } from './transport/index.ts';
export type { Transport, TransportAbsence, TransportName } from './transport/index.ts';
export type { ThermoErrorCode, StateCandidate } from './errors.ts';

/**
 * Fix a state from exactly two of T, P, v, rho, u, h, s, x (any of the 21 pairs; v and rho are one
 * property). Returns every property (SI) and the phase. Single-phase properties from α(δ, τ) per
 * IAPWS R6-95(2018) Table 3; inside the dome v, u, h, s are mass-weighted between the saturated
 * phases (equal P and Gibbs energy), x = (v − v')/(v'' − v').
 * Phase rules (state.ts): a state is on a saturation line only when it matches the saturated phase
 * at its temperature in density (within 1e−9) AND pressure (within 1e−9·Psat plus the liquid's
 * round-off floor, 2e−12·ρRT ≈ 2.5e−4 Pa for water at 0 °C), so a liquid a pascal above Psat is
 * a compressed liquid; T ≥ Tc and P ≥ Pc is supercritical; T ≥ Tc, P < Pc superheated vapor;
 * T < Tc, P ≥ Pc compressed liquid. A returned state carries the inputs it was fixed from: P in,
 * the same P out (also when it is put on a line).
 * Range: T from the triple point to the formulation's Tmax, P up to its Pmax (melting line not
 * checked); outside it throws `below-triple-point` or `out-of-range`.
 * `options.hint` picks one state where a pair has two (RootHint); without it such pairs throw
 * `ambiguous-state` naming both. Throws ThermoError for anything it cannot answer.
 */
export function fixState(fluid: string, inputs: Inputs, options: FixOptions = {}): State {
	return fixStateOf(getCompiledFluid(fluid), inputs, options);
}

/** A mixture (pseudo-pure.ts) has a bubble and a dew line, not one saturation: say so and how to ask. */
function noSingleSaturation(fl: Fluid): void {
	const band = bandOf(fl);
	if (band)
		throw new ThermoError(
			'mixture-two-phase',
			`${fl.data.name} is a mixture: it has a bubble line and a dew line (below ${fmt(band.Tj)} K), not one saturation pressure at a temperature.`,
			'Fix the state on a line with x = 0 (bubble point) or x = 1 (dew point) and T or P, or draw both lines from the saturation curve.'
		);
}

function finite(name: string, value: number): void {
	if (typeof value !== 'number' || !Number.isFinite(value))
		throw new ThermoError(
			'non-finite-input',
			`${name} must be a finite number (got ${String(value)}).`,
			`Give ${name} as a finite number in SI units.`
		);
}

/**
 * Saturation at temperature T (K), triple point ≤ T ≤ Tc: P (Pa) and the saturated liquid and
 * vapor states, from equal pressure and equal Gibbs energy in both phases (Maxwell criterion;
 * Newton after Akasaka (2008), J. Therm. Sci. Technol. 3, 442). At Tc both are the critical state.
 */
export function saturationAtT(fluid: string, T: number): Saturation {
	const fl = getCompiledFluid(fluid);
	finite('T', T);
	noSingleSaturation(fl);
	if (T < fl.Tt)
		throw new ThermoError(
			'below-triple-point',
			`T = ${fmt(T, fl.Tt)} K is below the triple point of ${fl.id} (${fmt(fl.Tt, T)} K).`,
			`Give a temperature from ${fmt(fl.Tt)} to ${fmt(fl.Tc)} K.`
		);
	if (T > fl.Tc)
		throw new ThermoError(
			'inconsistent-inputs',
			`There is no saturation above the critical temperature of ${fl.id} (${fmt(fl.Tc, T)} K); T = ${fmt(T, fl.Tc)} K.`,
			`Give a temperature from ${fmt(fl.Tt)} to ${fmt(fl.Tc)} K.`
		);
	const sat = satAtT(fl, T);
	return { T, P: sat.P, liquid: saturatedState(fl, sat, 0), vapor: saturatedState(fl, sat, 1) };
}

/**
 * Saturation at pressure P (Pa), triple-point pressure ≤ P ≤ Pc: the saturation temperature (K)
 * and the saturated liquid and vapor states (Newton in (T, ρ', ρ'') on P' = P'' = P, g' = g'').
 */
export function saturationAtP(fluid: string, P: number): Saturation {
	const fl = getCompiledFluid(fluid);
	finite('P', P);
	noSingleSaturation(fl);
	if (!(P > 0))
		throw new ThermoError(
			'non-positive-input',
			`P must be positive (got ${fmt(P, 0)}).`,
			'Give an absolute pressure in Pa.'
		);
	if (P > fl.Pc)
		throw new ThermoError(
			'inconsistent-inputs',
			`There is no saturation above the critical pressure of ${fl.id} (${fmt(fl.Pc, P)} Pa); P = ${fmt(P, fl.Pc)} Pa.`,
			`Give a pressure up to ${fmt(fl.Pc)} Pa.`
		);
	checkSaturationP(fl, P);
	const sat = satAtP(fl, P);
	return { T: sat.T, P, liquid: saturatedState(fl, sat, 0), vapor: saturatedState(fl, sat, 1) };
}

/**
 * Saturation curves for the vapor dome: `points` saturated liquid and vapor states from the
 * triple point toward the critical point, spaced Tᵢ = Tc − (Tc − Tt)(1 − i/points)³ (denser near
 * Tc), and the critical state (cv, cp, w null there: they diverge). Default 100 points.
 * Tc and the critical state are the equation's own critical point ((∂P/∂ρ)_T = (∂²P/∂ρ²)_T = 0;
 * FluidInfo.equationCritical), where its two phases merge — not the published `critical`, which
 * for some fluids differs (ammonia: 405.50 K against 405.40 K).
 */
export function saturationCurve(fluid: string, points = 100): SaturationCurve {
	return curveOf(getCompiledFluid(fluid), points);
}

/** Metadata of every fluid (FluidInfo: id, name, formula, formulation and citation, published critical point and the equation's own, triple point, limits, reference state). */
export const fluids: FluidInfo[] = allFluidInfo();

/** Metadata of every fluid, freshly built (same content as `fluids`). */
export function listFluids(): FluidInfo[] {
	return allFluidInfo();
}

/** Metadata of one fluid by id or alias (case-insensitive); throws ThermoError `unknown-fluid`. */
export function getFluid(id: string): FluidInfo {
	const key = typeof id === 'string' ? id.trim().toLowerCase() : '';
	const data = fluidData.find(
		(f) => f.id === key || f.aliases.some((a) => a.toLowerCase() === key)
	);
	if (!data)
		throw new ThermoError(
			'unknown-fluid',
			`Unknown fluid "${String(id)}".`,
			`Use one of: ${fluidIds().join(', ')}.`
		);
	return fluidInfo(data);
}

/**
 * A process leg between a start state and a target (docs/compute-api.md): points along the path, crossings of
 * the saturation lines, w = ∫P dv, q = Δu + w, wShaft = −∫v dP, qFlow = Δh + wShaft (J/kg).
 * The leg runs until the target first takes its value along the process curve (solvers/legs.ts;
 * integrals by Gauss–Kronrod quadrature per piece between crossings, or exactly where P or v is
 * fixed). Throws ThermoError (`unreachable-target` states the reachable range).
 */
export function computeLeg(spec: LegSpec): Leg {
	return computeLegImpl(spec);
}

/**
 * A whole path (PathSpec → PathResult, types.ts): states S1…, legs with totals (× mass in J, or ×
 * mass flow in W), the cycle analysis when it closes, design-limit events found exactly along each
 * leg, per-state extras (superheat, subcooling, volume fractions) and warnings with stable codes
 * (solvers/path.ts). Throws ThermoError (`invalid-path`, or a leg's error prefixed with its id).
 */
export function computePath(spec: PathSpec): PathResult {
	const formulation = (spec as { formulation?: unknown } | null)?.formulation;
	if (formulation === undefined || formulation === 'iapws95') return computePathBase(spec);
	if (formulation !== 'if97')
		throw new ThermoError(
			'invalid-path',
			`Unknown formulation "${String(formulation)}".`,
			'Use "iapws95" (the default) or "if97" (water only).'
		);
	if (spec.fluid !== 'water')
		throw new ThermoError(
			'invalid-path',
			`The formulation IAPWS-IF97 is for water only; this path is of ${String(spec.fluid)}.`,
			'Leave formulation out (the fluid’s own equation of state) or make the fluid water.'
		);
	return if97Path(spec, computePathBase(spec));
}
export { CYCLE_TOLERANCE, MAX_LEGS } from './solvers/path.ts';

export type { If97Seed } from './if97/fix.ts';
// the IF97 operations live apart, so the browser loads them only for an IF97 sheet (browser-if97.ts)
export { if97Fix, if97Isolines, if97SaturationCurve } from './water-if97.ts';
export { if97Extras, if97LegEnergy } from './if97/path.ts';
export { IF97_DOME_TOP } from './if97/dome.ts';

export { PRESSURE_EQUIPMENT_CAUTION, LIQUID_FULL_CAUTION } from './cautions.ts';
export { DEFAULT_ATMOSPHERE, STANDARD_ATMOSPHERE } from './constants.ts';

/** Degrees of superheat/subcooling against saturation at the state's P, and liquid/vapor volume fractions. */
export function stateExtras(state: State): import('./types.ts').StateExtras {
	return stateExtrasOf(getCompiledFluid(state.fluid), state);
}

/** Leg limits and names for validators (process names, target names, samples range, |n| bound). */
export {
	PROCESSES,
	TARGET_NAMES,
	SAMPLES_DEFAULT,
	SAMPLES_MIN,
	SAMPLES_MAX,
	N_MAX
} from './solvers/legs.ts';
export { ROOT_HINTS } from './solvers/choose.ts';

/**
 * Background isolines (isobars Pa, isotherms K, isochores m³/kg, isentropes J/(kg·K), isenthalps
 * J/kg) across the drawable range, through the dome, and quality lines inside it (solvers/isolines.ts).
 */
export {
	isolines,
	ISOLINE_KINDS,
	ISOLINE_UNITS,
	ISOLINE_POINTS_DEFAULT,
	ISOLINE_POINTS_MIN,
	ISOLINE_POINTS_MAX,
	ISOLINE_VALUES_MAX
} from './solvers/isolines.ts';

/**
 * Melting pressure (Pa) of `fluid` at T (K) and the solid beyond it — the curve bounding fluid
 * states from above (published melting equations, fluids/solid-lines.ts) — or null where the
 * fluid has no melting curve at T. Sublimation pressure below the triple point likewise.
 */
export function meltingPressure(fluid: string, T: number): { P: number; solid: string } | null {
	return meltingAt(getCompiledFluid(fluid), T);
}
export function sublimationPressure(fluid: string, T: number): number | null {
	return sublimationAt(getCompiledFluid(fluid), T);
}
/** Whether (T, P) is beyond the melting curve (solid): fixState refuses such states with `solid-region`. */
export function isSolidAt(fluid: string, T: number, P: number): boolean {
	return isSolid(getCompiledFluid(fluid), T, P);
}
/** Liquid states along the melting curve (for drawing it on T–v and P–v), up to the formulation's Pmax; [] without a curve. */
export function meltingCurve(fluid: string, points = 60): State[] {
	return meltingLine(getCompiledFluid(fluid), points);
}
