import type { PathResult, State } from '$lib/thermo/types';

/*
 * A computed path's leg points (every point a full state: most of a path's size) travel apart
 * from the rest of the path on the sheet page: the page's HTML carries the states, the legs and
 * their totals (what the table, the warnings and a reader without scripts need), and names the
 * URL of the legs' points, which the browser fetches once and keeps (immutable: the URL changes
 * with the draft's content).
 */

/** Where the legs' points of a page's first paint are. */
export interface LegPointsRef {
	url: string;
	/** how many legs they are for */
	legs: number;
}

/** The answer under a LegPointsRef: the points of each leg, in the path's order. */
export interface LegPoints {
	points: State[][];
}

/** The path with every leg's points left out (`points: []`); nothing else changes. */
export function withoutLegPoints(result: PathResult): PathResult {
	return {
		...result,
		legs: result.legs.map((l) => ({ ...l, leg: { ...l.leg, points: [] } }))
	};
}

/** Each leg's points, in the path's order. */
export function legPointsOf(result: PathResult): LegPoints {
	return { points: result.legs.map((l) => l.leg.points) };
}

/** The path with its legs' points put back; null when they are not for these legs (another count, an empty leg). */
export function withLegPoints(result: PathResult, got: LegPoints): PathResult | null {
	const points = got?.points;
	if (!Array.isArray(points) || points.length !== result.legs.length) return null;
	if (points.some((p) => !Array.isArray(p) || p.length === 0)) return null;
	return {
		...result,
		legs: result.legs.map((l, i) => ({ ...l, leg: { ...l.leg, points: points[i] } }))
	};
}
