import type { RequestHandler } from './$types';
import { computePath, type PathSpec } from '$lib/thermo';
import { chargeWork, computePost, readBody } from '$lib/server/compute/http';
import { pathPoints, pathRequestSchema } from '$lib/server/compute/schemas';

/** A whole path (PathSpec → PathResult): states, legs with totals, cycle, design-limit events, warnings. */
export const POST: RequestHandler = computePost(async (event) => {
	const spec = await readBody(event.request, pathRequestSchema);
	await chargeWork(event, pathPoints(spec));
	return { path: computePath(spec as PathSpec) };
});
