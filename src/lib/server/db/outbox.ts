import type { DB, OutboxMessage } from './schema';
import { jsonArrayHas } from './dialect';

export type NewOutboxMessage = Omit<OutboxMessage, 'id'>;

export async function insertOutboxMessage(db: DB, message: NewOutboxMessage): Promise<number> {
	const row = await db
		.insertInto('outbox')
		.values(message)
		.returning('id')
		.executeTakeFirstOrThrow();
	return row.id;
}

export type OutboxSummary = Omit<OutboxMessage, 'raw' | 'html'>;

/** Newest first; optionally only messages to one address. */
export async function listOutboxMessages(
	db: DB,
	options: { to?: string; limit?: number } = {}
): Promise<OutboxSummary[]> {
	let q = db
		.selectFrom('outbox')
		.select([
			'id',
			'message_id',
			'envelope_from',
			'envelope_to',
			'from_header',
			'to_header',
			'subject',
			'text',
			'received_at'
		])
		.orderBy('id', 'desc')
		.limit(Math.min(Math.max(options.limit ?? 100, 1), 500));
	if (options.to) {
		// envelope_to is a JSON array of lower-cased addresses
		q = q.where(
			'envelope_to',
			'like',
			`%"${options.to
				.trim()
				.toLowerCase()
				.replace(/[%_"\\]/g, '')}"%`
		);
	}
	return q.execute();
}

export async function getOutboxMessage(db: DB, id: number): Promise<OutboxMessage | undefined> {
	return db.selectFrom('outbox').selectAll().where('id', '=', id).executeTakeFirst();
}

/*
 * One person's mail. An address matches only exactly (against the JSON array of envelope
 * recipients, never with LIKE), and only mail received since `since` (when the account was made:
 * mail sent to an address before anyone held it is not handed to whoever signs up with it later).
 */
function addressedTo(db: DB, address: string) {
	return jsonArrayHas(db, 'outbox.envelope_to', address.trim().toLowerCase());
}

/** Newest first: the mail whose envelope names `address`, received at or after `since`. */
export async function listMailFor(
	db: DB,
	address: string,
	since: number,
	limit = 200
): Promise<OutboxSummary[]> {
	return db
		.selectFrom('outbox')
		.select([
			'id',
			'message_id',
			'envelope_from',
			'envelope_to',
			'from_header',
			'to_header',
			'subject',
			'text',
			'received_at'
		])
		.where(addressedTo(db, address))
		.where('received_at', '>=', since)
		.orderBy('id', 'desc')
		.limit(Math.min(Math.max(limit, 1), 500))
		.execute();
}

/** One message, only if it is addressed to `address` and arrived at or after `since`. */
export async function getMailFor(
	db: DB,
	id: number,
	address: string,
	since: number
): Promise<OutboxMessage | undefined> {
	return db
		.selectFrom('outbox')
		.selectAll()
		.where('id', '=', id)
		.where(addressedTo(db, address))
		.where('received_at', '>=', since)
		.executeTakeFirst();
}

/** Deletes the mail addressed to `address` alone; mail that also went to others stays. Returns how many. */
export async function clearMailFor(db: DB, address: string): Promise<number> {
	const r = await db
		.deleteFrom('outbox')
		.where('envelope_to', '=', JSON.stringify([address.trim().toLowerCase()]))
		.executeTakeFirst();
	return Number(r.numDeletedRows);
}
