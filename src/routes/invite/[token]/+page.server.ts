import { error, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireUser } from '$lib/server/guard';
import { acceptInvite, inspectInvite } from '$lib/server/teams';
import { runAction } from '$lib/server/forms';
import { getMembership } from '$lib/server/db/memberships';

export const load: PageServerLoad = async ({ params, locals }) => {
	const db = getDb();
	const view = await inspectInvite(db, params.token);
	if (!view)
		error(404, {
			code: 'link-invalid',
			message:
				'This invitation link is not valid. Check that you copied all of it, or ask for a new invitation.'
		});
	const member = locals.user ? !!(await getMembership(db, view.team.id, locals.user.id)) : false;
	return {
		token: params.token,
		team: { name: view.team.name, slug: view.team.slug },
		inviter: view.inviterName,
		role: view.invite.role,
		email: view.invite.email,
		expiresAt: view.invite.expires_at,
		state: view.state,
		signedInAs: locals.user?.email ?? null,
		matches: locals.user?.email === view.invite.email,
		member
	};
};

export const actions: Actions = {
	accept: async (event) => {
		const user = requireUser(event);
		return runAction({}, async () => {
			const team = await acceptInvite(getDb(), event.params.token, user);
			redirect(303, `/t/${team.slug}?joined=1`);
		});
	}
};
