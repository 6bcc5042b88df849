import { IIR_REFERENCE_STATE, type FluidData } from './schema.ts';

const FITTED_SOURCE = 'fitted to this equation by tests/reference/fit-ancillaries.py';

/** Molar mass used by the equation, kg/mol. */
const M = 0.01703026;

/**
 * Ammonia, reference equation of Tillner-Roth, Harms-Watzenberg & Baehr (1993):
 * 21 residual terms (5 polynomial, 16 exponential); ideal part with power terms.
 * Coefficients are numbers published with the equation; see `formulation.provenance`.
 */
export const ammonia: FluidData = {
	id: 'ammonia',
	name: 'Ammonia',
	formula: 'NH3',
	aliases: ['nh3', 'r717', 'r-717'],
	group: 'refrigerant',
	formulation: {
		name: 'Tillner-Roth–Harms-Watzenberg–Baehr (1993)',
		reference:
			'R. Tillner-Roth, F. Harms-Watzenberg, H. D. Baehr, "Eine neue Fundamentalgleichung für Ammoniak", DKV-Tagungsbericht 20 (1993) 167–181',
		provenance:
			'Coefficients transcribed from python3-iapws 1.5.2 (Debian, iapws/ammonia.py, class NH3) and compared term by term by ' +
			'script with two independent copies of the coefficients: NIST’s teqp (usnistgov/teqp, include/teqp/models/ammonia_water.hpp) and ' +
			'ASCEND (ascend4/ascend4, models/johnpye/fprops/fluids/ammonia.c, stated as taken from REFPROP 7.0): identical, including the sign of n = −0.3497111e-1, which REFPROP ' +
			'notes as misprinted in the original paper. Checked in ammonia-iapws.test.ts against python3-iapws states ' +
			'(tests/reference/iapws-ammonia.json) and in other-fluids.test.ts against the tables of Baehr & Tillner-Roth (1994), ' +
			'Springer, pp. 42 and 51. The equation does not pass exactly through its nominal critical point (405.40 K, 225 kg/m³ ' +
			'give 11.339 MPa, not 11.333 MPa; its own critical point lies near 405.50 K) — a property of the equation, shared by ' +
			'python3-iapws. Ancillary equations were fitted to the equation’s own saturation states by ' +
			'tests/reference/fit-ancillaries.py (the published ancillaries could not be established; starting guesses only). ' +
			'Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.314471 J/(mol·K) as used by the equation
	R: 8.314471 / M,
	reducing: { T: 405.4, rho: 225 },
	critical: { T: 405.4, P: 11.333e6, rho: 225 },
	triple: { T: 195.495, P: 6.0912e3 },
	limits: { Tmin: 195.495, Tmax: 700, Pmax: 1000e6 },
	referenceState: IIR_REFERENCE_STATE,
	ideal: [
		{ kind: 'lead', a1: -15.81502, a2: 4.255726 },
		{ kind: 'log-tau', a: -1 },
		{ kind: 'power', n: [11.47434, -1.296211, 0.5706757], t: [1 / 3, -1.5, -1.75] }
	],
	residual: [
		{
			kind: 'polynomial',
			n: [-0.1858814e1, 0.4554431e-1, 0.7238548, 0.122947e-1, 0.2141882e-10],
			d: [1, 2, 1, 4, 15],
			t: [1.5, -0.5, 0.5, 1, 3]
		},
		{
			kind: 'exponential',
			n: [
				-0.143002e-1, 0.3441324, -0.2873571, 0.2352589e-4, -0.3497111e-1, 0.1831117e-2,
				0.2397852e-1, -0.4085375e-1, 0.2379275, -0.3548972e-1, -0.1823729, 0.2281556e-1,
				-0.6663444e-2, -0.8847486e-2, 0.2272635e-2, -0.5588655e-3
			],
			d: [3, 3, 1, 8, 2, 8, 1, 1, 2, 3, 2, 4, 3, 1, 2, 4],
			t: [0, 3, 4, 4, 5, 5, 3, 6, 8, 8, 10, 10, 5, 7.5, 15, 30],
			l: [1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 2, 3, 3, 3, 3]
		}
	],
	ancillaries: {
		// Fitted to this equation’s own saturation states by tests/reference/fit-ancillaries.py (starting guesses only).
		// worst relative deviation of the fit: pSat 5.6e-04  rhoLiquid 6.3e-03 (θ > 1e-3; 1.5e-02 all)  rhoVapor 7.0e-03 (θ > 1e-3; 1.2e-02 all)
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [
				-7.0669235317, 1.3059110658e-1, 1.7338220308e1, -4.1988600836e1, 5.8987486675e1,
				-5.2608693904e1, 2.5339159179e1
			],
			t: [1, 1.5, 2.5, 3, 4, 5, 7.5],
			yc: 11333000,
			source: FITTED_SOURCE
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [
				8.720663325, -5.3510971765e1, 1.2160538237e2, -2.2057464459e2, 2.4720505769e2,
				-1.7300944824e2, 1.1038237056e2, -5.8415967937e1
			],
			t: [1 / 3, 0.5, 2 / 3, 1, 4 / 3, 2, 3, 5],
			yc: 225,
			source: FITTED_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [
				-9.3498554856, 6.0058825026e1, -1.3475536951e2, 2.3550106928e2, -2.7253924356e2,
				2.0560045611e2, -1.7833165613e2, 1.4672738433e2, -2.7732471265e2
			],
			t: [1 / 3, 0.5, 2 / 3, 1, 4 / 3, 2, 3, 5, 8],
			yc: 225,
			source: FITTED_SOURCE
		}
	}
};
