import { describe, expect, it } from 'vitest';
import * as engine from '$lib/thermo';
import { DEFAULT_UNIT_PREFS } from '$lib/units';
import { readAcrossSaturation } from './saturation-input';

const si = {
	...DEFAULT_UNIT_PREFS,
	system: 'si' as const,
	pressureUnit: 'kPa' as const,
	pressureReference: 'absolute' as const
};

describe('a temperature typed as a pressure (and back) means saturation', () => {
	it('40 °C in a P cell is the saturation pressure of water at 40 °C, and says so', () => {
		const r = readAcrossSaturation(engine, 'water', 'P', '40 °C', si);
		expect(r && r.ok).toBe(true);
		if (!r || !r.ok) return;
		// python3-iapws 1.5.2 (Debian): IAPWS95(T=313.15, x=0).P = 0.007384938 MPa
		expect(Math.abs(r.si / 7384.938 - 1)).toBeLessThan(1e-5);
		expect(r.note).toMatch(
			/^40\.00\u00a0°C typed as a pressure: the saturation pressure at 40\.00\u00a0°C, 7\.38\d*\u00a0kPa a\.$/
		);
	});

	it('1 bar a in a T cell is the saturation temperature at 1 bar', () => {
		const r = readAcrossSaturation(engine, 'water', 'T', '1 bar a', si);
		expect(r && r.ok).toBe(true);
		if (!r || !r.ok) return;
		// python3-iapws 1.5.2 (Debian): IAPWS97(P=0.1, x=0).T = 372.75592 K (IAPWS-95 agrees within 1 mK here)
		expect(Math.abs(r.si - 372.7559)).toBeLessThan(2e-3);
		expect(r.note).toContain('the saturation temperature at');
	});

	it('R-134a at 300 K', () => {
		const r = readAcrossSaturation(engine, 'r134a', 'P', '300 K', si);
		// Tillner-Roth & Baehr (1994), Table 8: p_s(300 K) = 0.70282 MPa
		expect(r && r.ok && Math.abs(r.si / 0.70282e6 - 1)).toBeLessThan(1e-4);
	});

	it('no saturation above the critical point: a reason, not a number; other text is not its business', () => {
		const r = readAcrossSaturation(engine, 'water', 'P', '400 °C', si);
		expect(r && !r.ok && r.message).toMatch(
			/400 °C is a temperature; read as "saturation pressure at 400 °C" there is none/
		);
		expect(readAcrossSaturation(engine, 'water', 'P', '3 kJ/kg', si)).toBeNull();
		expect(readAcrossSaturation(engine, 'water', 'T', '40 °C', si)).toBeNull();
	});
});
