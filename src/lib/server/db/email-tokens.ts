import type { DB, EmailToken, EmailTokenPurpose } from './schema';
import { newId } from './ids';
import { normalizeEmail } from './users';

export async function insertEmailToken(
	db: DB,
	input: {
		userId: string;
		purpose: EmailTokenPurpose;
		tokenHash: string;
		email: string;
		expiresAt: number;
	},
	now = Date.now()
): Promise<EmailToken> {
	const row: EmailToken = {
		id: newId(),
		user_id: input.userId,
		purpose: input.purpose,
		token_hash: input.tokenHash,
		email: normalizeEmail(input.email),
		created_at: now,
		expires_at: input.expiresAt,
		used_at: null
	};
	await db.insertInto('email_tokens').values(row).execute();
	return row;
}

export async function getEmailToken(
	db: DB,
	purpose: EmailTokenPurpose,
	tokenHash: string
): Promise<EmailToken | undefined> {
	return db
		.selectFrom('email_tokens')
		.selectAll()
		.where('purpose', '=', purpose)
		.where('token_hash', '=', tokenHash)
		.executeTakeFirst();
}

/** Marks a token used; false if it was already used (a second click, or a race). */
export async function markEmailTokenUsed(db: DB, id: string, now = Date.now()): Promise<boolean> {
	const r = await db
		.updateTable('email_tokens')
		.set({ used_at: now })
		.where('id', '=', id)
		.where('used_at', 'is', null)
		.executeTakeFirst();
	return Number(r.numUpdatedRows) > 0;
}

/** Retires every unused token of one purpose for a user (a new link, or a finished reset). */
export async function retireEmailTokens(
	db: DB,
	userId: string,
	purpose: EmailTokenPurpose,
	now = Date.now()
): Promise<void> {
	await db
		.updateTable('email_tokens')
		.set({ used_at: now })
		.where('user_id', '=', userId)
		.where('purpose', '=', purpose)
		.where('used_at', 'is', null)
		.execute();
}
