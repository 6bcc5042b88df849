/**
 * Viscosity and thermal conductivity of R-1234yf and R-1234ze(E): Huber & Assael (2016) and
 * Perkins & Huber (2011), coefficients in data/r1234yf.ts and data/r1234ze-e.ts. The conductivity's
 * critical enhancement takes cp, cv and (∂ρ/∂p)_T at the state and at the paper's reference
 * temperature from this engine's equation of state of the fluid.
 */

import { criticalEnhancement } from './enhancement.ts';
import {
	huberAssaelViscosity,
	perkinsHuberBackground,
	type HuberAssaelViscosity,
	type PerkinsHuberConductivity
} from './refrigerant-forms.ts';
import { r1234yfConductivity, r1234yfViscosity } from './data/r1234yf.ts';
import { r1234zeEConductivity, r1234zeEViscosity } from './data/r1234ze-e.ts';
import type { FluidCorrelation } from './fluids.ts';

const HUBER_ASSAEL = 'Huber & Assael (2016), Int. J. Refrig. 71, 39';
const PERKINS_HUBER = `Perkins & Huber (2011), J. Chem. Eng. Data 56, 4868 (critical enhancement with this engine's equation of state)`;

function hfo(
	fluid: string,
	v: HuberAssaelViscosity,
	k: PerkinsHuberConductivity
): FluidCorrelation {
	return {
		sources: { mu: HUBER_ASSAEL, k: PERKINS_HUBER },
		// the viscosity paper's stated range; the conductivity paper's was not read here, so k is
		// applied over the equation of state's range
		range: { mu: v.range, k: {} },
		mu: (T, rho) => huberAssaelViscosity(v, T, rho),
		k: (T, rho, mu) =>
			perkinsHuberBackground(k, T, rho) + criticalEnhancement(fluid, k.critical, T, rho, mu)
	};
}

export const r1234yfTransport = hfo('r1234yf', r1234yfViscosity, r1234yfConductivity);
export const r1234zeETransport = hfo('r1234ze-e', r1234zeEViscosity, r1234zeEConductivity);
