import type { FluidData } from './schema.ts';

/** Molar mass used by the equation, kg/mol. */
const M = 0.02801348;

/**
 * Nitrogen, reference equation of Span, Lemmon, Jacobsen, Wagner & Yokozeki (2000):
 * 36 residual terms (6 polynomial, 26 exponential, 4 Gaussian); ideal part with power and
 * one Planck–Einstein term. Coefficients are numbers published in the paper; see `formulation.provenance`.
 */
export const nitrogen: FluidData = {
	id: 'nitrogen',
	name: 'Nitrogen',
	formula: 'N2',
	aliases: ['n2', 'ln2', 'gn2', 'r728', 'r-728', 'liquid nitrogen'],
	group: 'cryogen',
	formulation: {
		name: 'Span et al. (2000)',
		reference:
			'R. Span, E. W. Lemmon, R. T Jacobsen, W. Wagner, A. Yokozeki, "A Reference Equation of State for the Thermodynamic Properties of Nitrogen for Temperatures from 63.151 to 1000 K and Pressures to 2200 MPa", J. Phys. Chem. Ref. Data 29 (2000) 1361–1433, doi:10.1063/1.1349047',
		provenance:
			'Coefficients transcribed from the public pychemqt repository (jjgomera/pychemqt, lib/mEoS/N2.py, 12 significant digits ' +
			'as printed in the paper) and compared term by term by script with the independent CoolProp data file ' +
			'(CoolProp/CoolProp, dev/fluids/Nitrogen.json): identical. Reducing density 11.1839 mol/dm³ times M (the paper works in ' +
			'molar units). Ancillary equations: the paper’s own vapor-pressure and saturated-density equations as carried by pychemqt, ' +
			'checked against the equation’s saturation states (worst 2e-4 in P, 2e-4 / 1.4e-3 in the densities away from Tc). ' +
			'Checked in other-fluids.test.ts against the paper’s saturation table (p. 1403), single-phase table (p. 1410), normal ' +
			'boiling point and critical and triple points. Published scientific data (facts), transcribed; no code copied.'
	},
	molarMass: M,
	// R = Rm/M with Rm = 8.31451 J/(mol·K) as used by the paper
	R: 8.31451 / M,
	reducing: { T: 126.192, rho: 11.1839e3 * M },
	critical: { T: 126.192, P: 3.3958e6, rho: 11.1839e3 * M },
	triple: { T: 63.151, P: 12.5198e3 },
	limits: { Tmin: 63.151, Tmax: 1000, Pmax: 2200e6 },
	referenceState: {
		kind: 'saturated-liquid-at-P',
		label: 'NBP: h = 0, s = 0 for saturated liquid at 101.325 kPa',
		P: 101325,
		h: 0,
		s: 0
	},
	ideal: [
		{ kind: 'lead', a1: -12.76952708, a2: -0.00784163 },
		{ kind: 'log-tau', a: 2.5 },
		{ kind: 'power', n: [-1.934819e-4, -1.247742e-5, 6.678326e-8], t: [-1, -2, -3] },
		{ kind: 'planck-einstein', n: [1.012941], gamma: [26.65788] }
	],
	residual: [
		{
			kind: 'polynomial',
			n: [
				0.924803575275, -0.492448489428, 0.661883336938, -0.192902649201e1, -0.622469309629e-1,
				0.349943957581
			],
			d: [1, 1, 2, 2, 3, 3],
			t: [0.25, 0.875, 0.5, 0.875, 0.375, 0.75]
		},
		{
			kind: 'exponential',
			n: [
				0.564857472498, -0.161720005987e1, -0.481395031883, 0.421150636384, -0.161962230825e-1,
				0.172100994165, 0.735448924933e-2, 0.168077305479e-1, -0.107626664179e-2,
				-0.137318088513e-1, 0.635466899859e-3, 0.304432279419e-2, -0.435762336045e-1,
				-0.723174889316e-1, 0.389644315272e-1, -0.21220136391e-1, 0.408822981509e-2,
				-0.551990017984e-4, -0.462016716479e-1, -0.300311716011e-2, 0.368825891208e-1,
				-0.25585684622e-2, 0.896915264558e-2, -0.44151337035e-2, 0.133722924858e-2,
				0.264832491957e-3
			],
			d: [1, 1, 1, 3, 3, 4, 6, 6, 7, 7, 8, 8, 1, 2, 3, 4, 5, 8, 4, 5, 5, 8, 3, 5, 6, 9],
			t: [
				0.5, 0.75, 2, 1.25, 3.5, 1, 0.5, 3, 0, 2.75, 0.75, 2.5, 4, 6, 6, 3, 3, 6, 16, 11, 15, 12,
				12, 7, 4, 16
			],
			l: [1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 3, 3, 3, 3, 4, 4, 4, 4]
		},
		{
			kind: 'gaussian',
			n: [0.196688194015e2, -0.20911560073e2, 0.167788306989e-1, 0.262767566274e4],
			d: [1, 1, 3, 2],
			t: [0, 1, 2, 3],
			alpha: [20, 20, 15, 25],
			beta: [325, 325, 300, 275],
			gamma: [1.16, 1.16, 1.13, 1.25],
			epsilon: [1, 1, 1, 1]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-6.12445284, 1.2632722, -0.765910082, -1.77570564],
			t: [1, 1.5, 2.5, 5],
			yc: 3.3958e6,
			source: 'Span et al. (2000), vapor-pressure ancillary equation (via pychemqt lib/mEoS/N2.py)'
		},
		rhoLiquid: {
			form: 'ln-ratio',
			n: [1.48654237, -0.280476066, 0.894143085e-1, -0.119879866],
			t: [0.3294, 2 / 3, 8 / 3, 35 / 6],
			yc: 11.1839e3 * M,
			source:
				'Span et al. (2000), saturated-liquid-density ancillary equation (via pychemqt lib/mEoS/N2.py)'
		},
		rhoVapor: {
			form: 'ln-ratio-tc-over-t',
			n: [-1.70127164, -3.70402649, 1.29859383, -0.561424977, -2.68505381],
			t: [0.34, 5 / 6, 7 / 6, 13 / 6, 14 / 3],
			yc: 11.1839e3 * M,
			source:
				'Span et al. (2000), saturated-vapor-density ancillary equation (via pychemqt lib/mEoS/N2.py)'
		}
	}
};
