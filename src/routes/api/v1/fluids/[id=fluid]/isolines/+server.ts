import type { RequestHandler } from './$types';
import { ISOLINE_WEIGHT } from '$lib/compute-limits';
import { chargeWork, computeGet, JsonText, readQuery } from '$lib/server/compute/http';
import { fluidFromParam } from '$lib/server/compute/fluids';
import { compute } from '$lib/server/compute/pool';
import { AppError } from '$lib/server/errors';
import { isolineQuerySchema } from '$lib/server/compute/schemas';
import type { IsolineKind } from '$lib/server/compute/tasks';

/**
 * Background isobars, isotherms, isochores, isentropes, isenthalps or quality lines (SI values)
 * across the drawable range, through the dome; every point carries T, P, v, h and s. For water with
 * `formulation=if97` the lines by IAPWS-IF97 (if97/isolines.ts), stopping where IF97's range does.
 */
export const GET: RequestHandler = computeGet(async (event) => {
	const fluid = fluidFromParam(event.params.id);
	const q = readQuery(event.url, isolineQuerySchema);
	const line = q.kind as IsolineKind;
	if (q.formulation === 'if97' && fluid.id !== 'water')
		throw new AppError(
			400,
			'invalid-input',
			`formulation "if97" (IAPWS-IF97) is for water only; these lines are of ${fluid.id}. Leave formulation out, or ask for /api/v1/fluids/water/isolines.`
		);
	await chargeWork(event, q.values.length * q.points * (ISOLINE_WEIGHT[line] ?? 1));
	return new JsonText(
		await compute({
			kind: 'isolines',
			fluid: fluid.id,
			line,
			values: q.values,
			points: q.points,
			...(q.formulation === 'if97' && { formulation: 'if97' as const })
		})
	);
});
