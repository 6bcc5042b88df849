/**
 * Melting and sublimation curves of the first five fluids, kept apart from their equation-of-state
 * files. Each block names its publication; values marked `from memory` were recalled, not read
 * from the paper, and are checked in solid.test.ts against the values their sources print where
 * that was possible (python3-iapws for water and ammonia).
 */
import type { SolidLines } from './schema.ts';

/**
 * Water: IAPWS R14-08(2011), "Revised Release on the Pressure along the Melting and Sublimation
 * Curves of Ordinary Water Substance", equations (1) (ice Ih), (2) (ice III), (3) (ice V),
 * (4) (ice VI), (5) (ice VII) and (6) (sublimation). The engine's range starts at the triple
 * point, so of the melting curves only ice V (to 273.31 K), VI and VII bound its states; ice Ih
 * and III lie below 273.16 K and are kept for drawing.
 */
const water: SolidLines = {
	melting: {
		source: 'IAPWS R14-08(2011), equations (1)–(5)',
		pieces: [
			{
				solid: 'ice Ih',
				form: 'power-sum',
				Tmin: 251.165,
				Tmax: 273.16,
				Tref: 273.16,
				Pref: 611.657,
				a: [-0.119539337e7, -0.808183159e5, -0.33382686e4],
				b: [0.3e1, 0.2575e2, 0.10375e3]
			},
			{
				solid: 'ice III',
				form: 'power-sum',
				Tmin: 251.165,
				Tmax: 256.164,
				Tref: 251.165,
				Pref: 208.566e6,
				a: [0.299948],
				b: [60]
			},
			{
				solid: 'ice V',
				form: 'power-sum',
				Tmin: 256.164,
				Tmax: 273.31,
				Tref: 256.164,
				Pref: 350.1e6,
				a: [1.18721],
				b: [8]
			},
			{
				solid: 'ice VI',
				form: 'power-sum',
				Tmin: 273.31,
				Tmax: 355,
				Tref: 273.31,
				Pref: 632.4e6,
				a: [1.07476],
				b: [4.6]
			},
			{
				solid: 'ice VII',
				form: 'exp-sum',
				Tmin: 355,
				Tmax: 715,
				Tref: 355,
				Pref: 2216e6,
				a: [0.173683e1, -0.544606e-1, 0.806106e-7],
				b: [-1, 5, 22]
			}
		]
	},
	sublimation: {
		source: 'IAPWS R14-08(2011), equation (6)',
		pieces: [
			{
				solid: 'ice Ih',
				form: 'exp-theta-sum',
				Tmin: 50,
				Tmax: 273.16,
				Tref: 273.16,
				Pref: 611.657,
				a: [-0.212144006e2, 0.273203819e2, -0.61059813e1],
				b: [0.333333333e-2, 0.120666667e1, 0.170333333e1]
			}
		]
	}
};

/**
 * Carbon dioxide: Span & Wagner (1996), J. Phys. Chem. Ref. Data 25, 1509, equations (3.10)
 * (melting) and (3.12) (sublimation) — from memory. The melting curve's published range ends at
 * 1100 K; the formulation's pressure limit (800 MPa) is reached well before.
 */
const carbonDioxide: SolidLines = {
	melting: {
		source: 'Span & Wagner (1996), eq. (3.10) — from memory',
		pieces: [
			{
				solid: 'solid CO₂',
				form: 'delta-power-sum',
				Tmin: 216.592,
				Tmax: 1100,
				Tref: 216.592,
				Pref: 0.51795e6,
				a: [1955.539, 2055.4593],
				b: [1, 2]
			}
		]
	},
	sublimation: {
		source: 'Span & Wagner (1996), eq. (3.12) — from memory',
		pieces: [
			{
				solid: 'solid CO₂',
				form: 'exp-theta-delta',
				Tmin: 150,
				Tmax: 216.592,
				Tref: 216.592,
				Pref: 0.51795e6,
				a: [-14.740846, 2.4327015, -5.3061778],
				b: [1, 1.9, 2.9]
			}
		]
	}
};

/**
 * Nitrogen: Span, Lemmon, Jacobsen, Wagner & Yokozeki (2000), J. Phys. Chem. Ref. Data 29, 1361,
 * equations (5) (melting) and (6) (sublimation) — from memory.
 */
const nitrogen: SolidLines = {
	melting: {
		source: 'Span et al. (2000), eq. (5) — from memory',
		pieces: [
			{
				solid: 'solid nitrogen',
				form: 'power-sum',
				Tmin: 63.151,
				Tmax: 2000,
				Tref: 63.151,
				Pref: 12.5198e3,
				a: [12798.61],
				b: [1.78963]
			}
		]
	},
	sublimation: {
		source: 'Span et al. (2000), eq. (6) — from memory',
		pieces: [
			{
				solid: 'solid nitrogen',
				form: 'exp-theta-delta',
				Tmin: 40,
				Tmax: 63.151,
				Tref: 63.151,
				Pref: 12.5198e3,
				a: [-13.088692],
				b: [1]
			}
		]
	}
};

/**
 * Ammonia: the melting curve of Haar & Gallagher (1978), J. Phys. Chem. Ref. Data 7, 635, in the
 * form python3-iapws 1.5.2 carries it (iapws.ammonia.NH3._melting: P = 1 MPa · 2533.125 · ln θ,
 * θ = T/Tt). It is an approximation that starts at P = 0 at the triple temperature; the solid
 * region is bounded below by the triple-point pressure as well (solvers/solid.ts).
 */
const ammonia: SolidLines = {
	melting: {
		source: 'Haar & Gallagher (1978), as in python3-iapws 1.5.2 iapws.ammonia.NH3._melting',
		pieces: [
			{
				solid: 'solid ammonia',
				form: 'log-theta',
				Tmin: 195.495,
				Tmax: 700,
				Tref: 195.495,
				Pref: 1e6,
				a: [2533.125],
				b: [1]
			}
		]
	}
};

/**
 * Argon: Tegeler, Span & Wagner (1999), J. Phys. Chem. Ref. Data 28, 779, melting and sublimation
 * equations (ln(p/p_t) = (T_t/T)·Σ aᵢ(1 − T/T_t)^bᵢ for the latter), p_t = 68.891 kPa at T_t = 83.8058 K. Melting coefficients as
 * CoolProp (dev/fluids/Argon.json, ANCILLARIES.melting_line) and pychemqt (lib/mEoS/Ar.py, _melting)
 * both carry them, digit for digit; sublimation coefficients as pychemqt (_sublimation) and several
 * other public copies of the paper's equation carry them (CoolProp has none). Range: to 700 K, the
 * equation's (pychemqt), CoolProp stops its copy at 260 K.
 */
const argon: SolidLines = {
	melting: {
		source: 'Tegeler, Span & Wagner (1999), melting equation',
		pieces: [
			{
				solid: 'solid argon',
				form: 'power-sum',
				Tmin: 83.8058,
				Tmax: 700,
				Tref: 83.8058,
				Pref: 68.891e3,
				a: [-7476.2665, 9959.0613],
				b: [1.05, 1.275]
			}
		]
	},
	sublimation: {
		source: 'Tegeler, Span & Wagner (1999), sublimation equation',
		pieces: [
			{
				solid: 'solid argon',
				form: 'exp-theta-delta',
				Tmin: 40,
				Tmax: 83.8058,
				Tref: 83.8058,
				Pref: 68.891e3,
				a: [-11.391604, -0.39513431],
				b: [1, 2.7]
			}
		]
	}
};

/**
 * Methane: Setzmann & Wagner (1991), J. Phys. Chem. Ref. Data 20, 1061, melting equation,
 * p_m/p_t = 1 + a₁(θ^1.85 − 1) + a₂(θ^2.1 − 1), p_t = 11.696 kPa, T_t = 90.6941 K, as pychemqt
 * (lib/mEoS/CH4.py, _melting) carries it. CoolProp carries another published melting equation
 * for methane (Abramson 2011, a Simon form); solid.test.ts holds the two to 1 % of each other from
 * the triple point to 190 K, since no second copy of the 1991 coefficients was found. The paper
 * gives no sublimation equation used here.
 */
const methane: SolidLines = {
	melting: {
		source: 'Setzmann & Wagner (1991), melting equation',
		pieces: [
			{
				solid: 'solid methane',
				form: 'power-sum',
				Tmin: 90.6941,
				Tmax: 625,
				Tref: 90.6941,
				Pref: 11.696e3,
				a: [2.47568e4, -7.36602e3],
				b: [1.85, 2.1]
			}
		]
	}
};

/**
 * Normal hydrogen: the melting curve of Datchi, Loubeyre & LeToullec (2000), Phys. Rev. B 61, 6535,
 * P = 1.63×10⁻⁴ GPa·(T/K)^1.824, as pychemqt (lib/mEoS/H2.py, _melting, "Eq. 9 in paper") carries
 * it; the Leachman et al. (2009) equation-of-state files in both public libraries name this curve
 * for normal hydrogen. CoolProp (dev/fluids/Hydrogen.json) carries a different Simon fit under the
 * same citation (about 8 % higher at 90 K); the lower curve is kept, so more of the unphysical
 * high-pressure liquid is refused. Neither fit reaches the triple point (about 20 MPa at 14 K,
 * where the true melting pressure is near the triple-point pressure): between them the engine
 * serves states that are in fact solid. It bounds the region where the equation's cv turns
 * negative (solid.test.ts).
 */
const hydrogen: SolidLines = {
	melting: {
		source: 'Datchi, Loubeyre & LeToullec (2000), Phys. Rev. B 61, 6535, eq. (9)',
		pieces: [
			{
				solid: 'solid hydrogen',
				form: 'power-plain',
				Tmin: 13.957,
				Tmax: 1100,
				Tref: 1,
				Pref: 1e9,
				a: [1.63e-4],
				b: [1.824]
			}
		]
	}
};

/**
 * Isobutane: Bücker & Wagner (2006), J. Phys. Chem. Ref. Data 35, 929, melting equation,
 * p_m/p_t = 1 + 1.9536371309×10⁹·(θ^6.12 − 1), T_t = 113.73 K. The coefficient as CoolProp
 * (dev/fluids/IsoButane.json) carries it; an older pychemqt (lib/mEoS/iC4.py) carries 1953637130,
 * the same to its 10 digits (the current pychemqt's 1.95363716e9 differs in the 8th digit and is
 * taken as a slip). p_t: this data file's 0.0229 Pa (older pychemqt 0.022891 Pa; CoolProp 0.0219).
 */
const isobutane: SolidLines = {
	melting: {
		source: 'Bücker & Wagner (2006), melting equation',
		pieces: [
			{
				solid: 'solid isobutane',
				form: 'power-sum',
				Tmin: 113.73,
				Tmax: 575,
				Tref: 113.73,
				Pref: 0.0229,
				a: [1.9536371309e9],
				b: [6.12]
			}
		]
	}
};

/**
 * Propane: the Simon equation of Reeves, Scott & Babb (1964), J. Chem. Phys. 40, 3662, which
 * Lemmon, McLinden & Wagner (2009) use for propane's melting line: P = p_t + 7.18×10⁸ Pa·(θ^1.283 − 1),
 * T_t = 85.525 K, p_t = 1.72×10⁻⁴ Pa. CoolProp (dev/fluids/n-Propane.json) and pychemqt
 * (lib/mEoS/C3.py) carry the same numbers.
 */
const propane: SolidLines = {
	melting: {
		source: 'Reeves, Scott & Babb (1964), Simon equation',
		pieces: [
			{
				solid: 'solid propane',
				form: 'simon',
				Tmin: 85.525,
				Tmax: 2000,
				Tref: 85.525,
				Pref: 1.72e-4,
				a: [7.18e8],
				b: [1.283]
			}
		]
	}
};

/**
 * Oxygen: Schmidt & Wagner (1985) give no melting equation; the one used is Younglove (1982),
 * J. Phys. Chem. Ref. Data 11, Suppl. 1: P = −267.226854 MPa + 0.227606348 MPa·(T/K)^1.769.
 * pychemqt (lib/mEoS/O2.py) carries these numbers; CoolProp (dev/fluids/Oxygen.json) the same in
 * Simon form (p₀ − a = −267 226 854 Pa, a = 227 606.348 Pa). The curve starts slightly above the
 * triple-point pressure at T_t; the engine takes the larger of the two.
 */
const oxygen: SolidLines = {
	melting: {
		source: 'Younglove (1982), melting equation',
		pieces: [
			{
				solid: 'solid oxygen',
				form: 'power-plain',
				Tmin: 54.361,
				Tmax: 300,
				Tref: 1,
				Pref: 1e6,
				a: [-267.226854, 0.227606348],
				b: [0, 1.769]
			}
		]
	}
};

/**
 * Air: Lemmon, Jacobsen, Penoncello & Friend (2000), melting equation of air,
 * p_m/p₀ = 1 + 35493.5·(θ^1.78963 − 1), T₀ = 59.75 K, p₀ = 5265 Pa, as pychemqt (lib/mEoS/Air.py)
 * carries it; CoolProp (dev/fluids/Air.json) the same in Simon form (a = 186 844 210.76 Pa =
 * 35493.5 × 5264.18 Pa).
 */
const air: SolidLines = {
	melting: {
		source: 'Lemmon et al. (2000), melting equation of air',
		pieces: [
			{
				solid: 'solid air',
				form: 'power-sum',
				Tmin: 59.75,
				Tmax: 2000,
				Tref: 59.75,
				Pref: 5265,
				a: [35493.5],
				b: [1.78963]
			}
		]
	}
};

/** Refrigerants whose equation's paper publishes no melting equation, and none is named here. */
const noMeltingEquation = (paper: string): SolidLines => ({
	melting: {
		source: `none published: ${paper} gives no melting equation and none is named here; states are bounded by the triple point only`,
		pieces: []
	}
});

/**
 * Solid lines by fluid id. R-134a has none: its equation's paper (Tillner-Roth & Baehr 1994)
 * publishes no melting equation and none is named here, so R-134a states are not checked
 * against a solid region (its range stops at 70 MPa).
 */
export const SOLID_LINES: Record<string, SolidLines> = {
	water,
	'carbon-dioxide': carbonDioxide,
	nitrogen,
	ammonia,
	argon,
	methane,
	hydrogen,
	isobutane,
	propane,
	oxygen,
	r32: noMeltingEquation('Tillner-Roth & Yokozeki (1997)'),
	r1234yf: noMeltingEquation('Lemmon & Akasaka (2022)'),
	'r1234ze-e': noMeltingEquation('Thol & Lemmon (2016)'),
	air
};
