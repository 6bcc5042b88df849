import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { compareRevisions, parseCompareSide } from '$lib/server/revisions';

/*
 * What changed between two revisions (or a revision and the working draft).
 *   GET ?a=1&b=2 (either may be "draft") → 200 { diff, before, after }
 *     diff: spec fields, each state's properties and each leg's q and w with differences, keyed by
 *     leg ids (src/lib/revisions/diff.ts); before/after: { label, doc, result } for drawing both.
 *   400 invalid-compare; 404 revision-not-found.
 */
export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	const a = parseCompareSide(event.url.searchParams.get('a'), 'a');
	const b = parseCompareSide(event.url.searchParams.get('b'), 'b');
	return compareRevisions(getDb(), access, event.params.sheet, a, b);
});
