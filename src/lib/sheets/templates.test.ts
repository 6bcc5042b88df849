import { describe, expect, it } from 'vitest';
import { computePath } from '$lib/thermo';
import { engineSpec } from './doc';
import { workedExample, WORKED_EXAMPLES } from './templates';
import reference from '../../../tests/reference/iapws-sketcher.json';

const run = (id: string) => computePath(engineSpec(workedExample(id)!.build()));

describe('worked examples tell the story they claim', () => {
	it('V-204 in a fire case goes liquid-full where IAPWS-95 says, past its design pressure', () => {
		const r = run('vessel-v204-fire');
		const full = r.warnings.find((w) => w.code === 'liquid-full');
		expect(full).toBeDefined();
		// python3-iapws 1.5.2 (Debian), IAPWS95: ρ' = 800 kg/m³ at 522.404 K (tests/reference/iapws-sketcher.json)
		expect(Math.abs(full!.at!.T - reference.vesselV204.liquidFull.T)).toBeLessThan(0.01);
		// python3-iapws 1.5.2 (Debian), IAPWS95(T=523.15, rho=800).P
		expect(Math.abs(r.states[1].state.P / reference.vesselV204.at523_15.P - 1)).toBeLessThan(1e-5);
		expect(r.warnings.map((w) => w.code)).toEqual(
			expect.arrayContaining([
				'pressure-equipment-caution',
				'design-pressure-exceeded',
				'relief-set-pressure-exceeded'
			])
		);
		// charged about 82 % liquid by volume, as its story says
		expect(r.states[0].extras.liquidVolumeFraction).toBeGreaterThan(0.8);
		expect(r.states[0].extras.liquidVolumeFraction).toBeLessThan(0.84);
	});

	it('HP-410 closes into a reverse cycle with a heating COP', () => {
		const r = run('heat-pump-hp410');
		expect(r.cycle?.kind).toBe('reverse');
		expect(r.cycle!.copHeating!).toBeGreaterThan(3);
	});

	it('R-310 stays two-phase below its design pressure, heading for liquid-full', () => {
		const r = run('receiver-r310-hot-day');
		expect(r.states[1].state.phase).toBe('saturated-mixture');
		expect(r.states[1].state.P).toBeLessThan(r.limits.designPressure!);
		expect(r.warnings.map((w) => w.code)).toContain('liquid-full-ahead');
		expect(r.states[0].extras.liquidVolumeFraction).toBeCloseTo(0.7, 1);
	});

	it('K-101 condenses at the jacket pressure and flashes through the trap', () => {
		const r = run('kettle-k101');
		expect(r.states[1].state.phase).toBe('saturated-liquid');
		expect(r.states[2].state.phase).toBe('saturated-mixture');
		expect(r.legs[0].leg.qFlow).toBeLessThan(0);
		expect(r.warnings.map((w) => w.code)).toContain('throttling-irreversible');
	});

	it('each build gives fresh leg ids', () => {
		for (const ex of WORKED_EXAMPLES) {
			const a = ex.build().spec.legs.map((l) => l.id);
			const b = ex.build().spec.legs.map((l) => l.id);
			expect(a.some((id, i) => id !== b[i])).toBe(true);
		}
	});
});
