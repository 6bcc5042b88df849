import type { FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.0319988;
const Tc = 154.581;
/** 13.63 mol/dm³ */
const rhoc = 13.63 * 1e3 * M;

const ANCILLARY_SOURCE =
	'Oxygen ancillary equations (θ = 1 − T/154.581 K) as carried by pychemqt lib/mEoS/O2.py; starting guesses only';

/**
 * Oxygen, reference equation of Schmidt & Wagner (1985): 32 residual terms (13 polynomial,
 * 11 exponential with δ², 8 with δ⁴) and the paper's own ideal part,
 * α⁰ = ln δ + k1·τ^1.5 + k2·τ^−2 + k3·ln τ + k4·τ + k5·ln(e^(k7·τ) − 1) + k6·ln(1 + (2/3)·e^(−k8·τ)) + k9 (+ a constant of its reference density),
 * written here with the engine's term kinds: k5·ln(e^(k7τ) − 1) = k5·ln(1 − e^(−k7τ)) + k5·k7·τ and
 * k6·ln(1 + (2/3)e^(−k8τ)) = k6·ln(2/3 + e^(k8τ)) − k6·k8·τ; the terms linear in τ and the constants
 * fall into the lead term, whose a1, a2 are set at load time by the NBP reference state.
 * Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const oxygen: FluidData = {
	id: 'oxygen',
	name: 'Oxygen',
	formula: 'O2',
	aliases: ['o2', 'r732', 'r-732', 'lox', 'gox', 'liquid oxygen'],
	group: 'cryogen',
	formulation: {
		name: 'Schmidt–Wagner (1985)',
		reference:
			'R. Schmidt, W. Wagner, "A New Form of the Equation of State for Pure Substances and its Application to Oxygen", Fluid Phase Equilibria 19 (1985) 175–200, doi:10.1016/0378-3812(85)87016-3',
		provenance:
			'Residual coefficients (32 terms: n, d, t and the exponent of δ in exp(−δ^l)) transcribed from pychemqt ' +
			'(jjgomera/pychemqt, lib/mEoS/O2.py, "schmidt") and compared by script, digit for digit, with two independent ' +
			'copies: the public CoolProp data file (CoolProp/CoolProp, dev/fluids/Oxygen.json): all 32 terms identical. Ideal ' +
			'part: the paper’s own cp⁰ form (k1…k9 = −0.740775e−3, −0.664930e−4, 2.50042, −21.4487, 1.01258, −0.944365, ' +
			'14.5066, 74.9148, 4.14817), from a public Python copy of the paper’s equation and held, as a second and ' +
			'independent check, to the ideal-gas cp⁰ printed in another publication (below). CoolProp and pychemqt carry other ideal-gas equations (a refit; Stewart, Jacobsen & Wagner ' +
			'1991), not used here. The ideal part reproduces the ideal-gas cp⁰ printed by Stewart, Jacobsen & Wagner (1991), ' +
			'Table 9, at 60, 200, 500, 1000 and 2000 K to all printed digits (oxygen.test.ts). Molar mass 31.9988 g/mol, ' +
			'R = 8.31434 J/(mol·K) (pychemqt, CoolProp), critical point 154.581 K, 5.043 MPa, 13.63 mol/dm³. Range served: ' +
			'54.361–300 K up to 80 MPa, as CoolProp states it (pychemqt allows 2000 K and 82 MPa; the narrower is kept). ' +
			'Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.31434 J/(mol·K) as used by the paper
	R: 8.31434 / M,
	reducing: { T: Tc, rho: rhoc },
	critical: { T: Tc, P: 5.043e6, rho: rhoc },
	// triple-point pressure: the equation's own at Tt, rounded (146.28 Pa, as CoolProp's and pychemqt's states)
	triple: { T: 54.361, P: 146.28 },
	limits: { Tmin: 54.361, Tmax: 300, Pmax: 80e6 },
	referenceState: {
		kind: 'saturated-liquid-at-P',
		label: 'NBP: h = 0, s = 0 for saturated liquid at 101.325 kPa',
		P: 101325,
		h: 0,
		s: 0
	},
	ideal: [
		{ kind: 'lead', a1: 4.14817, a2: -21.4487 },
		{ kind: 'power', n: [-0.740775e-3, -0.66493e-4], t: [1.5, -2] },
		{ kind: 'log-tau', a: 2.50042 },
		{ kind: 'planck-einstein', n: [1.01258], gamma: [14.5066] },
		{ kind: 'log-c-plus-exp', n: [-0.944365], c: [2 / 3], gamma: [74.9148] }
	],
	residual: [
		{
			kind: 'polynomial',
			n: [
				0.3983768749, -1.846157454, 0.4183473197, 0.02370620711, 0.09771730573, 0.03017891294,
				0.02273353212, 0.01357254086, -0.04052698943, 0.0005454628515, 0.0005113182277,
				2.953466883e-7, -8.687645072e-5
			],
			d: [1, 1, 1, 2, 2, 2, 3, 3, 3, 6, 7, 7, 8],
			t: [0, 1.5, 2.5, -0.5, 1.5, 2, 0, 1, 2.5, 0, 2, 5, 2]
		},
		{
			kind: 'exponential',
			n: [
				-0.2127082589, 0.08735941958, 0.127550919, -0.09067701064, -0.03540084206, -0.03623278059,
				0.0132769929, -0.0003254111865, -0.008313582932, 0.002124570559, -0.0008325206232,
				-2.626173276e-5, 0.002599581482, 0.009984649663, 0.002199923153, -0.02591350486,
				-0.1259630848, 0.1478355637, -0.01011251078
			],
			d: [1, 1, 2, 2, 3, 3, 5, 6, 7, 8, 10, 2, 3, 3, 4, 4, 5, 5, 5],
			t: [5, 6, 3.5, 5.5, 3, 7, 6, 8.5, 4, 6.5, 5.5, 22, 11, 18, 11, 23, 17, 18, 23],
			l: [2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 4, 4, 4, 4, 4, 4, 4, 4]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-6.0595, 1.305, -0.54178, -1.941, 0.35514],
			t: [1, 1.5, 2.2, 4.8, 6.2],
			yc: 5.043e6,
			source: ANCILLARY_SOURCE
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [1.6622, 0.76846, -0.10041, 0.2048, 0.011551],
			t: [0.345, 0.74, 1.2, 2.6, 7.2],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-2.2695, -4.6578, -9.948, -22.845, -45.19, -25.101],
			t: [0.3785, 1.07, 2.7, 5.5, 10, 20],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		}
	}
};
