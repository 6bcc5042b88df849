import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { listMembers } from '$lib/server/db/memberships';

export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	const members = await listMembers(getDb(), access.team.id);
	return {
		members: members.map((m) => ({
			id: m.user_id,
			name: m.name,
			email: m.email,
			role: m.role,
			since: m.created_at
		}))
	};
});
