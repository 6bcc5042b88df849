import { z } from 'zod';
import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { apiRoute, jsonError, readJson } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { flowContext } from '$lib/server/request';
import {
	moveRevision,
	OpenNotesError,
	parseRevisionNumber,
	restoreRevision
} from '$lib/server/revisions';
import { DraftConflictError } from '$lib/server/sheets';
import { plainText } from '$lib/plain-text';
import { isSignOffAction, SIGN_OFF_ACTIONS } from '$lib/revisions/steps';

/*
 * Sign-off steps on the newest revision, and restoring any revision as the working draft.
 *   POST …/submit   { checkerId?, note? }  designers, owners       draft → in-check (mails the checker)
 *   POST …/withdraw { note? }              designers, owners       in-check → draft
 *   POST …/check    { note?, override? }   checkers, owners; not the author   in-check → checked
 *   POST …/return   { note }               checkers, owners (owners only once checked) → draft
 *   POST …/approve  { note?, override? }   owners; not the author  checked → approved (locked)
 *   check and approve while review notes are open: 409 open-notes { openNotes } unless `override`
 *   gives the reason, which the sign-off log records with the number of open notes.
 *   POST …/restore  { version }            designers, owners: the revision's document becomes the
 *                                          working draft (409 draft-conflict if `version` is stale)
 *   → 200 { revision } (restore: { version, updatedAt, updatedBy, doc })
 *   403 forbidden / self-check / self-approve / self-return; 409 not-latest / wrong-status;
 *   409 open-notes; 400 invalid-note / invalid-checker / invalid-override; 404 unknown step or revision.
 */

const stepBody = z.strictObject(
	{
		note: z.string({ error: 'note must be text.' }).optional(),
		checkerId: plainText('checkerId', 'line', 'checkerId must be the id of a team member.')
			.nullable()
			.optional(),
		override: plainText(
			'override',
			'lines',
			'override must be text: the reason for signing off over open review notes.'
		).optional()
	},
	{ error: 'Send a JSON object, e.g. { "note": "…" }.' }
);
const restoreBody = z.strictObject(
	{ version: z.number({ error: 'version must be the draft version you hold.' }).int() },
	{ error: 'Send { "version": n }: the draft version you hold.' }
);

async function bodyOf<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
	// a step without a body is fine: every field is optional
	const copy = request.clone();
	if ((await copy.text()).trim() === '') return schema.parse({});
	return readJson(request, schema);
}

export const POST: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	const number = parseRevisionNumber(event.params.number);
	const action = event.params.action;
	if (action === 'restore') {
		const input = await readJson(event.request, restoreBody);
		try {
			return await restoreRevision(getDb(), access, event.params.sheet, number, input.version);
		} catch (e) {
			if (e instanceof DraftConflictError)
				return jsonError(409, e.code, e.message, { current: e.current });
			throw e;
		}
	}
	if (!isSignOffAction(action))
		return jsonError(
			404,
			'not-found',
			`There is no step "${action}". Use one of: ${SIGN_OFF_ACTIONS.join(', ')}, restore.`
		);
	const input = await bodyOf(event.request, stepBody);
	try {
		const revision = await moveRevision(
			getDb(),
			access,
			event.params.sheet,
			number,
			action,
			input,
			flowContext(event)
		);
		return { revision };
	} catch (e) {
		if (e instanceof OpenNotesError)
			return jsonError(409, e.code, e.message, { openNotes: e.openNotes });
		throw e;
	}
});
