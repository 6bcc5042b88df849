/** State from (P, h): along the isobar (see isobar.ts). */
import type { Fluid } from '../fluid.ts';
import type { State } from '../types.ts';
import { flashPY } from './isobar.ts';

export const flashPH = (fl: Fluid, P: number, h: number): State => flashPY(fl, P, 'h', h);
