import { describe, expect, it } from 'vitest';
import fixture from '../../../../tests/reference/iapws-legs.json';
import { ThermoError, getFluid, isolines, saturationAtP, saturationAtT } from '../index.ts';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const cases = (
	fixture as unknown as {
		cases: { name: string; crossings: { line: string; T: number; P: number; rho: number }[] }[];
	}
).cases;

function thrown(fn: () => unknown): ThermoError {
	try {
		fn();
	} catch (e) {
		if (e instanceof ThermoError) return e;
		throw e;
	}
	throw new Error('expected a ThermoError');
}

describe('isolines', () => {
	const water = getFluid('water');
	it('isobars below Pc span the range and run flat in T across the dome, through both saturation points', () => {
		const [line] = isolines('water', 'isobar', [101325], 80);
		expect(line.points.length).toBeGreaterThanOrEqual(80);
		expect(line.points[0].T).toBeCloseTo(water.limits.Tmin, 9);
		expect(line.points[line.points.length - 1].T).toBeCloseTo(water.limits.Tmax, 9);
		for (const p of line.points) expect(rel(p.P, 101325)).toBeLessThan(1e-12);
		// python3-iapws 1.5.2 (Debian), IAPWS95: Tsat and the saturated densities at 101325 Pa ('isobaric liquid to vapor')
		const ref = cases.find((c) => c.name === 'isobaric liquid to vapor')!.crossings;
		const liq = line.points.find((p) => Math.abs(p.v * ref[0].rho - 1) < 1e-7);
		const vap = line.points.find((p) => Math.abs(p.v * ref[1].rho - 1) < 1e-7);
		expect(liq && vap).toBeTruthy();
		const sat = saturationAtP('water', 101325);
		const inside = line.points.filter((p) => p.v > 1 / sat.liquid.rho && p.v < 1 / sat.vapor.rho);
		expect(inside.length).toBeGreaterThan(5);
		for (const p of inside) expect(rel(p.T, ref[0].T)).toBeLessThan(1e-9);
		// rising T along the line
		for (let i = 1; i < line.points.length; i++)
			expect(line.points[i].T).toBeGreaterThanOrEqual(line.points[i - 1].T);
	});
	it('isotherms below Tc run flat in P across the dome; above Tc they have no flat part', () => {
		const [sub, sup] = isolines('water', 'isotherm', [450, 700]);
		// python3-iapws 1.5.2 (Debian), IAPWS95: saturation at 450 K by the (T, x) call ('isothermal to 1e+07 Pa')
		const ref = cases.find((c) => c.name === 'isothermal to 1e+07 Pa')!.crossings[0];
		const sat = saturationAtT('water', 450);
		const flat = sub.points.filter((p) => p.v >= 1 / sat.liquid.rho && p.v <= 1 / sat.vapor.rho);
		expect(flat.length).toBeGreaterThan(5);
		for (const p of flat) expect(rel(p.P, ref.P)).toBeLessThan(1e-7);
		for (const p of sub.points) expect(p.T).toBe(450);
		for (let i = 1; i < sub.points.length; i++)
			expect(sub.points[i].v).toBeGreaterThan(sub.points[i - 1].v);
		// from the formulation's highest pressure down to a tenth of the triple-point pressure
		expect(rel(sub.points[0].P, water.limits.Pmax)).toBeLessThan(1e-9);
		expect(rel(sub.points[sub.points.length - 1].P, water.triple.P / 10)).toBeLessThan(1e-3);
		for (let i = 1; i < sup.points.length; i++)
			expect(sup.points[i].P).toBeLessThan(sup.points[i - 1].P);
	});
	it('isochores keep v and cross the dome where the saturation line has that v', () => {
		const lines = isolines('water', 'isochore', [0.001, 0.01, 1]);
		for (const l of lines) {
			expect(l.points.length).toBeGreaterThanOrEqual(100);
			for (const p of l.points) expect(rel(p.v, l.value)).toBeLessThan(1e-12);
			for (let i = 1; i < l.points.length; i++)
				expect(l.points[i].T).toBeGreaterThan(l.points[i - 1].T);
			expect(l.points.every((p) => p.P <= water.limits.Pmax * (1 + 1e-9))).toBe(true);
		}
	});
	it('works for every fluid', () => {
		for (const id of ['ammonia', 'carbon-dioxide', 'r134a', 'nitrogen']) {
			const f = getFluid(id);
			const [bar] = isolines(id, 'isobar', [f.critical.P / 3], 40);
			const [therm] = isolines(id, 'isotherm', [0.5 * (f.triple.T + f.critical.T)], 40);
			expect(bar.points.length).toBeGreaterThanOrEqual(40);
			expect(therm.points.length).toBeGreaterThanOrEqual(40);
		}
	});
	it.each([
		['isoline', [1e5], 100, 'invalid-option'],
		['quality', [1.2], 100, 'out-of-range'],
		['isentrope', [Number.POSITIVE_INFINITY], 100, 'non-positive-input'],
		['isobar', [], 100, 'invalid-option'],
		['isobar', new Array(41).fill(1e5), 100, 'invalid-option'],
		['isobar', [1e5], 5, 'invalid-option'],
		['isobar', [1e5], 100.5, 'invalid-option'],
		['isobar', [-1], 100, 'non-positive-input'],
		['isobar', [Number.NaN], 100, 'non-positive-input'],
		['isobar', [5e9], 100, 'out-of-range'],
		['isotherm', [100], 100, 'out-of-range']
	])('refuses %s %j points=%s', (kind, values, points, code) => {
		const e = thrown(() =>
			isolines('water', kind as 'isobar', values as number[], points as number)
		);
		expect(e.code).toBe(code);
	});
});

/** T (or another y) where a line's ln P reaches P, interpolated between its two points around it. */
function atPressure(points: { P: number }[], P: number, y: (p: never) => number): number {
	for (let i = 1; i < points.length; i++) {
		const a = points[i - 1];
		const b = points[i];
		if ((a.P - P) * (b.P - P) <= 0 && a.P !== b.P) {
			const t = Math.log(P / a.P) / Math.log(b.P / a.P);
			return y(a as never) + t * (y(b as never) - y(a as never));
		}
	}
	return NaN;
}

describe('isentropes, isenthalps and quality lines', () => {
	it('every point of an isentrope has its s, and it crosses 0.1 MPa where IAPWS-95 puts it', () => {
		const [line] = isolines('water', 'isentrope', [6500], 200);
		expect(line.points.length).toBeGreaterThanOrEqual(200);
		for (const p of line.points) expect(Math.abs(p.s - 6500)).toBeLessThan(1e-9 * 6500);
		// python3-iapws 1.5.2 (Debian), IAPWS95(P=0.1, s=6.5): T = 372.7559 K, h = 2354.807 kJ/kg (x = 0.858)
		expect(atPressure(line.points, 1e5, (p: { T: number }) => p.T)).toBeCloseTo(372.756, 1);
		expect(
			rel(
				atPressure(line.points, 1e5, (p: { h: number }) => p.h),
				2354806.6
			)
		).toBeLessThan(2e-3);
	});
	it('every point of an isenthalp has its h, and it crosses 1 MPa where IAPWS-95 puts it', () => {
		const [line] = isolines('water', 'isenthalp', [2.8e6], 200);
		for (const p of line.points) expect(Math.abs(p.h - 2.8e6)).toBeLessThan(1e-9 * 2.8e6);
		for (let i = 1; i < line.points.length; i++)
			expect(line.points[i].P).toBeGreaterThanOrEqual(line.points[i - 1].P);
		// python3-iapws 1.5.2 (Debian), IAPWS95(P=1, h=2800): T = 461.7635 K, s = 6.635070 kJ/(kg·K)
		expect(atPressure(line.points, 1e6, (p: { T: number }) => p.T)).toBeCloseTo(461.76, 0);
		expect(
			rel(
				atPressure(line.points, 1e6, (p: { s: number }) => p.s),
				6635.07
			)
		).toBeLessThan(1e-3);
	});
	it('quality lines run from the triple point to the critical point and meet the dome at x = 0 and 1', () => {
		const water = getFluid('water');
		const [x0, x3, x1] = isolines('water', 'quality', [0, 0.3, 1], 60);
		for (const l of [x0, x3, x1]) {
			expect(l.points.length).toBe(60);
			expect(l.points[0].T).toBeCloseTo(water.triple.T, 6);
			const end = l.points[l.points.length - 1];
			expect(end.T).toBeCloseTo(water.critical.T, 9);
			expect(rel(end.P, water.critical.P)).toBeLessThan(1e-9);
		}
		// identity: x = 0 and x = 1 are the saturation lines themselves
		for (let i = 0; i < 59; i += 7) {
			const sat = saturationAtT('water', x0.points[i].T);
			expect(rel(x0.points[i].h, sat.liquid.h)).toBeLessThan(1e-9);
			expect(rel(x1.points[i].s, sat.vapor.s)).toBeLessThan(1e-9);
			expect(rel(x1.points[i].v, sat.vapor.v)).toBeLessThan(1e-9);
		}
		// python3-iapws 1.5.2 (Debian), IAPWS95(T=373.15, x=0.3): P = 0.1014180 MPa, h = 1096.087 kJ/kg
		const h = atPressure(x3.points, 101418.0, (p: { h: number }) => p.h);
		expect(rel(h, 1096087.3)).toBeLessThan(1e-3);
	});
	it('isentropes and isenthalps for the refrigerants too', () => {
		for (const id of ['ammonia', 'r134a', 'carbon-dioxide']) {
			const f = getFluid(id);
			const sat = saturationAtT(id, 0.5 * (f.triple.T + f.critical.T));
			const [ise] = isolines(id, 'isentrope', [sat.vapor.s], 40);
			const [ish] = isolines(id, 'isenthalp', [sat.liquid.h], 40);
			expect(ise.points.length).toBeGreaterThanOrEqual(40);
			expect(ish.points.length).toBeGreaterThanOrEqual(40);
			for (const p of ise.points) expect(rel(p.s, sat.vapor.s)).toBeLessThan(1e-9);
		}
	});
});
