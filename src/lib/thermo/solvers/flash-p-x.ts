/** State from (P, x): saturation at P, then the mass-weighted mixture. */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { saturatedState } from '../state.ts';
import type { State } from '../types.ts';
import { checkSaturationP } from './range.ts';
import { satAtP } from './saturation.ts';

export function flashPX(fl: Fluid, P: number, x: number): State {
	if (P > fl.Pc)
		throw new ThermoError(
			'inconsistent-inputs',
			`A quality exists only below the critical pressure of ${fl.id} (${fmt(fl.Pc)} Pa); P = ${fmt(P)} Pa is above it.`,
			`Give a pressure below ${fmt(fl.Pc)} Pa with x, or give the state by two other properties.`
		);
	checkSaturationP(fl, P);
	return saturatedState(fl, satAtP(fl, P), x);
}
