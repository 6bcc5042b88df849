import { sql, type Kysely } from 'kysely';
import { isPostgresUrl, openDatabase, openPostgres } from './connection';
import { migrateToLatest } from './migrate';
import { migrations } from './migrations';
import type { Database } from './schema';

export type { DB } from './schema';

/**
 * The PostgreSQL server the integration tests run on: TEST_POSTGRES_URL, inside the vitest
 * project that runs them there (vite.config.ts sets STATEWRIGHT_TEST_DB=postgres).
 */
export function testPostgresUrl(): string | undefined {
	const url = process.env.TEST_POSTGRES_URL;
	return process.env.STATEWRIGHT_TEST_DB === 'postgres' && isPostgresUrl(url) ? url : undefined;
}

/** Every schema a test database lives in starts with this (and is dropped after the run). */
export const TEST_SCHEMA_PREFIX = 'sw_test_';

const testSchemas = new WeakMap<Kysely<Database>, string>();
let schemaCount = 0;
/** this process's migrated schema, emptied for each next test while no other test db is open */
let reusable: { schema: string; open: boolean } | undefined;

async function onPostgres(url: string, run: (db: Kysely<Database>) => Promise<unknown>) {
	const admin = openPostgres(url, { max: 1 });
	try {
		await run(admin);
	} finally {
		await admin.destroy();
	}
}

/** Deletes every row of every table (not the migration bookkeeping): a migrated, empty database. */
async function emptyTables(db: Kysely<Database>): Promise<void> {
	const tables = await sql<{
		name: string;
	}>`select table_name as name from information_schema.tables
		where table_schema = current_schema() and table_type = 'BASE TABLE' and table_name not like 'kysely_%'`.execute(
		db
	);
	// the two roots first: most rows go with them by cascade
	const names = ['users', 'teams', ...tables.rows.map((r) => r.name)];
	for (const name of new Set(names)) await sql`delete from ${sql.id(name)}`.execute(db);
}

/**
 * A fresh, fully migrated database for tests: in memory (SQLite), or on TEST_POSTGRES_URL in the
 * PostgreSQL test project a schema of this test process's own, migrated once and emptied for
 * each next test (a schema per test would spend over a second migrating). Close it with
 * disposeTestDb.
 */
export async function createTestDb(): Promise<Kysely<Database>> {
	const url = testPostgresUrl();
	if (!url) {
		const db = openDatabase(':memory:');
		await migrateToLatest(db, migrations);
		return db;
	}
	if (reusable && !reusable.open) {
		const db = openPostgres(url, { schema: reusable.schema, max: 4, unsafeFastCommit: true });
		await emptyTables(db);
		reusable.open = true;
		testSchemas.set(db, reusable.schema);
		return db;
	}
	const schema = `${TEST_SCHEMA_PREFIX}${process.pid}_${++schemaCount}_${Math.random().toString(36).slice(2, 8)}`;
	await onPostgres(url, (admin) => sql`create schema ${sql.id(schema)}`.execute(admin));
	const db = openPostgres(url, { schema, max: 4, unsafeFastCommit: true });
	testSchemas.set(db, schema);
	await migrateToLatest(db, migrations);
	if (!reusable) reusable = { schema, open: true };
	return db;
}

/**
 * Closes a test database. On PostgreSQL the process's reusable schema is kept for the next test;
 * any other is dropped (all are dropped after the run by scripts/vitest-postgres.ts).
 */
export async function disposeTestDb(db: Kysely<Database>): Promise<void> {
	await db.destroy();
	const schema = testSchemas.get(db);
	const url = testPostgresUrl();
	if (!schema || !url) return;
	if (reusable?.schema === schema) reusable.open = false;
	else
		await onPostgres(url, (admin) =>
			sql`drop schema if exists ${sql.id(schema)} cascade`.execute(admin)
		);
}
