import type { DB } from './schema';
import { isPostgres } from './dialect';

export interface CounterRow {
	tokens: number;
	failures: number;
	at: number;
}

/**
 * Reads one counter, lets `step` decide its next value, and writes it, with no other process
 * stepping the same counter in between: on PostgreSQL the row is locked (created first if
 * missing, so two first requests cannot both see "no row"); SQLite runs one transaction at a
 * time. `step` gets undefined for a counter never seen; it returns the row to keep (or null
 * to forget it) and the answer.
 */
export async function stepCounter<T>(
	db: DB,
	name: string,
	key: string,
	step: (row: CounterRow | undefined) => { next: CounterRow | null; result: T }
): Promise<T> {
	const pg = isPostgres(db);
	return db.transaction().execute(async (trx) => {
		if (pg)
			await trx
				.insertInto('rate_limits')
				.values({ name, key, tokens: 0, failures: 0, at: -1 })
				.onConflict((oc) => oc.columns(['name', 'key']).doNothing())
				.execute();
		let q = trx
			.selectFrom('rate_limits')
			.select(['tokens', 'failures', 'at'])
			.where('name', '=', name)
			.where('key', '=', key);
		if (pg) q = q.forUpdate();
		const found = await q.executeTakeFirst();
		// at = -1: the placeholder inserted above, a counter never seen
		const row = found && found.at >= 0 ? found : undefined;
		const { next, result } = step(row);
		if (next === null) {
			if (found)
				await trx
					.deleteFrom('rate_limits')
					.where('name', '=', name)
					.where('key', '=', key)
					.execute();
		} else {
			await trx
				.insertInto('rate_limits')
				.values({ name, key, ...next, at: Math.max(0, next.at) })
				.onConflict((oc) =>
					oc.columns(['name', 'key']).doUpdateSet({
						tokens: next.tokens,
						failures: next.failures,
						at: Math.max(0, next.at)
					})
				)
				.execute();
		}
		return result;
	});
}

/** Forgets one key of a limit, or the whole limit. */
export async function deleteCounters(db: DB, name: string, key?: string): Promise<void> {
	let q = db.deleteFrom('rate_limits').where('name', '=', name);
	if (key !== undefined) q = q.where('key', '=', key);
	await q.execute();
}

/** Deletes counters untouched since `before` (a day-old counter is as good as none). */
export async function deleteStaleCounters(db: DB, before: number): Promise<number> {
	const r = await db.deleteFrom('rate_limits').where('at', '<', before).executeTakeFirst();
	return Number(r.numDeletedRows);
}
