import type { Point, Rect } from './types';

/**
 * Label placement that keeps value labels off the path. Everything is in screen px of the plot;
 * no DOM: widths come from `textWidth`, an estimate good enough for monospaced and Plex Sans text.
 */

/** Approximate rendered width: JetBrains Mono advances 0.6 em; IBM Plex Sans averages ~0.55 em. */
export function textWidth(text: string, fontSize: number, mono = true): number {
	return [...text].length * fontSize * (mono ? 0.6 : 0.55);
}

export function rectsOverlap(a: Rect, b: Rect): boolean {
	return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

export function inflate(r: Rect, by: number): Rect {
	return { x: r.x - by, y: r.y - by, width: r.width + 2 * by, height: r.height + 2 * by };
}

/**
 * Clip segment a→b to a rectangle (Liang–Barsky). Returns the visible part or null.
 */
export function clipSegment(a: Point, b: Point, r: Rect): [Point, Point] | null {
	const dx = b.x - a.x;
	const dy = b.y - a.y;
	let t0 = 0;
	let t1 = 1;
	const edges: [number, number][] = [
		[-dx, a.x - r.x],
		[dx, r.x + r.width - a.x],
		[-dy, a.y - r.y],
		[dy, r.y + r.height - a.y]
	];
	for (const [p, q] of edges) {
		if (p === 0) {
			if (q < 0) return null;
		} else {
			const t = q / p;
			if (p < 0) {
				if (t > t1) return null;
				if (t > t0) t0 = t;
			} else {
				if (t < t0) return null;
				if (t < t1) t1 = t;
			}
		}
	}
	return [
		{ x: a.x + t0 * dx, y: a.y + t0 * dy },
		{ x: a.x + t1 * dx, y: a.y + t1 * dy }
	];
}

/** The visible runs of a polyline inside a rectangle, each a polyline starting/ending on the border where cut. */
export function clipPolyline(line: readonly Point[], r: Rect): Point[][] {
	const runs: Point[][] = [];
	let run: Point[] | null = null;
	for (let i = 1; i < line.length; i++) {
		const seg = clipSegment(line[i - 1], line[i], r);
		if (!seg) {
			run = null;
			continue;
		}
		const [p, q] = seg;
		const continues =
			run !== null &&
			run.length > 0 &&
			Math.hypot(run[run.length - 1].x - p.x, run[run.length - 1].y - p.y) < 1e-9;
		if (!continues) {
			run = [p];
			runs.push(run);
		}
		run!.push(q);
	}
	return runs.filter((r) => r.length >= 2);
}

function polylineHits(line: readonly Point[], r: Rect): boolean {
	for (let i = 1; i < line.length; i++) if (clipSegment(line[i - 1], line[i], r)) return true;
	return false;
}

/**
 * A uniform grid of the path's segments and boxes (state discs, crossing marks, placed labels),
 * so a label box is tested only against what lies near it.
 */
export class ObstacleIndex {
	private cells = new Map<string, { segs: [Point, Point][]; boxes: Rect[] }>();
	constructor(private readonly cell = 32) {}

	private *keys(r: Rect) {
		const c = this.cell;
		for (let i = Math.floor(r.x / c); i <= Math.floor((r.x + r.width) / c); i++)
			for (let j = Math.floor(r.y / c); j <= Math.floor((r.y + r.height) / c); j++)
				yield `${i},${j}`;
	}

	private bucket(k: string) {
		let b = this.cells.get(k);
		if (!b) {
			b = { segs: [], boxes: [] };
			this.cells.set(k, b);
		}
		return b;
	}

	addSegment(a: Point, b: Point): void {
		const box = {
			x: Math.min(a.x, b.x),
			y: Math.min(a.y, b.y),
			width: Math.abs(a.x - b.x),
			height: Math.abs(a.y - b.y)
		};
		for (const k of this.keys(box)) this.bucket(k).segs.push([a, b]);
	}

	/**
	 * Index a polyline. With `clip`, only its parts inside that rectangle (grown by 8 px) are kept:
	 * a zoomed chart projects lines far outside the plot, and those cannot touch a label.
	 */
	addPolyline(points: readonly Point[], clip?: Rect): void {
		const finite = points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
		const runs = clip ? clipPolyline(finite, inflate(clip, 8)) : [finite];
		for (const run of runs)
			for (let i = 1; i < run.length; i++) this.addSegment(run[i - 1], run[i]);
	}

	addBox(r: Rect): void {
		for (const k of this.keys(r)) this.bucket(k).boxes.push(r);
	}

	/** Whether anything indexed touches the rectangle. */
	hits(r: Rect): boolean {
		for (const k of this.keys(r)) {
			const b = this.cells.get(k);
			if (!b) continue;
			for (const box of b.boxes) if (rectsOverlap(box, r)) return true;
			for (const [p, q] of b.segs) if (clipSegment(p, q, r)) return true;
		}
		return false;
	}
}

export interface LabelRequest {
	id: string;
	width: number;
	height: number;
	/** the labelled line in plot px */
	line: readonly Point[];
	/** which visible end to try first (default 'end': where the line leaves the plot last) */
	prefer?: 'end' | 'start';
	/** points to try before the edges (e.g. above a curve's flat stretch) */
	anchors?: readonly Point[];
	/** further lines this label must not touch (e.g. the other design limits) */
	avoid?: readonly (readonly Point[])[];
}

export interface LabelPlacement {
	id: string;
	box: Rect;
	/** the point on the line the label belongs to */
	anchor: Point;
}

export interface PlaceOptions {
	/** how far along the line from its visible end a label may slide, px */
	maxSlide?: number;
	/** slide step, px */
	step?: number;
	/** clearance kept around each label, px */
	pad?: number;
	/** how far a label box may sit from the point of its line it belongs to, px */
	maxGap?: number;
}

function pointsAlong(run: readonly Point[], step: number, maxSlide: number): Point[] {
	const out: Point[] = [run[0]];
	let travelled = 0;
	let next = step;
	for (let i = 1; i < run.length && travelled < maxSlide; i++) {
		const a = run[i - 1];
		const b = run[i];
		const len = Math.hypot(b.x - a.x, b.y - a.y);
		while (next <= travelled + len && next <= maxSlide) {
			const t = (next - travelled) / len;
			out.push({ x: a.x + t * (b.x - a.x), y: a.y + t * (b.y - a.y) });
			next += step;
		}
		travelled += len;
	}
	return out;
}

function clampBox(x: number, y: number, w: number, h: number, plot: Rect): Rect {
	const right = plot.x + plot.width;
	const bottom = plot.y + plot.height;
	return {
		x: Math.min(Math.max(x, plot.x + 2), right - w - 2),
		y: Math.min(Math.max(y, plot.y + 2), bottom - h - 2),
		width: w,
		height: h
	};
}

/**
 * Label boxes for an anchor, best first: tucked inside the plot edge the line crosses (beside the
 * line), else above and right of the point; then the mirror spot (other side of the line).
 */
export function boxesAt(p: Point, w: number, h: number, plot: Rect): [Rect, Rect] {
	const e = 0.75;
	const right = plot.x + plot.width;
	const bottom = plot.y + plot.height;
	const above = p.y - h - 3;
	const below = p.y + 3;
	const after = p.x + 4 + w > right - 2 ? p.x - 4 - w : p.x + 4;
	const before = p.x - 4 - w < plot.x + 2 ? p.x + 4 : p.x - 4 - w;
	if (Math.abs(p.y - plot.y) < e)
		return [clampBox(after, plot.y + 3, w, h, plot), clampBox(before, plot.y + 3, w, h, plot)];
	if (Math.abs(p.y - bottom) < e)
		return [
			clampBox(after, bottom - h - 3, w, h, plot),
			clampBox(before, bottom - h - 3, w, h, plot)
		];
	if (Math.abs(p.x - right) < e)
		return [clampBox(right - w - 3, above, w, h, plot), clampBox(right - w - 3, below, w, h, plot)];
	if (Math.abs(p.x - plot.x) < e)
		return [clampBox(plot.x + 3, above, w, h, plot), clampBox(plot.x + 3, below, w, h, plot)];
	const primary = clampBox(after, above < plot.y + 2 ? below : above, w, h, plot);
	return [primary, clampBox(after, above < plot.y + 2 ? above : below, w, h, plot)];
}

/** Distance from a point to a rectangle (0 inside). */
export function distanceToRect(p: Point, r: Rect): number {
	const dx = Math.max(r.x - p.x, 0, p.x - (r.x + r.width));
	const dy = Math.max(r.y - p.y, 0, p.y - (r.y + r.height));
	return Math.hypot(dx, dy);
}

/**
 * Every box tried for an anchor, best first: the two of `boxesAt`, then the other corners and the
 * spots straight above and below the point. Boxes the plot edge pushed further than `maxGap` px from
 * the anchor are dropped — a label that far away no longer reads as its line's.
 */
export function candidateBoxes(p: Point, w: number, h: number, plot: Rect, maxGap = 8): Rect[] {
	const [a, b] = boxesAt(p, w, h, plot);
	const more = [
		clampBox(p.x + 4, p.y - h - 3, w, h, plot),
		clampBox(p.x + 4, p.y + 3, w, h, plot),
		clampBox(p.x - 4 - w, p.y - h - 3, w, h, plot),
		clampBox(p.x - 4 - w, p.y + 3, w, h, plot),
		clampBox(p.x - w / 2, p.y - h - 3, w, h, plot),
		clampBox(p.x - w / 2, p.y + 3, w, h, plot)
	];
	const out: Rect[] = [];
	for (const r of [a, b, ...more]) {
		if (distanceToRect(p, r) > maxGap) continue;
		if (out.some((o) => o.x === r.x && o.y === r.y)) continue;
		out.push(r);
	}
	return out;
}

/** The preferred label box for an anchor (see `boxesAt`). */
export function boxAt(p: Point, w: number, h: number, plot: Rect): Rect {
	return boxesAt(p, w, h, plot)[0];
}

/**
 * Place one label per request at its preferred anchors if any, else at the edge where its line
 * leaves the plot, sliding inward along the line, then trying the line's other visible end, until the box (with `pad` clearance)
 * touches nothing in `obstacles` nor an earlier label. Requests are placed in order (put the
 * important ones first); a label with no free spot is left out rather than drawn over the path.
 * Placed labels are added to `obstacles`.
 */
export function placeEdgeLabels(
	requests: readonly LabelRequest[],
	plot: Rect,
	obstacles: ObstacleIndex,
	options: PlaceOptions = {}
): LabelPlacement[] {
	const step = options.step ?? 10;
	const maxSlide = options.maxSlide ?? 160;
	const pad = options.pad ?? 2;
	const maxGap = options.maxGap ?? 8;
	const placed: LabelPlacement[] = [];
	for (const req of requests) {
		const runs = clipPolyline(req.line, plot);
		if (!runs.length) continue;
		const endRun = [...runs[runs.length - 1]].reverse();
		const startRun = runs[0];
		const edges = req.prefer === 'start' ? [startRun, endRun] : [endRun, startRun];
		const inside = (p: Point) =>
			p.x >= plot.x && p.x <= plot.x + plot.width && p.y >= plot.y && p.y <= plot.y + plot.height;
		const order = [
			(req.anchors ?? []).filter(inside),
			...edges.map((run) => pointsAlong(run, step, maxSlide))
		];
		// its own line, indexed once: each candidate box is then tested against the few segments near it
		const own = new ObstacleIndex(32);
		own.addPolyline(req.line, plot);
		let done = false;
		for (const candidates of order) {
			for (const p of candidates) {
				const box = candidateBoxes(p, req.width, req.height, plot, maxGap).find((b) => {
					const padded = inflate(b, pad);
					// never struck through by its own line, nor touching anything else
					return (
						insidePlot(b, plot) &&
						!own.hits(padded) &&
						!obstacles.hits(padded) &&
						!req.avoid?.some((line) => polylineHits(line, padded))
					);
				});
				if (!box) continue;
				placed.push({ id: req.id, box, anchor: p });
				obstacles.addBox(box);
				done = true;
				break;
			}
			if (done) break;
		}
	}
	return placed;
}

function insidePlot(b: Rect, plot: Rect, inset = 2): boolean {
	return (
		b.x >= plot.x + inset - 1e-9 &&
		b.y >= plot.y + inset - 1e-9 &&
		b.x + b.width <= plot.x + plot.width - inset + 1e-9 &&
		b.y + b.height <= plot.y + plot.height - inset + 1e-9
	);
}

/**
 * A small label beside a point (the critical point's "c.p."): up-right, down-right, up-left,
 * down-left, the first spot that is inside the plot and free. Null when none is.
 */
export function placeNear(
	p: Point,
	w: number,
	h: number,
	plot: Rect,
	obstacles: ObstacleIndex,
	gap = 5
): Rect | null {
	// the four corners first, then straight above, below, right and left; each a little further out if taken
	const spots: Point[] = [];
	for (const g of [gap, gap + 4, gap + 9])
		spots.push(
			{ x: p.x + g, y: p.y - h - g },
			{ x: p.x + g, y: p.y + g },
			{ x: p.x - w - g, y: p.y - h - g },
			{ x: p.x - w - g, y: p.y + g },
			{ x: p.x - w / 2, y: p.y - h - g },
			{ x: p.x - w / 2, y: p.y + g },
			{ x: p.x + g, y: p.y - h / 2 },
			{ x: p.x - w - g, y: p.y - h / 2 }
		);
	for (const s of spots) {
		const box = { x: s.x, y: s.y, width: w, height: h };
		if (insidePlot(box, plot) && !obstacles.hits(inflate(box, 1))) {
			obstacles.addBox(box);
			return box;
		}
	}
	return null;
}

/**
 * Anchors above the right part of a polyline's longest level stretch (|Δy| ≤ 1 px per segment),
 * where a label reads as belonging to that curve: a limit isobar's run across the dome on T–v,
 * a limit isotherm's on P–v. Ordered right to left (just the stretch's left end when the label is
 * longer than the stretch); empty when no stretch is as long as `minLength` px.
 */
export function levelAnchors(
	line: readonly Point[],
	width: number,
	step = 12,
	minLength = 48
): Point[] {
	let best: [number, number] | null = null;
	let i = 0;
	while (i < line.length - 1) {
		let j = i;
		while (j < line.length - 1 && Math.abs(line[j + 1].y - line[j].y) <= 1) j++;
		if (j > i) {
			const len = Math.abs(line[j].x - line[i].x);
			if (!best || len > Math.abs(line[best[1]].x - line[best[0]].x)) best = [i, j];
		}
		i = j + 1;
	}
	if (!best) return [];
	const a = line[best[0]];
	const b = line[best[1]];
	const left = Math.min(a.x, b.x);
	const right = Math.max(a.x, b.x);
	if (right - left < minLength) return [];
	const y = (a.y + b.y) / 2;
	const out: Point[] = [];
	for (let x = right - width - 8; x >= left; x -= step) out.push({ x, y });
	return out.length ? out : [{ x: left, y }];
}

/** What a chart's labels must keep off, in screen px. */
export interface LabelScene {
	plot: Rect;
	/** every drawn line: the dome, the triple line, design limits, measured traces */
	lines: readonly (readonly Point[])[];
	/**
	 * background hairlines (isolines): design-limit and `c.p.` labels may sit over them, and the
	 * chart then leaves a gap in them under the label (`masks`); isoline labels keep off them
	 */
	background?: readonly (readonly Point[])[];
	/** the path's legs */
	path: readonly (readonly Point[])[];
	/** marks drawn as boxes: state discs, crossing diamonds, the critical point's circle */
	marks: readonly Rect[];
}

export interface SceneLabels {
	/** design-limit labels: placed first, free to slide the whole length of their line */
	limits: readonly LabelRequest[];
	/** one label beside a point (the critical point's "c.p."), or none */
	near?: { point: Point; width: number; height: number } | null;
	/** isoline value labels: at the edge where their line leaves the plot, sliding inward */
	edges: readonly LabelRequest[];
}

export interface ScenePlacement {
	limits: LabelPlacement[];
	near: Rect | null;
	edges: LabelPlacement[];
	/** where the background lines are cut away: each limit and `c.p.` label box grown by `pad` */
	masks: Rect[];
}

/**
 * The chart's label placer, used by the on-screen chart and so by every export of its drawing:
 * each label box lands inside the plot (2 px in from the frame), touching no line, no leg, no mark
 * and no other label (with `pad` px to spare), its own line included; a label with no such spot
 * near its line is left out. Design-limit and `c.p.` labels outrank the background isolines: they
 * may be placed over them, and the returned `masks` say where the chart must cut those lines.
 */
export function placeChartLabels(scene: LabelScene, labels: SceneLabels, pad = 2): ScenePlacement {
	const obstacles = new ObstacleIndex(32);
	for (const line of scene.lines) obstacles.addPolyline(line, scene.plot);
	for (const leg of scene.path) obstacles.addPolyline(leg, scene.plot);
	for (const m of scene.marks) obstacles.addBox(m);
	// limits and c.p. first, over the background hairlines (which are then cut under them)
	const limits = placeEdgeLabels(labels.limits, scene.plot, obstacles, {
		maxSlide: scene.plot.width + scene.plot.height,
		step: 8,
		pad
	});
	const near = labels.near
		? placeNear(labels.near.point, labels.near.width, labels.near.height, scene.plot, obstacles)
		: null;
	const masks = [...limits.map((l) => inflate(l.box, pad)), ...(near ? [inflate(near, pad)] : [])];
	// isoline labels keep off every line, background included
	for (const line of scene.background ?? []) obstacles.addPolyline(line, scene.plot);
	const edges = placeEdgeLabels(labels.edges, scene.plot, obstacles, { pad, step: 6 });
	return { limits, near, edges, masks };
}
