/**
 * States from two of u, h, s — (h, s), (u, h), (u, s) — which fix neither T, P nor ρ directly.
 * Two-phase candidates: domeRoots with the quality fixed by the first property. Single-phase
 * candidates: 2-D Newton in (T, ln ρ) on both residuals, started from every cell of a per-fluid
 * state grid whose image contains the target (barycentric interpolation gives the start).
 * The grid follows each isotherm on two branches that meet the saturation line (or, above Tc, the
 * critical isobar) at their ends, so no cell straddles the dome:
 *   vapor-like: ln P uniform from Pt/100 up to Psat(T) (or Pc); liquid-like: from Psat(T) (or Pc) to Pmax.
 * Every converged candidate is checked to be single-phase and in range; duplicates are merged.
 */
import { fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point, propDT, propDrho, propValue, type EnergyProp } from '../properties.ts';
import type { RootHint, State } from '../types.ts';
import { choose } from './choose.ts';
import { densityAtTP } from './density.ts';
import { domeRoots } from './dome.ts';
import { locate, placedState, twoPhaseAt } from './locate.ts';
import { noStateInRange } from './range.ts';
import { satAtT, triplePressure } from './saturation.ts';

const NT_UNIFORM = 40;
/** relative offsets from Tc of extra isotherms (the map from (T, ρ) to u, h, s bends sharply there) */
const NEAR_CRITICAL = [-0.03, -0.01, -0.003, -0.001, 0.001, 0.003, 0.01, 0.03];
const NV = 18;
const NL = 18;
const UNIT: Record<EnergyProp, string> = { u: 'J/kg', h: 'J/kg', s: 'J/(kg·K)' };

interface Grid {
	/** number of isotherms */
	nt: number;
	/** per branch: node arrays [i*(nj)+j] */
	branches: { nj: number; T: Float64Array; lnRho: Float64Array; y: Float64Array[] }[];
	/** bounding boxes per pair key, per branch, per cell: [min a, max a, min b, max b] */
	boxes: Map<string, Float64Array[]>;
}

function buildGrid(fl: Fluid): Grid {
	const Pt = triplePressure(fl);
	const Plo = Pt / 100;
	// uniform in T, plus nodes closing in on the critical temperature from both sides
	const span = fl.Tmax - fl.Tmin;
	const set = new Set<number>();
	for (let i = 0; i < NT_UNIFORM; i++) set.add(fl.Tmin + (span * i) / (NT_UNIFORM - 1));
	for (const f of NEAR_CRITICAL) set.add(fl.Tc * (1 + f));
	set.add(fl.Tc);
	const Ts = [...set].filter((T) => T >= fl.Tmin && T <= fl.Tmax).sort((a, b) => a - b);
	for (let i = Ts.length - 1; i > 0; i--) if (Ts[i] - Ts[i - 1] < 1e-6 * Ts[i]) Ts.splice(i, 1);
	const nt = Ts.length;
	const p = new Point();
	const branches = [NV, NL].map((nj) => ({
		nj,
		T: new Float64Array(nt * nj),
		lnRho: new Float64Array(nt * nj),
		y: [0, 1, 2].map(() => new Float64Array(nt * nj))
	}));
	for (let i = 0; i < nt; i++) {
		const T = Ts[i];
		const sub = T < fl.Tc * (1 - 1e-9);
		const sat = sub ? satAtT(fl, T) : null;
		const Pmid = sat ? sat.P : fl.Pc;
		for (let b = 0; b < 2; b++) {
			const br = branches[b];
			const nj = br.nj;
			let rho = b === 0 ? Plo / (fl.R * T) : sat ? sat.rhoL : fl.rhoc;
			for (let j = 0; j < nj; j++) {
				const f = j / (nj - 1);
				const lnP = b === 0 ? Math.log(Plo) + f * (Math.log(Pmid) - Math.log(Plo)) : Math.log(Pmid) + f * (Math.log(fl.Pmax) - Math.log(Pmid));
				const P = Math.exp(lnP);
				if (sat && b === 0 && j === nj - 1) rho = sat.rhoV;
				else if (sat && b === 1 && j === 0) rho = sat.rhoL;
				else if (sat && b === 0) rho = densityAtTP(fl, T, P, Math.min(rho, sat.rhoV), 0, sat.rhoV);
				// start strictly inside the bracket: a guess equal to its bound would be replaced by 2·ρ' (density.ts),
				// from which Newton need not come back on a stiff liquid isotherm (oxygen near its triple point)
				else if (sat && b === 1) rho = densityAtTP(fl, T, P, Math.max(rho, sat.rhoL * (1 + 1e-12)), sat.rhoL);
				else rho = densityAtTP(fl, T, P, rho);
				const idx = i * nj + j;
				evalPoint(fl, T, rho, p, 1);
				br.T[idx] = T;
				br.lnRho[idx] = Math.log(rho);
				br.y[0][idx] = p.u;
				br.y[1][idx] = p.h;
				br.y[2][idx] = p.s;
			}
		}
	}
	return { nt, branches, boxes: new Map() };
}

function grid(fl: Fluid): Grid {
	let g = fl.cache.stateGrid as Grid | undefined;
	if (!g) {
		g = buildGrid(fl);
		fl.cache.stateGrid = g;
	}
	return g;
}

const YI: Record<EnergyProp, number> = { u: 0, h: 1, s: 2 };

function boxes(g: Grid, a: EnergyProp, b: EnergyProp): Float64Array[] {
	const key = a + b;
	let bx = g.boxes.get(key);
	if (bx) return bx;
	bx = g.branches.map((br) => {
		const nj = br.nj;
		const A = br.y[YI[a]], B = br.y[YI[b]];
		const out = new Float64Array((g.nt - 1) * (nj - 1) * 4);
		for (let i = 0; i < g.nt - 1; i++)
			for (let j = 0; j < nj - 1; j++) {
				const c = [i * nj + j, i * nj + j + 1, (i + 1) * nj + j, (i + 1) * nj + j + 1];
				const o = (i * (nj - 1) + j) * 4;
				out[o] = Math.min(...c.map((q) => A[q]));
				out[o + 1] = Math.max(...c.map((q) => A[q]));
				out[o + 2] = Math.min(...c.map((q) => B[q]));
				out[o + 3] = Math.max(...c.map((q) => B[q]));
			}
		return out;
	});
	g.boxes.set(key, bx);
	return bx;
}

/** Starting points (T, ln ρ) for the 2-D Newton, best first. */
export interface Starts {
	/** barycentric points of cells with the target inside one of their two triangles */
	inside: [number, number][];
	/** centres of cells whose bounding box holds the target but neither triangle does */
	centres: [number, number][];
	/** the nearest node, when no cell holds the target (e.g. below the grid's lowest pressure) */
	nearest: [number, number][];
}

function barycentric(Ya: Float64Array, Yb: Float64Array, p0: number, p1: number, p2: number, A: number, B: number): [number, number, number] | null {
	const x0 = Ya[p0], y0 = Yb[p0];
	const d = (Ya[p1] - x0) * (Yb[p2] - y0) - (Ya[p2] - x0) * (Yb[p1] - y0);
	if (d === 0) return null;
	const l1 = ((A - x0) * (Yb[p2] - y0) - (Ya[p2] - x0) * (B - y0)) / d;
	const l2 = ((Ya[p1] - x0) * (B - y0) - (A - x0) * (Yb[p1] - y0)) / d;
	const l0 = 1 - l1 - l2;
	return l0 >= -0.05 && l1 >= -0.05 && l2 >= -0.05 ? [l0, l1, l2] : null;
}

/**
 * Starting points: every grid cell across which both residuals change sign (the target lies in
 * the cell's bounding box in the (a, b) plane). The start is the barycentric point when the target
 * lies inside one of the cell's two triangles, else the cell's centre — cells on dilute-vapor
 * isotherms are nearly degenerate in (u, h), where only the centre is usable.
 */
export function starts(fl: Fluid, a: EnergyProp, A: number, b: EnergyProp, B: number): Starts {
	const g = grid(fl);
	const bx = boxes(g, a, b);
	const out: Starts = { inside: [], centres: [], nearest: [] };
	const ia = YI[a], ib = YI[b];
	for (let bi = 0; bi < g.branches.length; bi++) {
		const br = g.branches[bi];
		const nj = br.nj;
		const box = bx[bi];
		const Ya = br.y[ia], Yb = br.y[ib];
		const cells = (g.nt - 1) * (nj - 1);
		for (let cell = 0; cell < cells; cell++) {
			const o = cell * 4;
			const lo0 = box[o], hi0 = box[o + 1], lo1 = box[o + 2], hi1 = box[o + 3];
			const wa = 1e-9 * Math.abs(A) + 1e-6 * (hi0 - lo0);
			if (A < lo0 - wa || A > hi0 + wa) continue;
			const wb = 1e-9 * Math.abs(B) + 1e-6 * (hi1 - lo1);
			if (B < lo1 - wb || B > hi1 + wb) continue;
			const i = (cell / (nj - 1)) | 0, j = cell - i * (nj - 1);
			const c0 = i * nj + j, c1 = c0 + 1, c3 = c0 + nj, c2 = c3 + 1;
			let w = barycentric(Ya, Yb, c0, c1, c2, A, B);
			let tri = [c0, c1, c2];
			if (!w) {
				w = barycentric(Ya, Yb, c0, c2, c3, A, B);
				tri = [c0, c2, c3];
			}
			if (w) {
				out.inside.push([
					w[0] * br.T[tri[0]] + w[1] * br.T[tri[1]] + w[2] * br.T[tri[2]],
					w[0] * br.lnRho[tri[0]] + w[1] * br.lnRho[tri[1]] + w[2] * br.lnRho[tri[2]]
				]);
			} else {
				out.centres.push([
					0.25 * (br.T[c0] + br.T[c1] + br.T[c2] + br.T[c3]),
					0.25 * (br.lnRho[c0] + br.lnRho[c1] + br.lnRho[c2] + br.lnRho[c3])
				]);
			}
		}
	}
	if (out.inside.length + out.centres.length > 0) return out;
	let bestD = Infinity;
	for (const br of g.branches) {
		const Ya = br.y[ia], Yb = br.y[ib];
		for (let q = 0; q < g.nt * br.nj; q++) {
			const da = (Ya[q] - A) / (fl.R * fl.Tc), db = (Yb[q] - B) / (fl.R * fl.Tc);
			const dist = da * da + db * db;
			if (dist < bestD) {
				bestD = dist;
				out.nearest = [[br.T[q], br.lnRho[q]]];
			}
		}
	}
	return out;
}

/**
 * 2-D Newton in (T, ln ρ) on y_a = A, y_b = B (for (u, h): u = U and P/ρ = H − U); returns the
 * converged point or null.
 */
export function newton2(fl: Fluid, a: EnergyProp, A: number, b: EnergyProp, B: number, T0: number, z0: number, p: Point): Point | null {
	const sa = a === 's' ? fl.R : fl.R * fl.Tc;
	const sb = b === 's' ? fl.R : fl.R * fl.Tc;
	const pv = a === 'u' && b === 'h';
	let T = T0, z = z0;
	let lastDT = Infinity, lastDz = Infinity, noisy = 0, norm = Infinity;
	for (let it = 0; it < 60; it++) {
		const rho = Math.exp(z);
		evalPoint(fl, T, rho, p, 2);
		const ra = (propValue(p, a) - A) / sa;
		// for (u, h) the second residual is Pv − (H − U): h − u = P/ρ without cancellation
		const rb = pv ? (p.P / rho - (B - A)) / sb : (propValue(p, b) - B) / sb;
		norm = Math.abs(ra) + Math.abs(rb);
		if (!Number.isFinite(norm)) return null;
		if (norm < 1e-16) return p;
		const j11 = propDT(p, a) / sa, j12 = (propDrho(p, a) * rho) / sa;
		const j21 = pv ? p.dPdT / rho / sb : propDT(p, b) / sb;
		const j22 = pv ? (p.dPdrho - p.P / rho) / sb : (propDrho(p, b) * rho) / sb;
		const det = j11 * j22 - j12 * j21;
		if (!Number.isFinite(det) || det === 0) return null;
		let dT = -(ra * j22 - j12 * rb) / det;
		let dz = -(j11 * rb - ra * j21) / det;
		const m = Math.max(1, Math.abs(dT) / (0.2 * T), Math.abs(dz) / 1.0);
		dT /= m;
		dz /= m;
		// converged when the steps are at round-off, or have stopped shrinking once tiny (noise)
		const tiny = Math.abs(dT) <= 1e-14 * T && Math.abs(dz) <= 1e-13;
		const stuck = norm < 1e-11 && Math.abs(dT) >= 0.5 * lastDT && Math.abs(dz) >= 0.5 * lastDz;
		noisy = stuck ? noisy + 1 : 0;
		lastDT = Math.abs(dT);
		lastDz = Math.abs(dz);
		T += dT;
		z += dz;
		if (!(T > 0.5 * fl.Tmin && T < 2 * fl.Tmax && z < Math.log(50 * fl.rhoc))) return null;
		if (tiny || noisy >= 3) {
			evalPoint(fl, T, Math.exp(z), p, 2);
			return p;
		}
	}
	if (norm < 1e-10) return p;
	return null;
}

export function flashYY(fl: Fluid, a: EnergyProp, A: number, b: EnergyProp, B: number, hint?: RootHint): State {
	const what = `${a} = ${fmt(A)} ${UNIT[a]} and ${b} = ${fmt(B)} ${UNIT[b]}`;
	const found: State[] = [];
	// the quality from s (or h) is better conditioned than from u; any works
	for (const r of domeRoots(fl, { prop: a, value: A }, b, B)) {
		const st = twoPhaseAt(fl, r.sat, r.x);
		if (st) found.push(st);
	}
	// (h, s) is one-to-one across the dome (Mollier): a compressed liquid with entropy s lies above
	// h'(T) + v'-weighted pressure work, every mixture with that s below it; a two-phase answer ends
	// the search
	if (found.length > 0 && ((a === 's' && b === 'h') || (a === 'h' && b === 's'))) return choose(fl, found, hint, what, () => noStateInRange(fl, what));
	const p = new Point();
	const dT = (fl.Tmax - fl.Tmin) / (NT_UNIFORM - 1);
	const accepted: [number, number][] = [];
	const metastable: [number, number][] = [];
	const st = starts(fl, a, A, b, B);
	// cells holding the target first; centres of the other candidate cells only if none gave a
	// state — except for (u, h), whose dilute-vapor cells are degenerate and only reached that way
	const degenerate = (a === 'u' && b === 'h') || (a === 'h' && b === 'u');
	const queue: [number, number][] = [...st.inside, ...st.nearest, ...(degenerate ? st.centres : [])];
	let centresQueued = degenerate;
	let runs = 0;
	while (runs < 24) {
		if (queue.length === 0) {
			if (centresQueued || accepted.length > 0) break;
			queue.push(...st.centres);
			centresQueued = true;
			if (queue.length === 0) break;
		}
		const [T0, z0] = queue.shift() as [number, number];
		// a start within a grid cell of an accepted state leads to the same state
		if (accepted.some(([T, z]) => Math.abs(T - T0) < dT && Math.abs(z - z0) < 0.5)) continue;
		runs++;
		const q = newton2(fl, a, A, b, B, T0, z0, p);
		if (!q) continue;
		if (q.T < fl.Tmin * (1 - 1e-9) || q.T > fl.Tmax * (1 + 1e-9) || q.P > fl.Pmax * (1 + 1e-9) || !(q.P > 0)) continue;
		const loc = locate(fl, q);
		if (loc.phase === 'saturated-mixture' && loc.sat) {
			// a metastable root of the equation inside the dome: look again just outside it on its
			// side, once per such root
			if (metastable.some(([T, z]) => Math.abs(T - q.T) < 1e-6 * T && Math.abs(z - Math.log(q.rho)) < 1e-6)) continue;
			metastable.push([q.T, Math.log(q.rho)]);
			const { rhoL, rhoV } = loc.sat;
			const side = q.rho > Math.sqrt(rhoL * rhoV) ? Math.log(rhoL * 1.001) : Math.log(rhoV * 0.999);
			queue.unshift([q.T, side]);
			continue;
		}
		accepted.push([q.T, Math.log(q.rho)]);
		found.push(placedState(fl, q, loc));
	}
	return choose(fl, found, hint, what, () => noStateInRange(fl, what));
}
