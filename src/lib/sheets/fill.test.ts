import { describe, expect, it } from 'vitest';
import * as engine from '$lib/thermo';
import { fillStart, fillVolume } from './fill';

describe('start by fill level', () => {
	it('v = 1 / (φ ρ′ + (1 − φ) ρ″) with saturated densities of water at 450 K', () => {
		// IAPWS R6-95(2018), Table 8, T = 450 K: ρ′ = 890.341250, ρ″ = 4.81200360 kg/m³, p_s = 0.932203564 MPa
		const expected = 1 / (0.8 * 890.34125 + 0.2 * 4.8120036);
		const byT = fillStart(engine, 'water', { kind: 'fill', fraction: 0.8, T: 450 });
		expect(byT.T).toBe(450);
		expect(Math.abs(byT.v / expected - 1)).toBeLessThan(1e-8);
		// the same fill given at the saturation pressure of 450 K
		const byP = fillStart(engine, 'water', { kind: 'fill', fraction: 0.8, P: 0.932203564e6 });
		expect(Math.abs(byP.T - 450)).toBeLessThan(1e-5);
		expect(Math.abs(byP.v / expected - 1)).toBeLessThan(1e-6);
	});

	it('a sealed 50 L vessel 80 % full at 20 °C: mass and the level the engine reads back', () => {
		// python3-iapws 1.5.2 (Debian), IAPWS95(T=293.15, x=0).rho = 998.16180134, IAPWS95(T=293.15, x=1).rho = 0.017314008205
		const v = fillStart(engine, 'water', { kind: 'fill', fraction: 0.8, T: 293.15 }).v;
		expect(Math.abs(v / 0.0012522965492665402 - 1)).toBeLessThan(1e-7);
		expect(0.05 / v).toBeCloseTo(39.926, 2); // kg in 50 L
		const s = engine.fixState('water', { T: 293.15, v });
		expect(s.phase).toBe('saturated-mixture');
		expect(engine.stateExtras(s).liquidVolumeFraction!).toBeCloseTo(0.8, 9);
	});

	it('R-134a at 300 K against the equation’s own saturation table', () => {
		// Tillner-Roth & Baehr (1994), Table 8, T = 300 K: ρ′ = 1199.7, ρ″ = 34.193 kg/m³ (5 figures)
		const expected = fillVolume(0.6, 1199.7, 34.193);
		const v = fillStart(engine, 'r134a', { kind: 'fill', fraction: 0.6, T: 300 }).v;
		expect(Math.abs(v / expected - 1)).toBeLessThan(1e-4);
	});

	it('ends are saturated liquid and vapor; nonsense is refused with a reason', () => {
		// IAPWS R6-95(2018), Table 8, T = 450 K
		expect(
			fillStart(engine, 'water', { kind: 'fill', fraction: 1, T: 450 }).v * 890.34125
		).toBeCloseTo(1, 8);
		expect(
			fillStart(engine, 'water', { kind: 'fill', fraction: 0, T: 450 }).v * 4.8120036
		).toBeCloseTo(1, 8);
		expect(() => fillStart(engine, 'water', { kind: 'fill', fraction: 1.2, T: 450 })).toThrow(
			/0 to 100 %/
		);
		expect(() => fillStart(engine, 'water', { kind: 'fill', fraction: 0.5 })).toThrow(
			/temperature or at a pressure/
		);
		expect(() => fillStart(engine, 'water', { kind: 'fill', fraction: 0.5, T: 700 })).toThrow(
			engine.ThermoError
		);
	});
});
