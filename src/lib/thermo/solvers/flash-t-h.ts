/** State from (T, h): isotherm scan (see isotherm.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashTY } from './isotherm.ts';

export const flashTH = (fl: Fluid, T: number, h: number, hint?: RootHint): State => flashTY(fl, T, 'h', h, hint);
