/**
 * Finding a leg's end on its process curve: the direction in which the target comes nearer, a scan
 * along the curve's segments (both ways unless the target is monotone along the process), regula
 * falsi (Illinois) on the bracket, and the refusal naming the range the leg does reach.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import type { Process, TargetName } from '../types.ts';
import { Curve, type CPt, type Invariant, type Segment } from './leg-curve.ts';
import { PROCESS_CURVES } from './leg-processes.ts';
import { TARGET_UNIT } from './leg-spec.ts';

/** A place on the curve: segment, parameter and point; `crossing` when it sits on crossing i. */
export interface Pos {
	seg: number;
	t: number;
	p: CPt;
	crossing: number | null;
	/** segments entered before reaching it plus the fraction of the last (for "nearer") */
	dist: number;
}

export function valueOf(c: CPt, key: TargetName): number {
	switch (key) {
		case 'v':
			return 1 / c.rho;
		case 'x':
			return c.x ?? NaN;
		default:
			return c[key];
	}
}

export function unreachable(
	fl: Fluid,
	process: Process,
	inv: Invariant,
	n: number | undefined,
	key: TargetName,
	value: number,
	range: { lo: number; hi: number }
): ThermoError {
	const where = `This ${process} leg ${PROCESS_CURVES[process].describe(inv, n)}`;
	if (key === 'x' && !(range.hi >= range.lo))
		return new ThermoError(
			'unreachable-target',
			`${where} never enters the vapor dome of ${fl.id}, so it never has a quality.`,
			'Give the end by T, P, v, u, h or s instead, or choose a process that crosses the dome.'
		);
	const u = TARGET_UNIT[key] ? ` ${TARGET_UNIT[key]}` : '';
	return new ThermoError(
		'unreachable-target',
		`${where} never reaches ${key} = ${fmt(value)}${u}: within the range of the ${fl.data.formulation.name} formulation it reaches ${key} from ${fmt(range.lo)} to ${fmt(range.hi)}${u}${key === 'x' ? ' (on its way through the vapor dome)' : ''}.`,
		`Give a target ${key} from ${fmt(range.lo)} to ${fmt(range.hi)}${u}, or another process.`
	);
}

/** The direction in which F moves toward zero at the start (1 if it cannot tell). */
export function preferredDirection(
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

export function isMonotone(process: Process, key: TargetName): boolean {
	return MONOTONE[process].includes(key);
}

/**
 * Walk the curve from the start in direction dir (segments entered ≤ maxSegs), sampling F on each
 * segment; return the first place where F reaches zero, refined by regula falsi (Illinois).
 */
export function scan(
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
export function refine(
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
