/**
 * Fluid loading: every registered data file loads; malformed data is refused with
 * `invalid-fluid-data` naming the field; the declared reference state is applied generically.
 */
import { describe, expect, it } from 'vitest';
import { ThermoError } from './errors.ts';
import { fluids, getFluid, listFluids } from './index.ts';
import type { FluidData } from './fluids/schema.ts';
import { water } from './fluids/water.ts';
import { fluidData } from './fluids/index.ts';
import { getCompiledFluid, loadFluid } from './registry.ts';
import { fixStateOf } from './solvers/fix-state.ts';
import { satAtT } from './solvers/saturation.ts';

function clone(): FluidData {
	return structuredClone(water);
}

function refused(mutate: (d: Record<string, unknown> & FluidData) => void, field: string): void {
	const d = clone() as Record<string, unknown> & FluidData;
	mutate(d);
	let err: unknown;
	try {
		loadFluid(d);
	} catch (e) {
		err = e;
	}
	expect(err).toBeInstanceOf(ThermoError);
	expect((err as ThermoError).code).toBe('invalid-fluid-data');
	expect((err as ThermoError).field).toBe(field);
	expect((err as ThermoError).message).toContain(field);
}

describe('fluid loading', () => {
	it('loads every registered fluid and lists its metadata', () => {
		expect(fluids.map((f) => f.id)).toEqual(fluidData.map((f) => f.id));
		for (const info of listFluids()) {
			const fl = getCompiledFluid(info.id);
			expect(fl.id).toBe(info.id);
			expect(info.formulation.reference.length).toBeGreaterThan(20);
			expect(info.referenceState.length).toBeGreaterThan(5);
			const s = satAtT(fl, 0.5 * (info.triple.T + info.critical.T));
			expect(s.rhoL).toBeGreaterThan(s.rhoV);
		}
		expect(getFluid('Steam').id).toBe('water');
		expect(getFluid('R-290').id).toBe('propane');
		expect(getFluid('LNG').id).toBe('methane');
		expect(new Set(listFluids().map((f) => f.group))).toEqual(
			new Set(['water', 'refrigerant', 'hydrocarbon', 'cryogen'])
		);
		expect(() => getFluid('unobtainium')).toThrowError(ThermoError);
	});

	it('accepts the water file as it is', () => {
		expect(() => loadFluid(clone())).not.toThrow();
	});

	it('refuses malformed data, naming the field', () => {
		refused((d) => delete (d as Partial<FluidData>).R, 'R');
		refused((d) => ((d as { group: string }).group = 'snacks'), 'group');
		refused((d) => ((d.critical as { T: number }).T = Number.NaN), 'critical.T');
		refused((d) => (d.residual[1] as { t: number[] }).t.pop(), 'residual[1].t');
		refused(
			(d) => ((d.residual[0] as { n: number[] }).n[3] = Number.POSITIVE_INFINITY),
			'residual[0].n[3]'
		);
		refused((d) => ((d.residual[2] as { kind: string }).kind = 'spline'), 'residual[2].kind');
		refused((d) => d.ideal.push({ kind: 'lead', a1: 0, a2: 0 }), 'ideal');
		refused(
			(d) => ((d.ancillaries.pSat as { form: string }).form = 'cubic'),
			'ancillaries.pSat.form'
		);
		refused(
			(d) => ((d.referenceState as { kind: string }).kind = 'whatever'),
			'referenceState.kind'
		);
		refused((d) => (d.limits.Pmax = 1e6), 'limits.Pmax');
		refused((d) => ((d as { formulation: unknown }).formulation = undefined), 'formulation');
		refused((d) => ((d.ideal[2] as { gamma: number[] }).gamma[0] = -1), 'ideal[2].gamma[0]');
		refused(
			(d) => ((d.ancillaries.rhoVapor as { Tr: unknown }).Tr = 'hot'),
			'ancillaries.rhoVapor.Tr'
		);
		refused((d) => (d.ancillaries.pSat.Tr = 200), 'ancillaries.pSat.Tr');
	});

	it('reduces an ancillary with its own Tr when it gives one, else with the critical temperature', () => {
		// IAPWS SR1-86(1992) ancillaries are reduced with Tc = 647.096 K; Tillner-Roth & Baehr (1994) R-134a's with 374.18 K
		expect(getCompiledFluid('water').ancP.Tc).toBe(647.096);
		expect(getCompiledFluid('r134a').ancP.Tc).toBe(374.18);
		expect(getCompiledFluid('r134a').ancRhoV.Tc).toBe(374.18);
		const d = clone();
		d.id = 'water-tr';
		d.ancillaries.pSat.Tr = 600;
		const fl = loadFluid(d);
		expect(fl.ancP.Tc).toBe(600);
		expect(fl.ancRhoL.Tc).toBe(647.096);
		// θ = 1 − T/Tr: at Tr the vapor-pressure ancillary gives its yc
		expect(fl.ancP.value(600)).toBe(d.ancillaries.pSat.yc);
	});

	it('applies a declared reference state by shifting the lead constants only', () => {
		const d = clone();
		d.id = 'water-shifted';
		d.referenceState = { kind: 'saturated-liquid-at-T', label: 'test', T: 300, h: 100e3, s: 350 };
		const shifted = loadFluid(d);
		const base = getCompiledFluid('water');
		const liq = fixStateOf(shifted, { T: 300, x: 0 });
		expect(Math.abs(liq.h - 100e3)).toBeLessThan(1e-6);
		expect(Math.abs(liq.s - 350)).toBeLessThan(1e-9);
		// differences between states, and everything but u, h, s, are unchanged
		const a = fixStateOf(shifted, { T: 500, P: 1e5 }),
			b = fixStateOf(base, { T: 500, P: 1e5 });
		const a0 = fixStateOf(shifted, { T: 300, P: 1e5 }),
			b0 = fixStateOf(base, { T: 300, P: 1e5 });
		expect(Math.abs(a.h - a0.h - (b.h - b0.h))).toBeLessThan(1e-6);
		expect(Math.abs(a.s - a0.s - (b.s - b0.s))).toBeLessThan(1e-9);
		expect(a.rho).toBeCloseTo(b.rho, 10);
		expect(a.cp).toBeCloseTo(b.cp as number, 8);

		const p = clone();
		p.referenceState = { kind: 'saturated-liquid-at-P', label: 'test', P: 101325, h: 0, s: 0 };
		const atP = loadFluid(p);
		const nbp = fixStateOf(atP, { P: 101325, x: 0 });
		expect(Math.abs(nbp.h)).toBeLessThan(1e-6);
		expect(Math.abs(nbp.s)).toBeLessThan(1e-9);
	});
});
