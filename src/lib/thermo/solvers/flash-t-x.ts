/** State from (T, x): saturation at T, then the mass-weighted mixture. */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { saturatedState } from '../state.ts';
import type { State } from '../types.ts';
import { satAtT } from './saturation.ts';

export function flashTX(fl: Fluid, T: number, x: number): State {
	if (T > fl.Tc)
		throw new ThermoError(
			'inconsistent-inputs',
			`A quality exists only below the critical temperature of ${fl.id} (${fmt(fl.Tc)} K); T = ${fmt(T)} K is above it.`,
			`Give a temperature below ${fmt(fl.Tc)} K with x, or give the state by two other properties.`
		);
	return saturatedState(fl, satAtT(fl, T), x);
}
