import { IIR_REFERENCE_STATE, type FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.04409562;
const Tc = 369.89;

const ANCILLARY_SOURCE =
	'Lemmon, McLinden & Wagner (2009), ancillary equations (θ = 1 − T/369.89 K), as transcribed in pychemqt lib/mEoS/C3.py';

/**
 * Propane, reference equation of Lemmon, McLinden & Wagner (2009): 18 residual terms
 * (5 polynomial, 6 exponential, 7 Gaussian bell-shaped); ideal part ln δ + 3 ln τ + a1 + a2·τ and
 * four Planck–Einstein terms. Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const propane: FluidData = {
	id: 'propane',
	name: 'Propane',
	formula: 'C3H8',
	aliases: ['r290', 'r-290', 'hc-290', 'c3h8', 'lpg', 'n-propane'],
	group: 'hydrocarbon',
	formulation: {
		name: 'Lemmon–McLinden–Wagner (2009)',
		reference:
			'E. W. Lemmon, M. O. McLinden, W. Wagner, "Thermodynamic Properties of Propane. III. A Reference Equation of State for Temperatures from the Melting Line to 650 K and Pressures up to 1000 MPa", J. Chem. Eng. Data 54 (2009) 3141–3180, doi:10.1021/je900217v',
		provenance:
			'Coefficients (Tables 2 and 3 of the paper) transcribed from the public CoolProp data file (CoolProp/CoolProp, ' +
			'dev/fluids/n-Propane.json) and compared term by term by script with the independent pychemqt copy ' +
			'(jjgomera/pychemqt, lib/mEoS/C3.py, class C3, "lemmon"): all 18 residual terms identical digit for digit (n, d, t, and the ' +
			'Gaussian η, β, γ, ε); ideal part identical (a1 = −4.970583, a2 = 4.29352, the Planck–Einstein v = 3.043, 5.874, 9.337, ' +
			'7.922 with u = 393, 1237, 1984, 4351 K, written here as u/Tc; CoolProp stores u/Tc rounded to 7 digits). Molar ' +
			'mass 44.09562 g/mol, R = 8.314472 J/(mol·K), reducing point 369.89 K, 5.00 mol/dm³ (both sources). ' +
			'Checked in published-checks.test.ts with propane.checks.ts: the paper’s Table 5 (computer-program verification) and ' +
			'Table A1 (saturation, IIR convention). Triple-point pressure 1.72e-4 Pa: the equation’s own saturation pressure at 85.525 K, rounded. Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.314472 J/(mol·K) as used by the paper
	R: 8.314472 / M,
	reducing: { T: Tc, rho: 5.0e3 * M },
	critical: { T: Tc, P: 4.2512e6, rho: 5.0e3 * M },
	triple: { T: 85.525, P: 1.72e-4 },
	limits: { Tmin: 85.525, Tmax: 650, Pmax: 1000e6 },
	referenceState: IIR_REFERENCE_STATE,
	ideal: [
		{ kind: 'lead', a1: -4.970583, a2: 4.29352 },
		{ kind: 'log-tau', a: 3 },
		{
			kind: 'planck-einstein',
			n: [3.043, 5.874, 9.337, 7.922],
			gamma: [393 / Tc, 1237 / Tc, 1984 / Tc, 4351 / Tc]
		}
	],
	residual: [
		{
			kind: 'polynomial',
			n: [0.042910051, 1.7313671, -2.4516524, 0.34157466, -0.46047898],
			d: [4, 1, 1, 2, 2],
			t: [1, 0.33, 0.8, 0.43, 0.9]
		},
		{
			kind: 'exponential',
			n: [-0.66847295, 0.20889705, 0.19421381, -0.22917851, -0.60405866, 0.066680654],
			d: [1, 3, 6, 6, 2, 3],
			t: [2.46, 2.09, 0.88, 1.09, 3.25, 4.62],
			l: [1, 1, 1, 1, 2, 2]
		},
		{
			kind: 'gaussian',
			n: [0.017534618, 0.33874242, 0.22228777, -0.23219062, -0.09220694, -0.47575718, -0.017486824],
			d: [1, 1, 1, 2, 2, 4, 1],
			t: [0.76, 2.5, 2.75, 3.05, 2.55, 8.4, 6.75],
			alpha: [0.963, 1.977, 1.917, 2.307, 2.546, 3.28, 14.6],
			beta: [2.33, 3.47, 3.15, 3.19, 0.92, 18.8, 547.8],
			gamma: [0.684, 0.829, 1.419, 0.817, 1.5, 1.426, 1.093],
			epsilon: [1.283, 0.6936, 0.788, 0.473, 0.8577, 0.271, 0.948]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-6.7722, 1.6938, -1.3341, -3.1876, 0.94937],
			t: [1, 1.5, 2.2, 4.8, 6.2],
			yc: 4.2512e6,
			source: ANCILLARY_SOURCE
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [1.82205, 0.65802, 0.21109, 0.083973],
			t: [0.345, 0.74, 2.6, 7.2],
			yc: 5.0e3 * M,
			source: ANCILLARY_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-2.4887, -5.1069, -12.174, -30.495, -52.192, -134.89],
			t: [0.3785, 1.07, 2.7, 5.5, 10.0, 20.0],
			yc: 5.0e3 * M,
			source: ANCILLARY_SOURCE
		}
	}
};
