import type { Generated, Insertable, Kysely, Selectable, Updateable } from 'kysely';
import type { Role } from '$lib/roles';

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

// ---- revisions, review notes, notification settings, measured traces (issue 6) ----------------

export interface SheetRevisionsTable {
	id: string;
	sheet_id: string;
	team_id: string;
	/** Rev 1, 2, … within the sheet */
	number: number;
	/** the revision the saved draft started from */
	based_on: number | null;
	/** the sheet's title when the revision was saved */
	title: string;
	/** SheetDoc JSON (immutable) */
	doc: string;
	/** PathResult JSON computed from doc (immutable) */
	result: string;
	message: string;
	author_id: string | null;
	author_label: string;
	created_at: number;
	status: Generated<SheetStatusValue>;
	submitted_by: string | null;
	submitted_by_label: string | null;
	submitted_at: number | null;
	check_requested_from: string | null;
	checked_by: string | null;
	checked_by_label: string | null;
	checked_at: number | null;
	approved_by: string | null;
	approved_by_label: string | null;
	approved_at: number | null;
	returned_by: string | null;
	returned_by_label: string | null;
	returned_at: number | null;
}

export type RevisionEventKind =
	'saved' | 'submitted' | 'returned' | 'checked' | 'approved' | 'restored';

export interface SheetRevisionEventsTable {
	id: Generated<number>;
	revision_id: string;
	sheet_id: string;
	kind: RevisionEventKind;
	actor_id: string | null;
	actor_label: string;
	note: string | null;
	/** a check or approval over open review notes: the reason given, and how many were open */
	override_reason: string | null;
	open_notes: number | null;
	created_at: number;
}

export type NoteAnchorKind = 'sheet' | 'leg' | 'state';

export interface ReviewNotesTable {
	id: string;
	sheet_id: string;
	team_id: string;
	anchor_kind: NoteAnchorKind;
	/** leg id (leg), 'start' or the id of the leg the state ends (state), null (sheet) */
	anchor_id: string | null;
	/** L2, S3 … where the note was written */
	anchor_label: string;
	/** the revision the author was viewing; null for the working draft */
	revision_number: number | null;
	draft_version: number | null;
	body: string;
	author_id: string | null;
	author_label: string;
	created_at: number;
	edited_at: number | null;
	resolved_at: number | null;
	resolved_by: string | null;
	resolved_by_label: string | null;
	last_activity_at: number;
}

export type NoteReplyKind = 'reply' | 'resolved' | 'reopened';

export interface ReviewNoteRepliesTable {
	id: string;
	note_id: string;
	kind: NoteReplyKind;
	body: string;
	author_id: string | null;
	author_label: string;
	created_at: number;
}

export interface ReviewNoteMentionsTable {
	id: Generated<number>;
	note_id: string;
	reply_id: string | null;
	user_id: string;
	created_at: number;
}

/** 1 = send the mail, 0 = do not; a person without a row gets every kind. */
export interface NotificationSettingsTable {
	user_id: string;
	on_mention: number;
	on_reply: number;
	on_submitted: number;
	on_checked: number;
	on_approved: number;
	on_returned: number;
	updated_at: number;
}

export interface SheetTracesTable {
	id: string;
	sheet_id: string;
	team_id: string;
	name: string;
	original_filename: string;
	fluid: string;
	/** JSON TraceColumn[] */
	columns: string;
	/** Pa absolute, for gauge columns */
	atmosphere: number;
	/** K */
	tolerance: number;
	/** JSON TracePoint[] (SI) */
	points: string;
	point_count: number;
	in_dome_count: number;
	rejected_count: number;
	/** JSON RejectedLine[] left out at upload */
	rejected: string;
	/** JSON string[] */
	notes: string;
	started_at: string | null;
	uploaded_by: string | null;
	uploaded_by_label: string;
	uploaded_at: number;
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
	sheet_revisions: SheetRevisionsTable;
	sheet_revision_events: SheetRevisionEventsTable;
	review_notes: ReviewNotesTable;
	review_note_replies: ReviewNoteRepliesTable;
	review_note_mentions: ReviewNoteMentionsTable;
	notification_settings: NotificationSettingsTable;
	sheet_traces: SheetTracesTable;
	rate_limits: RateLimitsTable;
}

/** A rate-limit counter shared by the app processes (src/lib/server/db/rate-limits.ts). */
export interface RateLimitsTable {
	/** which limit: 'sign-in-ip', 'compute', … */
	name: string;
	key: string;
	/** a token bucket's level at `at` */
	tokens: number;
	/** a growing-delay counter's failures, the last counted at `at` */
	failures: number;
	at: number;
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
export type SheetRevisionRow = Selectable<SheetRevisionsTable>;
export type SheetRevisionEvent = Selectable<SheetRevisionEventsTable>;
export type ReviewNoteRow = Selectable<ReviewNotesTable>;
export type ReviewNoteReplyRow = Selectable<ReviewNoteRepliesTable>;
export type NotificationSettingsRow = Selectable<NotificationSettingsTable>;
export type SheetTraceRow = Selectable<SheetTracesTable>;
