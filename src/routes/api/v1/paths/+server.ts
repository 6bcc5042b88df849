import type { RequestHandler } from './$types';
import type { PathSpec } from '$lib/thermo';
import { chargeWork, computePost, JsonText, readBody } from '$lib/server/compute/http';
import { compute } from '$lib/server/compute/pool';
import { pathPoints, pathRequestSchema } from '$lib/server/compute/schemas';

/** A whole path (PathSpec → PathResult): states, legs with totals, cycle, design-limit events, warnings. */
export const POST: RequestHandler = computePost(async (event) => {
	const spec = await readBody(event.request, pathRequestSchema);
	chargeWork(event, pathPoints(spec));
	return new JsonText(await compute({ kind: 'path', spec: spec as PathSpec }));
});
