import type { RequestHandler } from './$types';
import { computePost, JsonText, readBody } from '$lib/server/compute/http';
import { compute } from '$lib/server/compute/pool';
import { stateRequestSchema } from '$lib/server/compute/schemas';

/**
 * A state from two properties: { state } per docs/compute-api.md, plus superheat/subcooling and volume
 * fractions, and its transport properties (viscosity, conductivity, Prandtl number, surface tension,
 * each null with a reason where absent); `hint`, `near` and `window` choose among several states.
 */
export const POST: RequestHandler = computePost(async ({ request }) => {
	// every field but fluid and inputs is a fixState option (tied to FixOptions: SchemasMatchEngine)
	const { fluid, inputs, ...options } = await readBody(request, stateRequestSchema);
	return new JsonText(await compute({ kind: 'state', fluid, inputs, options }));
});
