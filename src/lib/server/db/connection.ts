import Database from 'better-sqlite3';
import { Kysely, SqliteDialect } from 'kysely';
import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import type { Database as Schema } from './schema';

/**
 * Opens a SQLite file (or ':memory:') with the pragmas the app relies on: WAL so readers never
 * wait for the writer, foreign keys enforced, and a busy timeout for a second process (the
 * migrate script) touching the same file.
 */
export function openDatabase(path: string): Kysely<Schema> {
	if (path !== ':memory:') mkdirSync(dirname(path), { recursive: true });
	const sqlite = new Database(path);
	sqlite.pragma('journal_mode = WAL');
	sqlite.pragma('foreign_keys = ON');
	sqlite.pragma('busy_timeout = 5000');
	sqlite.pragma('synchronous = NORMAL');
	return new Kysely<Schema>({ dialect: new SqliteDialect({ database: sqlite }) });
}
