import { z } from 'zod';
import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { getDb } from '$lib/server/database';
import { apiRoute, readJson } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { flowContext } from '$lib/server/request';
import { replyToNote } from '$lib/server/notes';

/*
 * Reply in a thread: POST { body } → 201 { note } (owners, designers, checkers). The thread's
 * author is mailed (unless they turned replies off); @Name mentions are mailed as mentions.
 */

const body = z.strictObject(
	{ body: z.string({ error: 'body must be the text of the reply.' }) },
	{ error: 'Send { "body": "…" }.' }
);

export const POST: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'note:write');
	const input = await readJson(event.request, body);
	return json(
		{
			note: await replyToNote(
				getDb(),
				access,
				event.params.sheet,
				event.params.note,
				input,
				flowContext(event)
			)
		},
		{ status: 201 }
	);
});
