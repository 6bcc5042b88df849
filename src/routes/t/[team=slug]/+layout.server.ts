import type { LayoutServerLoad } from './$types';
import { requireTeam } from '$lib/server/guard';
import { capabilitiesOf } from '$lib/roles';

// Every page under /t/[team] sees the team and the viewer's role; pages and actions still call
// requireTeam with the capability they need (form actions do not run this load).
export const load: LayoutServerLoad = async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	return {
		team: {
			id: access.team.id,
			slug: access.team.slug,
			name: access.team.name,
			description: access.team.description,
			createdAt: access.team.created_at
		},
		role: access.role,
		capabilities: [...capabilitiesOf(access.role)]
	};
};
