/** State from (h, x): along the saturation curve (see dome.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashXY } from './flash-x.ts';

export const flashHX = (fl: Fluid, h: number, x: number, hint?: RootHint): State => flashXY(fl, x, 'h', h, hint);
