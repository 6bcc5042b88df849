import type { RequestHandler } from './$types';
import { apiRoute } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { capabilitiesOf } from '$lib/roles';

/** A team as the caller sees it, with the caller's role there. */
export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	return {
		team: {
			slug: access.team.slug,
			name: access.team.name,
			description: access.team.description,
			createdAt: access.team.created_at
		},
		role: access.role,
		capabilities: capabilitiesOf(access.role)
	};
});
