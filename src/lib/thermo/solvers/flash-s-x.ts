/** State from (s, x): along the saturation curve (see dome.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashXY } from './flash-x.ts';

export const flashSX = (fl: Fluid, s: number, x: number, hint?: RootHint): State => flashXY(fl, x, 's', s, hint);
