import type { Kysely } from 'kysely';
import { config } from './config';
import { openDatabase } from './db/connection';
import { migrateToLatest } from './db/migrate';
import { migrations } from './db/migrations';
import type { Database } from './db/schema';

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
