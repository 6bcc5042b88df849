import type { RequestHandler } from './$types';
import { fixState, stateExtras, transport } from '$lib/thermo';
import { computePost, readBody } from '$lib/server/compute/http';
import { stateRequestSchema } from '$lib/server/compute/schemas';

/**
 * A state from two properties: { state } per API.md, plus superheat/subcooling and volume fractions, and
 * its transport properties (viscosity, conductivity, Prandtl number, surface tension, each null with a reason where absent).
 */
export const POST: RequestHandler = computePost(async ({ request }) => {
	const body = await readBody(request, stateRequestSchema);
	const state = fixState(body.fluid, body.inputs, body.hint ? { hint: body.hint } : {});
	return { state, extras: stateExtras(state), transport: transport(state) };
});
