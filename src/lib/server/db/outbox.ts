import type { DB, OutboxMessage } from './schema';

export type NewOutboxMessage = Omit<OutboxMessage, 'id'>;

export async function insertOutboxMessage(db: DB, message: NewOutboxMessage): Promise<number> {
	const row = await db.insertInto('outbox').values(message).returning('id').executeTakeFirstOrThrow();
	return row.id;
}

export type OutboxSummary = Omit<OutboxMessage, 'raw' | 'html'>;

/** Newest first; optionally only messages to one address. */
export async function listOutboxMessages(db: DB, options: { to?: string; limit?: number } = {}): Promise<OutboxSummary[]> {
	let q = db
		.selectFrom('outbox')
		.select(['id', 'message_id', 'envelope_from', 'envelope_to', 'from_header', 'to_header', 'subject', 'text', 'received_at'])
		.orderBy('id', 'desc')
		.limit(Math.min(Math.max(options.limit ?? 100, 1), 500));
	if (options.to) {
		// envelope_to is a JSON array of lower-cased addresses
		q = q.where('envelope_to', 'like', `%"${options.to.trim().toLowerCase().replace(/[%_"\\]/g, '')}"%`);
	}
	return q.execute();
}

export async function getOutboxMessage(db: DB, id: number): Promise<OutboxMessage | undefined> {
	return db.selectFrom('outbox').selectAll().where('id', '=', id).executeTakeFirst();
}

export async function clearOutbox(db: DB): Promise<void> {
	await db.deleteFrom('outbox').execute();
}
