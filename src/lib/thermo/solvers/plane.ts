/**
 * States from two of u, h, s — (h, s), (u, h), (u, s) — which fix neither T, P nor ρ directly.
 * Two-phase candidates: domeRoots with the quality fixed by the first property. Single-phase
 * candidates: 2-D Newton in (T, ln ρ) on both residuals, started from every cell of a per-fluid
 * state grid whose image contains the target (barycentric interpolation gives the start).
 * The grid follows each isotherm on two branches that meet the saturation line (or, above Tc, the
 * critical isobar) at their ends, so no cell straddles the dome:
 *   vapor-like: ln P uniform from Pt·1e−5 up to Psat(T) (or Pc); liquid-like: from Psat(T) (or Pc) to Pmax.
 * Every converged candidate is checked to be single-phase and in range; duplicates are merged.
 */
import { fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point, propDT, propDrho, propValue, type EnergyProp } from '../properties.ts';
import type { RootHint, State } from '../types.ts';
import { choose } from './choose.ts';
import { densityAtTP } from './density.ts';
import { domeRoots, evalSatLine, SatLine } from './dome.ts';
import { locate, placedState, twoPhaseAt } from './locate.ts';
import { noStateInRange } from './range.ts';
import { newtonBracket, scanRoots, type FD } from './roots.ts';
import { CRITICAL_BAND, satAtT, triplePressure } from './saturation.ts';
import { saturatedState } from '../state.ts';
import { precisionOf } from './precision.ts';

const NT_UNIFORM = 40;
/** relative offsets from Tc of extra isotherms (the map from (T, ρ) to u, h, s bends sharply there) */
const NEAR_CRITICAL = [-0.03, -0.01, -0.003, -0.001, 0.001, 0.003, 0.01, 0.03];
const NV = 26;
const NL = 18;
/** at most this many Newton runs per pair */
const MAX_RUNS = 48;
/** samples of the (u, h) contour scan in ln ρ */
const CONTOUR_SAMPLES = 160;
/** the (u, h) contour scan reaches dilute gas down to this pressure (Pa) at Tmax, whatever the grid's floor */
const CONTOUR_FLOOR_P = 1e-4;
/** samples of the contour scan between that floor and the grid's */
const CONTOUR_DILUTE_SAMPLES = 32;
/**
 * samples of the contour scan between its last sample inside [Tmin, Tmax] and the point where the
 * curve u = U leaves that range (both roots beside a turning point can lie there: R-1234ze(E)
 * 0.1 K below Tmax)
 */
const CONTOUR_EDGE_SAMPLES = 8;
/** a start within this fraction of a grid cell (in T, and in ln ρ) of an accepted state is not run */
const SAME_START = 0.02;
/** scaled residual below which a point between two candidates shows them to be one state */
const VALLEY = 1e-10;
const UNIT: Record<EnergyProp, string> = { u: 'J/kg', h: 'J/kg', s: 'J/(kg·K)' };

interface Grid {
	/** number of isotherms */
	nt: number;
	/** per branch: node arrays [i*(nj)+j] */
	branches: { nj: number; T: Float64Array; lnRho: Float64Array; y: Float64Array[] }[];
	/** bounding boxes per pair key, per branch, per cell: [min a, max a, min b, max b] */
	boxes: Map<string, Float64Array[]>;
	/** per isotherm: ln of the pressure where its branches meet (Psat, or Pc above Tc) */
	lnPmid: Float64Array;
	/** ln of the liquid-like branches' top pressure (Pmax), and of the vapor-like ones' floor */
	lnPmax: number;
	lnPlo: number;
}

function buildGrid(fl: Fluid): Grid {
	const Pt = triplePressure(fl);
	// dilute gas well below the triple-point pressure (to about Pt·1e−5) is in range and in the grid
	const Plo = Pt * 1e-5;
	// uniform in T, plus nodes closing in on the critical temperature from both sides
	const span = fl.Tmax - fl.Tmin;
	const set = new Set<number>();
	// the last node is Tmax itself: Tmin + span can round one ulp above it (hydrogen, nitrogen,
	// carbon dioxide), and a node above Tmax would be dropped, leaving the top cell out of the grid
	for (let i = 0; i < NT_UNIFORM - 1; i++) set.add(fl.Tmin + (span * i) / (NT_UNIFORM - 1));
	set.add(fl.Tmax);
	for (const f of NEAR_CRITICAL) set.add(fl.Tc * (1 + f));
	set.add(fl.Tc);
	const Ts = [...set].filter((T) => T >= fl.Tmin && T <= fl.Tmax).sort((a, b) => a - b);
	for (let i = Ts.length - 1; i > 0; i--) if (Ts[i] - Ts[i - 1] < 1e-6 * Ts[i]) Ts.splice(i, 1);
	const nt = Ts.length;
	const p = new Point();
	const lnPmid = new Float64Array(nt);
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
		lnPmid[i] = Math.log(Pmid);
		for (let b = 0; b < 2; b++) {
			const br = branches[b];
			const nj = br.nj;
			let rho = b === 0 ? Plo / (fl.R * T) : sat ? sat.rhoL : fl.rhoc;
			for (let j = 0; j < nj; j++) {
				const f = j / (nj - 1);
				const lnP =
					b === 0
						? Math.log(Plo) + f * (Math.log(Pmid) - Math.log(Plo))
						: Math.log(Pmid) + f * (Math.log(fl.Pmax) - Math.log(Pmid));
				const P = Math.exp(lnP);
				if (sat && b === 0 && j === nj - 1) rho = sat.rhoV;
				else if (sat && b === 1 && j === 0) rho = sat.rhoL;
				else if (sat && b === 0) rho = densityAtTP(fl, T, P, Math.min(rho, sat.rhoV), 0, sat.rhoV);
				// start strictly inside the bracket: a guess equal to its bound would be replaced by 2·ρ' (density.ts),
				// from which Newton need not come back on a stiff liquid isotherm (oxygen near its triple point)
				else if (sat && b === 1)
					rho = densityAtTP(fl, T, P, Math.max(rho, sat.rhoL * (1 + 1e-12)), sat.rhoL);
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
	return {
		nt,
		branches,
		boxes: new Map(),
		lnPmid,
		lnPmax: Math.log(fl.Pmax),
		lnPlo: Math.log(Plo)
	};
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

/** ln ρ at P on isotherm i of the grid, on the branch P lies on (linear in ln P); NaN outside it. */
function lnRhoOnRow(g: Grid, i: number, lnP: number): number {
	const liquid = lnP >= g.lnPmid[i];
	const br = g.branches[liquid ? 1 : 0];
	const f = liquid
		? (lnP - g.lnPmid[i]) / (g.lnPmax - g.lnPmid[i])
		: (lnP - g.lnPlo) / (g.lnPmid[i] - g.lnPlo);
	if (!(f >= 0 && f <= 1)) return NaN;
	const nj = br.nj;
	const x = f * (nj - 1);
	const j = Math.min(nj - 2, Math.floor(x));
	const k = i * nj + j;
	return br.lnRho[k] + (x - j) * (br.lnRho[k + 1] - br.lnRho[k]);
}

/**
 * A start for the density at (T, P) above the critical temperature, read off the state grid
 * (linear in ln P along the isotherms either side of T, then in T; they must both lie above Tc);
 * NaN where the grid has none (P below its floor, T within its nearest isotherms of Tc).
 */
export function densityStart(fl: Fluid, T: number, P: number): number {
	const g = grid(fl);
	const Ts = g.branches[0].T;
	const nv = g.branches[0].nj;
	let lo = 0,
		hi = g.nt - 1;
	if (!(T >= Ts[0] && T <= Ts[hi * nv])) return NaN;
	while (hi - lo > 1) {
		const mid = (lo + hi) >> 1;
		if (Ts[mid * nv] <= T) lo = mid;
		else hi = mid;
	}
	const Ta = Ts[lo * nv],
		Tb = Ts[hi * nv];
	if (!(Ta >= fl.Tc)) return NaN;
	const lnP = Math.log(P);
	const za = lnRhoOnRow(g, lo, lnP),
		zb = lnRhoOnRow(g, hi, lnP);
	return Math.exp(za + ((T - Ta) / (Tb - Ta)) * (zb - za));
}

/**
 * A start (T, ρ) on the isobar P where u, h or s is Y, read off the state grid (linear in ln P
 * along each isotherm, then between isotherms): at or above Pc on the liquid-like branches, every
 * isotherm; below Pc (`vapor`) on the vapor-like ones, the isotherms above the saturation
 * temperature at P (a Y between the saturated vapor and the first of them gets none: a start
 * extrapolated from the saturated vapor does there). Null also when Y lies outside the grid's
 * values along the isobar, or when they do not rise with T along it (where an isobar turns, the
 * caller's scan finds every root).
 */
export function isobarStart(
	fl: Fluid,
	P: number,
	which: EnergyProp,
	Y: number,
	vapor = false
): [number, number] | null {
	if (vapor ? !(P < fl.Pc) : !(P >= fl.Pc && P <= fl.Pmax)) return null;
	const g = grid(fl);
	const br = g.branches[vapor ? 0 : 1];
	const nj = br.nj;
	const ys = br.y[YI[which]];
	const lnP = Math.log(P);
	let found: [number, number] | null = null;
	let prevT = NaN,
		prevY = NaN,
		prevZ = NaN;
	for (let i = 0; i < g.nt; i++) {
		const f = vapor
			? (lnP - g.lnPlo) / (g.lnPmid[i] - g.lnPlo)
			: (lnP - g.lnPmid[i]) / (g.lnPmax - g.lnPmid[i]);
		if (!(f >= 0 && f <= 1)) {
			// below the saturation temperature at P the isobar is liquid: no vapor-like node there
			if (vapor && Number.isNaN(prevT)) continue;
			return null;
		}
		const x = f * (nj - 1);
		const j = Math.min(nj - 2, Math.floor(x));
		const w = x - j;
		const k = i * nj + j;
		const y = ys[k] + w * (ys[k + 1] - ys[k]);
		const z = br.lnRho[k] + w * (br.lnRho[k + 1] - br.lnRho[k]);
		const T = br.T[k];
		if (!Number.isNaN(prevT)) {
			// a vapor-like isobar below Pc rises with T (cp > 0): a fall between isotherms is the linear
			// interpolation's error beside the critical point (the nodes bunch toward Pc there), not a
			// turn; no start from that interval
			if (!(y > prevY) && !vapor) return null;
			if (!found && y > prevY && Y >= prevY && Y <= y) {
				const u = (Y - prevY) / (y - prevY);
				found = [prevT + u * (T - prevT), Math.exp(prevZ + u * (z - prevZ))];
			}
		}
		prevT = T;
		prevY = y;
		prevZ = z;
	}
	return found;
}

function boxes(g: Grid, a: EnergyProp, b: EnergyProp): Float64Array[] {
	const key = a + b;
	let bx = g.boxes.get(key);
	if (bx) return bx;
	bx = g.branches.map((br) => {
		const nj = br.nj;
		const A = br.y[YI[a]],
			B = br.y[YI[b]];
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

function barycentric(
	Ya: Float64Array,
	Yb: Float64Array,
	p0: number,
	p1: number,
	p2: number,
	A: number,
	B: number
): [number, number, number] | null {
	const x0 = Ya[p0],
		y0 = Yb[p0];
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
	const ia = YI[a],
		ib = YI[b];
	for (let bi = 0; bi < g.branches.length; bi++) {
		const br = g.branches[bi];
		const nj = br.nj;
		const box = bx[bi];
		const Ya = br.y[ia],
			Yb = br.y[ib];
		const cells = (g.nt - 1) * (nj - 1);
		for (let cell = 0; cell < cells; cell++) {
			const o = cell * 4;
			const lo0 = box[o],
				hi0 = box[o + 1],
				lo1 = box[o + 2],
				hi1 = box[o + 3];
			const wa = 1e-9 * Math.abs(A) + 1e-6 * (hi0 - lo0);
			if (A < lo0 - wa || A > hi0 + wa) continue;
			const wb = 1e-9 * Math.abs(B) + 1e-6 * (hi1 - lo1);
			if (B < lo1 - wb || B > hi1 + wb) continue;
			const i = (cell / (nj - 1)) | 0,
				j = cell - i * (nj - 1);
			const c0 = i * nj + j,
				c1 = c0 + 1,
				c3 = c0 + nj,
				c2 = c3 + 1;
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
		const Ya = br.y[ia],
			Yb = br.y[ib];
		for (let q = 0; q < g.nt * br.nj; q++) {
			const da = (Ya[q] - A) / (fl.R * fl.Tc),
				db = (Yb[q] - B) / (fl.R * fl.Tc);
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
 * Starting points bracketed along the grid lines: in every cell that the curve y_a = A crosses
 * (found on the cell's edges — two isotherms and two lines of constant pressure fraction — by
 * interpolation in ln ρ), the other residual is interpolated at each edge crossing; where it has
 * opposite signs at two crossings of one cell a root of the pair lies on the curve between them,
 * started at the interpolated point. Each root the grid resolves is bracketed this way, also when
 * its cell holds another root or the curve leaves the grid through its low-pressure edge.
 */
export function bracketStarts(
	fl: Fluid,
	a: EnergyProp,
	A: number,
	b: EnergyProp,
	B: number
): [number, number][] {
	const g = grid(fl);
	const ia = YI[a],
		ib = YI[b];
	const pv = a === 'u' && b === 'h';
	const bx = boxes(g, a, b);
	const out: [number, number][] = [];
	const cross: number[] = [];
	for (let bi = 0; bi < g.branches.length; bi++) {
		const br = g.branches[bi];
		const nj = br.nj;
		const Ya = br.y[ia],
			Yb = br.y[ib];
		const box = bx[bi];
		const rb = (q: number) => (pv ? Yb[q] - Ya[q] - (B - A) : Yb[q] - B);
		const cells = (g.nt - 1) * (nj - 1);
		for (let cell = 0; cell < cells; cell++) {
			const o = cell * 4;
			if (A < box[o] || A > box[o + 1]) continue;
			// the interpolated residual at the edges lies within the cell's range of y_b: B outside
			// it (widened by round-off) leaves one sign at every crossing, so no bracket
			if (!pv) {
				const wb = 1e-9 * Math.abs(B) + 1e-6 * (box[o + 3] - box[o + 2]);
				if (B < box[o + 2] - wb || B > box[o + 3] + wb) continue;
			}
			const i = (cell / (nj - 1)) | 0,
				j = cell - i * (nj - 1);
			const c0 = i * nj + j,
				c1 = c0 + 1,
				c3 = c0 + nj,
				c2 = c3 + 1;
			cross.length = 0;
			for (const [p, q] of [
				[c0, c1],
				[c1, c2],
				[c2, c3],
				[c3, c0]
			]) {
				const fp = Ya[p] - A,
					fq = Ya[q] - A;
				if (fp === 0 || (fp < 0 !== fq < 0 && fq !== 0)) {
					const w = fp === 0 ? 0 : fp / (fp - fq);
					cross.push(
						br.T[p] + w * (br.T[q] - br.T[p]),
						br.lnRho[p] + w * (br.lnRho[q] - br.lnRho[p]),
						rb(p) + w * (rb(q) - rb(p))
					);
				}
			}
			for (let m = 0; m < cross.length; m += 3)
				for (let n = m + 3; n < cross.length; n += 3) {
					const r0 = cross[m + 2],
						r1 = cross[n + 2];
					if (r0 === 0 || r0 < 0 !== r1 < 0) {
						const w = r0 === 0 ? 0 : r0 / (r0 - r1);
						out.push([
							cross[m] + w * (cross[n] - cross[m]),
							cross[m + 1] + w * (cross[n + 1] - cross[m + 1])
						]);
					}
				}
		}
	}
	return out;
}

/**
 * Roots of (u, h) along the curve u = U, scanned in ln ρ: at fixed ρ, u rises strictly with T
 * (cv > 0), so each density has at most one T(ρ) with u = U, and every state with the pair is a
 * zero of R(ln ρ) = P/ρ − (H − U) at (T(ρ), ρ). Sampling R and its exact slope (scanRoots) brackets
 * each zero, turning points included — in dilute gas, where the grid's interpolation error is
 * larger than R itself, this is the only way to see them.
 */
export function contourRootsUH(fl: Fluid, U: number, H: number): [number, number][] {
	const g = grid(fl);
	let zMax = -Infinity,
		zMin = Infinity;
	for (const br of g.branches)
		for (let q = 0; q < br.lnRho.length; q++) {
			zMax = Math.max(zMax, br.lnRho[q]);
			zMin = Math.min(zMin, br.lnRho[q]);
		}
	const p = new Point();
	let Tlast = 0.5 * (fl.Tmin + fl.Tmax);
	const Tat = (z: number): number => {
		const rho = Math.exp(z);
		let T = Tlast,
			last = Infinity;
		for (let it = 0; it < 40; it++) {
			evalPoint(fl, T, rho, p, 2);
			const step = (p.u - U) / p.cv;
			if (!Number.isFinite(step)) return NaN;
			T = Math.min(Math.max(T - step, 0.5 * T), 2 * T);
			last = Math.abs(step);
			if (last <= 1e-12 * T) break;
		}
		// a run that has not settled (u = U has no T at this ρ where the equation is sane) is no
		// point of the curve: the scan treats it as outside the domain
		if (!(last <= 1e-8 * T)) return NaN;
		if (!(T >= fl.Tmin * (1 - 1e-9) && T <= fl.Tmax * (1 + 1e-9))) return NaN;
		evalPoint(fl, T, rho, p, 2);
		Tlast = T;
		return T;
	};
	const fn = (z: number, out: FD) => {
		const T = Tat(z);
		if (!Number.isFinite(T)) {
			out.f = NaN;
			out.df = NaN;
			return;
		}
		const rho = p.rho;
		const dudz = propDrho(p, 'u') * rho;
		const dTdz = -dudz / p.cv;
		out.f = (p.P / rho - (H - U)) / (fl.R * fl.Tc);
		out.df = ((p.dPdT / rho) * dTdz + (p.dPdrho - p.P / rho)) / (fl.R * fl.Tc);
	};
	// where the curve u = U leaves [Tmin, Tmax] between zIn (T in range) and zOut (not): at zOut
	// u(Tmax, ρ) < U (the curve is above Tmax) or u(Tmin, ρ) > U (below Tmin); the edge is the
	// zero of u(T_bound, ρ) − U between them (u(T_bound, ρ) − U has the other sign at zIn)
	const q = new Point();
	const uAt = (Tb: number) => (z: number, o: FD) => {
		const rho = Math.exp(z);
		evalPoint(fl, Tb, rho, q, 2);
		o.f = (q.u - U) / (fl.R * fl.Tc);
		o.df = (propDrho(q, 'u') * rho) / (fl.R * fl.Tc);
	};
	const at = (zIn: number, zOut: number): number | null => {
		const o: FD = { f: 0, df: 0 };
		for (const Tb of [fl.Tmax, fl.Tmin]) {
			const g = uAt(Tb);
			g(zOut, o);
			const gOut = o.f;
			if (!Number.isFinite(gOut) || (Tb === fl.Tmax ? gOut >= 0 : gOut <= 0)) continue;
			g(zIn, o);
			const gIn = o.f;
			if (!Number.isFinite(gIn) || gIn < 0 === gOut < 0) continue;
			const z = newtonBracket(g, zIn, gIn, zOut, gOut, 1e-13);
			// the edge itself, or a hair inside it, is where fn is still defined
			for (let k = 0; k < 4; k++) {
				const zk = z + (zIn - z) * (k === 0 ? 0 : Math.pow(10, 3 * k - 12));
				fn(zk, o);
				if (Number.isFinite(o.f) && Number.isFinite(o.df)) return zk;
			}
			return null;
		}
		return null;
	};
	const edge = { samples: CONTOUR_EDGE_SAMPLES, at };
	const out: [number, number][] = [];
	for (const z of scanRoots(fn, zMin, zMax, CONTOUR_SAMPLES, 1e-12, edge)) {
		const T = Tat(z);
		if (Number.isFinite(T)) out.push([T, z]);
	}
	// below the grid's floor (Pt·1e−5: about 5 Pa for carbon dioxide) the gas is still in range;
	// there R(ln ρ) is its dilute limit plus a term in ρ, so a coarse scan down to a common
	// absolute floor brackets its zero
	const zFloor = Math.log(CONTOUR_FLOOR_P / (fl.R * fl.Tmax));
	if (zFloor < zMin)
		for (const z of scanRoots(fn, zFloor, zMin, CONTOUR_DILUTE_SAMPLES, 1e-12, edge)) {
			const T = Tat(z);
			if (Number.isFinite(T) && !out.some(([, z1]) => Math.abs(z1 - z) < 1e-9)) out.push([T, z]);
		}
	return out;
}

/**
 * 2-D Newton in (T, ln ρ) on y_a = A, y_b = B (for (u, h): u = U and P/ρ = H − U); returns the
 * converged point or null.
 */
export function newton2(
	fl: Fluid,
	a: EnergyProp,
	A: number,
	b: EnergyProp,
	B: number,
	T0: number,
	z0: number,
	p: Point
): Point | null {
	const sa = a === 's' ? fl.R : fl.R * fl.Tc;
	const sb = b === 's' ? fl.R : fl.R * fl.Tc;
	const pv = a === 'u' && b === 'h';
	let T = T0,
		z = z0;
	let lastDT = Infinity,
		lastDz = Infinity,
		noisy = 0,
		norm = Infinity;
	for (let it = 0; it < 60; it++) {
		const rho = Math.exp(z);
		evalPoint(fl, T, rho, p, 2);
		const ra = (propValue(p, a) - A) / sa;
		// for (u, h) the second residual is Pv − (H − U): h − u = P/ρ without cancellation
		const rb = pv ? (p.P / rho - (B - A)) / sb : (propValue(p, b) - B) / sb;
		norm = Math.abs(ra) + Math.abs(rb);
		if (!Number.isFinite(norm)) return null;
		if (norm < 1e-16) return p;
		const j11 = propDT(p, a) / sa,
			j12 = (propDrho(p, a) * rho) / sa;
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
		// (ln ρ to a few ulps: in a liquid P moves by (∂P/∂ln ρ)_T·Δz, ~1e−4 Pa for Δz = 1e−13)
		const tiny = Math.abs(dT) <= 1e-14 * T && Math.abs(dz) <= 4e-15;
		// (both residuals at their inputs' rounding: for (u, h) the whole of Pv can lie below 1e−11
		// of R·Tc in a liquid at a few mPa, so the norm alone would stop anywhere along the isotherm)
		const stuck =
			norm < 1e-11 &&
			Math.abs(ra * sa) <= 8 * rounding(fl, a, A, T) &&
			Math.abs(rb * sb) <=
				8 * (pv ? rounding(fl, a, A, T) + rounding(fl, b, B, T) : rounding(fl, b, B, T)) &&
			Math.abs(dT) >= 0.5 * lastDT &&
			Math.abs(dz) >= 0.5 * lastDz;
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

export function flashYY(
	fl: Fluid,
	a: EnergyProp,
	A: number,
	b: EnergyProp,
	B: number,
	hint?: RootHint
): State {
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
	if (found.length > 0 && ((a === 's' && b === 'h') || (a === 'h' && b === 's')))
		return choose(fl, found, hint, what, () => noStateInRange(fl, what));
	const p = new Point();
	const dT = (fl.Tmax - fl.Tmin) / (NT_UNIFORM - 1);
	const accepted: [number, number][] = [];
	const metastable: [number, number][] = [];
	const st = starts(fl, a, A, b, B);
	// cells holding the target first; centres of the other candidate cells only if none gave a
	// state — except for (u, h), whose dilute-vapor cells are degenerate and only reached that way
	const degenerate = (a === 'u' && b === 'h') || (a === 'h' && b === 'u');
	const contour = degenerate
		? a === 'u'
			? contourRootsUH(fl, A, B)
			: contourRootsUH(fl, B, A)
		: [];
	const bracketed = bracketStarts(fl, a, A, b, B);
	// a cell-interior start beside a bracketed one is the same cell's root: run it once
	const inside = st.inside.filter(
		([T0, z0]) =>
			!bracketed.some(([T, z]) => Math.abs(T - T0) < 0.5 * dT && Math.abs(z - z0) < 0.25)
	);
	const queue: [number, number][] = [
		...contour,
		...bracketed,
		...inside,
		...st.nearest,
		...(degenerate ? st.centres : [])
	];
	let centresQueued = degenerate;
	const centreSet = new Set(st.centres.map(([T, z]) => T * 1e3 + z));
	let runs = 0;
	while (runs < MAX_RUNS) {
		if (queue.length === 0) {
			if (centresQueued || accepted.length > 0) break;
			queue.push(...st.centres);
			centresQueued = true;
			if (queue.length === 0) break;
		}
		const [T0, z0] = queue.shift() as [number, number];
		// a start right beside an accepted state leads to the same state; anything farther may not
		// (two roots of a pair can share a grid cell). Cell centres are a fallback (or, for (u, h),
		// a supplement to the contour scan): one within a cell of an accepted state is not run.
		const near = centreSet.has(T0 * 1e3 + z0) ? [dT, 0.5] : [SAME_START * dT, SAME_START];
		if (accepted.some(([T, z]) => Math.abs(T - T0) < near[0] && Math.abs(z - z0) < near[1]))
			continue;
		runs++;
		const q = newton2(fl, a, A, b, B, T0, z0, p);
		if (!q) continue;
		if (
			q.T < fl.Tmin * (1 - 1e-9) ||
			q.T > fl.Tmax * (1 + 1e-9) ||
			q.P > fl.Pmax * (1 + 1e-9) ||
			!(q.P > 0)
		)
			continue;
		const loc = locate(fl, q);
		if (loc.phase === 'saturated-mixture' && loc.sat) {
			// a metastable root of the equation inside the dome: look again just outside it on its
			// side, once per such root
			if (
				metastable.some(
					([T, z]) => Math.abs(T - q.T) < 1e-6 * T && Math.abs(z - Math.log(q.rho)) < 1e-6
				)
			)
				continue;
			metastable.push([q.T, Math.log(q.rho)]);
			const { rhoL, rhoV } = loc.sat;
			const side = q.rho > Math.sqrt(rhoL * rhoV) ? Math.log(rhoL * 1.001) : Math.log(rhoV * 0.999);
			queue.unshift([q.T, side]);
			continue;
		}
		accepted.push([q.T, Math.log(q.rho)]);
		found.push(placedState(fl, q, loc));
	}
	return choose(
		fl,
		mergeConnected(
			fl,
			a,
			A,
			b,
			B,
			found.map((c) => toLine(fl, a, A, b, B, c, p))
		),
		hint,
		what,
		() => noStateInRange(fl, what)
	);
}

const YIDX: Record<EnergyProp, number> = { u: 1, h: 2, s: 3 };

/** Rounding of u, h or s as precision.ts reckons it (the sums behind them: 256·R·T, 1024·R). */
function rounding(fl: Fluid, k: EnergyProp, y: number, T: number): number {
	return Number.EPSILON * Math.max(Math.abs(y), k === 's' ? 1024 * fl.R : 256 * fl.R * T);
}

/** Whether (T, ρ) meets both inputs within their rounding (for (u, h): u and Pv = h − u). */
function withinRounding(
	fl: Fluid,
	a: EnergyProp,
	A: number,
	b: EnergyProp,
	B: number,
	T: number,
	rho: number,
	p: Point
): boolean {
	evalPoint(fl, T, rho, p, 1);
	const da = rounding(fl, a, A, T),
		db = rounding(fl, b, B, T);
	// a few roundings: the equation's own evaluation noise in a cold liquid is of that size
	if (!(Math.abs(propValue(p, a) - A) <= 4 * da)) return false;
	if (a === 'u' && b === 'h') return Math.abs(p.P / rho - (B - A)) <= 4 * (da + db);
	return Math.abs(propValue(p, b) - B) <= 4 * db;
}

/**
 * A compressed liquid that the pair cannot tell from the saturated liquid is answered as the
 * saturated liquid. At constant s, du = −P·dv: where P is tiny (liquids of fluids whose triple-point
 * pressure is far below a pascal, e.g. propane at 86 K) u and s — likewise u and h, h − u = Pv —
 * hold still over pascals, so the Newton run stops anywhere along a valley that reaches down to the
 * saturation line. When the saturated liquid with the same first property meets both inputs within their
 * rounding (as precision.ts reckons it), it stands for the candidate, the
 * lowest-pressure state of the valley; its stated precision says P is unresolved (precision.ts).
 * A candidate that meets the inputs within their rounding and resolves P (stated precision of P
 * below 1/10) is kept; one that does not (an unresolved P, or a run stopped short in the valley) is
 * replaced.
 */
function toLine(
	fl: Fluid,
	a: EnergyProp,
	A: number,
	b: EnergyProp,
	B: number,
	c: State,
	p: Point
): State {
	if (c.phase !== 'compressed-liquid' || c.T >= fl.Tc * (1 - CRITICAL_BAND)) return c;
	// a candidate that meets the inputs within their rounding and resolves P stays as it is
	// (stated P precision below 1/10: the valley meeting the inputs within four roundings reaches
	// up to about twice the P at which the linearized precision is 1/2, where it is 1/8)
	if (withinRounding(fl, a, A, b, B, c.T, c.rho, p) && precisionOf(fl, c, a, A, b, B).P < 0.1)
		return c;
	const ia = YIDX[a];
	const line = new SatLine();
	let T = c.T;
	for (let it = 0; it < 30; it++) {
		evalSatLine(fl, T, line);
		const f = line.yL[ia] - A,
			d = line.dL[ia];
		const step = f / d;
		if (!Number.isFinite(step)) return c;
		T = Math.min(Math.max(T - step, fl.Tmin), fl.Tc * (1 - CRITICAL_BAND));
		if (Math.abs(step) <= 1e-13 * T) break;
	}
	evalSatLine(fl, T, line);
	// along such a valley T hardly moves; the saturated liquid meeting both inputs within their
	// rounding is then a state with the pair, and the only one there (at constant s, u turns once,
	// at P = 0; at constant u, h − u = Pv and at constant s, h rise with P)
	if (Math.abs(T - c.T) > 1e-4 * c.T) return c;
	if (!withinRounding(fl, a, A, b, B, T, line.sat.rhoL, p)) return c;
	return saturatedState(fl, line.sat, 0);
}

/** Scaled residual norm of the pair at (T, ρ) (as newton2 measures it). */
function residual(
	fl: Fluid,
	a: EnergyProp,
	A: number,
	b: EnergyProp,
	B: number,
	T: number,
	rho: number,
	p: Point
): number {
	const sa = a === 's' ? fl.R : fl.R * fl.Tc;
	const sb = b === 's' ? fl.R : fl.R * fl.Tc;
	evalPoint(fl, T, rho, p, 1);
	const rb = a === 'u' && b === 'h' ? (p.P / rho - (B - A)) / sb : (propValue(p, b) - B) / sb;
	return Math.abs((propValue(p, a) - A) / sa) + Math.abs(rb);
}

/**
 * Single-phase candidates joined by a valley of the residual are one ill-determined state, not
 * several (in dilute gas (u, h) fixes T but hardly P): two candidates are merged when the residual
 * stays at round-off level at three points between them. Two-phase candidates are kept as found.
 */
function mergeConnected(
	fl: Fluid,
	a: EnergyProp,
	A: number,
	b: EnergyProp,
	B: number,
	found: State[]
): State[] {
	if (found.length < 2) return found;
	const p = new Point();
	const out: State[] = [];
	for (const s of found) {
		const twin =
			s.x === null &&
			out.some((o) => {
				if (o.x !== null) return false;
				for (const f of [0.25, 0.5, 0.75]) {
					const T = o.T + f * (s.T - o.T),
						rho = o.rho * Math.pow(s.rho / o.rho, f);
					if (!(residual(fl, a, A, b, B, T, rho, p) <= VALLEY)) return false;
				}
				return true;
			});
		if (!twin) out.push(s);
	}
	return out;
}
