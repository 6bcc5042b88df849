/**
 * State from (T, P). Below Tc the side of the saturation line is decided first (table, then a full
 * saturation solve only within its margin: the table's accuracy, widened on the liquid side by the
 * line's pressure band), then the density is solved on that branch. T and P
 * on the saturation line (|P − Psat| within state.ts pressureTol: 1e−9·Psat plus the liquid's
 * round-off floor) are not independent: refused unless the hint `liquid-side` / `vapor-side` asks
 * for the saturated liquid / vapor (returned with the given P). Off the line the answer is the
 * single phase on P's side, however close: a liquid a pascal above Psat is a compressed liquid.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point } from '../properties.ts';
import { P_LINE_TOL, pressureTol, singleState } from '../state.ts';
import type { RootHint, State } from '../types.ts';
import { densityAtTP } from './density.ts';
import { locate, onLineAt, placedState } from './locate.ts';
import { densityStart } from './plane.ts';
import {
	CRITICAL_BAND,
	liquidStart,
	TABLE_ACCURACY,
	satAtT,
	satGuess,
	type SatGuess,
	type SatPoint
} from './saturation.ts';

const p = new Point();
const g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };
const M = 10 * TABLE_ACCURACY;

/** Relative pressure tolerance for (T, P) "on the saturation line" (state.ts P_LINE_TOL; a round-off floor is added for liquids). */
export const TP_LINE_TOL = P_LINE_TOL;

function failed(fl: Fluid, T: number, P: number): ThermoError {
	return new ThermoError(
		'no-convergence',
		`No density found for ${fl.id} at T = ${fmt(T)} K, P = ${fmt(P)} Pa.`,
		'Please report the inputs; try values a little away from the critical point.'
	);
}

/**
 * A start for the vapor's density at (T, P ≤ Psat): Z = P/(ρRT) taken linear in ρ from the ideal gas
 * (Z = 1 at ρ = 0) to the saturated vapor (Psat, ρ''), as a second virial coefficient would give,
 * and solved for ρ (the root of bρ² + ρ − P/(RT) = 0, b = (Z'' − 1)/ρ''; 1 + 4bP/RT ≥ 0 for P ≤ Psat).
 * Exact at both ends, where the plain scaling ρ''·P/Psat is off by 1 − Z'' in dilute gas (it is kept
 * near Psat on a flat isotherm, below).
 */
function vaporStart(fl: Fluid, T: number, P: number, Psat: number, rhoV: number): number {
	const RT = fl.R * T;
	const Z = Psat / (rhoV * RT);
	// near a flat saturated isotherm (Z'' well below 1) the line in Z bends P(ρ) over before ρ''
	// (its slope there, RT(2Z'' − 1), is the true one's lower side): the plain scaling then, near Psat
	if (Z < 0.8 && P > 0.5 * Psat) return (rhoV * P) / Psat;
	const b = (Z - 1) / rhoV;
	return (2 * P) / (RT * (1 + Math.sqrt(Math.max(0, 1 + (4 * b * P) / RT))));
}

export function flashTP(fl: Fluid, T: number, P: number, hint?: RootHint): State {
	let rho: number;
	let sat: SatPoint | null = null;
	if (T >= fl.Tc * (1 - CRITICAL_BAND)) {
		// start no denser than 2ρc: at hundreds of MPa the ideal-gas guess P/(RT) can lie beyond the
		// physical root, where Newton may settle on a spurious one of the equation (methane at
		// 580 K, 444 MPa: P/(RT) ≈ 1480 kg/m³ led to a root at 1938 kg/m³ with cv < 0)
		// from the state grid's estimate where it has one (plane.ts)
		const start = densityStart(fl, T, P);
		rho = densityAtTP(fl, T, P, start > 0 ? start : Math.min(P / (fl.R * T), 2 * fl.rhoc));
	} else {
		satGuess(fl, T, g);
		let side: 'liquid' | 'vapor';
		let lo: number, hi: number;
		// the table's margin, widened on the liquid side by the line's pressure band: near the triple
		// point of a fluid whose Psat is tiny (propane, 3e−4 Pa at 87 K) the liquid's round-off floor
		// spans several per cent of Psat, and a P within it is on the line, not a compressed liquid
		if (P > g.P * (1 + M) + 2 * pressureTol(fl, T, g.rhoL, g.P)) {
			side = 'liquid';
			lo = g.rhoL * (1 - M);
			hi = Infinity;
		} else if (P < g.P * (1 - M)) {
			side = 'vapor';
			lo = 0;
			hi = g.rhoV * (1 + M);
		} else {
			sat = satAtT(fl, T);
			const dP = P - sat.P;
			if (Math.abs(dP) <= pressureTol(fl, T, dP > 0 ? sat.rhoL : sat.rhoV, sat.P)) {
				if (hint === 'liquid-side') return onLineAt(fl, sat, 0, P);
				if (hint === 'vapor-side') return onLineAt(fl, sat, 1, P);
				throw new ThermoError(
					'two-phase-pressure-temperature',
					`T = ${fmt(T)} K and P = ${fmt(P)} Pa lie on the saturation line of ${fl.id}, where T and P are not independent: every state from saturated liquid to saturated vapor has them.`,
					'Give T or P together with v, x, h, u or s instead (or hint liquid-side / vapor-side for the saturated liquid / vapor).'
				);
			}
			side = P > sat.P ? 'liquid' : 'vapor';
			lo = side === 'liquid' ? sat.rhoL : 0;
			hi = side === 'liquid' ? Infinity : sat.rhoV;
		}
		rho =
			side === 'liquid'
				? densityAtTP(fl, T, P, liquidStart(fl, T, P, sat ?? g), lo, hi)
				: densityAtTP(
						fl,
						T,
						P,
						vaporStart(fl, T, P, sat ? sat.P : g.P, sat ? sat.rhoV : g.rhoV),
						lo,
						hi
					);
	}
	if (!(rho > 0)) throw failed(fl, T, P);
	evalPoint(fl, T, rho, p, 2);
	p.P = P;
	// beside a solved saturation the side is already decided, outside the pressure band
	if (sat) {
		if (sat.P < P ? !(rho >= sat.rhoL) : !(rho <= sat.rhoV)) throw failed(fl, T, P);
		return singleState(fl, p, sat.P < P ? 'compressed-liquid' : 'superheated-vapor');
	}
	const loc = locate(fl, p);
	if (loc.phase === 'saturated-mixture') throw failed(fl, T, P);
	return placedState(fl, p, loc, true);
}
