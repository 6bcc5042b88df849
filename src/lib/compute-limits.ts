/**
 * The compute API's work caps (docs/compute-limits.md), shared by the server's request schemas and
 * the browser's API client. Set from what a chart or a memo needs: the sheet page asks for 40
 * points a leg (20 while dragging), at most 50 legs, isolines of at most 9 values × 80 points and a
 * dome of 100 points; a drawn leg needs no more than a few hundred points.
 */

/** Points of one path request: legs × points per leg (each leg's samples, default 40), summed. */
export const API_PATH_POINTS_MAX = 4000;
/** Points of one isolines request: number of values (lines) × points per line × the kind's weight. */
export const API_ISOLINE_POINTS_MAX = 4000;
/**
 * What one point of each kind of line costs, in isobar points (`npm run bench:isolines`: an
 * isenthalp point takes up to four times an isobar's, a 2-D solve; the others are alike).
 */
export const ISOLINE_WEIGHT: Readonly<Record<string, number>> = {
	isobar: 1,
	isotherm: 1,
	isochore: 1,
	isentrope: 1,
	isenthalp: 4,
	quality: 1
};
/** Points of one leg request (its samples). */
export const API_SAMPLES_MAX = 1000;
/** Points per branch of the saturation dome. */
export const API_SATURATION_POINTS_MAX = 1000;
/** Points per leg when a request leaves samples out (the engine's default). */
export const DEFAULT_LEG_POINTS = 40;
/** Fewest points a leg may ask for. */
export const MIN_LEG_POINTS = 20;

interface PathPoints {
	samples?: number;
	legs: ReadonlyArray<{ samples?: number }>;
}

/** Points a path request asks for: each leg's samples (else the path's, else 40), summed. */
export function pathPoints(p: PathPoints): number {
	return p.legs.reduce((a, l) => a + (l.samples ?? p.samples ?? DEFAULT_LEG_POINTS), 0);
}

/**
 * The spec unchanged if it fits API_PATH_POINTS_MAX, else with one sample count for every leg
 * that fits (at least 20). For drawing only: a revision is computed on the server at the
 * document's own sampling.
 */
export function fitPathPoints<S extends PathPoints>(spec: S, max = API_PATH_POINTS_MAX): S {
	if (pathPoints(spec) <= max || spec.legs.length === 0) return spec;
	const samples = Math.max(MIN_LEG_POINTS, Math.floor(max / spec.legs.length));
	return { ...spec, samples, legs: spec.legs.map((l) => ({ ...l, samples: undefined })) };
}
