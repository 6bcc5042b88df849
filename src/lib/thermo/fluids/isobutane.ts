import { IIR_REFERENCE_STATE, type FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.0581222;
const rhoc = 225.5;

const ANCILLARY_SOURCE =
	'Bücker & Wagner (2006), ancillary equations (θ = 1 − T/407.81 K), as carried by pychemqt lib/mEoS/iC4.py; starting guesses only';

/**
 * Isobutane (R-600a), reference equation of Bücker & Wagner (2006): 25 residual terms (7 polynomial,
 * 16 exponential, 2 Gaussian); ideal part ln δ + a1 + a2·τ + c·ln τ and four Planck–Einstein terms.
 * Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const isobutane: FluidData = {
	id: 'isobutane',
	name: 'Isobutane',
	formula: 'CH(CH3)3',
	aliases: ['r600a', 'r-600a', 'hc-600a', 'i-butane', '2-methylpropane', 'c4h10'],
	group: 'hydrocarbon',
	formulation: {
		name: 'Bücker–Wagner (2006)',
		reference:
			'D. Bücker, W. Wagner, "Reference Equations of State for the Thermodynamic Properties of Fluid Phase n-Butane and Isobutane", J. Phys. Chem. Ref. Data 35 (2006) 929–1019, doi:10.1063/1.1901687',
		provenance:
			'Residual coefficients transcribed from the public CoolProp data file (CoolProp/CoolProp, dev/fluids/IsoButane.json) and ' +
			'compared term by term by script with the independent pychemqt copy (jjgomera/pychemqt, lib/mEoS/iC4.py, ' +
			'iC4, "buecker"): all 25 terms identical digit for digit (n, d, t, l and the Gaussian η, β, γ, ε). Ideal part: a1 = ' +
			'11.60865546, a2 = −5.29450411, c = 3.05956619 and the Planck–Einstein a = 4.94641014, 4.09475197, 15.6632824, 9.73918122 ' +
			'identical in both; the exponents θ = 0.9512779015, 2.3878958853, 4.3469042691, 10.3688586351 are pychemqt’s, the same ' +
			'digits in an independent Modelica copy (HelmholtzMedia) — CoolProp stores them rounded to 9 decimals ' +
			'(0.951277902…). Molar mass 58.1222 g/mol, R = 8.314472 J/(mol·K), reducing point 407.81 K, 225.5 kg/m³. Checked in ' +
			'published-checks.test.ts with isobutane.checks.ts: the paper’s verification and saturation values as transcribed by ' +
			'pychemqt, energies as differences (the paper’s own convention). Triple-point pressure 0.0229 Pa: the equation’s own saturation pressure at 113.73 K, rounded. Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.314472 J/(mol·K) as used by the paper
	R: 8.314472 / M,
	reducing: { T: 407.81, rho: rhoc },
	critical: { T: 407.81, P: 3.629e6, rho: rhoc },
	triple: { T: 113.73, P: 0.0229 },
	limits: { Tmin: 113.73, Tmax: 575, Pmax: 35e6 },
	referenceState: IIR_REFERENCE_STATE,
	ideal: [
		{ kind: 'lead', a1: 11.60865546, a2: -5.29450411 },
		{ kind: 'log-tau', a: 3.05956619 },
		{
			kind: 'planck-einstein',
			n: [4.94641014, 4.09475197, 15.6632824, 9.73918122],
			gamma: [0.9512779015, 2.3878958853, 4.3469042691, 10.3688586351]
		}
	],
	residual: [
		{
			kind: 'polynomial',
			n: [
				2.0686820727966, -3.6400098615204, 0.51968754427244, 0.17745845870123, -0.12361807851599,
				0.045145314010528, 0.03047647996598
			],
			d: [1, 1, 1, 2, 3, 4, 4],
			t: [0.5, 1, 1.5, 0, 0.5, 0.5, 0.75]
		},
		{
			kind: 'exponential',
			n: [
				0.75508387706302, -0.85885381015629, 0.036324009830684, -0.01954879945055,
				-0.004445239290496, 0.004641076366646, -0.071444097992825, -0.080765060030713,
				0.15560460945053, 0.0020318752160332, -0.10624883571689, 0.039807690546305,
				0.016371431292386, 0.00053212200682628, -0.0078681561156387, -0.0030981191888963
			],
			d: [1, 1, 2, 7, 8, 8, 1, 2, 3, 3, 4, 5, 5, 10, 2, 6],
			t: [2, 2.5, 2.5, 1.5, 1, 1.5, 4, 7, 3, 7, 3, 1, 6, 0, 6, 13],
			l: [1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 2, 2, 3, 3]
		},
		{
			kind: 'gaussian',
			n: [-0.042276036810382, -0.0053001044558079],
			d: [1, 2],
			t: [2, 0],
			alpha: [10, 10],
			beta: [150, 200],
			gamma: [1.16, 1.13],
			epsilon: [0.85, 1]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-6.85093103, 1.36543198, -1.32542691, -2.56190994],
			t: [1, 1.5, 2.5, 4.5],
			yc: 3.629e6,
			source: ANCILLARY_SOURCE
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [2.04025104, 0.850874089, -0.479052281, 0.348201252],
			t: [0.355, 1, 4 / 3, 7 / 3],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio-tc-over-t',
			n: [-2.12933323, -2.93790085, -0.89441086, -3.46343707],
			t: [0.355, 5 / 6, 19 / 6, 13 / 3],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		}
	}
};
