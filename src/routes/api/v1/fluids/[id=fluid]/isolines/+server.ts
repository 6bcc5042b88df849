import type { RequestHandler } from './$types';
import { isolines, ISOLINE_UNITS } from '$lib/thermo';
import { ISOLINE_WEIGHT } from '$lib/compute-limits';
import { chargeWork, computeGet, readQuery } from '$lib/server/compute/http';
import { fluidFromParam } from '$lib/server/compute/fluids';
import { isolineQuerySchema } from '$lib/server/compute/schemas';

/**
 * Background isobars, isotherms, isochores, isentropes, isenthalps or quality lines (SI values)
 * across the drawable range, through the dome; every point carries T, P, v, h and s.
 */
export const GET: RequestHandler = computeGet((event) => {
	const fluid = fluidFromParam(event.params.id);
	const q = readQuery(event.url, isolineQuerySchema);
	const kind = q.kind as keyof typeof ISOLINE_UNITS;
	chargeWork(event, q.values.length * q.points * (ISOLINE_WEIGHT[kind] ?? 1));
	return {
		fluid: fluid.id,
		kind,
		unit: ISOLINE_UNITS[kind],
		lines: isolines(fluid.id, kind, q.values, q.points)
	};
});
