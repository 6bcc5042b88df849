import { redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import {
	checkResetToken,
	PASSWORD_MIN,
	requestPasswordReset,
	resetPassword,
	startSession
} from '$lib/server/auth';
import { fields, formFailure, parseForm, runAction, readFormData } from '$lib/server/forms';
import { clientMeta, flowContext } from '$lib/server/request';
import { isAppError } from '$lib/server/errors';

export const load: PageServerLoad = async ({ url }) => {
	const token = url.searchParams.get('token');
	if (token === null) return { mode: 'request' as const, passwordMin: PASSWORD_MIN };
	try {
		const user = await checkResetToken(getDb(), token);
		return { mode: 'set' as const, token, email: user.email, passwordMin: PASSWORD_MIN };
	} catch (e) {
		if (!isAppError(e)) throw e;
		return { mode: 'invalid' as const, message: e.message, passwordMin: PASSWORD_MIN };
	}
};

const requestSchema = z.object({ email: fields.email });
const setSchema = z.object({
	token: z.string().min(1).max(100),
	password: fields.password,
	confirm: z.string()
});

export const actions: Actions = {
	request: async (event) => {
		const parsed = parseForm(requestSchema, await readFormData(event.request), ['email']);
		if (!parsed.ok) return parsed.failure;
		return runAction(
			parsed.values,
			async () => {
				await requestPasswordReset(getDb(), parsed.data.email, flowContext(event));
				return { sent: true, email: parsed.data.email };
			},
			event
		);
	},
	set: async (event) => {
		const parsed = parseForm(setSchema, await readFormData(event.request));
		if (!parsed.ok) return parsed.failure;
		const { token, password, confirm } = parsed.data;
		if (password !== confirm)
			return formFailure(400, 'The two passwords differ. Type the same new password twice.', {
				confirm: 'Does not match the password above.'
			});
		return runAction({}, async () => {
			const db = getDb();
			const user = await resetPassword(db, token, password);
			await startSession(db, event, user.id, clientMeta(event));
			redirect(303, '/account?password=reset');
		});
	}
};
