import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute } from '$lib/server/api';
import { requirePrincipal } from '$lib/server/guard';
import { getTeamById, listTeamsForUser } from '$lib/server/db/teams';
import { capabilitiesOf } from '$lib/roles';

/** Who is calling: a person (with their teams) or an API token (with its team and role). */
export const GET: RequestHandler = apiRoute(async (event) => {
	const principal = requirePrincipal(event);
	const db = getDb();
	if (principal.kind === 'token') {
		const t = principal.token;
		const team = await getTeamById(db, t.teamId);
		if (!team) error(404, { code: 'not-found', message: 'The token’s team no longer exists.' });
		return {
			kind: 'token',
			token: { name: t.name, role: t.role, capabilities: capabilitiesOf(t.role) },
			team: { slug: team.slug, name: team.name }
		};
	}
	const { user } = principal;
	const teams = await listTeamsForUser(db, user.id);
	return {
		kind: 'user',
		user: { name: user.name, email: user.email, emailVerified: user.emailVerified },
		teams: teams.map((t) => ({ slug: t.slug, name: t.name, role: t.role }))
	};
});
