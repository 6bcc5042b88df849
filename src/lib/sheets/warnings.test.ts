import { describe, expect, it } from 'vitest';
import { computePath, getFluid } from '$lib/thermo';
import { engineSpec } from './doc';
import { workedExample } from './templates';
import { sheetWarnings } from './warnings';
import { LIQUID_FULL_CAUTION, PRESSURE_EQUIPMENT_CAUTION } from '$lib/cautions';

function run(
	id: string,
	patch?: (d: ReturnType<NonNullable<ReturnType<typeof workedExample>>['build']>) => void
) {
	const doc = workedExample(id)!.build();
	patch?.(doc);
	const result = computePath(engineSpec(doc));
	return {
		doc,
		result,
		warnings: sheetWarnings(result, doc.spec.legs, doc.units, getFluid(doc.spec.fluid))
	};
}

describe('warnings under the table', () => {
	it('V-204: the code caution first, then liquid-full in the sheet’s units, then the limits met', () => {
		const { warnings } = run('vessel-v204-fire');
		expect(warnings[0]).toMatchObject({
			code: 'pressure-equipment-caution',
			severity: 'caution',
			text: PRESSURE_EQUIPMENT_CAUTION
		});
		const full = warnings.find((w) => w.code === 'liquid-full')!;
		expect(full.severity).toBe('caution');
		expect(full.text).toMatch(
			/^L1 \(isochoric\) fills the closed system with liquid at 249\.2\d\s°C and 3\.92\d\d\sMPa a\./
		);
		expect(full.text).toContain(
			'Heating a liquid-full sealed vessel raises its pressure very fast'
		);
		expect(full.text).toMatch(/Here about 1\.3\d MPa per K at constant volume\./);
		expect(full.target?.kind).toBe('leg');
		const codes = warnings.map((w) => w.code);
		expect(codes).toEqual(
			expect.arrayContaining([
				'limit-designPressure',
				'limit-reliefSetPressure',
				'limit-designTemperature'
			])
		);
		const dp = warnings.find((w) => w.code === 'limit-designPressure')!;
		expect(dp.title).toBe('Design pressure exceeded');
		expect(dp.text).toContain('1.1013\u00a0MPa a');
		// severities never go down the list
		const rank = { caution: 0, warning: 1, info: 2 };
		expect(warnings.map((w) => rank[w.severity])).toEqual(
			[...warnings.map((w) => rank[w.severity])].sort()
		);
		// no engine text in SI or with raw leg ids survives
		for (const w of warnings) expect(w.text).not.toMatch(/L[a-z2-9]{6}/);
	});

	it('a sealed 50 L vessel that starts liquid-full: the caution without any design limits, with (∂P/∂T)ᵥ in the sheet’s units', () => {
		// the tried-as-a-new-user case: water at 20 °C and 0 bar g, heated shut-in at constant volume to 40 °C
		const { warnings } = run('vessel-v204-fire', (d) => {
			d.spec.system = { kind: 'closed', volume: 0.05 };
			d.spec.start = { T: 293.15, P: 101_325 };
			d.spec.legs[0].target = { T: 313.15 };
			d.spec.limits = {};
			d.units = { ...d.units, pressureUnit: 'bar', pressureReference: 'gauge' };
		});
		const full = warnings.find((w) => w.code === 'liquid-full')!;
		expect(full.severity).toBe('caution');
		expect(full.text).toMatch(
			/^L1 \(isochoric\) heats a closed system that is liquid-full from the leg’s start \(compressed liquid at 20\.00\s°C and 0\sbar g\)/
		);
		expect(full.text).toContain(LIQUID_FULL_CAUTION);
		// (∂P/∂T)ᵥ = 450 643.7 Pa/K at 20 °C, 1 atm: python3-iapws 1.5.2 (Debian), IAPWS95, tests/reference/iapws-liquid-full.json → 4.51 bar per K
		expect(full.text).toMatch(/Here about 4\.51 bar per K at constant volume/);
		expect(warnings[0].code).toBe('liquid-full');
	});

	it('R-310 on a US sheet: pressures in psig, densities in lbm/ft³, and the liquid-full-ahead note', () => {
		const { warnings } = run('receiver-r310-hot-day');
		const ahead = warnings.find((w) => w.code === 'liquid-full-ahead')!;
		expect(ahead.severity).toBe('info');
		expect(ahead.text).toMatch(/lbm\/ft³/);
		expect(ahead.text).not.toMatch(/kg\/m³/);
	});

	it('a start already beyond a limit, and a relief set above the design pressure', () => {
		const { warnings } = run('kettle-k101', (d) => {
			d.spec.limits = { designPressure: 5e5, reliefSetPressure: 6e5 };
		});
		const start = warnings.find(
			(w) => w.code === 'limit-designPressure' && w.target?.kind === 'state'
		)!;
		expect(start.text).toMatch(
			/The start S1 is already beyond the design pressure \(3\.986[78]\sbar g\)/
		);
		expect(warnings.find((w) => w.code === 'relief-set-above-design-pressure')?.text).toMatch(
			/4\.986[78]\sbar g/
		);
		expect(warnings.find((w) => w.code === 'throttling-irreversible')?.text).toMatch(/^Leg L2/);
	});
});
