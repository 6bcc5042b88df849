import { roleWithin, ROLE_LABEL, type Role } from '$lib/roles';
import { transaction } from './db/dialect';
import type { ApiToken, DB, Team } from './db/schema';
import {
	getLiveApiTokenByHash,
	getTeamApiToken,
	insertApiToken,
	revokeApiToken,
	touchApiToken
} from './db/api-tokens';
import { getTeamById } from './db/teams';
import { logTeamEvent } from './db/team-events';
import { AppError } from './errors';
import { newSecret, sha256 } from './secrets';
import type { TeamAccess, TokenPrincipal } from './access';
import { can } from '$lib/roles';

/*
 * API tokens for scripts. A token belongs to one team and carries a role chosen when it is
 * created, which may not exceed its creator's (an owner may mint any role, a designer a
 * designer or viewer token). The token is shown once; only its SHA-256 is stored. When its
 * creator leaves the team, or moves to a role that no longer covers the token's role, the token
 * is revoked (see teams.ts). Tokens authenticate only on /api/v1/*.
 */

export const TOKEN_PREFIX = 'swt_';
const TOKEN_PATTERN = /^swt_[A-Za-z0-9_-]{43}$/;
const LAST_USED_RESOLUTION_MS = 60_000;

export type { TokenPrincipal } from './access';

/** The roles a member may give a new token. */
export function grantableTokenRoles(role: Role): Role[] {
	if (!can(role, 'token:create')) return [];
	return (['owner', 'designer', 'checker', 'viewer'] as const).filter((r) => roleWithin(r, role));
}

export async function createTeamToken(
	db: DB,
	access: TeamAccess,
	input: { name: string; role: Role }
): Promise<{ token: string; row: ApiToken }> {
	if (access.principal.kind !== 'user')
		throw new AppError(403, 'forbidden', 'API tokens are created by people, not by other tokens.');
	const creator = access.principal.user.id;
	if (!grantableTokenRoles(access.role).includes(input.role)) {
		throw new AppError(
			403,
			'role-too-high',
			`As ${ROLE_LABEL[access.role].toLowerCase()} you can create tokens with these roles: ${grantableTokenRoles(access.role).join(', ') || 'none'}.`,
			'role'
		);
	}
	const token = TOKEN_PREFIX + newSecret();
	const row = await transaction(db, async (trx) => {
		const row = await insertApiToken(trx, {
			teamId: access.team.id,
			name: input.name,
			tokenHash: sha256(token),
			prefix: token.slice(0, TOKEN_PREFIX.length + 6),
			role: input.role,
			createdBy: creator
		});
		await logTeamEvent(trx, {
			teamId: access.team.id,
			actorId: access.actor.id,
			actorLabel: access.actor.label,
			kind: 'token.created',
			detail: { name: row.name, role: row.role }
		});
		return row;
	});
	return { token, row };
}

/** Owners revoke any token of the team; designers their own. */
export async function revokeTeamToken(
	db: DB,
	access: TeamAccess,
	tokenId: string
): Promise<ApiToken> {
	const row = await getTeamApiToken(db, access.team.id, tokenId);
	if (!row || row.revoked_at !== null)
		throw new AppError(404, 'not-found', 'No such token in this team (it may already be revoked).');
	const own = access.principal.kind === 'user' && row.created_by === access.actor.id;
	if (!own && !can(access.role, 'team:manage')) {
		throw new AppError(403, 'forbidden', 'Only owners can revoke tokens other people created.');
	}
	await transaction(db, async (trx) => {
		await revokeApiToken(trx, access.team.id, row.id);
		await logTeamEvent(trx, {
			teamId: access.team.id,
			actorId: access.actor.id,
			actorLabel: access.actor.label,
			kind: 'token.revoked',
			detail: { name: row.name }
		});
	});
	return row;
}

/** The principal for an `Authorization: Bearer …` value, or null if it is not a live token. */
export async function authenticateToken(
	db: DB,
	bearer: string
): Promise<{ principal: TokenPrincipal; team: Team } | null> {
	if (!TOKEN_PATTERN.test(bearer)) return null;
	const row = await getLiveApiTokenByHash(db, sha256(bearer));
	if (!row) return null;
	const team = await getTeamById(db, row.team_id);
	if (!team) return null;
	const now = Date.now();
	if (row.last_used_at === null || now - row.last_used_at > LAST_USED_RESOLUTION_MS)
		await touchApiToken(db, row.id, now);
	return {
		principal: {
			id: row.id,
			name: row.name,
			role: row.role,
			teamId: row.team_id,
			createdBy: row.created_by,
			createdByName: row.created_by_name
		},
		team
	};
}
