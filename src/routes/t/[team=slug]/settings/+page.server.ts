import { redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireTeam } from '$lib/server/guard';
import { fields, formFailure, parseForm, runAction, readFormData } from '$lib/server/forms';
import { flowContext } from '$lib/server/request';
import { listMembers } from '$lib/server/db/memberships';
import { listPendingInvites } from '$lib/server/db/invites';
import { listApiTokens } from '$lib/server/db/api-tokens';
import { listTeamEvents } from '$lib/server/db/team-events';
import {
	cancelInvite,
	changeMemberRole,
	inviteMember,
	leaveTeam,
	removeTeamMember,
	renameTeam
} from '$lib/server/teams';
import { createTeamToken, grantableTokenRoles, revokeTeamToken } from '$lib/server/api-tokens';

export const load: PageServerLoad = async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	const db = getDb();
	const me = event.locals.user!.id;
	const manage = access.can('team:manage');
	const tokens = access.can('token:create') ? await listApiTokens(db, access.team.id) : [];
	return {
		me,
		members: (await listMembers(db, access.team.id)).map((m) => ({
			id: m.user_id,
			name: m.name,
			email: m.email,
			verified: m.email_verified_at !== null,
			role: m.role,
			since: m.created_at
		})),
		invites: manage
			? (await listPendingInvites(db, access.team.id)).map((i) => ({
					id: i.id,
					email: i.email,
					role: i.role,
					by: i.invited_by_name,
					createdAt: i.created_at,
					expiresAt: i.expires_at
				}))
			: [],
		tokens: tokens.map((t) => ({
			id: t.id,
			name: t.name,
			prefix: t.prefix,
			role: t.role,
			by: t.created_by_name,
			own: t.created_by === me,
			createdAt: t.created_at,
			lastUsedAt: t.last_used_at
		})),
		grantable: grantableTokenRoles(access.role),
		events: manage ? await listTeamEvents(db, access.team.id, 30) : []
	};
};

const renameSchema = z.object({ name: fields.teamName, description: fields.description });
const inviteSchema = z.object({ email: fields.email, role: fields.role });
const idSchema = z.object({ id: fields.id });
const roleSchema = z.object({ id: fields.id, role: fields.role });
const tokenSchema = z.object({ name: fields.tokenName, role: fields.role });
const leaveSchema = z.object({
	confirm: z.literal('yes', { error: 'Tick the box to confirm you want to leave.' })
});

export const actions: Actions = {
	rename: async (event) => {
		const access = await requireTeam(event, event.params.team, 'team:manage');
		const parsed = parseForm(renameSchema, await readFormData(event.request), [
			'name',
			'description'
		]);
		if (!parsed.ok) return parsed.failure;
		return runAction(parsed.values, async () => {
			await renameTeam(getDb(), access, parsed.data);
			return { done: 'rename' as const };
		});
	},
	invite: async (event) => {
		const access = await requireTeam(event, event.params.team, 'team:manage');
		const parsed = parseForm(inviteSchema, await readFormData(event.request), ['email', 'role']);
		if (!parsed.ok) return parsed.failure;
		return runAction(
			parsed.values,
			async () => {
				const r = await inviteMember(getDb(), access, parsed.data, flowContext(event));
				return {
					done: 'invite' as const,
					invited: { email: r.invite.email, role: r.invite.role, url: r.url, mailed: r.mailed }
				};
			},
			event
		);
	},
	revokeInvite: async (event) => {
		const access = await requireTeam(event, event.params.team, 'team:manage');
		const parsed = parseForm(idSchema, await readFormData(event.request));
		if (!parsed.ok) return parsed.failure;
		return runAction({}, async () => {
			const invite = await cancelInvite(getDb(), access, parsed.data.id);
			return { done: 'revokeInvite' as const, email: invite.email };
		});
	},
	changeRole: async (event) => {
		const access = await requireTeam(event, event.params.team, 'team:manage');
		const parsed = parseForm(roleSchema, await readFormData(event.request));
		if (!parsed.ok) return parsed.failure;
		return runAction({}, async () => {
			const r = await changeMemberRole(getDb(), access, parsed.data.id, parsed.data.role);
			return { done: 'changeRole' as const, revokedTokens: r.revokedTokens };
		});
	},
	removeMember: async (event) => {
		const access = await requireTeam(event, event.params.team, 'team:manage');
		const parsed = parseForm(idSchema, await readFormData(event.request));
		if (!parsed.ok) return parsed.failure;
		return runAction({}, async () => {
			const user = await removeTeamMember(getDb(), access, parsed.data.id);
			return { done: 'removeMember' as const, name: user.name };
		});
	},
	createToken: async (event) => {
		const access = await requireTeam(event, event.params.team, 'token:create');
		const parsed = parseForm(tokenSchema, await readFormData(event.request), ['name', 'role']);
		if (!parsed.ok) return parsed.failure;
		return runAction(parsed.values, async () => {
			const { token, row } = await createTeamToken(getDb(), access, parsed.data);
			return {
				done: 'createToken' as const,
				created: { value: token, name: row.name, role: row.role }
			};
		});
	},
	revokeToken: async (event) => {
		const access = await requireTeam(event, event.params.team, 'token:create');
		const parsed = parseForm(idSchema, await readFormData(event.request));
		if (!parsed.ok) return parsed.failure;
		return runAction({}, async () => {
			const row = await revokeTeamToken(getDb(), access, parsed.data.id);
			return { done: 'revokeToken' as const, name: row.name };
		});
	},
	leave: async (event) => {
		const access = await requireTeam(event, event.params.team, 'read');
		if (access.principal.kind !== 'user') return formFailure(403, 'Only people can leave teams.');
		const parsed = parseForm(leaveSchema, await readFormData(event.request));
		if (!parsed.ok) return parsed.failure;
		const r = await runAction({}, () => leaveTeam(getDb(), access));
		if (r) return r;
		redirect(303, '/');
	}
};
