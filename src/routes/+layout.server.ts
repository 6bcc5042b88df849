import type { LayoutServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { listTeamsForUser } from '$lib/server/db/teams';
import { config } from '$lib/server/config';

export const load: LayoutServerLoad = async ({ locals }) => {
	if (!locals.user) return { user: null, teams: [], showOutbox: false };
	const teams = await listTeamsForUser(getDb(), locals.user.id);
	return {
		user: locals.user,
		teams: teams.map((t) => ({
			slug: t.slug,
			name: t.name,
			role: t.role,
			memberCount: Number(t.member_count)
		})),
		// the outbox holds only the signed-in person's own mail
		showOutbox: config().devTools
	};
};
