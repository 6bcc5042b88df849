import type { Ancillary, FluidData } from './schema.ts';

/**
 * Air as a pseudo-pure fluid: Lemmon, Jacobsen, Penoncello & Friend (2000).
 *
 * `airEquation` is the equation as published (air.test.ts reproduces the paper's printed
 * single-phase table and its bubble- and dew-point pressures with it); `air` is the registered
 * fluid: the same equation on the NBP-style reference state, with its two-phase band
 * (`airBoundaries`, pseudo-pure.ts) between the bubble and dew lines, where states are refused.
 * See docs/fluids.md.
 */

/** Molar mass of the paper, kg/mol (0.7812 N₂, 0.0092 Ar, 0.2096 O₂ by mole). */
const M = 0.0289586;
/** Maxcondentherm point, the reducing point of the equation: K, Pa, mol/dm³. */
const Tj = 132.6312;
const Pj = 3.78502e6;
const rhoj = 10.4477 * 1e3 * M;

const ANCILLARY_SOURCE =
	'Lemmon, Jacobsen, Penoncello & Friend (2000), Eqs. (1)–(3) and Table 10 (θ = 1 − T/132.6312 K), ' +
	'as carried by pychemqt lib/mEoS/Air.py and compared with CoolProp dev/fluids/Air.json (see provenance)';

const PROVENANCE =
	'Residual coefficients (Table 13 of the paper: 19 terms, n, d, t, l) and ideal-gas coefficients (Table 12: N1–N13) ' +
	'transcribed from the public CoolProp data file (CoolProp/CoolProp, dev/fluids/Air.json) and compared by script, digit ' +
	'for digit, with two independent copies: pychemqt (jjgomera/pychemqt, lib/mEoS/Air.py) and the Fortran of the ' +
	'TEOS-10 SIA library by D. G. Wright (module air_1, init_iapws10, "Tables 12 and 13 of Lemmon et al. (2000)"): all 19 ' +
	'residual terms and all 13 ideal-gas coefficients identical in the three (n17 = +0.000233594806142 in each). ' +
	'Reducing (maxcondentherm) point 132.6312 K, 3.78502 MPa, 10.4477 mol/dm³; R = 8.31451 J/(mol·K): identical in all three. ' +
	'Molar mass: the paper’s 28.9586 g/mol (pychemqt; TEOS-10 SIA version 1.0, whose constants file names it as Lemmon et ' +
	'al. 2000’s). CoolProp uses 28.96546 g/mol, the later CIPM value that TEOS-10 SIA 1.1 also switched to; molar ' +
	'properties do not depend on it, mass-based ones by 2.4e−4. Bubble- and dew-point ancillaries (Table 10): coefficients ' +
	'identical in pychemqt and CoolProp; their exponents differ for the dew-point pressure (CoolProp 0.5, 1, 1.5, 2; ' +
	'pychemqt 0.5, 1, 2.5, 4). The paper’s printed ' +
	'Table A1 decides: with 0.5, 1, 2.5, 4 every printed dew pressure is reproduced, with CoolProp’s the 59.75 K one is ' +
	'off by a factor 4 (air.test.ts). Bubble- and dew-point densities (Eqs. 2, 3): as pychemqt carries them. ' +
	'Maxcondenbar point 132.6035 K, 3.7891 MPa, 11.0948 mol/dm³ (CoolProp); ' +
	'critical point of the mixture 132.5306 K, 3.7860 MPa, 11.8308 mol/dm³ (CoolProp; fprops). ' +
	'Published scientific data (facts), transcribed; no code copied.';

/**
 * The equation as a fluid data file would hold it, on the paper’s own energy convention (ideal-gas
 * constants N4, N5 as published). `ancillaries` is left out: air has bubble and dew lines instead
 * of one saturation line (`airBoundaries`).
 */
export const airEquation: Omit<FluidData, 'ancillaries'> = {
	id: 'air',
	name: 'Air',
	formula: 'N₂ + O₂ + Ar',
	aliases: ['r729', 'r-729', 'lair', 'liquid air', 'dry air'],
	group: 'cryogen',
	formulation: {
		name: 'Lemmon–Jacobsen–Penoncello–Friend (2000)',
		reference:
			'E. W. Lemmon, R. T Jacobsen, S. G. Penoncello, D. G. Friend, "Thermodynamic Properties of Air and Mixtures of Nitrogen, Argon, and Oxygen From 60 to 2000 K at Pressures to 2000 MPa", J. Phys. Chem. Ref. Data 29 (2000) 331–385, doi:10.1063/1.1285884',
		provenance: PROVENANCE
	},
	molarMass: M,
	R: 8.31451 / M,
	reducing: { T: Tj, rho: rhoj },
	// the mixture's critical point (not the reducing point): for a mixture it is neither the highest
	// temperature (maxcondentherm) nor the highest pressure (maxcondenbar) of the two-phase band
	critical: { T: 132.5306, P: 3.786e6, rho: 11.8308 * 1e3 * M },
	// lowest temperature of the equation (the solidification point of air); P: bubble-point pressure there, Table A1
	triple: { T: 59.75, P: 5265 },
	limits: { Tmin: 59.75, Tmax: 2000, Pmax: 2000e6 },
	referenceState: {
		kind: 'as-published',
		label: 'as published by Lemmon et al. (2000)'
	},
	// α⁰ = ln δ + Σ_{i=1..5} Nᵢ τ^(i−4) + N6 τ^1.5 + N7 ln τ + N8 ln(1 − e^(−N11 τ)) + N9 ln(1 − e^(−N12 τ)) + N10 ln(2/3 + e^(N13 τ))
	ideal: [
		{ kind: 'lead', a1: -13.841928076, a2: 17.275266575 },
		{
			kind: 'power',
			n: [6.057194e-8, -2.10274769e-5, -1.58860716e-4, -1.9536342e-4],
			t: [-3, -2, -1, 1.5]
		},
		{ kind: 'log-tau', a: 2.490888032 },
		{ kind: 'planck-einstein', n: [0.791309509, 0.212236768], gamma: [25.36365, 16.90741] },
		{ kind: 'log-c-plus-exp', n: [-0.197938904], c: [2 / 3], gamma: [87.31279] }
	],
	residual: [
		{
			kind: 'polynomial',
			n: [
				0.118160747229, 0.713116392079, -1.61824192067, 0.0714140178971, -0.0865421396646,
				0.134211176704, 0.0112626704218, -0.0420533228842, 0.0349008431982, 0.000164957183186
			],
			d: [1, 1, 1, 2, 3, 3, 4, 4, 4, 6],
			t: [0, 0.33, 1.01, 0, 0, 0.15, 0, 0.2, 0.35, 1.35]
		},
		{
			kind: 'exponential',
			n: [
				-0.101365037912, -0.17381369097, -0.0472103183731, -0.0122523554253, -0.146629609713,
				-0.0316055879821, 0.000233594806142, 0.0148287891978, -0.00938782884667
			],
			d: [1, 3, 5, 6, 1, 3, 11, 1, 3],
			t: [1.6, 0.8, 0.95, 1.25, 3.6, 6, 3.25, 3.5, 15],
			l: [1, 1, 1, 1, 2, 2, 2, 3, 3]
		}
	]
};

/** ρ/ρj = 1 + Σ nᵢ θ^tᵢ + nLog·ln(T/Tj) (the paper's Eq. 2, bubble-point density), θ = 1 − T/Tj. */
export interface BubbleDensityEq {
	n: number[];
	t: number[];
	nLog: number;
	/** ρj, kg/m³, and Tj, K */
	yc: number;
	Tr: number;
	source: string;
}

/** The two lines that bound air's two-phase band, below the maxcondentherm temperature. */
export const airBoundaries: {
	maxcondentherm: { T: number; P: number; rho: number };
	maxcondenbar: { T: number; P: number; rho: number };
	bubblePressure: Ancillary;
	dewPressure: Ancillary;
	bubbleDensity: BubbleDensityEq;
	dewDensity: Ancillary;
} = {
	maxcondentherm: { T: Tj, P: Pj, rho: rhoj },
	maxcondenbar: { T: 132.6035, P: 3.7891e6, rho: 11.0948 * 1e3 * M },
	// Eq. (1): ln(P/Pj) = (Tj/T) Σ Nᵢ θ^(i/2)
	bubblePressure: {
		form: 'ln-ratio-tc-over-t',
		n: [0.2260724, -7.080499, 5.700283, -12.44017, 17.81926, -10.81364],
		t: [0.5, 1, 1.5, 2, 2.5, 3],
		yc: Pj,
		Tr: Tj,
		source: ANCILLARY_SOURCE
	},
	dewPressure: {
		form: 'ln-ratio-tc-over-t',
		n: [-0.1567266, -5.539635, 0.7567212, -3.514322],
		t: [0.5, 1, 2.5, 4],
		yc: Pj,
		Tr: Tj,
		source: ANCILLARY_SOURCE
	},
	bubbleDensity: {
		n: [44.3413, -240.073, 285.139, -88.3366],
		t: [0.65, 0.85, 0.95, 1.1],
		nLog: -0.892181,
		yc: rhoj,
		Tr: Tj,
		source: ANCILLARY_SOURCE
	},
	// Eq. (3): ln(ρ/ρj) = Σ Nᵢ θ^tᵢ
	dewDensity: {
		form: 'ln-ratio',
		n: [-2.0466, -4.752, -13.259, -47.652],
		t: [0.41, 1, 2.8, 6.5],
		yc: rhoj,
		Tr: Tj,
		source: ANCILLARY_SOURCE
	}
};

/**
 * The registered fluid. The engine's pure-fluid solvers run on the equation (its own phase
 * equilibrium, whose critical point 131.86 K, 322 kg/m³ lies inside the band, is never served: every
 * such state lies between the dew and bubble lines and is refused by pseudo-pure.ts); quality
 * inputs mean the bubble line (x = 0) or the dew line (x = 1).
 */
export const air: FluidData = {
	...airEquation,
	aliases: [...airEquation.aliases, 'compressed air'],
	referenceState: {
		kind: 'bubble-liquid-at-P',
		label:
			'NBP-style: h = 0, s = 0 for the liquid at its bubble point at 101.325 kPa (78.90 K); the paper’s own constants are kept in airEquation',
		P: 101325,
		h: 0,
		s: 0
	},
	// the equation's own critical point (dP/dρ = d²P/dρ² = 0), found by a scan of (∂P/∂ρ)_T from the published mixture critical point
	equationCriticalGuess: { T: 131.87, rho: 322 },
	ancillaries: {
		// starting guesses only: the equation's own vapor pressure lies between these lines
		pSat: airBoundaries.bubblePressure,
		rhoLiquid: {
			form: 'ratio-plus-one',
			n: [
				23549.22872973586, -36125.479937395976, 29748.003516251414, -25536.830521053136,
				8367.433264822796, 1.3265163441261232
			],
			t: [0.052, 0.058, 0.086, 0.107, 0.125, 8.0],
			yc: 11830.8 * M,
			Tr: 132.5306,
			source:
				'CoolProp dev/fluids/Air.json ANCILLARIES.rhoL (a fit to the equation’s own saturated-liquid density); starting guesses only'
		},
		rhoVapor: airBoundaries.dewDensity
	},
	band: airBoundaries
};
