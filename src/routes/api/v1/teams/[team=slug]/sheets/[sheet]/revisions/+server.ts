import { z } from 'zod';
import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { getDb } from '$lib/server/database';
import { apiRoute, jsonError, readJson } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { listRevisions, RevisionConflictError, saveRevision } from '$lib/server/revisions';
import { DraftConflictError } from '$lib/server/sheets';

/*
 * Revisions of a sheet.
 *   GET  → 200 { revisions: RevisionSummary[] (newest first), events: [...] }          (read)
 *   POST { message, baseRevision, doc?, draftVersion? } → 201 { revision }          (sheet:edit)
 *     Freezes `doc`, or without it the stored working draft (at `draftVersion` when given), with
 *     the path computed from it. `baseRevision` is the newest revision the draft started from
 *     (null before Rev 1).
 *     409 revision-conflict { latest, yours: { doc, message, baseRevision } } — someone saved in
 *         between; nothing stored, the would-be revision comes back to compare and merge.
 *     409 draft-conflict { current } — the working draft moved on since draftVersion.
 *     409 in-check — the newest revision is being checked. 422 unchanged / path-not-computable.
 */

export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	return listRevisions(getDb(), access, event.params.sheet);
});

const body = z.strictObject(
	{
		message: z.string({ error: 'message is required: say what changed in this revision.' }),
		baseRevision: z
			.number({
				error: 'baseRevision must be the revision number the draft started from, or null.'
			})
			.int()
			.nullable(),
		doc: z.unknown().optional(),
		draftVersion: z
			.number({
				error:
					"draftVersion must be the working draft's version (a whole number from 1, as GET …/sheets/{id} returns it)."
			})
			.int({
				error:
					"draftVersion must be the working draft's version (a whole number from 1, as GET …/sheets/{id} returns it)."
			})
			.min(1, {
				error:
					"draftVersion must be the working draft's version (a whole number from 1, as GET …/sheets/{id} returns it)."
			})
			.optional()
	},
	{
		error:
			'Send { "message": "…", "baseRevision": n | null } and optionally "doc" or "draftVersion".'
	}
);

export const POST: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'sheet:edit');
	const input = await readJson(event.request, body);
	try {
		const revision = await saveRevision(getDb(), access, event.params.sheet, input);
		return json({ revision }, { status: 201 });
	} catch (e) {
		if (e instanceof RevisionConflictError)
			return jsonError(409, e.code, e.message, { latest: e.latest, yours: e.yours });
		if (e instanceof DraftConflictError)
			return jsonError(409, e.code, e.message, { current: e.current });
		throw e;
	}
});
