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
import type { OlchowySengers } from '../forms.ts';

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

/**
 * R-134a's thermal conductivity: Perkins, Laesecke, Howley, Ramires, Gurova & Cusco (2000),
 * "Experimental Thermal Conductivity Values for the IUPAC Round-Robin Sample of
 * 1,1,1,2-Tetrafluoroethane (R134a)", NIST Interagency Report NISTIR 6605, doi:10.6028/NIST.IR.6605:
 * λ = λ0(T) + Δλ(ρ) + Δλc(ρ, T), λ0 = a0 + a1 T, Δλ = λ_red Σ b_i (ρ/ρ_red)^i (W/(m·K)), and the
 * simplified Olchowy–Sengers critical enhancement.
 * Copies compared term by term: CoolProp dev/fluids/R134a.json (TRANSPORT.conductivity, stored with
 * λ_red folded into the b_i; commit ea27c639), pychemqt lib/mEoS/R134a.py ("Perkins (2000)" thermo0;
 * commit a26588c5), IDAES idaes/models/properties/general_helmholtz/components/parameters/r134a.py
 * (thermal_conductivity_rule; commit a60fbf81) and HelmholtzMedia
 * HelmholtzMedia/HelmholtzFluids/R134a/package.mo (thermalConductivityCoefficientsR134a; commit
 * 2045ee57). Every coefficient agrees (CoolProp stores q_D = 1892020000 m⁻¹ = 1/5.285356e−10 m).
 * The critical point scaling the enhancement is the equation of state's (374.21 K, 511.9 kg/m³,
 * 4.05928 MPa) in pychemqt, CoolProp and HelmholtzMedia; IDAES takes ρ_red (515.25 kg/m³) for ρc
 * there, which changes λ by under 1e−4 relative except within a few kelvin of Tc.
 */
export const r134aConductivity = {
	/** λ0 = a0 + a1 T, W/(m·K), T in K */
	dilute: { a: [-1.05248e-2, 8.00982e-5] },
	/** Δλ = λ_red Σ b_i (ρ/ρ_red)^i, i = 1…4; ρ_red = 5.049886 mol/dm³ × 102.032 g/mol */
	residual: {
		lambdaRed: 2.055e-3,
		rhoRed: 5.049886 * 102.032,
		b: [1.836526, 5.126143, -1.436883, 0.6261441]
	},
	/** the critical enhancement's terms (Olchowy–Sengers), SI */
	critical: {
		Tc: 374.21,
		rhoc: 511.9,
		Pc: 4.05928e6,
		Tref: 561.411,
		xi0: 1.94e-10,
		Gamma: 0.0496,
		nu: 0.63,
		gamma: 1.239,
		qDinv: 5.285356e-10,
		R0: 1.03
	} satisfies OlchowySengers
} as const;
