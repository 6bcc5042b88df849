/** State from (v, x): along the saturation curve (see dome.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashXY } from './flash-x.ts';

export const flashVX = (fl: Fluid, rho: number, x: number, hint?: RootHint): State => flashXY(fl, x, 'v', 1 / rho, hint);
