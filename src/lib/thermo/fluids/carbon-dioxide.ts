import { IIR_REFERENCE_STATE, type FluidData } from './schema.ts';

/**
 * Carbon dioxide, reference equation of Span & Wagner (1996): 42 residual terms
 * (7 polynomial, 27 exponential, 5 Gaussian, 3 non-analytic) and a Planck–Einstein ideal part.
 * Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const carbonDioxide: FluidData = {
	id: 'carbon-dioxide',
	name: 'Carbon dioxide',
	formula: 'CO2',
	aliases: ['co2', 'r744', 'r-744', 'carbon dioxide'],
	group: 'refrigerant',
	formulation: {
		name: 'Span–Wagner (1996)',
		reference:
			'R. Span, W. Wagner, "A New Equation of State for Carbon Dioxide Covering the Fluid Region from the Triple-Point Temperature to 1100 K at Pressures up to 800 MPa", J. Phys. Chem. Ref. Data 25 (1996) 1509–1596, doi:10.1063/1.555991',
		provenance:
			'Coefficients of the ideal-gas and residual parts transcribed from the public pychemqt repository ' +
			'(jjgomera/pychemqt, lib/mEoS/CO2.py, 14 significant digits as printed in the paper) and compared term by term by script ' +
			'with the independent CoolProp data file (CoolProp/CoolProp, dev/fluids/CarbonDioxide.json, 12 digits): every exponent and ' +
			'Gaussian / non-analytic parameter is identical and every n agrees to the digits CoolProp keeps (≤ 4e-12 relative). ' +
			'Ancillary equations: the paper’s own vapor-pressure and saturated-density equations as carried by pychemqt, checked ' +
			'against the equation’s saturation states (worst 4e-5 in P, 3e-4 / 6e-4 in the densities away from Tc). ' +
			'Checked in other-fluids.test.ts against the paper’s Table 34 (saturation) and Table 35 (single phase) and its ' +
			'critical and triple points. Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: 0.0440098,
	// R = Rm/M with Rm = 8.31451 J/(mol·K) as used by the paper
	R: 8.31451 / 0.0440098,
	reducing: { T: 304.1282, rho: 467.6 },
	critical: { T: 304.1282, P: 7.3773e6, rho: 467.6 },
	triple: { T: 216.592, P: 0.51795e6 },
	limits: { Tmin: 216.592, Tmax: 1100, Pmax: 800e6 },
	referenceState: IIR_REFERENCE_STATE,
	ideal: [
		{ kind: 'lead', a1: 8.37304456, a2: -3.70454304 },
		{ kind: 'log-tau', a: 2.5 },
		{
			kind: 'planck-einstein',
			n: [1.99427042, 0.62105248, 0.41195293, 1.04028922, 0.08327678],
			gamma: [3.15163, 6.1119, 6.77708, 11.32384, 27.08792]
		}
	],
	residual: [
		{
			kind: 'polynomial',
			n: [
				0.38856823203161, 0.2938547594274e1, -0.55867188534934e1, -0.76753199592477,
				0.31729005580416, 0.54803315897767, 0.12279411220335
			],
			d: [1, 1, 1, 1, 2, 2, 3],
			t: [0.0, 0.75, 1.0, 2.0, 0.75, 2.0, 0.75]
		},
		{
			kind: 'exponential',
			n: [
				0.2165896154322e1, 0.15841735109724e1, -0.23132705405503, 0.58116916431436e-1,
				-0.55369137205382, 0.48946615909422, -0.24275739843501e-1, 0.62494790501678e-1,
				-0.12175860225246, -0.37055685270086, -0.16775879700426e-1, -0.11960736637987,
				-0.45619362508778e-1, 0.35612789270346e-1, -0.74427727132052e-2, -0.17395704902432e-2,
				-0.21810121289527e-1, 0.24332166559236e-1, -0.37440133423463e-1, 0.14338715756878,
				-0.13491969083286, -0.2315122505348e-1, 0.12363125492901e-1, 0.2105832197294e-2,
				-0.33958519026368e-3, 0.55993651771592e-2, -0.30335118055646e-3
			],
			d: [1, 2, 4, 5, 5, 5, 6, 6, 6, 1, 1, 4, 4, 4, 7, 8, 2, 3, 3, 5, 5, 6, 7, 8, 10, 4, 8],
			t: [
				1.5, 1.5, 2.5, 0, 1.5, 2, 0, 1, 2, 3, 6, 3, 6, 8, 6, 0, 7, 12, 16, 22, 24, 16, 24, 8, 2, 28,
				14
			],
			l: [1, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 4, 4, 4, 5, 6]
		},
		{
			kind: 'gaussian',
			n: [
				-0.2136548868832e3, 0.26641569149272e5, -0.24027212204557e5, -0.28341603423999e3,
				0.21247284400179e3
			],
			d: [2, 2, 2, 3, 3],
			t: [1, 0, 1, 3, 3],
			alpha: [25, 25, 25, 15, 20],
			beta: [325, 300, 300, 275, 275],
			gamma: [1.16, 1.19, 1.19, 1.25, 1.22],
			epsilon: [1, 1, 1, 1, 1]
		},
		{
			kind: 'non-analytic',
			n: [-0.66642276540751, 0.72608632349897, 0.55068668612842e-1],
			a: [3.5, 3.5, 3.0],
			b: [0.875, 0.925, 0.875],
			beta: [0.3, 0.3, 0.3],
			A: [0.7, 0.7, 0.7],
			B: [0.3, 0.3, 1.0],
			C: [10.0, 10.0, 12.5],
			D: [275, 275, 275]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-7.0602087, 1.9391218, -1.6463597, -3.2995634],
			t: [1, 1.5, 2, 4],
			yc: 7.3773e6,
			source:
				'Span & Wagner (1996), vapor-pressure ancillary equation (via pychemqt lib/mEoS/CO2.py)'
		},
		rhoLiquid: {
			form: 'ln-ratio',
			n: [1.9245108, -0.62385555, -0.32731127, 0.39245142],
			t: [0.34, 0.5, 10 / 6, 11 / 6],
			yc: 467.6,
			source:
				'Span & Wagner (1996), saturated-liquid-density ancillary equation (via pychemqt lib/mEoS/CO2.py)'
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-1.7074879, -0.8227467, -4.6008549, -10.111178, -29.742252],
			t: [0.34, 0.5, 1, 7 / 3, 14 / 3],
			yc: 467.6,
			source:
				'Span & Wagner (1996), saturated-vapor-density ancillary equation (via pychemqt lib/mEoS/CO2.py)'
		}
	}
};
