/**
 * R-1234ze(E) (trans-1,3,3,3-tetrafluoropropene) transport coefficients.
 *
 * Viscosity: Huber & Assael (2016), "Correlations for the viscosity of 2,3,3,3-tetrafluoroprop-1-ene
 * (R1234yf) and trans-1,3,3,3-tetrafluoropropene (R1234ze(E))", Int. J. Refrig. 71, 39–45,
 * doi:10.1016/j.ijrefrig.2016.08.007: η = η0(T) + η0(T) B_η(T) ρ_n + Δη(ρ, T), in μPa·s.
 * Its abstract (NIST author manuscript, PubMed Central PMC5103321) gives the range: triple point
 * (169 K) to 420 K at pressures up to 100 MPa.
 * Copies compared term by term: pychemqt lib/mEoS/R1234zeE.py ("Huber (2016)" visco0; commit
 * a26588c5) and IDAES idaes/models/properties/general_helmholtz/components/parameters/r1234ze.py
 * (viscosity_rule; commit a60fbf81). They agree except
 *  - the Lennard-Jones σ of the initial-density term: 0.5 nm (pychemqt) against 0.5017 nm (IDAES,
 *    the σ of CoolProp's older corresponding-states model for this fluid). Only 0.5 nm reproduces the
 *    paper's printed liquid check value (217.89 μPa·s at 300 K, 10.522 mol/dm³; 0.5017 nm gives
 *    217.67), so 0.5 nm is kept;
 *  - b3 of the Rainwater–Friend sum, 2471.01251 (pychemqt) against 2471.0125 (IDAES; 4e−9 relative).
 * The residual is reduced by 382.513 K and 4.29 mol/dm³ in both copies.
 *
 * Thermal conductivity: Perkins & Huber (2011), "Measurement and Correlation of the Thermal
 * Conductivity of 2,3,3,3-Tetrafluoroprop-1-ene (R1234yf) and trans-1,3,3,3-Tetrafluoropropene
 * (R1234ze(E))", J. Chem. Eng. Data 56, 4868–4874, doi:10.1021/je200811n:
 * λ = λ0(T) + Δλ(ρ, T) + Δλc(ρ, T), in W/(m·K).
 * Copies compared term by term: CoolProp dev/fluids/R1234ze(E).json (TRANSPORT.conductivity,
 * Perkins-JCED-2011; commit ea27c639), pychemqt lib/mEoS/R1234zeE.py ("Perkins (2011)" thermo0) and
 * IDAES r1234ze.py (thermal_conductivity_rule, without the critical enhancement); they agree. The
 * paper's critical point (382.52 K, 489.24 kg/m³, 3.6363 MPa) is that of the equation of state it
 * used; pychemqt takes ρc = 489.238 kg/m³ for the enhancement (4e−6 relative apart).
 */
import type { OlchowySengers } from '../forms.ts';
import type { HuberAssaelViscosity, PerkinsHuberConductivity } from '../refrigerant-forms.ts';

export const r1234zeEViscosity: HuberAssaelViscosity = {
	M: 114.0416,
	/** η0 = Σ a_i T^i / Σ d_i T^i, μPa·s */
	dilute: { a: [-963382, 9614.09, -13.233, 0.0360562], d: [122059, -224.741, 1] },
	/** B*_η = Σ b_i T*^t_i, T* = T/(ε/k); B_η = N_A σ³ B*_η */
	initialDensity: {
		epsK: 340,
		sigmaNm: 0.5,
		b: [
			-19.572881, 219.73999, -1015.3226, 2471.0125, -3375.1717, 2491.6597, -787.26086, 14.085455,
			-0.34664158
		],
		t: [0, -0.25, -0.5, -0.75, -1, -1.25, -1.5, -2.5, -5.5]
	},
	/**
	 * Δη = δ^(2/3) Tr^(1/2) [c0 + c1 δ + c2 δ² + (c3 δ + c4 δ⁶ + c5 δ Tr² + c6 δ⁵ Tr)/(c7 Tr + c8 δ Tr)],
	 * δ = ρ/ρc, Tr = T/Tc; μPa·s
	 */
	residual: {
		Tc: 382.513,
		rhocMolar: 4.29,
		c: [8.61691913, 0, 20.83024738, 0, 0.5424369, -10.49684841, -1.38137689, 1, 0]
	},
	range: { Tmin: 169, Tmax: 420, Pmax: 100e6 }
};

export const r1234zeEConductivity: PerkinsHuberConductivity = {
	/** λ0 = Σ a_i Tr^i, Tr = T/Tc, W/(m·K) */
	dilute: { Tc: 382.52, a: [-0.0103589, 0.0308929, 0.000230348] },
	/** Δλ = Σ_{i=1..5} (B1,i + B2,i Tr) δ^i, δ = ρ/ρc, W/(m·K) */
	residual: {
		Tc: 382.52,
		rhoc: 489.24,
		B1: [-0.0428296, 0.0927099, -0.0702107, 0.0249708, -0.00301838],
		B2: [0.0434288, -0.0605844, 0.0440187, -0.0155082, 0.0021019]
	},
	/** the paper's critical enhancement (Olchowy–Sengers), SI; Tref = 1.5 Tc */
	critical: {
		Tc: 382.52,
		rhoc: 489.24,
		Pc: 3.6363e6,
		Tref: 573.78,
		xi0: 1.94e-10,
		Gamma: 0.0496,
		nu: 0.63,
		gamma: 1.239,
		qDinv: 5.835e-10,
		R0: 1.03
	} satisfies OlchowySengers
};
