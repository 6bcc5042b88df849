import type { Kysely } from 'kysely';
import { config } from '../config';
import { openDatabase } from './connection';
import { migrateToLatest } from './migrate';
import { migrations } from './migrations';
import type { Database } from './schema';

export type { DB } from './schema';

let instance: Kysely<Database> | undefined;

/** The app's one database handle, opened on first use from DATABASE_PATH. */
export function getDb(): Kysely<Database> {
	instance ??= openDatabase(config().databasePath);
	return instance;
}

/** Applies pending migrations to the app database; returns the names applied. */
export async function migrateAppDatabase(): Promise<string[]> {
	const results = await migrateToLatest(getDb(), migrations);
	return results.filter((r) => r.status === 'Success').map((r) => r.migrationName);
}

/** A fresh, fully migrated in-memory database for tests. */
export async function createTestDb(): Promise<Kysely<Database>> {
	const db = openDatabase(':memory:');
	await migrateToLatest(db, migrations);
	return db;
}
