/**
 * Process legs (isobaric, isochoric, isothermal, isentropic, isenthalpic, polytropic) between two
 * states, with crossings of the saturation lines, boundary work w = ∫P dv, q = Δu + w,
 * shaft work wShaft = −∫v dP and qFlow = Δh + wShaft (see the compute contract, API.md).
 * Not built yet: a later change implements it here.
 */
import { ThermoError } from '../errors.ts';
import type { Leg, LegSpec } from '../types.ts';

export function computeLeg(spec: LegSpec): Leg {
	void spec;
	throw new ThermoError(
		'not-implemented',
		'Process legs are not available yet in this version of the engine.',
		'Fix the end states one at a time with fixState for now.'
	);
}
