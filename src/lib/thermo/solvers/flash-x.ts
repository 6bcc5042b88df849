/** States on or inside the dome with a given quality and one of v, u, h, s (several possible). */
import { fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { saturatedState } from '../state.ts';
import type { RootHint, State } from '../types.ts';
import { choose } from './choose.ts';
import { domeRoots, type DomeProp } from './dome.ts';
import { ThermoError } from '../errors.ts';

const UNIT: Record<DomeProp, string> = { v: 'm³/kg', u: 'J/kg', h: 'J/kg', s: 'J/(kg·K)' };

export function flashXY(fl: Fluid, x: number, which: DomeProp, y: number, hint?: RootHint): State {
	const what = `x = ${fmt(x)} and ${which} = ${fmt(y)} ${UNIT[which]}`;
	const found = domeRoots(fl, { x }, which, y).map((r) => saturatedState(fl, r.sat, x));
	return choose(
		fl,
		found,
		hint,
		what,
		() =>
			new ThermoError(
				'inconsistent-inputs',
				`No saturated ${fl.id} state has ${what}: along the saturation curve from the triple point to the critical point that quality never reaches this ${which}.`,
				`Check the value and its units, or give the state by two other properties (for example T or P with x).`
			)
	);
}
