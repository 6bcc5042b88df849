import type { RequestHandler } from './$types';
import { fixState, stateExtras, transport } from '$lib/thermo';
import { computePost, readBody } from '$lib/server/compute/http';
import { stateRequestSchema } from '$lib/server/compute/schemas';

/**
 * A state from two properties: { state } per docs/compute-api.md, plus superheat/subcooling and volume
 * fractions, and its transport properties (viscosity, conductivity, Prandtl number, surface tension,
 * each null with a reason where absent); `hint`, `near` and `window` choose among several states.
 */
export const POST: RequestHandler = computePost(async ({ request }) => {
	const body = await readBody(request, stateRequestSchema);
	const state = fixState(body.fluid, body.inputs, {
		hint: body.hint,
		near: body.near,
		window: body.window
	});
	return { state, extras: stateExtras(state), transport: transport(state) };
});
