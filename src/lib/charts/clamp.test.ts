import { describe, expect, it } from 'vitest';
import { unitPrefs } from '$lib/units';
import { clampCoords, type ClampBounds } from './clamp';
import { chartState } from './test-fixtures';

// Water's triple point, IAPWS R6-95(2018); vapor volume at the triple point ≈ 205.99 m³/kg (from memory: handbook steam table)
const bounds: ClampBounds = {
	triple: { T: 273.16, P: 611.654771 },
	range: { Tmin: 273.16, Tmax: 1273.15, Pmax: 1e9 },
	saturation: {
		liquid: [chartState(273.16, 611.654771, 0.0010002, 'saturated-liquid')],
		vapor: [chartState(273.16, 611.654771, 205.99, 'saturated-vapor')],
		critical: chartState(647.096, 22.064e6, 1 / 322, 'supercritical-fluid')
	}
};
const si = unitPrefs();

describe('clamping to the valid range', () => {
	it('leaves a valid position alone', () => {
		const r = clampCoords('T-v', { T: 400, v: 0.5 }, bounds, si);
		expect(r).toEqual({ coords: { T: 400, v: 0.5 }, reason: null });
		expect(clampCoords('P-v', { P: 1e5, v: 0.5 }, bounds, si).reason).toBeNull();
	});

	it('T–v: below the triple point is raised to it, with the reason in display units', () => {
		const r = clampCoords('T-v', { T: 250, v: 0.01 }, bounds, si);
		expect(r.coords).toEqual({ T: 273.16, v: 0.01 });
		expect(r.reason).toMatch(/triple point \(0\.01\u00a0°C\)/);
		const us = clampCoords('T-v', { T: 250, v: 0.01 }, bounds, unitPrefs({ system: 'us' }));
		expect(us.reason).toMatch(/32\.02\u00a0°F/);
	});

	it('T–v: above the formulation limit is lowered to it', () => {
		const r = clampCoords('T-v', { T: 2000, v: 1 }, bounds, si);
		expect(r.coords.T).toBe(1273.15);
		expect(r.reason).toMatch(/highest temperature \(1000\.00\u00a0°C\)/);
	});

	it('P–v: above Pmax is lowered to it', () => {
		const r = clampCoords('P-v', { P: 2e9, v: 0.001 }, bounds, si);
		expect(r.coords.P).toBe(1e9);
		expect(r.reason).toMatch(/highest pressure/);
	});

	it('P–v: below the triple-point pressure, the liquid side is moved out to the vapor', () => {
		const r = clampCoords('P-v', { P: 100, v: 0.01 }, bounds, si);
		expect(r.coords.P).toBe(100);
		expect(r.coords.v).toBeCloseTo((205.99 * 611.654771) / 100, 9);
		expect(r.reason).toMatch(/only vapor exists/);
		expect(clampCoords('P-v', { P: 100, v: 5000 }, bounds, si).reason).toBeNull();
	});

	it('P–v on a linear axis: at or below vacuum is held above it', () => {
		const r = clampCoords('P-v', { P: -5000, v: 1e4 }, bounds, si);
		expect(r.coords.P).toBeGreaterThan(0);
		expect(r.reason).toMatch(/vacuum/);
	});

	it('without bounds nothing is clamped', () => {
		expect(clampCoords('T-v', { T: 10, v: 1 }, {}, si).reason).toBeNull();
	});
});
