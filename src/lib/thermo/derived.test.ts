/**
 * Derived properties — compressibility factor, isothermal compressibility, volume expansivity,
 * Joule–Thomson coefficient, isentropic exponent, (∂P/∂T)_v and the latent heat — against
 * python3-iapws 1.5.2 (Debian): classes IAPWS95 (water) and iapws.ammonia.NH3 (ammonia), direct
 * (T, rho) and (T, x) calls only. Fixture made by tests/reference/make-iapws-derived.py.
 */
import { describe, expect, it } from 'vitest';
import { fixState, saturationAtT } from './index.ts';
import fixture from '../../../tests/reference/iapws-derived.json';

interface Row {
	fluid: string;
	region: string;
	T: number;
	rho?: number;
	P: number;
	Z?: number;
	kappaT?: number;
	alphaV?: number;
	muJT?: number;
	gammaS?: number;
	dPdT?: number;
	hfg?: number;
	Hvap?: number;
}

const rows = fixture.points as Row[];
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('derived properties against python3-iapws 1.5.2 (Debian)', () => {
	const single = rows.filter((r) => r.region !== 'saturation');
	it.each(single.map((r) => [`${r.fluid} ${r.region} T=${r.T} K rho=${r.rho}`, r] as const))(
		'%s',
		(_, r) => {
			const st = fixState(r.fluid, { T: r.T, rho: r.rho as number });
			expect(st.phase).toBe(r.region);
			// python3-iapws 1.5.2 (Debian), IAPWS95 / NH3 (T, rho): Z, kappa, alfav, joule, gamma, dpdT_rho
			expect(rel(st.Z as number, r.Z as number)).toBeLessThan(1e-9);
			expect(rel(st.kappaT as number, r.kappaT as number)).toBeLessThan(1e-8);
			expect(rel(st.alphaV as number, r.alphaV as number)).toBeLessThan(1e-8);
			expect(rel(st.muJT as number, r.muJT as number)).toBeLessThan(1e-7);
			expect(rel(st.gammaS as number, r.gammaS as number)).toBeLessThan(1e-8);
			expect(rel(st.dPdT as number, r.dPdT as number)).toBeLessThan(1e-9);
			expect(st.hfg).toBeNull();
		}
	);

	const sat = rows.filter((r) => r.region === 'saturation');
	it.each(sat.map((r) => [`${r.fluid} latent heat at T=${r.T} K`, r] as const))('%s', (_, r) => {
		// python3-iapws 1.5.2 (Debian), h(T, x=1) − h(T, x=0)
		const line = saturationAtT(r.fluid, r.T);
		for (const st of [line.liquid, line.vapor, fixState(r.fluid, { T: r.T, x: 0.3 })]) {
			expect(rel(st.hfg as number, r.hfg as number)).toBeLessThan(1e-7);
			if (r.Hvap !== undefined) expect(rel(st.hfg as number, r.Hvap)).toBeLessThan(1e-7);
		}
		const mix = fixState(r.fluid, { T: r.T, x: 0.3 });
		// inside the dome (∂P/∂T)_v is the saturation curve's slope, and the single-phase-only properties are null
		const dT = 1e-4;
		const slope =
			(saturationAtT(r.fluid, r.T + dT).P - saturationAtT(r.fluid, r.T - dT).P) / (2 * dT);
		expect(rel(mix.dPdT as number, slope)).toBeLessThan(1e-5);
		expect([mix.kappaT, mix.alphaV, mix.muJT, mix.gammaS]).toEqual([null, null, null, null]);
		expect(
			rel(
				mix.Z as number,
				(mix.P * mix.v) / (r.fluid === 'water' ? 461.51805 * r.T : (8.314471 / 0.01703026) * r.T)
			)
		).toBeLessThan(1e-6);
		// water R: IAPWS R6-95(2018); ammonia R and M: Tillner-Roth, Harms-Watzenberg & Baehr (1993)
	});

	it('an ideal gas limit: Z → 1, γ_s → cp/cv, μ_JT small, for dilute water vapor', () => {
		const st = fixState('water', { T: 600, P: 10 });
		expect(Math.abs((st.Z as number) - 1)).toBeLessThan(1e-4);
		expect(rel(st.gammaS as number, (st.cp as number) / (st.cv as number))).toBeLessThan(1e-4);
		// κ_T = 1/P and α_V = 1/T for an ideal gas (common practice)
		expect(rel(st.kappaT as number, 1 / st.P)).toBeLessThan(1e-4);
		expect(rel(st.alphaV as number, 1 / st.T)).toBeLessThan(1e-4);
	});
});
