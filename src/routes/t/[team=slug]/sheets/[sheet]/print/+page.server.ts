import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireTeam } from '$lib/server/guard';
import { isAppError } from '$lib/server/errors';
import { printPageData, revisionParam, sheetContext } from '$lib/server/review-pages';

// The print view (A4 or Letter, for "print to PDF"): ?rev=N or ?rev=draft (default: the newest revision).
export const load: PageServerLoad = async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	try {
		const ctx = await sheetContext(getDb(), access, event.params.sheet);
		const rev = revisionParam(event.url.searchParams.get('rev'), ctx.latest?.number ?? null);
		return {
			...(await printPageData(getDb(), access, event.params.sheet, rev)),
			paper:
				event.url.searchParams.get('paper') === 'letter' ? ('letter' as const) : ('a4' as const)
		};
	} catch (e) {
		if (isAppError(e)) error(e.status, { code: e.code, message: e.message });
		throw e;
	}
};
