import type { Role } from '$lib/roles';
import type { DB, Team } from './schema';
import { newId } from './ids';

export { SLUG_PATTERN } from '$lib/slug';

export function slugify(name: string): string {
	const base = name
		.normalize('NFKD')
		.replace(/[\u0300-\u036f]/g, '')
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-+|-+$/g, '')
		.slice(0, 32)
		.replace(/-+$/, '');
	return base.length >= 2 ? base : `team-${base || 'x'}`;
}

async function freeSlug(db: DB, name: string): Promise<string> {
	const base = slugify(name);
	const taken = new Set(
		(await db.selectFrom('teams').select('slug').where('slug', 'like', `${base}%`).execute()).map(
			(r) => r.slug
		)
	);
	if (!taken.has(base)) return base;
	for (let i = 2; ; i++) if (!taken.has(`${base}-${i}`)) return `${base}-${i}`;
}

/** Creates a team with `ownerId` as its first owner. Call inside a transaction. */
export async function createTeam(
	db: DB,
	input: { name: string; description?: string; ownerId: string; slug?: string },
	now = Date.now()
): Promise<Team> {
	const team: Team = {
		id: newId(),
		slug: input.slug ?? (await freeSlug(db, input.name)),
		name: input.name.trim(),
		description: input.description?.trim() ?? '',
		created_at: now,
		updated_at: now
	};
	await db.insertInto('teams').values(team).execute();
	await db
		.insertInto('memberships')
		.values({
			team_id: team.id,
			user_id: input.ownerId,
			role: 'owner',
			created_at: now,
			updated_at: now
		})
		.execute();
	return team;
}

export async function getTeamBySlug(db: DB, slug: string): Promise<Team | undefined> {
	return db.selectFrom('teams').selectAll().where('slug', '=', slug).executeTakeFirst();
}

export async function getTeamById(db: DB, id: string): Promise<Team | undefined> {
	return db.selectFrom('teams').selectAll().where('id', '=', id).executeTakeFirst();
}

export interface TeamWithRole extends Team {
	role: Role;
	member_count: number;
}

export async function listTeamsForUser(db: DB, userId: string): Promise<TeamWithRole[]> {
	return db
		.selectFrom('memberships as m')
		.innerJoin('teams as t', 't.id', 'm.team_id')
		.selectAll('t')
		.select('m.role')
		.select((eb) =>
			eb
				.selectFrom('memberships as c')
				.whereRef('c.team_id', '=', 't.id')
				.select((e) => e.fn.countAll<number>().as('n'))
				.as('member_count')
		)
		.where('m.user_id', '=', userId)
		.orderBy('t.name')
		.execute() as Promise<TeamWithRole[]>;
}

export async function updateTeam(
	db: DB,
	id: string,
	input: { name: string; description: string },
	now = Date.now()
) {
	await db
		.updateTable('teams')
		.set({ name: input.name.trim(), description: input.description.trim(), updated_at: now })
		.where('id', '=', id)
		.execute();
}
