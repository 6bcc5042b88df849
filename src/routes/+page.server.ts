import { redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireUser } from '$lib/server/guard';
import { fields, parseForm, runAction, readFormData } from '$lib/server/forms';
import { createTeamFor } from '$lib/server/teams';
import { listRecentSheetsForUser, sheetCountsForUser } from '$lib/server/db/sheets';
import { summaryOf } from '$lib/server/sheets';
import { fluidNames } from '$lib/server/chart-data';

export const load: PageServerLoad = async ({ locals }) => {
	if (!locals.user)
		return {
			recentSheets: [],
			sheetCounts: {} as Record<string, number>,
			fluidNames: {} as Record<string, string>
		};
	const db = getDb();
	const [recent, counts] = await Promise.all([
		listRecentSheetsForUser(db, locals.user.id, 8),
		sheetCountsForUser(db, locals.user.id)
	]);
	return {
		recentSheets: recent.map((r) => ({
			...summaryOf(r),
			teamSlug: r.team_slug,
			teamName: r.team_name
		})),
		sheetCounts: Object.fromEntries(counts),
		fluidNames: fluidNames()
	};
};

const newTeam = z.object({ name: fields.teamName, description: fields.description });

export const actions: Actions = {
	createTeam: async (event) => {
		const user = requireUser(event);
		const parsed = parseForm(newTeam, await readFormData(event.request), ['name', 'description']);
		if (!parsed.ok) return parsed.failure;
		const team = await runAction(parsed.values, () => createTeamFor(getDb(), user, parsed.data));
		if ('slug' in team) redirect(303, `/t/${team.slug}`);
		return team;
	}
};
