import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireTeam } from '$lib/server/guard';
import { isAppError } from '$lib/server/errors';
import { parseCompareSide } from '$lib/server/revisions';
import { comparePageData, sheetContext } from '$lib/server/review-pages';

// Two revisions (or a revision and the working draft) side by side: the diff and both paths.
// Without a or b: the newest revision against the one before it (or the draft).
export const load: PageServerLoad = async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	try {
		const q = event.url.searchParams;
		const ctx = await sheetContext(getDb(), access, event.params.sheet);
		const latest = ctx.latest?.number ?? null;
		const a = q.get('a')
			? parseCompareSide(q.get('a'), 'a')
			: latest && latest > 1
				? latest - 1
				: (latest ?? 'draft');
		const b = q.get('b')
			? parseCompareSide(q.get('b'), 'b')
			: latest && latest > 1
				? latest
				: 'draft';
		return await comparePageData(getDb(), access, event.params.sheet, a, b);
	} catch (e) {
		if (isAppError(e)) error(e.status, { code: e.code, message: e.message });
		throw e;
	}
};
