/**
 * A leg's pieces (one per segment of the curve between its start and end, in leg order) and the
 * points placed along them: equal steps of the curve's length on T–v and P–v with log v (and linear
 * or log P), extra points where the curve turns, exactly through each crossing.
 */
import { ThermoError } from '../errors.ts';
import { Curve, type CPt, type Segment } from './leg-curve.ts';
import type { Pos } from './leg-end.ts';
import { SAMPLES_MAX } from './leg-spec.ts';

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

export function piecesBetween(
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
