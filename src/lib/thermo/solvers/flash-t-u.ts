/** State from (T, u): isotherm scan (see isotherm.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashTY } from './isotherm.ts';

export const flashTU = (fl: Fluid, T: number, u: number, hint?: RootHint): State => flashTY(fl, T, 'u', u, hint);
