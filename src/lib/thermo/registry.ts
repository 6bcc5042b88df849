/**
 * Loading fluids: find the data file by id or alias, validate it, compile it, pin the equation's
 * critical point and apply the declared reference state. Compiled fluids are cached.
 */
import { ThermoError, fmt } from './errors.ts';
import { Fluid, validateFluidData } from './fluid.ts';
import { fluidData } from './fluids/index.ts';
import type { FluidData } from './fluids/schema.ts';
import { evalPoint, Point } from './properties.ts';
import { refineCriticalPoint } from './solvers/critical.ts';
import { satAtP, satAtT } from './solvers/saturation.ts';
import { bandOf, lineTemperature } from './pseudo-pure.ts';
import type { FluidInfo } from './types.ts';

const compiled = new Map<string, Fluid>();

/**
 * Compile a validated FluidData and apply its reference state. The lead ideal-gas constants are
 * shifted so that the saturated liquid at the declared T (or P) has the declared h and s:
 * changing a1 by Δa1 changes s by −R·Δa1 and leaves h; changing a2 by Δa2 changes h by R·Tr·Δa2
 * and leaves s; the saturation state itself does not depend on a1, a2.
 */
export function loadFluid(data: unknown): Fluid {
	validateFluidData(data);
	const fl = new Fluid(data);
	refineCriticalPoint(fl);
	const rs = data.referenceState;
	if (rs.kind === 'as-published') return fl;
	const sat =
		rs.kind === 'saturated-liquid-at-T'
			? satAtT(fl, rs.T)
			: rs.kind === 'bubble-liquid-at-P'
				? bubbleAtP(fl, rs.P)
				: satAtP(fl, rs.P);
	const p = evalPoint(fl, sat.T, sat.rhoL, new Point(), 1);
	const a1 = fl.a1 - (rs.s - p.s) / fl.R;
	const a2 = fl.a2 + (rs.h - p.h) / (fl.R * fl.Tr);
	const shifted = new Fluid(data, { a1, a2 });
	shifted.Tc = fl.Tc;
	shifted.Pc = fl.Pc;
	shifted.rhoc = fl.rhoc;
	// the critical point is unchanged by the shift; the saturation table (which stores h, s) is rebuilt
	shifted.cache.criticalRefined = true;
	return shifted;
}

/** A mixture's liquid at its bubble point at P: T and ρ' (pseudo-pure.ts), for its reference state. */
function bubbleAtP(fl: Fluid, P: number): { T: number; rhoL: number } {
	const band = bandOf(fl);
	const T = band ? lineTemperature(fl, band, 'bubble', P) : null;
	if (!band || T === null)
		throw new ThermoError(
			'no-convergence',
			`${fl.id}: no bubble point at P = ${fmt(P)} Pa for its reference state.`,
			'Declare a reference pressure on the bubble line.'
		);
	return { T, rhoL: band.bubbleRho(T) };
}

function findData(id: string): FluidData | undefined {
	const key = id.trim().toLowerCase();
	return fluidData.find((f) => f.id === key || f.aliases.some((a) => a.toLowerCase() === key));
}

/** The compiled fluid for an id or alias; throws ThermoError `unknown-fluid`. */
export function getCompiledFluid(id: string): Fluid {
	if (typeof id !== 'string')
		throw new ThermoError(
			'unknown-fluid',
			'The fluid must be given as a string id.',
			`Use one of: ${fluidIds().join(', ')}.`
		);
	const hit = compiled.get(id);
	if (hit) return hit;
	const data = findData(id);
	if (!data)
		throw new ThermoError(
			'unknown-fluid',
			`Unknown fluid "${id}".`,
			`Use one of: ${fluidIds().join(', ')}.`
		);
	let fl = compiled.get(data.id);
	if (!fl) {
		fl = loadFluid(data);
		compiled.set(data.id, fl);
	}
	compiled.set(id, fl);
	return fl;
}

/** Ids of every registered fluid, in display order. */
export function fluidIds(): string[] {
	return fluidData.map((f) => f.id);
}

const equationCriticals = new Map<string, { T: number; P: number; rho: number }>();

/**
 * The equation's own critical point (solvers/critical.ts): from the compiled fluid when it is
 * loaded, else from the terms alone (no saturation table is built for it), cached per fluid.
 */
function equationCritical(data: FluidData): { T: number; P: number; rho: number } {
	let c = equationCriticals.get(data.id);
	if (!c) {
		const fl = compiled.get(data.id) ?? new Fluid(data);
		refineCriticalPoint(fl);
		c = { T: fl.Tc, P: fl.Pc, rho: fl.rhoc };
		equationCriticals.set(data.id, c);
	}
	return { ...c };
}

/** Public metadata of a fluid (FluidInfo, types.ts) from its data file. */
export function fluidInfo(data: FluidData): FluidInfo {
	return {
		id: data.id,
		name: data.name,
		formula: data.formula,
		aliases: [...data.aliases],
		group: data.group,
		formulation: { name: data.formulation.name, reference: data.formulation.reference },
		critical: { ...data.critical },
		equationCritical: equationCritical(data),
		triple: { ...data.triple },
		limits: { ...data.limits },
		referenceState: data.referenceState.label,
		molarMass: data.molarMass
	};
}

/** Metadata of every registered fluid. */
export function allFluidInfo(): FluidInfo[] {
	return fluidData.map(fluidInfo);
}
