import type { RequestHandler } from './$types';
import { computeLeg, type Process } from '$lib/thermo';
import { computePost, readBody } from '$lib/server/compute/http';
import { legRequestSchema } from '$lib/server/compute/schemas';

/** One process leg from a start state to a target: { leg } per API.md. */
export const POST: RequestHandler = computePost(async ({ request }) => {
	const b = await readBody(request, legRequestSchema);
	return { leg: computeLeg({ fluid: b.fluid, start: b.start, process: b.process as Process, target: b.target, n: b.n, samples: b.samples }) };
});
