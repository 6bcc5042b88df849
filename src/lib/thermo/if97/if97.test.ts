/**
 * IAPWS-IF97 (IAPWS R7-97(2012)) against the release's printed computer-program verification values,
 * as transcribed in the docstrings of python3-iapws 1.5.2 (Debian, iapws/iapws97.py, which name the
 * release's equation); table numbers of the release are given from memory of its layout. Each value
 * is compared to within half a unit in its last printed digit. Then a grid over regions 1, 2, 3, 5 and
 * the saturation line against python3-iapws's own region functions (tests/reference/if97-water.json,
 * made by tests/reference/make-if97.py), and round trips through (P, h) and (P, s).
 */
import { describe, expect, it } from 'vitest';
import fixture from '../../../../tests/reference/if97-water.json';
import { t1ph, t1ps, t2ph, t2ps, pB23, tB23, pB2bc, hB2bc, psat, tsat } from './regions.ts';
import {
	if97Region,
	if97Region3State,
	if97State,
	if97StatePh,
	if97StatePs,
	if97SaturationPressure,
	if97SaturationTemperature
} from './state.ts';
import { ThermoError } from '../errors.ts';

function halfUnit(text: string): number {
	const [mant, exp] = text.toLowerCase().split('e');
	const decimals = mant.includes('.') ? mant.split('.')[1].length : 0;
	return 0.5 * 10 ** (-decimals + (exp ? Number(exp) : 0));
}

/** actual (in the printed value's units) equals the printed value to half a unit in its last digit */
function printed(actual: number, text: string, what: string): void {
	const tol = halfUnit(text) * (1 + 1e-9);
	expect(
		Math.abs(actual - Number(text)),
		`${what}: ${actual} vs printed ${text}`
	).toBeLessThanOrEqual(tol);
}

const MPa = 1e6;
const kJ = 1e3;

describe("IF97 basic equations: the release's verification values", () => {
	it('region 1, Eq. 7 (R7-97(2012), Table 5)', () => {
		// IAPWS R7-97(2012), Table 5, as transcribed in python3-iapws 1.5.2 (_Region1 docstring)
		printed(if97State(3 * MPa, 300).v, '0.00100215168', 'v(300 K, 3 MPa)');
		printed(if97State(3 * MPa, 300).h / kJ, '115.331273', 'h(300 K, 3 MPa)');
		printed(if97State(3 * MPa, 300).u / kJ, '112.324818', 'u(300 K, 3 MPa)');
		printed(if97State(80 * MPa, 300).s / kJ, '0.368563852', 's(300 K, 80 MPa)');
		printed(if97State(80 * MPa, 300).cp! / kJ, '4.01008987', 'cp(300 K, 80 MPa)');
		printed(if97State(80 * MPa, 300).cv! / kJ, '3.91736606', 'cv(300 K, 80 MPa)');
		printed(if97State(3 * MPa, 500).w!, '1240.71337', 'w(500 K, 3 MPa)');
		// from memory: the rest of R7-97(2012) Table 5
		printed(if97State(3 * MPa, 300).s / kJ, '0.392294792', 's(300 K, 3 MPa)');
		printed(if97State(3 * MPa, 300).w!, '1507.73921', 'w(300 K, 3 MPa)');
		printed(if97State(3 * MPa, 500).h / kJ, '975.542239', 'h(500 K, 3 MPa)');
		for (const [P, T] of [
			[3, 300],
			[80, 300],
			[3, 500]
		])
			expect(if97State(P * MPa, T).region).toBe(1);
	});
	it('region 2, Eqs. 15–17 (R7-97(2012), Table 15)', () => {
		// IAPWS R7-97(2012), Table 15, as transcribed in python3-iapws 1.5.2 (_Region2 docstring)
		printed(if97State(30 * MPa, 700).v, '0.00542946619', 'v(700 K, 30 MPa)');
		printed(if97State(30 * MPa, 700).h / kJ, '2631.49474', 'h(700 K, 30 MPa)');
		printed(if97State(30 * MPa, 700).u / kJ, '2468.61076', 'u(700 K, 30 MPa)');
		printed(if97State(0.0035 * MPa, 700).s / kJ, '10.1749996', 's(700 K, 3.5 kPa)');
		printed(if97State(0.0035 * MPa, 700).cp! / kJ, '2.08141274', 'cp(700 K, 3.5 kPa)');
		printed(if97State(0.0035 * MPa, 700).cv! / kJ, '1.61978333', 'cv(700 K, 3.5 kPa)');
		printed(if97State(0.0035 * MPa, 300).w!, '427.920172', 'w(300 K, 3.5 kPa)');
		expect(if97State(30 * MPa, 700).region).toBe(2);
		expect(if97State(0.0035 * MPa, 300).region).toBe(2);
	});
	it('region 3, Eq. 28, in (ρ, T) (R7-97(2012), Table 33)', () => {
		// IAPWS R7-97(2012), Table 33, as transcribed in python3-iapws 1.5.2 (_Region3 docstring)
		const a = if97Region3State(500, 650);
		printed(a.P / MPa, '25.5837018', 'p(500 kg/m³, 650 K)');
		printed(a.h / kJ, '1863.43019', 'h(500 kg/m³, 650 K)');
		printed(a.u / kJ, '1812.26279', 'u(500 kg/m³, 650 K)');
		const b = if97Region3State(200, 650);
		printed(b.s / kJ, '4.85438792', 's(200 kg/m³, 650 K)');
		printed(b.cp! / kJ, '44.6579342', 'cp(200 kg/m³, 650 K)');
		printed(b.cv! / kJ, '4.04118076', 'cv(200 kg/m³, 650 K)');
		printed(b.w!, '383.444594', 'w(200 kg/m³, 650 K)');
		// from memory: the rest of R7-97(2012) Table 33
		printed(b.P / MPa, '22.2930643', 'p(200 kg/m³, 650 K)');
		printed(if97Region3State(500, 750).P / MPa, '78.3095639', 'p(500 kg/m³, 750 K)');
	});
	it('region 3, Eq. 28, reached from (P, T) by the density iteration (R7-97(2012), Table 33)', () => {
		// IAPWS R7-97(2012), Table 33, as transcribed in python3-iapws 1.5.2 (_Region3 docstring):
		// at (ρ, T) = (500 kg/m³, 650 K) p = 25.5837018 MPa; at (200, 650) p = 22.2930643 MPa (from memory);
		// at (500, 750) p = 78.3095639 MPa (from memory)
		const a = if97State(25.5837018 * MPa, 650);
		expect(a.region).toBe(3);
		expect(Math.abs(a.rho - 500) / 500).toBeLessThan(1e-7); // p printed to 9 digits
		printed(a.h / kJ, '1863.43019', 'h(500 kg/m³, 650 K)');
		printed(a.u / kJ, '1812.26279', 'u(500 kg/m³, 650 K)');
		const b = if97State(22.2930643 * MPa, 650);
		expect(Math.abs(b.rho - 200) / 200).toBeLessThan(1e-6); // near the critical point: ∂ρ/∂p is large
		expect(Math.abs(b.s / kJ - 4.85438792)).toBeLessThan(2e-7);
		expect(Math.abs(b.cp! / kJ - 44.6579342) / 44.6579342).toBeLessThan(2e-6);
		expect(Math.abs(b.cv! / kJ - 4.04118076)).toBeLessThan(1e-6);
		expect(Math.abs(b.w! - 383.444594)).toBeLessThan(2e-5);
		const c = if97State(78.3095639 * MPa, 750);
		expect(Math.abs(c.rho - 500) / 500).toBeLessThan(1e-8);
	});
	it('region 5, Eqs. 32–34 (R7-97(2012), Table 42)', () => {
		// IAPWS R7-97(2012), Table 42, as transcribed in python3-iapws 1.5.2 (_Region5 docstring)
		printed(if97State(0.5 * MPa, 1500).v, '1.38455090', 'v(1500 K, 0.5 MPa)');
		printed(if97State(0.5 * MPa, 1500).h / kJ, '5219.76855', 'h(1500 K, 0.5 MPa)');
		printed(if97State(0.5 * MPa, 1500).u / kJ, '4527.49310', 'u(1500 K, 0.5 MPa)');
		printed(if97State(30 * MPa, 1500).s / kJ, '7.72970133', 's(1500 K, 30 MPa)');
		printed(if97State(30 * MPa, 1500).cp! / kJ, '2.72724317', 'cp(1500 K, 30 MPa)');
		printed(if97State(30 * MPa, 1500).cv! / kJ, '2.19274829', 'cv(1500 K, 30 MPa)');
		printed(if97State(30 * MPa, 2000).w!, '1067.36948', 'w(2000 K, 30 MPa)');
		expect(if97State(30 * MPa, 2000).region).toBe(5);
	});
});

describe("IF97 region 4 and boundaries: the release's verification values", () => {
	it('saturation pressure Eq. 30 and temperature Eq. 31 (R7-97(2012), Tables 35 and 36)', () => {
		// IAPWS R7-97(2012), Tables 35/36, as transcribed in python3-iapws 1.5.2 (_PSat_T, _TSat_P docstrings)
		printed(psat(500), '2.63889776', 'psat(500 K)');
		printed(tsat(10), '584.149488', 'Tsat(10 MPa)');
		// from memory: the other rows of R7-97(2012) Tables 35 and 36
		printed(psat(300), '0.353658941e-2', 'psat(300 K)');
		printed(psat(600), '0.123443146e2', 'psat(600 K)');
		printed(tsat(0.1), '0.372755919e3', 'Tsat(0.1 MPa)');
		printed(tsat(1), '0.453035632e3', 'Tsat(1 MPa)');
		expect(if97SaturationPressure(500)).toBeCloseTo(psat(500) * MPa, 6);
		expect(if97SaturationTemperature(10 * MPa)).toBe(tsat(10));
	});
	it('B23, Eqs. 5 and 6, and B2bc, Eqs. 20 and 21', () => {
		// IAPWS R7-97(2012), text after Eq. 6, as transcribed in python3-iapws 1.5.2 (_P23_T docstring)
		printed(pB23(623.15), '16.52916425', 'p_B23(623.15 K)');
		printed(tB23(16.52916425), '623.15', 'T_B23(16.529 MPa)');
		// IAPWS R7-97(2012), text after Eq. 21, as transcribed in python3-iapws 1.5.2 (_P_2bc, _hbc_P docstrings)
		printed(pB2bc(3516.004323), '100.0', 'p_B2bc(3516.004323 kJ/kg)');
		printed(hB2bc(100), '3516.004323', 'h_B2bc(100 MPa)');
	});
});

describe("IF97 backward equations: the release's verification values", () => {
	it('region 1 T(p, h) Eq. 11 and T(p, s) Eq. 13 (R7-97(2012), Tables 7 and 9)', () => {
		// IAPWS R7-97(2012), Tables 7 and 9, as transcribed in python3-iapws 1.5.2 (_Backward1_* docstrings)
		printed(t1ph(3, 500), '391.798509', 'T(3 MPa, 500 kJ/kg)');
		printed(t1ph(80, 1500), '611.041229', 'T(80 MPa, 1500 kJ/kg)');
		printed(t1ps(3, 0.5), '307.842258', 'T(3 MPa, 0.5 kJ/(kg·K))');
		printed(t1ps(80, 3), '565.899909', 'T(80 MPa, 3 kJ/(kg·K))');
	});
	it('region 2 T(p, h) Eqs. 22–24 (R7-97(2012), Table 24)', () => {
		// IAPWS R7-97(2012), Table 24, as transcribed in python3-iapws 1.5.2 (_Backward2*_T_Ph docstrings)
		printed(t2ph(0.001, 3000), '534.433241', '2a');
		printed(t2ph(3, 4000), '1010.77577', '2a');
		printed(t2ph(5, 4000), '1015.31583', '2b');
		printed(t2ph(25, 3500), '875.279054', '2b');
		printed(t2ph(40, 2700), '743.056411', '2c');
		printed(t2ph(60, 3200), '882.756860', '2c');
	});
	it('region 2 T(p, s) Eqs. 25–27 (R7-97(2012), Table 29)', () => {
		// IAPWS R7-97(2012), Table 29, as transcribed in python3-iapws 1.5.2 (_Backward2*_T_Ps docstrings)
		printed(t2ps(0.1, 7.5), '399.517097', '2a');
		printed(t2ps(2.5, 8), '1039.84917', '2a');
		printed(t2ps(8, 6), '600.484040', '2b');
		printed(t2ps(90, 6), '1038.01126', '2b');
		printed(t2ps(20, 5.75), '697.992849', '2c');
		printed(t2ps(80, 5.75), '949.017998', '2c');
	});
});

interface Point {
	region: 1 | 2 | 3 | 5;
	T: number;
	P: number;
	v: number;
	h: number;
	s: number;
	cp: number;
	cv: number;
	w: number;
}

describe('IF97 against python3-iapws 1.5.2 (Debian) on a grid', () => {
	const points = fixture.points as Point[];
	it('has points in every region', () => {
		for (const r of [1, 2, 3, 5])
			expect(points.filter((p) => p.region === r).length).toBeGreaterThan(20);
	});
	it("(P, T) gives python3-iapws's region and properties (regions 1, 2, 5 to 1e−9; region 3 to 1e−8)", () => {
		// python3-iapws 1.5.2 (Debian), iapws97._Region1/_Region2/_Region5 at (T, p), _Region3 at (ρ, T)
		for (const p of points) {
			const st = if97State(p.P, p.T);
			const tol = p.region === 3 ? 1e-8 : 1e-9;
			const where = `region ${p.region}, T = ${p.T} K, P = ${p.P} Pa`;
			expect(st.region, where).toBe(p.region);
			for (const key of ['v', 'h', 's', 'cp', 'cv', 'w'] as const) {
				const a = st[key] as number;
				const scale =
					key === 'h'
						? Math.max(Math.abs(p.h), 1e5)
						: key === 's'
							? Math.max(Math.abs(p.s), 1e3)
							: Math.abs(p[key]);
				expect(Math.abs(a - p[key]) / scale, `${key} at ${where}: ${a} vs ${p[key]}`).toBeLessThan(
					key === 'cp' && p.region === 3 ? 1e-6 : tol
				);
			}
		}
	});
	it('saturation pressure and temperature (Eqs. 30, 31)', () => {
		// python3-iapws 1.5.2 (Debian), iapws97._PSat_T and _TSat_P
		for (const s of fixture.saturation) {
			if (s.given === 'T')
				expect(Math.abs(if97SaturationPressure(s.T) - s.P) / s.P).toBeLessThan(1e-12);
			else expect(Math.abs(if97SaturationTemperature(s.P) - s.T) / s.T).toBeLessThan(1e-12);
		}
	});
	it('(P, h) and (P, s) of each grid state give its temperature back', () => {
		// python3-iapws 1.5.2 (Debian): h and s of each grid state; T is the grid's own
		for (const p of points) {
			const where = `region ${p.region}, T = ${p.T} K, P = ${p.P} Pa`;
			const a = if97StatePh(p.P, p.h);
			const b = if97StatePs(p.P, p.s);
			// on a region boundary (623.15 K, B23, 1073.15 K) IF97's equations differ slightly (the release's
			// consistency limits), so (P, h) may land up to a few tenths of a kelvin beyond the boundary in the neighbouring region
			const boundary =
				p.T === 623.15 ||
				p.T === 1073.15 ||
				(p.region === 2 && p.T > 623.15 && p.T <= 863.15 && Math.abs(p.P / 1e6 - pB23(p.T)) < 1);
			const tol = boundary ? 0.2 / p.T : p.region === 3 ? 1e-7 : 1e-9;
			expect(Math.abs(a.T - p.T) / p.T, `T(P, h) at ${where}: ${a.T}`).toBeLessThan(tol);
			expect(Math.abs(b.T - p.T) / p.T, `T(P, s) at ${where}: ${b.T}`).toBeLessThan(tol);
			// the state returned carries the h and s it was fixed from
			expect(Math.abs(a.h - p.h)).toBeLessThan(1e-9 * Math.max(Math.abs(p.h), 1e5));
			expect(Math.abs(b.s - p.s)).toBeLessThan(1e-9 * Math.max(Math.abs(p.s), 1e3));
		}
	});
});

describe('IF97 phases, the dome and refusals', () => {
	it('names phases and puts (P, h) inside the dome on the mixture between the saturated states', () => {
		expect(if97State(0.101325 * MPa, 300).phase).toBe('compressed-liquid');
		expect(if97State(0.101325 * MPa, 400).phase).toBe('superheated-vapor');
		expect(if97State(30 * MPa, 700).phase).toBe('supercritical-fluid');
		expect(if97State(30 * MPa, 600).phase).toBe('compressed-liquid');
		const P = 1 * MPa;
		const T = if97SaturationTemperature(P);
		const liq = if97StatePh(P, 500e3);
		expect(liq.phase).toBe('compressed-liquid');
		const hf = if97State(P, T).h;
		const hg = if97State(P, T, { side: 'vapor' }).h;
		expect(if97State(P, T).phase).toBe('saturated-liquid');
		expect(if97State(P, T, { side: 'vapor' }).phase).toBe('saturated-vapor');
		const mid = if97StatePh(P, 0.25 * hf + 0.75 * hg);
		expect(mid.phase).toBe('saturated-mixture');
		expect(mid.region).toBe(4);
		expect(mid.x).toBeCloseTo(0.75, 12);
		expect(mid.T).toBe(T);
		expect(mid.cp).toBeNull();
		const ms = if97StatePs(P, mid.s);
		expect(ms.x).toBeCloseTo(0.75, 12);
		// above 16.529 MPa the dome's states lie in region 3: saturated states by the density iteration
		const P3 = 20 * MPa;
		const T3 = if97SaturationTemperature(P3);
		const l3 = if97State(P3, T3);
		const v3 = if97State(P3, T3, { side: 'vapor' });
		expect(l3.region).toBe(3);
		expect(l3.rho).toBeGreaterThan(322);
		expect(v3.rho).toBeLessThan(322);
		const m3 = if97StatePh(P3, 0.5 * (l3.h + v3.h));
		expect(m3.x).toBeCloseTo(0.5, 10);
	});
	it("refuses states outside IF97's range with a typed error", () => {
		const code = (f: () => unknown) => {
			try {
				f();
			} catch (e) {
				return e instanceof ThermoError ? e.code : 'other';
			}
			return 'none';
		};
		expect(code(() => if97State(1e5, 270))).toBe('below-triple-point');
		expect(code(() => if97State(101e6, 500))).toBe('out-of-range');
		expect(code(() => if97State(60e6, 1500))).toBe('out-of-range');
		expect(code(() => if97State(1e5, 2300))).toBe('out-of-range');
		expect(code(() => if97State(0, 300))).toBe('non-positive-input');
		expect(code(() => if97State(Number.NaN, 300))).toBe('non-finite-input');
		expect(code(() => if97StatePh(1e5, -1e6))).toBe('out-of-range');
		expect(code(() => if97StatePh(1e5, 1e8))).toBe('out-of-range');
		expect(code(() => if97Region(1e5, 2400))).toBe('out-of-range');
	});
});
