/**
 * Vapor–liquid saturation from the equation of state: equal pressure and equal Gibbs energy in the
 * two phases (Maxwell criterion). At given T the two densities are found by Newton's method in the
 * form of Akasaka (2008), J. Therm. Sci. Technol. 3, 442–451:
 *   J(δ) = δ(1 + δαʳ_δ),  K(δ) = δαʳ_δ + αʳ + ln δ,   J(δ') = J(δ''),  K(δ') = K(δ'').
 * At given P, a three-unknown Newton in (τ, δ', δ'') solves P(τ,δ') = P, P(τ,δ'') = P, K(δ') = K(δ'').
 * Starting guesses come from a per-fluid saturation table built once from the ancillary equations
 * (continuation toward the critical point), which makes later solves converge in one or two steps.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point } from '../properties.ts';

/** A solved saturation state: T K, P Pa, saturated liquid and vapor densities kg/m³. */
export interface SatPoint {
	T: number;
	P: number;
	rhoL: number;
	rhoV: number;
}

/** Within this distance of Tc (K, relative to Tc) the two phases are taken as the critical point. */
export const CRITICAL_BAND = 1e-9;

interface AkasakaOut {
	dL: number;
	dV: number;
	P: number;
	/** the saturated liquid's (∂P/∂ρ)_T/(RT) and dK/dP of its bulk modulus K = ρ(∂P/∂ρ)_T (at the last point evaluated) */
	kL: number;
	k1L: number;
}

/** Newton–Akasaka at fixed τ; returns false if it fails (caller tries other guesses). */
function akasaka(fl: Fluid, T: number, dL0: number, dV0: number, out: AkasakaOut): boolean {
	const tau = fl.Tr / T;
	let dL = dL0,
		dV = dV0;
	let prevNorm = Infinity;
	for (let it = 0; it < 60; it++) {
		let r = fl.residualAt(dL, tau, 3);
		const JL = dL * (1 + r.d1);
		const KL = r.d1 + r.a + Math.log(dL);
		const JdL = 1 + 2 * r.d1 + r.d2;
		const KdL = JdL / dL;
		// second derivatives in δ: J″ = (2δαʳ_δ + 4δ²αʳ_δδ + δ³αʳ_δδδ)/δ, K″ = (3δ²αʳ_δδ + δ³αʳ_δδδ − 1)/δ²
		const JddL = (2 * r.d1 + 4 * r.d2 + r.d3) / dL;
		// dK/dP = 1 + ρ(∂²P/∂ρ²)_T/(∂P/∂ρ)_T = 1 + δJ″/J′
		const k1L = 1 + (dL * JddL) / JdL;
		const KddL = (3 * r.d2 + r.d3 - 1) / (dL * dL);
		r = fl.residualAt(dV, tau, 3);
		const d1V = r.d1;
		const JV = dV * (1 + d1V);
		const KV = d1V + r.a + Math.log(dV);
		const JdV = 1 + 2 * d1V + r.d2;
		const KdV = JdV / dV;
		const JddV = (2 * d1V + 4 * r.d2 + r.d3) / dV;
		const KddV = (3 * r.d2 + r.d3 - 1) / (dV * dV);
		const FJ = JV - JL;
		const FK = KV - KL;
		// J' carries the cancellation of 1 + δαʳ_δ in the liquid: judge it on the liquid's scale δ'
		const norm = Math.abs(FJ) / dL + Math.abs(FK);
		if (!Number.isFinite(norm)) return false;
		// stop at round-off: residuals tiny, or no longer shrinking once small
		if (norm < 1e-15 || (norm < 1e-11 && norm > 0.25 * prevNorm)) {
			if (dL - dV < 1e-9 * dL) return false; // the trivial solution
			out.dL = dL;
			out.dV = dV;
			out.kL = JdL;
			out.k1L = k1L;
			// the vapor side gives P without cancellation at low T
			out.P = dV * fl.rhor * fl.R * T * (1 + d1V);
			return out.P > 0;
		}
		const lastNorm = prevNorm;
		prevNorm = norm;
		const det = JdV * KdL - JdL * KdV;
		if (!Number.isFinite(det) || det === 0) return false;
		let stepL = (FK * JdV - FJ * KdV) / det;
		let stepV = (FK * JdL - FJ * KdL) / det;
		// the residuals after this full step are its Taylor remainder, ½(F″_V·step_V² − F″_L·step_L²)
		// to third order in the step; where the step is small (a start from the table: below a
		// millionth of each density, so the third-order terms are some 1e−6 of the remainder) and that
		// remainder lies below the 1e−15 tolerance (the residuals' round-off floor is higher, about
		// 1e−14), the step is taken without evaluating once more. Also when quadratic convergence is in view (residuals below 1e−9 and a
		// thousandth of the last ones: after the step about norm³/prev²). P from J(δ'') carried along
		// the step (its error is of the order of the step squared, far below round-off)
		const remainder =
			(0.5 * Math.abs(JddV * stepV * stepV - JddL * stepL * stepL)) / dL +
			0.5 * Math.abs(KddV * stepV * stepV - KddL * stepL * stepL);
		if (
			((Math.abs(stepL) < 1e-6 * dL && Math.abs(stepV) < 1e-6 * dV && remainder < 1e-15) ||
				(norm < 1e-9 &&
					lastNorm < Infinity &&
					norm <= 1e-3 * lastNorm &&
					norm * (norm / lastNorm) ** 2 < 1e-17)) &&
			dL + stepL > dV + stepV &&
			dV + stepV > 0
		) {
			const nL = dL + stepL,
				nV = dV + stepV;
			if (nL - nV < 1e-9 * nL) return false; // the trivial solution
			out.dL = nL;
			out.kL = JdL;
			out.k1L = k1L;
			out.dV = nV;
			out.P = fl.rhor * fl.R * T * (JV + JdV * stepV);
			return out.P > 0;
		}
		// keep both densities positive and ordered
		let g = 1;
		for (let k = 0; k < 40; k++) {
			const nL = dL + g * stepL,
				nV = dV + g * stepV;
			if (nL > 0 && nV > 0 && nL > nV) break;
			g *= 0.5;
		}
		stepL *= g;
		stepV *= g;
		dL += stepL;
		dV += stepV;
		if (!(dL > dV && dV > 0)) return false;
	}
	return false;
}

/**
 * Saturation table in two overlapping segments, each uniform in its own abscissa:
 * low: z = 1/T from the triple point to 0.95·Tc (ln P and ln ρ'' are nearly linear in 1/T);
 * high: z = ξ = (1 − T/Tc)^(1/3) from 0.85·Tc to the critical point (densities ≈ linear in ξ).
 * Below 0.9·Tc the low segment is used, above it the high one. Stored: ln P, ρ', ln ρ'', and the
 * saturated liquid's (∂P/∂ρ)_T/(RT) and dK/dP (liquidStart).
 */
interface SatSegment {
	z0: number;
	dz: number;
	lnP: Float64Array;
	rhoL: Float64Array;
	lnRhoV: Float64Array;
	/** the saturated liquid's (∂P/∂ρ)_T/(RT) and dK/dP (AkasakaOut): a start for compressed liquid */
	kL: Float64Array;
	k1L: Float64Array;
}
/** Saturation nodes in rising T (triple point to just below Tc), with both phases' v, u, h, s. */
export interface DomeNodes {
	n: number;
	T: Float64Array;
	P: Float64Array;
	rhoL: Float64Array;
	rhoV: Float64Array;
	/** [v, u, h, s] of the liquid and vapor, each a Float64Array over the nodes */
	liq: Float64Array[];
	vap: Float64Array[];
}
interface SatTable {
	split: number;
	low: SatSegment;
	high: SatSegment;
	nodes: DomeNodes;
}

const SEGMENT_NODES = 100;
/**
 * The low segment has LOW_REFINE times the nodes (ρ′ and ρ″ bend toward the critical point well
 * below 0.9·Tc: with SEGMENT_NODES alone water's table was good to only 1e−6 at 0.85·Tc, to 1e−9
 * with four times as many, close enough for the saturation solve's first step to be its last).
 * The dome's nodes (DomeNodes) keep every LOW_REFINE-th of them, the spacing they always had.
 */
const LOW_REFINE = 4;
/** and the high segment twice as many (1e−8 → 1e−9 near the critical point), likewise */
const HIGH_REFINE = 2;

function xiOf(fl: Fluid, T: number): number {
	const th = 1 - T / fl.Tc;
	return th > 0 ? Math.cbrt(th) : 0;
}

function segment(
	fl: Fluid,
	z0: number,
	z1: number,
	Tof: (z: number) => number,
	endsAtCritical: boolean,
	n = SEGMENT_NODES
): SatSegment {
	const seg: SatSegment = {
		z0,
		dz: (z1 - z0) / (n - 1),
		lnP: new Float64Array(n),
		rhoL: new Float64Array(n),
		lnRhoV: new Float64Array(n),
		kL: new Float64Array(n),
		k1L: new Float64Array(n)
	};
	const out: AkasakaOut = { dL: 0, dV: 0, P: 0, kL: 0, k1L: 0 };
	for (let i = 0; i < n; i++) {
		if (endsAtCritical && i === n - 1) {
			seg.lnP[i] = Math.log(fl.Pc);
			seg.rhoL[i] = fl.rhoc;
			// (∂P/∂ρ)_T vanishes at the critical point; dK/dP held at its last value
			seg.kL[i] = 0;
			seg.k1L[i] = seg.k1L[i - 1];
			seg.lnRhoV[i] = Math.log(fl.rhoc);
			break;
		}
		const T = Tof(z0 + i * seg.dz);
		// toward the critical point continuation from the previous nodes comes first: the ancillaries
		// may end at a published Tc below the equation's own (ammonia) and lead Newton to the trivial
		// solution; a node must narrow the dome, not close it
		const plausible = (): boolean => {
			if (!endsAtCritical || i < 2) return true;
			const gap = out.dL - out.dV,
				prev = (seg.rhoL[i - 1] - Math.exp(seg.lnRhoV[i - 1])) / fl.rhor;
			const zr = (z0 + i * seg.dz) / (z0 + (i - 1) * seg.dz);
			return gap < prev && gap > 0.2 * prev * zr * zr;
		};
		const tryAt = (rL: number, rV: number) =>
			akasaka(fl, T, rL / fl.rhor, rV / fl.rhor, out) && plausible();
		// toward Tc: the mean density linear in the abscissa, the gap by the power of it seen over the
		// last two nodes (1 far out, 1.5 at the critical point: an analytic equation's ρ' − ρ'' ∝ θ^½)
		const extrapolate = () => {
			if (!endsAtCritical)
				return tryAt(
					2 * seg.rhoL[i - 1] - seg.rhoL[i - 2],
					Math.exp(2 * seg.lnRhoV[i - 1] - seg.lnRhoV[i - 2])
				);
			const mean = (k: number) => 0.5 * (seg.rhoL[k] + Math.exp(seg.lnRhoV[k]));
			const gap = (k: number) => seg.rhoL[k] - Math.exp(seg.lnRhoV[k]);
			const z = (k: number) => z0 + k * seg.dz;
			const e = Math.min(
				2,
				Math.max(0.5, Math.log(gap(i - 1) / gap(i - 2)) / Math.log(z(i - 1) / z(i - 2)))
			);
			const m = 2 * mean(i - 1) - mean(i - 2),
				h = 0.5 * gap(i - 1) * Math.pow(z(i) / z(i - 1), e);
			return tryAt(m + h, m - h);
		};
		const ancillary = () => tryAt(fl.ancRhoL.value(T), fl.ancRhoV.value(T));
		const ok =
			endsAtCritical && i >= 2
				? extrapolate() || ancillary()
				: ancillary() || (i >= 2 && extrapolate());
		if (!ok)
			throw new ThermoError(
				'no-convergence',
				`Saturation of ${fl.id} did not converge at T = ${fmt(T)} K while building the saturation table.`,
				'This is a defect in the fluid data or the engine; please report it.'
			);
		seg.lnP[i] = Math.log(out.P);
		seg.rhoL[i] = out.dL * fl.rhor;
		seg.kL[i] = out.kL;
		seg.k1L[i] = out.k1L;
		seg.lnRhoV[i] = Math.log(out.dV * fl.rhor);
	}
	return seg;
}

function buildTable(fl: Fluid): SatTable {
	const Tc = fl.Tc;
	const split = 0.9 * Tc;
	// the low segment keeps water's node spacing in Tc/T: fluids whose triple point lies far below Tc
	// (propane: Tt = 0.23·Tc) get more nodes, or the table misses TABLE_ACCURACY below 0.9·Tc
	const span = (Tc / fl.Tt - 1 / 0.95) / (647.096 / 273.16 - 1 / 0.95);
	const low = segment(
		fl,
		1 / fl.Tt,
		1 / (0.95 * Tc),
		(z) => 1 / z,
		false,
		LOW_REFINE * Math.max(SEGMENT_NODES, Math.ceil(SEGMENT_NODES * span)) - (LOW_REFINE - 1)
	);
	const high = segment(
		fl,
		Math.cbrt(0.15),
		0,
		(xi) => Tc * (1 - xi * xi * xi),
		true,
		HIGH_REFINE * SEGMENT_NODES - (HIGH_REFINE - 1)
	);
	const list: [number, number, number, number][] = [];
	for (let i = 0; i < low.lnP.length; i += LOW_REFINE) {
		const T = 1 / (low.z0 + i * low.dz);
		if (T < split) list.push([T, Math.exp(low.lnP[i]), low.rhoL[i], Math.exp(low.lnRhoV[i])]);
	}
	for (let i = 0; i < high.lnP.length - 1; i += HIGH_REFINE) {
		const xi = high.z0 + i * high.dz;
		const T = Tc * (1 - xi * xi * xi);
		if (T >= split) list.push([T, Math.exp(high.lnP[i]), high.rhoL[i], Math.exp(high.lnRhoV[i])]);
	}
	const n = list.length;
	const nodes: DomeNodes = {
		n,
		T: new Float64Array(n),
		P: new Float64Array(n),
		rhoL: new Float64Array(n),
		rhoV: new Float64Array(n),
		liq: [0, 1, 2, 3].map(() => new Float64Array(n)),
		vap: [0, 1, 2, 3].map(() => new Float64Array(n))
	};
	const p = new Point();
	list.forEach(([T, P, rL, rV], i) => {
		nodes.T[i] = T;
		nodes.P[i] = P;
		nodes.rhoL[i] = rL;
		nodes.rhoV[i] = rV;
		evalPoint(fl, T, rL, p, 1);
		nodes.liq[0][i] = 1 / rL;
		nodes.liq[1][i] = p.u;
		nodes.liq[2][i] = p.h;
		nodes.liq[3][i] = p.s;
		evalPoint(fl, T, rV, p, 1);
		nodes.vap[0][i] = 1 / rV;
		nodes.vap[1][i] = p.u;
		nodes.vap[2][i] = p.h;
		nodes.vap[3][i] = p.s;
	});
	return { split, low, high, nodes };
}

/** The fluid's saturation table (built on first use, a few milliseconds). */
export function satTable(fl: Fluid): SatTable {
	let t = fl.cache.satTable as SatTable | undefined;
	if (!t) {
		t = buildTable(fl);
		fl.cache.satTable = t;
	}
	return t;
}

/** 4-point Lagrange interpolation of arr at fractional index u (nodes uniform). */
function lagrange(arr: Float64Array, u: number): number {
	const n = arr.length;
	let i = Math.floor(u) - 1;
	if (i < 0) i = 0;
	if (i > n - 4) i = n - 4;
	const s = u - i;
	const y0 = arr[i],
		y1 = arr[i + 1],
		y2 = arr[i + 2],
		y3 = arr[i + 3];
	return (
		(-y0 * (s - 1) * (s - 2) * (s - 3)) / 6 +
		(y1 * s * (s - 2) * (s - 3)) / 2 -
		(y2 * s * (s - 1) * (s - 3)) / 2 +
		(y3 * s * (s - 1) * (s - 2)) / 6
	);
}

/** Table-interpolated saturation at T (guesses and fast phase checks only; see TABLE_ACCURACY). */
export interface SatGuess {
	P: number;
	rhoL: number;
	rhoV: number;
}

/**
 * Relative accuracy promised for satGuess (P and both densities) from the triple point to
 * 0.999·Tc; checked for every registered fluid by the engine tests. Fast phase checks use margins
 * of 10× this.
 */
export const TABLE_ACCURACY = 1e-5;

export function satGuess(fl: Fluid, T: number, out: SatGuess): SatGuess {
	const tab = satTable(fl);
	// the segment and fractional node index for T (called for every state placed against the dome)
	const low = T < tab.split;
	const seg = low ? tab.low : tab.high;
	const u = low ? (1 / T - seg.z0) / seg.dz : (xiOf(fl, T) - seg.z0) / seg.dz;
	out.P = Math.exp(lagrange(seg.lnP, u));
	out.rhoL = lagrange(seg.rhoL, u);
	out.rhoV = Math.exp(lagrange(seg.lnRhoV, u));
	return out;
}

/**
 * A start for the density of compressed liquid at (T, P > Psat) from the saturation table: the
 * bulk modulus K = ρ(∂P/∂ρ)_T taken linear in P from the saturated liquid's (the Tait form),
 * integrated: ln(ρ/ρ') = ln(1 + K₁(P − Psat)/K₀)/K₁. `g` is satGuess at T.
 */
export function liquidStart(fl: Fluid, T: number, P: number, g: SatGuess): number {
	const tab = satTable(fl);
	const low = T < tab.split;
	const seg = low ? tab.low : tab.high;
	const u = low ? (1 / T - seg.z0) / seg.dz : (xiOf(fl, T) - seg.z0) / seg.dz;
	const K0 = g.rhoL * fl.R * T * lagrange(seg.kL, u);
	const K1 = lagrange(seg.k1L, u);
	const x = (P - g.P) / K0;
	if (!(K0 > 0 && x > 0)) return g.rhoL * (1 + 1e-12);
	const lnr = K1 > 1e-3 && Number.isFinite(K1) ? Math.log1p(K1 * x) / K1 : x;
	return g.rhoL * Math.exp(lnr);
}

/**
 * Saturation at temperature T (K), Tt ≤ T ≤ Tc. Returns T, P (Pa) and the two densities (kg/m³).
 * `guess` (densities near T, e.g. from a neighbouring solve) replaces the table's start.
 * Within CRITICAL_BAND·Tc of Tc it returns the critical point. Throws `no-convergence` on failure.
 */
export function satAtT(fl: Fluid, T: number, guess?: { rhoL: number; rhoV: number }): SatPoint {
	if (T >= fl.Tc * (1 - CRITICAL_BAND)) return { T, P: fl.Pc, rhoL: fl.rhoc, rhoV: fl.rhoc };
	const out: AkasakaOut = { dL: 0, dV: 0, P: 0, kL: 0, k1L: 0 };
	// near Tc Newton can also settle on the trivial solution ρ' ≈ ρ'': a solution must keep at least
	// a quarter of the gap of its start
	const from = (rL: number, rV: number) =>
		akasaka(fl, T, rL / fl.rhor, rV / fl.rhor, out) &&
		out.dL - out.dV > (0.25 * (rL - rV)) / fl.rhor;
	let ok = false;
	if (guess) ok = from(guess.rhoL, guess.rhoV);
	const g = ok ? null : satGuess(fl, T, { P: 0, rhoL: 0, rhoV: 0 });
	if (g) ok = from(g.rhoL, g.rhoV);
	if (!ok) ok = from(fl.ancRhoL.value(T), fl.ancRhoV.value(T));
	if (!ok)
		throw new ThermoError(
			'no-convergence',
			`Saturation of ${fl.id} did not converge at T = ${fmt(T)} K.`,
			'Try a temperature a little further from the critical point, or report the inputs.'
		);
	return { T, P: out.P, rhoL: out.dL * fl.rhor, rhoV: out.dV * fl.rhor };
}

/** Table-based guess of the saturation temperature at P (triple-point pressure ≤ P ≤ Pc). */
function guessTsat(fl: Fluid, tab: SatTable, P: number): number {
	const lnP = Math.log(P);
	const useLow = lnP < Math.log(satGuess(fl, tab.split, { P: 0, rhoL: 0, rhoV: 0 }).P);
	const seg = useLow ? tab.low : tab.high;
	const lp = seg.lnP;
	// both segments store ln P rising with the node index
	let lo = 0,
		hi = lp.length - 1;
	while (hi - lo > 1) {
		const mid = (lo + hi) >> 1;
		if (lp[mid] <= lnP) lo = mid;
		else hi = mid;
	}
	// Illinois regula falsi on the interpolant: the table itself is good to TABLE_ACCURACY, so a
	// guess to 1e−10 in ln P is all Newton needs
	let a = lo,
		b = hi;
	let fa = lagrange(lp, a) - lnP;
	let fb = lagrange(lp, b) - lnP;
	let u = a,
		side = 0;
	for (let k = 0; k < 60; k++) {
		u = fb === fa ? 0.5 * (a + b) : a - (fa * (b - a)) / (fb - fa);
		if (!(u >= Math.min(a, b) && u <= Math.max(a, b))) u = 0.5 * (a + b);
		const fu = lagrange(lp, u) - lnP;
		if (Math.abs(fu) < 1e-10 || Math.abs(b - a) < 1e-12) break;
		if (fu < 0 === fa < 0) {
			a = u;
			fa = fu;
			if (side === -1) fb *= 0.5;
			side = -1;
		} else {
			b = u;
			fb = fu;
			if (side === 1) fa *= 0.5;
			side = 1;
		}
	}
	const z = seg.z0 + u * seg.dz;
	return useLow ? 1 / z : fl.Tc * (1 - z * z * z);
}

/**
 * Saturation at pressure P (Pa), triple-point pressure ≤ P ≤ Pc: Newton in (τ, δ', δ'') with a
 * table-interpolated start; falls back to an outer Newton/bisection on T over satAtT.
 */
export function satAtP(fl: Fluid, P: number): SatPoint {
	if (P >= fl.Pc * (1 - 1e-12)) return { T: fl.Tc, P: fl.Pc, rhoL: fl.rhoc, rhoV: fl.rhoc };
	const tab = satTable(fl);
	const T0 = guessTsat(fl, tab, P);
	const g0 = satGuess(fl, T0, { P: 0, rhoL: 0, rhoV: 0 });
	// T carried beside τ = Tr/T, computed as evalPoint computes it, so that the states at the answer
	// are evaluated at the very τ the last iteration was
	let T = T0;
	let tau = fl.Tr / T;
	let dL = g0.rhoL / fl.rhor;
	let dV = g0.rhoV / fl.rhor;
	const c = fl.rhor * fl.R * fl.Tr;
	let ok = false;
	let lastR = Infinity;
	for (let it = 0; it < 30; it++) {
		let r = fl.residualAt(dL, tau, 2);
		const PL = (c * dL * (1 + r.d1)) / tau;
		const a11 = (c * dL * (r.dt - 1 - r.d1)) / (tau * tau) / P;
		const a12 = (c * (1 + 2 * r.d1 + r.d2)) / tau / P;
		const KL = r.d1 + r.a + Math.log(dL);
		const KtL = r.t1 + r.dt;
		const KdL = (1 + 2 * r.d1 + r.d2) / dL;
		r = fl.residualAt(dV, tau, 2);
		const PV = (c * dV * (1 + r.d1)) / tau;
		const a21 = (c * dV * (r.dt - 1 - r.d1)) / (tau * tau) / P;
		const a23 = (c * (1 + 2 * r.d1 + r.d2)) / tau / P;
		const KV = r.d1 + r.a + Math.log(dV);
		const KtV = r.t1 + r.dt;
		const KdV = (1 + 2 * r.d1 + r.d2) / dV;
		const r1 = PL / P - 1,
			r2 = PV / P - 1,
			r3 = KL - KV;
		if (!(a12 > 0 && a23 > 0)) break;
		const a31 = (KtL - KtV) / tau;
		const den = a31 - (KdL * a11) / a12 + (KdV * a21) / a23;
		const dTau = (-r3 + (KdL * r1) / a12 - (KdV * r2) / a23) / den;
		const ddL = (-r1 - a11 * dTau) / a12;
		const ddV = (-r2 - a21 * dTau) / a23;
		if (!Number.isFinite(dTau + ddL + ddV)) break;
		// a step below round-off (the residuals then at their floor: a liquid's P carries some 1e−10
		// of cancellation at a few MPa): this point, where both phases were just evaluated, is the
		// answer to 1e−13, and their states there cost nothing (Fluid.residualAt). Likewise residuals
		// at round-off that no longer shrink: beside the critical point the steps stay some 1e−12 of
		// the densities however often they are taken (the system is that ill-conditioned there; water
		// at 21.8 MPa went round all 30 iterations)
		const rmax = Math.max(Math.abs(r1), Math.abs(r2), Math.abs(r3));
		if (
			(Math.abs(dTau) < 1e-14 * tau &&
				Math.abs(ddL) < 1e-13 * dL &&
				Math.abs(ddV) < 1e-13 * dV &&
				Math.abs(r1) < 1e-9 &&
				Math.abs(r2) < 1e-9) ||
			(rmax < 1e-12 && rmax > 0.25 * lastR)
		) {
			ok = dL - dV > 1e-9 * dL;
			break;
		}
		lastR = rmax;
		let g = 1;
		while (g > 1e-6 && !(dL + g * ddL > dV + g * ddV && dV + g * ddV > 0 && tau + g * dTau > 0))
			g *= 0.5;
		T = fl.Tr / (tau + g * dTau);
		tau = fl.Tr / T;
		dL += g * ddL;
		dV += g * ddV;
	}
	if (ok) return { T, P, rhoL: dL * fl.rhor, rhoV: dV * fl.rhor };
	return satAtPByT(fl, P, T0);
}

/** Robust fallback: solve ln Psat(T) = ln P by safeguarded secant on T within [Tt, Tc]. */
function satAtPByT(fl: Fluid, P: number, T0: number): SatPoint {
	let lo = fl.Tt,
		hi = fl.Tc * (1 - CRITICAL_BAND);
	const lnP = Math.log(P);
	let T = Math.min(Math.max(T0, lo), hi);
	let best: SatPoint | null = null;
	for (let it = 0; it < 100; it++) {
		const s = satAtT(fl, T);
		const f = Math.log(s.P) - lnP;
		best = s;
		if (Math.abs(f) < 1e-13) break;
		if (f < 0) lo = T;
		else hi = T;
		// Clapeyron-like slope: d lnP/dT ≈ lnP/T·(…) — use secant with bracket
		const slopeT = (Math.log(satAtT(fl, T * (1 - 1e-7)).P) - Math.log(s.P)) / (-T * 1e-7);
		let Tn = T - f / slopeT;
		if (!(Tn > lo && Tn < hi)) Tn = 0.5 * (lo + hi);
		if (Math.abs(Tn - T) < 1e-12 * T) {
			T = Tn;
			best = satAtT(fl, T);
			break;
		}
		T = Tn;
	}
	if (!best || Math.abs(Math.log(best.P) - lnP) > 1e-9)
		throw new ThermoError(
			'no-convergence',
			`Saturation of ${fl.id} did not converge at P = ${fmt(P)} Pa.`,
			'Try a pressure a little further from the critical pressure, or report the inputs.'
		);
	return { T: best.T, P, rhoL: best.rhoL, rhoV: best.rhoV };
}

/** The equation's vapor pressure at the triple-point temperature, Pa. */
export function triplePressure(fl: Fluid): number {
	return Math.exp(satTable(fl).low.lnP[0]);
}

/** The saturation table's nodes (rising T, triple point to just below Tc). */
export function domeNodes(fl: Fluid): DomeNodes {
	return satTable(fl).nodes;
}
