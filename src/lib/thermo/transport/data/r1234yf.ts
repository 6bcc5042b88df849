/**
 * R-1234yf (2,3,3,3-tetrafluoropropene) transport coefficients.
 *
 * Viscosity: Huber & Assael (2016), "Correlations for the viscosity of 2,3,3,3-tetrafluoroprop-1-ene
 * (R1234yf) and trans-1,3,3,3-tetrafluoropropene (R1234ze(E))", Int. J. Refrig. 71, 39–45,
 * doi:10.1016/j.ijrefrig.2016.08.007: η = η0(T) + η0(T) B_η(T) ρ_n + Δη(ρ, T), in μPa·s.
 * Its abstract (NIST author manuscript, PubMed Central PMC5103321) gives the range: triple point
 * (220 K) to 410 K at pressures up to 30 MPa.
 * Copies compared term by term: pychemqt lib/mEoS/R1234yf.py ("Huber (2016)" visco0; commit a26588c5)
 * and a public MATLAB copy R1234yf_mu.m (found by exact-number search of public
 * repositories; the search did not name its repository); the dilute-gas terms also in the Fortran
 * source of the TREND library (its "R1234yf approximation of collision integral"). They agree, except
 * b3 of the Rainwater–Friend sum, 2471.01251 in pychemqt against 2471.0125 in the MATLAB copy (4e−9
 * relative; 2471.0125 kept, as in data/carbon-dioxide.ts). The residual is reduced by the critical
 * point of the equation of state the paper used (Richter, McLinden & Lemmon 2011: 367.85 K,
 * 4.17 mol/dm³), as in the MATLAB copy; pychemqt now reduces by 4.18 mol/dm³ (Lemmon & Akasaka 2022),
 * which misses the paper's liquid check value by 1 %; 4.17 reproduces all three.
 *
 * Thermal conductivity: Perkins & Huber (2011), "Measurement and Correlation of the Thermal
 * Conductivity of 2,3,3,3-Tetrafluoroprop-1-ene (R1234yf) and trans-1,3,3,3-Tetrafluoropropene
 * (R1234ze(E))", J. Chem. Eng. Data 56, 4868–4874, doi:10.1021/je200811n:
 * λ = λ0(T) + Δλ(ρ, T) + Δλc(ρ, T), in W/(m·K).
 * Copies compared term by term: CoolProp dev/fluids/R1234yf.json (TRANSPORT.conductivity,
 * Perkins-JCED-2011; commit ea27c639) and pychemqt lib/mEoS/R1234yf.py ("Perkins (2011)" thermo0);
 * they agree (CoolProp stores q_D = 1713796058.2 m⁻¹, pychemqt q_D⁻¹ = 5.835e−10 m).
 */
import type { OlchowySengers } from '../forms.ts';
import type { HuberAssaelViscosity, PerkinsHuberConductivity } from '../refrigerant-forms.ts';

export const r1234yfViscosity: HuberAssaelViscosity = {
	M: 114.0416,
	/** η0 = Σ a_i T^i / Σ d_i T^i, μPa·s */
	dilute: { a: [-836950, 6336.28, -2.3547, 0.0395563], d: [39509.1, 121.018, 1] },
	/** B*_η = Σ b_i T*^t_i, T* = T/(ε/k); B_η = N_A σ³ B*_η */
	initialDensity: {
		epsK: 275,
		sigmaNm: 0.531,
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
		Tc: 367.85,
		rhocMolar: 4.17,
		c: [-0.1942591, -2.079577245, 0, -43.47027288, 0, 0, 0, -3.53682791, 1]
	},
	range: { Tmin: 220, Tmax: 410, Pmax: 30e6 }
};

export const r1234yfConductivity: PerkinsHuberConductivity = {
	/** λ0 = Σ a_i Tr^i, Tr = T/Tc, W/(m·K) */
	dilute: { Tc: 367.85, a: [-0.0102778, 0.0291098, 0.000860643] },
	/** Δλ = Σ_{i=1..5} (B1,i + B2,i Tr) δ^i, δ = ρ/ρc, W/(m·K) */
	residual: {
		Tc: 367.85,
		rhoc: 475.55,
		B1: [-0.0368219, 0.0883226, -0.0705909, 0.0259026, -0.0032295],
		B2: [0.0397166, -0.077239, 0.0664707, -0.0249071, 0.00336228]
	},
	/** the paper's critical enhancement (Olchowy–Sengers), SI; Tref = 1.5 Tc */
	critical: {
		Tc: 367.85,
		rhoc: 475.55,
		Pc: 3.3822e6,
		Tref: 551.775,
		xi0: 1.94e-10,
		Gamma: 0.0496,
		nu: 0.63,
		gamma: 1.239,
		qDinv: 5.835e-10,
		R0: 1.03
	} satisfies OlchowySengers
};
