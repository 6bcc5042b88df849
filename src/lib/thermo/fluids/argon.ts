import type { FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.039948;
const rhoc = 535.6;

const ANCILLARY_SOURCE =
	'Tegeler, Span & Wagner (1999), ancillary equations (θ = 1 − T/150.687 K), as carried by pychemqt lib/mEoS/Ar.py; starting guesses only';

/**
 * Argon, reference equation of Tegeler, Span & Wagner (1999): 41 residual terms (12 polynomial,
 * 25 exponential, 4 Gaussian); ideal part of a monatomic gas, ln δ + a1 + a2·τ + 1.5·ln τ.
 * Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const argon: FluidData = {
	id: 'argon',
	name: 'Argon',
	formula: 'Ar',
	aliases: ['ar', 'r740', 'r-740', 'lar', 'liquid argon'],
	group: 'cryogen',
	formulation: {
		name: 'Tegeler–Span–Wagner (1999)',
		reference:
			'Ch. Tegeler, R. Span, W. Wagner, "A New Equation of State for Argon Covering the Fluid Region for Temperatures From the Melting Line to 700 K at Pressures up to 1000 MPa", J. Phys. Chem. Ref. Data 28 (1999) 779–850, doi:10.1063/1.556037',
		provenance:
			'Residual coefficients (Table 30 of the paper, 14 significant digits) copied from the public CoolProp data file ' +
			'(CoolProp/CoolProp, dev/fluids/Argon.json) and compared term by term by script with an independent copy, ' +
			'pychemqt (jjgomera/pychemqt, lib/mEoS/Ar.py), which carries the same numbers rounded to 12 significant digits: all ' +
			'41 terms (n, d, t, l and the Gaussian η, β, γ, ε) agree at that precision, and the 14-digit values reproduce the ' +
			'paper’s printed Tables 33 and 34 to their printed digits. Ideal part a1 = 8.31666243, a2 = −4.94651164, ' +
			'1.5 ln τ (CoolProp, pychemqt: identical). Molar mass 39.948 g/mol, R = 8.31451 J/(mol·K), reducing point 150.687 K, ' +
			'535.6 kg/m³. Checked in published-checks.test.ts with argon.checks.ts: the paper’s Table 33 (saturation) and ' +
			'Table 34 (single phase), as energy differences (the paper’s own convention differs from the NBP one by constants). ' +
			'Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.31451 J/(mol·K) as used by the paper
	R: 8.31451 / M,
	reducing: { T: 150.687, rho: rhoc },
	critical: { T: 150.687, P: 4.863e6, rho: rhoc },
	triple: { T: 83.8058, P: 68.891e3 },
	limits: { Tmin: 83.8058, Tmax: 700, Pmax: 1000e6 },
	referenceState: {
		kind: 'saturated-liquid-at-P',
		label: 'NBP: h = 0, s = 0 for saturated liquid at 101.325 kPa',
		P: 101325,
		h: 0,
		s: 0
	},
	ideal: [
		{ kind: 'lead', a1: 8.31666243, a2: -4.94651164 },
		{ kind: 'log-tau', a: 1.5 }
	],
	residual: [
		{
			kind: 'polynomial',
			n: [
				0.088722304990011, 0.70514805167298, -1.682011565409, -0.14909014431486, -0.1202480460094,
				-0.12164978798599, 0.40035933626752, -0.27136062699129, 0.24211924579645, 0.005788958318557,
				-0.041097335615341, 0.024710761541614
			],
			d: [1, 1, 1, 1, 1, 2, 2, 2, 2, 3, 3, 4],
			t: [0, 0.25, 1, 2.75, 4, 0, 0.25, 0.75, 2.75, 0, 2, 0.75]
		},
		{
			kind: 'exponential',
			n: [
				-0.32181391750702, 0.33230017695794, 0.031019986287345, -0.030777086002437,
				0.093891137419581, -0.090643210682031, -0.00045778349276654, -8.2659729025197e-5,
				0.00013013415603147, -0.011397840001996, -0.024455169960535, -0.064324067175955,
				0.058889471093674, -0.00064933552112965, -0.013889862158435, 0.4048983929691,
				-0.38612519594749, -0.18817142332233, 0.15977647596482, 0.053985518513856,
				-0.028953417958014, -0.013025413381384, 0.0028948696775778, -0.0022647134304796,
				0.0017616456196368
			],
			d: [1, 1, 3, 4, 4, 5, 7, 10, 10, 2, 2, 4, 4, 8, 3, 5, 5, 6, 6, 7, 7, 8, 9, 5, 6],
			t: [3, 3.5, 1, 2, 4, 3, 0, 0.5, 1, 1, 7, 5, 6, 6, 10, 13, 14, 11, 14, 8, 14, 6, 7, 24, 22],
			l: [1, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 3, 3, 3, 3, 4, 4]
		},
		{
			kind: 'gaussian',
			n: [0.0058552454482774, -0.69251908270028, 1.5315490030516, -0.0027380447449783],
			d: [2, 1, 2, 3],
			t: [3, 1, 0, 0],
			alpha: [20, 20, 20, 20],
			beta: [250, 375, 300, 225],
			gamma: [1.11, 1.14, 1.17, 1.11],
			epsilon: [1, 1, 1, 1]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-5.9409785, 1.3553888, -0.4649761, -1.5399043],
			t: [1, 1.5, 2, 4.5],
			yc: 4.863e6,
			source: ANCILLARY_SOURCE
		},
		rhoLiquid: {
			form: 'ln-ratio',
			n: [1.5004264, -0.3138129, 0.086461622, -0.041477525],
			t: [0.334, 2 / 3, 7 / 3, 4],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio-tc-over-t',
			n: [-2.9182, 0.09793, -1.3721, -2.2898],
			t: [0.72, 1.25, 0.32, 4.34],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		}
	}
};
