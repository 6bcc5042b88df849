/**
 * The per-process strategies of the leg curve (leg-processes.ts): every process the engine accepts
 * has one, each answers every part of the interface exactly one way, and what each says about its
 * curve holds on a real leg (the invariant stays fixed along it; the canonical key rises along it).
 */
import { describe, expect, it } from 'vitest';
import { getCompiledFluid } from '../registry.ts';
import { fixState } from '../index.ts';
import { Curve, cptOfState } from './leg-curve.ts';
import { PROCESS_CURVES } from './leg-processes.ts';
import { PROCESSES } from './leg-spec.ts';

describe('one strategy per process', () => {
	it('every accepted process has a strategy, and no strategy is left without a process', () => {
		expect(Object.keys(PROCESS_CURVES).sort()).toEqual([...PROCESSES].sort());
	});

	for (const process of PROCESSES)
		it(`${process}: crossings one way (a fixed saturation or a line residual), quality one way (v or an energy)`, () => {
			const pc = PROCESS_CURVES[process];
			expect((pc.fixedSaturation ? 1 : 0) + (pc.lineResidual ? 1 : 0)).toBe(1);
			expect((pc.domeVolume ? 1 : 0) + (pc.domeEnergy ? 1 : 0)).toBe(1);
			// a one-piece branch is only for curves that meet the dome at one saturation
			if (pc.lonePieceBranch) expect(pc.fixedSaturation).toBeDefined();
			if (pc.domeWork === 'shaft') expect(pc.domeShaftIntegrand).toBeDefined();
		});

	// water from a superheated start (IAPWS-95); the invariant of each process is the start's own value
	const start = fixState('water', { T: 600, P: 1e6 });
	for (const process of PROCESSES)
		it(`${process}: the invariant holds at points of the curve, and the key rises along its segment`, () => {
			const fl = getCompiledFluid('water');
			const pc = PROCESS_CURVES[process];
			const inv = pc.invariant(start, process === 'polytropic' ? 1.3 : undefined);
			const curve = new Curve(fl, inv, cptOfState(fl, start));
			const pos = curve.locateStart(cptOfState(fl, start));
			const seg = curve.segs[pos.seg];
			const keys: number[] = [];
			for (const f of [0.999, 1, 1.001]) {
				// a step of 0.1 % in the segment's parameter (T or ln v or ln P) on either side
				const t = curve.singleParam === 'T' ? pos.t * f : pos.t + (f - 1);
				const c = curve.at(seg, t, cptOfState(fl, start));
				expect(c, `${process} at ${t}`).not.toBeNull();
				if (!c) return;
				keys.push(pc.key(c));
				const held =
					process === 'isobaric'
						? [c.P, start.P]
						: process === 'isochoric'
							? [c.rho, start.rho]
							: process === 'isothermal'
								? [c.T, start.T]
								: process === 'isentropic'
									? [c.s, start.s]
									: process === 'isenthalpic'
										? [c.h, start.h]
										: [c.P * (1 / c.rho) ** 1.3, start.P * start.v ** 1.3];
				expect(Math.abs(held[0] / held[1] - 1), `${process} invariant`).toBeLessThan(1e-9);
			}
			expect(keys[1]).toBeGreaterThan(keys[0]);
			expect(keys[2]).toBeGreaterThan(keys[1]);
		});
});
