/** State from (v, h): along the isochore and across the dome (see isochore.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashRhoY } from './isochore.ts';

export const flashVH = (fl: Fluid, rho: number, h: number, hint?: RootHint): State => flashRhoY(fl, rho, 'h', h, hint);
