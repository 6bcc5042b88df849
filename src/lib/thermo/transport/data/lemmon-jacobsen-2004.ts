/**
 * Viscosity and thermal conductivity of nitrogen, argon, oxygen and air: Lemmon & Jacobsen (2004),
 * "Viscosity and Thermal Conductivity Equations for Nitrogen, Oxygen, Argon, and Air",
 * Int. J. Thermophys. 25, 21–69. The coefficients are the paper's (its tables of η and λ terms),
 * in its units: η terms in μPa·s, λ terms in mW/(m·K), ρc in mol/dm³, σ in nm, M in g/mol.
 * Copies compared term by term: CoolProp dev/fluids/{Nitrogen,Argon,Oxygen,Air}.json (TRANSPORT, stored
 * in SI) and pychemqt lib/mEoS/{N2,Ar,O2,Air}.py ("Lemmon (2004)" visco and thermo dicts); they agree.
 * Air is the paper's pseudo-pure air (M = 28.9586 g/mol, the molar mass this engine's air uses);
 * its Tc, ρc and pc are the paper's reducing values for air (the maxcondentherm, 132.6312 K).
 * The collision-integral terms b_i are shared by the three fluids (the paper's Table I).
 */
import type { CollisionDilute, OlchowySengers, TauDeltaSum } from '../forms.ts';

export interface LemmonJacobsenFluid {
	/** the paper's critical parameters: Tc (K), ρc (mol/dm³), pc (Pa) */
	Tc: number;
	rhocMolar: number;
	Pc: number;
	dilute: CollisionDilute;
	/** residual viscosity, μPa·s */
	viscosity: TauDeltaSum;
	/** λ0 = N1 η0/(μPa·s) + Σ N_i τ^t_i, mW/(m·K) */
	conductivityDilute: { N1: number; N: readonly number[]; t: readonly number[] };
	/** residual conductivity, mW/(m·K) */
	conductivity: TauDeltaSum;
	/** the Olchowy–Sengers terms other than Tc, ρc, pc: ξ0 (nm), Γ, q_D⁻¹ (nm), Tref (K) */
	critical: { xi0Nm: number; Gamma: number; qDinvNm: number; Tref: number };
}

/** ln Ω = Σ b_i (ln T*)^i, Lemmon & Jacobsen (2004), Table I */
const b = [0.431, -0.4623, 0.08406, 0.005341, -0.00331] as const;

/** R0, ν and γ of the paper's critical enhancement, the same for every fluid */
export const lemmonJacobsenUniversal = { R0: 1.01, nu: 0.63, gamma: 1.2415 } as const;

export const lemmonJacobsen2004: Record<
	'nitrogen' | 'argon' | 'oxygen' | 'air',
	LemmonJacobsenFluid
> = {
	nitrogen: {
		Tc: 126.192,
		rhocMolar: 11.1839,
		Pc: 3.3958e6,
		dilute: { M: 28.01348, sigmaNm: 0.3656, epsK: 98.94, b },
		viscosity: {
			N: [10.72, 0.03989, 0.001208, -7.402, 4.62],
			t: [0.1, 0.25, 3.2, 0.9, 0.3],
			d: [2, 10, 12, 2, 1],
			l: [0, 1, 1, 2, 3],
			gamma: [0, 1, 1, 1, 1]
		},
		conductivityDilute: { N1: 1.511, N: [2.117, -3.332], t: [-1.0, -0.7] },
		conductivity: {
			N: [8.862, 31.11, -73.13, 20.03, -0.7096, 0.2672],
			t: [0.0, 0.03, 0.2, 0.8, 0.6, 1.9],
			d: [1, 2, 3, 4, 8, 10],
			l: [0, 0, 1, 2, 2, 2],
			gamma: [0, 0, 1, 1, 1, 1]
		},
		critical: { xi0Nm: 0.17, Gamma: 0.055, qDinvNm: 0.4, Tref: 252.384 }
	},
	argon: {
		Tc: 150.687,
		rhocMolar: 13.40743,
		Pc: 4.863e6,
		dilute: { M: 39.948, sigmaNm: 0.335, epsK: 143.2, b },
		viscosity: {
			N: [12.19, 13.99, 0.005027, -18.93, -6.698, -3.827],
			t: [0.42, 0.0, 0.95, 0.5, 0.9, 0.8],
			d: [1, 2, 10, 5, 1, 2],
			l: [0, 0, 0, 2, 4, 4],
			gamma: [0, 0, 0, 1, 1, 1]
		},
		conductivityDilute: { N1: 0.8158, N: [-0.432], t: [-0.77] },
		conductivity: {
			N: [13.73, 10.07, 0.7375, -33.96, 20.47, -2.274, -3.973],
			t: [0.0, 0.0, 0.0, 0.8, 1.2, 0.8, 0.5],
			d: [1, 2, 4, 5, 6, 9, 1],
			l: [0, 0, 0, 2, 2, 2, 4],
			gamma: [0, 0, 0, 1, 1, 1, 1]
		},
		critical: { xi0Nm: 0.13, Gamma: 0.055, qDinvNm: 0.32, Tref: 301.374 }
	},
	oxygen: {
		Tc: 154.581,
		rhocMolar: 13.63,
		Pc: 5.043e6,
		dilute: { M: 31.9988, sigmaNm: 0.3428, epsK: 118.5, b },
		viscosity: {
			N: [17.67, 0.4042, 0.0001077, 0.351, -13.67],
			t: [0.05, 0.0, 2.1, 0.0, 0.5],
			d: [1, 5, 12, 8, 1],
			l: [0, 0, 0, 1, 2],
			gamma: [0, 0, 0, 1, 1]
		},
		conductivityDilute: { N1: 1.036, N: [6.283, -4.262], t: [-0.9, -0.6] },
		conductivity: {
			N: [15.31, 8.898, -0.7336, 6.728, -4.374, -0.4747],
			t: [0.0, 0.0, 0.3, 4.3, 0.5, 1.8],
			d: [1, 3, 4, 5, 7, 10],
			l: [0, 0, 0, 2, 2, 2],
			gamma: [0, 0, 0, 1, 1, 1]
		},
		critical: { xi0Nm: 0.24, Gamma: 0.055, qDinvNm: 0.51, Tref: 309.162 }
	},
	air: {
		Tc: 132.6312,
		rhocMolar: 10.4477,
		Pc: 3.78502e6,
		dilute: { M: 28.9586, sigmaNm: 0.36, epsK: 103.3, b },
		viscosity: {
			N: [10.72, 1.122, 0.002019, -8.876, -0.02916],
			t: [0.2, 0.05, 2.4, 0.6, 3.6],
			d: [1, 4, 9, 1, 8],
			l: [0, 0, 0, 1, 1],
			gamma: [0, 0, 0, 1, 1]
		},
		conductivityDilute: { N1: 1.308, N: [1.405, -1.036], t: [-1.1, -0.3] },
		conductivity: {
			N: [8.743, 14.76, -16.62, 3.793, -6.142, -0.3778],
			t: [0.1, 0.0, 0.5, 2.7, 0.3, 1.3],
			d: [1, 2, 3, 7, 7, 11],
			l: [0, 0, 2, 2, 2, 2],
			gamma: [0, 0, 1, 1, 1, 1]
		},
		critical: { xi0Nm: 0.11, Gamma: 0.055, qDinvNm: 0.31, Tref: 265.262 }
	}
};

/** The Olchowy–Sengers parameters of one fluid in SI. */
export function lemmonJacobsenCritical(f: LemmonJacobsenFluid): OlchowySengers {
	return {
		Tc: f.Tc,
		rhoc: f.rhocMolar * f.dilute.M,
		Pc: f.Pc,
		Tref: f.critical.Tref,
		xi0: f.critical.xi0Nm * 1e-9,
		Gamma: f.critical.Gamma,
		nu: lemmonJacobsenUniversal.nu,
		gamma: lemmonJacobsenUniversal.gamma,
		qDinv: f.critical.qDinvNm * 1e-9,
		R0: lemmonJacobsenUniversal.R0
	};
}
