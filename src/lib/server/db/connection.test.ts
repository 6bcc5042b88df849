/**
 * SQLite through Kysely with each statement prepared once (connection.ts `reusingStatements`):
 * the same SQL text reuses its statement, the number kept is bounded, and a kept statement still
 * answers correctly after the schema changes under it.
 */
import Database from 'better-sqlite3';
import { Kysely, SqliteDialect, sql } from 'kysely';
import { describe, expect, it } from 'vitest';
import { reusingStatements } from './connection';

function counted(max?: number) {
	const sqlite = new Database(':memory:');
	const prepared: string[] = [];
	const prepare = sqlite.prepare.bind(sqlite);
	sqlite.prepare = ((text: string) => {
		prepared.push(text);
		return prepare(text);
	}) as typeof sqlite.prepare;
	// eslint-disable-next-line @typescript-eslint/no-explicit-any -- a scratch table outside the app's schema
	const db = new Kysely<any>({
		dialect: new SqliteDialect({ database: reusingStatements(sqlite, max) })
	});
	return { db, prepared };
}

describe('SQLite statements prepared once', () => {
	it('reuse the statement of the same SQL text, with each call’s own parameters', async () => {
		const { db, prepared } = counted();
		await sql`create table t (id integer primary key, name text)`.execute(db);
		for (const [id, name] of [
			[1, 'a'],
			[2, 'b'],
			[3, 'c']
		] as const)
			await db.insertInto('t').values({ id, name }).execute();
		const byId = (id: number) =>
			db.selectFrom('t').select('name').where('id', '=', id).executeTakeFirst();
		expect((await byId(2))?.name).toBe('b');
		expect((await byId(3))?.name).toBe('c');
		expect(await byId(9)).toBeUndefined();
		const inserts = prepared.filter((s) => s.startsWith('insert'));
		const selects = prepared.filter((s) => s.startsWith('select'));
		expect(inserts).toHaveLength(1);
		expect(selects).toHaveLength(1);
		await db.destroy();
	});

	it('keep at most `max` statements, forgetting the least recently used', async () => {
		const { db, prepared } = counted(2);
		await sql`create table t (id integer primary key)`.execute(db);
		const q = (n: number) =>
			db
				.selectFrom('t')
				.select(sql<number>`${sql.lit(n)}`.as('n'))
				.execute();
		await q(1);
		await q(2);
		await q(1); // kept
		await q(3); // forgets 2
		await q(1); // still kept
		await q(2); // prepared again
		const selects = prepared.filter((s) => s.startsWith('select'));
		expect(selects.map((s) => /select (\d)/.exec(s)?.[1])).toEqual(['1', '2', '3', '2']);
		await db.destroy();
	});

	it('answer correctly after the schema changes under a kept statement', async () => {
		const { db } = counted();
		await sql`create table t (id integer primary key)`.execute(db);
		await db.insertInto('t').values({ id: 1 }).execute();
		const all = () => db.selectFrom('t').selectAll().execute();
		expect(await all()).toEqual([{ id: 1 }]);
		await sql`alter table t add column label text default 'x'`.execute(db);
		expect(await all()).toEqual([{ id: 1, label: 'x' }]);
		await db.destroy();
	});
});
