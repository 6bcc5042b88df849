import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireTeam } from '$lib/server/guard';
import { listMembers } from '$lib/server/db/memberships';
import { countSheets } from '$lib/server/db/sheets';
import { listTeamSheets } from '$lib/server/sheets';
import { fluidNames } from '$lib/server/chart-data';
import { controlCharProblem } from '$lib/plain-text';

export const load: PageServerLoad = async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	const members = await listMembers(getDb(), access.team.id);
	const q = (event.url.searchParams.get('q') ?? '').trim().slice(0, 200);
	const problem = controlCharProblem(q, 'The search text');
	if (problem) error(400, { code: 'invalid-query', message: problem });
	const [{ sheets, total }, all] = await Promise.all([
		listTeamSheets(getDb(), access, { q, limit: 100 }),
		countSheets(getDb(), access.team.id)
	]);
	return {
		joined: event.url.searchParams.has('joined'),
		members: members.map((m) => ({ id: m.user_id, name: m.name, role: m.role })),
		q,
		sheets: sheets.map((s) => ({ ...s, teamSlug: access.team.slug })),
		matching: total,
		sheetCount: all,
		fluidNames: fluidNames()
	};
};
