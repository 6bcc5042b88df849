/**
 * Melting and sublimation curves and the refusal of solid states. Each check names its source.
 */
import { describe, expect, it } from 'vitest';
import { ThermoError } from '../errors.ts';
import {
	fixState,
	isSolidAt,
	meltingCurve,
	meltingPressure,
	saturationCurve,
	sublimationPressure
} from '../index.ts';
import { getCompiledFluid } from '../registry.ts';
import { choose } from './choose.ts';
import { piecePressure, solidLines } from './solid.ts';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** the piece of a fluid's melting curve for a named solid */
function piece(fluid: string, solid: string) {
	const p = solidLines(getCompiledFluid(fluid))?.melting.pieces.find((q) => q.solid === solid);
	if (!p) throw new Error(`no ${solid} piece`);
	return p;
}

describe('water: IAPWS R14-08(2011)', () => {
	// IAPWS R14-08(2011), Table 3 (check values) — from memory; the same values (more digits) are
	// what python3-iapws 1.5.2 (Debian) iapws._iapws._Melting_Pressure / _Sublimation_Pressure print
	it.each([
		['ice Ih', 260, 138.268e6, 138.2681130022179e6],
		['ice III', 254, 268.685e6, 268.6846466336108e6],
		['ice V', 265, 479.64e6, 479.6402443787991e6],
		['ice VI', 320, 1356.76e6, 1356.7565178693883e6],
		['ice VII', 550, 6308.71e6, 6308.714243543019e6]
	] as const)('%s melting pressure at %d K', (solid, T, release, python) => {
		const P = piecePressure(piece('water', solid), T);
		expect(rel(P, release)).toBeLessThan(5e-6);
		expect(rel(P, python)).toBeLessThan(1e-12);
	});

	it('sublimation pressure at 230 K', () => {
		// IAPWS R14-08(2011), Table 3: 8.94735 Pa (from memory); python3-iapws 1.5.2 _Sublimation_Pressure(230) = 8.947352740189152e-06 MPa
		expect(rel(sublimationPressure('water', 230) as number, 8.94735)).toBeLessThan(5e-6);
		expect(rel(sublimationPressure('water', 230) as number, 8.94735274018915)).toBeLessThan(1e-12);
	});

	it('above the triple point the bounding curve is ice V to 273.31 K, then VI, then VII', () => {
		// python3-iapws 1.5.2 (Debian), _Melting_Pressure(273.2) = 630.155287177161 MPa (ice V)
		expect(rel(meltingPressure('water', 273.2)?.P as number, 630.155287177161e6)).toBeLessThan(
			1e-12
		);
		expect(meltingPressure('water', 273.2)?.solid).toBe('ice V');
		expect(meltingPressure('water', 300)?.solid).toBe('ice VI');
		expect(meltingPressure('water', 400)?.solid).toBe('ice VII');
		expect(meltingPressure('water', 800)).toBeNull();
	});

	it('refuses 273.16 K at 1 GPa (ice) with solid-region, answers 273.16 K at 600 MPa as a liquid', () => {
		let err: unknown;
		try {
			fixState('water', { T: 273.16, P: 1e9 });
		} catch (e) {
			err = e;
		}
		expect(err).toBeInstanceOf(ThermoError);
		expect((err as ThermoError).code).toBe('solid-region');
		expect((err as ThermoError).message).toMatch(/freezes/);
		expect(fixState('water', { T: 273.16, P: 6e8 }).phase).toBe('compressed-liquid');
		expect(fixState('water', { T: 273.16, x: 0 }).phase).toBe('saturated-liquid');
	});
});

describe('other fluids', () => {
	it('nitrogen at 63.151 K and 2.2 GPa is solid, not a liquid with negative cv', () => {
		expect(() => fixState('nitrogen', { T: 63.151, P: 2.2e9 })).toThrow(/solid, not a fluid/);
		// Span et al. (2000) eq. (5), from memory: at 300 K about 2.45 GPa (nitrogen melts near
		// 2.4 GPa at room temperature — common practice)
		const P300 = meltingPressure('nitrogen', 300)?.P as number;
		expect(P300).toBeGreaterThan(2.2e9);
		expect(P300).toBeLessThan(2.6e9);
		expect(fixState('nitrogen', { T: 300, P: 2e9 }).phase).toBe('supercritical-fluid');
	});

	it('carbon dioxide: Span & Wagner (1996) melting curve', () => {
		// eq. (3.10), from memory: p/pt = 1 + 1955.5390(T/Tt − 1) + 2055.4593(T/Tt − 1)², Tt = 216.592 K, pt = 0.51795 MPa
		const th = 250 / 216.592 - 1;
		expect(
			rel(
				meltingPressure('carbon-dioxide', 250)?.P as number,
				0.51795e6 * (1 + 1955.539 * th + 2055.4593 * th * th)
			)
		).toBeLessThan(1e-12);
		expect(isSolidAt('carbon-dioxide', 250, 2e8)).toBe(true);
		expect(isSolidAt('carbon-dioxide', 250, 1e8)).toBe(false);
		// at the triple point the melting pressure is the triple-point pressure
		expect(rel(meltingPressure('carbon-dioxide', 216.592)?.P as number, 0.51795e6)).toBeLessThan(
			1e-12
		);
	});

	it('ammonia: the melting curve python3-iapws 1.5.2 carries (Haar & Gallagher 1978)', () => {
		// python3-iapws 1.5.2 (Debian), iapws.ammonia.NH3._melting: 1000 kPa · 2533.125 · ln(T/Tt) at 250 K
		expect(rel(meltingPressure('ammonia', 250)?.P as number, 622961588.0618882)).toBeLessThan(
			1e-12
		);
		expect(() => fixState('ammonia', { T: 250, P: 7e8 })).toThrow(/solid, not a fluid/);
	});

	it('R-134a has no melting curve: states up to its 70 MPa limit are fluid', () => {
		expect(meltingPressure('r134a', 200)).toBeNull();
		expect(fixState('r134a', { T: 200, P: 7e7 }).phase).toBe('compressed-liquid');
	});

	it('drops solid candidates from an ambiguous list, and refuses when only solid ones remain', () => {
		const fl = getCompiledFluid('water');
		const liquid = fixState('water', { T: 300, P: 1e8 });
		// a state beyond the ice VI melting curve (IAPWS R14-08(2011) eq. (4): about 1.0 GPa at 300 K)
		const ice = { ...liquid, P: 1.2e9 };
		const none = () => new ThermoError('inconsistent-inputs', 'none', 'none');
		expect(choose(fl, [liquid, ice], undefined, 'test inputs', none)).toBe(liquid);
		expect(() => choose(fl, [ice], undefined, 'test inputs', none)).toThrow(/solid, not a fluid/);
	});
});

describe('meltingCurve (for drawing)', () => {
	it('water: compressed liquid just below the ice V/VI melting pressure up to the 1 GPa limit', () => {
		const line = meltingCurve('water', 20);
		expect(line.length).toBeGreaterThan(15);
		for (const s of line) {
			expect(s.phase).toBe('compressed-liquid');
			expect(s.P).toBeLessThanOrEqual(1e9);
			expect(isSolidAt('water', s.T, s.P * 1.001)).toBe(true);
		}
		// IAPWS R14-08(2011) eq. (4): ice VI melts at 1 GPa near 300 K (python3-iapws 1.5.2 (Debian): _Melting_Pressure(300) = 996.1095 MPa)
		expect(line[line.length - 1].T).toBeGreaterThan(295);
		expect(line[line.length - 1].T).toBeLessThan(305);
	});

	it('is empty for R-134a, which has no melting curve', () => {
		expect(meltingCurve('r134a', 10)).toEqual([]);
	});
});

describe('saturationCurve carries the melting curve for the charts', () => {
	it('water: liquid states along ice V/VI up to 1 GPa; R-134a: none', () => {
		const w = saturationCurve('water', 10).melting ?? [];
		expect(w.length).toBeGreaterThan(20);
		expect(w.every((s) => s.phase === 'compressed-liquid' && s.P > 6e8)).toBe(true);
		expect(saturationCurve('r134a', 10).melting).toEqual([]);
	});
});

describe('the nine newer fluids: melting lines from their papers or a named publication', () => {
	// Each expected value is the equation evaluated from a second public copy of its coefficients
	// (CoolProp dev/fluids/*.json ANCILLARIES.melting_line, CoolProp's Simon or polynomial_in_Tr
	// form), not from this engine.
	const coolprop: [string, number, (T: number) => number][] = [
		// CoolProp Argon.json (Tegeler-JPCRD-1999): p0·(1 + Σ a(T/T0)^t − 1)
		[
			'argon',
			150,
			(T) =>
				68891 *
				(1 +
					-7476.2665 * (Math.pow(T / 83.8058, 1.05) - 1) +
					9959.0613 * (Math.pow(T / 83.8058, 1.275) - 1))
		],
		// CoolProp IsoButane.json (Buecker-JPCRD-2006B), with this file's p_t
		['isobutane', 120, (T) => 0.0229 * (1 + 1953637130.9 * (Math.pow(T / 113.73, 6.12) - 1))],
		// CoolProp n-Propane.json (Reeves-JCP-1964): p0 + a((T/T0)^c − 1)
		['propane', 120, (T) => 0.000172 + 7.18e8 * (Math.pow(T / 85.525, 1.283) - 1)],
		// CoolProp Oxygen.json (Younglove-NIST-1982), T0 = 1 K
		['oxygen', 60, (T) => -266999247.652 + 227606.348 * (Math.pow(T, 1.769) - 1)]
	];
	it.each(coolprop)('%s at %d K agrees with CoolProp’s copy', (fluid, T, P) => {
		expect(rel(meltingPressure(fluid, T)?.P as number, P(T))).toBeLessThan(1e-9);
	});

	it('argon sublimation: Tegeler et al. (1999) equation at 80 K as written out in the paper’s form', () => {
		// ln(p/pt) = (Tt/T)(a1·(1 − T/Tt) + a2·(1 − T/Tt)^2.7), public copies of the paper's equation
		const q = 1 - 80 / 83.8058;
		const P = 68891 * Math.exp((83.8058 / 80) * (-11.391604 * q - 0.39513431 * Math.pow(q, 2.7)));
		expect(rel(sublimationPressure('argon', 80) as number, P)).toBeLessThan(1e-12);
		// below the triple-point pressure, as sublimation must be
		expect(P).toBeLessThan(68891);
	});

	it('methane: Setzmann & Wagner (1991) within 1 % of the Abramson (2011) Simon curve CoolProp carries', () => {
		// CoolProp Methane.json (Abramson-HPR-2011): p = 11700 Pa + 2.08e8 Pa·((T/90.6941)^1.698 − 1)
		for (const T of [95, 100, 120, 150, 190]) {
			const abramson = 11700 + 2.08e8 * (Math.pow(T / 90.6941, 1.698) - 1);
			expect(rel(meltingPressure('methane', T)?.P as number, abramson)).toBeLessThan(0.01);
		}
		expect(() => fixState('methane', { T: 120, P: 2e8 })).toThrow(/solid, not a fluid/);
		expect(fixState('methane', { T: 120, P: 1e8 }).phase).toBe('compressed-liquid');
	});

	it('hydrogen: Datchi et al. (2000) curve; no state served with cv ≤ 0 at 14–90 K up to 2 GPa', () => {
		// pychemqt lib/mEoS/H2.py: P = 1e9 Pa · 1.63e-4 · T^1.824
		expect(
			rel(meltingPressure('hydrogen', 50)?.P as number, 1e9 * 1.63e-4 * Math.pow(50, 1.824))
		).toBeLessThan(1e-12);
		let served = 0;
		for (const T of [14, 20, 30, 40, 50, 60, 70, 80, 90]) {
			for (const P of [0.05e9, 0.1e9, 0.2e9, 0.3e9, 0.5e9, 0.8e9, 1.2e9, 2e9]) {
				let s;
				try {
					s = fixState('hydrogen', { T, P });
				} catch (e) {
					expect((e as ThermoError).code).toBe('solid-region');
					continue;
				}
				served++;
				// a stable fluid has cv > 0 (thermodynamic stability — common practice)
				expect(s.cv).toBeGreaterThan(0);
			}
		}
		expect(served).toBeGreaterThan(10);
		expect(() => fixState('hydrogen', { T: 14, P: 3e8 })).toThrow(/solid, not a fluid/);
	});

	it('R-32, R-1234yf, R-1234ze(E): no published melting equation, said so in the data', () => {
		for (const f of ['r32', 'r1234yf', 'r1234ze-e']) {
			const lines = solidLines(getCompiledFluid(f));
			expect(lines?.melting.pieces).toEqual([]);
			expect(lines?.melting.source).toMatch(/no melting equation/);
			expect(meltingCurve(f, 10)).toEqual([]);
		}
		expect(fixState('r32', { T: 140, P: 6e7 }).phase).toBe('compressed-liquid');
	});

	it('every melting-line fluid draws its line as liquid just below the melting pressure', () => {
		for (const f of ['argon', 'methane', 'hydrogen', 'isobutane', 'propane', 'oxygen']) {
			const line = meltingCurve(f, 12);
			expect(line.length).toBeGreaterThan(8);
			for (const s of line) expect(isSolidAt(f, s.T, s.P * 1.001)).toBe(true);
		}
	});
});
