/**
 * Methane's viscosity and thermal conductivity: Friend, Ely & Ingham (1989), "Thermophysical
 * Properties of Methane", J. Phys. Chem. Ref. Data 18, 583–638.
 *
 * Why this one: it is the methane correlation for both μ and λ that two independent public libraries
 * carry with the paper's printed values beside it (its Appendix tables A1–A3, quoted in pychemqt's
 * tests; four λ values in CoolProp's tests). The newer viscosity model that CoolProp uses by default
 * for methane (the friction theory of Quiñones-Cisneros & Deiters, 2006) comes with no printed check
 * values in either library, and no newer thermal-conductivity correlation is carried by both.
 *
 * η = η0(T) + ηr(ρ, T), μPa·s:
 *   η0 = 10.50 √T* / Ω(2,2)(T*), 1/Ω(2,2) = Σ C_i T*^((i−3)/3) (i = 0…8), T* = T/174 K;
 *   ηr = 12.149 Σ g_i δ^r_i τ^s_i / (1 + g9 δ + g10 δ τ), δ = ρ/ρc, τ = Tc/T.
 * λ = λ0(T) + λr(ρ, T) + λc(ρ, T), mW/(m·K):
 *   λ0 = 0.51828 η0 [3.75 − f_int (τ² ∂²φ⁰/∂τ² + 1.5)], f_int = 1.45885 − 0.4377162/T*
 *      (−τ² ∂²φ⁰/∂τ² = c_v⁰/R, from the ideal part of the equation of state);
 *   λr = 6.29638 [Σ j_i δ^r_i τ^s_i + j7 δ²/δσ*], δσ* = ρ″(T)/ρc for T < Tc and ρ < ρc, else 1;
 *   λc = 91.855/(η τ²) · X² · χ*^0.4681 · F, X = (∂p/∂T)_ρ/(ρR), χ* = 0.28631 δ τ RT/(∂p/∂ρ)_T,
 *      F = exp(−2.646 |T′|^½ − 2.678 ρ′² + 0.637 ρ′), T′ = 1 − T/Tc, ρ′ = 1 − δ, η in μPa·s.
 *
 * Coefficients read from two public copies and compared term by term: CoolProp/CoolProp
 * src/Backends/Helmholtz/TransportRoutines.cpp, conductivity_hardcoded_methane (which carries the
 * viscosity as well), commit ea27c6394887390270a03dcd0ad00a1274be4efc; and jjgomera/pychemqt
 * lib/mEoS/CH4.py, visco3 and thermo0 "Friend (1989)" with _ThCritical, and the forms in lib/meos.py
 * (_Omega type 2, the no_viscoCp and nr_s terms), commit a26588c5bc2fe861cf39431d66a2145282be8f64.
 * Every C_i, g_i, j_i, exponent and constant agrees digit for digit, with these differences of form:
 * - Tc of δ, τ: pychemqt 190.551 K (Friend's equation of state's critical temperature), CoolProp
 *   190.55 K; 190.551 K is used (the difference, 5e−6 in τ, is far below the printed digits).
 * - ρc = 10.139 mol/dm³ in both; turned into kg/m³ with Friend's M = 16.043 g/mol (pychemqt's thermo0).
 * - the factor of λ0: CoolProp 0.51828 (the paper's), pychemqt R/M of its equation of state; 0.51828.
 * - δσ*: both read the paper's "11" as a misprint for 1; both take ρ″ from an ancillary equation,
 *   here from this engine's saturation solution of its own equation of state.
 * - near the critical point (|T′| < 0.03 and |ρ′| < 0.03) the paper takes χ* from a scaled equation
 *   (its Eqs. 23 and 26); only CoolProp carries those constants, pychemqt uses Eq. 19 throughout.
 *   With one copy that form is not built: λc keeps Eq. 19 there too (as pychemqt does), so inside
 *   that small window λ is Eq. 19's, not the paper's tabulated figure; the source text says so.
 *
 * The paper fitted all this with its own 32-term equation of state; this engine's methane is
 * Setzmann & Wagner (1991). μ and the background of λ need only (T, ρ) and are the paper's at any
 * (T, ρ); but a state's ρ at given (T, p) differs between the two equations (by 1.6e−3 at 250 K,
 * 50 MPa), so μ and λ of a state fixed by (T, p) differ from the paper's tables by a few tenths of a
 * per cent in dense states (0.3 % in η there). λ0 takes c_v⁰ and λc takes (∂p/∂T)_ρ and (∂p/∂ρ)_T
 * from this engine's equation (its c_p⁰ at 400 K is 40.608 J/(mol·K) against the 40.613 of the paper's Table A1,
 * which lowers λ0 by 0.006 mW/(m·K)). Within about a
 * kelvin of the critical point the paper's tables come from a scaled equation of state and λ here
 * (classical equation, Eq. 19) departs from them by several per cent (94–95 against 100.3 mW/(m·K) for
 * the saturated liquid at 190 K).
 */
export const methaneTransport = {
	/** Friend's reducing point: K, mol/dm³ × g/mol → kg/m³ */
	Tc: 190.551,
	rhoc: 10.139 * 16.043,
	viscosity: {
		/** ε/k of T* = T/174 K, and the factor 10.50 μPa·s */
		epsK: 174,
		eta0: 10.5,
		/** C_i of 1/Ω(2,2) = Σ C_i T*^((i−3)/3) */
		C: [
			-3.0328138281, 16.918880086, -37.189364917, 41.288861858, -24.61592114, 8.9488430959,
			-1.8739245042, 0.2096610139, -9.6570437074e-3
		],
		/** ηr numerator g_i δ^r_i τ^s_i, μPa·s after the factor 12.149 */
		g: [
			0.41250137, -0.14390912, 0.10366993, 0.40287464, -0.24903524, -0.12953131, 0.06575776,
			0.02566628, -0.03716526
		],
		r: [1, 1, 2, 2, 2, 3, 3, 4, 4],
		s: [0, 1, 0, 1, 1.5, 0, 2, 0, 1],
		/** denominator 1 + g9 δ + g10 δ τ */
		g9: -0.38798341,
		g10: 0.03533815,
		factor: 12.149
	},
	conductivity: {
		/** λ0 = lambda0 · η0 [3.75 + f_int (c_v⁰/R − 1.5)] mW/(m·K), f_int = f[0] + f[1]/T* */
		lambda0: 0.51828,
		f: [1.45885, -0.4377162],
		/** λr = factor [Σ j_i δ^r_i τ^s_i + j7 δ²/δσ*] mW/(m·K) */
		j: [2.4149207, 0.55166331, -0.52837734, 0.073809553, 0.24465507, -0.047613626],
		r: [1, 3, 4, 4, 5, 5],
		s: [0, 0, 0, 1, 0, 1],
		j7: 1.5554612,
		factor: 6.29638,
		/** λc (Eq. 19), mW/(m·K) with η in μPa·s */
		critical: {
			A: 91.855,
			chi: 0.28631,
			power: 0.4681,
			FT: 2.646,
			Frho: 2.678,
			FA: -0.637
		}
	},
	/**
	 * The range of Friend's formulation: about 91 K (the triple point) to 600 K (the paper's abstract,
	 * as read in a public copy of its first page), pressures to 100 MPa (the limit pychemqt records
	 * for Friend's equation of state)
	 */
	range: { Tmax: 600, Pmax: 100e6 }
} as const;
