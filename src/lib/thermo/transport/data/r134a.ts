/**
 * R-134a's viscosity: the fluid-specific correlation of Huber, Laesecke & Perkins (2003), "Model for
 * the Viscosity and Thermal Conductivity of Refrigerants, Including a New Correlation for the
 * Viscosity of R134a", Ind. Eng. Chem. Res. 42, 3163 (not its extended-corresponding-states model):
 * η = η0(T) + η0(T) B_η(T) ρ_n + Δη_h(ρ, T), Δη_h = Σ e_i τ^t_i δ^d_i + c7 [1/(δ0 − δ) − 1/δ0],
 * δ0 = c10/(1 + c8 T_r + c9 T_r²), in mPa·s for the residual.
 * Copies compared term by term: CoolProp dev/fluids/R134a.json (TRANSPORT.viscosity, Huber-IECR-2003)
 * and pychemqt lib/mEoS/R134a.py ("Huber (2003)" visco1 and _closePacked). They agree except σ, given
 * as 0.468932 nm by CoolProp and 0.46893 nm by pychemqt (4e−6 apart; the longer one is kept).
 */
export const r134aViscosity = {
	/** η0 = 0.021357 √(M T)/(σ² S*) μPa·s (M g/mol, σ nm), ln S* = Σ a_i (ln T*)^i, T* = T/(ε/k) */
	dilute: {
		chapman: 0.021357,
		M: 102.031837,
		sigmaNm: 0.468932,
		epsK: 299.363,
		a: [0.355404, -0.464337, 0.0257353]
	},
	/** B*_η = Σ b_i T*^t_i, B_η = N_A σ³ B*_η */
	initialDensity: {
		b: [
			-19.572881, 219.73999, -1015.3226, 2471.01251, -3375.1717, 2491.6597, -787.26086, 14.085455,
			-0.34664158
		],
		t: [0, -0.25, -0.5, -0.75, -1, -1.25, -1.5, -2.5, -5.5]
	},
	/** Δη_h: τ = Tc/T, δ = ρ/ρc, T_r = T/Tc; e_i and c7 in mPa·s */
	residual: {
		Tc: 374.21,
		rhoc: 511.9,
		e: [-0.0206900719, 0.000356029549, 0.00211101816, 0.0139601415, -0.0045643502, -0.00351593275],
		t: [0, 6, 2, 0.5, -2, 0],
		d: [1, 2, 2, 2, 2, 3],
		c7: 0.21476332,
		c8: -0.0890173375,
		c9: 0.100035295,
		c10: 3.163695636
	}
} as const;
