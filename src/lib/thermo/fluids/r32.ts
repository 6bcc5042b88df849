import { IIR_REFERENCE_STATE, type FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.052024;
const rhoc = 424;

const ANCILLARY_SOURCE =
	'ancillary equations (θ = 1 − T/351.255 K) as carried by pychemqt lib/mEoS/R32.py; starting guesses only, checked against the equation in published-checks';

/**
 * R-32 (difluoromethane), reference equation of Tillner-Roth & Yokozeki (1997): 19 residual terms
 * (8 polynomial, 11 exponential); ideal part ln δ + a1 + a2·τ + a3·ln τ and four Planck–Einstein
 * terms. Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const r32: FluidData = {
	id: 'r32',
	name: 'R-32',
	formula: 'CH2F2',
	aliases: ['r-32', 'hfc-32', 'hfc32', 'difluoromethane', 'methylene fluoride'],
	group: 'refrigerant',
	formulation: {
		name: 'Tillner-Roth–Yokozeki (1997)',
		reference:
			'R. Tillner-Roth, A. Yokozeki, "An International Standard Equation of State for Difluoromethane (R-32) for Temperatures from the Triple Point at 136.34 K to 435 K and Pressures up to 70 MPa", J. Phys. Chem. Ref. Data 26 (1997) 1273–1328, doi:10.1063/1.556002',
		provenance:
			'Coefficients transcribed from the public CoolProp data file (CoolProp/CoolProp, dev/fluids/R32.json) and compared ' +
			'term by term by script with the independent pychemqt copy (jjgomera/pychemqt, lib/mEoS/R32.py, class R32, ' +
			'"tillner"): all 19 residual terms identical digit for digit (n, d, t, l); ideal part identical (a1 = −8.258096, ' +
			'a2 = 6.353098, a3 = 3.004486; Planck–Einstein a = 1.160761, 2.645151, 5.794987, 1.129475 with exponents 2.2718538, ' +
			'11.9144210, 5.1415638, 32.7682170 in τ). Molar mass 52.024 g/mol, R = 8.314471 J/(mol·K), reducing point 351.255 K, ' +
			'424 kg/m³ (both sources). Triple-point pressure 48.0 Pa: the equation’s own saturation pressure at 136.34 K (CoolProp’s ' +
			'tabulated value, 47.9999 Pa; the paper prints 0.05 kPa). Checked in published-checks.test.ts with r32.checks.ts: the ' +
			'paper’s Tables 12 and 13 (saturation, IIR convention) and Tables 14–16 (single phase). Published scientific data ' +
			'(facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.314471 J/(mol·K) as used by the paper
	R: 8.314471 / M,
	reducing: { T: 351.255, rho: rhoc },
	critical: { T: 351.255, P: 5.782e6, rho: rhoc },
	triple: { T: 136.34, P: 48.0 },
	limits: { Tmin: 136.34, Tmax: 435, Pmax: 70e6 },
	referenceState: IIR_REFERENCE_STATE,
	ideal: [
		{ kind: 'lead', a1: -8.258096, a2: 6.353098 },
		{ kind: 'log-tau', a: 3.004486 },
		{
			kind: 'planck-einstein',
			n: [1.160761, 2.645151, 5.794987, 1.129475],
			gamma: [2.2718538, 11.914421, 5.1415638, 32.768217]
		}
	],
	residual: [
		{
			kind: 'polynomial',
			n: [
				1.046634, -0.5451165, -0.002448595, -0.04877002, 0.03520158, 0.00162275, 2.377225e-5,
				0.029149
			],
			d: [1, 2, 5, 1, 1, 3, 8, 4],
			t: [0.25, 1, -0.25, -1, 2, 2, 0.75, 0.25]
		},
		{
			kind: 'exponential',
			n: [
				0.003386203, -0.004202444, 0.0004782025, -0.005504323, -0.02418396, 0.4209034, -0.4616537,
				-1.200513, -2.59155, -1.400145, 0.8263017
			],
			d: [4, 4, 8, 3, 5, 1, 1, 3, 1, 2, 3],
			t: [18, 26, -1, 25, 1.75, 4, 5, 1, 1.5, 1, 0.5],
			l: [4, 3, 1, 4, 1, 2, 2, 1, 1, 1, 1]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-7.4883, 1.9697, -1.7496, -4.0224, 1.5209],
			t: [1, 1.5, 2.2, 4.8, 6.2],
			yc: 5.782e6,
			source: ANCILLARY_SOURCE
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [1.2584, 4.641, -5.487, 3.3115, -0.6137],
			t: [0.27, 0.8, 1.1, 1.5, 1.8],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-2.2002, -5.972, -14.571, -42.598, 4.2686, -73.373],
			t: [0.336, 0.98, 2.7, 5.7, 6.5, 11],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		}
	}
};
