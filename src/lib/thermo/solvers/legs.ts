/**
 * Process legs (isobaric, isochoric, isothermal, isentropic, isenthalpic, polytropic) from a start
 * state to a target, with the crossings of the saturation lines, boundary work w = ∫P dv,
 * q = Δu + w, shaft work wShaft = −∫v dP and qFlow = Δh + wShaft (see the compute contract, docs/compute-api.md).
 *
 * The leg follows the process curve (leg-curve.ts) from the start until the target property first
 * takes the target value, in whichever direction along the curve reaches it first (both are
 * searched; the nearer wins and a note says when the other also would). The end state is found by
 * bracketing on the curve's parameter and refining to round-off, so it satisfies the invariant and
 * the target exactly (to ~1e−12).
 *
 * Integrals (J/kg), per smooth piece between crossings (the integrands have kinks there):
 * - isobaric: w = P·Δv, wShaft = 0 (exact);   isochoric: w = 0, wShaft = −v·ΔP (exact);
 * - isothermal, isentropic and polytropic single-phase pieces and polytropic/isothermal two-phase
 *   pieces: w = ∫P·v d(ln v) by adaptive Gauss–Kronrod (quadrature.ts), relative tolerance 1e−10;
 * - isentropic two-phase pieces: wShaft = −∫v·(dPs/dT) dT with Clapeyron's dPs/dT = Δs/Δv;
 * - on every piece w − wShaft = Δ(Pv) (integration by parts).
 * Throttling (isenthalpic) is irreversible: q, w, wShaft and qFlow are 0 and a note says so.
 *
 * Points: at least `samples` (default 40, 20…2000), adaptively placed — equal steps of the curve's
 * length on T–v and P–v with log v (and linear or log P), with extra points where the curve turns,
 * up to 1.5 × samples — and exactly through each crossing.
 *
 * Here: tracing a leg (start, end, pieces, crossings, integrals assembled into the Leg). Beside it:
 * leg-spec.ts (validation), leg-curve.ts (the process curve), leg-end.ts (end-finding),
 * leg-points.ts (pieces and point placement), leg-integrals.ts (boundary work).
 */
import { bandOf, holdLegOutsideBand } from '../pseudo-pure.ts';
import { ThermoError, fmt } from '../errors.ts';
import type { Crossing, Leg, LegSpec, State } from '../types.ts';
import { Curve, cptOfState, paramOf, stateOf, type CPt, type Invariant } from './leg-curve.ts';
import { checkOptions, inWindow, outsideWindow, pickIndex } from './choose.ts';
import { fixStateOf, type Key } from './fix-state.ts';
import { legPointPrecision } from './precision.ts';
import {
	isMonotone,
	preferredDirection,
	refine,
	scan,
	unreachable,
	valueOf,
	type Pos
} from './leg-end.ts';
import { integrals } from './leg-integrals.ts';
import { PROCESS_CURVES } from './leg-processes.ts';
import { piecesBetween, samplePieces } from './leg-points.ts';
import { checkLegSpec, TARGET_UNIT, THROTTLING_NOTE } from './leg-spec.ts';

export {
	checkLegSpec,
	N_MAX,
	PROCESSES,
	SAMPLES_DEFAULT,
	SAMPLES_MAX,
	SAMPLES_MIN,
	TARGET_NAMES,
	THROTTLING_NOTE,
	type CheckedLeg
} from './leg-spec.ts';
export { samplePieces, type Piece, type SP } from './leg-points.ts';

/** Compute a leg (see the module comment and docs/compute-api.md). Throws ThermoError for anything it cannot answer. */
export function computeLeg(spec: LegSpec): Leg {
	return traceLeg(spec).leg;
}

/** A computed leg with what paths need to look along it again. */
export interface LegTrace {
	leg: Leg;
	/** per crossing of leg.crossings: [two-phase before, two-phase after] */
	sides: [boolean, boolean][];
	/** the last piece of the leg is two-phase (an end on a line reached from inside the dome) */
	endsFromDome: boolean;
	/**
	 * The first state along the leg where g turns from negative to ≥ 0 (g of the point's T, P, v;
	 * refined by regula falsi on the curve, not the nearest point), or null.
	 */
	firstReach(g: (T: number, P: number, v: number) => number): State | null;
}

/**
 * computeLeg with the curve kept (for paths: limit crossings along the leg, crossing directions).
 * `chained`: the start is the previous leg's end, given by its (T, ρ), so the window is not
 * applied to it again (its P from (T, ρ) may differ from the end's in the last bits).
 */
export function traceLeg(spec: LegSpec, chained = false): LegTrace {
	const chk = checkLegSpec(spec);
	const { fl, process, key, value, n, samples } = chk;
	checkOptions({ hint: spec.endHint, near: spec.endNear }, "the leg's end choice");
	const endChoice = spec.endHint !== undefined || spec.endNear !== undefined;
	const start = fixStateOf(fl, spec.start, {
		hint: spec.startHint,
		near: spec.startNear,
		window: chained ? undefined : spec.window
	});
	const startC = cptOfState(fl, start);
	const inv: Invariant = PROCESS_CURVES[process].invariant(start, n);
	const curve = new Curve(fl, inv, startC);
	curve.energies = key === 'u' || key === 'h' || key === 's';
	const notes: string[] = [];
	if (process === 'isenthalpic') notes.push(THROTTLING_NOTE);

	const scale =
		key === 'u' || key === 'h'
			? Math.max(Math.abs(value), fl.R * fl.Tc)
			: key === 's'
				? Math.max(Math.abs(value), fl.R)
				: key === 'x'
					? 1
					: value;
	const F = (c: CPt) => (valueOf(c, key) - value) / scale;
	const tolF = key === 'x' ? 1e-12 : 1e-11;
	const pos0 = curve.locateStart(startC);
	const F0 = F(startC);
	let end: Pos;
	let dir: 1 | -1 = 1;
	if (Math.abs(F0) <= tolF) {
		end = { ...pos0, p: startC, dist: 0 };
		notes.push('The target equals the start value: this leg has zero length.');
	} else {
		const range = { lo: Infinity, hi: -Infinity, dome: false };
		const seen = (c: CPt) => {
			const y = valueOf(c, key);
			if (Number.isFinite(y)) {
				range.lo = Math.min(range.lo, y);
				range.hi = Math.max(range.hi, y);
			}
		};
		seen(startC);
		// look first the way the target property moves toward the target
		const first = preferredDirection(curve, pos0, startC, F, F0);
		const mono = isMonotone(inv.process, key);
		const hit1 = scan(curve, pos0, startC, F, F0, tolF, first, Infinity, key, seen, range, mono);
		// a property monotone along the whole curve is reached one way only: no need to look back;
		// with a choice of end the other way is searched in full
		const choosing = endChoice || spec.window !== undefined;
		const hit2 =
			hit1 && mono
				? null
				: scan(
						curve,
						pos0,
						startC,
						F,
						F0,
						tolF,
						first === 1 ? -1 : 1,
						hit1 && !choosing ? Math.floor(hit1.dist) : Infinity,
						key,
						seen,
						range,
						mono
					);
		if (!hit1 && !hit2) throw unreachable(fl, process, inv, n, key, value, range);
		const other: 1 | -1 = first === 1 ? -1 : 1;
		let hits: { pos: Pos; dir: 1 | -1 }[] = [];
		if (hit1) hits.push({ pos: hit1, dir: first });
		if (hit2) hits.push({ pos: hit2, dir: other });
		if (spec.window) {
			const inside = hits.filter((h) => inWindow(h.pos.p, spec.window));
			if (inside.length === 0)
				throw outsideWindow(
					fl,
					`${key} = ${fmt(value)}${TARGET_UNIT[key] ? ` ${TARGET_UNIT[key]}` : ''} along this ${process} leg ${PROCESS_CURVES[process].describe(inv, n)}`,
					hits.map((h) => stateOf(fl, h.pos.p)),
					spec.window
				);
			hits = inside;
		}
		hits.sort((a, b) => a.pos.dist - b.pos.dist);
		let pick = 0;
		if (hits.length > 1) {
			const i = pickIndex(
				hits.map((h) => stateOf(fl, h.pos.p)),
				spec.endHint,
				spec.endNear
			);
			if (i >= 0) pick = i;
			const b = hits[pick === 0 ? 1 : 0].pos;
			notes.push(
				`The target ${key} = ${fmt(value)} ${TARGET_UNIT[key]} is also reached the other way along this ${process} leg (at T = ${fmt(b.p.T)} K, P = ${fmt(b.p.P)} Pa); ${i >= 0 ? `the end ${spec.endNear ? 'nearest endNear' : `the hint "${spec.endHint}" selects`} was taken` : 'the nearer end was taken (endHint or endNear choose the other)'}.`
			);
		}
		end = hits[pick].pos;
		dir = hits[pick].dir;
	}
	// a throttle only lowers the pressure: along constant h, ds = −(v/T)·dP
	if (process === 'isenthalpic' && end.p.P > start.P * (1 + 1e-12))
		throw new ThermoError(
			'unreachable-target',
			`A throttling (isenthalpic) leg can only lower the pressure — its entropy rises by ds = −(v/T)·dP — but this target needs P to rise from ${fmt(start.P)} to ${fmt(end.p.P)} Pa.`,
			'Give a target at a lower pressure, or use another process (isentropic or polytropic compression).'
		);
	const pieces = piecesBetween(curve, pos0, startC, end, dir);
	const sampled = samplePieces(curve, pieces, samples);
	const points: State[] = sampled.map((sp) => stateOf(fl, sp.c));
	points[0] = start;
	const endState = points[points.length - 1];
	const crossings: Crossing[] = pieces
		.slice(1)
		.map((pc) => ({ line: pc.lineFrom as Crossing['line'], state: stateOf(fl, pc.A) }));
	// every point states how well the leg's invariant and its target property fix it
	const pk: Key = key === 'v' ? 'rho' : key;
	for (const st of [...points, ...crossings.map((c) => c.state)])
		if (st.precision === undefined) st.precision = legPointPrecision(fl, st, process, n, pk);

	const du = endState.u - start.u,
		dh = endState.h - start.h,
		ds = endState.s - start.s;
	// closed forms where the process has them, else quadrature along the pieces
	const { w, wShaft } = curve.pc.work(start, endState, inv, () =>
		integrals(curve, pieces, sampled)
	);
	const leg: Leg = {
		process,
		start,
		end: endState,
		points,
		crossings,
		w,
		q: process === 'isenthalpic' ? 0 : du + w,
		du,
		dh,
		ds,
		wShaft,
		qFlow: process === 'isenthalpic' ? 0 : dh + wShaft
	};
	const band = bandOf(fl);
	if (band) holdLegOutsideBand(fl, band, leg);
	if (notes.length) leg.notes = notes;
	if (process === 'polytropic') leg.n = n;
	const sides = pieces
		.slice(1)
		.map((pc, i): [boolean, boolean] => [pieces[i].seg.dome, pc.seg.dome]);
	const endsFromDome =
		pieces[pieces.length - 1].seg.dome &&
		pieces[pieces.length - 1].from !== pieces[pieces.length - 1].to;
	const firstReach = (g: (T: number, P: number, v: number) => number): State | null => {
		const G = (c: CPt) => g(c.T, c.P, 1 / c.rho);
		let gPrev = G(sampled[0].c);
		for (let j = 1; j < sampled.length; j++) {
			const b = sampled[j],
				a = sampled[j - 1];
			const gb = G(b.c);
			if (gPrev < 0 && gb >= 0) {
				if (gb === 0) return stateOf(fl, b.c);
				const pc = pieces[b.piece];
				const ta = a.piece === b.piece ? a.t : pc.from;
				const r = refine(curve, pc.seg, ta, gPrev, a.c, b.t, gb, b.c, G);
				return stateOf(fl, r.p);
			}
			gPrev = gb;
		}
		return null;
	};
	return { leg, sides, endsFromDome, firstReach };
}

export { paramOf };
