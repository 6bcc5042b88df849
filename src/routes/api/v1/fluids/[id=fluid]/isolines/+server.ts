import type { RequestHandler } from './$types';
import { ISOLINE_WEIGHT } from '$lib/compute-limits';
import { chargeWork, computeGet, JsonText, readQuery } from '$lib/server/compute/http';
import { fluidFromParam } from '$lib/server/compute/fluids';
import { compute } from '$lib/server/compute/pool';
import { isolineQuerySchema } from '$lib/server/compute/schemas';
import type { IsolineKind } from '$lib/server/compute/tasks';

/**
 * Background isobars, isotherms, isochores, isentropes, isenthalps or quality lines (SI values)
 * across the drawable range, through the dome; every point carries T, P, v, h and s.
 */
export const GET: RequestHandler = computeGet(async (event) => {
	const fluid = fluidFromParam(event.params.id);
	const q = readQuery(event.url, isolineQuerySchema);
	const line = q.kind as IsolineKind;
	await chargeWork(event, q.values.length * q.points * (ISOLINE_WEIGHT[line] ?? 1));
	return new JsonText(
		await compute({ kind: 'isolines', fluid: fluid.id, line, values: q.values, points: q.points })
	);
});
