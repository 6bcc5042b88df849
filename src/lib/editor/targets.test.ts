import { describe, expect, it } from 'vitest';
import { fixState } from '$lib/thermo';
import type { Inputs, State } from '$lib/thermo/types';
import {
	defaultTargetKind,
	projectOntoLeg,
	stateAtV,
	targetFor,
	type ScreenMetric
} from './targets';
import reference from '../../../tests/reference/iapws-sketcher.json';

const fix = (inputs: Inputs) => fixState('water', inputs);
const TV: ScreenMetric = {
	kind: 'T-v',
	pressureScale: 'log',
	ySpan: [263, 673],
	vSpan: [5e-4, 200],
	aspect: 1.8
};
const PV: ScreenMetric = {
	kind: 'P-v',
	pressureScale: 'log',
	ySpan: [500, 3e7],
	vSpan: [5e-4, 200],
	aspect: 1.8
};

/** Distance on screen (plot heights), as the projection measures it. */
function screenDist(m: ScreenMetric, a: { v: number; y: number }, b: { v: number; y: number }) {
	const lv = Math.log10(m.vSpan[1] / m.vSpan[0]);
	const dx = (Math.log10(a.v / b.v) / lv) * m.aspect;
	const dy =
		m.kind === 'T-v'
			? (a.y - b.y) / (m.ySpan[1] - m.ySpan[0])
			: Math.log10(a.y / b.y) / Math.log10(m.ySpan[1] / m.ySpan[0]);
	return Math.hypot(dx, dy);
}

describe('projecting the pointer onto a leg’s constraint line', () => {
	const wet = fix({ T: 373.15, v: reference.isochore.v });

	it('an isochoric leg takes the pointer’s T on T–v and its P on P–v, at the start’s v', () => {
		const onTv = projectOntoLeg('isochoric', wet, { T: 523.15, v: 3 }, TV, fix)!;
		expect(onTv.v).toBeCloseTo(0.5, 12);
		expect(onTv.T).toBeCloseTo(523.15, 9);
		// python3-iapws 1.5.2 (Debian), IAPWS95(T=523.15, rho=2): tests/reference/iapws-sketcher.json
		expect(onTv.P / reference.isochore.points[3].P - 1).toBeLessThan(2e-6);
		expect(onTv.phase).toBe('superheated-vapor');
		const onPv = projectOntoLeg(
			'isochoric',
			wet,
			{ P: reference.isochore.points[2].P, v: 0.01 },
			PV,
			fix
		)!;
		expect(onPv.T).toBeCloseTo(473.15, 3);
	});

	it('finds a pointer lying on the isobar exactly', () => {
		const start = fix({ P: 1e6, T: 393.15 });
		const [, , hot] = reference.isobar.points;
		// python3-iapws: v at 1 MPa and 250 °C is 0.232747 m³/kg; the pointer sits there on T–v
		const s = projectOntoLeg('isobaric', start, { T: hot.T, v: hot.v }, TV, fix)!;
		expect(s.P).toBeCloseTo(1e6, 3);
		expect(Math.abs(s.T - hot.T)).toBeLessThan(0.01);
		expect(Math.abs(s.v / hot.v - 1)).toBeLessThan(1e-4);
	});

	it('picks the nearest point on screen, also where the isobar is steep (liquid) on T–v', () => {
		const start = fix({ P: 1e6, T: 300 });
		const pointer = { T: 420, v: 0.0011 }; // beside the steep liquid part of the 1 MPa isobar
		const s = projectOntoLeg('isobaric', start, pointer, TV, fix)!;
		const d = screenDist(TV, { v: s.v, y: s.T }, { v: pointer.v, y: pointer.T });
		// brute force over the isobar
		let best = Infinity;
		for (let i = 0; i <= 4000; i++) {
			const v = 10 ** (Math.log10(0.001) + (i / 4000) * (Math.log10(0.3) - Math.log10(0.001)));
			let st: State;
			try {
				st = fix({ P: 1e6, v });
			} catch {
				continue;
			}
			best = Math.min(best, screenDist(TV, { v: st.v, y: st.T }, { v: pointer.v, y: pointer.T }));
		}
		expect(d).toBeLessThanOrEqual(best + 1e-6);
		expect(s.phase).toBe('compressed-liquid');
		expect(Math.abs(s.T - 420)).toBeLessThan(3);
	});

	it('follows isentropic, isenthalpic, isothermal and polytropic lines through the start', () => {
		const start = fix({ P: 1e6, T: 523.15 });
		for (const process of ['isentropic', 'isenthalpic', 'isothermal', 'polytropic'] as const) {
			const s = projectOntoLeg(process, start, { P: 2e5, v: 1.0 }, PV, fix, 1.3)!;
			if (process === 'isentropic') expect(s.s).toBeCloseTo(start.s, 4);
			if (process === 'isenthalpic') expect(s.h).toBeCloseTo(start.h, 3);
			if (process === 'isothermal') expect(s.T).toBeCloseTo(start.T, 6);
			if (process === 'polytropic')
				expect(s.P * s.v ** 1.3).toBeCloseTo(start.P * start.v ** 1.3, 0);
			expect(s.v).toBeGreaterThan(start.v);
		}
		expect(stateAtV('polytropic', start, start.v * 2, fix, 1).P).toBeCloseTo(start.P / 2, 2);
	});

	it('answers null where the line has no state near the pointer', () => {
		const failing = () => {
			throw new Error('no state');
		};
		expect(projectOntoLeg('isobaric', wet, { T: 400, v: 1 }, TV, failing)).toBeNull();
	});
});

describe('choosing the target of a leg', () => {
	const superheated = fix({ P: 1e6, T: 523.15 });
	const mixture = fix({ P: 1e6, x: 0.4 });
	const liquid = fix({ P: 1e6, T: 350 });

	it('a new leg ends on what an engineer would type', () => {
		expect(defaultTargetKind('isochoric', mixture, 'T-v')).toBe('T');
		expect(defaultTargetKind('isochoric', mixture, 'P-v')).toBe('P');
		expect(defaultTargetKind('isobaric', superheated, 'T-v')).toBe('T');
		expect(defaultTargetKind('isobaric', mixture, 'T-v')).toBe('x');
		expect(defaultTargetKind('isothermal', mixture, 'P-v')).toBe('x');
		expect(defaultTargetKind('isothermal', liquid, 'P-v')).toBe('P');
		expect(defaultTargetKind('isentropic', superheated, 'T-v')).toBe('P');
		expect(defaultTargetKind('isenthalpic', mixture, 'T-v')).toBe('P');
		expect(defaultTargetKind('polytropic', superheated, 'T-v', 0)).toBe('v');
	});

	it('keeps the wanted kind where it can hold the end', () => {
		expect(targetFor('isochoric', superheated, 'P', 'T-v')).toEqual({
			target: { P: superheated.P },
			note: null
		});
		expect(targetFor('isobaric', superheated, 'h', 'T-v').target).toEqual({ h: superheated.h });
		expect(targetFor('isobaric', mixture, 'x', 'T-v').target).toEqual({ x: mixture.x });
	});

	it('falls back with a note where it cannot', () => {
		const outOfDome = targetFor('isochoric', superheated, 'x', 'T-v');
		expect(outOfDome.target).toEqual({ T: superheated.T });
		expect(outOfDome.note).toMatch(/outside the vapor dome/);
		const flat = targetFor('isobaric', mixture, 'T', 'T-v');
		expect(flat.target).toEqual({ x: mixture.x });
		expect(flat.note).toMatch(/does not change across the dome/);
		const invariant = targetFor('isobaric', superheated, 'P', 'P-v');
		expect(Object.keys(invariant.target)).toEqual(['T']);
		expect(invariant.note).toMatch(/keeps P constant/);
		const xOutside = targetFor('isobaric', superheated, 'x', 'T-v');
		expect(xOutside.target).toEqual({ T: superheated.T });
	});
});
