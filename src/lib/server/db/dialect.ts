import { PostgresAdapter, sql, type Kysely, type RawBuilder, type Transaction } from 'kysely';

/*
 * What differs between the two databases the app runs on: SQLite (the embedded default) and
 * PostgreSQL (DATABASE_URL, for several app processes). Migrations and queries ask here instead
 * of testing the dialect themselves. Imports only kysely: the migrations load it under tsx too.
 */

export type DialectName = 'sqlite' | 'postgres';

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type AnyDb = Kysely<any>;

export function dialectOf(db: AnyDb): DialectName {
	return db.getExecutor().adapter instanceof PostgresAdapter ? 'postgres' : 'sqlite';
}

export const isPostgres = (db: AnyDb): boolean => dialectOf(db) === 'postgres';

/**
 * Column types for the migrations. SQLite keeps the types it was first created with (`integer`
 * holds any 64-bit value there); PostgreSQL needs `bigint` for Unix milliseconds (a 32-bit
 * `integer` ends in 1970) and `double precision` where SQLite's `real` is already 8 bytes.
 */
export function columnTypes(db: AnyDb) {
	const pg = isPostgres(db);
	return {
		/** Unix milliseconds, counters that could pass 2³¹ */
		time: pg ? ('bigint' as const) : ('integer' as const),
		real: pg ? ('double precision' as const) : ('real' as const),
		/** an integer key the database numbers itself */
		serial: pg ? ('bigserial' as const) : ('integer' as const),
		/** whether a `serial` column also needs `autoincrement` (SQLite's never-reused ids) */
		autoIncrement: !pg
	};
}

/** A unique or primary-key constraint refused a row (SQLite and PostgreSQL alike). */
export function isUniqueViolation(e: unknown): boolean {
	const code = (e as { code?: unknown } | null)?.code;
	if (code === '23505') return true;
	return (
		typeof code === 'string' &&
		(code === 'SQLITE_CONSTRAINT_UNIQUE' || code === 'SQLITE_CONSTRAINT_PRIMARYKEY')
	);
}

/** PostgreSQL asks the client to run the transaction again (serialization failure, deadlock). */
function isRetryable(e: unknown): boolean {
	const code = (e as { code?: unknown } | null)?.code;
	return code === '40001' || code === '40P01';
}

const RETRIES = 8;

/**
 * Runs `fn` in one transaction. SQLite runs transactions one at a time (one connection), so the
 * services' read-then-write steps (next sheet number, latest revision, last owner) see nothing
 * change under them. On PostgreSQL the same guarantee comes from SERIALIZABLE isolation: a
 * transaction that raced another is rolled back and run again, and the retry sees the winner's
 * rows (so two saves of one revision answer 201 and 409, never a 500). `fn` must touch only the
 * database, since it may run more than once.
 */
export async function transaction<DB, T>(
	db: Kysely<DB>,
	fn: (trx: Transaction<DB>) => Promise<T>
): Promise<T> {
	if (db.isTransaction) return fn(db as Transaction<DB>);
	if (!isPostgres(db)) return db.transaction().execute(fn);
	for (let attempt = 1; ; attempt++) {
		try {
			return await db.transaction().setIsolationLevel('serializable').execute(fn);
		} catch (e) {
			if (!isRetryable(e) || attempt >= RETRIES) throw e;
			await new Promise((r) => setTimeout(r, Math.random() * 5 * attempt));
		}
	}
}

/**
 * The text at `path` inside a JSON text column ('' when absent): SQLite's json_extract, or
 * PostgreSQL's `#>>` on the column read as jsonb.
 */
export function jsonText(db: AnyDb, column: string, path: readonly string[]): RawBuilder<string> {
	const col = sql.ref(column);
	return isPostgres(db)
		? sql<string>`coalesce(${col}::jsonb #>> ${sql.lit(`{${path.join(',')}}`)}, '')`
		: sql<string>`coalesce(json_extract(${col}, ${sql.lit(`$.${path.join('.')}`)}), '')`;
}

/** The length of the JSON array at `path` inside a JSON text column (0 when absent). */
export function jsonArrayLength(
	db: AnyDb,
	column: string,
	path: readonly string[]
): RawBuilder<number> {
	const col = sql.ref(column);
	if (!isPostgres(db))
		return sql<number>`coalesce(json_array_length(${col}, ${sql.lit(`$.${path.join('.')}`)}), 0)`;
	const at = sql`(${col}::jsonb #> ${sql.lit(`{${path.join(',')}}`)})`;
	return sql<number>`(case when jsonb_typeof(${at}) = 'array' then jsonb_array_length(${at}) else 0 end)`;
}

/** Whether the JSON array of strings in `column` holds `value` exactly. */
export function jsonArrayHas(db: AnyDb, column: string, value: string): RawBuilder<boolean> {
	const col = sql.ref(column);
	return isPostgres(db)
		? sql<boolean>`exists (select 1 from jsonb_array_elements_text(${col}::jsonb) as e(value) where e.value = ${value})`
		: sql<boolean>`exists (select 1 from json_each(${col}) where json_each.value = ${value})`;
}

/**
 * LIKE as SQLite has it: case-insensitive (SQLite folds ASCII letters; PostgreSQL's ILIKE folds
 * every letter), with `\` as the escape character on both.
 */
export function likeOperator(db: AnyDb): 'like' | 'ilike' {
	return isPostgres(db) ? 'ilike' : 'like';
}
