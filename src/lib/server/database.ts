import type { Kysely } from 'kysely';
import { config } from './config';
import { isPostgresUrl, openDatabase, openPostgres } from './db/connection';
import { migrateToLatest } from './db/migrate';
import { migrations } from './db/migrations';
import type { Database } from './db/schema';

let instance: Kysely<Database> | undefined;

/** The app's one database handle, opened on first use: DATABASE_URL (PostgreSQL) or DATABASE_PATH. */
export function getDb(): Kysely<Database> {
	const c = config();
	instance ??= isPostgresUrl(c.databaseUrl)
		? openPostgres(c.databaseUrl)
		: openDatabase(c.databasePath);
	return instance;
}

/** Where the app's data lives, for the start-up banner (a URL without its password). */
export function databaseLabel(): string {
	const c = config();
	if (!c.databaseUrl) return c.databasePath;
	const u = new URL(c.databaseUrl);
	if (u.password) u.password = '***';
	return `PostgreSQL ${u.toString()}`;
}

/** Applies pending migrations to the app database; returns the names applied. */
export async function migrateAppDatabase(): Promise<string[]> {
	const results = await migrateToLatest(getDb(), migrations);
	return results.filter((r) => r.status === 'Success').map((r) => r.migrationName);
}
