import type { Kysely } from 'kysely';

// A sign-off step taken over open review notes records the override: the reason given and how
// many notes were open. Both null for every other event.
export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.alterTable('sheet_revision_events')
		.addColumn('override_reason', 'text')
		.execute();
	await db.schema.alterTable('sheet_revision_events').addColumn('open_notes', 'integer').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.alterTable('sheet_revision_events').dropColumn('open_notes').execute();
	await db.schema.alterTable('sheet_revision_events').dropColumn('override_reason').execute();
}
