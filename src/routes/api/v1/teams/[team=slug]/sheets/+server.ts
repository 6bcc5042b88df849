import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute, readJson } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { createFromExample, createSheet, listTeamSheets } from '$lib/server/sheets';
import { plainText } from '$lib/plain-text';

/*
 * A team's sheets.
 *   GET  ?q=words&limit=50&offset=0 → 200 { sheets: SheetSummary[], total }          (any member or token)
 *   POST { title, doc } or { example, title? } → 201 { sheet: SheetWithDraft }         (sheet:edit)
 *        `doc` is a sheet document (src/lib/sheets/types.ts) or a bare PathSpec (SI units), which
 *        becomes a document with default units; `example` names a worked example.
 *        400 bad body or document, 403 role, 422 start state the engine cannot fix.
 */

const listQuery = z.strictObject(
	{
		q: plainText('The search text (q)')
			.max(200, { error: 'q must be at most 200 characters.' })
			.optional(),
		limit: z.coerce
			.number({ error: 'limit must be a whole number.' })
			.int({ error: 'limit must be a whole number.' })
			.min(1, { error: 'limit must be 1 to 200.' })
			.max(200, { error: 'limit must be 1 to 200.' })
			.optional(),
		offset: z.coerce
			.number({ error: 'offset must be a whole number.' })
			.int({ error: 'offset must be a whole number.' })
			.min(0, { error: 'offset must be 0 or more.' })
			.optional()
	},
	{ error: 'Allowed query parameters: q, limit, offset.' }
);

const createBody = z.union(
	[
		z.strictObject({
			title: z.string({ error: 'title must be text.' }),
			doc: z.unknown().refine((d) => d !== undefined, { message: 'doc is required.' })
		}),
		z.strictObject({
			example: plainText('example', 'line', 'example must be a worked example id.'),
			title: z.string({ error: 'title must be text.' }).optional()
		})
	],
	{
		error: 'Send { "title", "doc" } (a sheet document or a path spec), or { "example", "title"? }.'
	}
);

export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	const q = listQuery.parse(Object.fromEntries(event.url.searchParams));
	return listTeamSheets(getDb(), access, q);
});

export const POST: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'sheet:edit');
	const body = await readJson(event.request, createBody);
	const sheet =
		'example' in body
			? await createFromExample(getDb(), access, body.example, body.title)
			: await createSheet(getDb(), access, { title: body.title, doc: body.doc });
	return json({ sheet }, { status: 201 });
});
