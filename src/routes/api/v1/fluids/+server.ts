import type { RequestHandler } from './$types';
import { listFluids } from '$lib/thermo';
import { computeGet, readQuery } from '$lib/server/compute/http';
import { z } from 'zod';

/** Every fluid with its formulation, critical and triple points, limits and reference state. */
export const GET: RequestHandler = computeGet((event) => {
	readQuery(event.url, z.strictObject({}, { error: 'This route takes no query parameters.' }));
	return { fluids: listFluids() };
});
