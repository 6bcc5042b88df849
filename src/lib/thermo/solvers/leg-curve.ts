/**
 * The curve a process leg follows, cut at its crossings of the saturation lines into segments.
 *
 * Each process keeps one quantity fixed (the invariant: P, v, T, s, h, or ln P + n·ln v for a
 * polytropic leg). Along the whole curve a canonical direction is fixed and every segment is
 * parametrised by a quantity that is monotone on it. What differs between processes — the
 * invariant, the parameters, how a point is solved, what the process knows about the dome, its
 * work — is one strategy object per process (leg-processes.ts, with the table of parameters and
 * solves); the curve dispatches through PROCESS_CURVES and holds only what all processes share:
 * segments, crossings, the domain, the two-phase mixture and the end-finding on a segment.
 *
 * Two-phase points are mass-weighted between the saturated phases (x = (v − v')/(v'' − v') etc.).
 * Crossings are the temperatures where the invariant equals its value on a saturation line
 * (crossings.ts: bracketed between the saturation table's nodes, refined by Newton along the line).
 * The curve's domain is the formulation's range (Tmin ≤ T ≤ Tmax, P ≤ Pmax) with a pressure floor
 * of 1 Pa (or the start's pressure if lower); the ends of the outer segments are where the curve
 * leaves it.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point } from '../properties.ts';
import { saturatedState } from '../state.ts';
import type { Inputs, Process, SaturationLine, State } from '../types.ts';
import { fixStateOf } from './fix-state.ts';
import { lineRoots } from './crossings.ts';
import {
	mixture,
	paramOf,
	phases,
	singlePt,
	type Branch,
	type CPt,
	type Param
} from './curve-point.ts';
import {
	PROCESS_CURVES,
	type Invariant,
	type PointSolver,
	type ProcessCurve
} from './leg-processes.ts';
import { locate, placedState } from './locate.ts';
import {
	CRITICAL_BAND,
	TABLE_ACCURACY,
	satAtT,
	satGuess,
	type SatGuess,
	type SatPoint
} from './saturation.ts';

export { paramOf, type Branch, type CPt, type Invariant, type Param };

export interface Segment {
	dome: boolean;
	branch: Branch;
	/** parameter at the canonical start / end of the segment */
	ta: number;
	tb: number;
	/** points at the ends, once known (crossings are known from the start; outer ends are found lazily) */
	A: CPt | null;
	B: CPt | null;
	/** the saturation line at each end (null for an outer end) */
	lineA: SaturationLine | null;
	lineB: SaturationLine | null;
}

export interface CrossingPt {
	line: SaturationLine;
	p: CPt;
}

/**
 * Work limits of one curve: evaluations of its points and fallbacks to the general flash. Random
 * legs of every fluid need at most ~400 evaluations and ~5 fallbacks (the fuzz in bench/legs.bench.ts),
 * a 2000-point leg or isoline a few thousand;
 * the limits only turn a pathological case into a prompt `no-convergence` error.
 */
const MAX_EVALUATIONS = 50000;
const MAX_FALLBACKS = 400;

/** Where leavesDomain looks between the start (0) and a crossing (1). */
const LEAVE_FRACTIONS = [
	1e-4, 1e-3, 0.01, 0.03, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.97, 0.99
];

/** Pressure floor of every curve, Pa (lowered to the start's pressure if that is lower). */
export const P_FLOOR = 1;

const M = 10 * TABLE_ACCURACY;

type VolumeAt = NonNullable<ProcessCurve['domeVolume']>;

/** The public State of a curve point (phase per the engine's rules in state.ts). */
export function stateOf(fl: Fluid, c: CPt): State {
	if (c.state) return c.state;
	let st: State;
	if (c.sat && c.x !== null) st = saturatedState(fl, c.sat, c.x, c.L, c.V);
	else {
		const p = c.pt ?? evalPoint(fl, c.T, c.rho, new Point(), 2);
		// a curve that fixes P (isobaric, isenthalpic, polytropic) carries it like a given input
		if (c.givenP) p.P = c.P;
		st = placedState(fl, p, locate(fl, p), c.givenP === true);
	}
	c.state = st;
	return st;
}

/** A curve point from a public State (the leg's start). */
export function cptOfState(fl: Fluid, st: State): CPt {
	if (st.x !== null && st.phase !== 'supercritical-fluid') {
		const sat = satAtT(fl, st.T);
		const [L, V] = phases(fl, sat);
		const c = mixture(sat, st.x, L, V);
		c.state = st;
		return c;
	}
	const p = evalPoint(fl, st.T, st.rho, new Point(), 2);
	p.P = st.P;
	return {
		T: st.T,
		rho: st.rho,
		P: st.P,
		u: st.u,
		h: st.h,
		s: st.s,
		x: null,
		sat: null,
		pt: p,
		state: st
	};
}

/** The curve of one leg: its segments in canonical order, evaluators and domain. */
export class Curve implements PointSolver {
	readonly fl: Fluid;
	readonly inv: Invariant;
	readonly process: Process;
	/** the process's strategy: parameters, point solves, dome knowledge */
	readonly pc: ProcessCurve;
	readonly singleParam: Param;
	readonly domeParam: Param;
	/** +1 when the two-phase parameter rises along the canonical direction, −1 when it falls */
	readonly domeSign: 1 | -1;
	segs: Segment[] = [];
	crossings: CrossingPt[] = [];
	readonly Pfloor: number;
	private fixedSat: { sat: SatPoint; L: Point; V: Point } | null = null;
	readonly g: SatGuess = { P: 0, rhoL: 0, rhoV: 0 };
	private pL = new Point();
	private pV = new Point();
	/** evaluations done (for benchmarks and tests); at most MAX_EVALUATIONS */
	evaluations = 0;
	/** general flashes called where the curve's own Newton failed; at most MAX_FALLBACKS */
	private fallbacks = 0;
	/** while looking for the domain's edge: no slow fallback flashes (failures there are expected) */
	private quick = false;
	/**
	 * Whether two-phase points need u, h, s at once (a target in u, h or s). Without, isochoric and
	 * polytropic two-phase points carry NaN there and their State (stateOf) has the full values.
	 */
	energies = true;

	/** `Pfloor` overrides the curve's lowest pressure (isolines end at a drawable pressure). */
	constructor(fl: Fluid, inv: Invariant, start: CPt, Pfloor?: number) {
		this.fl = fl;
		this.inv = inv;
		this.process = inv.process;
		this.Pfloor = Math.min(Pfloor ?? P_FLOOR, start.P * (1 - 1e-12));
		this.pc = PROCESS_CURVES[inv.process];
		this.singleParam = this.pc.singleParam;
		this.domeParam = this.pc.domeParam;
		this.domeSign = this.pc.domeSign;
		this.build(start);
	}

	/** Key rising along the canonical direction (orders crossings). */
	key(c: CPt): number {
		return this.pc.key(c);
	}

	/** Whether a point lies in the curve's domain (g ≤ 0; see violation). */
	violation(c: CPt): number {
		const fl = this.fl;
		return Math.max(
			Math.log(c.P / fl.Pmax),
			Math.log(this.Pfloor / c.P),
			c.T / fl.Tmax - 1,
			fl.Tmin / c.T - 1
		);
	}

	// ---- evaluators ---------------------------------------------------------------------------

	/** Point at parameter t of a segment; null when no state there (solver failure or out of range). */
	at(seg: Segment, t: number, guess: CPt | null): CPt | null {
		if (++this.evaluations > MAX_EVALUATIONS) throw this.tooMuchWork();
		try {
			const c = seg.dome ? this.dome(t) : this.pc.single(this, t, guess, seg.branch);
			if (!c || !Number.isFinite(c.T) || !Number.isFinite(c.rho) || !(c.P > 0)) return null;
			if (!seg.dome && this.pc.fixesP) c.givenP = true;
			// the equation of state continues into the dome (metastable and unstable states): not a point of the leg
			if (!seg.dome && this.insideDome(c)) return null;
			return c;
		} catch (e) {
			if (e instanceof ThermoError) return null;
			throw e;
		}
	}

	/** A single-phase evaluation lying clearly inside the dome (beyond the table's accuracy). */
	private insideDome(c: CPt): boolean {
		const fl = this.fl;
		if (!(c.T < fl.Tc * (1 - 1e-6)) || c.T < fl.Tt) return false;
		satGuess(fl, c.T, this.g);
		return c.rho < this.g.rhoL * (1 - 100 * M) && c.rho > this.g.rhoV * (1 + 100 * M);
	}

	/** T at fixed ρ with f(point) = 0, Newton from the guess (df/dT given); fallback: the engine's flash. */
	tAtRho(
		rho: number,
		guess: CPt | null,
		branch: Branch,
		f: (p: Point) => [number, number],
		pair: Inputs
	): CPt | null {
		const fl = this.fl;
		let T = guess ? guess.T : fl.Tc;
		const p = new Point();
		for (let it = 0; it < 40; it++) {
			evalPoint(fl, T, rho, p, 2);
			const [r, dr] = f(p);
			if (!Number.isFinite(r) || !(dr > 0)) break;
			let dT = -r / dr;
			const cap = 0.25 * T;
			if (Math.abs(dT) > cap) dT = Math.sign(dT) * cap;
			if (Math.abs(dT) <= 1e-13 * T) return singlePt(p);
			T += dT;
			if (!(T > 0.5 * fl.Tmin && T < 2 * fl.Tmax)) break;
			if (Math.abs(dT) <= 1e-11 * T) {
				evalPoint(fl, T, rho, p, 2);
				return singlePt(p);
			}
		}
		return this.fallback({ ...pair, rho }, guess, branch);
	}

	/** The engine's general flash for the pair; where it finds several states, the one nearest the guess. */
	fallback(inputs: Inputs, guess: CPt | null, branch: Branch): CPt | null {
		if (this.quick) return null;
		if (++this.fallbacks > MAX_FALLBACKS) throw this.tooMuchWork();
		const fl = this.fl;
		let st: State;
		try {
			st = fixStateOf(
				fl,
				inputs,
				branch === 'liquid'
					? { hint: 'liquid-side' }
					: branch === 'vapor'
						? { hint: 'vapor-side' }
						: {}
			);
		} catch (e) {
			if (!(e instanceof ThermoError) || e.code !== 'ambiguous-state' || !e.candidates || !guess)
				return null;
			const best = [...e.candidates].sort(
				(a, b) => Math.abs(a.T - guess.T) - Math.abs(b.T - guess.T)
			)[0];
			const p = evalPoint(fl, best.T, best.rho, new Point(), 2);
			return singlePt(p);
		}
		if (st.x !== null && st.phase === 'saturated-mixture') return null;
		const p = evalPoint(fl, st.T, st.rho, new Point(), 2);
		p.P = st.P;
		return singlePt(p);
	}

	/** Two-phase point at parameter t; null when the invariant puts no mixture there. */
	private dome(t: number): CPt | null {
		const fl = this.fl,
			inv = this.inv,
			pc = this.pc;
		let sat: SatPoint, L: Point, V: Point, x: number;
		if (this.fixedSat) {
			({ sat, L, V } = this.fixedSat);
			x = ((pc.domeVolume as VolumeAt)(inv, t) - 1 / sat.rhoL) / (1 / sat.rhoV - 1 / sat.rhoL);
		} else {
			const at = pc.domeSaturation(fl, inv, t);
			if (!at) return null;
			sat = at;
			if (sat.rhoL === sat.rhoV) {
				const c = evalPoint(fl, fl.Tc, fl.rhoc, new Point(), 1);
				return { T: fl.Tc, rho: fl.rhoc, P: fl.Pc, u: c.u, h: c.h, s: c.s, x: 0.5, sat, pt: null };
			}
			if (pc.domeVolume) {
				const v = pc.domeVolume(inv, t);
				x = (v - 1 / sat.rhoL) / (1 / sat.rhoV - 1 / sat.rhoL);
				// x from v needs no energies; they are filled in only when someone reads them
				if (!this.energies) {
					if (!(x >= -1e-9 && x <= 1 + 1e-9) && !(sat.P > fl.Pc * (1 - 1e-4) && Number.isFinite(x)))
						return null;
					x = Math.min(1, Math.max(0, x));
					return {
						T: sat.T,
						rho: 1 / (1 / sat.rhoL + x * (1 / sat.rhoV - 1 / sat.rhoL)),
						P: sat.P,
						u: NaN,
						h: NaN,
						s: NaN,
						x,
						sat,
						pt: null
					};
				}
				[L, V] = phases(fl, sat);
			} else {
				[L, V] = phases(fl, sat);
				const e = pc.domeEnergy as 's' | 'h';
				x = ((inv[e] as number) - L[e]) / (V[e] - L[e]);
			}
		}
		// next to the critical point a crossing may be placed at the critical point itself (see lineRoots):
		// there the curve's few ppm of two-phase stretch are clamped onto the nearer line
		if (!(x >= -1e-9 && x <= 1 + 1e-9) && !(sat.P > fl.Pc * (1 - 1e-4) && Number.isFinite(x)))
			return null;
		return mixture(sat, Math.min(1, Math.max(0, x)), L, V);
	}

	/**
	 * Integrand of the leg integral on a segment at parameter t: for parameter ln v, P·v
	 * (∫P dv = ∫P·v d ln v); on a two-phase segment whose process integrates shaft work there (the
	 * isentropic one, parameter T), its −v·dPs/dT (−∫v dP).
	 */
	integrand(seg: Segment, t: number, guess: CPt | null): number {
		if (seg.dome && this.pc.domeShaftIntegrand)
			return this.pc.domeShaftIntegrand(this.fl, this.inv, t, this.pL, this.pV);
		const c = this.at(seg, t, guess);
		if (!c) throw this.unsolved();
		return c.P / c.rho;
	}

	/** The error for a curve that needs far more solves than any leg does (a pathological case): fail fast. */
	tooMuchWork(): ThermoError {
		return new ThermoError(
			'no-convergence',
			`This ${this.process} leg of ${this.fl.id} could not be followed: its points would not solve within the engine's work limit.`,
			'Please report the leg; try a slightly different start or target.'
		);
	}

	/** The error for a point that cannot be solved (near the critical point the lines cannot be resolved). */
	unsolved(): ThermoError {
		const critical = this.crossings.some((c) => c.p.sat !== null && c.p.sat.rhoL === c.p.sat.rhoV);
		return critical
			? new ThermoError(
					'no-convergence',
					`This ${this.process} leg of ${this.fl.id} passes within round-off of the critical point (${fmt(this.fl.Tc)} K, ${fmt(this.fl.Pc)} Pa), where its crossing of the saturation line cannot be resolved.`,
					'Move the start or the target slightly so that the leg passes the critical point at a distance.'
				)
			: new ThermoError(
					'no-convergence',
					`A point of this ${this.process} leg of ${this.fl.id} could not be solved.`,
					'Please report the leg; try a slightly different start or target.'
				);
	}

	// ---- construction -------------------------------------------------------------------------

	private crossingPt(sat: SatPoint, line: SaturationLine): CPt {
		const [L, V] = phases(this.fl, sat);
		return mixture(sat, line === 'saturated-liquid' ? 0 : 1, L, V);
	}

	private build(start: CPt): void {
		const fl = this.fl,
			inv = this.inv;
		const pc = this.pc;
		let crossings: CrossingPt[] = [];
		if (pc.fixedSaturation) {
			// one saturation (isobaric below Pc, isothermal below Tc): its two ends are the crossings
			const sat = pc.fixedSaturation(fl, inv);
			if (sat) {
				const [L, V] = phases(fl, sat);
				this.fixedSat = { sat, L, V };
				crossings = [
					{ line: 'saturated-liquid', p: this.crossingPt(sat, 'saturated-liquid') },
					{ line: 'saturated-vapor', p: this.crossingPt(sat, 'saturated-vapor') }
				];
			}
		} else {
			const F = (pc.lineResidual as NonNullable<ProcessCurve['lineResidual']>)(fl, inv);
			for (const side of [0, 1] as const) {
				const line: SaturationLine = side === 0 ? 'saturated-liquid' : 'saturated-vapor';
				for (const T of lineRoots(fl, side, F))
					crossings.push({
						line,
						p: this.crossingPt(satAtT(fl, T >= fl.Tc * (1 - 2 * CRITICAL_BAND) ? fl.Tc : T), line)
					});
			}
			// a start on a saturation line is a point of the curve on that line
			if (start.x === 0 || start.x === 1) {
				const line: SaturationLine = start.x === 0 ? 'saturated-liquid' : 'saturated-vapor';
				if (!crossings.some((c) => c.line === line && Math.abs(c.p.T - start.T) <= 1e-7 * start.T))
					crossings.push({ line, p: start });
			}
			crossings.sort((a, b) => this.key(a.p) - this.key(b.p));
			// a curve through the critical point meets both lines there: one crossing
			crossings = crossings.filter(
				(c, i) =>
					i === 0 ||
					!(
						c.p.sat &&
						c.p.sat.rhoL === c.p.sat.rhoV &&
						crossings[i - 1].p.sat?.rhoL === crossings[i - 1].p.sat?.rhoV
					)
			);
		}
		// regions of the m + 1 pieces between crossings
		const inDome = start.x !== null && start.x > 0 && start.x < 1;
		const flags = (cs: CrossingPt[]): { dome: boolean[]; conflict: number | null } => {
			const m = cs.length;
			const dome: boolean[] = new Array(m + 1).fill(false);
			if (this.fixedSat) dome[1] = true;
			else if (m === 0) dome[0] = inDome;
			else {
				// between two crossings: test the middle of the two-phase parameter
				for (let k = 1; k < m; k++)
					dome[k] = this.twoPhaseAt(
						0.5 * (paramOf(this.domeParam, cs[k - 1].p) + paramOf(this.domeParam, cs[k].p))
					);
				// outer pieces: the other side of the neighbouring crossing, or a probe beside it
				dome[0] = m > 1 ? !dome[1] : this.probe(cs[0].p, -1);
				dome[m] = m > 1 ? !dome[m - 1] : this.probe(cs[m - 1].p, 1);
			}
			// the start's own piece must be what the start says it is
			const onCrossing = cs.some(
				(c) =>
					Math.abs(c.p.T - start.T) <= 1e-9 * start.T &&
					Math.abs(c.p.rho - start.rho) <= 1e-9 * start.rho
			);
			if (this.fixedSat || m === 0 || start.x === 0 || start.x === 1 || onCrossing)
				return { dome, conflict: null };
			const k = cs.filter((c) => this.key(c.p) < this.key(start)).length;
			return { dome, conflict: dome[k] !== inDome ? k : null };
		};
		let { dome, conflict } = flags(crossings);
		if (conflict !== null) {
			// the curve may leave the domain (below the triple point) between the start and a crossing,
			// and meet the dome again beyond: what lies past such a gap is not part of this leg
			const k = conflict;
			const below = k > 0 && this.leavesDomain(start, crossings[k - 1].p);
			const above = k < crossings.length && this.leavesDomain(start, crossings[k].p);
			if (below || above) {
				crossings = crossings.slice(below ? k : 0, above ? k : crossings.length);
				({ dome, conflict } = flags(crossings));
			}
			if (conflict !== null) {
				dome[conflict] = inDome;
				// a probe beside a crossing near the critical point can be misled by round-off: there the
				// other side is the other phase; elsewhere its probe stands (a curve may touch a line and
				// stay on its side, e.g. water's liquid near its density maximum)
				const c = crossings[0];
				if (crossings.length === 1 && Math.abs(c.p.T / fl.Tc - 1) < 1e-3)
					dome[1 - conflict] = !inDome;
			}
		}
		this.crossings = crossings;
		const m = crossings.length;
		const segs: Segment[] = [];
		for (let k = 0; k <= m; k++) {
			const a = k > 0 ? crossings[k - 1] : null;
			const b = k < m ? crossings[k] : null;
			const isDome = dome[k];
			const param = isDome ? this.domeParam : this.singleParam;
			// a crossing at the critical point belongs to neither branch
			const atCritical = (c: CrossingPt | null) =>
				!!c && !!c.p.sat && c.p.sat.rhoL === c.p.sat.rhoV;
			const lines =
				atCritical(a) || atCritical(b)
					? ['critical']
					: [a?.line, b?.line].filter((l): l is SaturationLine => !!l);
			const branch: Branch =
				isDome || lines.length === 0
					? 'any'
					: lines.every((l) => l === 'saturated-liquid')
						? 'liquid'
						: lines.every((l) => l === 'saturated-vapor')
							? 'vapor'
							: 'any';
			const [ha, hb] = this.hardBounds(isDome);
			segs.push({
				dome: isDome,
				branch,
				ta: a ? paramOf(param, a.p) : ha,
				tb: b ? paramOf(param, b.p) : hb,
				A: a ? a.p : null,
				B: b ? b.p : null,
				lineA: a ? a.line : null,
				lineB: b ? b.line : null
			});
		}
		// a fixed-saturation curve that misses the dome (an isobar below the triple-point pressure or
		// above Pc, an isotherm above Tc): one piece, on the branch its process says
		if (this.fixedSat === null && pc.lonePieceBranch && segs.length === 1)
			segs[0].branch = pc.lonePieceBranch(fl, inv);
		this.segs = segs;
	}

	/** Whether the curve has a two-phase point at parameter t of the two-phase parametrisation. */
	private twoPhaseAt(t: number): boolean {
		try {
			const q = this.dome(t);
			return q !== null && q.x !== null && q.x > 0 && q.x < 1;
		} catch (e) {
			if (e instanceof ThermoError) return false;
			throw e;
		}
	}

	/** Two-phase just beside a crossing, on the side dir (−1 below, +1 above in canonical order). */
	private probe(c: CPt, dir: 1 | -1): boolean {
		const t = paramOf(this.domeParam, c);
		const eps = this.domeParam === 'T' ? 1e-6 * t : 1e-6;
		return this.twoPhaseAt(t + dir * this.domeSign * eps);
	}

	/**
	 * Whether the single-phase curve from the start toward a crossing leaves the domain or its branch
	 * on the way (e.g. a polytropic vapor that cools below the triple point before it meets the
	 * dome): points of the single-phase parametrisation (LEAVE_FRACTIONS), quick solves only.
	 */
	private leavesDomain(start: CPt, toward: CPt): boolean {
		const t0 = paramOf(this.singleParam, start),
			t1 = paramOf(this.singleParam, toward);
		const branch: Branch = start.rho > this.fl.rhoc ? 'liquid' : 'vapor';
		this.quick = true;
		try {
			let prev: CPt = start;
			// closer together near the start, where a branch may end within a small step
			for (const f of LEAVE_FRACTIONS) {
				const c = this.pc.single(this, t0 + (t1 - t0) * f, prev, branch);
				if (!c || this.violation(c) > 1e-12) return true;
				prev = c;
			}
			return false;
		} catch (e) {
			if (e instanceof ThermoError) return false;
			throw e;
		} finally {
			this.quick = false;
		}
	}

	/** Hard parameter bounds of an outer piece (beyond them lies no state of the domain). */
	private hardBounds(dome: boolean): [number, number] {
		if (!dome) return this.pc.singleBounds(this);
		// two-phase pieces end at the triple point (or, failing that, just below the critical point)
		const [lo, hi] = this.pc.domeBounds(this.fl, this.inv, this.fixedSat?.sat ?? null);
		const [a, b] = lo <= hi ? [lo, hi] : [hi, lo];
		return this.domeSign > 0 ? [a, b] : [b, a];
	}

	/**
	 * The end of segment k on `side` ('A' canonical start, 'B' end): a crossing, or where the curve
	 * leaves the domain (found by regula falsi on the violation from a known point `ok` inside).
	 * Returns null if no state of the piece can be found at all.
	 */
	end(
		k: number,
		side: 'A' | 'B',
		ok: CPt,
		tOk: number,
		tBad?: number,
		bad?: CPt | null
	): { t: number; p: CPt } | null {
		const seg = this.segs[k];
		const known = side === 'A' ? seg.A : seg.B;
		if (known) return { t: side === 'A' ? seg.ta : seg.tb, p: known };
		const tHard = tBad ?? (side === 'A' ? seg.ta : seg.tb);
		const hard = tBad !== undefined ? (bad ?? null) : this.at(seg, tHard, ok);
		let res: { t: number; p: CPt };
		if (hard && this.violation(hard) <= 1e-12) res = { t: tHard, p: hard };
		else {
			this.quick = true;
			// violation g: ≤ 0 inside; a failed solve counts as outside
			let a = tOk,
				b = tHard;
			let ga = Math.min(0, this.violation(ok));
			let gb = hard ? this.violation(hard) : NaN;
			let pa = ok;
			let lastSide = 0;
			for (let it = 0; it < 100; it++) {
				let t: number;
				if (Number.isFinite(gb) && gb > 0 && ga < 0) {
					t = a + (ga * (a - b)) / (gb - ga);
					if (!(t > Math.min(a, b) && t < Math.max(a, b))) t = 0.5 * (a + b);
				} else t = 0.5 * (a + b);
				const c = this.at(seg, t, pa);
				const g = c ? this.violation(c) : NaN;
				if (c && g <= 0) {
					a = t;
					ga = g;
					pa = c;
					if (lastSide === -1 && Number.isFinite(gb)) gb *= 0.5;
					lastSide = -1;
				} else {
					b = t;
					gb = g;
					if (lastSide === 1) ga *= 0.5;
					lastSide = 1;
				}
				if (Math.abs(b - a) <= 1e-13 * Math.max(1, Math.abs(a)) || (ga > -1e-13 && c && g <= 0))
					break;
			}
			this.quick = false;
			res = { t: a, p: pa };
		}
		if (side === 'A') {
			seg.ta = res.t;
			seg.A = res.p;
		} else {
			seg.tb = res.t;
			seg.B = res.p;
		}
		return res;
	}

	/** Where the start lies: segment index and parameter, or the crossing it sits on. */
	locateStart(start: CPt): { seg: number; t: number; crossing: number | null } {
		const cs = this.crossings;
		const same = cs.findIndex(
			(c) =>
				Math.abs(c.p.T - start.T) <= 1e-9 * start.T &&
				Math.abs(c.p.rho - start.rho) <= 1e-9 * start.rho
		);
		if (same >= 0) return { seg: same + 1, t: this.segs[same + 1].ta, crossing: same };
		if (start.x === 0 || start.x === 1) {
			const line: SaturationLine = start.x === 0 ? 'saturated-liquid' : 'saturated-vapor';
			const i = cs.findIndex(
				(c) =>
					c.line === line &&
					Math.abs(c.p.T - start.T) <= 1e-7 * start.T &&
					Math.abs(c.p.P - start.P) <= 1e-6 * start.P
			);
			if (i >= 0) return { seg: i + 1, t: this.segs[i + 1].ta, crossing: i };
		}
		const key = this.key(start);
		let k = cs.filter((c) => this.key(c.p) < key).length;
		const inDome = start.x !== null && start.x > 0 && start.x < 1;
		if (this.segs[k].dome !== inDome) {
			// next to a crossing within round-off: take the neighbour that matches
			if (
				k > 0 &&
				this.segs[k - 1].dome === inDome &&
				Math.abs(this.key(cs[k - 1].p) - key) <= 1e-6 * Math.max(1, Math.abs(key))
			)
				k -= 1;
			else if (
				k + 1 < this.segs.length &&
				this.segs[k + 1].dome === inDome &&
				k < cs.length &&
				Math.abs(this.key(cs[k].p) - key) <= 1e-6 * Math.max(1, Math.abs(key))
			)
				k += 1;
			else
				throw new ThermoError(
					'no-convergence',
					`The start of this ${this.process} leg could not be placed on its path (near ${fmt(start.T)} K, ${fmt(start.P)} Pa).`,
					'Please report the leg; try a start a little further from the saturation lines.'
				);
		}
		const seg = this.segs[k];
		return {
			seg: k,
			t: paramOf(seg.dome ? this.domeParam : this.singleParam, start),
			crossing: null
		};
	}
}
