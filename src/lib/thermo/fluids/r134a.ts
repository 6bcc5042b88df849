import { IIR_REFERENCE_STATE, type FluidData } from './schema.ts';

const PUBLISHED_SOURCE =
	'Tillner-Roth & Baehr (1994), J. Phys. Chem. Ref. Data 23, 657, ancillary equations (θ = 1 − T/374.18 K); see formulation.provenance';

/** Molar mass used by the equation, kg/mol. */
const M = 0.102032;

/**
 * R-134a (1,1,1,2-tetrafluoroethane), reference equation of Tillner-Roth & Baehr (1994):
 * 21 residual terms (8 polynomial, 13 exponential). Its reducing temperature and density
 * (374.18 K, 508 kg/m³) differ from its critical point (374.21 K, 511.9 kg/m³).
 */
export const r134a: FluidData = {
	id: 'r134a',
	name: 'R-134a',
	formula: 'CH2FCF3',
	aliases: ['r-134a', 'hfc-134a', 'hfc134a', '1,1,1,2-tetrafluoroethane'],
	group: 'refrigerant',
	formulation: {
		name: 'Tillner-Roth–Baehr (1994)',
		reference:
			'R. Tillner-Roth, H. D. Baehr, "An International Standard Formulation for the Thermodynamic Properties of 1,1,1,2-Tetrafluoroethane (HFC-134a) for Temperatures from 170 K to 455 K and Pressures up to 70 MPa", J. Phys. Chem. Ref. Data 23 (1994) 657–729, doi:10.1063/1.555958',
		provenance:
			'Coefficients transcribed from the public pychemqt repository (jjgomera/pychemqt, lib/mEoS/R134a.py) and compared term ' +
			'by term by script with two independent copies of the coefficients, CoolProp (CoolProp/CoolProp, dev/fluids/R134a.json) and Cantera ' +
			'(Cantera/cantera, src/tpx/HFC134a.cpp): identical. Ancillary equations (starting guesses only): the paper’s vapor ' +
			'pressure (4.05629 MPa at 374.18 K), saturated liquid density and saturated vapor density (516.86 kg/m³), all reduced ' +
			'with 374.18 K, as transcribed by public implementations citing the paper: a C library by M. Engelpracht ' +
			'(refrigerant_vaporPressure.c, refrigerant_saturatedLiquidDensity.c), CoolProp’s former R134a.cpp, SINTEF thermopack and ' +
			'IDAES. Their coefficients agree; they differ in reducing values (CoolProp’s: 374.15 K for the densities, the critical ' +
			'pressure for the vapor pressure) and in two exponents of the vapor-density equation (9/4 or 5/2, 11/2 or 11/12). The ' +
			'choice here (374.18 K, 4.05629 MPa, 9/4, 11/2) is the one that follows the equation itself: vapor pressure within ' +
			'0.02 % from 240 K to Tc, liquid density within 0.03 % to 370 K, vapor density within 0.05 % from 260 to 340 K (with ' +
			'5/2: 73 % off); checked in other-fluids.test.ts. ' +
			'Checked in other-fluids.test.ts against the paper’s Table 8 ' +
			'(saturation, IIR energies) and Table 9 (single phase) and its critical and triple points. ' +
			'Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.314471 J/(mol·K) as used by the paper
	R: 8.314471 / M,
	reducing: { T: 374.18, rho: 508 },
	critical: { T: 374.21, P: 4.05928e6, rho: 511.9 },
	triple: { T: 169.85, P: 389.56 },
	limits: { Tmin: 169.85, Tmax: 455, Pmax: 70e6 },
	referenceState: IIR_REFERENCE_STATE,
	ideal: [
		{ kind: 'lead', a1: -1.019535, a2: 9.047135 },
		{ kind: 'log-tau', a: -1.629789 },
		{ kind: 'power', n: [-9.723916, -3.92717], t: [-0.5, -0.75] }
	],
	residual: [
		{
			kind: 'polynomial',
			n: [
				0.5586817e-1, 0.498223, 0.2458698e-1, 0.8570145e-3, 0.4788584e-3, -0.1800808e1, 0.2671641,
				-0.4781652e-1
			],
			d: [2, 1, 3, 6, 6, 1, 1, 2],
			t: [-0.5, 0, 0, 0, 1.5, 1.5, 2, 2]
		},
		{
			kind: 'exponential',
			n: [
				0.1423987e-1, 0.3324062, -0.7485907e-2, 0.1017263e-3, -0.5184567, -0.8692288e-1, 0.2057144,
				-0.5000457e-2, 0.4603262e-3, -0.3497836e-2, 0.6995038e-2, -0.1452184e-1, -0.1285458e-3
			],
			d: [5, 2, 2, 4, 1, 4, 1, 2, 4, 1, 5, 3, 10],
			t: [1, 3, 5, 1, 5, 5, 6, 10, 10, 10, 18, 22, 50],
			l: [1, 1, 1, 2, 2, 2, 2, 2, 2, 3, 3, 3, 4]
		}
	],
	ancillaries: {
		// Tillner-Roth & Baehr (1994), the paper's ancillary equations, reduced with 374.18 K (starting guesses only)
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-7.686556, 2.311791, -2.039554, -3.583758],
			t: [1, 1.5, 2, 4],
			yc: 4.05629e6,
			Tr: 374.18,
			source: PUBLISHED_SOURCE
		},
		rhoLiquid: {
			// ρ'/(kg/m³) = 518.20 + 884.13·θ^(1/3) + 485.84·θ^(2/3) + 193.29·θ^(10/3)
			form: 'ratio-plus-one',
			n: [884.13 / 518.2, 485.84 / 518.2, 193.29 / 518.2],
			t: [1 / 3, 2 / 3, 10 / 3],
			yc: 518.2,
			Tr: 374.18,
			source: PUBLISHED_SOURCE
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-2.837294, -7.875988, 4.478586, -14.140125, -52.361297],
			t: [1 / 3, 2 / 3, 1 / 2, 9 / 4, 11 / 2],
			yc: 516.86,
			Tr: 374.18,
			source: PUBLISHED_SOURCE
		}
	}
};
