/** State from (T, ρ): one evaluation of the equation of state, then placed against the dome. */
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point } from '../properties.ts';
import type { State } from '../types.ts';
import { locate, placedState } from './locate.ts';
import { assertInRange } from './range.ts';

const p = new Point();

export function flashTRho(fl: Fluid, T: number, rho: number): State {
	evalPoint(fl, T, rho, p, 2);
	const loc = locate(fl, p);
	const st = placedState(fl, p, loc);
	return loc.sat ? st : assertInRange(fl, st);
}
