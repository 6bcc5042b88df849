import { describe, expect, it } from 'vitest';
import { BTU_IT, FOOT, POUND_FORCE, POUND_MASS } from './factors';
import { displayUnit, formatQuantity, parseQuantity, unitById, unitPrefs } from './index';

describe('transport quantities', () => {
	it('convert with the defining factors', () => {
		// 1 lbm/(ft·h) = 0.45359237 kg / (0.3048 m × 3600 s) = 4.133789e−4 Pa·s (NIST SP 811, Appendix B)
		expect(unitById('lbm/(ft·h)').toSI(1, 0)).toBeCloseTo(POUND_MASS / (FOOT * 3600), 15);
		expect(unitById('lbm/(ft·h)').toSI(1, 0)).toBeCloseTo(4.133789e-4, 9);
		// 1 Btu_IT/(h·ft·°F) = 1.730735 W/(m·K) (NIST SP 811, Appendix B)
		expect(unitById('Btu/(h·ft·°F)').toSI(1, 0)).toBeCloseTo(1.730735, 6);
		expect(unitById('Btu/(h·ft·°F)').toSI(1, 0)).toBeCloseTo((BTU_IT / 3600 / FOOT) * 1.8, 12);
		// 1 lbf/ft = 14.59390 N/m (NIST SP 811, Appendix B)
		expect(unitById('lbf/ft').toSI(1, 0)).toBeCloseTo(POUND_FORCE / FOOT, 12);
		expect(unitById('lbf/ft').toSI(1, 0)).toBeCloseTo(14.5939, 4);
		expect(unitById('mPa·s').toSI(1, 0)).toBe(1e-3);
	});
	it('display in μPa·s, W/(m·K), mN/m (SI) and lbm/(ft·h), Btu/(h·ft·°F), lbf/ft (US)', () => {
		const si = unitPrefs();
		const us = unitPrefs({ system: 'us' });
		expect(displayUnit('viscosity', si).label).toBe('μPa·s');
		expect(displayUnit('thermalConductivity', si).label).toBe('W/(m·K)');
		expect(displayUnit('surfaceTension', si).label).toBe('mN/m');
		expect(displayUnit('viscosity', us).label).toBe('lbm/(ft·h)');
		expect(formatQuantity(8.9e-4, 'viscosity', si).full).toBe('890.00\u00a0μPa·s');
		expect(formatQuantity(0.0589, 'surfaceTension', si).full).toBe('58.900\u00a0mN/m');
		expect(formatQuantity(6.13, 'dimensionless', si).text).toBe('6.1300');
	});
	it('parse typed values and refuse the wrong quantity', () => {
		const r = parseQuantity('0.89 cP', 'viscosity');
		expect(r.ok && r.si).toBeCloseTo(8.9e-4, 12);
		expect(parseQuantity('0.6 W/m/K', 'thermalConductivity').ok).toBe(true);
		expect(parseQuantity('-3 mN/m', 'surfaceTension').ok).toBe(false);
		expect(parseQuantity('3 kPa', 'viscosity').ok).toBe(false);
	});
});
