import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { isHttpError, isRedirect } from '@sveltejs/kit';
import { setupIntegration } from './testing';
import { createUser } from './db/users';
import { addMember } from './db/memberships';
import { listApiTokens } from './db/api-tokens';
import { createTeamFor } from './teams';
import {
	authenticateToken,
	createTeamToken,
	grantableTokenRoles,
	revokeTeamToken
} from './api-tokens';
import { requireTeam, requireUser, resolveTeamAccess, type GuardEvent } from './guard';
import type { SessionUser } from './auth';
import type { TokenPrincipal } from './api-tokens';
import { AppError } from './errors';
import type { Role } from '$lib/roles';
import type { Team } from './db/schema';

let env: Awaited<ReturnType<typeof setupIntegration>>;
let team: Team;
let otherTeam: Team;
const people = {} as Record<Role | 'outsider', SessionUser>;

async function person(email: string): Promise<SessionUser> {
	const u = await createUser(env.db, { email, name: email.split('@')[0], passwordHash: 'unused' });
	return { id: u.id, email: u.email, name: u.name, emailVerified: false };
}
const access = async (u: SessionUser, t = team) =>
	(await resolveTeamAccess(env.db, { kind: 'user', user: u }, t.slug))!;

function event(path: string, locals: Partial<App.Locals>): GuardEvent {
	return {
		url: new URL(`http://statewright.test${path}`),
		locals: { user: null, session: null, token: null, ...locals }
	};
}

async function thrown(p: Promise<unknown> | (() => unknown)) {
	try {
		await (typeof p === 'function' ? p() : p);
	} catch (e) {
		return e;
	}
	return null;
}

beforeEach(async () => {
	env = await setupIntegration();
	people.owner = await person('owner@example.com');
	team = await createTeamFor(env.db, people.owner, { name: 'Heat Works' });
	for (const role of ['designer', 'checker', 'viewer'] as const) {
		people[role] = await person(`${role}@example.com`);
		await addMember(env.db, team.id, people[role].id, role);
	}
	people.outsider = await person('outsider@example.com');
	otherTeam = await createTeamFor(env.db, people.outsider, { name: 'Elsewhere' });
});
afterEach(async () => {
	await env.close();
});

describe('API tokens', () => {
	it('are shown once, stored hashed, and authenticate with their team and role', async () => {
		const { token, row } = await createTeamToken(env.db, await access(people.designer), {
			name: 'nightly export',
			role: 'viewer'
		});
		expect(token).toMatch(/^swt_[A-Za-z0-9_-]{43}$/);
		expect(row.token_hash).not.toContain(token.slice(4));
		expect(row.prefix).toBe(token.slice(0, 10));
		const found = await authenticateToken(env.db, token);
		expect(found?.principal).toMatchObject({
			name: 'nightly export',
			role: 'viewer',
			teamId: team.id,
			createdBy: people.designer.id
		});
		const [listed] = await listApiTokens(env.db, team.id);
		expect(listed.last_used_at).not.toBeNull();
		expect('token_hash' in listed).toBe(false);
		expect(
			await authenticateToken(env.db, token.slice(0, -1) + (token.endsWith('A') ? 'B' : 'A'))
		).toBeNull();
		expect(await authenticateToken(env.db, 'swt_short')).toBeNull();
	});

	it('never exceed their creator’s role', async () => {
		expect(grantableTokenRoles('owner')).toEqual(['owner', 'designer', 'checker', 'viewer']);
		expect(grantableTokenRoles('designer')).toEqual(['designer', 'viewer']);
		expect(grantableTokenRoles('checker')).toEqual([]);
		expect(grantableTokenRoles('viewer')).toEqual([]);
		const e = await thrown(
			createTeamToken(env.db, await access(people.designer), { name: 'sneaky', role: 'owner' })
		);
		expect(e).toBeInstanceOf(AppError);
		expect((e as AppError).status).toBe(403);
		expect(await listApiTokens(env.db, team.id)).toEqual([]);
	});

	it('are revoked by their creator or an owner, and then stop working', async () => {
		const mine = await createTeamToken(env.db, await access(people.designer), {
			name: 'mine',
			role: 'designer'
		});
		const owners = await createTeamToken(env.db, await access(people.owner), {
			name: 'owners',
			role: 'viewer'
		});
		const e = await thrown(revokeTeamToken(env.db, await access(people.designer), owners.row.id));
		expect((e as AppError).status).toBe(403);
		await revokeTeamToken(env.db, await access(people.designer), mine.row.id);
		await revokeTeamToken(env.db, await access(people.owner), owners.row.id);
		expect(await authenticateToken(env.db, mine.token)).toBeNull();
		expect(await authenticateToken(env.db, owners.token)).toBeNull();
		expect(
			((await thrown(revokeTeamToken(env.db, await access(people.owner), mine.row.id))) as AppError)
				.status
		).toBe(404);
	});

	it('cannot be revoked across teams by id', async () => {
		const theirs = await createTeamToken(env.db, await access(people.outsider, otherTeam), {
			name: 'theirs',
			role: 'viewer'
		});
		expect(
			(
				(await thrown(
					revokeTeamToken(env.db, await access(people.owner), theirs.row.id)
				)) as AppError
			).status
		).toBe(404);
		expect(await authenticateToken(env.db, theirs.token)).not.toBeNull();
	});
});

describe('guard', () => {
	it('answers non-members 404 and members without the capability 403', async () => {
		const cases: Array<
			[keyof typeof people, 'read' | 'sheet:edit' | 'sheet:check' | 'team:manage', number | 'ok']
		> = [
			['owner', 'team:manage', 'ok'],
			['designer', 'sheet:edit', 'ok'],
			['designer', 'sheet:check', 403],
			['checker', 'sheet:check', 'ok'],
			['checker', 'sheet:edit', 403],
			['viewer', 'read', 'ok'],
			['viewer', 'sheet:edit', 403],
			['designer', 'team:manage', 403],
			['outsider', 'read', 404]
		];
		for (const [who, capability, expected] of cases) {
			const e = await thrown(
				requireTeam(event(`/t/${team.slug}`, { user: people[who] }), team.slug, capability, env.db)
			);
			if (expected === 'ok') expect(e, `${who} ${capability}`).toBeNull();
			else {
				expect(isHttpError(e), `${who} ${capability}`).toBe(true);
				expect((e as { status: number }).status, `${who} ${capability}`).toBe(expected);
			}
		}
		// a missing team looks exactly like someone else's
		const missing = await thrown(
			requireTeam(event('/t/nope', { user: people.owner }), 'nope', 'read', env.db)
		);
		expect((missing as { status: number }).status).toBe(404);
	});

	it('sends nobody to sign-in on pages and answers 401 on the API', async () => {
		const page = await thrown(
			requireTeam(event(`/t/${team.slug}/settings?x=1`, {}), team.slug, 'read', env.db)
		);
		expect(isRedirect(page)).toBe(true);
		expect((page as { location: string }).location).toBe(
			`/signin?next=${encodeURIComponent(`/t/${team.slug}/settings?x=1`)}`
		);
		const api = await thrown(
			requireTeam(event(`/api/v1/teams/${team.slug}`, {}), team.slug, 'read', env.db)
		);
		expect((api as { status: number }).status).toBe(401);
		expect(isRedirect(await thrown(() => requireUser(event('/account', {}))))).toBe(true);
	});

	it('lets a token reach only its own team, with its own role', async () => {
		const { token } = await createTeamToken(env.db, await access(people.owner), {
			name: 'ci',
			role: 'checker'
		});
		const principal = (await authenticateToken(env.db, token))!.principal as TokenPrincipal;
		const ok = await requireTeam(
			event(`/api/v1/teams/${team.slug}`, { token: principal }),
			team.slug,
			'sheet:check',
			env.db
		);
		expect(ok.role).toBe('checker');
		expect(ok.actor).toEqual({ id: people.owner.id, label: `${people.owner.name} (token “ci”)` });
		const edit = await thrown(
			requireTeam(
				event(`/api/v1/teams/${team.slug}`, { token: principal }),
				team.slug,
				'sheet:edit',
				env.db
			)
		);
		expect((edit as { status: number }).status).toBe(403);
		const other = await thrown(
			requireTeam(
				event(`/api/v1/teams/${otherTeam.slug}`, { token: principal }),
				otherTeam.slug,
				'read',
				env.db
			)
		);
		expect((other as { status: number }).status).toBe(404);
	});
});

describe('the guard’s per-request memo', () => {
	it('looks a team up once for all the loads of one GET, and afresh for the next request', async () => {
		const { setMemberRole } = await import('./db/memberships');
		const get = () => ({
			...event('/t/heat-works', { user: people.viewer }),
			locals: { user: people.viewer, session: null, token: null, teamAccess: new Map() }
		});
		const first = get();
		const a = await requireTeam(first, team.slug, 'read', env.db);
		await setMemberRole(env.db, team.id, people.viewer.id, 'designer');
		// the page's load after the layout's, in the same GET: the same answer, not read again
		expect(await requireTeam(first, team.slug, 'read', env.db)).toBe(a);
		expect(a.role).toBe('viewer');
		// the next request reads the changed role
		const next = await requireTeam(get(), team.slug, 'sheet:edit', env.db);
		expect(next.role).toBe('designer');
		// a request without the memo (a form action, and the loads after it) always reads afresh
		await setMemberRole(env.db, team.id, people.viewer.id, 'viewer');
		const post = event('/t/heat-works', { user: people.viewer });
		expect((await requireTeam(post, team.slug, 'read', env.db)).role).toBe('viewer');
		const e = await thrown(requireTeam(post, team.slug, 'sheet:edit', env.db));
		expect(isHttpError(e) && e.status).toBe(403);
	});
});
