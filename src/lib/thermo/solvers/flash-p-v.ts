/** State from (P, v): saturation at P, else roots of P(T, ρ) = P along the isochore (see isobar.ts). */
import type { Fluid } from '../fluid.ts';
import type { RootHint, State } from '../types.ts';
import { flashPRho } from './isobar.ts';

export const flashPV = (fl: Fluid, P: number, rho: number, hint?: RootHint): State => flashPRho(fl, P, rho, hint);
