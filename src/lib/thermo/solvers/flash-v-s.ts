/** State from (v, s): along the isochore and across the dome (see isochore.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashRhoY } from './isochore.ts';

export const flashVS = (fl: Fluid, rho: number, s: number, hint?: RootHint): State => flashRhoY(fl, rho, 's', s, hint);
