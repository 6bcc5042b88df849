import type { RequestHandler } from './$types';
import { computePath, type PathSpec } from '$lib/thermo';
import { computePost, readBody } from '$lib/server/compute/http';
import { pathRequestSchema } from '$lib/server/compute/schemas';

/** A whole path (PathSpec → PathResult): states, legs with totals, cycle, design-limit events, warnings. */
export const POST: RequestHandler = computePost(async ({ request }) => {
	const spec = await readBody(request, pathRequestSchema);
	return { path: computePath(spec as PathSpec) };
});
