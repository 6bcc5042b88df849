import type { Capability, Role } from '$lib/roles';
import type { Team } from './db/schema';
import type { SessionUser } from './auth';

/*
 * Who is acting and what they may do in a team: the types guard.ts hands to every service, and
 * api-tokens.ts builds for a token (here so neither of the two imports the other).
 */

export interface TokenPrincipal {
	id: string;
	name: string;
	role: Role;
	teamId: string;
	createdBy: string | null;
	/** the creator's name, who signs what the token does (null when the account is gone) */
	createdByName: string | null;
}

export type Principal =
	{ kind: 'user'; user: SessionUser } | { kind: 'token'; token: TokenPrincipal };

export interface TeamAccess {
	team: Team;
	role: Role;
	principal: Principal;
	/** who to record as having done something: the person, or for a token "Creator Name (token “name”)" */
	actor: { id: string | null; label: string };
	can(capability: Capability): boolean;
}
