/** Saturation curves for drawing the dome. */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { criticalState, saturatedState } from '../state.ts';
import type { SaturationCurve } from '../types.ts';
import { satAtT } from './saturation.ts';
import { meltingLine } from './solid.ts';
import { bandCurve, bandOf } from '../pseudo-pure.ts';

/** points drawn along the melting curve */
const MELTING_POINTS = 40;

/**
 * `points` saturated liquid and vapor states at Tᵢ = Tc − (Tc − Tt)·(1 − i/points)³, i = 0…points−1
 * (from the triple point, denser toward the critical point: the last lies (Tc − Tt)/points³ below
 * Tc), plus the critical state and the liquid along the melting curve (solid.ts meltingLine).
 */
export function curveOf(fl: Fluid, points: number): SaturationCurve {
	if (!Number.isInteger(points) || points < 2 || points > 5000)
		throw new ThermoError(
			'invalid-option',
			`The number of saturation points must be a whole number from 2 to 5000 (got ${fmt(points, 2, 5000)}).`,
			'Give points between 2 and 5000 (100 draws a smooth dome).'
		);
	// a mixture: its bubble line as the liquid, its dew line as the vapor (pseudo-pure.ts)
	const band = bandOf(fl);
	if (band) return { ...bandCurve(fl, band, points), melting: meltingLine(fl, MELTING_POINTS) };
	const liquid = [],
		vapor = [];
	const span = fl.Tc - fl.Tt;
	for (let i = 0; i < points; i++) {
		const w = 1 - i / points;
		const T = i === 0 ? fl.Tt : fl.Tc - span * w * w * w;
		const sat = satAtT(fl, T);
		liquid.push(saturatedState(fl, sat, 0));
		vapor.push(saturatedState(fl, sat, 1));
	}
	return { liquid, vapor, critical: criticalState(fl), melting: meltingLine(fl, MELTING_POINTS) };
}
