import type { Kysely } from 'kysely';
import { columnTypes } from '../src/lib/server/db/dialect';

// Rate-limit counters shared by every app process on one database (PostgreSQL deployments): a
// token bucket (tokens, at) or a growing-delay counter (failures, at) per limit name and key.
// A row untouched for a day is the same as no row and is deleted.
export async function up(db: Kysely<any>): Promise<void> {
	const t = columnTypes(db);
	await db.schema
		.createTable('rate_limits')
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('key', 'text', (c) => c.notNull())
		.addColumn('tokens', t.real, (c) => c.notNull().defaultTo(0))
		.addColumn('failures', 'integer', (c) => c.notNull().defaultTo(0))
		.addColumn('at', t.time, (c) => c.notNull())
		.addPrimaryKeyConstraint('rate_limits_pk', ['name', 'key'])
		.execute();
	await db.schema.createIndex('rate_limits_at').on('rate_limits').column('at').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropTable('rate_limits').execute();
}
