import type { FluidData } from './schema.ts';

/**
 * Water and steam, IAPWS-95.
 *
 * Coefficients: IAPWS R6-95(2018), "Revised Release on the IAPWS Formulation 1995 for the
 * Thermodynamic Properties of Ordinary Water Substance for General and Scientific Use",
 * Tables 1 (ideal-gas part, Eq. 5) and 2 (residual part, Eq. 6); also Wagner & Pruß (2002),
 * J. Phys. Chem. Ref. Data 31, 387–535.
 * Ancillary saturation equations (starting guesses only): IAPWS SR1-86(1992), "Revised
 * Supplementary Release on Saturation Properties of Ordinary Water Substance", Eqs. 1–3
 * (Wagner & Pruß (1993), J. Phys. Chem. Ref. Data 22, 783–787).
 */
export const water: FluidData = {
	id: 'water',
	name: 'Water',
	formula: 'H2O',
	aliases: ['steam', 'h2o', 'r718', 'r-718'],
	group: 'water',
	formulation: {
		name: 'IAPWS-95',
		reference:
			'IAPWS R6-95(2018), Revised Release on the IAPWS Formulation 1995 for the Thermodynamic Properties of Ordinary Water Substance for General and Scientific Use; W. Wagner and A. Pruß, J. Phys. Chem. Ref. Data 31, 387–535 (2002)',
		provenance:
			"Coefficients transcribed from the tables of IAPWS R6-95(2018) as printed, and checked number by number against the same tables in python3-iapws 1.5.2 (Debian, iapws/iapws95.py, class IAPWS95). Verified by the release's own check values (Tables 6, 7 and 8). IAPWS releases are freely available and their equations may be used without licence."
	},
	molarMass: 0.018015268,
	R: 461.51805,
	reducing: { T: 647.096, rho: 322 },
	critical: { T: 647.096, P: 22.064e6, rho: 322 },
	triple: { T: 273.16, P: 611.654771 },
	limits: { Tmin: 273.16, Tmax: 1273, Pmax: 1000e6 },
	referenceState: {
		kind: 'as-published',
		label: 'IAPWS-95: internal energy and entropy zero for saturated liquid at the triple point'
	},
	ideal: [
		// Table 1: n°1, n°2 (2018 values), n°3 ln τ, n°4…n°8 with γ°4…γ°8
		{ kind: 'lead', a1: -8.3204464837497, a2: 6.6832105275932 },
		{ kind: 'log-tau', a: 3.00632 },
		{
			kind: 'planck-einstein',
			n: [0.012436, 0.97315, 1.2795, 0.96956, 0.24873],
			gamma: [1.28728967, 3.53734222, 7.74073708, 9.24437796, 27.5075105]
		}
	],
	residual: [
		// Table 2, i = 1…7
		{
			kind: 'polynomial',
			n: [
				0.12533547935523e-1, 0.78957634722828e1, -0.87803203303561e1, 0.31802509345418,
				-0.26145533859358, -0.78199751687981e-2, 0.88089493102134e-2
			],
			d: [1, 1, 1, 2, 2, 3, 4],
			t: [-0.5, 0.875, 1, 0.5, 0.75, 0.375, 1]
		},
		// Table 2, i = 8…51 (exponent of δ in exp(−δ^c) is c)
		{
			kind: 'exponential',
			n: [
				-0.66856572307965, 0.20433810950965, -0.66212605039687e-4, -0.19232721156002,
				-0.25709043003438, 0.16074868486251, -0.4009282892587e-1, 0.39343422603254e-6,
				-0.75941377088144e-5, 0.56250979351888e-3, -0.15608652257135e-4, 0.11537996422951e-8,
				0.36582165144204e-6, -0.13251180074668e-11, -0.62639586912454e-9, -0.10793600908932,
				0.17611491008752e-1, 0.22132295167546, -0.40247669763528, 0.58083399985759,
				0.49969146990806e-2, -0.31358700712549e-1, -0.74315929710341, 0.4780732991548,
				0.20527940895948e-1, -0.13636435110343, 0.14180634400617e-1, 0.83326504880713e-2,
				-0.29052336009585e-1, 0.38615085574206e-1, -0.20393486513704e-1, -0.16554050063734e-2,
				0.19955571979541e-2, 0.15870308324157e-3, -0.1638856834253e-4, 0.43613615723811e-1,
				0.34994005463765e-1, -0.76788197844621e-1, 0.22446277332006e-1, -0.62689710414685e-4,
				-0.55711118565645e-9, -0.19905718354408, 0.31777497330738, -0.11841182425981
			],
			d: [
				1, 1, 1, 2, 2, 3, 4, 4, 5, 7, 9, 10, 11, 13, 15, 1, 2, 2, 2, 3, 4, 4, 4, 5, 6, 6, 7, 9, 9,
				9, 9, 9, 10, 10, 12, 3, 4, 4, 5, 14, 3, 6, 6, 6
			],
			t: [
				4, 6, 12, 1, 5, 4, 2, 13, 9, 3, 4, 11, 4, 13, 1, 7, 1, 9, 10, 10, 3, 7, 10, 10, 6, 10, 10,
				1, 2, 3, 4, 8, 6, 9, 8, 16, 22, 23, 23, 10, 50, 44, 46, 50
			],
			l: [
				1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2,
				2, 2, 2, 2, 3, 3, 3, 3, 4, 6, 6, 6, 6
			]
		},
		// Table 2, i = 52…54
		{
			kind: 'gaussian',
			n: [-0.31306260323435e2, 0.31546140237781e2, -0.25213154341695e4],
			d: [3, 3, 3],
			t: [0, 1, 4],
			alpha: [20, 20, 20],
			beta: [150, 150, 250],
			gamma: [1.21, 1.21, 1.25],
			epsilon: [1, 1, 1]
		},
		// Table 2, i = 55…56
		{
			kind: 'non-analytic',
			n: [-0.14874640856724, 0.31806110878444],
			a: [3.5, 3.5],
			b: [0.85, 0.95],
			beta: [0.3, 0.3],
			A: [0.32, 0.32],
			B: [0.2, 0.2],
			C: [28, 32],
			D: [700, 800]
		}
	],
	ancillaries: {
		pSat: {
			form: 'ln-ratio-tc-over-t',
			n: [-7.85951783, 1.84408259, -11.7866497, 22.6807411, -15.9618719, 1.80122502],
			t: [1, 1.5, 3, 3.5, 4, 7.5],
			yc: 22.064e6,
			source: 'IAPWS SR1-86(1992), Eq. 1 (Wagner & Pruß 1993)'
		},
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [1.99274064, 1.09965342, -0.510839303, -1.75493479, -45.5170352, -6.7469445e5],
			t: [1 / 3, 2 / 3, 5 / 3, 16 / 3, 43 / 3, 110 / 3],
			yc: 322,
			source: 'IAPWS SR1-86(1992), Eq. 2 (Wagner & Pruß 1993)'
		},
		rhoVapor: {
			form: 'ln-ratio',
			n: [-2.0315024, -2.6830294, -5.38626492, -17.2991605, -44.7586581, -63.9201063],
			t: [2 / 6, 4 / 6, 8 / 6, 18 / 6, 37 / 6, 71 / 6],
			yc: 322,
			source: 'IAPWS SR1-86(1992), Eq. 3 (Wagner & Pruß 1993)'
		}
	}
};
