import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
	clipPolyline,
	clipSegment,
	distanceToRect,
	inflate,
	levelAnchors,
	ObstacleIndex,
	placeChartLabels,
	placeEdgeLabels,
	placeNear,
	rectsOverlap,
	type LabelRequest
} from './labels';
import type { Point, Rect } from './types';

const plot: Rect = { x: 50, y: 20, width: 400, height: 300 };

function touchesPolyline(box: Rect, line: Point[]): boolean {
	for (let i = 1; i < line.length; i++) if (clipSegment(line[i - 1], line[i], box)) return true;
	return false;
}

describe('clipping', () => {
	it('clips a segment to the rectangle, or returns null', () => {
		const c = clipSegment({ x: 0, y: 100 }, { x: 600, y: 100 }, plot)!;
		expect(c[0]).toEqual({ x: 50, y: 100 });
		expect(c[1]).toEqual({ x: 450, y: 100 });
		expect(clipSegment({ x: 0, y: 0 }, { x: 40, y: 10 }, plot)).toBeNull();
	});

	it('splits a polyline into visible runs', () => {
		const runs = clipPolyline(
			[
				{ x: 0, y: 100 },
				{ x: 100, y: 100 },
				{ x: 100, y: 0 },
				{ x: 200, y: 0 },
				{ x: 200, y: 100 },
				{ x: 300, y: 100 }
			],
			plot
		);
		expect(runs).toHaveLength(2);
		expect(runs[0][0]).toEqual({ x: 50, y: 100 });
		expect(runs[1][runs[1].length - 1]).toEqual({ x: 300, y: 100 });
	});
});

describe('edge labels avoid the path', () => {
	const isobar = [
		{ x: 60, y: 250 },
		{ x: 300, y: 250 },
		{ x: 600, y: 50 }
	]; // leaves through the right edge
	const req: LabelRequest = { id: 'p1', width: 60, height: 11, line: isobar };

	it('sits at the plot edge where its line leaves, inside the plot', () => {
		const [p] = placeEdgeLabels([req], plot, new ObstacleIndex());
		expect(p.box.x + p.box.width).toBeCloseTo(plot.x + plot.width - 3, 6);
		expect(p.box.y).toBeGreaterThanOrEqual(plot.y);
		expect(p.box.y + p.box.height).toBeLessThanOrEqual(plot.y + plot.height);
	});

	it('slides along its line when the path is in the way, and never covers the path', () => {
		const free = placeEdgeLabels([req], plot, new ObstacleIndex())[0];
		const obstacles = new ObstacleIndex();
		// a leg running right through the free spot
		const leg = [
			{ x: free.box.x - 20, y: free.box.y - 10 },
			{ x: free.box.x + free.box.width + 20, y: free.box.y + free.box.height + 10 }
		];
		obstacles.addPolyline(leg);
		const [p] = placeEdgeLabels([req], plot, obstacles);
		expect(p).toBeDefined();
		expect(touchesPolyline(inflate(p.box, 2), leg)).toBe(false);
		expect(p.box).not.toEqual(free.box);
	});

	it('keeps clear of state discs', () => {
		const free = placeEdgeLabels([req], plot, new ObstacleIndex())[0];
		const obstacles = new ObstacleIndex();
		const disc = { x: free.box.x + 10, y: free.box.y - 5, width: 20, height: 20 };
		obstacles.addBox(disc);
		const [p] = placeEdgeLabels([req], plot, obstacles);
		expect(rectsOverlap(p.box, disc)).toBe(false);
	});

	it('is left out when no spot near either end is free', () => {
		const obstacles = new ObstacleIndex();
		obstacles.addBox(plot); // the path covers everything
		expect(placeEdgeLabels([req], plot, obstacles)).toEqual([]);
	});

	it('labels do not overlap each other', () => {
		const a: LabelRequest = {
			id: 'a',
			width: 60,
			height: 11,
			line: [
				{ x: 60, y: 200 },
				{ x: 600, y: 200 }
			]
		};
		const b: LabelRequest = {
			id: 'b',
			width: 60,
			height: 11,
			line: [
				{ x: 60, y: 204 },
				{ x: 600, y: 204 }
			]
		};
		const placed = placeEdgeLabels([a, b], plot, new ObstacleIndex());
		expect(placed).toHaveLength(2);
		expect(rectsOverlap(placed[0].box, placed[1].box)).toBe(false);
	});

	it('a line that never enters the plot gets no label', () => {
		expect(
			placeEdgeLabels(
				[
					{
						id: 'x',
						width: 20,
						height: 10,
						line: [
							{ x: 0, y: 0 },
							{ x: 10, y: 5 }
						]
					}
				],
				plot,
				new ObstacleIndex()
			)
		).toEqual([]);
	});

	it('the critical-point label takes the first free side', () => {
		const obstacles = new ObstacleIndex();
		const p = { x: 200, y: 150 };
		obstacles.addBox({ x: 203, y: 130, width: 40, height: 18 }); // up-right taken
		const box = placeNear(p, 22, 11, plot, obstacles)!;
		expect(box.x).toBeGreaterThan(p.x);
		expect(box.y).toBeGreaterThan(p.y); // down-right
	});
});

describe('labels for curved limits', () => {
	it('prefer the curve’s level stretch, right to left', () => {
		const line = [
			{ x: 88, y: 30 },
			{ x: 89, y: 210 },
			{ x: 150, y: 210 },
			{ x: 280, y: 210.5 },
			{ x: 300, y: 250 },
			{ x: 440, y: 300 }
		];
		const a = levelAnchors(line, 100);
		expect(a[0].x).toBe(280 - 100 - 8);
		expect(a.every((p) => p.x >= 89 && Math.abs(p.y - 210) < 1)).toBe(true);
		const [placed] = placeEdgeLabels(
			[{ id: 'dt', width: 100, height: 12, line, anchors: a }],
			plot,
			new ObstacleIndex()
		);
		expect(placed.box.y + placed.box.height).toBeLessThanOrEqual(210); // above the stretch
		expect(placed.box.x).toBeGreaterThanOrEqual(89);
		expect(placed.box.x + placed.box.width).toBeLessThanOrEqual(290);
	});

	it('a label longer than the stretch starts at its left end; no level stretch, no anchors', () => {
		const short = [
			{ x: 100, y: 100 },
			{ x: 160, y: 100 },
			{ x: 200, y: 200 }
		];
		expect(levelAnchors(short, 150)).toEqual([{ x: 100, y: 100 }]);
		expect(
			levelAnchors(
				[
					{ x: 0, y: 0 },
					{ x: 100, y: 100 }
				],
				50
			)
		).toEqual([]);
	});
});

describe('labels avoid the other limits', () => {
	it('a label keeps off lines it is told to avoid', () => {
		const line = [
			{ x: 60, y: 200 },
			{ x: 600, y: 200 }
		];
		const free = placeEdgeLabels(
			[{ id: 'a', width: 80, height: 11, line }],
			plot,
			new ObstacleIndex()
		)[0];
		const neighbour = [
			{ x: 60, y: free.box.y + 4 },
			{ x: 600, y: free.box.y + 4 }
		];
		const [p] = placeEdgeLabels(
			[{ id: 'a', width: 80, height: 11, line, avoid: [neighbour] }],
			plot,
			new ObstacleIndex()
		);
		expect(p).toBeDefined();
		expect(touchesPolyline(inflate(p.box, 2), neighbour)).toBe(false);
	});
});

describe('the chart label placer (placeChartLabels)', () => {
	const near = (r: Rect, line: readonly Point[], pad: number) =>
		touchesPolyline(inflate(r, pad), line as Point[]);
	const inside = (r: Rect) =>
		r.x >= plot.x + 2 - 1e-9 &&
		r.y >= plot.y + 2 - 1e-9 &&
		r.x + r.width <= plot.x + plot.width - 2 + 1e-9 &&
		r.y + r.height <= plot.y + plot.height - 2 + 1e-9;

	it('keeps an isobar label off its own line where the line climbs steeply to the edge', () => {
		// a line that leaves the right edge going up at 60°: the usual spot above-left of the exit is crossed by it
		const line = [
			{ x: 100, y: 300 },
			{ x: 380, y: 300 },
			{ x: 460, y: 160 }
		];
		const free = placeEdgeLabels(
			[{ id: 'a', width: 60, height: 12, line }],
			plot,
			new ObstacleIndex(),
			{ maxGap: 1e9 }
		);
		const { edges } = placeChartLabels(
			{ plot, lines: [line], path: [], marks: [] },
			{ limits: [], edges: [{ id: 'a', width: 60, height: 12, line }] }
		);
		expect(edges).toHaveLength(1);
		expect(near(edges[0].box, line, 2)).toBe(false);
		expect(free).toHaveLength(1);
	});

	it('never puts the c.p. label on the dome or an isoline through the critical point', () => {
		const cp = { x: 250, y: 120 };
		const dome = [{ x: 120, y: 320 }, cp, { x: 400, y: 320 }];
		const isotherm = [
			{ x: 60, y: 120 },
			{ x: 460, y: 120 }
		]; // straight through c.p.
		const r = placeChartLabels(
			{ plot, lines: [dome, isotherm], path: [], marks: [] },
			{ limits: [], near: { point: cp, width: 22, height: 13 }, edges: [] }
		);
		expect(r.near).not.toBeNull();
		expect(near(r.near!, dome, 1) || near(r.near!, isotherm, 1)).toBe(false);
		expect(distanceToRect(cp, r.near!)).toBeLessThan(12);
	});

	it('a limit label sits beside its own rule, never far away, and is dropped when there is no room', () => {
		const rule = [
			{ x: 49, y: 60 },
			{ x: 451, y: 60 }
		];
		const r = placeChartLabels(
			{ plot, lines: [rule], path: [], marks: [] },
			{ limits: [{ id: 'dp', width: 120, height: 13, line: rule }], edges: [] }
		);
		expect(r.limits).toHaveLength(1);
		expect(distanceToRect(r.limits[0].anchor, r.limits[0].box)).toBeLessThanOrEqual(8);
		expect(near(r.limits[0].box, rule, 2)).toBe(false);
		// hatching lines every 8 px leave no 13 px gap anywhere
		const hatch = Array.from({ length: 40 }, (_, i) => [
			{ x: 49, y: 20 + i * 8 },
			{ x: 451, y: 20 + i * 8 }
		]);
		const none = placeChartLabels(
			{ plot, lines: [rule, ...hatch], path: [], marks: [] },
			{ limits: [{ id: 'dp', width: 120, height: 13, line: rule }], edges: [] }
		);
		expect(none.limits).toEqual([]);
	});

	it('random scenes: every placed box is inside the plot and touches no line, leg, mark or other label (seeded)', () => {
		const pt = fc.record({
			x: fc.double({ min: 0, max: 500, noNaN: true }),
			y: fc.double({ min: 0, max: 340, noNaN: true })
		});
		const poly = fc.array(pt, { minLength: 2, maxLength: 6 });
		const box = fc.record({
			x: fc.double({ min: 40, max: 440, noNaN: true }),
			y: fc.double({ min: 10, max: 310, noNaN: true }),
			width: fc.double({ min: 4, max: 24, noNaN: true }),
			height: fc.double({ min: 4, max: 24, noNaN: true })
		});
		fc.assert(
			fc.property(
				fc.array(poly, { maxLength: 8 }),
				fc.array(poly, { maxLength: 3 }),
				fc.array(box, { maxLength: 5 }),
				fc.array(poly, { minLength: 1, maxLength: 4 }),
				fc.array(poly, { maxLength: 8 }),
				(lines, legs, marks, limitLines, isoLines) => {
					const limits = limitLines.map((line, i) => ({
						id: `l${i}`,
						width: 90,
						height: 13,
						line,
						anchors: levelAnchors(line, 90)
					}));
					const edges = isoLines.map((line, i) => ({ id: `i${i}`, width: 48, height: 12, line }));
					const r = placeChartLabels(
						{ plot, lines: [...lines, ...limitLines], background: isoLines, path: legs, marks },
						{ limits, near: { point: { x: 250, y: 150 }, width: 22, height: 13 }, edges }
					);
					const boxes = [
						...r.limits.map((p) => p.box),
						...r.edges.map((p) => p.box),
						...(r.near ? [r.near] : [])
					];
					const masked = (b: Rect) =>
						r.masks.some(
							(m) =>
								m.x <= b.x &&
								m.y <= b.y &&
								m.x + m.width >= b.x + b.width &&
								m.y + m.height >= b.y + b.height
						);
					for (const b of boxes) {
						expect(inside(b)).toBe(true);
						for (const l of [...lines, ...limitLines, ...legs])
							expect(touchesPolyline(b, l)).toBe(false);
						// a background line under a label is cut there; isoline labels never sit on one
						for (const l of isoLines) if (touchesPolyline(b, l)) expect(masked(b)).toBe(true);
						for (const m of marks) expect(rectsOverlap(b, m)).toBe(false);
					}
					for (const p of r.edges)
						for (const l of isoLines) expect(touchesPolyline(p.box, l)).toBe(false);
					for (let i = 0; i < boxes.length; i++)
						for (let j = i + 1; j < boxes.length; j++)
							expect(rectsOverlap(boxes[i], boxes[j])).toBe(false);
					for (const p of [...r.limits, ...r.edges])
						expect(distanceToRect(p.anchor, p.box)).toBeLessThanOrEqual(8 + 1e-9);
				}
			),
			{ seed: 16009, numRuns: 300 }
		);
	});
});
