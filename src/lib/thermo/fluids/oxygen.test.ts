/**
 * Oxygen's ideal-gas part (Schmidt & Wagner 1985, with the ln(c + exp(γτ)) term kind): its cp⁰
 * against the ideal-gas heat capacities printed by Stewart, Jacobsen & Wagner (1991), J. Phys. Chem.
 * Ref. Data 20, 917, Table 9 (p. 948), as quoted by pychemqt (jjgomera/pychemqt, lib/mEoS/O2.py,
 * Test.test_schmidt, commented-out values), to their printed digits.
 */
import { describe, expect, it } from 'vitest';
import { getCompiledFluid } from '../registry.ts';

describe('oxygen: ideal-gas heat capacity', () => {
	it('cp⁰ at 60, 200, 500, 1000 and 2000 K within half a unit of the printed 0.001 J/(mol·K)', () => {
		const fl = getCompiledFluid('oxygen');
		const M = fl.data.molarMass;
		const rows: [number, number, number][] = [
			// T [K], cv⁰, cp⁰ [J/(mol·K)]. Only cp⁰ is compared: the printed cv⁰ = cp⁰ − R is rounded from the
			// 1991 paper's own R, and at 500 K ours (R = 8.31434 J/(mol·K), the 1985 paper's) lands 5.03e−4 from it
			[60, 20.809, 29.123],
			[200, 20.812, 29.127],
			[500, 22.778, 31.093],
			[1000, 26.563, 34.877],
			[2000, 29.469, 37.783]
		];
		for (const [T, cv0, cp0] of rows) {
			const r = fl.idealAt(1, fl.Tr / T, 2);
			const cv = -fl.R * r.t2 * M;
			expect(Math.abs(cv - cv0), `cv0 at ${T} K: ${cv}`).toBeLessThanOrEqual(0.001);
			expect(Math.abs(cv + fl.R * M - cp0), `cp0 at ${T} K: ${cv + fl.R * M}`).toBeLessThanOrEqual(
				0.0005
			);
		}
	});
});
