import type { Role } from '$lib/roles';
import { setupIntegration } from './testing';
import { createUser } from './db/users';
import { addMember } from './db/memberships';
import { createTeamFor } from './teams';
import { resolveTeamAccess, type TeamAccess } from './guard';
import type { SessionUser } from './auth';
import type { Team } from './db/schema';
import { createSheet } from './sheets';
import { vesselDoc } from '$lib/revisions/test-fixtures';
import type { SheetDoc } from '$lib/sheets/types';
import type { NotifyContext } from './notifications';

/**
 * For the integration tests of revisions, notes and traces: a fresh database and fake SMTP
 * server, a team with one person per role (plus a second designer and checker), and a sheet.
 * Names and addresses are invented.
 */
export interface ReviewWorld {
	env: Awaited<ReturnType<typeof setupIntegration>>;
	team: Team;
	people: Record<Role | 'designer2' | 'checker2' | 'outsider', SessionUser>;
	access(who: SessionUser): Promise<TeamAccess>;
	ctx: NotifyContext;
	newSheet(doc?: SheetDoc, by?: SessionUser): Promise<string>;
	/** subjects of the mails a person received, oldest first */
	mail(who: SessionUser): Promise<Array<{ subject: string; text: string }>>;
}

export async function reviewWorld(): Promise<ReviewWorld> {
	const env = await setupIntegration('http://statewright.test');
	const person = async (email: string, name: string): Promise<SessionUser> => {
		const u = await createUser(env.db, {
			email,
			name,
			passwordHash: 'unused',
			emailVerified: true
		});
		return { id: u.id, email: u.email, name: u.name, emailVerified: true };
	};
	const owner = await person('hale.owner@example.com', 'Ines Hale');
	const team = await createTeamFor(env.db, owner, { name: 'Fenwick Vessel Works' });
	const people = { owner } as ReviewWorld['people'];
	const roles: Array<[keyof ReviewWorld['people'], Role, string]> = [
		['designer', 'designer', 'Arlo Brandt'],
		['designer2', 'designer', 'Mina Soto'],
		['checker', 'checker', 'Priya Nandakumar'],
		['checker2', 'checker', 'Jonas Weir'],
		['viewer', 'viewer', 'Cal Rooney']
	];
	for (const [key, role, name] of roles) {
		people[key] = await person(`${String(key)}@example.com`, name);
		await addMember(env.db, team.id, people[key].id, role);
	}
	people.outsider = await person('outsider@example.com', 'Otto Sider');
	const access = async (who: SessionUser) => {
		const a = await resolveTeamAccess(env.db, { kind: 'user', user: who }, team.slug);
		if (!a) throw new Error(`${who.email} is not in the team`);
		return a;
	};
	return {
		env,
		team,
		people,
		access,
		ctx: env.ctx,
		async newSheet(doc = vesselDoc(), by = people.designer) {
			return (await createSheet(env.db, await access(by), { title: 'V-204 fire case', doc })).id;
		},
		mail: async (who) => (await env.mailTo(who.email)).reverse()
	};
}
