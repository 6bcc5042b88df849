import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { deleteTrace, readTrace } from '$lib/server/traces';

/*
 * One measured trace.
 *   GET    → 200 { trace } with every point (SI: t s, P Pa absolute, T K, v m³/kg, phase, inDome)
 *   DELETE → 204 (designers, owners)
 */

export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	return { trace: await readTrace(getDb(), access, event.params.sheet, event.params.trace) };
});

export const DELETE: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'sheet:edit');
	await deleteTrace(getDb(), access, event.params.sheet, event.params.trace);
	return new Response(null, { status: 204 });
});
