/**
 * States at fixed T with a given u, h or s. Along an isotherm these properties can turn (e.g.
 * water's s near its density maximum, h of hot compressed liquid), so every branch is scanned:
 * below Tc the liquid branch ρ' ≤ ρ ≤ ρ(T, Pmax) (in ρ) and the vapor branch ρ ≤ ρ'' (in ln ρ),
 * plus the mixture if y' ≤ y ≤ y''; at or above Tc the single branch up to ρ(T, Pmax).
 * Derivatives: (∂u/∂ρ)_T = (P − T(∂P/∂T)_ρ)/ρ², (∂h/∂ρ)_T = (∂P/∂ρ)_T/ρ − T(∂P/∂T)_ρ/ρ²,
 * (∂s/∂ρ)_T = −(∂P/∂T)_ρ/ρ².
 */
import { fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point, propDrho, propValue, type EnergyProp } from '../properties.ts';
import { saturatedState } from '../state.ts';
import type { RootHint, State } from '../types.ts';
import { choose } from './choose.ts';
import { densityAtTP } from './density.ts';
import { evalSatLine, SatLine } from './dome.ts';
import { locate, locateWithSat, placedState, twoPhaseAt } from './locate.ts';
import { noStateInRange } from './range.ts';
import { scanRoots, type FD } from './roots.ts';
import { CRITICAL_BAND, triplePressure } from './saturation.ts';

const IDX: Record<EnergyProp, number> = { u: 1, h: 2, s: 3 };
const UNIT: Record<EnergyProp, string> = { u: 'J/kg', h: 'J/kg', s: 'J/(kg·K)' };

/** Lowest density searched on vapor branches, relative to the critical density. */
const RHO_FLOOR = 1e-10;
/**
 * Dilute gas is in range down to well below the triple-point pressure, which for some fluids
 * (propane ~1.7e−4 Pa) lies far under RHO_FLOOR·ρc: the vapor scan reaches down to the density of
 * an ideal gas at this fraction of the triple-point pressure as well (the state grid's floor, plane.ts).
 */
const DILUTE_FRACTION = 1e-5;

export function flashTY(
	fl: Fluid,
	T: number,
	which: EnergyProp,
	y: number,
	hint?: RootHint
): State {
	const p = new Point();
	const found: State[] = [];
	const fn = (logScale: boolean) => (z: number, out: FD) => {
		const rho = logScale ? Math.exp(z) : z;
		evalPoint(fl, T, rho, p, 2);
		out.f = propValue(p, which) - y;
		out.df = propDrho(p, which) * (logScale ? rho : 1);
	};
	const single = (rho: number, known: 'liquid' | 'vapor' | 'any', line: SatLine | null) => {
		evalPoint(fl, T, rho, p, 2);
		const loc = line ? locateWithSat(fl, T, rho, p.P, line.sat) : locate(fl, p);
		if (loc.phase === 'saturated-mixture') return;
		if (!loc.sat) {
			if (known !== 'any' && (loc.phase === 'compressed-liquid') !== (known === 'liquid')) return;
			if (p.P > fl.Pmax * (1 + 1e-9)) return;
		}
		found.push(placedState(fl, p, loc));
	};
	const subcritical = T < fl.Tc * (1 - CRITICAL_BAND);
	const rhoFloor = RHO_FLOOR * fl.rhoc;
	const rhoLow = Math.min(rhoFloor, (DILUTE_FRACTION * triplePressure(fl)) / (fl.R * T));
	// roots below the fixed floor: the gas there is near-ideal and y monotonic in ln ρ
	// (y monotonic there: a root only where y(ρlow) − y and y(ρfloor) − y differ in sign)
	const ends: FD = { f: 0, df: 0 };
	const dilute = (add: (rho: number) => void) => {
		if (!(rhoLow < rhoFloor)) return;
		const zl = Math.log(rhoLow),
			zf = Math.log(rhoFloor);
		fn(true)(zl, ends);
		const fl0 = ends.f;
		fn(true)(zf, ends);
		if (fl0 !== 0 && ends.f !== 0 && fl0 < 0 === ends.f < 0) return;
		for (const z of scanRoots(fn(true), zl, zf, 4, 1e-13)) add(Math.exp(z));
	};
	if (subcritical) {
		const line = evalSatLine(fl, T, new SatLine());
		const rhoMax = densityAtTP(fl, T, fl.Pmax * (1 + 1e-6), line.sat.rhoL * 1.01, line.sat.rhoL);
		const b = IDX[which];
		const yL = line.yL[b],
			yV = line.yV[b];
		// a value equal to y' or y'' within round-off of the input is the saturated state itself
		const eps = 1e-12 * (Math.abs(y) + (which === 's' ? fl.R : fl.R * T));
		if (Math.abs(y - yL) <= eps) found.push(saturatedState(fl, line.sat, 0));
		else if (Math.abs(y - yV) <= eps) found.push(saturatedState(fl, line.sat, 1));
		else {
			const st = twoPhaseAt(fl, line.sat, (y - yL) / (yV - yL));
			if (st) found.push(st);
		}
		const { rhoL, rhoV } = line.sat;
		if (rhoMax > rhoL) {
			// to round-off in ρ: a liquid's P moves ~1e−4 Pa per 1e−13·ρ, all of P a few mPa above Psat
			for (const r of scanRoots(fn(false), rhoL, rhoMax, 10, 4 * Number.EPSILON * rhoMax))
				if (r > rhoL) single(r, 'liquid', line);
		}
		for (const z of scanRoots(fn(true), Math.log(rhoFloor), Math.log(rhoV), 12, 1e-13))
			if (Math.exp(z) < rhoV) single(Math.exp(z), 'vapor', line);
		dilute((r) => single(r, 'vapor', line));
		if (which === 's') extendDilute(fl, T, y, rhoLow, fn(true), (r) => single(r, 'vapor', line));
	} else {
		const rhoMax = densityAtTP(fl, T, fl.Pmax * (1 + 1e-6), 2 * fl.rhoc);
		for (const z of scanRoots(fn(true), Math.log(rhoFloor), Math.log(rhoMax), 24, 1e-13))
			single(Math.exp(z), 'any', null);
		dilute((r) => single(r, 'any', null));
		if (which === 's') extendDilute(fl, T, y, rhoLow, fn(true), (r) => single(r, 'any', null));
	}
	return choose(fl, found, hint, `T = ${fmt(T)} K and ${which} = ${fmt(y)} ${UNIT[which]}`, () =>
		noStateInRange(fl, `T = ${fmt(T)} K and ${which} = ${fmt(y)} ${UNIT[which]}`)
	);
}

/** Entropy beyond the densest-to-lightest scan: below RHO_FLOOR s ≈ s₀ − R·ln ρ, solved by Newton in ln ρ. */
function extendDilute(
	fl: Fluid,
	T: number,
	y: number,
	rhoLow: number,
	fn: (z: number, out: FD) => void,
	add: (rho: number) => void
): void {
	const out: FD = { f: 0, df: 0 };
	let z = Math.log(rhoLow);
	fn(z, out);
	if (!(out.f < 0)) return;
	for (let it = 0; it < 50; it++) {
		const step = -out.f / out.df;
		z += Math.max(-50, Math.min(50, step));
		fn(z, out);
		if (Math.abs(step) < 1e-13) break;
	}
	if (Math.abs(out.f) <= 1e-9 * Math.max(1, Math.abs(y)) && Math.exp(z) > 0) add(Math.exp(z));
	void T;
}
