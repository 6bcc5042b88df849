import type { Role } from '$lib/roles';
import type { DB, Invite } from './schema';
import { newId } from './ids';
import { normalizeEmail } from './users';

export async function insertInvite(
	db: DB,
	input: {
		teamId: string;
		email: string;
		role: Role;
		tokenHash: string;
		invitedBy: string | null;
		expiresAt: number;
	},
	now = Date.now()
): Promise<Invite> {
	const invite: Invite = {
		id: newId(),
		team_id: input.teamId,
		email: normalizeEmail(input.email),
		role: input.role,
		token_hash: input.tokenHash,
		invited_by: input.invitedBy,
		created_at: now,
		expires_at: input.expiresAt,
		accepted_at: null,
		accepted_by: null,
		revoked_at: null
	};
	await db.insertInto('invites').values(invite).execute();
	return invite;
}

export async function getInviteByTokenHash(db: DB, tokenHash: string): Promise<Invite | undefined> {
	return db
		.selectFrom('invites')
		.selectAll()
		.where('token_hash', '=', tokenHash)
		.executeTakeFirst();
}

export async function getTeamInvite(
	db: DB,
	teamId: string,
	id: string
): Promise<Invite | undefined> {
	return db
		.selectFrom('invites')
		.selectAll()
		.where('team_id', '=', teamId)
		.where('id', '=', id)
		.executeTakeFirst();
}

export interface PendingInvite extends Invite {
	invited_by_name: string | null;
}

/** Invites not yet accepted, revoked or expired, newest first. */
export async function listPendingInvites(
	db: DB,
	teamId: string,
	now = Date.now()
): Promise<PendingInvite[]> {
	return db
		.selectFrom('invites as i')
		.leftJoin('users as u', 'u.id', 'i.invited_by')
		.selectAll('i')
		.select('u.name as invited_by_name')
		.where('i.team_id', '=', teamId)
		.where('i.accepted_at', 'is', null)
		.where('i.revoked_at', 'is', null)
		.where('i.expires_at', '>', now)
		.orderBy('i.created_at', 'desc')
		.execute();
}

/** Revokes every open invite of `email` to the team (a new invite replaces the old link). */
export async function revokeOpenInvitesFor(
	db: DB,
	teamId: string,
	email: string,
	now = Date.now()
): Promise<void> {
	await db
		.updateTable('invites')
		.set({ revoked_at: now })
		.where('team_id', '=', teamId)
		.where('email', '=', normalizeEmail(email))
		.where('accepted_at', 'is', null)
		.where('revoked_at', 'is', null)
		.execute();
}

export async function revokeInvite(
	db: DB,
	teamId: string,
	id: string,
	now = Date.now()
): Promise<boolean> {
	const r = await db
		.updateTable('invites')
		.set({ revoked_at: now })
		.where('team_id', '=', teamId)
		.where('id', '=', id)
		.where('accepted_at', 'is', null)
		.where('revoked_at', 'is', null)
		.executeTakeFirst();
	return Number(r.numUpdatedRows) > 0;
}

/** Marks an open invite accepted; false if someone used or revoked it first. */
export async function markInviteAccepted(
	db: DB,
	id: string,
	userId: string,
	now = Date.now()
): Promise<boolean> {
	const r = await db
		.updateTable('invites')
		.set({ accepted_at: now, accepted_by: userId })
		.where('id', '=', id)
		.where('accepted_at', 'is', null)
		.where('revoked_at', 'is', null)
		.where('expires_at', '>', now)
		.executeTakeFirst();
	return Number(r.numUpdatedRows) > 0;
}
