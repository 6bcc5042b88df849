/**
 * Normal hydrogen's viscosity and thermal conductivity.
 *
 * Viscosity: Muzny, Huber & Kazakov (2013), "Correlation for the Viscosity of Normal Hydrogen Obtained
 * from Symbolic Regression", J. Chem. Eng. Data 58, 969–979, with its erratum (J. Chem. Eng. Data 67
 * (2022) 2855), which gives the density scale of the residual term as 90.909090909 kg/m³ in place of
 * the 90.5 kg/m³ first printed (pychemqt's note; CoolProp uses the same scale). CoolProp's reference
 * list also notes two misprints of the paper: the exponent of T* in the virial sum (Eq. 7) is −i, and
 * B_η (Eq. 6) carries N_A. η = η0(T) + η0(T) B_η(T) ρ_n + Δη_h(ρ, T), in μPa·s.
 *
 * Thermal conductivity: Assael, Assael, Huber, Perkins & Takata (2011), "Correlation of the Thermal
 * Conductivity of Normal and Parahydrogen from the Triple Point to 1000 K and up to 100 MPa",
 * J. Phys. Chem. Ref. Data 40, 033101 (its normal-hydrogen coefficients):
 * λ = λ0(T) + Δλ(ρ, T) + Δλc(ρ, T), in W/(m·K).
 *
 * The numbers were read from two public copies and compared term by term:
 * CoolProp/CoolProp dev/fluids/Hydrogen.json (TRANSPORT) with the residual viscosity in
 * src/Backends/Helmholtz/TransportRoutines.cpp (viscosity_hydrogen_higher_order_hardcoded), commit
 * ea27c6394887390270a03dcd0ad00a1274be4efc; and jjgomera/pychemqt lib/mEoS/H2.py (visco0 "Muzny
 * (2013)", thermo0 "Assael (2011)"), commit a26588c5bc2fe861cf39431d66a2145282be8f64. Every
 * coefficient agrees digit for digit (CoolProp writes the residual viscosity factor in Pa·s,
 * 6.43449673e−6, pychemqt in μPa·s, 6.43449673; CoolProp the residual density factor as ×0.011,
 * pychemqt as ÷90.909090909; CoolProp the cut-off as q_D = 2.5e9 m⁻¹, pychemqt as q_D⁻¹ = 0.4e−9 m;
 * both take Tref = 1.5 Tc = 49.7175 K and ν = 0.63). A third public copy (BELFEM, the Berkeley Lab finite-element
 * framework, its Helmholtz hydrogen transport) prints b2 = 3.71513 and b4 = 9.09655 for the virial sum where the
 * two copies used here, and two further ones seen, have 3.7151 and 9.0965; the difference moves η by
 * under 1e−5 of itself at the check states, so it is not settled by the checks — the two agreeing
 * copies are used.
 */
export const hydrogenTransport = {
	/** the equation of state's critical point (Leachman et al. 2009), which both correlations reduce by */
	Tc: 33.145,
	/** kg/m³ (15.508 mol/dm³ × 2.01588 g/mol) */
	rhoc: 31.262,
	viscosity: {
		/** η0 = 0.021357 √(M T)/(σ² S*) μPa·s (M g/mol, σ nm), ln S* = Σ a_i (ln T*)^i, T* = T/(ε/k) */
		dilute: {
			chapman: 0.021357,
			M: 2.01588,
			sigmaNm: 0.297,
			epsK: 30.41,
			a: [0.20963, -0.455274, 0.143602, -0.0335325, 0.00276981]
		},
		/** B*_η = Σ b_i T*^t_i (T* = T/30.41), B_η = N_A σ³ B*_η */
		initialDensity: {
			b: [-0.187, 2.4871, 3.7151, -11.0972, 9.0965, -3.8292, 0.5166],
			t: [0, -1, -2, -3, -4, -5, -6]
		},
		/**
		 * Δη_h = c1 ρr² exp(c2 Tr + c3/Tr + c4 ρr²/(c5 + Tr) + c6 ρr⁶), μPa·s, Tr = T/33.145 K,
		 * ρr = ρ/ρsc with ρsc = 90.909090909 kg/m³ (the erratum's)
		 */
		residual: {
			rhoSc: 1 / 0.011,
			c: [6.43449673, 4.56334068e-2, 2.32797868e-1, 9.5832612e-1, 1.27941189e-1, 3.63576595e-1]
		},
		/** the abstract's: triple point to 1000 K, pressures to 200 MPa */
		range: { Tmax: 1000, Pmax: 200e6 }
	},
	conductivity: {
		/** λ0 = Σ A1_i Tr^i / Σ A2_i Tr^i, W/(m·K), Tr = T/33.145 K */
		dilute: {
			A1: [-0.340976, 4.5882, -1.4508, 0.326394, 0.00316939, 0.000190592, -1.139e-6],
			A2: [138.497, -22.1878, 4.57151, 1.0]
		},
		/** Δλ = Σ (B1_i + B2_i Tr) ρr^i, i = 1…5, W/(m·K), ρr = ρ/31.262 kg/m³ */
		residual: {
			B1: [0.0363081, -0.0207629, 0.031481, -0.0143097, 0.0017498],
			B2: [0.0018337, -0.00886716, 0.015826, -0.0106283, 0.00280673]
		},
		/** simplified Olchowy–Sengers (Eqs. 4–7), reduced by the equation of state's critical point */
		critical: {
			Tc: 33.145,
			rhoc: 31.262,
			Pc: 1.2964e6,
			Tref: 1.5 * 33.145,
			xi0: 1.5e-10,
			Gamma: 0.052,
			nu: 0.63,
			gamma: 1.2415,
			qDinv: 4e-10,
			R0: 1.01
		},
		/** the title's: triple point to 1000 K, up to 100 MPa */
		range: { Tmax: 1000, Pmax: 100e6 }
	}
} as const;
