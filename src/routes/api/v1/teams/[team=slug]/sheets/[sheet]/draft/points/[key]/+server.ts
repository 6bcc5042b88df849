import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute, jsonError } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { readSheetDraft } from '$lib/server/sheets';
import { keptLegPoints, legPointsNow } from '$lib/server/first-paint';

/*
 * The legs' points of a sheet's working draft, as the sheet page's first paint computed them:
 *   GET …/sheets/{sheet}/draft/points/{key} → 200 { points: State[][] }   (one array per leg)
 * `key` names the draft's content (the page gives the URL), so the answer under a URL never
 * changes: `private, max-age=31536000, immutable`, a strong ETag, 304 on If-None-Match. Every
 * request checks the caller's access (404 non-members, like the sheet). Once the draft has
 * changed, the old key is a 404 `draft-changed`: compute the path of the current draft instead
 * (POST /api/v1/paths), as the editor does.
 */
export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	const { sheet, key } = event.params;
	let found = keptLegPoints(access.team.id, sheet, key);
	if (!found) {
		// not kept here (another app process, a restart, or evicted): the current draft's, if it is this one
		const current = await readSheetDraft(getDb(), access, sheet);
		if (current.draftKey !== key)
			return jsonError(
				404,
				'draft-changed',
				'The draft of this sheet has changed since this URL was given: compute the current draft’s path with POST /api/v1/paths, or reload the sheet page.'
			);
		found = legPointsNow(access.team.id, sheet, key, current.sheet.doc);
	}
	const headers = {
		etag: found.etag,
		'cache-control': 'private, max-age=31536000, immutable',
		vary: 'cookie, authorization'
	};
	const inm = event.request.headers.get('if-none-match');
	if (inm && inm.split(',').some((t) => t.trim() === found.etag || t.trim() === `W/${found.etag}`))
		return new Response(null, { status: 304, headers });
	return new Response(found.body, { headers: { ...headers, 'content-type': 'application/json' } });
});
