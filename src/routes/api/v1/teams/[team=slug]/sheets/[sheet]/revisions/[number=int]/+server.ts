import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { parseRevisionNumber, readRevision } from '$lib/server/revisions';

/*
 * One revision, read-only: GET → 200 { revision } with its document, computed path and sign-off.
 * 404 revision-not-found.
 */
export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	return {
		revision: await readRevision(
			getDb(),
			access,
			event.params.sheet,
			parseRevisionNumber(event.params.number)
		)
	};
});
