import type { Generated, Insertable, Kysely, Selectable, Updateable } from 'kysely';
import type { Role } from '../../roles';

/*
 * Table types for Kysely. Times are integer Unix milliseconds; ids are random text. Secrets
 * (session ids, invite/reset/verify tokens, API tokens) are stored only as SHA-256 hex digests.
 */

export interface UsersTable {
	id: string;
	/** lower-cased, unique */
	email: string;
	name: string;
	password_hash: string;
	email_verified_at: number | null;
	created_at: number;
	updated_at: number;
}

export interface SessionsTable {
	/** SHA-256 hex of the cookie value; the cookie value itself is never stored */
	id: string;
	user_id: string;
	expires_at: number;
	created_at: number;
	last_seen_at: number;
	ip: string | null;
	user_agent: string | null;
}

export interface TeamsTable {
	id: string;
	/** URL name: /t/<slug> */
	slug: string;
	name: string;
	description: string;
	created_at: number;
	updated_at: number;
}

export interface MembershipsTable {
	team_id: string;
	user_id: string;
	role: Role;
	created_at: number;
	updated_at: number;
}

export interface InvitesTable {
	id: string;
	team_id: string;
	email: string;
	role: Role;
	token_hash: string;
	invited_by: string | null;
	created_at: number;
	expires_at: number;
	accepted_at: number | null;
	accepted_by: string | null;
	revoked_at: number | null;
}

export type EmailTokenPurpose = 'verify-email' | 'reset-password';

export interface EmailTokensTable {
	id: string;
	user_id: string;
	purpose: EmailTokenPurpose;
	token_hash: string;
	/** the address the link was sent to */
	email: string;
	created_at: number;
	expires_at: number;
	used_at: number | null;
}

export interface ApiTokensTable {
	id: string;
	team_id: string;
	name: string;
	token_hash: string;
	/** the first characters of the token, shown so people can tell tokens apart */
	prefix: string;
	role: Role;
	created_by: string | null;
	created_at: number;
	last_used_at: number | null;
	revoked_at: number | null;
}

export interface OutboxTable {
	id: Generated<number>;
	message_id: string | null;
	envelope_from: string;
	/** JSON array of recipient addresses (lower-cased) */
	envelope_to: string;
	from_header: string;
	to_header: string;
	subject: string;
	text: string;
	html: string | null;
	raw: string;
	received_at: number;
}

export interface TeamEventsTable {
	id: Generated<number>;
	team_id: string;
	actor_id: string | null;
	/** who did it, as shown at the time (a name, or "token <name>") */
	actor_label: string;
	kind: string;
	/** JSON object with the event's details */
	detail: string;
	created_at: number;
}

export type SheetStatusValue = 'draft' | 'in-check' | 'checked' | 'approved';

export interface SheetsTable {
	id: string;
	team_id: string;
	/** 1, 2, 3 … within the team */
	number: number;
	title: string;
	fluid: string;
	system_kind: 'closed' | 'flow';
	status: SheetStatusValue;
	/** the worked example the sheet started from, if any */
	example: string | null;
	/** the working draft: a SheetDoc as JSON (src/lib/sheets/types.ts) */
	draft: string;
	/** bumped by every draft save; a save names the version it started from (optimistic concurrency) */
	draft_version: number;
	created_by: string | null;
	created_by_label: string;
	created_at: number;
	updated_by: string | null;
	updated_by_label: string;
	updated_at: number;
}

export interface Database {
	users: UsersTable;
	sessions: SessionsTable;
	teams: TeamsTable;
	memberships: MembershipsTable;
	invites: InvitesTable;
	email_tokens: EmailTokensTable;
	api_tokens: ApiTokensTable;
	outbox: OutboxTable;
	team_events: TeamEventsTable;
	sheets: SheetsTable;
}

/** A database handle or an open transaction: every data function takes one of these first. */
export type DB = Kysely<Database>;

export type User = Selectable<UsersTable>;
export type NewUser = Insertable<UsersTable>;
export type UserUpdate = Updateable<UsersTable>;
export type SessionRow = Selectable<SessionsTable>;
export type Team = Selectable<TeamsTable>;
export type Membership = Selectable<MembershipsTable>;
export type Invite = Selectable<InvitesTable>;
export type EmailToken = Selectable<EmailTokensTable>;
export type ApiToken = Selectable<ApiTokensTable>;
export type OutboxMessage = Selectable<OutboxTable>;
export type TeamEvent = Selectable<TeamEventsTable>;
export type SheetRow = Selectable<SheetsTable>;
