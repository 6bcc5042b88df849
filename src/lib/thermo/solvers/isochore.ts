/**
 * States at fixed density with a given u, h or s. Along an isochore u, h and s all rise with T
 * (du = cv·dT, ds = cv/T·dT, dh = (cv + v(∂P/∂T)_v)dT in one phase, likewise across the dome), so
 * there is one answer — except where the equation gives cv < 0 (outside its physical domain, e.g.
 * hydrogen at 14 K above ~0.2 GPa, where the real substance is solid): a stretch whose y falls at
 * its low end is scanned and every root listed. The single-phase stretches of the isochore (outside the dome, from the
 * saturation table's densities) are searched first, and only if none holds it the two-phase part
 * (domeRoots with the quality fixed by v).
 */
import { fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point, propDT, propValue, type EnergyProp } from '../properties.ts';
import type { RootHint, State } from '../types.ts';
import { choose } from './choose.ts';
import { domeRoots } from './dome.ts';
import { locate, placedState, twoPhaseAt } from './locate.ts';
import { noStateInRange } from './range.ts';
import { newtonBracket, scanRoots, type FD } from './roots.ts';
import { domeNodes } from './saturation.ts';

const UNIT: Record<EnergyProp, string> = { u: 'J/kg', h: 'J/kg', s: 'J/(kg·K)' };

/**
 * Temperature intervals where the isochore ρ lies outside the dome (from the table nodes), each
 * widened by one node spacing toward the dome so that an inexact boundary cannot hide a root.
 */
export function singlePhaseIntervals(fl: Fluid, rho: number): [number, number][] {
	const nd = domeNodes(fl);
	const n = nd.n;
	const inside = (i: number) => rho > nd.rhoV[i] && rho < nd.rhoL[i];
	const out: [number, number][] = [];
	let start: number | null = inside(0) ? null : fl.Tmin;
	for (let i = 0; i < n - 1; i++) {
		const a = inside(i),
			b = inside(i + 1);
		if (a && !b) start = nd.T[i];
		else if (!a && b) {
			out.push([start ?? fl.Tmin, Math.min(nd.T[i + 1] + (nd.T[i + 1] - nd.T[i]), fl.Tmax)]);
			start = null;
		}
	}
	out.push([start ?? nd.T[n - 1], fl.Tmax * (1 + 1e-7)]);
	return out
		.map(([a, b]) => [Math.max(a, fl.Tmin * (1 - 1e-7)), b] as [number, number])
		.filter(([a, b]) => b > a);
}

export function flashRhoY(
	fl: Fluid,
	rho: number,
	which: EnergyProp,
	y: number,
	hint?: RootHint
): State {
	const what = `ρ = ${fmt(rho)} kg/m³ and ${which} = ${fmt(y)} ${UNIT[which]}`;
	const found: State[] = [];
	const nd = domeNodes(fl);
	const p = new Point();
	const fn = (T: number, out: FD) => {
		evalPoint(fl, T, rho, p, 2);
		out.f = propValue(p, which) - y;
		out.df = propDT(p, which);
	};
	const out: FD = { f: 0, df: 0 };
	for (const [Ta, Tb] of singlePhaseIntervals(fl, rho)) {
		fn(Ta, out);
		const fa = out.f;
		// y falling with T at the low end: cv < 0 there (the equation outside its physical domain,
		// e.g. hydrogen near 14 K above ~0.2 GPa, where the real substance is solid), so y may turn
		const turns = out.df < 0;
		fn(Tb, out);
		const fb = out.f;
		const tiny = 1e-12 * (Math.abs(y) + fl.R * Tb);
		const roots =
			Math.abs(fa) <= tiny
				? [Ta]
				: Math.abs(fb) <= tiny
					? [Tb]
					: fa < 0 !== fb < 0
						? [newtonBracket(fn, Ta, fa, Tb, fb, 1e-13 * Tb)]
						: Tb < fl.Tc
							? scanRoots(fn, Ta, Tb, 6, 1e-13 * Tb)
							: turns
								? scanRoots(fn, Ta, Tb, 24, 1e-13 * Tb)
								: [];
		for (const T of roots) {
			evalPoint(fl, T, rho, p, 2);
			const loc = locate(fl, p);
			if (loc.phase === 'saturated-mixture') continue; // inside the dome: the two-phase search covers it
			if (!loc.sat && p.P > fl.Pmax * (1 + 1e-9)) continue;
			found.push(placedState(fl, p, loc));
		}
	}
	// y rises with T along the whole isochore (one answer): a single-phase one ends the search
	if (found.length > 0) return choose(fl, found, hint, what, () => noStateInRange(fl, what));
	let maxRhoL = 0;
	for (let i = 0; i < nd.n; i++) maxRhoL = Math.max(maxRhoL, nd.rhoL[i]);
	if (rho > nd.rhoV[0] * (1 - 1e-6) && rho < maxRhoL * (1 + 1e-6)) {
		for (const r of domeRoots(fl, { prop: 'v', value: 1 / rho }, which, y)) {
			const st = twoPhaseAt(fl, r.sat, r.x);
			if (st) found.push(st);
		}
	}
	return choose(fl, found, hint, what, () => noStateInRange(fl, what));
}
