import { IIR_REFERENCE_STATE, type FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.1140416;
const Tc = 382.513;
const rhoc = 4.29e3 * M;

const ANCILLARY_SOURCE =
	'Thol & Lemmon (2016), ancillary equations (θ = 1 − T/382.513 K), as carried by pychemqt lib/mEoS/R1234zeE.py; starting guesses only';

/**
 * R-1234ze(E) (trans-1,3,3,3-tetrafluoropropene), reference equation of Thol & Lemmon (2016): 16 residual
 * terms (5 polynomial, 5 exponential, 6 Gaussian); ideal part ln δ + a1 + a2·τ + 3·ln τ and two Planck–Einstein terms.
 * Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const r1234zeE: FluidData = {
	id: 'r1234ze-e',
	name: 'R-1234ze(E)',
	formula: 'CHF=CHCF3',
	aliases: [
		'r1234ze(e)',
		'r-1234ze(e)',
		'r1234ze',
		'r-1234ze',
		'r1234zee',
		'hfo-1234ze(e)',
		'hfo-1234ze',
		'trans-1,3,3,3-tetrafluoropropene'
	],
	group: 'refrigerant',
	formulation: {
		name: 'Thol–Lemmon (2016)',
		reference:
			'M. Thol, E. W. Lemmon, "Equation of State for the Thermodynamic Properties of trans-1,3,3,3-Tetrafluoropropene [R-1234ze(E)]", Int. J. Thermophys. 37 (2016) 28, doi:10.1007/s10765-016-2040-6',
		provenance:
			'Residual coefficients transcribed from the public CoolProp data file (CoolProp/CoolProp, dev/fluids/R1234ze(E).json) and ' +
			'compared term by term by script with the independent pychemqt copy (jjgomera/pychemqt, lib/mEoS/R1234zeE.py, class ' +
			'R1234zeE, "thol"): all 16 terms identical digit for digit (n, d, t, l and the Gaussian η, β, γ, ε). Ideal part: 3 ln τ and ' +
			'Planck–Einstein v = 9.3575, 10.717 with u = 513, 1972 K (written here as u/Tc) in both; a1, a2 are set by the IIR reference ' +
			'state. Molar mass 114.0416 g/mol, reducing point 382.513 K, 4.29 mol/dm³ (both). R = 8.3144621 J/(mol·K) as in pychemqt ' +
			'(CoolProp carries 8.314472): the paper’s Table 3 values, printed to 7 digits, are reproduced with 8.3144621 and not with ' +
			'8.314472. Checked in published-checks.test.ts with r1234ze-e.checks.ts: Table 3 (computer-program verification). No ' +
			'saturation table of the paper was available in a public copy: saturation is checked at the critical and normal ' +
			'boiling points only. Limits 420 K and 100 MPa as the paper states them (from memory). Triple-point pressure 218.6 Pa: the equation’s own saturation pressure at 168.62 K, rounded. Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.3144621 J/(mol·K) as used by the paper
	R: 8.3144621 / M,
	reducing: { T: Tc, rho: rhoc },
	critical: { T: Tc, P: 3.6349e6, rho: rhoc },
	triple: { T: 168.62, P: 218.6 },
	limits: { Tmin: 168.62, Tmax: 420, Pmax: 100e6 },
	referenceState: IIR_REFERENCE_STATE,
	ideal: [
		{ kind: 'lead', a1: -12.558347537, a2: 8.7912297624 },
		{ kind: 'log-tau', a: 3 },
		{ kind: 'planck-einstein', n: [9.3575, 10.717], gamma: [513 / Tc, 1972 / Tc] }
	],
	residual: [
		{
			kind: 'polynomial',
			n: [0.03982797, 1.812227, -2.537512, -0.5333254, 0.1677031],
			d: [4, 1, 1, 2, 3],
			t: [1, 0.223, 0.755, 1.24, 0.44]
		},
		{
			kind: 'exponential',
			n: [-1.323801, -0.6694654, 0.8072718, -0.7740229, -0.01843846],
			d: [1, 3, 2, 2, 7],
			t: [2, 2.2, 1.2, 1.5, 0.9],
			l: [2, 2, 1, 2, 1]
		},
		{
			kind: 'gaussian',
			n: [1.407916, -0.4237082, -0.2270068, -0.805213, 0.00994318, -0.008798793],
			d: [1, 1, 3, 3, 2, 1],
			t: [1.33, 1.75, 2.11, 1, 1.5, 1],
			alpha: [1, 1.61, 1.24, 9.34, 5.78, 3.08],
			beta: [1.21, 1.37, 0.98, 171, 47.4, 15.4],
			gamma: [0.943, 0.642, 0.59, 1.2, 1.33, 0.64],
			epsilon: [0.728, 0.87, 0.855, 0.79, 1.3, 0.71]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-7.5888, 1.9696, -2.0827, -4.1238],
			t: [1, 1.5, 2.2, 4.6],
			yc: 3.6349e6,
			source: ANCILLARY_SOURCE
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [1.1913, 2.2456, -1.7747, 1.3096],
			t: [0.27, 0.7, 1.25, 1.9],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-1.0308, -5.0422, -11.5, -37.499, -77.945],
			t: [0.24, 0.72, 2.1, 4.8, 9.5],
			yc: rhoc,
			source: ANCILLARY_SOURCE
		}
	}
};
