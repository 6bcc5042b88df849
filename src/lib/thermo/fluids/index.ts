import type { FluidData } from './schema.ts';
import { water } from './water.ts';
import { ammonia } from './ammonia.ts';
import { carbonDioxide } from './carbon-dioxide.ts';
import { r134a } from './r134a.ts';
import { nitrogen } from './nitrogen.ts';
import { propane } from './propane.ts';
import { r32 } from './r32.ts';
import { argon } from './argon.ts';
import { methane } from './methane.ts';
import { isobutane } from './isobutane.ts';
import { r1234zeE } from './r1234ze-e.ts';
import { hydrogen } from './hydrogen.ts';
import { r1234yf } from './r1234yf.ts';
import { oxygen } from './oxygen.ts';
import { air } from './air.ts';

/**
 * Registry of fluid data files, in display order. Each entry is a plain FluidData (see schema.ts);
 * the engine validates and compiles it on first use. To add a fluid: import its data file and add
 * one line to this array.
 */
export const fluidData: FluidData[] = [
	water,
	ammonia,
	carbonDioxide,
	r134a,
	nitrogen,
	propane,
	r32,
	argon,
	methane,
	isobutane,
	r1234zeE,
	hydrogen,
	r1234yf,
	oxygen,
	air
];
