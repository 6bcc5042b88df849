import type { DB, User } from './schema';
import { newId } from './ids';

export function normalizeEmail(email: string): string {
	return email.trim().toLowerCase();
}

export async function createUser(
	db: DB,
	input: { email: string; name: string; passwordHash: string; emailVerified?: boolean },
	now = Date.now()
): Promise<User> {
	const user: User = {
		id: newId(),
		email: normalizeEmail(input.email),
		name: input.name.trim(),
		password_hash: input.passwordHash,
		email_verified_at: input.emailVerified ? now : null,
		created_at: now,
		updated_at: now
	};
	await db.insertInto('users').values(user).execute();
	return user;
}

export async function getUserById(db: DB, id: string): Promise<User | undefined> {
	return db.selectFrom('users').selectAll().where('id', '=', id).executeTakeFirst();
}

export async function getUserByEmail(db: DB, email: string): Promise<User | undefined> {
	return db
		.selectFrom('users')
		.selectAll()
		.where('email', '=', normalizeEmail(email))
		.executeTakeFirst();
}

export async function countUsers(db: DB): Promise<number> {
	const row = await db
		.selectFrom('users')
		.select((eb) => eb.fn.countAll<number>().as('n'))
		.executeTakeFirstOrThrow();
	return Number(row.n);
}

export async function updateUserName(
	db: DB,
	id: string,
	name: string,
	now = Date.now()
): Promise<void> {
	await db
		.updateTable('users')
		.set({ name: name.trim(), updated_at: now })
		.where('id', '=', id)
		.execute();
}

export async function setPasswordHash(
	db: DB,
	id: string,
	passwordHash: string,
	now = Date.now()
): Promise<void> {
	await db
		.updateTable('users')
		.set({ password_hash: passwordHash, updated_at: now })
		.where('id', '=', id)
		.execute();
}

/** Marks the address verified, but only if it is still the user's address. */
export async function markEmailVerified(
	db: DB,
	id: string,
	email: string,
	now = Date.now()
): Promise<boolean> {
	const result = await db
		.updateTable('users')
		.set({ email_verified_at: now, updated_at: now })
		.where('id', '=', id)
		.where('email', '=', normalizeEmail(email))
		.where('email_verified_at', 'is', null)
		.executeTakeFirst();
	return Number(result.numUpdatedRows) > 0;
}
