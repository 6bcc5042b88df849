import { sql, type Kysely } from 'kysely';
import { columnTypes } from '../src/lib/server/db/dialect';

// Sheets: a team's design documents, each holding one path. The working draft is the sheet
// document as JSON (src/lib/sheets/types.ts), saved by autosave with a version counter for
// optimistic concurrency. Revisions, review notes and traces come in later migrations.

export async function up(db: Kysely<any>): Promise<void> {
	const t = columnTypes(db);
	await db.schema
		.createTable('sheets')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('teams.id').onDelete('cascade'))
		// 1, 2, 3 … within the team, shown as "Sheet 7"
		.addColumn('number', 'integer', (c) => c.notNull())
		.addColumn('title', 'text', (c) => c.notNull())
		.addColumn('fluid', 'text', (c) => c.notNull())
		.addColumn('system_kind', 'text', (c) => c.notNull())
		.addColumn('status', 'text', (c) => c.notNull().defaultTo('draft'))
		// the worked example it started from, if any
		.addColumn('example', 'text')
		.addColumn('draft', 'text', (c) => c.notNull())
		.addColumn('draft_version', 'integer', (c) => c.notNull().defaultTo(1))
		.addColumn('created_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('created_by_label', 'text', (c) => c.notNull())
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('updated_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('updated_by_label', 'text', (c) => c.notNull())
		.addColumn('updated_at', t.time, (c) => c.notNull())
		.addUniqueConstraint('sheets_team_number', ['team_id', 'number'])
		.addCheckConstraint(
			'sheets_status',
			sql`status in ('draft', 'in-check', 'checked', 'approved')`
		)
		.addCheckConstraint('sheets_system_kind', sql`system_kind in ('closed', 'flow')`)
		.addCheckConstraint('sheets_draft_version', sql`draft_version >= 1`)
		.addCheckConstraint('sheets_title', sql`length(title) between 1 and 120`)
		.execute();
	await db.schema
		.createIndex('sheets_team_updated')
		.on('sheets')
		.columns(['team_id', 'updated_at'])
		.execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropTable('sheets').execute();
}
