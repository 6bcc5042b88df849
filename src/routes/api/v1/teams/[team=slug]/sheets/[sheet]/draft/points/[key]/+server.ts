import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { legPointsAnswer } from '$lib/server/first-paint';

/*
 * The legs' points of a sheet's working draft, as the sheet page's first paint computed them:
 *   GET …/sheets/{sheet}/draft/points/{key} → 200 { points: State[][] }   (one array per leg)
 * `key` names the draft's content (the page gives the URL), so the answer under a URL never
 * changes: `private, max-age=31536000, immutable`, a strong ETag, 304 on If-None-Match. Every
 * request checks the caller's access (404 non-members, like the sheet). Once the draft has
 * changed, an old key this process no longer keeps is a 404 `draft-changed`: compute the current
 * draft's path instead (POST /api/v1/paths), as the editor does.
 */
export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	return legPointsAnswer(
		getDb(),
		access,
		event.params.sheet,
		event.params.key,
		event.request.headers.get('if-none-match')
	);
});
