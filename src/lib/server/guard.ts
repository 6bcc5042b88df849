import { error, redirect } from '@sveltejs/kit';
import { can, ROLE_LABEL, type Capability, type Role } from '$lib/roles';
import type { DB } from './db/schema';
import { getDb } from './database';
import { getTeamBySlug } from './db/teams';
import { getMembership } from './db/memberships';
import type { SessionUser } from './auth';
import type { Principal, TeamAccess } from './access';

/*
 * Every permission check of the app goes through this module.
 *
 *   const user = requireUser(event);                              // any signed-in person
 *   const access = await requireTeam(event, params.team, 'sheet:edit');
 *
 * `requireTeam` answers 404 to anyone who is not a member (the same answer as for a team that
 * does not exist, so team names cannot be probed), 403 to a member whose role lacks the
 * capability, and for nobody signed in a redirect to /signin (pages) or 401 (/api/*).
 * On /api/v1/* an API token is a principal too: it reaches only its own team, with its role.
 */

export type { Principal, TeamAccess } from './access';

/** The part of a RequestEvent the guard needs (lets unit tests pass a plain object). */
export interface GuardEvent {
	locals: App.Locals;
	url: URL;
}

const DOING: Record<Capability, string> = {
	read: 'see this team',
	'sheet:edit': 'edit sheets (designers and owners can)',
	'sheet:check': 'mark revisions checked (checkers and owners can)',
	'sheet:approve': 'approve revisions (owners can)',
	'note:write': 'write review notes (owners, designers and checkers can)',
	'token:create': 'create API tokens (owners and designers can)',
	'team:manage': 'manage the team (owners can)'
};

function isApi(url: URL): boolean {
	return url.pathname.startsWith('/api/');
}

export function principalOf(locals: App.Locals): Principal | null {
	if (locals.token) return { kind: 'token', token: locals.token };
	if (locals.user) return { kind: 'user', user: locals.user };
	return null;
}

function unauthenticated(url: URL): never {
	if (isApi(url)) {
		error(401, {
			code: 'unauthenticated',
			message: 'Sign in, or send an API token as "Authorization: Bearer swt_…".'
		});
	}
	redirect(303, `/signin?next=${encodeURIComponent(url.pathname + url.search)}`);
}

/** A person or an API token; otherwise redirect to sign-in, or 401 on the API. */
export function requirePrincipal(event: GuardEvent): Principal {
	const principal = principalOf(event.locals);
	if (!principal) unauthenticated(event.url);
	return principal;
}

/** The signed-in person (tokens do not count); otherwise redirect to sign-in, or 401 on the API. */
export function requireUser(event: GuardEvent): SessionUser {
	if (!event.locals.user) unauthenticated(event.url);
	return event.locals.user;
}

export function forbidden(role: Role, capability: Capability): never {
	error(403, {
		code: 'forbidden',
		message: `Your role in this team is ${ROLE_LABEL[role].toLowerCase()}, which cannot ${DOING[capability]}.`
	});
}

export function notFound(what = 'team'): never {
	error(404, {
		code: 'not-found',
		message: `There is no such ${what} here, or you are not a member of it.`
	});
}

/**
 * Resolves a principal's access to a team by its URL name, without throwing: null when the
 * team does not exist or the principal may not see it. Exposed for tests and for code that
 * answers a missing team differently.
 */
export async function resolveTeamAccess(
	db: DB,
	principal: Principal,
	teamSlug: string
): Promise<TeamAccess | null> {
	const team = await getTeamBySlug(db, teamSlug);
	if (!team) return null;
	let role: Role;
	let actor: TeamAccess['actor'];
	if (principal.kind === 'token') {
		if (principal.token.teamId !== team.id) return null;
		role = principal.token.role;
		// the person behind the token signs what it does ("Tobias Lindqvist (token “ci-export”)")
		const token = `token “${principal.token.name}”`;
		const creator = principal.token.createdByName;
		actor = { id: principal.token.createdBy, label: creator ? `${creator} (${token})` : token };
	} else {
		const m = await getMembership(db, team.id, principal.user.id);
		if (!m) return null;
		role = m.role;
		actor = { id: principal.user.id, label: principal.user.name };
	}
	return { team, role, principal, actor, can: (c) => can(role, c) };
}

/** Asserts the access holds a capability: 403 if not. */
export function requireCapability(access: TeamAccess, capability: Capability): void {
	if (!access.can(capability)) forbidden(access.role, capability);
}

/**
 * The one check for anything under a team: resolves the principal's membership and asserts the
 * capability. 404 for non-members, 403 for members without the capability.
 */
export async function requireTeam(
	event: GuardEvent,
	teamSlug: string,
	capability: Capability = 'read',
	db: DB = getDb()
): Promise<TeamAccess> {
	const principal = requirePrincipal(event);
	// one lookup per team for all the loads of one GET (the layout's and the page's); hooks set
	// the memo on GET and HEAD only, so a form action and the loads after it read afresh
	const memo = event.locals.teamAccess;
	let pending = memo?.get(teamSlug);
	if (!pending || pending.db !== db) {
		pending = { db, access: resolveTeamAccess(db, principal, teamSlug) };
		memo?.set(teamSlug, pending);
	}
	const access = await pending.access;
	if (!access) notFound();
	requireCapability(access, capability);
	return access;
}
