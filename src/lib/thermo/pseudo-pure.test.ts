/**
 * The two-phase band of air as a pseudo-pure fluid (pseudo-pure.ts), on the equation of Lemmon et
 * al. (2000) compiled directly (air is not registered yet: see fluids/air.ts).
 */
import { describe, expect, it } from 'vitest';
import { Fluid } from './fluid.ts';
import { airBoundaries, airEquation } from './fluids/air.ts';
import type { FluidData } from './fluids/schema.ts';
import { MixtureBand } from './pseudo-pure.ts';
import { evalPoint, Point } from './properties.ts';
import { densityAtTP } from './solvers/density.ts';
import { ThermoError } from './errors.ts';

// the constructor compiles the saturation ancillaries of a pure fluid; no saturation solver is called here
const data: FluidData = {
	...airEquation,
	ancillaries: {
		pSat: airBoundaries.bubblePressure,
		rhoLiquid: airBoundaries.dewDensity,
		rhoVapor: airBoundaries.dewDensity
	}
};
const fl = new Fluid(data);
const band = new MixtureBand(fl, airBoundaries);
const molPerDm3 = (rho: number) => rho / (airEquation.molarMass * 1e3);

describe('air: the band between the bubble and dew lines', () => {
	it('at 100 K the band runs from the dew pressure 0.56742 MPa to the bubble pressure 0.66313 MPa (Table A1 of Lemmon et al. 2000, via pychemqt)', () => {
		expect(band.insideTP(100, 0.6e6)).toBe(true);
		expect(band.insideTP(100, 0.5675e6)).toBe(true);
		expect(band.insideTP(100, 0.6631e6)).toBe(true);
		expect(band.insideTP(100, 0.567e6)).toBe(false);
		expect(band.insideTP(100, 0.6632e6)).toBe(false);
		// at and above the maxcondentherm (132.6312 K, the paper's reducing point) there is no band
		expect(band.insideTP(132.6312, 3.78502e6)).toBe(false);
		expect(band.insideTP(140, 3.8e6)).toBe(false);
	});

	it('the bubble line passes 101.325 kPa at the normal bubble point 78.903 K (pychemqt lib/mEoS/Air.py, Tb)', () => {
		expect(band.bubbleP(78.9025)).toBeLessThan(101325);
		expect(band.bubbleP(78.9035)).toBeGreaterThan(101325);
	});

	it('refuses with mixture-two-phase, saying why and what to give instead', () => {
		const e = band.refusal(100);
		expect(e).toBeInstanceOf(ThermoError);
		expect(e.code).toBe('mixture-two-phase');
		expect(e.message).toContain('Air is a mixture');
		expect(Number(e.message.match(/bubble P = (\d+) Pa/)?.[1])).toBeCloseTo(663130, -1);
		expect(Number(e.message.match(/dew P = (\d+) Pa/)?.[1])).toBeCloseTo(567420, -1);
		expect(e.message).toContain('different compositions');
		// the same pressures in the hint (the message prints as many digits as it needs)
		expect(Number(e.hint!.match(/above (\d+) Pa \(liquid\)/)?.[1])).toBeCloseTo(663130, -1);
		expect(Number(e.hint!.match(/below (\d+) Pa \(gas\)/)?.[1])).toBeCloseTo(567420, -1);
		expect(e.hint).toMatch(/132\.63\d* K/);
	});

	it('labels states outside the band: liquid above the bubble line, vapor below the dew line, supercritical above the maxcondentherm', () => {
		expect(band.phase(100, 0.7e6)).toBe('compressed-liquid');
		expect(band.phase(100, 0.5e6)).toBe('superheated-vapor');
		expect(band.phase(80, 0.101325e6)).toBe('superheated-vapor'); // 80 K at 1 atm: dew P 0.08232 MPa (Table A1)
		expect(band.phase(78, 0.101325e6)).toBe('compressed-liquid'); // the normal bubble point is 78.903 K (pychemqt Air.Tb)
		expect(band.phase(140, 5e6)).toBe('supercritical-fluid');
		expect(band.phase(140, 1e6)).toBe('superheated-vapor');
	});

	it('the equation’s densities on the lines: CoolProp’s states at 59.75 K (dev/fluids/Air.json, sat_min_liquid / sat_min_vapor, molar)', () => {
		// CoolProp: bubble point 5264.1810687705665 Pa, 33066.64172799635 mol/m³; dew point 2428.869447772259 Pa, 4.901258804044648 mol/m³
		const rhoL = densityAtTP(fl, 59.75, 5264.1810687705665, band.bubbleDensityGuess(59.75));
		expect(Math.abs(molPerDm3(rhoL) / 33.06664172799635 - 1)).toBeLessThan(1e-8);
		const rhoV = densityAtTP(fl, 59.75, 2428.869447772259, 1e-3);
		expect(Math.abs(molPerDm3(rhoV) / 0.004901258804044648 - 1)).toBeLessThan(1e-8);
	});

	it('bubble- and dew-point densities: on the liquid and vapor branches, within 1 % of the paper’s Eqs. (2) and (3)', () => {
		for (const T of [60, 70, 80, 90, 100, 110, 120, 125, 130, 132, 132.5, 132.6]) {
			const rL = band.bubbleRho(T),
				rV = band.dewRho(T);
			// the ancillaries represent the mixture model to a fraction of a percent (1 %: common practice)
			expect(Math.abs(rL / band.bubbleDensityGuess(T) - 1), `bubble ρ at ${T} K`).toBeLessThan(
				0.01
			);
			expect(rV).toBeLessThan(rL);
			const pL = evalPoint(fl, T, rL, new Point()),
				pV = evalPoint(fl, T, rV, new Point());
			expect(pL.dPdrho).toBeGreaterThan(0);
			expect(pV.dPdrho).toBeGreaterThan(0);
			expect(band.insideTRho(T, 0.5 * (rL + rV))).toBe(true);
			expect(band.insideTRho(T, rL * 1.001)).toBe(false);
			expect(band.insideTRho(T, rV * 0.999)).toBe(false);
		}
	});
});
