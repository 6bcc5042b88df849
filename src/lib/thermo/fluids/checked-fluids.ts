import type { FluidChecks } from './checks.ts';
import { propaneChecks } from './propane.checks.ts';
import { r32Checks } from './r32.checks.ts';
import { argonChecks } from './argon.checks.ts';
import { methaneChecks } from './methane.checks.ts';
import { isobutaneChecks } from './isobutane.checks.ts';
import { r1234zeEChecks } from './r1234ze-e.checks.ts';
import { hydrogenChecks } from './hydrogen.checks.ts';
import { r1234yfChecks } from './r1234yf.checks.ts';
import { oxygenChecks } from './oxygen.checks.ts';

/** Every fluid's published check values (run by published-checks.test.ts); one line per fluid. */
export const checkedFluids: FluidChecks[] = [
	propaneChecks,
	r32Checks,
	argonChecks,
	methaneChecks,
	isobutaneChecks,
	r1234zeEChecks,
	hydrogenChecks,
	r1234yfChecks,
	oxygenChecks
];
