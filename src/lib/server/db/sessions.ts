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
	const session = await db
		.selectFrom('sessions')
		.selectAll()
		.where('id', '=', id)
		.executeTakeFirst();
	if (!session) return { session: undefined, user: undefined };
	const user = await db
		.selectFrom('users')
		.selectAll()
		.where('id', '=', session.user_id)
		.executeTakeFirst();
	return user ? { session, user } : { session, user: undefined };
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
