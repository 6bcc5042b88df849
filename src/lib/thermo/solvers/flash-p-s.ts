/** State from (P, s): along the isobar (see isobar.ts). */
import type { Fluid } from '../fluid.ts';
import type { State } from '../types.ts';
import { flashPY } from './isobar.ts';

export const flashPS = (fl: Fluid, P: number, s: number): State => flashPY(fl, P, 's', s);
