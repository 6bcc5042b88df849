/**
 * Legs and chart lines for every fluid that keeps published check values beside it
 * (checked-fluids.ts), as the first five have them: each process across and around the dome ends
 * at its target with the exact identities of its integrals, and the chart's saturation dome and
 * isolines come back whole. Internal consistency of the engine with each fluid's data; the data
 * itself is checked against the papers in published-checks.test.ts.
 */
// Sources of the check values: the first law and the definitions of the integrals — q = Δu + w,
// qFlow = Δh + wShaft, q = Δh at constant P, q = TΔs at constant T, q = 0 along an isentrope, Δh = 0
// in throttling (calculus identities of the compute contract, docs/compute-api.md); a leg ends at its
// own target (an identity). Tolerances 1e-9 relative (round-off) and 1e-6 (quadrature): common practice.
import { describe, expect, it } from 'vitest';
import { computeLeg, fixState, isolines, saturationCurve } from '../index.ts';
import type { Process } from '../types.ts';
import { fluidData } from './index.ts';
import { checkedFluids } from './checked-fluids.ts';

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe.each(checkedFluids.map((c) => [c.fluid]))('%s legs and chart lines', (id) => {
	const data = fluidData.find((f) => f.id === id)!;
	const Tc = data.critical.T;
	const Tt = data.triple.T;
	const Tlow = Tt + 0.45 * (Tc - Tt);
	const Thigh = Tt + 0.85 * (Tc - Tt);
	const Plow = fixState(id, { T: Tlow, x: 0 }).P;
	const Phigh = fixState(id, { T: Thigh, x: 0 }).P;

	it('gives every process a leg that ends at its target, with q = Δu + w and qFlow = Δh + wShaft', () => {
		const cases: [string, Record<string, number>, Process, Record<string, number>, number?][] = [
			[
				'evaporate and superheat at constant P',
				{ P: Plow, x: 0 },
				'isobaric',
				{ T: Tlow + 0.2 * (Tc - Tt) }
			],
			['compress saturated vapor isentropically', { P: Plow, x: 1 }, 'isentropic', { P: Phigh }],
			['throttle saturated liquid', { P: Phigh, x: 0 }, 'isenthalpic', { P: Plow }],
			['heat a sealed two-phase charge', { T: Tlow, x: 0.3 }, 'isochoric', { T: Thigh }],
			['compress vapor isothermally into the dome', { T: Tlow, x: 1 }, 'isothermal', { x: 0.5 }],
			['compress vapor polytropically', { P: Plow, x: 1 }, 'polytropic', { P: Phigh }, 1.1]
		];
		for (const [what, start, process, target, n] of cases) {
			const leg = computeLeg({ fluid: id, start, process, target, n });
			expect(leg.points.length, what).toBeGreaterThanOrEqual(40);
			const [k, v] = Object.entries(target)[0];
			const got = (leg.end as unknown as Record<string, number>)[k];
			if (k === 'x') expect(Math.abs(got - v), what).toBeLessThan(1e-9);
			else expect(rel(got, v), what).toBeLessThan(1e-9);
			const scale = Math.max(
				Math.abs(leg.q),
				Math.abs(leg.w),
				Math.abs(leg.du),
				Math.abs(leg.dh),
				1
			);
			if (process === 'isenthalpic') {
				// throttling is irreversible: the engine reports no work and no heat, and keeps h
				expect([leg.q, leg.w, leg.wShaft, leg.qFlow], what).toEqual([0, 0, 0, 0]);
				expect(leg.ds, what).toBeGreaterThan(0);
			} else {
				expect(Math.abs(leg.q - (leg.du + leg.w)), `${what}: q = Δu + w`).toBeLessThan(
					1e-9 * scale
				);
				expect(
					Math.abs(leg.qFlow - (leg.dh + leg.wShaft)),
					`${what}: qFlow = Δh + wShaft`
				).toBeLessThan(1e-9 * scale);
			}
			if (process === 'isobaric')
				expect(Math.abs(leg.q - leg.dh), `${what}: q = Δh`).toBeLessThan(1e-6 * scale);
			if (process === 'isothermal')
				expect(Math.abs(leg.q - leg.start.T * leg.ds), `${what}: q = TΔs`).toBeLessThan(
					1e-6 * scale
				);
			if (process === 'isentropic')
				expect(Math.abs(leg.q), `${what}: q = 0`).toBeLessThan(1e-6 * scale);
			for (const p of leg.points)
				for (const q of [p.T, p.P, p.rho, p.h, p.s]) expect(Number.isFinite(q), what).toBe(true);
		}
		// the throttle keeps h; the isentrope keeps s (to the engine's quadrature and solver tolerance)
		const thr = computeLeg({
			fluid: id,
			start: { P: Phigh, x: 0 },
			process: 'isenthalpic',
			target: { P: Plow }
		});
		expect(Math.abs(thr.end.h - thr.start.h)).toBeLessThan(1e-6 * data.R * Tc);
		expect(thr.end.x).toBeGreaterThan(0);
		const ise = computeLeg({
			fluid: id,
			start: { P: Plow, x: 1 },
			process: 'isentropic',
			target: { P: Phigh }
		});
		expect(Math.abs(ise.end.s - ise.start.s)).toBeLessThan(1e-9 * data.R);
	});

	it('draws the dome and isolines across it', () => {
		const curve = saturationCurve(id, 60);
		expect(curve.liquid.length).toBeGreaterThanOrEqual(30);
		expect(curve.vapor.length).toBe(curve.liquid.length);
		expect(rel(curve.critical.T, Tc)).toBeLessThan(1e-3);
		for (const p of [...curve.liquid, ...curve.vapor])
			expect(Number.isFinite(p.v) && p.P > 0).toBe(true);
		const [bar] = isolines(id, 'isobar', [Phigh], 60);
		const [therm] = isolines(id, 'isotherm', [Tlow], 60);
		expect(bar.points.length).toBeGreaterThanOrEqual(60);
		expect(therm.points.length).toBeGreaterThanOrEqual(60);
		// the isobar runs flat in T through the dome, at the saturation temperature
		const vL = fixState(id, { T: Thigh, x: 0 }).v,
			vV = fixState(id, { T: Thigh, x: 1 }).v;
		const inDome = bar.points.filter((p) => p.v > vL * (1 + 1e-6) && p.v < vV * (1 - 1e-6));
		expect(inDome.length).toBeGreaterThan(0);
		for (const p of inDome) expect(rel(p.T, Thigh)).toBeLessThan(1e-6);
	});
});
