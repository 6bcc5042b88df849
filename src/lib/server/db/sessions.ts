import type { DB, SessionRow, User } from './schema';

export async function insertSession(db: DB, session: SessionRow): Promise<void> {
	await db.insertInto('sessions').values(session).execute();
}

export async function getSessionAndUser(
	db: DB,
	id: string
): Promise<
	{ session: SessionRow; user: User } | { session: SessionRow | undefined; user: undefined }
> {
	// one round trip: the session and its person (a session whose person is gone comes back alone)
	const row = await db
		.selectFrom('sessions as s')
		.leftJoin('users as u', 'u.id', 's.user_id')
		.select([
			's.id',
			's.user_id',
			's.expires_at',
			's.created_at',
			's.last_seen_at',
			's.ip',
			's.user_agent',
			'u.id as u_id',
			'u.email as u_email',
			'u.name as u_name',
			'u.password_hash as u_password_hash',
			'u.email_verified_at as u_email_verified_at',
			'u.created_at as u_created_at',
			'u.updated_at as u_updated_at'
		])
		.where('s.id', '=', id)
		.executeTakeFirst();
	if (!row) return { session: undefined, user: undefined };
	const session: SessionRow = {
		id: row.id,
		user_id: row.user_id,
		expires_at: row.expires_at,
		created_at: row.created_at,
		last_seen_at: row.last_seen_at,
		ip: row.ip,
		user_agent: row.user_agent
	};
	if (row.u_id === null) return { session, user: undefined };
	return {
		session,
		user: {
			id: row.u_id,
			email: row.u_email!,
			name: row.u_name!,
			password_hash: row.u_password_hash!,
			email_verified_at: row.u_email_verified_at,
			created_at: row.u_created_at!,
			updated_at: row.u_updated_at!
		}
	};
}

export async function listUserSessions(
	db: DB,
	userId: string,
	now = Date.now()
): Promise<SessionRow[]> {
	return db
		.selectFrom('sessions')
		.selectAll()
		.where('user_id', '=', userId)
		.where('expires_at', '>', now)
		.orderBy('last_seen_at', 'desc')
		.execute();
}

export async function setSessionExpiry(db: DB, id: string, expiresAt: number): Promise<void> {
	await db.updateTable('sessions').set({ expires_at: expiresAt }).where('id', '=', id).execute();
}

export async function touchSession(db: DB, id: string, now = Date.now()): Promise<void> {
	await db.updateTable('sessions').set({ last_seen_at: now }).where('id', '=', id).execute();
}

export async function deleteSession(db: DB, id: string): Promise<void> {
	await db.deleteFrom('sessions').where('id', '=', id).execute();
}

/** Deletes one of a user's sessions; false when it is not theirs (or already gone). */
export async function deleteUserSession(db: DB, userId: string, id: string): Promise<boolean> {
	const r = await db
		.deleteFrom('sessions')
		.where('id', '=', id)
		.where('user_id', '=', userId)
		.executeTakeFirst();
	return Number(r.numDeletedRows) > 0;
}

export async function deleteUserSessions(
	db: DB,
	userId: string,
	exceptId?: string
): Promise<number> {
	let q = db.deleteFrom('sessions').where('user_id', '=', userId);
	if (exceptId) q = q.where('id', '!=', exceptId);
	const r = await q.executeTakeFirst();
	return Number(r.numDeletedRows);
}

export async function deleteExpiredSessions(db: DB, now = Date.now()): Promise<void> {
	await db.deleteFrom('sessions').where('expires_at', '<=', now).execute();
}
