import { IIR_REFERENCE_STATE, type FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.1140416;
const Tc = 367.85;
const rhoc = 4.18e3 * M;

const ANCILLARY_SOURCE =
	'Lemmon & Akasaka (2022), ancillary equations (θ = 1 − T/367.85 K), as carried by pychemqt lib/mEoS/R1234yf.py; starting guesses only';

/**
 * R-1234yf (2,3,3,3-tetrafluoropropene), reference equation of Lemmon & Akasaka (2022): 17 residual terms
 * (5 polynomial, 5 exponential, 7 Gaussian); ideal part ln δ + a1 + a2·τ + 3·ln τ and three Planck–Einstein terms.
 * Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const r1234yf: FluidData = {
	id: 'r1234yf',
	name: 'R-1234yf',
	formula: 'CH2=CFCF3',
	aliases: [
		'r-1234yf',
		'hfo-1234yf',
		'hfo1234yf',
		'2,3,3,3-tetrafluoropropene',
		'2,3,3,3-tetrafluoroprop-1-ene'
	],
	group: 'refrigerant',
	formulation: {
		name: 'Lemmon–Akasaka (2022)',
		reference:
			'E. W. Lemmon, R. Akasaka, "An International Standard Formulation for 2,3,3,3-Tetrafluoroprop-1-ene (R1234yf) Covering Temperatures from the Triple Point Temperature to 410 K and Pressures Up to 100 MPa", Int. J. Thermophys. 43 (2022) 119, doi:10.1007/s10765-022-03015-y',
		provenance:
			'Residual coefficients transcribed from the public CoolProp data file (CoolProp/CoolProp, dev/fluids/R1234yf.json, its ' +
			'first equation, Lemmon-IJT-2022) and compared term by term by script with the independent pychemqt copy ' +
			'(jjgomera/pychemqt, lib/mEoS/R1234yf.py, class R1234yf, "lemmon"): all 17 terms identical digit for digit (n, d, t, l and ' +
			'the Gaussian η, β, γ, ε). Ideal part identical: 3 ln τ, Planck–Einstein v = 8.65, 9.75, 2.11 with u = 512, 1570, 4500 K ' +
			'(written here as u/Tc; both sources store u/Tc); a1, a2 are set by the IIR reference state. Molar mass 114.0416 g/mol, ' +
			'R = 8.314462618 J/(mol·K), reducing point 367.85 K, 4.18 mol/dm³ (both). Triple point 121.6 K, 0.4127 Pa (CoolProp). ' +
			'Checked in published-checks.test.ts with r1234yf.checks.ts: the paper’s Table 7 (computer-program verification). No ' +
			'saturation table of the paper was available in a public copy: saturation is checked at the critical point ' +
			'(and by phase equilibrium) only. Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.314462618 J/(mol·K) as used by the paper
	R: 8.314462618 / M,
	reducing: { T: Tc, rho: rhoc },
	critical: { T: Tc, P: 3.3844e6, rho: rhoc },
	triple: { T: 121.6, P: 0.4127 },
	limits: { Tmin: 121.6, Tmax: 410, Pmax: 100e6 },
	referenceState: IIR_REFERENCE_STATE,
	ideal: [
		{ kind: 'lead', a1: -12.081525543189, a2: 8.52896238365 },
		{ kind: 'log-tau', a: 3 },
		{ kind: 'planck-einstein', n: [8.65, 9.75, 2.11], gamma: [512 / Tc, 1570 / Tc, 4500 / Tc] }
	],
	residual: [
		{
			kind: 'polynomial',
			n: [0.0340387, 1.912859, -2.1984719881617, -0.8147645305033, 0.2288282],
			d: [4, 1, 1, 2, 3],
			t: [1, 0.222, 0.61, 1.122, 0.5]
		},
		{
			kind: 'exponential',
			n: [-1.65436, -1.446628, 0.5961722, -0.6148209, -0.0180069],
			d: [1, 3, 2, 2, 7],
			t: [2.14, 2.284, 1.05, 2.33, 0.778],
			l: [2, 2, 1, 2, 1]
		},
		{
			kind: 'gaussian',
			n: [0.2845275, -0.3050809, 2.198935, -0.4270329, -0.4015581, 0.1179587, -0.3141002],
			d: [1, 1, 1, 1, 1, 1, 1],
			t: [1, 2, 1.236, 1.6, 1.85, 0.7, 1.75],
			alpha: [28.1, 28, 1.307, 1.96, 1.25, 1, 2.2],
			beta: [1016, 1000, 1.16, 1.2, 1.26, 1.6, 0.87],
			gamma: [1.061, 1.062, 1.3, 1.04, 1, 1.14, 1.1],
			epsilon: [0.96, 0.96, 0.853, 1.15, 1.3, 1.5, 0.762]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-7.4507, 2.164, -1.674, -3.318, -1.617],
			t: [1, 1.5, 2, 4, 9],
			yc: 3.3844e6,
			source: ANCILLARY_SOURCE
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [3.392, -4.119, 8.932, -8.525, 3.384],
			t: [0.4, 0.7, 1.1, 1.5, 2.1],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-3.616, -74.91, 197.7, -152.76, -61.062, -115.53],
			t: [0.426, 2, 2.4, 2.7, 7.5, 15],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		}
	}
};
