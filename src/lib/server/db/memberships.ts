import type { Role } from '$lib/roles';
import type { DB, Membership } from './schema';

export interface Member {
	user_id: string;
	name: string;
	email: string;
	email_verified_at: number | null;
	role: Role;
	created_at: number;
}

export async function getMembership(
	db: DB,
	teamId: string,
	userId: string
): Promise<Membership | undefined> {
	return db
		.selectFrom('memberships')
		.selectAll()
		.where('team_id', '=', teamId)
		.where('user_id', '=', userId)
		.executeTakeFirst();
}

export async function listMembers(db: DB, teamId: string): Promise<Member[]> {
	return db
		.selectFrom('memberships as m')
		.innerJoin('users as u', 'u.id', 'm.user_id')
		.select(['m.user_id', 'u.name', 'u.email', 'u.email_verified_at', 'm.role', 'm.created_at'])
		.where('m.team_id', '=', teamId)
		.execute()
		.then((rows) => rows.sort(byRoleThenName));
}

const RANK: Record<Role, number> = { owner: 0, designer: 1, checker: 2, viewer: 3 };
function byRoleThenName(a: Member, b: Member): number {
	return RANK[a.role] - RANK[b.role] || a.name.localeCompare(b.name);
}

export async function addMember(
	db: DB,
	teamId: string,
	userId: string,
	role: Role,
	now = Date.now()
): Promise<void> {
	await db
		.insertInto('memberships')
		.values({ team_id: teamId, user_id: userId, role, created_at: now, updated_at: now })
		.execute();
}

export async function setMemberRole(
	db: DB,
	teamId: string,
	userId: string,
	role: Role,
	now = Date.now()
): Promise<void> {
	await db
		.updateTable('memberships')
		.set({ role, updated_at: now })
		.where('team_id', '=', teamId)
		.where('user_id', '=', userId)
		.execute();
}

export async function removeMember(db: DB, teamId: string, userId: string): Promise<void> {
	await db
		.deleteFrom('memberships')
		.where('team_id', '=', teamId)
		.where('user_id', '=', userId)
		.execute();
}

export async function countOwners(db: DB, teamId: string): Promise<number> {
	const row = await db
		.selectFrom('memberships')
		.select((eb) => eb.fn.countAll<number>().as('n'))
		.where('team_id', '=', teamId)
		.where('role', '=', 'owner')
		.executeTakeFirstOrThrow();
	return Number(row.n);
}

export async function ownsAnyTeam(db: DB, userId: string): Promise<boolean> {
	const row = await db
		.selectFrom('memberships')
		.select('team_id')
		.where('user_id', '=', userId)
		.where('role', '=', 'owner')
		.executeTakeFirst();
	return row !== undefined;
}
