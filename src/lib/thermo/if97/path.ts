/**
 * A water path by IAPWS-IF97: the IAPWS-95 path (computePath) re-fixed state by state.
 *
 * S1 is fixed by IF97 from the spec's start pair. Each leg's end is fixed by IF97 from the pair the
 * leg fixes it by: the leg's invariant taken from the IF97 start of the leg (isobaric P, isochoric v,
 * isothermal T, isentropic s, isenthalpic h; polytropic P·vⁿ = P₁v₁ⁿ) and the leg's target. Newton's
 * method starts from the IAPWS-95 state (fix.ts). Each leg's q and w then follow from its IF97 end
 * states by identities exact for the process, the same as the engine's (solvers/legs.ts):
 *
 * | process     | w = ∫P dv                           | q         | wShaft = −∫v dP | qFlow          |
 * | ----------- | ----------------------------------- | --------- | --------------- | -------------- |
 * | isobaric    | P·Δv                                | Δu + w    | 0               | Δh             |
 * | isochoric   | 0                                   | Δu        | −v·ΔP           | Δh + wShaft    |
 * | isothermal  | T·Δs − Δu                           | T·Δs      | w − Δ(Pv)       | T·Δs           |
 * | isentropic  | −Δu                                 | 0         | −Δh             | 0              |
 * | isenthalpic | 0 (throttling: irreversible)        | 0         | 0               | 0              |
 * | polytropic  | (P₂v₂ − P₁v₁)/(1 − n); n = 1: P₁v₁ ln(v₂/v₁) | Δu + w | w − Δ(Pv) (n = 0: 0) | Δh + wShaft |
 *
 * Each leg's crossings of the saturation lines are IF97's own: where the leg's invariant meets IF97's
 * saturated liquid or vapor (Eq. 30 with region 1, 2 or 3 on each side), found from the IAPWS-95
 * crossing (if97Crossing); one whose IF97 line lies beyond the leg's IF97 end is dropped, and one the
 * IF97 leg meets where the IAPWS-95 leg does not is found between the two IF97 points it separates and
 * put among the points (if97LegPoints). Each point between the ends is re-fixed by IF97 from the
 * invariant and the point's progress coordinate (COORD: a property that runs monotonically along the
 * process curve and pairs with the invariant; isobaric (P, h), isentropic (s, P) and isenthalpic
 * (h, P) go straight to the basic equations, (T, v) in region 3 straight to Eq. 28). The IAPWS-95
 * point's coordinate is carried over piecewise linearly (in ln P or ln v for those) between the leg's
 * anchors — start, crossings, end — mapped onto their IF97 counterparts, so the IF97 points stay in
 * order and run exactly through the IF97 ends and crossings.
 *
 * The design-limit events are IF97's (if97LimitEvents): the start's from the IF97 start, and along
 * each leg the first IF97 point at or beyond a limit decides, the event state fixed by IF97 from the
 * leg's invariant and the limit's P or T; their warnings are written again from those states. The
 * other warnings' states (liquid-full) stay IAPWS-95. A state, point or crossing IF97 cannot give keeps its
 * IAPWS-95 value, is marked `formulation: 'iapws95'` and counted in an `if97-state-unavailable`
 * warning; a leg with such an end keeps its IAPWS-95 q, w, points and crossings (all so marked).
 */
import { ThermoError } from '../errors.ts';
import { DESIGN_LIMIT_NAMES } from '../types.ts';
import type {
	Crossing,
	DesignLimitName,
	Inputs,
	Leg,
	LimitEvent,
	PathLeg,
	PathResult,
	PathSpec,
	PathState,
	PathWarning,
	Process,
	State,
	StateExtras,
	TargetName
} from '../types.ts';
import { PC, RHOC, TC, pB23, pressure3, psat, tsat } from './regions.ts';
import { if97FixFrom, type If97Seed } from './fix.ts';
import { if97Limits, if97Region3State, if97State, if97StatePh, if97StatePs } from './state.ts';
import {
	cycleOf,
	LIMIT_WARNING_CODES,
	limitTests,
	limitWarnings,
	startLimitEvents
} from '../solvers/path.ts';

const seedOf = (st: State): If97Seed => ({ T: st.T, P: st.P, x: st.x, phase: st.phase });

const P_SAT_MIN = psat(if97Limits.Tmin) * 1e6;

/**
 * Superheat, subcooling and volume fractions of an IF97 state against IF97's own saturation line
 * (Eqs. 30/31), as the engine's stateExtras gives them for IAPWS-95.
 */
export function if97Extras(st: State): StateExtras {
	const out: StateExtras = {
		Tsat: null,
		superheat: null,
		subcooling: null,
		liquidVolumeFraction: null,
		vaporVolumeFraction: null
	};
	if (st.P >= P_SAT_MIN && st.P < PC * 1e6) {
		const Ts = tsat(st.P / 1e6);
		out.Tsat = Ts;
		if (st.phase === 'superheated-vapor') out.superheat = st.T - Ts;
		if (st.phase === 'saturated-vapor') out.superheat = 0;
		if (st.phase === 'compressed-liquid') out.subcooling = Ts - st.T;
		if (st.phase === 'saturated-liquid') out.subcooling = 0;
	}
	if (st.x !== null && st.T < TC) {
		const vV = if97State(psat(st.T) * 1e6, st.T, { side: 'vapor' }).v;
		const av = Math.min(1, Math.max(0, (st.x * vV) / st.v));
		out.vaporVolumeFraction = av;
		out.liquidVolumeFraction = 1 - av;
	}
	return out;
}

const INVARIANT: Record<Exclude<Process, 'polytropic'>, 'P' | 'v' | 'T' | 's' | 'h'> = {
	isobaric: 'P',
	isochoric: 'v',
	isothermal: 'T',
	isentropic: 's',
	isenthalpic: 'h'
};

/** The leg's target as [property, value] with ρ read as v. */
function targetPair(
	target: Partial<Record<TargetName, number>>
): ['T' | 'P' | 'v' | 'u' | 'h' | 's' | 'x', number] {
	const [k, x] = Object.entries(target).find(([, y]) => y !== undefined) as [TargetName, number];
	return k === 'rho' ? ['v', 1 / x] : [k, x];
}

/** The IF97 end of a polytropic leg: P·vⁿ = P₁v₁ⁿ and the target, by Newton in ln v from the IAPWS-95 end. */
function polytropicEnd(start: State, n: number, target: [string, number], seed: State): State {
	const C = start.P * start.v ** n;
	const [k, value] = target;
	if (k === 'P' && n !== 0)
		return if97FixFrom({ P: value, v: (C / value) ** (1 / n) }, seedOf(seed));
	if (k === 'v') return if97FixFrom({ P: C / value ** n, v: value }, seedOf(seed));
	const at = (lnv: number) => {
		const v = Math.exp(lnv);
		return if97FixFrom({ P: C / v ** n, v }, seedOf(seed));
	};
	const f = (lnv: number): number => {
		const st = at(lnv);
		const y = st[k as keyof State] as number;
		return k === 'P' || k === 'T' ? Math.log(y / value) : (y - value) / (Math.abs(value) + 1e3);
	};
	let y = Math.log(seed.v);
	let fy = f(y);
	for (let i = 0; i < 40 && Math.abs(fy) > 1e-12; i++) {
		const h = 1e-7;
		const d = (f(y + h) - fy) / h;
		if (!Number.isFinite(d) || d === 0) break;
		y -= fy / d;
		fy = f(y);
	}
	if (!(Math.abs(fy) <= 1e-9))
		throw new ThermoError(
			'no-convergence',
			`IAPWS-IF97: no end found for this polytropic leg (P·v^${n} = const, ${k} = ${value}).`,
			'Use IAPWS-95 for this sheet.'
		);
	return at(y);
}

/**
 * The property each process's points are re-fixed by beside the invariant: it runs monotonically
 * along the process curve (an isobar's h, an isochore's T, an isotherm's v, an isentrope's and an
 * isenthalp's P, a polytrope's v). P and v are carried over in logarithms.
 */
export const COORD: Record<Process, 'h' | 'T' | 'v' | 'P'> = {
	isobaric: 'h',
	isochoric: 'T',
	isothermal: 'v',
	isentropic: 'P',
	isenthalpic: 'P',
	polytropic: 'v'
};

/** The pair that fixes a point of the leg from `start` (its invariant) at coordinate c. */
export function if97PointInputs(process: Process, start: State, c: number, n?: number): Inputs {
	if (process === 'polytropic') return { P: start.P * (start.v / c) ** (n ?? 1), v: c };
	const inv = INVARIANT[process];
	return { [inv]: start[inv], [COORD[process]]: c } as Inputs;
}

/** IF97's saturated liquid or vapor at T (K), Eq. 30 with the region on that side. */
function saturatedAt(T: number, side: 'liquid' | 'vapor'): State {
	if (!(T >= if97Limits.Tmin && T < TC))
		throw new ThermoError(
			'out-of-range',
			`IAPWS-IF97's saturation line runs from ${if97Limits.Tmin} K to ${TC} K; this crossing lies at ${T} K.`,
			'Use IAPWS-95 for this sheet.'
		);
	return if97State(psat(T) * 1e6, T, { side });
}

/**
 * Where a leg from the IF97 state `start` meets IF97's saturated liquid or vapor line near the
 * IAPWS-95 crossing `near`: at the leg's own P (isobaric, polytropic n = 0) or T (isothermal), else
 * the temperature along the line where the invariant takes its value (secant from the IAPWS-95 T).
 */
export function if97Crossing(process: Process, start: State, near: Crossing, n?: number): State {
	const side = near.line === 'saturated-liquid' ? 'liquid' : 'vapor';
	const x = side === 'liquid' ? 0 : 1;
	const seed = seedOf(near.state);
	if (process === 'isobaric' || (process === 'polytropic' && n === 0))
		return if97FixFrom({ P: start.P, x }, seed);
	if (process === 'isothermal') return if97FixFrom({ T: start.T, x }, seed);
	const k = n ?? 1;
	const lnC = Math.log(start.P) + k * Math.log(start.v);
	const F = (T: number): number => {
		const st = saturatedAt(T, side);
		switch (process) {
			case 'isochoric':
				return Math.log(st.v / start.v);
			case 'isentropic':
				return (st.s - start.s) / 1e3;
			case 'isenthalpic':
				return (st.h - start.h) / 1e6;
			default:
				return Math.log(st.P) + k * Math.log(st.v) - lnC;
		}
	};
	const top = TC - 1e-9;
	let a = Math.min(near.state.T, top);
	let b = Math.min(a * (1 - 1e-6), top);
	let fa = F(a);
	let fb = F(b);
	for (let i = 0; i < 60; i++) {
		if (fb === 0 || Math.abs(b - a) <= 1e-12 * b) return saturatedAt(b, side);
		if (fa === fb) break;
		const c = Math.min(top, Math.max(if97Limits.Tmin, b - (fb * (b - a)) / (fb - fa)));
		a = b;
		fa = fb;
		b = c;
		fb = F(b);
	}
	throw new ThermoError(
		'no-convergence',
		`IAPWS-IF97: this leg's crossing of the ${near.line} line was not found near ${near.state.T} K.`,
		'Use IAPWS-95 for this sheet.'
	);
}

/**
 * A (T, v) point straight from region 3's Helmholtz equation (Eq. 28), which takes ρ and T: where it
 * lands in region 3 (623.15 K ≤ T, P from B23 to 100 MPa), mechanically stable and, below Tc, on the
 * side of the saturation line its density says (so neither metastable nor inside the dome). Else
 * null, and the general (T, v) solve (Newton in ln P) is used. Saves that solve's many region 3
 * density iterations on isochores and isotherms near and above the critical point.
 */
export function region3Direct(T: number, v: number): State | null {
	if (!(T >= 623.15)) return null;
	const rho = 1 / v;
	const { p, dpdrho } = pressure3(rho, T);
	if (!(dpdrho > 0 && p >= pB23(T) && p <= if97Limits.Pmax / 1e6)) return null;
	if (T < TC) {
		const ps = psat(T);
		if (rho > RHOC ? !(p > ps * (1 + 1e-9)) : !(p < ps * (1 - 1e-9))) return null;
	}
	return if97Region3State(rho, T);
}

/**
 * The IF97 point of the leg from `start` at coordinate c: (P, h) and (P, s) straight to the basic
 * equations (as if97FixFrom would, without its checks of the pair), (T, v) in region 3 straight from
 * Eq. 28 where it can be, else if97FixFrom seeded with the IAPWS-95 point `seed`.
 */
function pointAt(
	process: Process,
	start: State,
	c: number,
	n: number | undefined,
	seed: State
): State {
	switch (process) {
		case 'isobaric':
			return if97StatePh(start.P, c);
		case 'isentropic':
			return if97StatePs(c, start.s);
		case 'isenthalpic':
			return if97StatePh(c, start.h);
		case 'isochoric':
			return region3Direct(c, start.v) ?? if97FixFrom({ T: c, v: start.v }, seedOf(seed));
		case 'isothermal':
			return region3Direct(start.T, c) ?? if97FixFrom({ T: start.T, v: c }, seedOf(seed));
		default:
			return if97FixFrom(if97PointInputs(process, start, c, n), seedOf(seed));
	}
}

/** Coordinate c of a state as carried over: logarithmic for P and v. */
const coordOf = (process: Process, st: State): number => {
	const c = COORD[process];
	return c === 'P' || c === 'v' ? Math.log(st[c]) : st[c];
};

/**
 * The points and crossings of a leg by IF97 (module comment): `pts95` and `cr95` are the IAPWS-95
 * leg's, `start` and `end` the IF97 ends. Points IF97 cannot give keep their IAPWS-95 value, marked
 * `formulation: 'iapws95'`; `failed` counts them (with the first reason).
 */
export function if97LegPoints(
	process: Process,
	start: State,
	end: State,
	pts95: readonly State[],
	cr95: readonly Crossing[],
	n?: number
): { points: State[]; crossings: Crossing[]; failed: number; why: unknown } {
	let failed = 0;
	let why: unknown = null;
	const miss = (st: State, e: unknown): State => {
		if (!(e instanceof ThermoError)) throw e;
		failed++;
		why ??= e;
		return { ...st, formulation: 'iapws95' };
	};
	const found: Crossing[] = cr95.map((c) => {
		try {
			return { line: c.line, state: if97Crossing(process, start, c, n) };
		} catch (e) {
			return { line: c.line, state: miss(c.state, e) };
		}
	});
	const last = pts95.length - 1;
	const c0 = coordOf(process, start);
	const cEnd = coordOf(process, end);
	const dir = Math.sign(cEnd - c0);
	// anchors: [index in pts95, IAPWS-95 coordinate, IF97 coordinate, IF97 state]
	const anchors: Array<[number, number, number, State]> = [
		[0, coordOf(process, pts95[0]), c0, start]
	];
	// [index in pts95, crossing] of the crossings the IF97 leg keeps
	const kept: Array<[number, Crossing]> = [];
	let from = 1;
	cr95.forEach((c, j) => {
		const st = found[j].state;
		const ci = coordOf(process, st);
		// IF97's line may lie beyond the leg's IF97 end (or before the previous crossing) where the
		// IAPWS-95 leg ends just past its own line: then the IF97 leg does not cross it
		if (!((ci - anchors[anchors.length - 1][2]) * dir > 0 && (cEnd - ci) * dir > 0)) return;
		for (let k = from; k < last; k++) {
			const p = pts95[k];
			if (p.T === c.state.T && p.rho === c.state.rho) {
				anchors.push([k, coordOf(process, p), ci, st]);
				kept.push([k, found[j]]);
				from = k + 1;
				return;
			}
		}
		kept.push([from, found[j]]);
	});
	anchors.push([last, coordOf(process, pts95[last]), cEnd, end]);
	const log = COORD[process] === 'P' || COORD[process] === 'v';
	const points: State[] = new Array(pts95.length);
	let a = 0;
	for (let k = 0; k <= last; k++) {
		while (a < anchors.length - 1 && anchors[a + 1][0] < k) a++;
		const A = anchors[a];
		const B = anchors[Math.min(a + 1, anchors.length - 1)];
		if (k === A[0] || k === B[0]) {
			points[k] = k === A[0] ? A[3] : B[3];
			continue;
		}
		const p = pts95[k];
		// the IAPWS-95 piece stretched onto the IF97 one; a piece of (next to) no length on either side
		// (a leg whose ends coincide) is moved across unstretched
		const ratio = (B[2] - A[2]) / (B[1] - A[1]);
		const c = A[2] + (coordOf(process, p) - A[1]) * (ratio > 0.5 && ratio < 2 ? ratio : 1);
		const x = log ? Math.exp(c) : c;
		try {
			points[k] = pointAt(process, start, x, n, p);
		} catch (e) {
			points[k] = miss(p, e);
		}
	}
	// a crossing met twice in a row (the end of one piece and the start of the next) is one state
	for (let k = 1; k < last; k++)
		if (pts95[k].T === pts95[k - 1].T && pts95[k].rho === pts95[k - 1].rho)
			points[k] = points[k - 1];
	// IF97's line crossed where IAPWS-95's is not (the IAPWS-95 leg ends just short of its own line):
	// between two IF97 points, one inside the dome and one outside it, with no crossing between them
	const inside = (st: State) => st.x !== null && st.x > 0 && st.x < 1;
	const added: Array<[number, Crossing]> = [];
	for (let k = 1; k <= last; k++) {
		const [pa, pb] = [points[k - 1], points[k]];
		if (pa.formulation || pb.formulation || inside(pa) === inside(pb)) continue;
		if (pa.x !== null && !inside(pa)) continue; // on the line already
		if (pb.x !== null && !inside(pb)) continue;
		const single = inside(pa) ? pb : pa;
		const line =
			single.phase === 'compressed-liquid'
				? 'saturated-liquid'
				: single.phase === 'superheated-vapor'
					? 'saturated-vapor'
					: null;
		if (!line) continue;
		try {
			const st = if97Crossing(process, start, { line, state: single }, n);
			const ci = coordOf(process, st);
			const [ca, cb] = [coordOf(process, pa), coordOf(process, pb)];
			if ((ci - ca) * (cb - ci) > 0) added.push([k, { line, state: st }]);
		} catch (e) {
			if (!(e instanceof ThermoError)) throw e;
		}
	}
	for (let i = added.length - 1; i >= 0; i--) points.splice(added[i][0], 0, added[i][1].state);
	const crossings = [...kept, ...added].sort((x, y) => x[0] - y[0]).map(([, c]) => c);
	return { points, crossings, failed, why };
}

/** q, w, wShaft, qFlow and the differences of a leg between two IF97 states (the table above). */
export function if97LegEnergy(
	process: Process,
	start: State,
	end: State,
	n?: number
): Pick<Leg, 'q' | 'w' | 'wShaft' | 'qFlow' | 'du' | 'dh' | 'ds'> {
	const du = end.u - start.u;
	const dh = end.h - start.h;
	const ds = end.s - start.s;
	const dPv = end.P * end.v - start.P * start.v;
	let w: number;
	let wShaft: number;
	switch (process) {
		case 'isobaric':
			w = start.P * (end.v - start.v);
			wShaft = 0;
			break;
		case 'isochoric':
			w = 0;
			wShaft = -start.v * (end.P - start.P);
			break;
		case 'isothermal':
			w = start.T * ds - du;
			wShaft = w - dPv;
			break;
		case 'isentropic':
			w = -du;
			wShaft = -dh;
			break;
		case 'isenthalpic':
			return { q: 0, w: 0, wShaft: 0, qFlow: 0, du, dh, ds };
		case 'polytropic': {
			const k = n ?? 1;
			w =
				k === 1
					? start.P * start.v * Math.log(end.v / start.v)
					: (end.P * end.v - start.P * start.v) / (1 - k);
			wShaft = k === 0 ? 0 : w - dPv;
			break;
		}
	}
	return { q: du + w, w, wShaft, qFlow: dh + wShaft, du, dh, ds };
}

function unavailable(id: string, leg: string | undefined, e: unknown): PathWarning {
	const why = e instanceof ThermoError ? e.message : String(e);
	const w: PathWarning = {
		code: 'if97-state-unavailable',
		severity: 'warning',
		message: `${id}: IAPWS-IF97 cannot give this state, so it is shown by IAPWS-95. ${why}`,
		state: id
	};
	if (leg !== undefined) w.leg = leg;
	return w;
}

function pointsUnavailable(leg: string, count: number, e: unknown): PathWarning {
	const why = e instanceof ThermoError ? e.message : String(e);
	return {
		code: 'if97-state-unavailable',
		severity: 'warning',
		message: `${leg}: IAPWS-IF97 cannot give ${count === 1 ? 'one point' : `${count} points`} of this leg (points along it or where it crosses a saturation line), so ${count === 1 ? 'it is' : 'they are'} drawn by IAPWS-95. ${why}`,
		leg
	};
}

/**
 * The design-limit events of an IF97 path, found as computePath finds them for IAPWS-95 but on the
 * IF97 states: the start is at or beyond a limit; along a leg, the first IF97 point at or beyond it
 * after one short of it, the event's state then fixed by IF97 from the leg's invariant and the
 * limit's P or T (polytropic: P·vⁿ = P₁v₁ⁿ), seeded by the IAPWS-95 event. A leg that stayed IAPWS-95
 * keeps its events; an event state IF97 cannot give keeps the IAPWS-95 one, so marked.
 */
function if97LimitEvents(
	spec: PathSpec,
	base: PathResult,
	start: State,
	legs: readonly PathLeg[]
): LimitEvent[] {
	const limits = base.limits;
	const { beyond, tol } = limitTests(limits);
	const named = DESIGN_LIMIT_NAMES.filter((k) => limits[k] !== undefined);
	const events = startLimitEvents(limits, start);
	legs.forEach((pl, i) => {
		const leg = pl.leg;
		const baseOf = (k: DesignLimitName) =>
			base.limitEvents.find((e) => e.leg === pl.id && e.limit === k && e.kind === 'reached');
		if (leg.start.formulation === 'iapws95' || leg.end.formulation === 'iapws95') {
			for (const k of named) {
				const ev = baseOf(k);
				if (ev) events.push(ev);
			}
			return;
		}
		const ls = spec.legs[i];
		const pts = leg.points;
		for (const k of named) {
			const value = limits[k] as number;
			// how far beyond the limit (g), and the same counting a state within tolerance as at it (G)
			const g = (p: State) => beyond[k](p.T, p.P);
			const G = (p: State) => g(p) + tol(k);
			let j = 1;
			while (j < pts.length && !(G(pts[j - 1]) < 0 && G(pts[j]) >= 0)) j++;
			if (j >= pts.length) continue;
			const seed = baseOf(k)?.state ?? pts[j];
			let state: State;
			if (G(pts[j]) === 0) state = pts[j];
			else
				try {
					state = limitStateOnLeg(ls.process, leg.start, k, value, seed, ls.n);
				} catch (e) {
					if (!(e instanceof ThermoError)) throw e;
					state = { ...seed, formulation: 'iapws95' };
				}
			events.push({
				limit: k,
				value,
				leg: pl.id,
				kind: 'reached',
				exceeded: g(leg.end) > tol(k) || pts.some((p) => g(p) > tol(k)),
				state
			});
		}
	});
	return events;
}

/** The IF97 state of a leg from `start` where the limit's P or T takes `value`. */
function limitStateOnLeg(
	process: Process,
	start: State,
	limit: DesignLimitName,
	value: number,
	seed: State,
	n?: number
): State {
	const q = limit.endsWith('Pressure') ? 'P' : 'T';
	if (process === 'polytropic') return polytropicEnd(start, n ?? 1, [q, value], seed);
	const inv = INVARIANT[process];
	return if97FixFrom({ [inv]: start[inv], [q]: value } as Inputs, seedOf(seed));
}

/** The path's warnings with the design-limit ones written again from `events`, where they stood. */
function withLimitWarnings(warnings: readonly PathWarning[], events: readonly LimitEvent[]) {
	const at = warnings.findIndex((w) => LIMIT_WARNING_CODES.has(w.code));
	const rest = warnings.filter((w) => !LIMIT_WARNING_CODES.has(w.code));
	const relief = rest.findIndex((w) => w.code === 'relief-set-above-design-pressure');
	const put = at >= 0 ? at : relief >= 0 ? relief : rest.length;
	return [...rest.slice(0, put), ...limitWarnings(events), ...rest.slice(put)];
}

/**
 * The IAPWS-95 path `base` (computePath of `spec`) with its states and legs' energies by IAPWS-IF97
 * (module comment). Each state keeps its IAPWS-95 value as `iapws95`. Never throws for a state IF97
 * cannot give: that state stays IAPWS-95 with a warning.
 */
export function if97Path(spec: PathSpec, base: PathResult): PathResult {
	const warnings: PathWarning[] = [];
	const states: PathState[] = [];
	const fix = (
		inputs: () => Inputs | State,
		seed: State,
		id: string,
		leg?: string
	): PathState['state'] | null => {
		try {
			const got = inputs();
			return 'phase' in got ? (got as State) : if97FixFrom(got as Inputs, seedOf(seed));
		} catch (e) {
			if (!(e instanceof ThermoError)) throw e;
			warnings.push(unavailable(id, leg, e));
			return null;
		}
	};
	const put = (ps: PathState, st: State | null) => {
		const base95 = ps.state;
		if (st)
			states.push({
				...ps,
				state: st,
				extras: if97Extras(st),
				iapws95: base95,
				formulation: 'if97'
			});
		else states.push({ ...ps, iapws95: base95, formulation: 'iapws95' });
	};
	put(
		base.states[0],
		fix(() => spec.start, base.states[0].state, base.states[0].id)
	);
	const legs = base.legs.map((pl, i) => {
		const ls = spec.legs[i];
		const from = states[i];
		const end95 = base.states[i + 1];
		const target = targetPair(ls.target);
		const st = fix(
			() => {
				if (ls.process === 'polytropic')
					return polytropicEnd(from.state, ls.n ?? 1, target, end95.state);
				const inv = INVARIANT[ls.process];
				return { [inv]: from.state[inv], [target[0]]: target[1] } as Inputs;
			},
			end95.state,
			end95.id,
			pl.id
		);
		put(end95, st);
		const to = states[i + 1];
		if (from.formulation !== 'if97' || to.formulation !== 'if97') {
			// the leg stays IAPWS-95 (its end's warning says why); its points and crossings say so
			const mark = (p: State): State => ({ ...p, formulation: 'iapws95' });
			const leg: Leg = {
				...pl.leg,
				points: pl.leg.points.map(mark),
				crossings: pl.leg.crossings.map((c) => ({ ...c, state: mark(c.state) }))
			};
			return { ...pl, leg };
		}
		const e = if97LegEnergy(ls.process, from.state, to.state, ls.n);
		const got = if97LegPoints(
			ls.process,
			from.state,
			to.state,
			pl.leg.points,
			pl.leg.crossings,
			ls.n
		);
		if (got.failed) warnings.push(pointsUnavailable(pl.id, got.failed, got.why));
		const leg: Leg = {
			...pl.leg,
			...e,
			start: from.state,
			end: to.state,
			points: got.points,
			crossings: got.crossings
		};
		return { ...pl, leg };
	});
	const closed = base.system.kind === 'closed';
	const s1 = states[0].state;
	const m =
		spec.system.kind === 'closed'
			? (spec.system.mass ?? (spec.system.volume !== undefined ? spec.system.volume / s1.v : 1))
			: spec.system.massFlow;
	const system: PathResult['system'] =
		spec.system.kind === 'closed'
			? { kind: 'closed', mass: m, volume: m * s1.v }
			: { kind: 'flow', massFlow: m };
	const unit = base.totals.unit;
	const totals = (q: number, w: number, wShaft: number, qFlow: number) => ({
		unit,
		Q: m * q,
		W: m * w,
		WShaft: m * wShaft,
		QFlow: m * qFlow
	});
	const per = { q: 0, w: 0, wShaft: 0, qFlow: 0, du: 0, dh: 0, ds: 0 };
	const outLegs = legs.map((pl) => {
		const l = pl.leg;
		per.q += l.q;
		per.w += l.w;
		per.wShaft += l.wShaft;
		per.qFlow += l.qFlow;
		return { ...pl, totals: totals(l.q, l.w, l.wShaft, l.qFlow) };
	});
	const last = states[states.length - 1].state;
	per.du = last.u - s1.u;
	per.dh = last.h - s1.h;
	per.ds = last.s - s1.s;
	let cycle = base.cycle;
	if (cycle) cycle = cycleOf(outLegs, closed, m, unit);
	const limitEvents = if97LimitEvents(spec, base, s1, outLegs);
	return {
		...base,
		system,
		states,
		legs: outLegs,
		perKg: per,
		totals: totals(per.q, per.w, per.wShaft, per.qFlow),
		cycle,
		limitEvents,
		warnings: [...withLimitWarnings(base.warnings, limitEvents), ...warnings],
		formulation: 'if97'
	};
}
