import type { RequestHandler } from './$types';
import { chargeWork, computeGet, JsonText, readQuery } from '$lib/server/compute/http';
import { fluidFromParam } from '$lib/server/compute/fluids';
import { compute } from '$lib/server/compute/pool';
import { saturationQuerySchema } from '$lib/server/compute/schemas';

/** The vapor dome: saturated liquid and vapor states from the triple point toward the critical point. */
export const GET: RequestHandler = computeGet(async (event) => {
	const fluid = fluidFromParam(event.params.id);
	const q = readQuery(event.url, saturationQuerySchema);
	const points = q.points ?? 100;
	await chargeWork(event, 2 * points);
	return new JsonText(await compute({ kind: 'saturation', fluid: fluid.id, points }));
});
