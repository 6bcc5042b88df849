/**
 * Air (Lemmon et al. 2000, pseudo-pure): the equation, compiled directly (air is not registered:
 * see air.ts), against the paper's printed single-phase table and bubble- and dew-point pressures
 * (air.checks.ts names the table and the public copy each value was read in). Every
 * printed value must be reproduced within half a unit in its last printed digit.
 */
import { describe, expect, it } from 'vitest';
import { AncillaryEq, Fluid, validateFluidData } from '../fluid.ts';
import { evalPoint, Point } from '../properties.ts';
import { densityAtTP } from '../solvers/density.ts';
import type { FluidData } from './schema.ts';
import { airBoundaries, airEquation } from './air.ts';
import { airBubbleDew, airSinglePhase } from './air.checks.ts';

/**
 * The Fluid constructor compiles three ancillaries the saturation solvers use; this test calls no
 * saturation solver, so the bubble pressure and dew density stand in (air has no single line).
 */
const data: FluidData = {
	...airEquation,
	ancillaries: {
		pSat: airBoundaries.bubblePressure,
		rhoLiquid: airBoundaries.dewDensity,
		rhoVapor: airBoundaries.dewDensity
	}
};
const fl = new Fluid(data);
const M = airEquation.molarMass;

/** Half a unit in the last printed digit of `text`. */
function halfUnit(text: string): number {
	const decimals = text.includes('.') ? text.split('.')[1].length : 0;
	return 0.5 * 10 ** -decimals;
}

describe('air (Lemmon et al. 2000): the data file', () => {
	it('passes the fluid-data validator, with its ln(c + exp(γτ)) ideal term', () => {
		expect(() => validateFluidData(structuredClone(data))).not.toThrow();
		expect(airEquation.ideal.some((t) => t.kind === 'log-c-plus-exp')).toBe(true);
	});
});

describe('air (Lemmon et al. 2000): printed single-phase table', () => {
	it(airSinglePhase.source, () => {
		const failures: string[] = [];
		for (const row of airSinglePhase.rows) {
			const [T, PMPa] = [Number(row[0]), Number(row[1])];
			const P = PMPa * 1e6;
			// all rows are gas or supercritical (T above the maxcondentherm, or P far below the dew line at 100 K)
			const rho = densityAtTP(fl, T, P, P / (fl.R * T));
			const p = evalPoint(fl, T, rho, new Point(), 2);
			const molar: Record<string, number> = {
				rho: p.rho / (M * 1e3),
				u: p.u * M,
				h: p.h * M,
				s: p.s * M,
				cv: p.cv * M,
				cp: p.cp * M,
				w: p.w
			};
			['rho', 'u', 'h', 's', 'cv', 'cp', 'w'].forEach((k, i) => {
				const text = row[i + 2];
				const got = molar[k];
				if (!(Math.abs(got - Number(text)) <= halfUnit(text)))
					failures.push(`T = ${T} K, P = ${PMPa} MPa: ${k} ${got} against printed ${text}`);
			});
		}
		expect(failures).toEqual([]);
	});
});

describe('air (Lemmon et al. 2000): bubble and dew lines', () => {
	const bubble = new AncillaryEq(airBoundaries.bubblePressure, airBoundaries.maxcondentherm.T);
	const dew = new AncillaryEq(airBoundaries.dewPressure, airBoundaries.maxcondentherm.T);

	it(`bubble- and dew-point pressures: ${airBubbleDew.source}`, () => {
		for (const [T, pb, pd] of airBubbleDew.rows) {
			expect(
				Math.abs(bubble.value(Number(T)) / 1e6 - Number(pb)),
				`bubble P at ${T} K`
			).toBeLessThanOrEqual(halfUnit(pb));
			expect(
				Math.abs(dew.value(Number(T)) / 1e6 - Number(pd)),
				`dew P at ${T} K`
			).toBeLessThanOrEqual(halfUnit(pd));
		}
	});

	it('the dew-pressure exponents 0.5, 1, 1.5, 2 of CoolProp’s copy miss the printed 59.75 K value (why 0.5, 1, 2.5, 4 were kept)', () => {
		const other = new AncillaryEq(
			{ ...airBoundaries.dewPressure, t: [0.5, 1, 1.5, 2] },
			airBoundaries.maxcondentherm.T
		);
		// Table A1 (via pychemqt): 0.00243 MPa at 59.75 K
		expect(other.value(59.75) / 1e6).toBeLessThan(0.001);
		expect(Math.abs(dew.value(59.75) / 1e6 - 0.00243)).toBeLessThanOrEqual(0.000005);
	});

	it('the two lines meet at the maxcondentherm, and the bubble line lies above the dew line below it', () => {
		const { T, P } = airBoundaries.maxcondentherm;
		expect(bubble.value(T)).toBe(P);
		expect(dew.value(T)).toBe(P);
		for (let t = 59.75; t < T - 0.01; t += 0.5)
			expect(bubble.value(t)).toBeGreaterThan(dew.value(t));
	});
});
