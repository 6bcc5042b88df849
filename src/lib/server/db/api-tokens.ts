import type { Role } from '$lib/roles';
import type { ApiToken, DB } from './schema';
import { newId } from './ids';

export async function insertApiToken(
	db: DB,
	input: {
		teamId: string;
		name: string;
		tokenHash: string;
		prefix: string;
		role: Role;
		createdBy: string;
	},
	now = Date.now()
): Promise<ApiToken> {
	const row: ApiToken = {
		id: newId(),
		team_id: input.teamId,
		name: input.name.trim(),
		token_hash: input.tokenHash,
		prefix: input.prefix,
		role: input.role,
		created_by: input.createdBy,
		created_at: now,
		last_used_at: null,
		revoked_at: null
	};
	await db.insertInto('api_tokens').values(row).execute();
	return row;
}

/** A live (not revoked) token by its hash. */
/** A live token by its hash, with its creator's name (null when the account is gone). */
export async function getLiveApiTokenByHash(
	db: DB,
	tokenHash: string
): Promise<(ApiToken & { created_by_name: string | null }) | undefined> {
	return db
		.selectFrom('api_tokens')
		.leftJoin('users', 'users.id', 'api_tokens.created_by')
		.selectAll('api_tokens')
		.select('users.name as created_by_name')
		.where('api_tokens.token_hash', '=', tokenHash)
		.where('api_tokens.revoked_at', 'is', null)
		.executeTakeFirst();
}

export async function getTeamApiToken(
	db: DB,
	teamId: string,
	id: string
): Promise<ApiToken | undefined> {
	return db
		.selectFrom('api_tokens')
		.selectAll()
		.where('team_id', '=', teamId)
		.where('id', '=', id)
		.executeTakeFirst();
}

export interface ListedApiToken extends Omit<ApiToken, 'token_hash'> {
	created_by_name: string | null;
}

/** Live tokens of a team, newest first (the hash never leaves this module). */
export async function listApiTokens(db: DB, teamId: string): Promise<ListedApiToken[]> {
	return db
		.selectFrom('api_tokens as k')
		.leftJoin('users as u', 'u.id', 'k.created_by')
		.select([
			'k.id',
			'k.team_id',
			'k.name',
			'k.prefix',
			'k.role',
			'k.created_by',
			'k.created_at',
			'k.last_used_at',
			'k.revoked_at',
			'u.name as created_by_name'
		])
		.where('k.team_id', '=', teamId)
		.where('k.revoked_at', 'is', null)
		.orderBy('k.created_at', 'desc')
		.execute();
}

export async function revokeApiToken(
	db: DB,
	teamId: string,
	id: string,
	now = Date.now()
): Promise<boolean> {
	const r = await db
		.updateTable('api_tokens')
		.set({ revoked_at: now })
		.where('team_id', '=', teamId)
		.where('id', '=', id)
		.where('revoked_at', 'is', null)
		.executeTakeFirst();
	return Number(r.numUpdatedRows) > 0;
}

/** Revokes a member's live tokens in a team, all of them or only those whose role is in `roles`. */
export async function revokeMemberApiTokens(
	db: DB,
	teamId: string,
	userId: string,
	roles?: readonly Role[],
	now = Date.now()
): Promise<number> {
	let q = db
		.updateTable('api_tokens')
		.set({ revoked_at: now })
		.where('team_id', '=', teamId)
		.where('created_by', '=', userId)
		.where('revoked_at', 'is', null);
	if (roles) {
		if (roles.length === 0) return 0;
		q = q.where('role', 'in', roles);
	}
	const r = await q.executeTakeFirst();
	return Number(r.numUpdatedRows);
}

export async function touchApiToken(db: DB, id: string, now = Date.now()): Promise<void> {
	await db.updateTable('api_tokens').set({ last_used_at: now }).where('id', '=', id).execute();
}
