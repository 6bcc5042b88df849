import type { FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.0160428;
const Tc = 190.564;
const rhoc = 162.66;

const ANCILLARY_SOURCE =
	'Setzmann & Wagner (1991), ancillary equations (θ = 1 − T/190.564 K), as carried by pychemqt lib/mEoS/CH4.py; starting guesses only';

/**
 * Methane, reference equation of Setzmann & Wagner (1991): 40 residual terms (13 polynomial,
 * 23 exponential, 4 Gaussian); ideal part ln δ + a1 + a2·τ + 3.0016·ln τ and five Planck–Einstein terms.
 * Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const methane: FluidData = {
	id: 'methane',
	name: 'Methane',
	formula: 'CH4',
	aliases: ['ch4', 'r50', 'r-50', 'lng', 'liquefied natural gas'],
	group: 'cryogen',
	formulation: {
		name: 'Setzmann–Wagner (1991)',
		reference:
			'U. Setzmann, W. Wagner, "A New Equation of State and Tables of Thermodynamic Properties for Methane Covering the Range from the Melting Line to 625 K at Pressures up to 1000 MPa", J. Phys. Chem. Ref. Data 20 (1991) 1061–1155, doi:10.1063/1.555898',
		provenance:
			'Residual coefficients transcribed from the public CoolProp data file (CoolProp/CoolProp, dev/fluids/Methane.json) and ' +
			'compared term by term by script with the independent pychemqt copy (jjgomera/pychemqt, lib/mEoS/CH4.py, class ' +
			'CH4, "setzmann"): all 40 terms identical digit for digit (n, d, t, l and the Gaussian η, β, γ, ε). Ideal part identical: ' +
			'a1 = 9.91243972, a2 = −6.33270087, 3.0016 ln τ, Planck–Einstein a = 0.008449, 4.6942, 3.4865, 1.6572, 1.4115 with ' +
			'θ = 648, 1957, 3895, 5705, 15080 K (written here as θ/Tc). Molar mass 16.0428 g/mol, R = 8.31451 J/(mol·K), reducing ' +
			'point 190.564 K, 162.66 kg/m³ (10.139128 mol/dm³). Checked in published-checks.test.ts with methane.checks.ts: the ' +
			'paper’s Table 39 (saturation) and Table 40 (single phase), as energy differences (the paper’s convention differs from ' +
			'the NBP one by constants). Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.31451 J/(mol·K) as used by the paper
	R: 8.31451 / M,
	reducing: { T: Tc, rho: rhoc },
	critical: { T: Tc, P: 4.5992e6, rho: rhoc },
	triple: { T: 90.6941, P: 11.696e3 },
	limits: { Tmin: 90.6941, Tmax: 625, Pmax: 1000e6 },
	referenceState: {
		kind: 'saturated-liquid-at-P',
		label: 'NBP: h = 0, s = 0 for saturated liquid at 101.325 kPa',
		P: 101325,
		h: 0,
		s: 0
	},
	ideal: [
		{ kind: 'lead', a1: 9.91243972, a2: -6.33270087 },
		{ kind: 'log-tau', a: 3.0016 },
		{
			kind: 'planck-einstein',
			n: [0.008449, 4.6942, 3.4865, 1.6572, 1.4115],
			gamma: [648 / Tc, 1957 / Tc, 3895 / Tc, 5705 / Tc, 15080 / Tc]
		}
	],
	residual: [
		{
			kind: 'polynomial',
			n: [
				0.04367901028, 0.6709236199, -1.765577859, 0.8582330241, -1.206513052, 0.512046722,
				-0.0004000010791, -0.01247842423, 0.03100269701, 0.001754748522, -3.171921605e-6,
				-2.24034684e-6, 2.947056156e-7
			],
			d: [1, 1, 1, 2, 2, 2, 2, 3, 4, 4, 8, 9, 10],
			t: [-0.5, 0.5, 1, 0.5, 1, 1.5, 4.5, 0, 1, 3, 1, 3, 3]
		},
		{
			kind: 'exponential',
			n: [
				0.1830487909, 0.1511883679, -0.4289363877, 0.06894002446, -0.01408313996, -0.0306305483,
				-0.02969906708, -0.01932040831, -0.1105739959, 0.09952548995, 0.008548437825,
				-0.06150555662, -0.04291792423, -0.0181320729, 0.0344590476, -0.00238591945, -0.01159094939,
				0.06641693602, -0.0237154959, -0.03961624905, -0.01387292044, 0.03389489599, -0.002927378753
			],
			d: [1, 1, 1, 2, 4, 5, 6, 1, 2, 3, 4, 4, 3, 5, 5, 8, 2, 3, 4, 4, 4, 5, 6],
			t: [0, 1, 2, 0, 0, 2, 2, 5, 5, 5, 2, 4, 12, 8, 10, 10, 10, 14, 12, 18, 22, 18, 14],
			l: [1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 3, 4, 4, 4, 4, 4, 4, 4]
		},
		{
			kind: 'gaussian',
			n: [9.324799946e-5, -6.287171518, 12.71069467, -6.423953466],
			d: [2, 0, 0, 0],
			t: [2, 0, 1, 2],
			alpha: [20, 40, 40, 40],
			beta: [200, 250, 250, 250],
			gamma: [1.07, 1.11, 1.11, 1.11],
			epsilon: [1, 1, 1, 1]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-6.036219, 1.409353, -0.4945199, -1.443048],
			t: [1, 1.5, 2, 4.5],
			yc: 4.5992e6,
			source: ANCILLARY_SOURCE
		},
		rhoLiquid: {
			form: 'ln-ratio',
			n: [1.9906389, -0.78756197, 0.036976723],
			t: [0.354, 0.5, 2.5],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-1.880284, -2.8526531, -3.000648, -5.251169, -13.191859, -37.553961],
			t: [0.354, 5 / 6, 1.5, 2.5, 25 / 6, 47 / 6],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		}
	}
};
