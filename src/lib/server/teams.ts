import { roleWithin, ROLES, type Role } from '$lib/roles';
import { transaction } from './db/dialect';
import type { DB, Invite, Team, User } from './db/schema';
import { createTeam, getTeamById, updateTeam } from './db/teams';
import {
	addMember,
	countOwners,
	getMembership,
	removeMember,
	setMemberRole
} from './db/memberships';
import {
	getInviteByTokenHash,
	getTeamInvite,
	insertInvite,
	markInviteAccepted,
	revokeInvite,
	revokeOpenInvitesFor
} from './db/invites';
import { getUserByEmail, getUserById, markEmailVerified, normalizeEmail } from './db/users';
import { revokeMemberApiTokens } from './db/api-tokens';
import { logTeamEvent } from './db/team-events';
import { AppError } from './errors';
import { newSecret, sha256 } from './secrets';
import { inviteLimits } from './rate-limit';
import { inviteMail } from './mail-templates';
import type { FlowContext, SessionUser } from './auth';
import type { TeamAccess } from './guard';

/*
 * Team membership rules, each write in one transaction:
 * - a team always keeps at least one owner (no demoting, removing or leaving the last one);
 * - invitations carry a role and a single-use token, last INVITE_DAYS days, and can be accepted
 *   only by an account with the invited address;
 * - when a member leaves or is demoted, API tokens they created that their new role no longer
 *   covers are revoked.
 * Callers pass a TeamAccess from guard.requireTeam(…, 'team:manage') for owner-only actions.
 */

export const INVITE_DAYS = 7;

function assertManager(access: TeamAccess) {
	if (!access.can('team:manage'))
		throw new AppError(403, 'forbidden', 'Only owners can manage the team.');
}

function log(
	db: DB,
	access: TeamAccess,
	kind: Parameters<typeof logTeamEvent>[1]['kind'],
	detail: Record<string, unknown>
) {
	return logTeamEvent(db, {
		teamId: access.team.id,
		actorId: access.actor.id,
		actorLabel: access.actor.label,
		kind,
		detail
	});
}

export async function createTeamFor(
	db: DB,
	user: SessionUser,
	input: { name: string; description?: string }
): Promise<Team> {
	return transaction(db, async (trx) => {
		const team = await createTeam(trx, {
			name: input.name,
			description: input.description,
			ownerId: user.id
		});
		await logTeamEvent(trx, {
			teamId: team.id,
			actorId: user.id,
			actorLabel: user.name,
			kind: 'team.created',
			detail: { name: team.name }
		});
		return team;
	});
}

export async function renameTeam(
	db: DB,
	access: TeamAccess,
	input: { name: string; description: string }
): Promise<void> {
	assertManager(access);
	await transaction(db, async (trx) => {
		await updateTeam(trx, access.team.id, input);
		await log(trx, access, 'team.renamed', { from: access.team.name, to: input.name.trim() });
	});
}

export interface InviteResult {
	invite: Invite;
	/** the link, shown once to the owner in case the mail does not arrive */
	url: string;
	mailed: boolean;
}

export async function inviteMember(
	db: DB,
	access: TeamAccess,
	input: { email: string; role: Role },
	ctx: FlowContext
): Promise<InviteResult> {
	assertManager(access);
	const email = normalizeEmail(input.email);
	const existing = await getUserByEmail(db, email);
	if (existing && (await getMembership(db, access.team.id, existing.id))) {
		throw new AppError(
			409,
			'already-member',
			`${email} is already a member of ${access.team.name}. Change their role in the member list instead.`,
			'email'
		);
	}
	const limit = await inviteLimits.take(access.team.id);
	if (!limit.allowed)
		throw new AppError(
			429,
			'rate-limited',
			`This team has sent many invitations recently. Try again in ${Math.ceil(limit.retryAfterMs / 60_000)} minutes.`
		);
	const token = newSecret();
	const expiresAt = Date.now() + INVITE_DAYS * 86_400_000;
	const invite = await transaction(db, async (trx) => {
		await revokeOpenInvitesFor(trx, access.team.id, email);
		const invite = await insertInvite(trx, {
			teamId: access.team.id,
			email,
			role: input.role,
			tokenHash: sha256(token),
			invitedBy: access.actor.id,
			expiresAt
		});
		await log(trx, access, 'invite.sent', { email, role: input.role });
		return invite;
	});
	const url = `${ctx.origin}/invite/${token}`;
	let mailed = true;
	try {
		await ctx.send({
			to: email,
			...inviteMail({
				teamName: access.team.name,
				inviterName: access.actor.label,
				role: input.role,
				url,
				expiresAt
			})
		});
	} catch (e) {
		console.error('[statewright] invite mail failed:', e);
		mailed = false;
	}
	return { invite, url, mailed };
}

export async function cancelInvite(db: DB, access: TeamAccess, inviteId: string): Promise<Invite> {
	assertManager(access);
	const invite = await getTeamInvite(db, access.team.id, inviteId);
	if (!invite) throw new AppError(404, 'not-found', 'No such invitation in this team.');
	await transaction(db, async (trx) => {
		if (!(await revokeInvite(trx, access.team.id, inviteId))) {
			throw new AppError(
				409,
				'invite-closed',
				'This invitation was already accepted or withdrawn.'
			);
		}
		await log(trx, access, 'invite.revoked', { email: invite.email });
	});
	return invite;
}

export type InviteState = 'open' | 'accepted' | 'revoked' | 'expired';

export interface InviteView {
	invite: Invite;
	team: Team;
	inviterName: string | null;
	state: InviteState;
}

/** What an invitation link points at, whatever its state; null if the token is unknown. */
export async function inspectInvite(db: DB, token: string): Promise<InviteView | null> {
	if (!/^[A-Za-z0-9_-]{43}$/.test(token)) return null;
	const invite = await getInviteByTokenHash(db, sha256(token));
	if (!invite) return null;
	const team = await getTeamById(db, invite.team_id);
	if (!team) return null;
	const inviter = invite.invited_by ? await getUserById(db, invite.invited_by) : undefined;
	const state: InviteState =
		invite.accepted_at !== null
			? 'accepted'
			: invite.revoked_at !== null
				? 'revoked'
				: invite.expires_at <= Date.now()
					? 'expired'
					: 'open';
	return { invite, team, inviterName: inviter?.name ?? null, state };
}

const CLOSED: Record<Exclude<InviteState, 'open'>, string> = {
	accepted:
		'This invitation has already been used. Ask an owner of the team for a new one if you still need to join.',
	revoked: 'This invitation was withdrawn by an owner of the team, or replaced by a newer one.',
	expired: `This invitation has expired (they last ${INVITE_DAYS} days). Ask an owner of the team for a new one.`
};

/**
 * Accepts an invitation for the signed-in user, whose address must be the invited one. The
 * invitation is used up, the user joins with its role, and their address counts as confirmed.
 */
export async function acceptInvite(db: DB, token: string, user: SessionUser): Promise<Team> {
	const view = await inspectInvite(db, token);
	if (!view)
		throw new AppError(
			404,
			'link-invalid',
			'This invitation link is not valid. Check that you copied all of it.'
		);
	if (view.state !== 'open') throw new AppError(410, `invite-${view.state}`, CLOSED[view.state]);
	if (normalizeEmail(user.email) !== view.invite.email) {
		throw new AppError(
			403,
			'wrong-account',
			`This invitation is for ${view.invite.email}, but you are signed in as ${user.email}. Sign out and sign in (or sign up) with the invited address.`
		);
	}
	await transaction(db, async (trx) => {
		if (await getMembership(trx, view.team.id, user.id)) {
			throw new AppError(409, 'already-member', `You are already a member of ${view.team.name}.`);
		}
		if (!(await markInviteAccepted(trx, view.invite.id, user.id)))
			throw new AppError(410, 'invite-accepted', CLOSED.accepted);
		await addMember(trx, view.team.id, user.id, view.invite.role);
		await markEmailVerified(trx, user.id, user.email);
		await logTeamEvent(trx, {
			teamId: view.team.id,
			actorId: user.id,
			actorLabel: user.name,
			kind: 'invite.accepted',
			detail: { email: user.email, role: view.invite.role }
		});
	});
	return view.team;
}

async function requireMember(
	db: DB,
	access: TeamAccess,
	userId: string
): Promise<{ user: User; role: Role }> {
	const m = await getMembership(db, access.team.id, userId);
	const user = m ? await getUserById(db, userId) : undefined;
	if (!m || !user)
		throw new AppError(404, 'not-found', 'That person is not a member of this team.');
	return { user, role: m.role };
}

async function assertOwnerRemains(db: DB, teamId: string, losing: Role) {
	if (losing === 'owner' && (await countOwners(db, teamId)) <= 1) {
		throw new AppError(
			409,
			'last-owner',
			'A team needs at least one owner. Make someone else owner first.'
		);
	}
}

/** Revokes the member's tokens whose role their new role (or none) no longer covers. */
async function revokeUncoveredTokens(
	db: DB,
	teamId: string,
	userId: string,
	newRole: Role | null
): Promise<number> {
	const uncovered = ROLES.filter((r) => newRole === null || !roleWithin(r, newRole));
	return revokeMemberApiTokens(db, teamId, userId, uncovered);
}

export async function changeMemberRole(
	db: DB,
	access: TeamAccess,
	userId: string,
	role: Role
): Promise<{ from: Role; revokedTokens: number }> {
	assertManager(access);
	return transaction(db, async (trx) => {
		const member = await requireMember(trx, access, userId);
		if (member.role === role) return { from: role, revokedTokens: 0 };
		await assertOwnerRemains(trx, access.team.id, member.role);
		await setMemberRole(trx, access.team.id, userId, role);
		const revokedTokens = await revokeUncoveredTokens(trx, access.team.id, userId, role);
		await log(trx, access, 'member.role-changed', {
			name: member.user.name,
			email: member.user.email,
			from: member.role,
			to: role,
			revokedTokens
		});
		return { from: member.role, revokedTokens };
	});
}

export async function removeTeamMember(db: DB, access: TeamAccess, userId: string): Promise<User> {
	assertManager(access);
	if (access.principal.kind === 'user' && userId === access.principal.user.id) {
		throw new AppError(400, 'use-leave', 'To remove yourself, use "Leave team".');
	}
	return transaction(db, async (trx) => {
		const member = await requireMember(trx, access, userId);
		await assertOwnerRemains(trx, access.team.id, member.role);
		await removeMember(trx, access.team.id, userId);
		await revokeUncoveredTokens(trx, access.team.id, userId, null);
		await log(trx, access, 'member.removed', {
			name: member.user.name,
			email: member.user.email,
			role: member.role
		});
		return member.user;
	});
}

export async function leaveTeam(db: DB, access: TeamAccess): Promise<void> {
	if (access.principal.kind !== 'user')
		throw new AppError(403, 'forbidden', 'Tokens cannot leave teams.');
	const userId = access.principal.user.id;
	await transaction(db, async (trx) => {
		const m = await getMembership(trx, access.team.id, userId);
		if (!m) throw new AppError(404, 'not-found', 'You are not a member of this team.');
		await assertOwnerRemains(trx, access.team.id, m.role);
		await removeMember(trx, access.team.id, userId);
		await revokeUncoveredTokens(trx, access.team.id, userId, null);
		await log(trx, access, 'member.left', { role: m.role });
	});
}
