import { describe, expect, it } from 'vitest';
import * as F from './factors';

/** Round to the significant figures NIST prints (1.234 567 E+03 has 7). */
const printed = (x: number, sig = 7) => Number(x.toPrecision(sig));

// The printed NIST values below are transcribed from memory of NIST SP 811 (2008), Appendix B.8/B.9
// (not read from a copy during this work); each also follows from the exact definitions it is
// checked against, so a slip in memory would show up as a disagreement here.
describe('conversion factors against NIST SP 811 (2008), Appendix B.8', () => {
	// Factors printed in boldface (exact) must equal the definition to the last bit.
	it('exact definitions', () => {
		expect(F.FOOT).toBe(0.3048); // NIST SP 811 (2008), App. B.8: foot → 3.048 E-01 m (exact)
		expect(F.INCH).toBe(0.0254); // NIST SP 811 (2008), App. B.8: inch → 2.54 E-02 m (exact)
		expect(F.POUND_MASS).toBe(0.45359237); // NIST SP 811 (2008), App. B.8: pound (avoirdupois) → 4.535 923 7 E-01 kg (exact)
		expect(F.STANDARD_GRAVITY).toBe(9.80665); // NIST SP 811 (2008), App. B.8: standard gravity → 9.806 65 E+00 m/s² (exact)
		expect(F.BAR).toBe(1e5); // NIST SP 811 (2008), App. B.8: bar → 1.0 E+05 Pa (exact)
		expect(F.STANDARD_ATMOSPHERE).toBe(101325); // NIST SP 811 (2008), App. B.8: atmosphere, standard → 1.013 25 E+05 Pa (exact)
		expect(F.BTU_IT).toBe(1055.05585262); // NIST SP 811 (2008), App. B.8 footnote: Btu_IT = 1.055 055 852 62 E+03 J (exact)
		expect(F.BTU_PER_LBM).toBe(2326); // NIST SP 811 (2008), App. B.8: Btu_IT/lb → 2.326 E+03 J/kg (exact)
		expect(F.BTU_PER_LBM_RANKINE).toBe(4186.8); // NIST SP 811 (2008), App. B.8: Btu_IT/(lb·°F) → 4.1868 E+03 J/(kg·K) (exact)
		expect(F.CELSIUS_OFFSET).toBe(273.15); // NIST SP 811 (2008), App. B.9: T/K = t/°C + 273.15
		expect(F.FAHRENHEIT_OFFSET).toBe(459.67); // NIST SP 811 (2008), App. B.9: T/K = (t/°F + 459.67)/1.8
		expect(F.RANKINE).toBeCloseTo(1 / 1.8, 15); // NIST SP 811 (2008), App. B.9: T/K = (T/°R)/1.8
	});

	it('the exact Btu factors agree with one another', () => {
		expect(F.BTU_IT / F.POUND_MASS).toBeCloseTo(F.BTU_PER_LBM, 9);
		expect((F.BTU_IT / F.POUND_MASS) * 1.8).toBeCloseTo(F.BTU_PER_LBM_RANKINE, 9);
	});

	it('derived factors: exact to double precision, and equal to the printed values when rounded', () => {
		// exact values stated in the brief (from the definitions above)
		expect(F.POUND_FORCE).toBeCloseTo(4.4482216152605, 12);
		expect(F.PSI).toBeCloseTo(6894.757293168, 8); // 1 lbf/in² = 6894.757293168 Pa
		expect(F.CUBIC_FOOT).toBeCloseTo(0.028316846592, 15);
		expect(F.US_GALLON).toBeCloseTo(3.785411784e-3, 15); // NIST SP 811 (2008), App. B.8 footnote: 231 in³ exactly

		// NIST SP 811 (2008), App. B.8, values as printed (7 significant figures), from memory
		expect(printed(F.POUND_FORCE)).toBe(4.448222); // pound-force → 4.448 222 E+00 N
		expect(printed(F.PSI)).toBe(6894.757); // pound-force per square inch → 6.894 757 E+03 Pa
		expect(printed(F.CUBIC_FOOT)).toBe(0.02831685); // cubic foot → 2.831 685 E-02 m³
		expect(printed(F.CUBIC_FOOT_PER_LBM)).toBe(0.06242796); // cubic foot per pound → 6.242 796 E-02 m³/kg
		expect(printed(F.LBM_PER_CUBIC_FOOT)).toBe(16.01846); // pound per cubic foot → 1.601 846 E+01 kg/m³
		expect(printed(F.BTU_IT)).toBe(1055.056); // British thermal unit_IT → 1.055 056 E+03 J
		expect(printed(F.BTU_PER_HOUR)).toBe(0.2930711); // Btu_IT per hour → 2.930 711 E-01 W
		expect(printed(F.HORSEPOWER)).toBe(745.6999); // horsepower (550 ft·lbf/s) → 7.456 999 E+02 W
		expect(printed(F.LBM_PER_HOUR)).toBe(0.0001259979); // pound per hour → 1.259 979 E-04 kg/s
		expect(printed(F.US_GALLON)).toBe(0.003785412); // gallon (U.S.) → 3.785 412 E-03 m³
	});

	it('reciprocal pairs are reciprocal', () => {
		expect(F.CUBIC_FOOT_PER_LBM * F.LBM_PER_CUBIC_FOOT).toBeCloseTo(1, 15);
	});
});
