import { ROLE_LABEL, isRole } from '$lib/roles';

/** One line of the team activity list. */
export function describeEvent(e: {
	actor_label: string;
	kind: string;
	detail: Record<string, unknown>;
}): string {
	const d = e.detail;
	const role = (r: unknown) => (isRole(r) ? ROLE_LABEL[r].toLowerCase() : String(r));
	const who = e.actor_label;
	switch (e.kind) {
		case 'team.created':
			return `${who} created the team`;
		case 'team.renamed':
			return `${who} renamed the team from “${d.from}” to “${d.to}”`;
		case 'invite.sent':
			return `${who} invited ${d.email} as ${role(d.role)}`;
		case 'invite.revoked':
			return `${who} withdrew the invitation to ${d.email}`;
		case 'invite.accepted':
			return `${who} joined as ${role(d.role)}`;
		case 'member.role-changed':
			return `${who} changed ${d.name}'s role from ${role(d.from)} to ${role(d.to)}`;
		case 'member.removed':
			return `${who} removed ${d.name}`;
		case 'member.left':
			return `${who} left the team`;
		case 'token.created':
			return `${who} created the ${role(d.role)} token “${d.name}”`;
		case 'token.revoked':
			return `${who} revoked the token “${d.name}”`;
		case 'sheet.deleted':
			return `${who} deleted sheet ${d.number} “${d.title}”${d.revisions ? ` with ${d.revisions} revision${d.revisions === 1 ? '' : 's'}` : ''}`;
		default:
			return `${who}: ${e.kind}`;
	}
}
