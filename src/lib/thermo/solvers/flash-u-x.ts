/** State from (u, x): along the saturation curve (see dome.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashXY } from './flash-x.ts';

export const flashUX = (fl: Fluid, u: number, x: number, hint?: RootHint): State => flashXY(fl, x, 'u', u, hint);
