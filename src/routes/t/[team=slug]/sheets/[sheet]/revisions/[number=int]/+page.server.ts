import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireTeam } from '$lib/server/guard';
import { isAppError } from '$lib/server/errors';
import { parseRevisionNumber } from '$lib/server/revisions';
import { revisionPageData } from '$lib/server/review-pages';

// One revision, read-only: its path and table, review notes shown against it, its sign-off.
export const load: PageServerLoad = async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	try {
		return await revisionPageData(
			getDb(),
			access,
			event.params.sheet,
			parseRevisionNumber(event.params.number)
		);
	} catch (e) {
		if (isAppError(e)) error(e.status, { code: e.code, message: e.message });
		throw e;
	}
};
