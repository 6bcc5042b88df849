import type { RequestHandler } from './$types';
import { SAMPLES_DEFAULT } from '$lib/thermo';
import { chargeWork, computePost, JsonText, readBody } from '$lib/server/compute/http';
import { compute } from '$lib/server/compute/pool';
import { legRequestSchema } from '$lib/server/compute/schemas';

/**
 * One process leg from a start state to a target: { leg } per docs/compute-api.md; startHint /
 * startNear choose the start, endHint / endNear the end, and window bounds both.
 */
export const POST: RequestHandler = computePost(async (event) => {
	const b = await readBody(event.request, legRequestSchema);
	await chargeWork(event, b.samples ?? SAMPLES_DEFAULT);
	const spec = {
		fluid: b.fluid,
		start: b.start,
		process: b.process,
		target: b.target,
		n: b.n,
		samples: b.samples,
		startHint: b.startHint,
		startNear: b.startNear,
		endHint: b.endHint,
		endNear: b.endNear,
		window: b.window
	};
	return new JsonText(await compute({ kind: 'leg', spec }));
});
