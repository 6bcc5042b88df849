import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupIntegration } from './testing';
import { DEMO_PEOPLE, DEMO_TEAM, seedDemo } from './demo';
import { resolveTeamAccess, type TeamAccess } from './guard';
import { listTeamSheets } from './sheets';
import { listRevisions } from './revisions';
import { listNotes } from './notes';
import { listTraces } from './traces';
import { countUsers } from './db/users';
import { listMembers } from './db/memberships';
import { listTeamEvents } from './db/team-events';
import { listOutboxMessages } from './db/outbox';

let env: Awaited<ReturnType<typeof setupIntegration>>;
let viewer: TeamAccess;
const sheetId: Record<string, string> = {};

beforeAll(async () => {
	env = await setupIntegration();
	expect((await seedDemo(env.db)).seeded).toBe(true);
	const p = DEMO_PEOPLE.find((x) => x.role === 'viewer')!;
	const user = await env.db
		.selectFrom('users')
		.select(['id', 'email', 'name'])
		.where('email', '=', p.email)
		.executeTakeFirstOrThrow();
	viewer = (await resolveTeamAccess(
		env.db,
		{ kind: 'user', user: { ...user, emailVerified: true } },
		DEMO_TEAM.slug
	))!;
	for (const s of (await listTeamSheets(env.db, viewer)).sheets)
		sheetId[s.title.split(' ')[0]] = s.id;
}, 60_000);
afterAll(() => env.close());

describe('demo seed', () => {
	it('seeds once: a second start on the same database adds nothing', async () => {
		expect((await seedDemo(env.db)).seeded).toBe(false);
		expect(await countUsers(env.db)).toBe(DEMO_PEOPLE.length);
		expect(Object.keys(sheetId).sort()).toEqual(['HP-410', 'K-101', 'R-310', 'V-204']);
	});

	it('K-101 has an approved revision signed by three different people, and a commissioning trace', async () => {
		const { revisions } = await listRevisions(env.db, viewer, sheetId['K-101']);
		expect(revisions).toHaveLength(1);
		const r = revisions[0];
		expect(r.status).toBe('approved');
		expect([r.author.name, r.checked?.name, r.approved?.name]).toEqual([
			'Tobias Lindqvist',
			'Priya Ramanathan',
			'Maren Okafor'
		]);
		expect(r.author.at).toBeLessThan(r.checked!.at);
		expect(r.approved!.at).toBeLessThan(Date.now());
		const traces = await listTraces(env.db, viewer, sheetId['K-101']);
		expect(traces).toHaveLength(1);
		expect(traces[0].pointCount).toBe(8);
		expect(traces[0].rejectedCount).toBe(0);
	});

	it('HP-410 is in check with an open note on its compression leg, a reply, and a resolved sheet note', async () => {
		const { revisions } = await listRevisions(env.db, viewer, sheetId['HP-410']);
		expect(revisions.map((r) => r.status)).toEqual(['in-check']);
		const { notes, open } = await listNotes(env.db, viewer, sheetId['HP-410']);
		expect(notes).toHaveLength(2);
		expect(open).toBe(1);
		const leg = notes.find((n) => n.anchor.kind === 'leg')!;
		expect(leg.label).toBe('L1');
		expect(leg.outdated).toBe(false);
		expect(leg.replies.map((x) => x.author.name)).toEqual(['Tobias Lindqvist']);
		expect(leg.mentions).toHaveLength(1);
		expect(notes.find((n) => n.anchor.kind === 'sheet')?.resolved?.by).toBe('Maren Okafor');
	});

	it('V-204 and R-310 stay plain drafts, and seeding sends no mail', async () => {
		for (const tag of ['V-204', 'R-310'])
			expect((await listRevisions(env.db, viewer, sheetId[tag])).revisions).toHaveLength(0);
		expect(await listOutboxMessages(env.db, {})).toHaveLength(0);
	});

	it('one clock: people and the team come before the first sheet, every event after it and before now', async () => {
		const sheets = (await listTeamSheets(env.db, viewer)).sheets as {
			createdAt: number;
			updatedAt: number;
		}[];
		const firstSheet = Math.min(...sheets.map((s) => s.createdAt));
		const team = await env.db
			.selectFrom('teams')
			.select(['id', 'created_at'])
			.where('slug', '=', DEMO_TEAM.slug)
			.executeTakeFirstOrThrow();
		const members = await listMembers(env.db, team.id);
		expect(members).toHaveLength(DEMO_PEOPLE.length);
		const users = await env.db.selectFrom('users').select(['created_at']).execute();
		const now = Date.now();
		for (const at of [
			team.created_at,
			...members.map((m) => m.created_at),
			...users.map((u) => u.created_at)
		]) {
			expect(at).toBeLessThan(firstSheet);
			expect(at).toBeGreaterThan(firstSheet - 3 * 3_600_000);
		}
		const events = await listTeamEvents(env.db, team.id, 500);
		expect(events.find((e) => e.kind === 'team.created')!.created_at).toBe(team.created_at);
		for (const e of events.filter((e) => e.kind !== 'team.created')) {
			expect(e.created_at, e.kind).toBeGreaterThanOrEqual(firstSheet);
			expect(e.created_at, e.kind).toBeLessThanOrEqual(now);
		}
		for (const s of sheets) expect(s.updatedAt).toBeLessThanOrEqual(now);
	});
});
