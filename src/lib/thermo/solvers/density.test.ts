import { describe, expect, it } from 'vitest';
import { fixState, saturationAtT } from '../index.ts';
import { getCompiledFluid } from '../registry.ts';
import { densityAtTP } from './density.ts';

/*
 * The liquid root of P(T, ρ) = P from the saturated liquid upward, when the isotherm is flat near Tc
 * and Newton's first steps overshoot far into densities where an equation of state need not behave.
 * A solver property (a root of the equation's own P), so the check is the equation itself: P at the
 * returned ρ equals the asked P, on the liquid branch.
 */
describe('densityAtTP on a near-critical liquid isotherm', () => {
	const T = 150.1466340702176; // oxygen, 0.97 Tc
	const fl = getCompiledFluid('oxygen');
	const rhoL = saturationAtT('oxygen', T).liquid.rho;

	for (const P of [1e7, 3e7, 6e7, 8e7])
		it(`finds the liquid at ${P / 1e6} MPa from just above ρ′`, () => {
			const rho = densityAtTP(fl, T, P, rhoL * 1.01, rhoL);
			expect(rho).toBeGreaterThan(rhoL);
			const s = fixState('oxygen', { T, rho });
			expect(s.phase).toBe('compressed-liquid');
			expect(Math.abs(s.P / P - 1)).toBeLessThan(1e-9);
		});

	it('so (T, u) of that liquid is found again (it was refused as out of range)', () => {
		const ref = fixState('oxygen', { T, P: 5856181.005188041 });
		const back = fixState('oxygen', { T, u: ref.u });
		expect(Math.abs(back.rho / ref.rho - 1)).toBeLessThan(1e-9);
		expect(back.phase).toBe('compressed-liquid');
	});
});
