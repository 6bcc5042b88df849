import type { Kysely } from 'kysely';
import { openDatabase } from './connection';
import { migrateToLatest } from './migrate';
import { migrations } from './migrations';
import type { Database } from './schema';

export type { DB } from './schema';

/** A fresh, fully migrated in-memory database for tests. */
export async function createTestDb(): Promise<Kysely<Database>> {
	const db = openDatabase(':memory:');
	await migrateToLatest(db, migrations);
	return db;
}
