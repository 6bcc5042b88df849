import type { Point } from './types';

/**
 * Screen offsets for state discs that would sit on one another. A closed cycle ends where it
 * started, so its last state (S5) lands exactly on its first (S1) and hid it; a state whose disc
 * centre lies within `radius` px of an earlier one is moved to the right beside it (one disc width
 * plus a gap per earlier state there), so both labels show. The first of a stack stays on its point.
 * Offsets are for drawing and picking only: the state keeps its coordinates.
 */
export function stackOffsets(
	points: readonly (Point & { id: string })[],
	radius: number,
	gap = 2
): Map<string, Point & { beside?: string }> {
	const out = new Map<string, Point & { beside?: string }>();
	const anchors: { id: string; x: number; y: number; count: number }[] = [];
	for (const p of points) {
		const a = anchors.find((q) => Math.hypot(q.x - p.x, q.y - p.y) < radius);
		if (a) {
			// `beside`: the state whose point this one shares (for its accessible name)
			out.set(p.id, { x: a.x + a.count * (2 * radius + gap) - p.x, y: a.y - p.y, beside: a.id });
			a.count += 1;
		} else {
			anchors.push({ id: p.id, x: p.x, y: p.y, count: 1 });
			out.set(p.id, { x: 0, y: 0 });
		}
	}
	return out;
}
