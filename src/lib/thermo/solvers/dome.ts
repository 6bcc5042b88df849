/**
 * Two-phase states with a given pair: find the temperatures on the saturation curve where a mixture
 * has the pair. Quality comes from the fixed member (x itself, or x = (A − a')/(a'' − a') for a
 * property A), and G(T) = b' + x·(b'' − b') − B must vanish for the other member B. The saturation
 * table's nodes give every sign change of G (and turning points that cross or touch zero, found
 * on the exact slope dG/dT),
 * then Newton with the exact derivative along the saturation line refines each root:
 *   dPs/dT = (s'' − s')/(v'' − v')  (Clapeyron),  dρ/dT|sat = (dPs/dT − (∂P/∂T)_ρ)/(∂P/∂ρ)_T,
 *   dy/dT|sat = (∂y/∂T)_ρ + (∂y/∂ρ)_T·dρ/dT|sat for y = v, u, h, s of each phase.
 */
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point, propDT, propDrho, type EnergyProp } from '../properties.ts';
import { domeNodes, satAtT, type SatPoint } from './saturation.ts';

export type DomeProp = 'v' | 'u' | 'h' | 's';
const IDX: Record<DomeProp, number> = { v: 0, u: 1, h: 2, s: 3 };

/** Saturation at T with v, u, h, s of both phases and their slopes along the saturation line. */
export class SatLine {
	T = 0;
	sat: SatPoint = { T: 0, P: 0, rhoL: 0, rhoV: 0 };
	readonly yL = new Float64Array(4);
	readonly yV = new Float64Array(4);
	readonly dL = new Float64Array(4);
	readonly dV = new Float64Array(4);
	readonly pL = new Point();
	readonly pV = new Point();
}

function slopes(p: Point, dPs: number, y: Float64Array, d: Float64Array): void {
	const drho = (dPs - p.dPdT) / p.dPdrho;
	y[0] = 1 / p.rho;
	d[0] = -drho / (p.rho * p.rho);
	const names: EnergyProp[] = ['u', 'h', 's'];
	for (let k = 0; k < 3; k++) {
		const w = names[k];
		y[k + 1] = w === 'u' ? p.u : w === 'h' ? p.h : p.s;
		d[k + 1] = propDT(p, w) + propDrho(p, w) * drho;
	}
}

/**
 * Fill `out` for temperature T (below Tc). When `out` already holds a nearby temperature, its
 * densities and slopes start the saturation solve (ρ(T) ≈ ρ(T₀) + dρ/dT·(T − T₀)).
 */
export function evalSatLine(fl: Fluid, T: number, out: SatLine, sat?: SatPoint): SatLine {
	let guess: { rhoL: number; rhoV: number } | undefined;
	if (!sat && out.T > 0 && Math.abs(T - out.T) < 0.05 * T) {
		const dT = T - out.T;
		const rL = out.sat.rhoL,
			rV = out.sat.rhoV;
		guess = { rhoL: rL - rL * rL * out.dL[0] * dT, rhoV: rV - rV * rV * out.dV[0] * dT };
		if (!(guess.rhoL > guess.rhoV && guess.rhoV > 0)) guess = undefined;
	}
	const s = sat ?? satAtT(fl, T, guess);
	out.T = T;
	out.sat = s;
	evalPoint(fl, T, s.rhoL, out.pL, 2);
	evalPoint(fl, T, s.rhoV, out.pV, 2);
	out.pL.P = s.P;
	out.pV.P = s.P;
	const dPs = (out.pV.s - out.pL.s) / (1 / s.rhoV - 1 / s.rhoL);
	slopes(out.pL, dPs, out.yL, out.dL);
	slopes(out.pV, dPs, out.yV, out.dV);
	return out;
}

/** What fixes the quality: x itself, or a property value. */
export type QualitySpec = { x: number } | { prop: DomeProp; value: number };

export interface DomeRoot {
	sat: SatPoint;
	x: number;
}

/** Quality and G at one saturation line; also their T-derivatives when `line` carries slopes. */
function gOf(
	spec: QualitySpec,
	b: number,
	B: number,
	yL: ArrayLike<number>,
	yV: ArrayLike<number>,
	dL?: ArrayLike<number>,
	dV?: ArrayLike<number>
): [number, number, number] {
	let x: number,
		dx = 0;
	if ('x' in spec) x = spec.x;
	else {
		const a = IDX[spec.prop];
		const span = yV[a] - yL[a];
		x = (spec.value - yL[a]) / span;
		if (dL && dV) dx = -((1 - x) * dL[a] + x * dV[a]) / span;
	}
	const G = yL[b] + x * (yV[b] - yL[b]) - B;
	const dG = dL && dV ? (1 - x) * dL[b] + x * dV[b] + (yV[b] - yL[b]) * dx : NaN;
	return [x, G, dG];
}

/** a mixture meets the inputs when G is within this fraction of |B| + |b'' − b'| */
const ACCEPT = 1e-7;
/** G at a turning point this close to zero (same scale) is a double root, not a near miss */
const TOUCH = 1e-10;

/**
 * Whether the cubic through nodes i−1 … i+2 (shifted at the ends) keeps clearly away from zero on
 * [T_i, T_i+1]: its extremum there stays on G's side by more than a quarter of the smaller end value
 * and more than the interpolation can be off (1 % of the larger).
 */
function nodeCubicClear(T: Float64Array, G: Float64Array, i: number, n: number): boolean {
	if (n < 4) return false;
	const k0 = Math.min(Math.max(i - 1, 0), n - 4);
	const Ga = G[i],
		Gb = G[i + 1];
	let ext = Ga;
	for (let q = 1; q < 16; q++) {
		const t = T[i] + ((T[i + 1] - T[i]) * q) / 16;
		let v = 0;
		for (let j = k0; j < k0 + 4; j++) {
			let w = G[j];
			for (let m = k0; m < k0 + 4; m++) if (m !== j) w *= (t - T[m]) / (T[j] - T[m]);
			v += w;
		}
		if (v < 0 !== Ga < 0) return false;
		if (Math.abs(v) < Math.abs(ext)) ext = v;
	}
	// clear only when short of zero beyond the interpolation's own error (a fraction of G's size)
	return (
		Math.abs(ext) > 0.25 * Math.min(Math.abs(Ga), Math.abs(Gb)) &&
		Math.abs(ext) > 1e-2 * Math.max(Math.abs(Ga), Math.abs(Gb))
	);
}

/** Whether |G| has a local minimum at node i (an end node counts with its one neighbour) that is small against G's local change. */
function dipsAt(G: Float64Array, i: number, n: number): boolean {
	const g = Math.abs(G[i]);
	const left = i > 0 ? Math.abs(G[i - 1]) : Infinity,
		right = i < n - 1 ? Math.abs(G[i + 1]) : Infinity;
	if (!(g <= left && g <= right)) return false;
	let change = 0;
	for (let k = Math.max(1, i - 1); k <= Math.min(n - 1, i + 2); k++)
		change = Math.max(change, Math.abs(G[k] - G[k - 1]));
	return g <= 4 * change;
}

/**
 * All two-phase solutions with quality fixed by `spec` and property `target` = `value`. Quality
 * may overshoot 0…1 by round-off (up to 1e−6 near Tc); place each with twoPhaseAt.
 */
export function domeRoots(
	fl: Fluid,
	spec: QualitySpec,
	target: DomeProp,
	value: number
): DomeRoot[] {
	const nodes = domeNodes(fl);
	const b = IDX[target];
	const n = nodes.n;
	const G = new Float64Array(n);
	const bL = nodes.liq[b],
		bV = nodes.vap[b];
	let any = false;
	if ('x' in spec) {
		const x = spec.x;
		for (let i = 0; i < n; i++) G[i] = bL[i] + x * (bV[i] - bL[i]) - value;
	} else {
		const a = IDX[spec.prop],
			A = spec.value;
		const aL = nodes.liq[a],
			aV = nodes.vap[a];
		for (let i = 0; i < n; i++)
			G[i] = bL[i] + ((A - aL[i]) / (aV[i] - aL[i])) * (bV[i] - bL[i]) - value;
	}
	// nothing to refine when G keeps one sign and |G| never dips (the common single-phase case)
	for (let i = 1; i < n && !any; i++) {
		if (G[i] < 0 !== G[i - 1] < 0) any = true;
		else if (
			i < n - 1 &&
			Math.abs(G[i]) < Math.abs(G[i - 1]) &&
			Math.abs(G[i]) < Math.abs(G[i + 1])
		)
			any = true;
	}
	// a turning point inside the first or last interval shows as |G| falling toward the end node
	if (!any && n > 2 && (dipsAt(G, 0, n) || dipsAt(G, n - 1, n))) any = true;
	if (
		!any &&
		!(Math.abs(G[0]) <= 1e-6 * Math.abs(G[1] - G[0])) &&
		!(Math.abs(G[n - 1]) <= 1e-6 * Math.abs(G[n - 2] - G[n - 1]))
	)
		return [];
	const line = new SatLine();
	const roots: DomeRoot[] = [];
	const fn = (T: number): [number, number, number] => {
		evalSatLine(fl, T, line);
		return gOf(spec, b, value, line.yL, line.yV, line.dL, line.dV);
	};
	const refine = (Ta: number, Ga: number, Tb: number, Gb: number, T0: number) => {
		let a = Ta,
			fa = Ga,
			c = Tb;
		let T = T0;
		for (let it = 0; it < 60; it++) {
			const [x, g, dg] = fn(T);
			if (g === 0 || it === 59) return accept(x);
			if (g < 0 === fa < 0) {
				a = T;
				fa = g;
			} else c = T;
			let next = T - g / dg;
			const lo = Math.min(a, c),
				hi = Math.max(a, c);
			// Newton converges quadratically: a predicted step this small is the remaining error
			if (Math.abs(next - T) <= 1e-13 * T && next > lo && next < hi) return accept(x);
			if (!(next > lo && next < hi)) next = 0.5 * (a + c);
			if (hi - lo <= 1e-14 * T) return accept(x);
			T = next;
		}
	};
	/** start for a bracket [i, i+1]: inverse quadratic through three nodes, else the secant */
	const start = (i: number): number => {
		const Ta = nodes.T[i],
			Tb = nodes.T[i + 1],
			Ga = G[i],
			Gb = G[i + 1];
		const lin = Ta - (Ga * (Tb - Ta)) / (Gb - Ga);
		const k = i > 0 ? i - 1 : i + 2;
		if (k >= n) return lin;
		const Tk = nodes.T[k],
			Gk = G[k];
		if (Gk === Ga || Gk === Gb) return lin;
		const q =
			(Ta * Gb * Gk) / ((Ga - Gb) * (Ga - Gk)) +
			(Tb * Ga * Gk) / ((Gb - Ga) * (Gb - Gk)) +
			(Tk * Ga * Gb) / ((Gk - Ga) * (Gk - Gb));
		return q > Math.min(Ta, Tb) && q < Math.max(Ta, Tb) ? q : lin;
	};
	const hs =
		!('x' in spec) &&
		((spec.prop === 's' && target === 'h') || (spec.prop === 'h' && target === 's'));
	const push = (sat: SatPoint, x: number) => {
		if (roots.some((r) => Math.abs(r.sat.T - sat.T) <= 1e-9 * sat.T)) return;
		roots.push({ sat, x });
	};
	const accept = (x: number) => {
		// keep round-off overshoots; callers place the state (twoPhaseAt) and drop real outsiders
		if (!(x >= -1e-6 && x <= 1 + 1e-6)) return;
		// a candidate must meet the inputs: an unconverged refinement (steep G beside Tc) is no root
		const [, gLine] = gOf(spec, b, value, line.yL, line.yV);
		if (!(Math.abs(gLine) <= ACCEPT * (Math.abs(value) + Math.abs(line.yV[b] - line.yL[b]))))
			return;
		const sat = line.sat;
		// next to a saturation line G can be nearly tangent to zero (for (h, s), dh = T·ds + v·dP
		// makes the mixtures' h(T) touch the line's): there solve the line itself, a' (T) = A
		// (only for (h, s): for (u, s) in a liquid the pair cannot tell a line from a state a few
		// hundred pascals off it, and the polish would add such a twin)
		if (!('x' in spec) && hs && (Math.abs(x) < 1e-4 || Math.abs(1 - x) < 1e-4)) {
			const end = Math.abs(x) < 1e-4 ? 0 : 1;
			const on = polishOnLine(spec, end, sat.T);
			if (on) return push(on, end);
		}
		push(sat, x);
	};
	/** T where the saturated liquid (end 0) or vapor (end 1) has a = A, if b = B holds there too */
	const polishOnLine = (
		sp: { prop: DomeProp; value: number },
		end: 0 | 1,
		T0: number
	): SatPoint | null => {
		const a = IDX[sp.prop];
		let T = T0;
		for (let it = 0; it < 30; it++) {
			evalSatLine(fl, T, line);
			const ya = end ? line.yV[a] : line.yL[a],
				dya = end ? line.dV[a] : line.dL[a];
			const step = (ya - sp.value) / dya;
			if (!Number.isFinite(step)) return null;
			T -= step;
			if (!(T > fl.Tt * (1 - 1e-9) && T < fl.Tc)) return null;
			if (Math.abs(step) <= 1e-13 * T) break;
		}
		evalSatLine(fl, T, line);
		const yb = end ? line.yV[b] : line.yL[b];
		const span = Math.abs(line.yV[b] - line.yL[b]);
		return Math.abs(yb - value) <= 1e-12 * span ? line.sat : null;
	};
	// a root sitting on an end node (e.g. exactly at the triple point) shows no sign change
	for (const [i, j] of [
		[0, 1],
		[n - 1, n - 2]
	]) {
		if (Math.abs(G[i]) <= 1e-6 * Math.abs(G[j] - G[i])) {
			const [x, g] = fn(nodes.T[i]);
			if (Math.abs(g) <= 1e-8 * Math.abs(G[j] - G[i])) accept(x);
		}
	}
	// quality at a node (for a property-fixed quality), to skip roots that would lie outside 0…1
	const xAt = (i: number): number => {
		if ('x' in spec) return spec.x;
		const a = IDX[spec.prop];
		return (spec.value - nodes.liq[a][i]) / (nodes.vap[a][i] - nodes.liq[a][i]);
	};
	const outside = (i: number, j: number): boolean => {
		const xa = xAt(i),
			xb = xAt(j);
		return (xa < -0.01 && xb < -0.01) || (xa > 1.01 && xb > 1.01);
	};
	/** extremum of G in [Ta, Tb] (same sign at both ends): two roots if it crosses zero, one if it touches */
	const turning = (Ta: number, Ga: number, Tb: number, Gb: number) => {
		const [, , da] = fn(Ta);
		const [, , db] = fn(Tb);
		// |G| must fall leaving Ta and rise arriving at Tb
		if (!(da < 0 === Ga > 0) || !(db < 0 === Gb < 0)) return;
		// the cubic through both ends' values and slopes (accurate to h⁴ on these node spacings)
		// bounds the extremum: clearly short of zero, there is nothing to look for. Its extremum
		// from G'(t) = c1 + 2c2·t + 3c3·t² = 0 on 0 < t < 1.
		const h = Tb - Ta;
		const c1 = h * da,
			c2 = 3 * (Gb - Ga) - h * (2 * da + db),
			c3 = 2 * (Ga - Gb) + h * (da + db);
		let ext = Ga;
		const at = (t: number) => {
			if (t > 0 && t < 1) {
				const G = Ga + t * (c1 + t * (c2 + t * c3));
				if (Math.abs(G) < Math.abs(ext) || G < 0 !== Ga < 0) ext = G;
			}
		};
		if (c3 === 0) at(-c1 / (2 * c2));
		else {
			const disc = c2 * c2 - 3 * c3 * c1;
			if (disc >= 0) {
				const r = Math.sqrt(disc);
				at((-c2 + r) / (3 * c3));
				at((-c2 - r) / (3 * c3));
			}
		}
		if (
			ext < 0 === Ga < 0 &&
			Math.abs(ext) > 0.05 * Math.min(Math.abs(Ga), Math.abs(Gb)) &&
			Math.abs(ext) > 1e-3 * Math.max(Math.abs(Ga), Math.abs(Gb))
		)
			return;
		let lo = Ta,
			hi = Tb,
			m = 0.5 * (lo + hi);
		for (let k = 0; k < 80; k++) {
			m = 0.5 * (lo + hi);
			const [, g, dg] = fn(m);
			if (g === 0) return accept(line.sat ? gOf(spec, b, value, line.yL, line.yV)[0] : 0);
			if (g < 0 !== Ga < 0) {
				refine(Ta, Ga, m, g, 0.5 * (Ta + m));
				refine(m, g, Tb, Gb, 0.5 * (m + Tb));
				return;
			}
			if (dg < 0 === da < 0) lo = m;
			else hi = m;
			if (hi - lo <= 1e-13 * m) break;
		}
		const [x, g] = fn(m);
		if (Math.abs(g) <= TOUCH * (Math.abs(value) + Math.abs(line.yV[b] - line.yL[b]))) accept(x);
	};
	for (let i = 0; i < n - 1; i++) {
		const Ga = G[i],
			Gb = G[i + 1];
		if (!Number.isFinite(Ga) || !Number.isFinite(Gb)) continue;
		if (outside(i, i + 1) && (i === 0 || outside(i - 1, i + 1))) continue;
		const Ta = nodes.T[i],
			Tb = nodes.T[i + 1];
		if (Ga === 0) {
			refine(Ta, Ga, Tb, Gb, Ta);
			continue;
		}
		if (Ga < 0 !== Gb < 0) {
			refine(Ta, Ga, Tb, Gb, start(i));
			continue;
		}
		// same sign at both nodes: a turning point of G between them may cross or touch zero. Only
		// intervals beside a local minimum of |G| that is small against G's change over the
		// neighbouring nodes can hold one; the exact slopes at both nodes decide, then bisection on
		// dG/dT finds the extremum: G crossing there gives two roots, G touching zero (within
		// round-off) the double root of a tangent pair (x or a property at its extreme on the line)
		if (!(dipsAt(G, i, n) || dipsAt(G, i + 1, n))) continue;
		// first from the table alone: the cubic through four nodes around the interval; only an
		// extremum that comes near zero is worth the exact slopes (two saturation solves)
		if (nodeCubicClear(nodes.T, G, i, n)) continue;
		turning(Ta, Ga, Tb, Gb);
	}
	return roots;
}
