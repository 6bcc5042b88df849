import type { FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.00201588;
const Tc = 33.145;
const rhoc = 15.508e3 * M;

const ANCILLARY_SOURCE =
	'Leachman et al. (2009), ancillary equations (θ = 1 − T/33.145 K), as carried by pychemqt lib/mEoS/H2.py; starting guesses only';

/**
 * Normal hydrogen, reference equation of Leachman, Jacobsen, Penoncello & Lemmon (2009): 14 residual
 * terms (7 polynomial, 2 exponential, 5 Gaussian); ideal part ln δ + a1 + a2·τ + 1.5·ln τ and five Planck–Einstein
 * terms. Normal hydrogen is the 3:1 ortho–para mixture of room temperature, treated as a pure fluid (no
 * ortho–para conversion). Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const hydrogen: FluidData = {
	id: 'hydrogen',
	name: 'Hydrogen (normal)',
	formula: 'H2',
	aliases: ['h2', 'lh2', 'gh2', 'normal hydrogen', 'n-h2', 'r702', 'r-702', 'liquid hydrogen'],
	group: 'cryogen',
	formulation: {
		name: 'Leachman–Jacobsen–Penoncello–Lemmon (2009)',
		reference:
			'J. W. Leachman, R. T Jacobsen, S. G. Penoncello, E. W. Lemmon, "Fundamental Equations of State for Parahydrogen, Normal Hydrogen, and Orthohydrogen", J. Phys. Chem. Ref. Data 38 (2009) 721–748, doi:10.1063/1.3160306',
		provenance:
			'Residual coefficients (normal hydrogen) transcribed from the public CoolProp data file (CoolProp/CoolProp, ' +
			'dev/fluids/Hydrogen.json) and compared term by term by script with the independent pychemqt copy ' +
			'(jjgomera/pychemqt, lib/mEoS/H2.py, H2, "leachman"): all 14 terms identical digit for digit (n, d, t, l and the ' +
			'Gaussian φ, β, γ, D, stored with the signs of exp(−η(δ − ε)² − β(τ − γ)²)). Ideal part identical: a1 = −1.4579856475, ' +
			'a2 = 1.888076782, 1.5 ln τ, Planck–Einstein a = 1.616, −0.4117, −0.792, 0.758, 1.217 with b = 531, 751, 1989, 2484, ' +
			'6859 K (written here as b/Tc). Molar mass 2.01588 g/mol, R = 8.314472 J/(mol·K), reducing point 33.145 K, ' +
			'15.508 mol/dm³. Checked in published-checks.test.ts with hydrogen.checks.ts: the paper’s Table 14 (saturation, NBP ' +
			'convention), as pychemqt gives it; no single-phase table of the paper was available in a public copy. Published scientific data (facts), copied as data; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.314472 J/(mol·K) as used by the paper
	R: 8.314472 / M,
	reducing: { T: Tc, rho: rhoc },
	critical: { T: Tc, P: 1.2964e6, rho: rhoc },
	triple: { T: 13.957, P: 7.358e3 },
	limits: { Tmin: 13.957, Tmax: 1000, Pmax: 2000e6 },
	referenceState: {
		kind: 'saturated-liquid-at-P',
		label: 'NBP: h = 0, s = 0 for saturated liquid at 101.325 kPa',
		P: 101325,
		h: 0,
		s: 0
	},
	ideal: [
		{ kind: 'lead', a1: -1.4579856475, a2: 1.888076782 },
		{ kind: 'log-tau', a: 1.5 },
		{
			kind: 'planck-einstein',
			n: [1.616, -0.4117, -0.792, 0.758, 1.217],
			gamma: [531 / Tc, 751 / Tc, 1989 / Tc, 2484 / Tc, 6859 / Tc]
		}
	],
	residual: [
		{
			kind: 'polynomial',
			n: [-6.93643, 0.01, 2.1101, 4.52059, 0.732564, -1.34086, 0.130985],
			d: [1, 4, 1, 1, 2, 2, 3],
			t: [0.6844, 1, 0.989, 0.489, 0.803, 1.1444, 1.409]
		},
		{
			kind: 'exponential',
			n: [-0.777414, 0.351944],
			d: [1, 3],
			t: [1.754, 1.311],
			l: [1, 1]
		},
		{
			kind: 'gaussian',
			n: [-0.0211716, 0.0226312, 0.032187, -0.0231752, 0.0557346],
			d: [2, 1, 3, 1, 1],
			t: [4.187, 5.646, 0.791, 7.249, 2.986],
			alpha: [1.685, 0.489, 0.103, 2.506, 1.607],
			beta: [0.171, 0.2245, 0.1304, 0.2785, 0.3967],
			gamma: [0.7164, 1.3444, 1.4517, 0.7204, 1.5445],
			epsilon: [1.506, 0.156, 1.736, 0.67, 1.662]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-4.89789, 0.988558, 0.349689, 0.499356],
			t: [1, 1.5, 2, 2.85],
			yc: 1.2964e6,
			source: ANCILLARY_SOURCE
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [15.456, -41.72, 50.276, -27.947, 5.6718],
			t: [0.62, 0.83, 1.05, 1.3, 1.6],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-2.9962, -16.724, 15.819, -16.852, 34.586, -53.754],
			t: [0.466, 2, 2.4, 4, 7, 8],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		}
	}
};
