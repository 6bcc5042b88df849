import { describe, expect, it } from 'vitest';
import { clipPolyline, clipSegment, inflate, levelAnchors, ObstacleIndex, placeEdgeLabels, placeNear, rectsOverlap, type LabelRequest } from './labels';
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
		const a: LabelRequest = { id: 'a', width: 60, height: 11, line: [{ x: 60, y: 200 }, { x: 600, y: 200 }] };
		const b: LabelRequest = { id: 'b', width: 60, height: 11, line: [{ x: 60, y: 204 }, { x: 600, y: 204 }] };
		const placed = placeEdgeLabels([a, b], plot, new ObstacleIndex());
		expect(placed).toHaveLength(2);
		expect(rectsOverlap(placed[0].box, placed[1].box)).toBe(false);
	});

	it('a line that never enters the plot gets no label', () => {
		expect(placeEdgeLabels([{ id: 'x', width: 20, height: 10, line: [{ x: 0, y: 0 }, { x: 10, y: 5 }] }], plot, new ObstacleIndex())).toEqual([]);
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
		const [placed] = placeEdgeLabels([{ id: 'dt', width: 100, height: 12, line, anchors: a }], plot, new ObstacleIndex());
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
		expect(levelAnchors([{ x: 0, y: 0 }, { x: 100, y: 100 }], 50)).toEqual([]);
	});
});

describe('labels avoid the other limits', () => {
	it('a label keeps off lines it is told to avoid', () => {
		const line = [{ x: 60, y: 200 }, { x: 600, y: 200 }];
		const free = placeEdgeLabels([{ id: 'a', width: 80, height: 11, line }], plot, new ObstacleIndex())[0];
		const neighbour = [{ x: 60, y: free.box.y + 4 }, { x: 600, y: free.box.y + 4 }];
		const [p] = placeEdgeLabels([{ id: 'a', width: 80, height: 11, line, avoid: [neighbour] }], plot, new ObstacleIndex());
		expect(p).toBeDefined();
		expect(touchesPolyline(inflate(p.box, 2), neighbour)).toBe(false);
	});
});
