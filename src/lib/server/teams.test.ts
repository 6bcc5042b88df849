import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { Role } from '$lib/roles';
import { expectAppError, linkIn, setupIntegration } from './testing';
import { createUser } from './db/users';
import { addMember, getMembership } from './db/memberships';
import { listApiTokens } from './db/api-tokens';
import { listTeamEvents } from './db/team-events';
import { listPendingInvites } from './db/invites';
import {
	acceptInvite,
	cancelInvite,
	changeMemberRole,
	createTeamFor,
	inspectInvite,
	inviteMember,
	leaveTeam,
	removeTeamMember,
	renameTeam
} from './teams';
import { createTeamToken } from './api-tokens';
import { resolveTeamAccess, type TeamAccess } from './guard';
import type { SessionUser } from './auth';
import type { Team } from './db/schema';

let env: Awaited<ReturnType<typeof setupIntegration>>;
let team: Team;
const people = {} as Record<Role | 'outsider', SessionUser>;

async function person(email: string, name: string): Promise<SessionUser> {
	const u = await createUser(env.db, { email, name, passwordHash: 'unused', emailVerified: false });
	return { id: u.id, email: u.email, name: u.name, emailVerified: false };
}

async function access(who: SessionUser, t: Team = team): Promise<TeamAccess> {
	const a = await resolveTeamAccess(env.db, { kind: 'user', user: who }, t.slug);
	if (!a) throw new Error(`${who.email} has no access to ${t.slug}`);
	return a;
}

function tokenFromInviteMail(text: string) {
	return linkIn(text, 'http://statewright.test/invite/').split('/invite/')[1];
}

beforeEach(async () => {
	env = await setupIntegration();
	people.owner = await person('owner@example.com', 'Olu Owner');
	team = await createTeamFor(env.db, people.owner, { name: 'Heat Works' });
	for (const role of ['designer', 'checker', 'viewer'] as const) {
		people[role] = await person(`${role}@example.com`, `${role} person`);
		await addMember(env.db, team.id, people[role].id, role);
	}
	people.outsider = await person('outsider@example.com', 'Out Sider');
});
afterEach(async () => {
	await env.close();
});

describe('invitations', () => {
	it('mails a single-use link that makes the invited address a member with the role', async () => {
		const newcomer = await person('new@example.com', 'New Comer');
		const r = await inviteMember(
			env.db,
			await access(people.owner),
			{ email: 'NEW@example.com', role: 'checker' },
			env.ctx
		);
		expect(r.mailed).toBe(true);
		const [mail] = await env.mailTo('new@example.com');
		expect(mail.subject).toBe('Olu Owner invited you to Heat Works on Statewright');
		const token = tokenFromInviteMail(mail.text);
		expect(r.url).toBe(`http://statewright.test/invite/${token}`);
		expect((await inspectInvite(env.db, token))?.state).toBe('open');
		const joined = await acceptInvite(env.db, token, newcomer);
		expect(joined.id).toBe(team.id);
		expect((await getMembership(env.db, team.id, newcomer.id))?.role).toBe('checker');
		expect((await inspectInvite(env.db, token))?.state).toBe('accepted');
		// reused
		const other = await person('other@example.com', 'Other');
		await expectAppError(acceptInvite(env.db, token, other), 410, 'invite-accepted');
		expect((await listTeamEvents(env.db, team.id)).map((e) => e.kind)).toEqual([
			'invite.accepted',
			'invite.sent',
			'team.created'
		]);
	});

	it('works only for the invited address', async () => {
		await inviteMember(
			env.db,
			await access(people.owner),
			{ email: 'someone@example.com', role: 'viewer' },
			env.ctx
		);
		const token = tokenFromInviteMail((await env.mailTo('someone@example.com'))[0].text);
		const e = await expectAppError(
			acceptInvite(env.db, token, people.outsider),
			403,
			'wrong-account'
		);
		expect(e.message).toContain('someone@example.com');
		expect(await getMembership(env.db, team.id, people.outsider.id)).toBeUndefined();
	});

	it('refuses expired, withdrawn, replaced and made-up invitations', async () => {
		const a = await access(people.owner);
		const invitee = await person('late@example.com', 'Late');
		const first = await inviteMember(
			env.db,
			a,
			{ email: 'late@example.com', role: 'viewer' },
			env.ctx
		);
		const second = await inviteMember(
			env.db,
			a,
			{ email: 'late@example.com', role: 'designer' },
			env.ctx
		);
		const t1 = first.url.split('/invite/')[1];
		const t2 = second.url.split('/invite/')[1];
		await expectAppError(acceptInvite(env.db, t1, invitee), 410, 'invite-revoked');
		expect((await listPendingInvites(env.db, team.id)).map((i) => i.role)).toEqual(['designer']);
		await env.db
			.updateTable('invites')
			.set({ expires_at: Date.now() - 1 })
			.where('id', '=', second.invite.id)
			.execute();
		await expectAppError(acceptInvite(env.db, t2, invitee), 410, 'invite-expired');
		const third = await inviteMember(
			env.db,
			a,
			{ email: 'late@example.com', role: 'viewer' },
			env.ctx
		);
		await cancelInvite(env.db, a, third.invite.id);
		await expectAppError(
			acceptInvite(env.db, third.url.split('/invite/')[1], invitee),
			410,
			'invite-revoked'
		);
		await expectAppError(acceptInvite(env.db, 'x'.repeat(43), invitee), 404, 'link-invalid');
		expect(await getMembership(env.db, team.id, invitee.id)).toBeUndefined();
	});

	it('refuses to invite a member and lets only owners invite', async () => {
		await expectAppError(
			inviteMember(
				env.db,
				await access(people.owner),
				{ email: 'designer@example.com', role: 'viewer' },
				env.ctx
			),
			409,
			'already-member'
		);
		for (const role of ['designer', 'checker', 'viewer'] as const) {
			await expectAppError(
				inviteMember(
					env.db,
					await access(people[role]),
					{ email: 'x@example.com', role: 'owner' },
					env.ctx
				),
				403,
				'forbidden'
			);
		}
		expect(await env.mailTo('x@example.com')).toEqual([]);
	});

	it('cannot withdraw another team’s invitation by its id', async () => {
		const otherTeam = await createTeamFor(env.db, people.outsider, { name: 'Elsewhere' });
		const r = await inviteMember(
			env.db,
			await access(people.outsider, otherTeam),
			{ email: 'q@example.com', role: 'viewer' },
			env.ctx
		);
		await expectAppError(
			cancelInvite(env.db, await access(people.owner), r.invite.id),
			404,
			'not-found'
		);
		expect(await listPendingInvites(env.db, otherTeam.id)).toHaveLength(1);
	});
});

describe('roles', () => {
	it('owners change roles; the change is logged', async () => {
		const r = await changeMemberRole(
			env.db,
			await access(people.owner),
			people.viewer.id,
			'designer'
		);
		expect(r.from).toBe('viewer');
		expect((await getMembership(env.db, team.id, people.viewer.id))?.role).toBe('designer');
		const [e] = await listTeamEvents(env.db, team.id);
		expect(e.kind).toBe('member.role-changed');
		expect(e.detail).toMatchObject({ from: 'viewer', to: 'designer' });
	});

	it('a designer cannot make themself owner, nor anyone anything', async () => {
		await expectAppError(
			changeMemberRole(env.db, await access(people.designer), people.designer.id, 'owner'),
			403
		);
		await expectAppError(
			changeMemberRole(env.db, await access(people.checker), people.viewer.id, 'designer'),
			403
		);
		expect((await getMembership(env.db, team.id, people.designer.id))?.role).toBe('designer');
	});

	it('keeps at least one owner', async () => {
		const a = await access(people.owner);
		await expectAppError(
			changeMemberRole(env.db, a, people.owner.id, 'designer'),
			409,
			'last-owner'
		);
		await expectAppError(leaveTeam(env.db, a), 409, 'last-owner');
		await changeMemberRole(env.db, a, people.checker.id, 'owner');
		await changeMemberRole(env.db, a, people.owner.id, 'viewer');
		expect((await getMembership(env.db, team.id, people.owner.id))?.role).toBe('viewer');
		const b = await access(people.checker);
		await expectAppError(removeTeamMember(env.db, b, people.checker.id), 400, 'use-leave');
	});

	it('cannot act on someone who is not in the team', async () => {
		await expectAppError(
			changeMemberRole(env.db, await access(people.owner), people.outsider.id, 'owner'),
			404,
			'not-found'
		);
		await expectAppError(
			removeTeamMember(env.db, await access(people.owner), people.outsider.id),
			404,
			'not-found'
		);
		expect(await getMembership(env.db, team.id, people.outsider.id)).toBeUndefined();
	});

	it('revokes tokens a demoted or departing member can no longer hold', async () => {
		const d = await access(people.designer);
		await createTeamToken(env.db, d, { name: 'designer script', role: 'designer' });
		await createTeamToken(env.db, d, { name: 'read script', role: 'viewer' });
		const r = await changeMemberRole(
			env.db,
			await access(people.owner),
			people.designer.id,
			'checker'
		);
		expect(r.revokedTokens).toBe(1);
		expect((await listApiTokens(env.db, team.id)).map((t) => t.name)).toEqual(['read script']);
		await removeTeamMember(env.db, await access(people.owner), people.designer.id);
		expect(await listApiTokens(env.db, team.id)).toEqual([]);
	});

	it('lets any member leave, and renames only for owners', async () => {
		await leaveTeam(env.db, await access(people.viewer));
		expect(await getMembership(env.db, team.id, people.viewer.id)).toBeUndefined();
		await expectAppError(
			renameTeam(env.db, await access(people.designer), { name: 'Hijacked', description: '' }),
			403
		);
		await renameTeam(env.db, await access(people.owner), {
			name: 'Heat Works North',
			description: 'd'
		});
		expect((await access(people.owner)).team.name).toBe('Heat Works North');
	});
});
