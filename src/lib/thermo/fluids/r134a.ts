import type { FluidData } from './schema.ts';

const FITTED_SOURCE = 'fitted to this equation by tests/reference/fit-ancillaries.py';

/** Molar mass used by the equation, kg/mol. */
const M = 0.102032;

/**
 * R-134a (1,1,1,2-tetrafluoroethane), reference equation of Tillner-Roth & Baehr (1994):
 * 21 residual terms (8 polynomial, 13 exponential). Its reducing temperature and density
 * (374.18 K, 508 kg/m³) differ from its critical point (374.21 K, 511.9 kg/m³).
 */
export const r134a: FluidData = {
	id: 'r134a',
	name: 'R-134a',
	formula: 'CH2FCF3',
	aliases: ['r-134a', 'hfc-134a', 'hfc134a', '1,1,1,2-tetrafluoroethane'],
	formulation: {
		name: 'Tillner-Roth–Baehr (1994)',
		reference:
			'R. Tillner-Roth, H. D. Baehr, "An International Standard Formulation for the Thermodynamic Properties of 1,1,1,2-Tetrafluoroethane (HFC-134a) for Temperatures from 170 K to 455 K and Pressures up to 70 MPa", J. Phys. Chem. Ref. Data 23 (1994) 657–729, doi:10.1063/1.555958',
		provenance:
			'Coefficients transcribed from the public pychemqt repository (jjgomera/pychemqt, lib/mEoS/R134a.py) and compared term ' +
			'by term by script with two independent transcriptions, CoolProp (CoolProp/CoolProp, dev/fluids/R134a.json) and Cantera ' +
			'(Cantera/cantera, src/tpx/HFC134a.cpp): identical. Ancillary equations: the paper’s vapor-pressure and liquid-density ' +
			'equations are reduced with 374.18 K, which the schema’s ancillary forms (θ = 1 − T/Tc with the critical temperature) ' +
			'cannot express, so the three ancillaries here were fitted to the equation’s own saturation states by ' +
			'tests/reference/fit-ancillaries.py (starting guesses only). Checked in other-fluids.test.ts against the paper’s Table 8 ' +
			'(saturation, IIR energies) and Table 9 (single phase) and its critical and triple points. ' +
			'Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.314471 J/(mol·K) as used by the paper
	R: 8.314471 / M,
	reducing: { T: 374.18, rho: 508 },
	critical: { T: 374.21, P: 4.05928e6, rho: 511.9 },
	triple: { T: 169.85, P: 389.56 },
	limits: { Tmin: 169.85, Tmax: 455, Pmax: 70e6 },
	referenceState: {
		kind: 'saturated-liquid-at-T',
		label: 'IIR: h = 200 kJ/kg, s = 1 kJ/(kg·K) for saturated liquid at 0 °C',
		T: 273.15,
		h: 200e3,
		s: 1e3
	},
	ideal: [
		{ kind: 'lead', a1: -1.019535, a2: 9.047135 },
		{ kind: 'log-tau', a: -1.629789 },
		{ kind: 'power', n: [-9.723916, -3.92717], t: [-0.5, -0.75] }
	],
	residual: [
		{
			kind: 'polynomial',
			n: [0.5586817e-1, 0.498223, 0.2458698e-1, 0.8570145e-3, 0.4788584e-3, -0.1800808e1, 0.2671641, -0.4781652e-1],
			d: [2, 1, 3, 6, 6, 1, 1, 2],
			t: [-0.5, 0, 0, 0, 1.5, 1.5, 2, 2]
		},
		{
			kind: 'exponential',
			n: [
				0.1423987e-1, 0.3324062, -0.7485907e-2, 0.1017263e-3, -0.5184567, -0.8692288e-1, 0.2057144, -0.5000457e-2,
				0.4603262e-3, -0.3497836e-2, 0.6995038e-2, -0.1452184e-1, -0.1285458e-3
			],
			d: [5, 2, 2, 4, 1, 4, 1, 2, 4, 1, 5, 3, 10],
			t: [1, 3, 5, 1, 5, 5, 6, 10, 10, 10, 18, 22, 50],
			l: [1, 1, 1, 2, 2, 2, 2, 2, 2, 3, 3, 3, 4]
		}
	],
	ancillaries: {
		// Fitted to this equation’s own saturation states by tests/reference/fit-ancillaries.py (starting guesses only).
		// worst relative deviation of the fit: pSat 5.6e-05  rhoLiquid 5.8e-04 (θ > 1e-3; 2.3e-03 all)  rhoVapor 5.2e-03 (θ > 1e-3; 5.2e-03 all)
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-7.718445892, 2.2673048813, -8.2471857251, 1.1103327399e1, -1.2320230517e1, 4.572246408, -1.5029797253],
			t: [1, 1.5, 2.5, 3, 4, 5, 7.5],
			yc: 4059280,
			source: FITTED_SOURCE
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [-1.4825048049e-1, 1.2750962015e1, -2.3392267282e1, 3.3324850462e1, -2.9714896333e1, 1.4815938329e1, -6.313452917, 2.273461195],
			t: [1 / 3, 0.5, 2 / 3, 1, 4 / 3, 2, 3, 5],
			yc: 511.9,
			source: FITTED_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-1.296496825, -1.0647507376e1, 3.8415071653e1, -6.9217997911e1, 6.7981737447e1, -8.1026361007e1, 5.0122703246e1, -1.5550734188e2],
			t: [1 / 3, 2 / 3, 1, 4 / 3, 2, 3, 5, 8],
			yc: 511.9,
			source: FITTED_SOURCE
		}
	}
};
