/**
 * Range checks shared by the flashes (limits from the fluid data file). The range is kept simple:
 * T from the triple-point temperature (or limits.Tmin if higher) to limits.Tmax, P up to
 * limits.Pmax. The melting line is not checked: a state at T ≥ Tt is accepted whatever its
 * pressure (e.g. water near 273 K above about 630 MPa, where ice VI would form).
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import type { State } from '../types.ts';
import { triplePressure } from './saturation.ts';

export function belowTriple(fl: Fluid, T: number): ThermoError {
	return new ThermoError(
		'below-triple-point',
		`T = ${fmt(T, fl.Tmin)} K is below the triple point of ${fl.id} (${fmt(fl.Tmin, T)} K); the engine covers fluid states from the triple point up.`,
		`Give a temperature of at least ${fmt(fl.Tmin, T)} K.`
	);
}

export function aboveTmax(fl: Fluid, T: number): ThermoError {
	return new ThermoError(
		'out-of-range',
		`T = ${fmt(T, fl.Tmax)} K is above the range of the ${fl.data.formulation.name} formulation for ${fl.id} (up to ${fmt(fl.Tmax, T)} K).`,
		`Give a temperature of at most ${fmt(fl.Tmax, T)} K.`
	);
}

export function abovePmax(fl: Fluid, P: number): ThermoError {
	return new ThermoError(
		'out-of-range',
		`P = ${fmt(P, fl.Pmax)} Pa is above the range of the ${fl.data.formulation.name} formulation for ${fl.id} (up to ${fmt(fl.Pmax, P)} Pa).`,
		`Give a pressure of at most ${fmt(fl.Pmax, P)} Pa.`
	);
}

/** The pair names no state within the formulation's range. */
export function noStateInRange(fl: Fluid, what: string): ThermoError {
	return new ThermoError(
		'out-of-range',
		`No ${fl.id} state with ${what} lies within the range of the ${fl.data.formulation.name} formulation (${fmt(fl.Tmin)}–${fmt(fl.Tmax)} K, up to ${fmt(fl.Pmax)} Pa).`,
		'Check the values and their units; give values that describe a fluid state inside that range.'
	);
}

export function checkT(fl: Fluid, T: number): void {
	if (T < fl.Tmin * (1 - 1e-12)) throw belowTriple(fl, T);
	if (T > fl.Tmax * (1 + 1e-12)) throw aboveTmax(fl, T);
}

export function checkP(fl: Fluid, P: number): void {
	if (P > fl.Pmax * (1 + 1e-12)) throw abovePmax(fl, P);
}

/** A pressure given with a quality must lie on the saturation curve. */
export function checkSaturationP(fl: Fluid, P: number): void {
	const Pt = triplePressure(fl);
	if (P < Pt * (1 - 1e-9))
		throw new ThermoError(
			'below-triple-point',
			`P = ${fmt(P, Pt)} Pa is below the triple-point pressure of ${fl.id} (${fmt(Pt, P)} Pa): no liquid exists there, so there is no saturation.`,
			`Give a pressure of at least ${fmt(Pt, P)} Pa with a quality, or give the state by two other properties.`
		);
}

/** Whether a computed state lies in range (T within limits, P ≤ Pmax). */
export function inRange(fl: Fluid, s: State): boolean {
	return (
		s.T >= fl.Tmin * (1 - 1e-9) &&
		s.T <= fl.Tmax * (1 + 1e-9) &&
		s.P <= fl.Pmax * (1 + 1e-9) &&
		s.P > 0
	);
}

/** Throw out-of-range for a computed state outside the limits. */
export function assertInRange(fl: Fluid, s: State): State {
	if (s.T < fl.Tmin * (1 - 1e-9)) throw belowTriple(fl, s.T);
	if (s.T > fl.Tmax * (1 + 1e-9)) throw aboveTmax(fl, s.T);
	if (s.P > fl.Pmax * (1 + 1e-9)) throw abovePmax(fl, s.P);
	return s;
}
