import type { DB, TeamEvent } from './schema';

/** What happened in a team, for the activity list in team settings. */
export type TeamEventKind =
	| 'team.created'
	| 'team.renamed'
	| 'invite.sent'
	| 'invite.revoked'
	| 'invite.accepted'
	| 'member.role-changed'
	| 'member.removed'
	| 'member.left'
	| 'token.created'
	| 'token.revoked'
	| 'sheet.deleted';

export async function logTeamEvent(
	db: DB,
	input: {
		teamId: string;
		actorId: string | null;
		actorLabel: string;
		kind: TeamEventKind;
		detail?: Record<string, unknown>;
	},
	now = Date.now()
): Promise<void> {
	await db
		.insertInto('team_events')
		.values({
			team_id: input.teamId,
			actor_id: input.actorId,
			actor_label: input.actorLabel,
			kind: input.kind,
			detail: JSON.stringify(input.detail ?? {}),
			created_at: now
		})
		.execute();
}

export interface ListedTeamEvent extends Omit<TeamEvent, 'detail'> {
	detail: Record<string, unknown>;
}

export async function listTeamEvents(
	db: DB,
	teamId: string,
	limit = 50
): Promise<ListedTeamEvent[]> {
	const rows = await db
		.selectFrom('team_events')
		.selectAll()
		.where('team_id', '=', teamId)
		.orderBy('id', 'desc')
		.limit(limit)
		.execute();
	return rows.map((r) => ({ ...r, detail: JSON.parse(r.detail) as Record<string, unknown> }));
}
