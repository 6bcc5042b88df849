import { redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { sendVerification, startSession, verifyEmail } from '$lib/server/auth';
import { requireUser } from '$lib/server/guard';
import { runAction } from '$lib/server/forms';
import { clientMeta, flowContext } from '$lib/server/request';
import { isAppError } from '$lib/server/errors';

// Following the e-mailed link confirms the address (the link is single-use and expires).
export const load: PageServerLoad = async (event) => {
	const { url, locals } = event;
	const token = url.searchParams.get('token');
	if (token === null && url.searchParams.has('confirmed') && locals.user?.emailVerified) {
		return {
			result: { ok: true as const, email: locals.user.email, alreadyVerified: false },
			signedIn: true,
			verified: true,
			email: locals.user.email
		};
	}
	if (token === null)
		return {
			result: null,
			signedIn: !!locals.user,
			verified: locals.user?.emailVerified ?? false,
			email: locals.user?.email ?? null
		};
	try {
		const db = getDb();
		const { user, alreadyVerified } = await verifyEmail(db, token);
		// the first use of the link finishes a sign-up: it proves the address, so it signs its holder in
		if (!alreadyVerified && !locals.user) {
			await startSession(db, event, user.id, clientMeta(event));
			// a fresh request, so the whole page (its header too) is drawn signed in
			redirect(303, '/verify?confirmed');
		}
		return {
			result: { ok: true as const, email: user.email, alreadyVerified },
			signedIn: !!locals.user,
			verified: true,
			email: user.email
		};
	} catch (e) {
		if (!isAppError(e)) throw e;
		return {
			result: { ok: false as const, message: e.message },
			signedIn: !!locals.user,
			verified: locals.user?.emailVerified ?? false,
			email: locals.user?.email ?? null
		};
	}
};

export const actions: Actions = {
	resend: async (event) => {
		const user = requireUser(event);
		if (user.emailVerified) return { resent: false, already: true };
		return runAction(
			{},
			async () => {
				await sendVerification(getDb(), user, flowContext(event));
				return { resent: true, already: false };
			},
			event
		);
	}
};
