import { afterEach, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { sql, type Kysely } from 'kysely';
import { createTestDb, disposeTestDb } from './index';
import { openDatabase } from './connection';
import { migrateToLatest } from './migrate';
import { migrations } from './migrations';
import type { Database } from './schema';
import { createUser, getUserByEmail, markEmailVerified } from './users';
import { createTeam, getTeamBySlug, listTeamsForUser, slugify, SLUG_PATTERN } from './teams';
import { addMember, countOwners, getMembership, listMembers, ownsAnyTeam } from './memberships';
import { insertSession, getSessionAndUser, deleteExpiredSessions } from './sessions';
import {
	clearMailFor,
	getMailFor,
	insertOutboxMessage,
	listMailFor,
	listOutboxMessages
} from './outbox';
import { logTeamEvent, listTeamEvents } from './team-events';
// eslint-disable-next-line no-restricted-imports -- checks the route matcher agrees with the slugs the db stores
import { match as slugMatcher } from '../../../params/slug';

let db: Kysely<Database>;
afterEach(async () => {
	if (db) await disposeTestDb(db);
});

async function user(email: string, name = 'Test Person') {
	return createUser(db, { email, name, passwordHash: 'x' });
}

describe('migrations', () => {
	it('apply to a fresh file with WAL and foreign keys on, and revert cleanly', async () => {
		const dir = mkdtempSync(join(tmpdir(), 'sw-db-'));
		try {
			db = openDatabase(join(dir, 'nested', 'app.db'));
			const results = await migrateToLatest(db, migrations);
			expect(results.map((r) => r.status)).toEqual(Object.keys(migrations).map(() => 'Success'));
			const mode = await sql<{ journal_mode: string }>`pragma journal_mode`.execute(db);
			expect(mode.rows[0].journal_mode).toBe('wal');
			const fk = await sql<{ foreign_keys: number }>`pragma foreign_keys`.execute(db);
			expect(fk.rows[0].foreign_keys).toBe(1);
			// a second run finds nothing to do
			expect(await migrateToLatest(db, migrations)).toEqual([]);
			const tables = await sql<{
				name: string;
			}>`select name from sqlite_master where type = 'table' and name not like 'kysely_%' and name not like 'sqlite_%' order by name`.execute(
				db
			);
			// the foundation's tables (later migrations add their own)
			expect(tables.rows.map((r) => r.name)).toEqual(
				expect.arrayContaining([
					'api_tokens',
					'email_tokens',
					'invites',
					'memberships',
					'outbox',
					'sessions',
					'team_events',
					'teams',
					'users'
				])
			);
			for (const m of Object.values(migrations).reverse()) await m.down!(db);
			const left = await sql<{
				name: string;
			}>`select name from sqlite_master where type = 'table' and name not like 'kysely_%' and name not like 'sqlite_%'`.execute(
				db
			);
			expect(left.rows).toEqual([]);
		} finally {
			await db.destroy();
			rmSync(dir, { recursive: true, force: true });
		}
	});

	it('are named <ISO timestamp>_<verb_object>', () => {
		for (const name of Object.keys(migrations))
			expect(name).toMatch(/^\d{8}T\d{6}Z_[a-z]+(_[a-z]+)+$/);
	});
});

describe('users', () => {
	it('stores e-mail lower-cased and refuses a second account for it', async () => {
		db = await createTestDb();
		const u = await user('  Ada.Lovelace@Example.COM ');
		expect(u.email).toBe('ada.lovelace@example.com');
		expect((await getUserByEmail(db, 'ADA.LOVELACE@example.com'))?.id).toBe(u.id);
		await expect(user('ada.lovelace@example.com')).rejects.toThrow(/UNIQUE|duplicate key/);
	});

	it('refuses an upper-case address written around the helpers', async () => {
		db = await createTestDb();
		await expect(
			db
				.insertInto('users')
				.values({
					id: 'x',
					email: 'A@B.C',
					name: 'n',
					password_hash: 'h',
					email_verified_at: null,
					created_at: 0,
					updated_at: 0
				})
				.execute()
		).rejects.toThrow(/CHECK|violates check constraint/);
	});

	it('marks an address verified only while it is still the account address', async () => {
		db = await createTestDb();
		const u = await user('a@example.com');
		expect(await markEmailVerified(db, u.id, 'other@example.com')).toBe(false);
		expect(await markEmailVerified(db, u.id, 'a@example.com')).toBe(true);
		expect(await markEmailVerified(db, u.id, 'a@example.com')).toBe(false); // already
	});
});

describe('teams and memberships', () => {
	it('creates a team with its first owner and a free URL name', async () => {
		db = await createTestDb();
		const u = await user('o@example.com');
		const t1 = await createTeam(db, { name: 'Plant Engineering', ownerId: u.id });
		const t2 = await createTeam(db, { name: 'plant engineering!', ownerId: u.id });
		expect(t1.slug).toBe('plant-engineering');
		expect(t2.slug).toBe('plant-engineering-2');
		expect((await getMembership(db, t1.id, u.id))?.role).toBe('owner');
		expect(await countOwners(db, t1.id)).toBe(1);
		expect(await ownsAnyTeam(db, u.id)).toBe(true);
		const listed = await listTeamsForUser(db, u.id);
		expect(listed.map((t) => [t.slug, t.role, Number(t.member_count)])).toEqual([
			['plant-engineering', 'owner', 1],
			['plant-engineering-2', 'owner', 1]
		]);
	});

	it('makes URL names the route matcher accepts', () => {
		for (const name of [
			'Ünïcødé Wärme',
			'x',
			'---',
			'A very long team name that goes on and on and on beyond forty',
			'Kältetechnik & Co.'
		]) {
			const s = slugify(name);
			expect(s, name).toMatch(SLUG_PATTERN);
			expect(slugMatcher(s), name).toBe(true);
		}
		for (const bad of ['', 'a', '-ab', 'ab-', 'a--b', 'AB', 'a/b', '../x', 'a'.repeat(41)])
			expect(slugMatcher(bad), bad).toBe(false);
	});

	it('refuses a role outside the four and a duplicate membership', async () => {
		db = await createTestDb();
		const o = await user('o@example.com');
		const m = await user('m@example.com');
		const t = await createTeam(db, { name: 'T1', ownerId: o.id });
		// @ts-expect-error an invalid role must be refused by the database too
		await expect(addMember(db, t.id, m.id, 'admin')).rejects.toThrow(
			/CHECK|violates check constraint/
		);
		await addMember(db, t.id, m.id, 'viewer');
		await expect(addMember(db, t.id, m.id, 'designer')).rejects.toThrow(
			/UNIQUE|PRIMARY|duplicate key/
		);
	});

	it('lists members owners first, then by name', async () => {
		db = await createTestDb();
		const o = await user('o@example.com', 'Zed Owner');
		const t = await createTeam(db, { name: 'Team', ownerId: o.id });
		await addMember(db, t.id, (await user('v@example.com', 'Ann Viewer')).id, 'viewer');
		await addMember(db, t.id, (await user('c@example.com', 'Bo Checker')).id, 'checker');
		await addMember(db, t.id, (await user('d@example.com', 'Cy Designer')).id, 'designer');
		expect((await listMembers(db, t.id)).map((m) => m.role)).toEqual([
			'owner',
			'designer',
			'checker',
			'viewer'
		]);
	});

	it('cascades: deleting a team removes its memberships and events', async () => {
		db = await createTestDb();
		const o = await user('o@example.com');
		const t = await createTeam(db, { name: 'Gone', ownerId: o.id });
		await logTeamEvent(db, {
			teamId: t.id,
			actorId: o.id,
			actorLabel: 'O',
			kind: 'team.created',
			detail: { a: 1 }
		});
		expect((await listTeamEvents(db, t.id))[0].detail).toEqual({ a: 1 });
		await db.deleteFrom('teams').where('id', '=', t.id).execute();
		expect(await getMembership(db, t.id, o.id)).toBeUndefined();
		expect(await listTeamEvents(db, t.id)).toEqual([]);
		expect(await getTeamBySlug(db, 'gone')).toBeUndefined();
	});
});

describe('sessions and outbox', () => {
	it('deletes expired sessions and follows the user on delete', async () => {
		db = await createTestDb();
		const u = await user('s@example.com');
		const row = { user_id: u.id, created_at: 0, last_seen_at: 0, ip: null, user_agent: null };
		await insertSession(db, { ...row, id: 'old', expires_at: 1000 });
		await insertSession(db, { ...row, id: 'new', expires_at: Date.now() + 60_000 });
		await deleteExpiredSessions(db);
		expect((await getSessionAndUser(db, 'old')).session).toBeUndefined();
		expect((await getSessionAndUser(db, 'new')).user?.id).toBe(u.id);
		await db.deleteFrom('users').where('id', '=', u.id).execute();
		expect((await getSessionAndUser(db, 'new')).session).toBeUndefined();
	});

	it('filters the outbox by recipient without wildcard tricks', async () => {
		db = await createTestDb();
		const base = {
			message_id: null,
			envelope_from: 'f@x',
			from_header: 'f@x',
			to_header: '',
			subject: 's',
			text: 't',
			html: null,
			raw: 'r',
			received_at: 1
		};
		await insertOutboxMessage(db, { ...base, envelope_to: JSON.stringify(['a@example.com']) });
		await insertOutboxMessage(db, { ...base, envelope_to: JSON.stringify(['b@example.com']) });
		expect(await listOutboxMessages(db, { to: 'A@example.com' })).toHaveLength(1);
		expect(await listOutboxMessages(db, { to: '%' })).toHaveLength(0);
		expect(await listOutboxMessages(db)).toHaveLength(2);
	});

	it('hands a person only their own mail: exact address, since their account was made, and clears only that', async () => {
		db = await createTestDb();
		const base = {
			message_id: null,
			envelope_from: 'f@x',
			from_header: 'f@x',
			to_header: '',
			subject: 's',
			text: 't',
			html: null,
			raw: 'r'
		};
		const mine = await insertOutboxMessage(db, {
			...base,
			envelope_to: JSON.stringify(['a_b@example.com']),
			received_at: 2000
		});
		const before = await insertOutboxMessage(db, {
			...base,
			envelope_to: JSON.stringify(['a_b@example.com']),
			received_at: 999
		});
		// addresses that a LIKE pattern, or a stripped one, would have matched
		const lookalike = await insertOutboxMessage(db, {
			...base,
			envelope_to: JSON.stringify(['axb@example.com']),
			received_at: 2000
		});
		const stripped = await insertOutboxMessage(db, {
			...base,
			envelope_to: JSON.stringify(['ab@example.com']),
			received_at: 2000
		});
		const shared = await insertOutboxMessage(db, {
			...base,
			envelope_to: JSON.stringify(['a_b@example.com', 'c@example.com']),
			received_at: 2000
		});
		expect((await listMailFor(db, 'A_B@example.com', 1000)).map((m) => m.id)).toEqual([
			shared,
			mine
		]);
		expect(await getMailFor(db, mine, 'a_b@example.com', 1000)).toBeDefined();
		for (const id of [before, lookalike, stripped])
			expect(await getMailFor(db, id, 'a_b@example.com', 1000)).toBeUndefined();
		expect(await listMailFor(db, '%', 0)).toEqual([]);
		expect(await listMailFor(db, 'a%b@example.com', 0)).toEqual([]);
		expect(await clearMailFor(db, 'a_b@example.com')).toBe(2);
		expect((await listOutboxMessages(db)).map((m) => m.id).sort((x, y) => x - y)).toEqual([
			lookalike,
			stripped,
			shared
		]);
	});
});
