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
 * Solid lines by fluid id. R-134a has none: its equation's paper (Tillner-Roth & Baehr 1994)
 * publishes no melting equation and none is named here, so R-134a states are not checked
 * against a solid region (its range stops at 70 MPa).
 */
export const SOLID_LINES: Record<string, SolidLines> = {
	water,
	'carbon-dioxide': carbonDioxide,
	nitrogen,
	ammonia
};
