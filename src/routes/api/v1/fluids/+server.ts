import type { RequestHandler } from './$types';
import { listFluids } from '$lib/thermo';
import { computeGet, readQuery } from '$lib/server/compute/http';
import { noQuerySchema } from '$lib/server/compute/schemas';

/** Every fluid with its formulation, critical and triple points, limits and reference state. */
export const GET: RequestHandler = computeGet((event) => {
	readQuery(event.url, noQuerySchema);
	return { fluids: listFluids() };
});
