import type { RequestHandler } from './$types';
import { computePath, transport, type PathSpec } from '$lib/thermo';
import { chargeWork, computePost, readBody } from '$lib/server/compute/http';
import { pathPoints, pathRequestSchema } from '$lib/server/compute/schemas';

/**
 * A whole path (PathSpec → PathResult): states (each with its transport properties), legs with
 * totals, cycle, design-limit events, warnings. The legs' points carry no transport properties: at
 * ~4 µs a state they would add about half the CPU of a leg, and their reasons and sources to every
 * point of every drag answer (bench/transport.bench.ts).
 */
export const POST: RequestHandler = computePost(async (event) => {
	const spec = await readBody(event.request, pathRequestSchema);
	chargeWork(event, pathPoints(spec));
	const path = computePath(spec as PathSpec);
	for (const ps of path.states) ps.transport = transport(ps.state);
	return { path };
});
