/**
 * Viscosity and thermal conductivity of the light hydrocarbons: propane and isobutane. Each
 * viscosity is a Vogel et al. correlation (dilute gas from a collision integral, the Rainwater–Friend
 * initial-density term, a double polynomial in δ and 1/T_r and a close-packed term); each
 * conductivity a Perkins et al. one (polynomial dilute gas, polynomial residual in δ and T_r, and the
 * Olchowy–Sengers critical enhancement from this engine's equation of state). Coefficients and the
 * copies they were read from: data/propane.ts, data/isobutane.ts.
 */
import { criticalEnhancement } from './enhancement.ts';
import { diluteAndInitial } from './forms.ts';
import { perkinsHuberBackground } from './refrigerant-forms.ts';
import type { FluidCorrelation } from './fluids.ts';
import { propaneConductivity, propaneViscosity } from './data/propane.ts';
import { isobutaneViscosity } from './data/isobutane.ts';

/** the shape shared by data/propane.ts and data/isobutane.ts */
export interface VogelViscosity {
	dilute: { chapman: number; M: number; sigmaNm: number; epsK: number; a: readonly number[] };
	initialDensity: { b: readonly number[]; t: readonly number[] };
	higherOrder: {
		Tc: number;
		rhoc: number;
		e: readonly (readonly number[])[];
		f: number;
		g1: number;
		g2: number;
	};
}

/** η in Pa·s at T (K) and ρ (kg/m³). */
export function vogelViscosity(v: VogelViscosity, T: number, rho: number): number {
	// η0 (1 + B_η ρ_n), μPa·s
	const dilute = diluteAndInitial(v.dilute, v.initialDensity, T, rho);
	const h = v.higherOrder;
	const delta = rho / h.rhoc;
	const Tr = T / h.Tc;
	let poly = 0;
	for (let i = 0; i < h.e.length; i++) {
		const row = h.e[i];
		let c = 0;
		for (let j = row.length - 1; j >= 0; j--) c = c / Tr + row[j];
		poly += c * delta ** (i + 2);
	}
	const delta0 = h.g1 * (1 + h.g2 * Math.sqrt(Tr));
	const closePacked = h.f * (delta / (delta0 - delta) - delta / delta0);
	return (dilute + poly + closePacked) * 1e-6;
}

export const propane: FluidCorrelation = {
	sources: {
		mu: 'Vogel, Küchenmeister, Bich & Laesecke (1998), J. Phys. Chem. Ref. Data 27, 947',
		k: 'Marsh, Perkins & Ramires (2002), J. Chem. Eng. Data 47, 932 (critical enhancement with this engine’s equation of state)'
	},
	range: { mu: propaneViscosity.range, k: propaneConductivity.range },
	mu: (T, rho) => vogelViscosity(propaneViscosity, T, rho),
	k: (T, rho, mu) =>
		perkinsHuberBackground(propaneConductivity, T, rho) +
		criticalEnhancement('propane', propaneConductivity.critical, T, rho, mu)
};

export const isobutane: FluidCorrelation = {
	sources: {
		mu: 'Vogel, Küchenmeister & Bich (2000), Int. J. Thermophys. 21, 343',
		k: ''
	},
	// the paper's statement of range could not be read here: applied within the equation of state's
	range: { mu: {}, k: {} },
	mu: (T, rho) => vogelViscosity(isobutaneViscosity, T, rho),
	noK: 'The thermal conductivity of isobutane is not built into the engine: the two public copies of Perkins (2002) disagree on its reducing temperature and density, and no published check value was found to settle it.'
};
