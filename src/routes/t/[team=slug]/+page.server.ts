import type { PageServerLoad } from './$types';
import { getDb } from '$lib/server/db';
import { requireTeam } from '$lib/server/guard';
import { listMembers } from '$lib/server/db/memberships';

export const load: PageServerLoad = async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	const members = await listMembers(getDb(), access.team.id);
	return {
		joined: event.url.searchParams.has('joined'),
		members: members.map((m) => ({ id: m.user_id, name: m.name, role: m.role }))
	};
};
