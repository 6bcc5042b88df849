/**
 * Team roles and what each may do. Client-safe (no server imports) so pages can hide controls
 * with the same table the server enforces in `$lib/server/guard`.
 *
 * Permissions are capabilities, not a rank: a checker must not edit a path and a designer must
 * not check their own work, so no role is simply "above" another except the owner.
 */
export const ROLES = ['owner', 'designer', 'checker', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const CAPABILITIES = [
	'read', // see the team, its members and sheets; export
	'sheet:edit', // create, edit, rename, delete sheets; upload measured traces; save revisions
	'sheet:check', // mark a revision checked
	'sheet:approve', // approve a revision
	'note:write', // write and resolve review notes
	'token:create', // create API tokens for the team (and revoke one's own)
	'team:manage' // rename the team, invite, change roles, remove members, revoke anyone's token
] as const;
export type Capability = (typeof CAPABILITIES)[number];

const GRANTS: Record<Role, readonly Capability[]> = {
	owner: [
		'read',
		'sheet:edit',
		'sheet:check',
		'sheet:approve',
		'note:write',
		'token:create',
		'team:manage'
	],
	designer: ['read', 'sheet:edit', 'note:write', 'token:create'],
	checker: ['read', 'sheet:check', 'note:write'],
	viewer: ['read']
};

export function can(role: Role | null | undefined, capability: Capability): boolean {
	return role != null && GRANTS[role].includes(capability);
}

export function capabilitiesOf(role: Role): readonly Capability[] {
	return GRANTS[role];
}

/** True when every capability of `role` is also held by `holder` (used to cap API-token roles). */
export function roleWithin(role: Role, holder: Role): boolean {
	return GRANTS[role].every((c) => GRANTS[holder].includes(c));
}

export function isRole(value: unknown): value is Role {
	return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export const ROLE_LABEL: Record<Role, string> = {
	owner: 'Owner',
	designer: 'Designer',
	checker: 'Checker',
	viewer: 'Viewer'
};

export const ROLE_SUMMARY: Record<Role, string> = {
	owner: 'Runs the team: invites people, sets roles, approves revisions.',
	designer: 'Builds and edits sheets; creates API tokens for scripts.',
	checker: 'Reviews sheets, writes review notes and marks revisions checked.',
	viewer: 'Reads and exports sheets.'
};
