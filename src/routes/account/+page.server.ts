import { redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import {
	changePassword,
	clearSessionCookie,
	invalidateUserSessions,
	PASSWORD_MIN,
	sendVerification
} from '$lib/server/auth';
import { requireUser } from '$lib/server/guard';
import { fields, formFailure, parseForm, runAction, readFormData } from '$lib/server/forms';
import { flowContext } from '$lib/server/request';
import { deleteUserSession, listUserSessions } from '$lib/server/db/sessions';
import { updateUserName } from '$lib/server/db/users';
import {
	getNotificationSettings,
	setNotificationSettings
} from '$lib/server/db/notification-settings';
import { NOTIFICATION_LABELS, settingsFromForm } from '$lib/server/notifications';

export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const sessions = await listUserSessions(getDb(), user.id);
	return {
		passwordMin: PASSWORD_MIN,
		passwordReset: event.url.searchParams.get('password') === 'reset',
		notifications: {
			settings: await getNotificationSettings(getDb(), user.id),
			labels: NOTIFICATION_LABELS
		},
		sessions: sessions.map((s) => ({
			id: s.id,
			current: s.id === event.locals.session?.id,
			createdAt: s.created_at,
			lastSeenAt: s.last_seen_at,
			expiresAt: s.expires_at,
			ip: s.ip,
			userAgent: s.user_agent
		}))
	};
};

const profileSchema = z.object({ name: fields.personName });
const passwordSchema = z.object({
	current: fields.password,
	next: fields.password,
	confirm: z.string()
});
const sessionSchema = z.object({
	session: z.string().regex(/^[0-9a-f]{64}$/, 'That session id is not valid.')
});

export const actions: Actions = {
	notifications: async (event) => {
		const user = requireUser(event);
		await setNotificationSettings(
			getDb(),
			user.id,
			settingsFromForm(await readFormData(event.request))
		);
		return { saved: 'notifications' };
	},
	profile: async (event) => {
		const user = requireUser(event);
		const parsed = parseForm(profileSchema, await readFormData(event.request), ['name']);
		if (!parsed.ok) return parsed.failure;
		await updateUserName(getDb(), user.id, parsed.data.name);
		return { saved: 'profile' };
	},
	password: async (event) => {
		const user = requireUser(event);
		const parsed = parseForm(passwordSchema, await readFormData(event.request));
		if (!parsed.ok) return parsed.failure;
		if (parsed.data.next !== parsed.data.confirm)
			return formFailure(400, 'The two new passwords differ.', {
				confirm: 'Does not match the new password.'
			});
		return runAction({}, async () => {
			const ended = await changePassword(
				getDb(),
				user,
				{
					current: parsed.data.current,
					next: parsed.data.next,
					keepSessionId: event.locals.session!.id
				},
				flowContext(event)
			);
			return { saved: 'password', ended };
		});
	},
	revokeSession: async (event) => {
		const user = requireUser(event);
		const parsed = parseForm(sessionSchema, await readFormData(event.request));
		if (!parsed.ok) return parsed.failure;
		if (parsed.data.session === event.locals.session?.id)
			return formFailure(400, 'That is this session: use Sign out instead.');
		const gone = await deleteUserSession(getDb(), user.id, parsed.data.session);
		if (!gone) return formFailure(404, 'No such session (it may have ended already).');
		return { saved: 'session' };
	},
	signOutOthers: async (event) => {
		const user = requireUser(event);
		const ended = await invalidateUserSessions(getDb(), user.id, event.locals.session!.id);
		return { saved: 'others', ended };
	},
	signOutEverywhere: async (event) => {
		const user = requireUser(event);
		await invalidateUserSessions(getDb(), user.id);
		clearSessionCookie(event.cookies, event.url);
		redirect(303, '/signin');
	},
	resendVerification: async (event) => {
		const user = requireUser(event);
		if (user.emailVerified) return { saved: 'verified' };
		return runAction(
			{},
			async () => {
				await sendVerification(getDb(), user, flowContext(event));
				return { saved: 'verification' };
			},
			event
		);
	}
};
