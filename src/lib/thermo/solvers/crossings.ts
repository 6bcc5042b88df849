/**
 * Where a process curve crosses the saturation lines: temperatures at which the process's invariant
 * takes its value on the liquid or vapor line, bracketed between the saturation table's nodes and
 * refined by Newton along the line with the slopes
 *   dPs/dT = (s'' − s')/(v'' − v') (Clapeyron), dρ/dT|sat = (dPs/dT − (∂P/∂T)_ρ)/(∂P/∂ρ)_T.
 * Each process's residual F is its strategy's lineResidual (leg-processes.ts); isobaric and isothermal
 * curves meet the lines at the one saturation of their P or T instead.
 */
import { ThermoError } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point, propDT, propDrho } from '../properties.ts';
import { CRITICAL_BAND, domeNodes, satAtT, type SatPoint } from './saturation.ts';

/** Saturation at T with both phases' v, u, h, s, P and their slopes along the lines (T < Tc). */
interface LineSlopes {
	sat: SatPoint;
	/** per phase [0 liquid, 1 vapor]: [v, u, h, s] and d/dT */
	y: [number[], number[]];
	dy: [number[], number[]];
	dPs: number;
}

function lineAt(fl: Fluid, T: number): LineSlopes {
	const sat = satAtT(fl, T);
	const L = evalPoint(fl, T, sat.rhoL, new Point(), 2);
	const V = evalPoint(fl, T, sat.rhoV, new Point(), 2);
	const dPs = (V.s - L.s) / (1 / sat.rhoV - 1 / sat.rhoL);
	const out: LineSlopes = { sat, y: [[], []], dy: [[], []], dPs };
	[L, V].forEach((p, k) => {
		const drho = (dPs - p.dPdT) / p.dPdrho;
		out.y[k] = [1 / p.rho, p.u, p.h, p.s];
		out.dy[k] = [
			-drho / (p.rho * p.rho),
			propDT(p, 'u') + propDrho(p, 'u') * drho,
			propDT(p, 'h') + propDrho(p, 'h') * drho,
			propDT(p, 's') + propDrho(p, 's') * drho
		];
	});
	return out;
}

/** F on a saturation line from P and [v, u, h, s]; dF/dT from their slopes. */
export type LineFn = (
	P: number,
	y: ArrayLike<number>,
	dP: number,
	dy: ArrayLike<number>
) => [number, number];

/**
 * Temperatures where F vanishes on one saturation line (0 liquid, 1 vapor): sign changes between
 * the saturation table's nodes (and between the last node and the critical point), refined by
 * Newton kept inside the bracket.
 */
export function lineRoots(fl: Fluid, side: 0 | 1, F: LineFn): number[] {
	const nd = domeNodes(fl);
	const n = nd.n;
	const Ts: number[] = [];
	const Fs: number[] = [];
	const y = [0, 0, 0, 0];
	const arr = side === 0 ? nd.liq : nd.vap;
	for (let i = 0; i < n; i++) {
		for (let k = 0; k < 4; k++) y[k] = arr[k][i];
		Ts.push(nd.T[i]);
		Fs.push(F(nd.P[i], y, 0, y)[0]);
	}
	const c = evalPoint(fl, fl.Tc, fl.rhoc, new Point(), 1);
	const Tcb = fl.Tc * (1 - 2 * CRITICAL_BAND);
	if (Ts[n - 1] < Tcb) {
		Ts.push(Tcb);
		Fs.push(F(fl.Pc, [1 / fl.rhoc, c.u, c.h, c.s], 0, y)[0]);
	}
	const roots: number[] = [];
	// a curve through the critical point itself (e.g. the critical isochore)
	if (Ts[Ts.length - 1] >= fl.Tc * (1 - 2 * CRITICAL_BAND) && Math.abs(Fs[Fs.length - 1]) <= 1e-12)
		roots.push(fl.Tc);
	for (let i = 0; i < Ts.length - 1; i++) {
		let a = Ts[i],
			b = Ts[i + 1];
		let fa = Fs[i];
		const fb = Fs[i + 1];
		if (!Number.isFinite(fa) || !Number.isFinite(fb)) continue;
		if (fa === 0) {
			roots.push(a);
			continue;
		}
		if (fa < 0 === fb < 0) continue;
		let T = a - (fa * (b - a)) / (fb - fa);
		let fT = NaN;
		for (let it = 0; it < 80; it++) {
			let ls: LineSlopes;
			try {
				ls = lineAt(fl, T);
			} catch (e) {
				// saturation fails only within ~1e−8 of Tc: the curve passes through the critical point
				if (!(e instanceof ThermoError)) throw e;
				T = fl.Tc;
				break;
			}
			const [f, df] = F(ls.sat.P, ls.y[side], ls.dPs, ls.dy[side]);
			fT = f;
			if (f === 0) break;
			if (f < 0 === fa < 0) {
				a = T;
				fa = f;
			} else b = T;
			let next = T - f / df;
			if (!(next > Math.min(a, b) && next < Math.max(a, b))) next = 0.5 * (a + b);
			if (Math.abs(next - T) <= 1e-13 * T || Math.abs(b - a) <= 1e-13 * T) {
				T = next;
				break;
			}
			T = next;
		}
		// a root left unresolved at the edge of the critical band is the critical point itself
		if (T >= fl.Tc * (1 - 1e-8) && !(Math.abs(fT) <= 1e-9)) T = fl.Tc;
		if (!roots.some((r) => Math.abs(r - T) <= 1e-9 * T)) roots.push(T);
	}
	return roots;
}
