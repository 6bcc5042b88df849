import type { RequestHandler } from './$types';
import { isolines } from '$lib/thermo';
import { chargeWork, computeGet, readQuery } from '$lib/server/compute/http';
import { fluidFromParam } from '$lib/server/compute/fluids';
import { isolineQuerySchema } from '$lib/server/compute/schemas';

const UNIT = { isobar: 'Pa', isotherm: 'K', isochore: 'm³/kg' } as const;

/** Background isobars, isotherms or isochores (SI values) across the drawable range, through the dome. */
export const GET: RequestHandler = computeGet(async (event) => {
	const fluid = fluidFromParam(event.params.id);
	const q = readQuery(event.url, isolineQuerySchema);
	await chargeWork(event, q.values.length * q.points);
	const kind = q.kind as keyof typeof UNIT;
	return {
		fluid: fluid.id,
		kind,
		unit: UNIT[kind],
		lines: isolines(fluid.id, kind, q.values, q.points)
	};
});
