import type { RequestHandler } from './$types';
import { chargeWork, computePost, JsonText, readBody } from '$lib/server/compute/http';
import { compute } from '$lib/server/compute/pool';
import { pathPoints, pathRequestSchema } from '$lib/server/compute/schemas';

/**
 * A whole path (PathSpec → PathResult): states (each with its transport properties), legs with
 * totals, cycle, design-limit events, warnings. The legs' points carry no transport properties: at
 * ~4 µs a state they would add about half the CPU of a leg, and their reasons and sources to every
 * point of every drag answer (bench/transport.bench.ts).
 */
export const POST: RequestHandler = computePost(async (event) => {
	const spec = await readBody(event.request, pathRequestSchema);
	await chargeWork(event, pathPoints(spec));
	return new JsonText(await compute({ kind: 'path', spec }));
});
