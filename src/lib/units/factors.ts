/**
 * Conversion factors to SI, each named with its source.
 *
 * Exact factors follow from the definitions quoted beside them; NIST SP 811 (2008 edition),
 * Appendix B.8 prints them (boldface = exact). Derived factors (psi, Btu/lbm, …) are computed
 * here from the exact ones instead of being copied as rounded decimals, so they are exact to
 * double precision; `factors.test.ts` checks each against the value NIST SP 811 prints.
 */

/** 1 ft = 0.3048 m exactly. International yard and pound agreement (1959); NIST SP 811 (2008), App. B.8. */
export const FOOT = 0.3048;

/** 1 in = 0.0254 m exactly. Same agreement; NIST SP 811 (2008), App. B.8. */
export const INCH = 0.0254;

/** 1 lbm (avoirdupois pound) = 0.45359237 kg exactly. Same agreement; NIST SP 811 (2008), App. B.8. */
export const POUND_MASS = 0.45359237;

/** Standard acceleration of gravity g_n = 9.80665 m/s² exactly. 3rd CGPM (1901); NIST SP 811 (2008), App. B.8. */
export const STANDARD_GRAVITY = 9.80665;

/** 1 lbf = 1 lbm × g_n = 4.4482216152605 N exactly. NIST SP 811 (2008), App. B.8 prints 4.448 222 E+00. */
export const POUND_FORCE = POUND_MASS * STANDARD_GRAVITY;

/** 1 lbf/in² = 6894.757293168… Pa (lbf / in²). NIST SP 811 (2008), App. B.8 prints 6.894 757 E+03. */
export const PSI = POUND_FORCE / (INCH * INCH);

/** 1 bar = 100 000 Pa exactly. NIST SP 811 (2008), App. B.8. */
export const BAR = 1e5;

/** 1 standard atmosphere (src/lib/thermo/constants.ts, shared with the engine's gauge default). */
export { STANDARD_ATMOSPHERE } from '$lib/thermo/constants';

/**
 * 1 Btu_IT = 1055.05585262 J exactly: the IT calorie is 4.1868 J exactly (5th International
 * Conference on the Properties of Steam, 1956) and 1 Btu_IT/(lbm·°F) = 1 cal_IT/(g·°C).
 * NIST SP 811 (2008), App. B.8 prints 1.055 056 E+03.
 */
export const BTU_IT = 1055.05585262;

/** 1 Btu_IT/lbm = 2326 J/kg exactly (= BTU_IT / POUND_MASS, checked in the tests). NIST SP 811 (2008), App. B.8 prints 2.326 E+03 (boldface). */
export const BTU_PER_LBM = 2326;

/**
 * 1 Btu_IT/(lbm·°R) = 1 Btu_IT/(lbm·°F) = 4186.8 J/(kg·K) exactly.
 * NIST SP 811 (2008), App. B.8 prints 4.1868 E+03 (boldface).
 */
export const BTU_PER_LBM_RANKINE = 4186.8;

/** 1 ft³ = 0.028316846592 m³ exactly. NIST SP 811 (2008), App. B.8 prints 2.831 685 E-02. */
export const CUBIC_FOOT = FOOT * FOOT * FOOT;

/** 1 US gallon = 231 in³ = 3.785411784 × 10⁻³ m³ exactly. NIST SP 811 (2008), App. B.8 prints 3.785 412 E-03. */
export const US_GALLON = 231 * INCH * INCH * INCH;

/** 1 ft³/lbm = 0.0624279606… m³/kg. NIST SP 811 (2008), App. B.8 prints 6.242 796 E-02. */
export const CUBIC_FOOT_PER_LBM = CUBIC_FOOT / POUND_MASS;

/** 1 lbm/ft³ = 16.0184633739… kg/m³. NIST SP 811 (2008), App. B.8 prints 1.601 846 E+01. */
export const LBM_PER_CUBIC_FOOT = POUND_MASS / CUBIC_FOOT;

/** 1 Btu_IT/h = 0.29307107… W. NIST SP 811 (2008), App. B.8 prints 2.930 711 E-01. */
export const BTU_PER_HOUR = BTU_IT / 3600;

/** 1 hp (550 ft·lbf/s) = 745.69987158… W. NIST SP 811 (2008), App. B.8 prints 7.456 999 E+02. */
export const HORSEPOWER = 550 * FOOT * POUND_FORCE;

/** 1 lbm/h = 1.2599788… × 10⁻⁴ kg/s. NIST SP 811 (2008), App. B.8 prints 1.259 979 E-04. */
export const LBM_PER_HOUR = POUND_MASS / 3600;

/** 1 °R = 1 °F (as an interval) = 5/9 K exactly. NIST SP 811 (2008), App. B.8 and B.9. */
export const RANKINE = 5 / 9;

/** T/°F = T/K × 1.8 − 459.67 exactly. NIST SP 811 (2008), App. B.9. */
export const FAHRENHEIT_OFFSET = 459.67;

/** T/°C = T/K − 273.15 exactly. NIST SP 811 (2008), App. B.9. */
export const CELSIUS_OFFSET = 273.15;

/** Default atmospheric pressure for gauge readings; its home is the engine, which applies it too. */
export { DEFAULT_ATMOSPHERE } from '$lib/thermo/constants';
