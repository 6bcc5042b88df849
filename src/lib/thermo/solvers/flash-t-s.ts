/** State from (T, s): isotherm scan (see isotherm.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashTY } from './isotherm.ts';

export const flashTS = (fl: Fluid, T: number, s: number, hint?: RootHint): State => flashTY(fl, T, 's', s, hint);
