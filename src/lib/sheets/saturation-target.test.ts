import { describe, expect, it } from 'vitest';
import * as engine from '$lib/thermo';
import { fillStart } from './fill';
import { saturationTarget } from './saturation-target';

describe('a leg to saturation', () => {
	it('a sealed vessel 80 % full at 20 °C, heated shut in, reaches the liquid line (liquid-full) at 250 °C', () => {
		const v = fillStart(engine, 'water', { kind: 'fill', fraction: 0.8, T: 293.15 }).v;
		const start = engine.fixState('water', { T: 293.15, v });
		const r = saturationTarget(engine, 'water', start, 'isochoric');
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.x).toBe(0);
		// python3-iapws 1.5.2 (Debian): bisection on IAPWS95(T, x=0).rho = 1/v → T = 523.39307 K, P = 3.99252 MPa
		expect(Math.abs(r.leg.end.T - 523.39307)).toBeLessThan(2e-3);
		expect(Math.abs(r.leg.end.P / 3.99252e6 - 1)).toBeLessThan(1e-4);
	});

	it('a vessel mostly vapor (v above the critical volume) dries out instead: the vapor line', () => {
		const v = fillStart(engine, 'water', { kind: 'fill', fraction: 0.05, T: 373.15 }).v;
		const r = saturationTarget(
			engine,
			'water',
			engine.fixState('water', { T: 373.15, v }),
			'isochoric'
		);
		expect(r.ok && r.x).toBe(1);
	});

	it('compressed liquid heated at 1 MPa stops at the bubble point, superheated vapor cooled at 1 MPa at the dew point', () => {
		// python3-iapws 1.5.2 (Debian): bisection on IAPWS95(T, x=0).P = 1 MPa → T = 453.02801 K
		const liquid = saturationTarget(
			engine,
			'water',
			engine.fixState('water', { T: 293.15, P: 1e6 }),
			'isobaric'
		);
		expect(liquid.ok && liquid.x).toBe(0);
		expect(liquid.ok && Math.abs(liquid.leg.end.T - 453.02801)).toBeLessThan(2e-3);
		const vapor = saturationTarget(
			engine,
			'water',
			engine.fixState('water', { T: 573.15, P: 1e6 }),
			'isobaric'
		);
		expect(vapor.ok && vapor.x).toBe(1);
		expect(vapor.ok && Math.abs(vapor.leg.end.T - 453.02801)).toBeLessThan(2e-3);
	});

	it('from inside the dome both lines are reachable: the heating one is taken', () => {
		const r = saturationTarget(
			engine,
			'water',
			engine.fixState('water', { T: 400, x: 0.3 }),
			'isobaric'
		);
		expect(r.ok && r.x).toBe(1);
		expect(r.ok && r.leg.q).toBeGreaterThan(0);
	});
});
