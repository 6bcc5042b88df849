/** State from (T, ρ): one evaluation of the equation of state, then placed against the dome. */
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point } from '../properties.ts';
import { saturatedState, singleState } from '../state.ts';
import type { State } from '../types.ts';
import { locate } from './locate.ts';
import { assertInRange } from './range.ts';

const p = new Point();

export function flashTRho(fl: Fluid, T: number, rho: number): State {
	evalPoint(fl, T, rho, p, 2);
	const loc = locate(fl, p);
	if (loc.sat) return saturatedState(fl, loc.sat, loc.x ?? 0);
	return assertInRange(fl, singleState(fl, p, loc.phase));
}
