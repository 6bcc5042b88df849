import { redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { safeNext } from '$lib/server/forms';
import { clearSessionCookie, invalidateSession, sessionCookieName } from '$lib/server/auth';

export const load: PageServerLoad = async ({ locals }) => {
	if (!locals.user) redirect(303, '/signin');
	return {};
};

export const actions: Actions = {
	default: async ({ cookies, url, request }) => {
		const token = cookies.get(sessionCookieName(url));
		if (token) await invalidateSession(getDb(), token);
		clearSessionCookie(cookies, url);
		const next = safeNext(String((await request.formData().catch(() => null))?.get('next') ?? ''));
		redirect(303, next === '/' ? '/signin' : `/signin?next=${encodeURIComponent(next)}`);
	}
};
