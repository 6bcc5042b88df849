import { z } from 'zod';
import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute, readJson } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { deleteTeamSheet, readSheet, renameTeamSheet } from '$lib/server/sheets';

/*
 * One sheet.
 *   GET                → 200 { sheet: SheetWithDraft } (meta, `version`, and the working draft `doc`)
 *   PATCH { title }    → 200 { sheet: SheetMeta }       (sheet:edit; 400 bad title, 403 role)
 *   DELETE             → 204 (owners; designers their own sheets without revisions; 409 approved-record
 *                        when a revision is approved — approved revisions are kept)
 *   404 for a sheet of another team, a mistyped id, or a team the caller is not in.
 */

export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	return { sheet: await readSheet(getDb(), access, event.params.sheet) };
});

const patchBody = z.strictObject(
	{ title: z.string({ error: 'title must be text.' }) },
	{
		error:
			'Send { "title": "…" }; only the title can be changed here (the draft is saved with PUT …/draft).'
	}
);

export const PATCH: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'sheet:edit');
	const body = await readJson(event.request, patchBody);
	return { sheet: await renameTeamSheet(getDb(), access, event.params.sheet, body.title) };
});

export const DELETE: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'sheet:edit');
	await deleteTeamSheet(getDb(), access, event.params.sheet);
	return new Response(null, { status: 204 });
});
