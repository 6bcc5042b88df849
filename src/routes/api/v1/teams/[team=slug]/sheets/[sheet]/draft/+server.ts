import { z } from 'zod';
import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute, jsonError, readJson } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { DraftConflictError, saveDraft } from '$lib/server/sheets';

/*
 * Save the working draft (autosave uses this).
 *   PUT { version, doc } → 200 { version, updatedAt, updatedBy }
 *     `version` is the draft version the editor started from (from GET …/sheets/{id} or the last
 *     save). 409 `draft-conflict` when someone saved since, with `current: { version, updatedAt,
 *     updatedBy }`: nothing is written. 400 bad document, 403 role (checkers and viewers), 404.
 */

const body = z.strictObject(
	{
		version: z.number({ error: 'version must be the whole number the sheet was read with.' }),
		doc: z
			.unknown()
			.refine((d) => d !== undefined, { message: 'doc is required: the sheet document to save.' })
	},
	{ error: 'Send { "version": n, "doc": { … } }.' }
);

export const PUT: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'sheet:edit');
	const input = await readJson(event.request, body);
	try {
		return await saveDraft(getDb(), access, event.params.sheet, {
			version: input.version,
			doc: input.doc
		});
	} catch (e) {
		if (e instanceof DraftConflictError)
			return jsonError(409, e.code, e.message, { current: e.current });
		throw e;
	}
});
