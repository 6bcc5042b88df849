import { z } from 'zod';
import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { getDb } from '$lib/server/database';
import { apiRoute, readJson } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { flowContext } from '$lib/server/request';
import { createNote, listNotes, noteContextOf } from '$lib/server/notes';

/*
 * Review notes of a sheet.
 *   GET ?revision=N → 200 { notes, open, outdated }                                        (read)
 *     Each note says whether its anchor exists in the document it is shown against: revision N,
 *     or without `revision` the working draft (`outdated`, `label`).
 *   POST { anchor, body, revision? } → 201 { note }                        (owners, designers, checkers)
 *     anchor: { kind: "sheet" } | { kind: "leg", legId } | { kind: "state", at: "start" | legId };
 *     `revision`: the revision being read (the anchor must exist there). @Name mentions are mailed.
 *   400 invalid-body / invalid-anchor / unknown-anchor; 403 viewers.
 */

export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	return listNotes(getDb(), access, event.params.sheet, noteContextOf(event.url));
});

const body = z.strictObject(
	{
		anchor: z.unknown().refine((a) => a !== undefined, {
			message:
				'anchor is required: { "kind": "sheet" }, { "kind": "leg", "legId": "…" } or { "kind": "state", "at": "…" }.'
		}),
		body: z.string({ error: 'body must be the text of the note.' }),
		revision: z
			.number({
				error:
					'revision must be the number of the revision you are reading (1, 2, …), or null for the working draft.'
			})
			.int({
				error:
					'revision must be the number of the revision you are reading (1, 2, …), or null for the working draft.'
			})
			.min(1, {
				error:
					'revision must be the number of the revision you are reading (1, 2, …), or null for the working draft.'
			})
			.nullable()
			.optional()
	},
	{ error: 'Send { "anchor": {…}, "body": "…" } and optionally "revision".' }
);

export const POST: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'note:write');
	const input = await readJson(event.request, body);
	const note = await createNote(
		getDb(),
		access,
		event.params.sheet,
		{ anchor: input.anchor as never, body: input.body, revision: input.revision ?? null },
		flowContext(event)
	);
	return json({ note }, { status: 201 });
});
