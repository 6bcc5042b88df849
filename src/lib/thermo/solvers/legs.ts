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
 */
import { bandOf, holdLegOutsideBand } from '../pseudo-pure.ts';
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { getCompiledFluid } from '../registry.ts';
import type { Crossing, Leg, LegSpec, Process, State, TargetName } from '../types.ts';
import {
	Curve,
	cptOfState,
	paramOf,
	stateOf,
	type CPt,
	type Invariant,
	type Segment
} from './leg-curve.ts';
import { checkOptions, inWindow, outsideWindow, pickIndex } from './choose.ts';
import { fixStateOf, type Key } from './fix-state.ts';
import { legPointPrecision } from './precision.ts';
import { integrate } from './quadrature.ts';

export const PROCESSES: readonly Process[] = [
	'isobaric',
	'isochoric',
	'isothermal',
	'isentropic',
	'isenthalpic',
	'polytropic'
];
export const TARGET_NAMES: readonly TargetName[] = ['T', 'P', 'v', 'rho', 'u', 'h', 's', 'x'];
/** Default, least and greatest number of points along a leg. */
export const SAMPLES_DEFAULT = 40;
export const SAMPLES_MIN = 20;
export const SAMPLES_MAX = 2000;
/** Largest |n| accepted for a polytropic leg. */
export const N_MAX = 50;

const UNIT: Record<TargetName, string> = {
	T: 'K',
	P: 'Pa',
	v: 'm³/kg',
	rho: 'kg/m³',
	u: 'J/kg',
	h: 'J/kg',
	s: 'J/(kg·K)',
	x: ''
};
const INVARIANT_KEYS: Record<Process, TargetName[]> = {
	isobaric: ['P'],
	isochoric: ['v', 'rho'],
	isothermal: ['T'],
	isentropic: ['s'],
	isenthalpic: ['h'],
	polytropic: []
};

export const THROTTLING_NOTE =
	'Throttling is irreversible: no reversible heat or work belongs to it, so its heat and work (boundary and shaft) are reported as 0; its enthalpy is unchanged and its entropy rises.';

function invalid(message: string, hint: string): ThermoError {
	return new ThermoError('invalid-leg', message, hint);
}

/** Checked leg spec: the target key and value, n and samples. */
export interface CheckedLeg {
	fl: Fluid;
	process: Process;
	key: TargetName;
	value: number;
	n: number | undefined;
	samples: number;
}

/** Validate a leg spec (everything but the start, which fixState checks). Throws ThermoError. */
export function checkLegSpec(spec: LegSpec): CheckedLeg {
	if (typeof spec !== 'object' || spec === null)
		throw invalid(
			'A leg must be an object { fluid, start, process, target, n?, samples? }.',
			'Send the leg as a JSON object.'
		);
	const fl = getCompiledFluid(spec.fluid);
	const process = spec.process;
	if (!PROCESSES.includes(process))
		throw invalid(`Unknown process "${String(process)}".`, `Use one of: ${PROCESSES.join(', ')}.`);
	const target = spec.target as Record<string, unknown>;
	if (typeof target !== 'object' || target === null || Array.isArray(target))
		throw invalid(
			'The target must be an object holding one property, e.g. { "T": 450 }.',
			`Give exactly one of ${TARGET_NAMES.join(', ')}.`
		);
	const keys = Object.keys(target).filter((k) => target[k] !== undefined);
	for (const k of keys)
		if (!TARGET_NAMES.includes(k as TargetName))
			throw invalid(
				`Unknown target property "${k}".`,
				`Give exactly one of ${TARGET_NAMES.join(', ')} (SI units).`
			);
	if (keys.length !== 1)
		throw invalid(
			`A leg ends on exactly one target property; got ${keys.length}${keys.length ? ` (${keys.join(', ')})` : ''}.`,
			`Give exactly one of ${TARGET_NAMES.join(', ')}; the process supplies the other.`
		);
	const key = keys[0] as TargetName;
	const value = target[key];
	if (typeof value !== 'number' || !Number.isFinite(value))
		throw new ThermoError(
			'non-finite-input',
			`The target ${key} must be a finite number (got ${String(value)}).`,
			`Give ${key} as a finite number in ${UNIT[key] || 'SI units'}.`
		);
	if ((key === 'T' || key === 'P' || key === 'v' || key === 'rho') && !(value > 0))
		throw new ThermoError(
			'non-positive-input',
			`The target ${key} must be positive (got ${fmt(value, 0)}); the engine uses absolute values.`,
			`Give ${key} in ${UNIT[key]} as a positive absolute value (kelvin, absolute pressure).`
		);
	if (key === 'x' && !(value >= 0 && value <= 1))
		throw new ThermoError(
			'quality-out-of-range',
			`The target quality x must lie between 0 and 1 (got ${fmt(value, 0, 1)}).`,
			'Give x from 0 (saturated liquid) to 1 (saturated vapor).'
		);
	let n: number | undefined;
	if (process === 'polytropic') {
		if (typeof spec.n !== 'number' || !Number.isFinite(spec.n))
			throw invalid(
				`A polytropic leg needs a finite exponent n (P·vⁿ = const); got ${String(spec.n)}.`,
				`Give n, for example 1.3; from −${N_MAX} to ${N_MAX}.`
			);
		if (Math.abs(spec.n) > N_MAX)
			throw invalid(
				`The polytropic exponent n = ${fmt(spec.n)} is outside −${N_MAX}…${N_MAX}.`,
				'Use an isochoric leg for very large n.'
			);
		n = spec.n;
	}
	if (INVARIANT_KEYS[process].includes(key) || (process === 'polytropic' && n === 0 && key === 'P'))
		throw new ThermoError(
			'target-is-invariant',
			`${process === 'polytropic' ? 'A polytropic leg with n = 0' : `An ${process} leg`} keeps ${key === 'rho' ? 'rho (= 1/v)' : key} fixed, so ${key} cannot be its target.`,
			`Give the end by another property: one of ${TARGET_NAMES.filter((k) => !INVARIANT_KEYS[process].includes(k)).join(', ')}.`
		);
	let samples = SAMPLES_DEFAULT;
	if (spec.samples !== undefined) {
		if (
			typeof spec.samples !== 'number' ||
			!Number.isInteger(spec.samples) ||
			spec.samples < SAMPLES_MIN ||
			spec.samples > SAMPLES_MAX
		)
			throw invalid(
				`samples must be a whole number from ${SAMPLES_MIN} to ${SAMPLES_MAX} (got ${String(spec.samples)}).`,
				`Leave samples out for ${SAMPLES_DEFAULT} points, or give ${SAMPLES_MIN}…${SAMPLES_MAX}.`
			);
		samples = spec.samples;
	}
	return { fl, process, key, value, n, samples };
}

/** A place on the curve: segment, parameter and point; `crossing` when it sits on crossing i. */
interface Pos {
	seg: number;
	t: number;
	p: CPt;
	crossing: number | null;
	/** segments entered before reaching it plus the fraction of the last (for "nearer") */
	dist: number;
}

function describeInvariant(process: Process, inv: Invariant, n: number | undefined): string {
	switch (process) {
		case 'isobaric':
			return `at P = ${fmt(inv.P as number)} Pa`;
		case 'isochoric':
			return `at v = ${fmt(1 / (inv.rho as number))} m³/kg`;
		case 'isothermal':
			return `at T = ${fmt(inv.T as number)} K`;
		case 'isentropic':
			return `at s = ${fmt(inv.s as number)} J/(kg·K)`;
		case 'isenthalpic':
			return `at h = ${fmt(inv.h as number)} J/kg`;
		case 'polytropic':
			return `with P·vⁿ constant, n = ${fmt(n as number)}`;
	}
}

function valueOf(c: CPt, key: TargetName): number {
	switch (key) {
		case 'v':
			return 1 / c.rho;
		case 'x':
			return c.x ?? NaN;
		default:
			return c[key];
	}
}

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
	const inv: Invariant =
		process === 'polytropic' && n === 0
			? { process: 'isobaric', P: start.P }
			: process === 'polytropic'
				? { process, n, lnC: Math.log(start.P) + (n as number) * Math.log(start.v) }
				: { process, P: start.P, rho: start.rho, T: start.T, s: start.s, h: start.h };
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
					`${key} = ${fmt(value)}${UNIT[key] ? ` ${UNIT[key]}` : ''} along this ${process} leg ${describeInvariant(process, inv, n)}`,
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
				`The target ${key} = ${fmt(value)} ${UNIT[key]} is also reached the other way along this ${process} leg (at T = ${fmt(b.p.T)} K, P = ${fmt(b.p.P)} Pa); ${i >= 0 ? `the end ${spec.endNear ? 'nearest endNear' : `the hint "${spec.endHint}" selects`} was taken` : 'the nearer end was taken (endHint or endNear choose the other)'}.`
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
	let w = 0,
		wShaft = 0;
	const dPv = endState.P * endState.v - start.P * start.v;
	switch (inv.process) {
		case 'isobaric':
			w = (inv.P as number) * (endState.v - start.v);
			wShaft = 0;
			break;
		case 'isochoric':
			w = 0;
			wShaft = -start.v * (endState.P - start.P);
			break;
		case 'isenthalpic':
			break;
		default: {
			w = integrals(curve, pieces, sampled);
			wShaft = w - dPv;
		}
	}
	if (process === 'polytropic' && n === 0) wShaft = 0;
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

function unreachable(
	fl: Fluid,
	process: Process,
	inv: Invariant,
	n: number | undefined,
	key: TargetName,
	value: number,
	range: { lo: number; hi: number }
): ThermoError {
	const where = `This ${process} leg ${describeInvariant(process, inv, n)}`;
	if (key === 'x' && !(range.hi >= range.lo))
		return new ThermoError(
			'unreachable-target',
			`${where} never enters the vapor dome of ${fl.id}, so it never has a quality.`,
			'Give the end by T, P, v, u, h or s instead, or choose a process that crosses the dome.'
		);
	const u = UNIT[key] ? ` ${UNIT[key]}` : '';
	return new ThermoError(
		'unreachable-target',
		`${where} never reaches ${key} = ${fmt(value)}${u}: within the range of the ${fl.data.formulation.name} formulation it reaches ${key} from ${fmt(range.lo)} to ${fmt(range.hi)}${u}${key === 'x' ? ' (on its way through the vapor dome)' : ''}.`,
		`Give a target ${key} from ${fmt(range.lo)} to ${fmt(range.hi)}${u}, or another process.`
	);
}

/** The direction in which F moves toward zero at the start (1 if it cannot tell). */
function preferredDirection(
	curve: Curve,
	pos: Pos | { seg: number; t: number; crossing: number | null },
	startC: CPt,
	F: (c: CPt) => number,
	F0: number
): 1 | -1 {
	const k = pos.seg;
	const seg = curve.segs[k];
	const span = Math.abs(seg.tb - seg.ta);
	const h = Number.isFinite(span) && span > 0 ? 1e-3 * span : 1e-4;
	const dt = (seg.tb >= seg.ta ? 1 : -1) * h;
	const t = pos.t + dt;
	if (!(Math.min(seg.ta, seg.tb) <= t && t <= Math.max(seg.ta, seg.tb))) return 1;
	const c = curve.at(seg, t, startC);
	if (!c) return 1;
	const f = F(c);
	if (!Number.isFinite(f) || !Number.isFinite(F0) || f === F0) return 1;
	return Math.abs(f) < Math.abs(F0) ? 1 : -1;
}

const SCAN_STEPS = 8;

/**
 * Target properties that never turn back along a process curve (so each value is met at most once):
 * isobaric T, h, s, x (dh = T·ds > 0 at constant P); isochoric T, u, s (du = T·ds = cv·dT);
 * isothermal v, P; isentropic v, P, u, h (du = −P·dv, dh = v·dP); isenthalpic P, s (ds = −v/T·dP);
 * polytropic v, P (P = C·v⁻ⁿ). Others (T along an isentrope near water's density maximum, v along
 * an isobar…) can turn and are searched both ways.
 */
const MONOTONE: Record<Process, readonly TargetName[]> = {
	isobaric: ['T', 'h', 's'],
	isochoric: ['T', 'u', 's'],
	isothermal: ['v', 'rho', 'P'],
	isentropic: ['v', 'rho', 'P', 'u', 'h'],
	isenthalpic: ['P', 's'],
	polytropic: ['v', 'rho', 'P']
};

function isMonotone(process: Process, key: TargetName): boolean {
	return MONOTONE[process].includes(key);
}

/**
 * Walk the curve from the start in direction dir (segments entered ≤ maxSegs), sampling F on each
 * segment; return the first place where F reaches zero, refined by regula falsi (Illinois).
 */
function scan(
	curve: Curve,
	pos0: { seg: number; t: number; crossing: number | null },
	startC: CPt,
	F: (c: CPt) => number,
	F0: number,
	tolF: number,
	dir: 1 | -1,
	maxSegs: number,
	key: TargetName,
	seen: (c: CPt) => void,
	range: { dome: boolean },
	mono = false
): Pos | null {
	const segs = curve.segs;
	let k = pos0.crossing === null ? pos0.seg : dir === 1 ? pos0.crossing + 1 : pos0.crossing;
	let tPrev = pos0.crossing === null ? pos0.t : dir === 1 ? segs[k].ta : segs[k].tb;
	let prev = startC;
	let Fprev = F0;
	let entered = 0;
	while (k >= 0 && k < segs.length && entered <= maxSegs) {
		const seg = segs[k];
		const side = dir === 1 ? 'B' : 'A';
		// a crossing ends the segment; an outer end is found only if the walk gets there (lazy edge)
		const known = side === 'B' ? seg.B : seg.A;
		let e: { t: number; p: CPt } | null = known
			? { t: side === 'B' ? seg.tb : seg.ta, p: known }
			: null;
		// no quality on an outer single-phase segment, and nothing beyond it
		if (!e && key === 'x' && !seg.dome) return null;
		const tEnd = e ? e.t : side === 'B' ? seg.tb : seg.ta;
		const tEntry = tPrev;
		if (seg.dome) range.dome = true;
		const skip = key === 'x' && !seg.dome;
		// a monotone property between known ends: one look at the far end brackets it
		const steps = skip || (mono && e) ? 1 : SCAN_STEPS;
		let stop = false;
		for (let j = 1; j <= steps; j++) {
			let t = j === steps ? tEnd : tEntry + ((tEnd - tEntry) * j) / steps;
			let c = j === steps && e ? e.p : curve.at(seg, t, prev);
			if (!e && (!c || curve.violation(c) > 1e-12)) {
				// past the domain's edge: find it between the last good sample and this one, and end there
				e = curve.end(k, side, prev, tPrev, t, c);
				if (!e) return null;
				t = e.t;
				c = e.p;
				stop = true;
			}
			if (!c) continue;
			const f = F(c);
			seen(c);
			const frac = tEnd === tEntry ? 1 : (t - tEntry) / (tEnd - tEntry);
			const atCrossing =
				j === steps &&
				(dir === 1 ? seg.B !== null && seg.lineB !== null : seg.A !== null && seg.lineA !== null);
			const crossingIndex = atCrossing ? (dir === 1 ? k : k - 1) : null;
			if (Math.abs(f) <= tolF)
				return { seg: k, t, p: c, crossing: crossingIndex, dist: entered + frac };
			if (Number.isFinite(f) && Number.isFinite(Fprev) && f < 0 !== Fprev < 0) {
				const r = refine(curve, seg, tPrev, Fprev, prev, t, f, c, F);
				if (!(Math.abs(F(r.p)) <= 1e-7))
					throw new ThermoError(
						'no-convergence',
						Math.abs(r.p.T / curve.fl.Tc - 1) < 1e-4
							? `The target ${key} could not be met to round-off along this leg: it lies at the critical point (T = ${fmt(r.p.T)} K), where the properties change without bound.`
							: `The target ${key} could not be met to round-off along this leg (near T = ${fmt(r.p.T)} K, P = ${fmt(r.p.P)} Pa).`,
						'Give a target a little away from there, or please report the leg.'
					);
				const fr = tEnd === tEntry ? 1 : (r.t - tEntry) / (tEnd - tEntry);
				return { seg: k, t: r.t, p: r.p, crossing: null, dist: entered + fr };
			}
			prev = c;
			Fprev = f;
			tPrev = t;
			if (stop) break;
		}
		if (stop || !e) return null;
		prev = e.p;
		Fprev = F(e.p);
		k += dir;
		entered++;
		if (k >= 0 && k < segs.length) tPrev = dir === 1 ? segs[k].ta : segs[k].tb;
	}
	return null;
}

/** Root of F on a segment between a and b (opposite signs), Illinois regula falsi with bisection. */
function refine(
	curve: Curve,
	seg: Segment,
	a: number,
	fa: number,
	pa: CPt,
	b: number,
	fb: number,
	pb: CPt,
	F: (c: CPt) => number
): { t: number; p: CPt } {
	let side = 0;
	let best = Math.abs(fa) < Math.abs(fb) ? { t: a, p: pa, f: fa } : { t: b, p: pb, f: fb };
	for (let it = 0; it < 100; it++) {
		let t = b - (fb * (b - a)) / (fb - fa);
		if (!(t > Math.min(a, b) && t < Math.max(a, b)) || it % 8 === 7) t = 0.5 * (a + b);
		const c = curve.at(seg, t, Math.abs(t - a) < Math.abs(t - b) ? pa : pb);
		if (!c) {
			t = 0.5 * (a + b);
			const c2 = curve.at(seg, t, pa);
			if (!c2) break;
			const f2 = F(c2);
			if (f2 < 0 === fa < 0) {
				a = t;
				fa = f2;
				pa = c2;
			} else {
				b = t;
				fb = f2;
				pb = c2;
			}
			continue;
		}
		const f = F(c);
		if (Math.abs(f) < Math.abs(best.f)) best = { t, p: c, f };
		if (f === 0 || Math.abs(f) <= 1e-15) break;
		if (f < 0 === fa < 0) {
			a = t;
			fa = f;
			pa = c;
			if (side === -1) fb *= 0.5;
			side = -1;
		} else {
			b = t;
			fb = f;
			pb = c;
			if (side === 1) fa *= 0.5;
			side = 1;
		}
		if (Math.abs(b - a) <= 2e-15 * Math.max(1, Math.abs(t))) break;
	}
	return { t: best.t, p: best.p };
}

/** A piece of the leg inside one segment, in leg order. */
export interface Piece {
	seg: Segment;
	from: number;
	to: number;
	A: CPt;
	B: CPt;
	/** the saturation line at A when A is a crossing the leg passes through */
	lineFrom: string | null;
}

function piecesBetween(
	curve: Curve,
	pos0: { seg: number; t: number; crossing: number | null },
	startC: CPt,
	end: Pos,
	dir: 1 | -1
): Piece[] {
	const segs = curve.segs;
	if (end.p === startC)
		return [
			{ seg: segs[pos0.seg], from: pos0.t, to: pos0.t, A: startC, B: startC, lineFrom: null }
		];
	let k = pos0.crossing === null ? pos0.seg : dir === 1 ? pos0.crossing + 1 : pos0.crossing;
	let from = pos0.crossing === null ? pos0.t : dir === 1 ? segs[k].ta : segs[k].tb;
	let A = startC;
	let lineFrom: string | null = null;
	const out: Piece[] = [];
	for (;;) {
		const seg = segs[k];
		if (!seg)
			throw new ThermoError(
				'no-convergence',
				'The end of this leg could not be placed on its path.',
				'Please report the leg; try a slightly different start or target.'
			);
		if (k === end.seg) {
			out.push({ seg, from, to: end.t, A, B: end.p, lineFrom });
			break;
		}
		const B = (dir === 1 ? seg.B : seg.A) as CPt;
		out.push({ seg, from, to: dir === 1 ? seg.tb : seg.ta, A, B, lineFrom });
		lineFrom = dir === 1 ? seg.lineB : seg.lineA;
		A = B;
		k += dir;
		from = dir === 1 ? segs[k].ta : segs[k].tb;
	}
	// a piece of zero length (a start on a crossing, an end on one) carries nothing
	const kept = out.filter((pc) => pc.from !== pc.to);
	return kept.length ? kept : out.slice(0, 1);
}

export interface SP {
	piece: number;
	t: number;
	c: CPt;
	X: number[];
}

/** Adaptive points along the pieces (see the module comment). */
export function samplePieces(curve: Curve, pieces: Piece[], samples: number): SP[] {
	const pts: SP[] = [];
	const coords = (c: CPt) => [-Math.log(c.rho), c.T, Math.log(c.P), c.P];
	if (pieces.length === 1 && pieces[0].from === pieces[0].to) {
		const c = pieces[0].A;
		for (let i = 0; i < samples; i++) pts.push({ piece: 0, t: pieces[0].from, c, X: coords(c) });
		return pts;
	}
	const init = Math.max(2, Math.min(6, Math.floor(samples / (2 * pieces.length))));
	pieces.forEach((pc, i) => {
		if (i === 0) pts.push({ piece: 0, t: pc.from, c: pc.A, X: coords(pc.A) });
		let prev = pc.A;
		for (let j = 1; j < init; j++) {
			const t = pc.from + ((pc.to - pc.from) * j) / init;
			const c = curve.at(pc.seg, t, prev);
			if (!c) continue;
			pts.push({ piece: i, t, c, X: coords(c) });
			prev = c;
		}
		pts.push({ piece: i, t: pc.to, c: pc.B, X: coords(pc.B) });
	});
	// normalise each coordinate by the leg's own span (floors keep a fixed coordinate from blowing up)
	const S = [0, 1, 2, 3].map((d) => {
		let lo = Infinity,
			hi = -Infinity;
		for (const p of pts) {
			lo = Math.min(lo, p.X[d]);
			hi = Math.max(hi, p.X[d]);
		}
		const floor = d === 1 ? 1e-3 * Math.abs(hi) : d === 3 ? 1e-3 * Math.abs(hi) : 1e-3;
		return Math.max(hi - lo, floor, 1e-300);
	});
	const norm = (X: number[]) => [X[0] / S[0], X[1] / S[1], X[2] / S[2], X[3] / S[3]];
	const N: number[][] = pts.map((p) => norm(p.X));
	// boundary vertices (crossings) may kink: never count their angle
	// an interval (j, j + 1) lies in the piece of its right end; a piece's last point carries that piece's index
	const boundary = (j: number) =>
		j === 0 || j === pts.length - 1 || pts[j].piece !== pts[j + 1].piece;
	const leftT = (j: number) =>
		pts[j].piece === pts[j + 1].piece ? pts[j].t : pieces[pts[j + 1].piece].from;
	// length of an interval: the longest of its projections on (ln v, T), (ln v, ln P), (ln v, P)
	const len = (j: number) => {
		const a = N[j],
			b = N[j + 1];
		const dx = b[0] - a[0];
		let m = 0;
		for (let d = 1; d < 4; d++) {
			const dy = b[d] - a[d];
			m = Math.max(m, dx * dx + dy * dy);
		}
		return Math.sqrt(m);
	};
	// turning angle at a vertex: the largest over the three projections
	const turn = (j: number) => {
		if (boundary(j)) return 0;
		const a = N[j - 1],
			b = N[j],
			c = N[j + 1];
		const ux = b[0] - a[0],
			vx = c[0] - b[0];
		let m = 0;
		for (let d = 1; d < 4; d++) {
			const uy = b[d] - a[d],
				vy = c[d] - b[d];
			const lu = ux * ux + uy * uy,
				lv = vx * vx + vy * vy;
			if (lu === 0 || lv === 0) continue;
			const cos = Math.max(-1, Math.min(1, (ux * vx + uy * vy) / Math.sqrt(lu * lv)));
			m = Math.max(m, Math.acos(cos));
		}
		return m;
	};
	const cap = Math.min(SAMPLES_MAX * 2, samples + Math.max(20, Math.floor(samples / 2)));
	const TURN_TOL = 0.08;
	const renorm = () => {
		N.length = 0;
		for (const p of pts) N.push(norm(p.X));
	};
	/** Split interval j (pts[j], pts[j+1]) into m + 1 equal parameter steps; returns the new points. */
	const split = (j: number, m: number): SP[] => {
		const a = pts[j],
			b = pts[j + 1];
		const ta = leftT(j);
		const out: SP[] = [];
		let prev = a.c;
		for (let i = 1; i <= m; i++) {
			const t = ta + ((b.t - ta) * i) / (m + 1);
			if (t === ta || t === b.t) continue;
			const c = curve.at(pieces[b.piece].seg, t, prev);
			if (!c) continue;
			out.push({ piece: b.piece, t, c, X: coords(c) });
			prev = c;
		}
		return out;
	};
	// pass 1: share the remaining budget among the coarse intervals by length weighted by turning
	{
		const theta = pts.map((_, j) => turn(j));
		const wts = pts.map((_, j) =>
			j < pts.length - 1 ? len(j) * (1 + 8 * Math.max(theta[j], theta[j + 1])) : 0
		);
		const total = wts.reduce((x, y) => x + y, 0);
		const budget = Math.max(0, samples - pts.length);
		const share = wts.map((w) => (total > 0 ? (budget * w) / total : 0));
		const m = share.map(Math.floor);
		let left = budget - m.reduce((x, y) => x + y, 0);
		const order = share
			.map((v, j) => [v - m[j], j])
			.filter(([, j]) => wts[j] > 0 || total === 0)
			.sort((x, y) => y[0] - x[0]);
		if (total === 0) for (let j = 0; j < pts.length - 1; j++) order.push([0, j]);
		for (let i = 0; left > 0 && order.length; i = (i + 1) % order.length, left--) m[order[i][1]]++;
		const next: SP[] = [];
		for (let j = 0; j < pts.length; j++) {
			next.push(pts[j]);
			if (j < pts.length - 1 && m[j] > 0) next.push(...split(j, m[j]));
		}
		pts.length = 0;
		pts.push(...next);
		renorm();
	}
	// passes 2–4: halve the intervals beside sharp turns, and top up to `samples` if solves failed
	for (let pass = 0; pass < 3 && pts.length < cap; pass++) {
		const theta = pts.map((_, j) => turn(j));
		const want = new Set<number>();
		for (let j = 0; j < pts.length - 1; j++) {
			if (Math.max(theta[j], theta[j + 1]) > TURN_TOL && len(j) > 1e-3) want.add(j);
		}
		if (pts.length < samples) {
			const byLen = pts
				.map((_, j) => [j < pts.length - 1 ? len(j) : -1, j])
				.sort((x, y) => y[0] - x[0]);
			for (const [l, j] of byLen) {
				if (pts.length + want.size >= samples) break;
				if (l > 0) want.add(j);
			}
		}
		if (want.size === 0) break;
		const room = cap - pts.length;
		const chosen = [...want].sort((x, y) => len(y) - len(x)).slice(0, room);
		const mark = new Set(chosen);
		const next: SP[] = [];
		for (let j = 0; j < pts.length; j++) {
			next.push(pts[j]);
			if (mark.has(j)) next.push(...split(j, 1));
		}
		pts.length = 0;
		pts.push(...next);
		renorm();
	}
	return pts;
}

/** Boundary work w = ∫P dv along the leg, J/kg (isothermal, isentropic, polytropic legs). */
function integrals(curve: Curve, pieces: Piece[], sampled: SP[]): number {
	let w = 0;
	pieces.forEach((pc, i) => {
		if (pc.from === pc.to) return;
		const mine = sampled.filter((s) => s.piece === i);
		const guess = (t: number) => {
			let best = mine[0].c,
				d = Infinity;
			for (const s of mine) {
				const e = Math.abs(s.t - t);
				if (e < d) {
					d = e;
					best = s.c;
				}
			}
			return best;
		};
		const Pv = (c: CPt) => c.P / c.rho;
		if (pc.seg.dome && curve.process === 'isothermal') {
			w += pc.A.P * (1 / pc.B.rho - 1 / pc.A.rho);
			return;
		}
		let scaleAbs = 0;
		for (const s of mine) scaleAbs = Math.max(scaleAbs, Math.abs(Pv(s.c)));
		const f = (t: number) => curve.integrand(pc.seg, t, guess(t));
		if (pc.seg.dome && curve.process === 'isentropic') {
			let dPsv = 0;
			for (const s of mine) dPsv = Math.max(dPsv, Math.abs(s.c.P / s.c.rho / s.c.T));
			const ws = integrate(f, pc.from, pc.to, 1e-10, 1e-9 * dPsv * Math.abs(pc.to - pc.from)).value;
			w += Pv(pc.B) - Pv(pc.A) + ws;
			return;
		}
		w += integrate(f, pc.from, pc.to, 1e-10, 1e-9 * scaleAbs * Math.abs(pc.to - pc.from)).value;
	});
	return w;
}

export { paramOf };
