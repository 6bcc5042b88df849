import type { RequestHandler } from './$types';
import { computeLeg, SAMPLES_DEFAULT, type Process } from '$lib/thermo';
import { chargeWork, computePost, readBody } from '$lib/server/compute/http';
import { legRequestSchema } from '$lib/server/compute/schemas';

/**
 * One process leg from a start state to a target: { leg } per docs/compute-api.md; startHint /
 * startNear choose the start, endHint / endNear the end, and window bounds both.
 */
export const POST: RequestHandler = computePost(async (event) => {
	const b = await readBody(event.request, legRequestSchema);
	chargeWork(event, b.samples ?? SAMPLES_DEFAULT);
	return {
		leg: computeLeg({
			fluid: b.fluid,
			start: b.start,
			process: b.process as Process,
			target: b.target,
			n: b.n,
			samples: b.samples,
			startHint: b.startHint,
			startNear: b.startNear,
			endHint: b.endHint,
			endNear: b.endNear,
			window: b.window
		})
	};
});
