import { redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { signIn, startSession } from '$lib/server/auth';
import { fields, parseForm, runAction, safeNext, readFormData } from '$lib/server/forms';
import { clientIp, clientMeta } from '$lib/server/request';

export const load: PageServerLoad = async ({ locals, url }) => {
	const next = safeNext(url.searchParams.get('next'));
	if (locals.user) redirect(303, next);
	return { next, reset: url.searchParams.has('reset') };
};

const schema = z.object({
	email: fields.email,
	password: fields.password,
	next: z.string().optional()
});

export const actions: Actions = {
	default: async (event) => {
		const parsed = parseForm(schema, await readFormData(event.request), ['email', 'next']);
		if (!parsed.ok) return parsed.failure;
		const { email, password, next } = parsed.data;
		return runAction(
			parsed.values,
			async () => {
				const db = getDb();
				const user = await signIn(db, { email, password }, clientIp(event));
				await startSession(db, event, user.id, clientMeta(event));
				redirect(303, safeNext(next));
			},
			event
		);
	}
};
