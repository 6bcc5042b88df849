/** State from (u, h): two-phase search plus grid-started 2-D Newton (see plane.ts). In dilute vapor h − u = Pv ≈ RT carries almost no pressure information: the pair is ill-conditioned there. */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashYY } from './plane.ts';

export const flashUH = (fl: Fluid, u: number, h: number, hint?: RootHint): State => flashYY(fl, 'u', u, 'h', h, hint);
