/**
 * Propane's transport coefficients.
 *
 * Viscosity: Vogel, Küchenmeister, Bich & Laesecke (1998), "Reference Correlation of the Viscosity of
 * Propane", J. Phys. Chem. Ref. Data 27, 947–970:
 * η = η0(T) + η0(T) B_η(T) ρ_n + Δη_h(ρ, T), with η0 from a collision integral, B_η the
 * Rainwater–Friend second viscosity virial coefficient and Δη_h = Σ e_ij δ^i/T_r^j (i = 2…5, j = 0…2)
 * + f [δ/(δ0 − δ) − δ/δ0], δ0 = g1 (1 + g2 T_r^(1/2)) (the modified Batschinski–Hildebrand
 * close-packed term), δ = ρ/ρc, T_r = T/Tc, in μPa·s.
 * Why not the newer Vogel & Herrmann (2016), J. Phys. Chem. Ref. Data 45, 043103: one public copy of
 * its residual coefficients was found (pychemqt lib/mEoS/C3.py, "Vogel (2016)"; CoolProp still carries
 * the 1998 correlation), and the project asks for two compared term by term.
 *
 * Thermal conductivity: Marsh, Perkins & Ramires (2002), "Measurement and Correlation of the Thermal
 * Conductivity of Propane from 86 K to 600 K at Pressures to 70 MPa", J. Chem. Eng. Data 47, 932–940:
 * λ = λ0(T) + Δλ_r(ρ, T) + Δλ_c(ρ, T), λ0 = Σ A_i T_r^i, Δλ_r = Σ (B1,i + B2,i T_r) δ^i (i = 1…5),
 * in W/(m·K), and the simplified Olchowy–Sengers critical enhancement.
 *
 * Copies compared term by term (CoolProp/CoolProp dev/fluids/n-Propane.json, TRANSPORT section, commit
 * ea27c639; jjgomera/pychemqt lib/mEoS/C3.py, "Vogel (1998)" visco1 and "Marsh (2002)" thermo0, commit
 * a26588c5; and, as a third look, IDAES/idaes-pse
 * idaes/models/properties/general_helmholtz/components/parameters/propane.py):
 * - every e_ij, f, g1, a_i, b_i, σ, ε/k, M, A_i, B1,i, B2,i, ξ0, Γ, R0, γ and q_D⁻¹ = 0.716635 nm agree
 *   digit for digit (CoolProp stores e_ij and f in Pa·s, 1e−6 × the μPa·s figures; its close-packed
 *   g2 = 2.1517543007 is g1 × 0.860516059264, the product of the other copies' g1 and g2);
 * - they disagree on reducing constants. The viscosity's Δη_h temperature is 369.825 K in CoolProp,
 *   369.82 K in pychemqt and the equation of state's 369.89 K in IDAES; CoolProp's is kept (the
 *   paper's check values, printed to four digits, cannot tell them apart: 369.82 K moves η by 5e−5,
 *   369.89 K by up to 7e−4, both in the cold liquid). The conductivity's Δλ_r reducing point is
 *   369.82 K and 220.3 kg/m³ in CoolProp, 369.85 K and 5 mol/dm³ in pychemqt, 369.89 K and 5 mol/dm³
 *   in IDAES; pychemqt's is kept because it alone reproduces the REFPROP 9.1 saturated-liquid λ at
 *   368 K quoted in CoolProp's src/Tests/CoolProp-Tests.cpp (to 1e−6; CoolProp's own misses by 4e−4,
 *   IDAES's by 2e−5; hydrocarbons.test.ts).
 */
import type { OlchowySengers } from '../forms.ts';

export const propaneViscosity = {
	/** η0 = 0.021357 √(M T)/(σ² S*) μPa·s (M g/mol, σ nm), ln S* = Σ a_i (ln T*)^i, T* = T/(ε/k) */
	dilute: {
		chapman: 0.021357,
		M: 44.0956,
		sigmaNm: 0.49748,
		epsK: 263.88,
		a: [0.25104574, -0.47271238, 0, 0.060836515]
	},
	/** B*_η = Σ b_i T*^t_i, B_η = N_A σ³ B*_η */
	initialDensity: {
		b: [
			-19.572881, 219.73999, -1015.3226, 2471.01251, -3375.1717, 2491.6597, -787.26086, 14.085455,
			-0.34664158
		],
		t: [0, -0.25, -0.5, -0.75, -1, -1.25, -1.5, -2.5, -5.5]
	},
	/** Δη_h = Σ e_ij δ^i/T_r^j + f [δ/(δ0 − δ) − δ/δ0], δ0 = g1 (1 + g2 √T_r); μPa·s */
	higherOrder: {
		Tc: 369.825,
		/** ρc, mol/dm³ × M: 5 mol/dm³ */
		rhoc: 5 * 44.0956,
		/** e_ij for i = 2…5 (rows), j = 0…2 (columns) */
		e: [
			[35.9873030195, -180.512188564, 87.7124888223],
			[-105.773052525, 205.319740877, -129.21093261],
			[58.9491587759, -129.7400331, 76.6280419971],
			[-9.59407868475, 21.0726986598, -14.3971968187]
		],
		f: 1616.88405374,
		g1: 2.50053938863,
		g2: 0.860516059264
	},
	/**
	 * 90 K to 600 K, up to 100 MPa: the span of the paper's table of values (its Table 4 as transcribed
	 * by pychemqt); the paper's own statement of range could not be read here
	 */
	range: { Tmax: 600, Pmax: 100e6 }
} as const;

export const propaneConductivity = {
	/**
	 * λ0 = Σ a_i T_r^i W/(m·K), T_r = T/369.85 K (CoolProp and pychemqt; IDAES reduces by 369.89 K): the
	 * REFPROP 9.1 dilute-gas λ at 368 K quoted in CoolProp's tests is reproduced to 1e−14 with 369.85 K
	 */
	dilute: { Tc: 369.85, a: [-0.00124778, 0.00816371, 0.0199374] },
	/** Δλ_r = Σ (B1,i + B2,i T_r) δ^i, i = 1…5, W/(m·K); pychemqt's reducing point (see above) */
	residual: {
		Tc: 369.85,
		rhoc: 5 * 44.09562,
		B1: [-0.03695, 0.148658, -0.119986, 0.0412431, -0.00486905],
		B2: [0.0482798, -0.135636, 0.117588, -0.0436911, 0.00616079]
	},
	/**
	 * Olchowy–Sengers terms (SI). ξ0, Γ, γ, R0 and q_D⁻¹ in all three copies; Tref 554.73 K (1.5 × 369.82 K)
	 * and ν 0.63 in pychemqt and IDAES (CoolProp's file gives neither and falls back on its defaults);
	 * Pc 4.2512 MPa and ρc 5 mol/dm³ are the equation of state's (IDAES names them).
	 */
	critical: {
		Tc: 369.89,
		rhoc: 5 * 44.09562,
		Pc: 4.2512e6,
		Tref: 554.73,
		xi0: 0.194e-9,
		Gamma: 0.0496,
		nu: 0.63,
		gamma: 1.239,
		qDinv: 0.716635e-9,
		R0: 1.03
	} satisfies OlchowySengers,
	/** the title's range: 86 K to 600 K, pressures to 70 MPa */
	range: { Tmax: 600, Pmax: 70e6 }
} as const;
