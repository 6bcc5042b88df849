import type { RequestHandler } from './$types';
import { chargeWork, computeGet, JsonText, readQuery } from '$lib/server/compute/http';
import { fluidFromParam } from '$lib/server/compute/fluids';
import { compute } from '$lib/server/compute/pool';
import { AppError } from '$lib/server/errors';
import { saturationQuerySchema } from '$lib/server/compute/schemas';

/**
 * The vapor dome: saturated liquid and vapor states from the triple point toward the critical point;
 * for water with `formulation=if97` IAPWS-IF97's dome (to 643.15 K, then its critical point).
 */
export const GET: RequestHandler = computeGet(async (event) => {
	const fluid = fluidFromParam(event.params.id);
	const q = readQuery(event.url, saturationQuerySchema);
	const points = q.points ?? 100;
	if (q.formulation === 'if97' && fluid.id !== 'water')
		throw new AppError(
			400,
			'invalid-input',
			`formulation "if97" (IAPWS-IF97) is for water only; this dome is of ${fluid.id}. Leave formulation out, or ask for /api/v1/fluids/water/saturation.`
		);
	await chargeWork(event, 2 * points);
	const formulation = q.formulation === 'if97' ? ('if97' as const) : undefined;
	return new JsonText(
		await compute({
			kind: 'saturation',
			fluid: fluid.id,
			points,
			...(formulation && { formulation })
		})
	);
});
