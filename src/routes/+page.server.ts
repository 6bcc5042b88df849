import { redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions } from './$types';
import { getDb } from '$lib/server/db';
import { requireUser } from '$lib/server/guard';
import { fields, parseForm, runAction, readFormData } from '$lib/server/forms';
import { createTeamFor } from '$lib/server/teams';

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
