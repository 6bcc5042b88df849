/** State from (u, s): two-phase search plus grid-started 2-D Newton (see plane.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashYY } from './plane.ts';

export const flashUS = (fl: Fluid, u: number, s: number, hint?: RootHint): State => flashYY(fl, 's', s, 'u', u, hint);
