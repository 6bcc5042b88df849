import { redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { PASSWORD_MIN, signUp, startSession } from '$lib/server/auth';
import { normalizeEmail } from '$lib/server/db/users';
import { fields, parseForm, runAction, safeNext, readFormData } from '$lib/server/forms';
import { clientMeta, flowContext } from '$lib/server/request';
import { inspectInvite } from '$lib/server/teams';

export const load: PageServerLoad = async ({ locals, url }) => {
	const next = safeNext(url.searchParams.get('next'));
	if (locals.user) redirect(303, next);
	const token = url.searchParams.get('invite');
	const view = token ? await inspectInvite(getDb(), token) : null;
	const invite =
		view && view.state === 'open'
			? { token: token!, email: view.invite.email, team: view.team.name, role: view.invite.role }
			: null;
	return { next, invite, passwordMin: PASSWORD_MIN };
};

const schema = z.object({
	name: fields.personName,
	email: fields.email,
	password: fields.password,
	next: z.string().optional(),
	invite: z.string().max(100).optional()
});

export const actions: Actions = {
	default: async (event) => {
		const parsed = parseForm(schema, await readFormData(event.request), [
			'name',
			'email',
			'next',
			'invite'
		]);
		if (!parsed.ok) return parsed.failure;
		const { name, email, password, invite } = parsed.data;
		return runAction(
			parsed.values,
			async () => {
				const db = getDb();
				// an open invitation for this very address proves the address: the invitee joins at once
				const view = invite ? await inspectInvite(db, invite) : null;
				const invited =
					view?.state === 'open' && normalizeEmail(view.invite.email) === normalizeEmail(email);
				const outcome = await signUp(db, { name, email, password }, flowContext(event), {
					verified: invited
				});
				if (outcome.created && invited) {
					await startSession(db, event, outcome.user.id, clientMeta(event));
					redirect(303, `/invite/${encodeURIComponent(invite!)}`);
				}
				// a new address and a taken one get the same answer: the rest happens by mail
				return { sent: true as const, email: normalizeEmail(email) };
			},
			event
		);
	}
};
