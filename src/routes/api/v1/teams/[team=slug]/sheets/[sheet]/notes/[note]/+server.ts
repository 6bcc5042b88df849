import { z } from 'zod';
import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute, readJson } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { getNote, noteContextOf, setNoteState } from '$lib/server/notes';

/*
 * One review-note thread.
 *   GET ?revision=N          → 200 { note } (with replies; `outdated` against revision N or the draft)
 *   PATCH { resolved: bool } → 200 { note } resolve or reopen (owners, designers, checkers);
 *                              409 already-resolved / already-open
 */

export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	return {
		note: await getNote(
			getDb(),
			access,
			event.params.sheet,
			event.params.note,
			noteContextOf(event.url)
		)
	};
});

const patch = z.strictObject(
	{ resolved: z.boolean({ error: 'resolved must be true (resolve) or false (reopen).' }) },
	{ error: 'Send { "resolved": true } or { "resolved": false }.' }
);

export const PATCH: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'note:write');
	const input = await readJson(event.request, patch);
	return {
		note: await setNoteState(getDb(), access, event.params.sheet, event.params.note, input.resolved)
	};
});
