/** State from (P, u): along the isobar (see isobar.ts). */
import type { Fluid } from '../fluid.ts';
import type { State } from '../types.ts';
import { flashPY } from './isobar.ts';

export const flashPU = (fl: Fluid, P: number, u: number): State => flashPY(fl, P, 'u', u);
