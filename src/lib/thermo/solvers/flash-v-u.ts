/** State from (v, u): along the isochore and across the dome (see isochore.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashRhoY } from './isochore.ts';

export const flashVU = (fl: Fluid, rho: number, u: number, hint?: RootHint): State => flashRhoY(fl, rho, 'u', u, hint);
