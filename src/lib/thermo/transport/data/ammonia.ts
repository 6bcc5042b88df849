/**
 * Ammonia's viscosity: Monogenidou, Assael & Huber (2018), "Reference Correlation for the Viscosity
 * of Ammonia from the Triple Point to 725 K and up to 50 MPa", J. Phys. Chem. Ref. Data 47, 023102:
 * η = η0(T) + η0(T) B_η(T) ρ_n + Δη(ρ, T), in μPa·s.
 * One public copy of the coefficients was found (pychemqt lib/mEoS/NH3.py, "Monogenidou (2018)"
 * visco0; CoolProp still carries the 1995 correlation); the paper's three check values at 300 K
 * (fluids.test.ts), which exercise every term family, agree with it to their printed digits.
 * Thermal conductivity (same authors, J. Phys. Chem. Ref. Data 47, 043101) is not built: its one copy
 * notes that it misses the paper's tables above 600 kg/m³.
 */
export const ammoniaViscosity = {
	/** η0 = 0.021357 √(M T)/(σ² S*) μPa·s (M g/mol, σ nm), ln S* = Σ a_i (ln T*)^i, T* = T/(ε/k) */
	dilute: {
		chapman: 0.021357,
		M: 17.03052,
		sigmaNm: 0.2957,
		epsK: 386,
		a: [0.39175, -0.59918, -0.00022, 0.19871, -0.06942]
	},
	/** B*_η = Σ b_i T*^t_i (T* = T/386), B_η = N_A σ³ B*_η */
	initialDensity: {
		b: [
			-19.572881, 219.73999, -1015.3226, 2471.01251, -3375.1717, 2491.6597, -787.26086, 14.085455,
			-0.34664158
		],
		t: [0, -0.25, -0.5, -0.75, -1, -1.25, -1.5, -2.5, -5.5]
	},
	/** Δη = Σ n_i τ^t_i δ^d_i, τ = 405.56 K / T, δ = ρ/(233.25 kg/m³), μPa·s */
	residual: {
		Tc: 405.56,
		rhoc: 233.25,
		n: [0.0393308, 16.724735, 1.1975934, 0.0016995, -4.2399794],
		t: [-0.5, -0.5, -0.5, 3.5, -1.5],
		d: [2 / 3, 5 / 3, 14 / 3, 26 / 3, 8 / 3]
	},
	/** the title's range */
	range: { Tmax: 725, Pmax: 50e6 }
} as const;
