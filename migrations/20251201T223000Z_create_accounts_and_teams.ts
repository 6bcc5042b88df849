import { sql, type Kysely } from 'kysely';
import { columnTypes } from '../src/lib/server/db/dialect';

// Accounts, sessions, teams with roles, invites, e-mailed one-time tokens, API tokens,
// the fake-SMTP outbox and the team activity log. Times are integer Unix milliseconds.

const roleCheck = sql`role in ('owner', 'designer', 'checker', 'viewer')`;

export async function up(db: Kysely<any>): Promise<void> {
	const t = columnTypes(db);
	await db.schema
		.createTable('users')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('email', 'text', (c) => c.notNull().unique())
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('password_hash', 'text', (c) => c.notNull())
		.addColumn('email_verified_at', t.time)
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('updated_at', t.time, (c) => c.notNull())
		.addCheckConstraint('users_email_lower', sql`email = lower(email)`)
		.execute();

	await db.schema
		.createTable('sessions')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('user_id', 'text', (c) => c.notNull().references('users.id').onDelete('cascade'))
		.addColumn('expires_at', t.time, (c) => c.notNull())
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('last_seen_at', t.time, (c) => c.notNull())
		.addColumn('ip', 'text')
		.addColumn('user_agent', 'text')
		.execute();
	await db.schema.createIndex('sessions_user_id').on('sessions').column('user_id').execute();

	await db.schema
		.createTable('teams')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('slug', 'text', (c) => c.notNull().unique())
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('description', 'text', (c) => c.notNull().defaultTo(''))
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('updated_at', t.time, (c) => c.notNull())
		.execute();

	await db.schema
		.createTable('memberships')
		.addColumn('team_id', 'text', (c) => c.notNull().references('teams.id').onDelete('cascade'))
		.addColumn('user_id', 'text', (c) => c.notNull().references('users.id').onDelete('cascade'))
		.addColumn('role', 'text', (c) => c.notNull())
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('updated_at', t.time, (c) => c.notNull())
		.addPrimaryKeyConstraint('memberships_pk', ['team_id', 'user_id'])
		.addCheckConstraint('memberships_role', roleCheck)
		.execute();
	await db.schema.createIndex('memberships_user_id').on('memberships').column('user_id').execute();

	await db.schema
		.createTable('invites')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('teams.id').onDelete('cascade'))
		.addColumn('email', 'text', (c) => c.notNull())
		.addColumn('role', 'text', (c) => c.notNull())
		.addColumn('token_hash', 'text', (c) => c.notNull().unique())
		.addColumn('invited_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('expires_at', t.time, (c) => c.notNull())
		.addColumn('accepted_at', t.time)
		.addColumn('accepted_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('revoked_at', t.time)
		.addCheckConstraint('invites_role', roleCheck)
		.execute();
	await db.schema.createIndex('invites_team_id').on('invites').column('team_id').execute();

	await db.schema
		.createTable('email_tokens')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('user_id', 'text', (c) => c.notNull().references('users.id').onDelete('cascade'))
		.addColumn('purpose', 'text', (c) => c.notNull())
		.addColumn('token_hash', 'text', (c) => c.notNull().unique())
		.addColumn('email', 'text', (c) => c.notNull())
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('expires_at', t.time, (c) => c.notNull())
		.addColumn('used_at', t.time)
		.addCheckConstraint('email_tokens_purpose', sql`purpose in ('verify-email', 'reset-password')`)
		.execute();
	await db.schema
		.createIndex('email_tokens_user_id')
		.on('email_tokens')
		.column('user_id')
		.execute();

	await db.schema
		.createTable('api_tokens')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('teams.id').onDelete('cascade'))
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('token_hash', 'text', (c) => c.notNull().unique())
		.addColumn('prefix', 'text', (c) => c.notNull())
		.addColumn('role', 'text', (c) => c.notNull())
		.addColumn('created_by', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('created_at', t.time, (c) => c.notNull())
		.addColumn('last_used_at', t.time)
		.addColumn('revoked_at', t.time)
		.addCheckConstraint('api_tokens_role', roleCheck)
		.execute();
	await db.schema.createIndex('api_tokens_team_id').on('api_tokens').column('team_id').execute();

	await db.schema
		.createTable('outbox')
		.addColumn('id', t.serial, (c) =>
			t.autoIncrement ? c.primaryKey().autoIncrement() : c.primaryKey()
		)
		.addColumn('message_id', 'text')
		.addColumn('envelope_from', 'text', (c) => c.notNull())
		.addColumn('envelope_to', 'text', (c) => c.notNull())
		.addColumn('from_header', 'text', (c) => c.notNull())
		.addColumn('to_header', 'text', (c) => c.notNull())
		.addColumn('subject', 'text', (c) => c.notNull())
		.addColumn('text', 'text', (c) => c.notNull())
		.addColumn('html', 'text')
		.addColumn('raw', 'text', (c) => c.notNull())
		.addColumn('received_at', t.time, (c) => c.notNull())
		.execute();

	await db.schema
		.createTable('team_events')
		.addColumn('id', t.serial, (c) =>
			t.autoIncrement ? c.primaryKey().autoIncrement() : c.primaryKey()
		)
		.addColumn('team_id', 'text', (c) => c.notNull().references('teams.id').onDelete('cascade'))
		.addColumn('actor_id', 'text', (c) => c.references('users.id').onDelete('set null'))
		.addColumn('actor_label', 'text', (c) => c.notNull())
		.addColumn('kind', 'text', (c) => c.notNull())
		.addColumn('detail', 'text', (c) => c.notNull().defaultTo('{}'))
		.addColumn('created_at', t.time, (c) => c.notNull())
		.execute();
	await db.schema
		.createIndex('team_events_team_time')
		.on('team_events')
		.columns(['team_id', 'created_at'])
		.execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	for (const table of [
		'team_events',
		'outbox',
		'api_tokens',
		'email_tokens',
		'invites',
		'memberships',
		'teams',
		'sessions',
		'users'
	]) {
		await db.schema.dropTable(table).execute();
	}
}
