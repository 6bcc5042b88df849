/**
 * Carbon dioxide's transport coefficients.
 *
 * Viscosity: Laesecke & Muzny (2017), "Reference Correlation for the Viscosity of Carbon Dioxide",
 * J. Phys. Chem. Ref. Data 46, 013107: η = η0(T) + ρ_n B_η(T) η0(T) + Δη(ρ, T) (its Eqs. 4, 5–7, 8–9).
 * Thermal conductivity: Huber, Sykioti, Assael & Perkins (2016), "Reference Correlation of the Thermal
 * Conductivity of Carbon Dioxide from the Triple Point to 1100 K and up to 200 MPa",
 * J. Phys. Chem. Ref. Data 45, 013102: λ = λ0(T) + Δλ(ρ, T) + Δλc(ρ, T) (its Eqs. 3, 4 and 6–9).
 * Copies compared term by term: CoolProp dev/fluids/CarbonDioxide.json and its TransportRoutines.cpp
 * (viscosity_dilute_CO2_LaeseckeJPCRD2017, viscosity_CO2_higher_order_hardcoded_LaeseckeJPCRD2017,
 * conductivity_dilute_hardcoded_CO2_HuberJPCRD2016), and pychemqt lib/mEoS/CO2.py ("Laesecke (2017)",
 * "Huber (2016)"); they agree.
 */
import type { OlchowySengers } from '../forms.ts';

export const co2Viscosity = {
	/** molar mass of the correlation, kg/mol */
	M: 0.0440095,
	/** Eq. 4: η0 = 1.0055 √T / (a0 + a1 T^(1/6) + a2 exp(a3 T^(1/3)) + (a4 + a5 T^(1/3))/exp(T^(1/3)) + a6 √T), mPa·s */
	dilute: {
		numerator: 1.0055,
		a: [
			1749.35489318835, -369.069300007128, 5423856.34887691, -2.21283852168356, -269503.247933569,
			73145.021531826, 5.34368649509278
		]
	},
	/** Rainwater–Friend second viscosity virial: B*_η = Σ b_i T*^t_i, T* = T/(ε/k), B_η = N_A σ³ B*_η */
	initialDensity: {
		epsK: 200.76,
		sigma: 0.378421e-9,
		b: [
			-19.572881, 219.73999, -1015.3226, 2471.0125, -3375.1717, 2491.6597, -787.26086, 14.085455,
			-0.34664158
		],
		t: [0, -0.25, -0.5, -0.75, -1, -1.25, -1.5, -2.5, -5.5]
	},
	/**
	 * Eq. 8: Δη = η_tL (c1 Tr ρr³ + (ρr² + ρr^γ)/(Tr − c2)), Tr = T/Tt, ρr = ρ/ρ_tL; Eq. 9:
	 * η_tL = ρ_tL^(2/3) √(R Tt)/(M^(1/6) N_A^(1/3))
	 */
	residual: {
		c1: 0.360603235428487,
		c2: 0.121550806591497,
		gamma: 8.06282737481277,
		Tt: 216.592,
		rhoTL: 1178.53
	}
} as const;

export const co2Conductivity = {
	/** Eq. 3: λ0 = √Tr / Σ L_k/Tr^k, mW/(m·K), Tr = T/Tc */
	dilute: { Tc: 304.1282, L: [1.51874307e-2, 2.8067404e-2, 2.2856419e-2, -7.4162421e-3] },
	/** Eq. 4: Δλ = Σ (B1,i + B2,i Tr) ρr^i, i = 1…6, W/(m·K); ρr = ρ/ρc */
	residual: {
		Tc: 304.1282,
		rhoc: 467.6,
		B1: [1.00128e-2, 5.60488e-2, -8.1162e-2, 6.24337e-2, -2.06336e-2, 2.53248e-3],
		B2: [4.30829e-3, -3.58563e-2, 6.7148e-2, -5.22855e-2, 1.74571e-2, -1.96414e-3]
	},
	/** the critical enhancement's terms (Olchowy–Sengers), SI */
	critical: {
		Tc: 304.1282,
		rhoc: 467.6,
		Pc: 7.3773e6,
		Tref: 456.19,
		xi0: 1.5e-10,
		Gamma: 0.052,
		nu: 0.63,
		gamma: 1.239,
		qDinv: 0.4e-9,
		R0: 1.02
	} satisfies OlchowySengers,
	/** the title's range: triple point to 1100 K, up to 200 MPa */
	range: { Tmax: 1100, Pmax: 200e6 }
} as const;
