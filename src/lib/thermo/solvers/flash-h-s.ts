/** State from (h, s): two-phase search plus grid-started 2-D Newton (see plane.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashYY } from './plane.ts';

export const flashHS = (fl: Fluid, h: number, s: number, hint?: RootHint): State => flashYY(fl, 's', s, 'h', h, hint);
