import { sql, type Kysely } from 'kysely';
import { columnTypes, isPostgres } from '../src/lib/server/db/dialect';

// Revisions of sheets (immutable: spec and computed result frozen, enforced by triggers) with
// their sign-off workflow and its log; review notes anchored to a leg, a state or the sheet, with
// replies, mentions and resolve/reopen; per-user e-mail notification settings; measured traces.
// Times are integer Unix milliseconds.

const statusCheck = sql`status in ('draft', 'in-check', 'checked', 'approved')`;

export async function up(db: Kysely<any>): Promise<void> {
	const t = columnTypes(db);
	await db.schema
		.createTable('sheet_revisions')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('sheet_id', 'text', (c) => c.notNull().references('sheets.id').onDelete('cascade'))
		.addColumn('team_id', 'text', (c) => c.notNull().references('teams.id').onDelete('cascade'))
		// Rev 1, 2, … within the sheet
		.addColumn('number', 'integer', (c) => c.notNull())
		// the revision the saved draft started from (null for Rev 1, or a draft begun from nothing)
		.addColumn('based_on', 'integer')
		.addColumn('title', 'text', (c) => c.notNull())
		// the SheetDoc and the PathResult computed from it, as JSON
		.addColumn('doc', 'text', (c) => c.notNull())
		.addColumn('result', 'text', (c) => c.notNull())
		.addColumn('message', 'text', (c) => c.notNull())
		.addColumn('author_id', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('author_label', 'text', (c) => c.notNull())
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('status', 'text', (c) => c.notNull().defaultTo('draft'))
		.addColumn('submitted_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('submitted_by_label', 'text')
		.addColumn('submitted_at', t.time)
		// the checker the designer asked (null: any checker of the team)
		.addColumn('check_requested_from', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('checked_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('checked_by_label', 'text')
		.addColumn('checked_at', t.time)
		.addColumn('approved_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('approved_by_label', 'text')
		.addColumn('approved_at', t.time)
		.addColumn('returned_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('returned_by_label', 'text')
		.addColumn('returned_at', t.time)
		.addUniqueConstraint('sheet_revisions_sheet_number', ['sheet_id', 'number'])
		.addCheckConstraint('sheet_revisions_number', sql`number >= 1`)
		.addCheckConstraint(
			'sheet_revisions_based_on',
			sql`based_on is null or (based_on >= 1 and based_on < number)`
		)
		.addCheckConstraint('sheet_revisions_status', statusCheck)
		.addCheckConstraint('sheet_revisions_message', sql`length(message) between 1 and 2000`)
		.execute();
	await db.schema
		.createIndex('sheet_revisions_team')
		.on('sheet_revisions')
		.column('team_id')
		.execute();

	// What a revision holds never changes (user ids may still be cleared when an account goes).
	// An approved revision is locked: its status and sign-off stay as they are.
	const content =
		'sheet_id, team_id, number, based_on, title, doc, result, message, author_label, created_at';
	const signOff =
		'status, submitted_at, checked_at, approved_at, returned_at, submitted_by_label, checked_by_label, approved_by_label';
	if (isPostgres(db)) {
		for (const [name, message] of [
			['sheet_revisions_content_immutable', 'revision content is immutable'],
			['sheet_revisions_approved_locked', 'an approved revision is locked']
		]) {
			await sql`create function ${sql.id(name)}() returns trigger language plpgsql as ${sql.lit(
				`begin raise exception '${message}'; end`
			)}`.execute(db);
		}
		await sql`create trigger sheet_revisions_content_immutable
			before update of ${sql.raw(content)} on sheet_revisions
			for each row execute function sheet_revisions_content_immutable()`.execute(db);
		await sql`create trigger sheet_revisions_approved_locked
			before update of ${sql.raw(signOff)} on sheet_revisions
			for each row when (old.status = 'approved') execute function sheet_revisions_approved_locked()`.execute(
			db
		);
	} else {
		await sql`create trigger sheet_revisions_content_immutable
		before update of ${sql.raw(content)} on sheet_revisions
		begin select raise(abort, 'revision content is immutable'); end`.execute(db);
		await sql`create trigger sheet_revisions_approved_locked
		before update of ${sql.raw(signOff)} on sheet_revisions
		when old.status = 'approved'
		begin select raise(abort, 'an approved revision is locked'); end`.execute(db);
	}

	await db.schema
		.createTable('sheet_revision_events')
		.addColumn('id', t.serial, (c) =>
			t.autoIncrement ? c.primaryKey().autoIncrement() : c.primaryKey()
		)
		.addColumn('revision_id', 'text', (c) =>
			c.notNull().references('sheet_revisions.id').onDelete('cascade')
		)
		.addColumn('sheet_id', 'text', (c) => c.notNull().references('sheets.id').onDelete('cascade'))
		.addColumn('kind', 'text', (c) => c.notNull())
		.addColumn('actor_id', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('actor_label', 'text', (c) => c.notNull())
		.addColumn('note', 'text')
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addCheckConstraint(
			'sheet_revision_events_kind',
			sql`kind in ('saved', 'submitted', 'returned', 'checked', 'approved', 'restored')`
		)
		.execute();
	await db.schema
		.createIndex('sheet_revision_events_sheet')
		.on('sheet_revision_events')
		.columns(['sheet_id', 'id'])
		.execute();

	await db.schema
		.createTable('review_notes')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('sheet_id', 'text', (c) => c.notNull().references('sheets.id').onDelete('cascade'))
		.addColumn('team_id', 'text', (c) => c.notNull().references('teams.id').onDelete('cascade'))
		.addColumn('anchor_kind', 'text', (c) => c.notNull())
		// leg: the leg id; state: 'start' or the id of the leg the state ends; sheet: null
		.addColumn('anchor_id', 'text')
		// the label the anchor had where the note was written (L2, S3), for notes whose anchor is gone
		.addColumn('anchor_label', 'text', (c) => c.notNull())
		// what the author was looking at: a revision number, or the working draft (null) at a draft version
		.addColumn('revision_number', 'integer')
		.addColumn('draft_version', 'integer')
		.addColumn('body', 'text', (c) => c.notNull())
		.addColumn('author_id', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('author_label', 'text', (c) => c.notNull())
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('edited_at', t.time)
		.addColumn('resolved_at', t.time)
		.addColumn('resolved_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('resolved_by_label', 'text')
		.addColumn('last_activity_at', t.time, (c) => c.notNull())
		.addCheckConstraint('review_notes_anchor_kind', sql`anchor_kind in ('sheet', 'leg', 'state')`)
		.addCheckConstraint(
			'review_notes_anchor_id',
			sql`(anchor_kind = 'sheet') = (anchor_id is null)`
		)
		.addCheckConstraint('review_notes_body', sql`length(body) between 1 and 4000`)
		.execute();
	await db.schema
		.createIndex('review_notes_sheet')
		.on('review_notes')
		.columns(['sheet_id', 'created_at'])
		.execute();

	await db.schema
		.createTable('review_note_replies')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('note_id', 'text', (c) =>
			c.notNull().references('review_notes.id').onDelete('cascade')
		)
		// a reply, or a line in the thread saying who resolved or reopened it
		.addColumn('kind', 'text', (c) => c.notNull())
		.addColumn('body', 'text', (c) => c.notNull())
		.addColumn('author_id', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('author_label', 'text', (c) => c.notNull())
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addCheckConstraint('review_note_replies_kind', sql`kind in ('reply', 'resolved', 'reopened')`)
		.addCheckConstraint(
			'review_note_replies_body',
			sql`(kind = 'reply' and length(body) between 1 and 4000) or (kind <> 'reply' and length(body) <= 4000)`
		)
		.execute();
	await db.schema
		.createIndex('review_note_replies_note')
		.on('review_note_replies')
		.columns(['note_id', 'created_at'])
		.execute();

	await db.schema
		.createTable('review_note_mentions')
		.addColumn('id', t.serial, (c) =>
			t.autoIncrement ? c.primaryKey().autoIncrement() : c.primaryKey()
		)
		.addColumn('note_id', 'text', (c) =>
			c.notNull().references('review_notes.id').onDelete('cascade')
		)
		.addColumn('reply_id', 'text', (c) =>
			c.references('review_note_replies.id').onDelete('cascade')
		)
		.addColumn('user_id', 'text', (c) => c.notNull().references('users.id').onDelete('cascade'))
		.addColumn('created_at', t.time, (c) => c.notNull())
		.execute();
	await db.schema
		.createIndex('review_note_mentions_user')
		.on('review_note_mentions')
		.columns(['user_id', 'created_at'])
		.execute();

	await db.schema
		.createTable('notification_settings')
		.addColumn('user_id', 'text', (c) => c.primaryKey().references('users.id').onDelete('cascade'))
		.addColumn('on_mention', 'integer', (c) => c.notNull().defaultTo(1))
		.addColumn('on_reply', 'integer', (c) => c.notNull().defaultTo(1))
		.addColumn('on_submitted', 'integer', (c) => c.notNull().defaultTo(1))
		.addColumn('on_checked', 'integer', (c) => c.notNull().defaultTo(1))
		.addColumn('on_approved', 'integer', (c) => c.notNull().defaultTo(1))
		.addColumn('on_returned', 'integer', (c) => c.notNull().defaultTo(1))
		.addColumn('updated_at', t.time, (c) => c.notNull())
		.execute();

	await db.schema
		.createTable('sheet_traces')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('sheet_id', 'text', (c) => c.notNull().references('sheets.id').onDelete('cascade'))
		.addColumn('team_id', 'text', (c) => c.notNull().references('teams.id').onDelete('cascade'))
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('original_filename', 'text', (c) => c.notNull())
		// the fluid the points were fixed for
		.addColumn('fluid', 'text', (c) => c.notNull())
		// JSON: the file's columns with their units
		.addColumn('columns', 'text', (c) => c.notNull())
		// Pa absolute, used for gauge columns
		.addColumn('atmosphere', t.real, (c) => c.notNull())
		// K, the saturation-line tolerance
		.addColumn('tolerance', t.real, (c) => c.notNull())
		// JSON array of TracePoint (src/lib/traces/types.ts), SI
		.addColumn('points', 'text', (c) => c.notNull())
		.addColumn('point_count', 'integer', (c) => c.notNull())
		.addColumn('in_dome_count', 'integer', (c) => c.notNull())
		.addColumn('rejected_count', 'integer', (c) => c.notNull().defaultTo(0))
		// JSON array of the rejected lines left out (only when the uploader chose to leave them out)
		.addColumn('rejected', 'text', (c) => c.notNull().defaultTo('[]'))
		.addColumn('notes', 'text', (c) => c.notNull().defaultTo('[]'))
		.addColumn('started_at', 'text')
		.addColumn('uploaded_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('uploaded_by_label', 'text', (c) => c.notNull())
		.addColumn('uploaded_at', t.time, (c) => c.notNull())
		.addCheckConstraint('sheet_traces_name', sql`length(name) between 1 and 80`)
		.addCheckConstraint(
			'sheet_traces_counts',
			sql`point_count >= 1 and in_dome_count >= 0 and rejected_count >= 0`
		)
		.execute();
	await db.schema
		.createIndex('sheet_traces_sheet')
		.on('sheet_traces')
		.columns(['sheet_id', 'uploaded_at'])
		.execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	for (const table of [
		'sheet_traces',
		'notification_settings',
		'review_note_mentions',
		'review_note_replies',
		'review_notes',
		'sheet_revision_events',
		'sheet_revisions'
	]) {
		await db.schema.dropTable(table).execute();
	}
	if (isPostgres(db))
		for (const name of ['sheet_revisions_content_immutable', 'sheet_revisions_approved_locked'])
			await sql`drop function ${sql.id(name)}()`.execute(db);
}
