import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { Role } from '$lib/roles';
import { expectAppError, setupIntegration } from './testing';
import { createUser } from './db/users';
import { addMember } from './db/memberships';
import { createTeamFor } from './teams';
import { resolveTeamAccess, type TeamAccess } from './guard';
import type { SessionUser } from './auth';
import type { Team } from './db/schema';
import {
	getSheet,
	likePattern,
	listRecentSheetsForUser,
	sheetCountsForUser,
	writeDraft
} from './db/sheets';
import {
	createFromExample,
	createSheet,
	DraftConflictError,
	listTeamSheets,
	readSheet,
	renameTeamSheet,
	saveDraft
} from './sheets';
import { makeDoc } from '$lib/sheets/doc';
import { WORKED_EXAMPLES } from '$lib/sheets/templates';
import type { SheetDoc } from '$lib/sheets/types';

let env: Awaited<ReturnType<typeof setupIntegration>>;
let team: Team;
let other: Team;
const people = {} as Record<Role | 'outsider', SessionUser>;

async function person(email: string, name: string): Promise<SessionUser> {
	const u = await createUser(env.db, { email, name, passwordHash: 'unused', emailVerified: true });
	return { id: u.id, email: u.email, name: u.name, emailVerified: true };
}

async function access(who: SessionUser, t: Team = team): Promise<TeamAccess> {
	const a = await resolveTeamAccess(env.db, { kind: 'user', user: who }, t.slug);
	if (!a) throw new Error(`${who.email} has no access to ${t.slug}`);
	return a;
}

function waterDoc(): SheetDoc {
	return makeDoc({
		spec: {
			fluid: 'water',
			system: { kind: 'closed', volume: 0.5 },
			start: { T: 373.15, x: 0.2 },
			legs: [{ id: 'Labc234', process: 'isochoric', target: { T: 453.15 } }]
		}
	});
}

beforeEach(async () => {
	env = await setupIntegration();
	people.owner = await person('owner@example.com', 'Olu Owner');
	team = await createTeamFor(env.db, people.owner, { name: 'Heat Works' });
	for (const role of ['designer', 'checker', 'viewer'] as const) {
		people[role] = await person(`${role}@example.com`, `${role} person`);
		await addMember(env.db, team.id, people[role].id, role);
	}
	people.outsider = await person('outsider@example.com', 'Out Sider');
	other = await createTeamFor(env.db, people.outsider, { name: 'Other Shop' });
});
afterEach(async () => {
	await env.close();
});

describe('creating sheets', () => {
	it('stores a validated draft at version 1 with team-scoped numbers', async () => {
		const a = await access(people.designer);
		const s1 = await createSheet(env.db, a, { title: '  Kettle   jacket ', doc: waterDoc() });
		const s2 = await createSheet(env.db, a, { title: 'Second', doc: waterDoc() });
		expect(s1.title).toBe('Kettle jacket');
		expect([s1.number, s2.number]).toEqual([1, 2]);
		expect(s1.version).toBe(1);
		expect(s1.createdBy).toBe('designer person');
		const o = await createSheet(env.db, await access(people.outsider, other), {
			title: 'Theirs',
			doc: waterDoc()
		});
		expect(o.number).toBe(1);
		const row = await getSheet(env.db, team.id, s1.id);
		expect(JSON.parse(row!.draft).spec.legs[0].id).toBe('Labc234');
		expect(row!.fluid).toBe('water');
		expect(row!.system_kind).toBe('closed');
	});

	it('refuses checkers and viewers (403) and writes nothing', async () => {
		for (const role of ['checker', 'viewer'] as const) {
			const e = await expectAppError(
				createSheet(env.db, await access(people[role]), { title: 'x', doc: waterDoc() }),
				403,
				'forbidden'
			);
			expect(e.message).toContain('designers and owners');
		}
		expect((await listTeamSheets(env.db, await access(people.owner))).total).toBe(0);
	});

	it('refuses a bad document or title with a message, and a start state the engine cannot fix with 422', async () => {
		const a = await access(people.designer);
		const bad = waterDoc() as unknown as { spec: { start: Record<string, number> } };
		bad.spec.start = { T: 373.15 };
		const e = await expectAppError(
			createSheet(env.db, a, { title: 'x', doc: bad }),
			400,
			'invalid-sheet'
		);
		expect(e.message).toMatch(/exactly two properties/);
		await expectAppError(
			createSheet(env.db, a, { title: '   ', doc: waterDoc() }),
			400,
			'invalid-title'
		);
		const unreachable = waterDoc();
		unreachable.spec.start = { T: 700, x: 0.5 }; // above water's critical temperature: no quality there
		const u = await expectAppError(createSheet(env.db, a, { title: 'x', doc: unreachable }), 422);
		expect(u.message).toMatch(/start state cannot be fixed/);
		expect((await listTeamSheets(env.db, a)).total).toBe(0);
	});

	it('creates from every worked example; a bare PathSpec from a script is migrated into a document', async () => {
		const a = await access(people.owner);
		for (const ex of WORKED_EXAMPLES) {
			const s = await createFromExample(env.db, a, ex.id);
			expect(s.example).toBe(ex.id);
			expect(s.doc.spec.fluid).toBe(ex.fluid);
		}
		await expectAppError(createFromExample(env.db, a, 'no-such-example'), 400, 'unknown-example');
		const bare = {
			fluid: 'ammonia',
			system: { kind: 'closed', volume: 2 },
			start: { T: 288.15, v: 0.0023 },
			legs: [{ process: 'isochoric', target: { T: 318.15 } }],
			atmosphericPressure: 95_000
		};
		const s = await createSheet(env.db, a, { title: 'From a script', doc: bare });
		expect(s.doc.version).toBe(1);
		expect(s.doc.units.atmosphere).toBe(95_000);
		expect(s.doc.spec.legs[0].id).toMatch(/^L[a-z2-9]{6}$/);
	});
});

describe('reading, listing and searching', () => {
	it('reads only within the team: another team’s id is 404, as is a malformed one', async () => {
		const mine = await createSheet(env.db, await access(people.designer), {
			title: 'Mine',
			doc: waterDoc()
		});
		const theirs = await createSheet(env.db, await access(people.outsider, other), {
			title: 'Theirs',
			doc: waterDoc()
		});
		expect((await readSheet(env.db, await access(people.viewer), mine.id)).title).toBe('Mine');
		await expectAppError(
			readSheet(env.db, await access(people.viewer), theirs.id),
			404,
			'sheet-not-found'
		);
		await expectAppError(readSheet(env.db, await access(people.viewer), "x' or 1=1 --"), 404);
	});

	it('searches title, fluid, title block and number, every word, wildcards taken literally', async () => {
		const a = await access(people.owner);
		await createFromExample(env.db, a, 'kettle-k101');
		await createFromExample(env.db, a, 'receiver-r310-hot-day');
		await createSheet(env.db, a, { title: '100% fill_check', doc: waterDoc() });
		const titles = async (q: string) =>
			(await listTeamSheets(env.db, a, { q })).sheets.map((s) => s.title);
		expect(await titles('ammonia')).toEqual(['R-310 ammonia receiver on a hot day']);
		expect(await titles('K-101')).toEqual(['K-101 kettle jacket: condensing steam, then the trap']);
		expect(await titles('Gorsebank receiver')).toHaveLength(1);
		expect(await titles('Gorsebank kettle')).toHaveLength(0);
		expect(await titles('water')).toHaveLength(2);
		expect(await titles('%')).toEqual(['100% fill_check']);
		expect(await titles('_')).toEqual(['100% fill_check']);
		expect(await titles('#2')).toEqual(['R-310 ammonia receiver on a hot day']);
		expect(likePattern('a%b_c\\')).toBe('%a\\%b\\_c\\\\%');
		const all = await listTeamSheets(env.db, a);
		expect(all.total).toBe(3);
		expect(all.sheets[0].legCount).toBe(1);
		expect(all.sheets.find((s) => s.tag === 'K-101')?.legCount).toBe(2);
	});

	it('lists recent sheets across a person’s teams and counts them per team', async () => {
		await createSheet(env.db, await access(people.designer), { title: 'A', doc: waterDoc() }, 1000);
		await createSheet(env.db, await access(people.designer), { title: 'B', doc: waterDoc() }, 2000);
		await createSheet(
			env.db,
			await access(people.outsider, other),
			{ title: 'Elsewhere', doc: waterDoc() },
			3000
		);
		const recent = await listRecentSheetsForUser(env.db, people.checker.id);
		expect(recent.map((r) => r.title)).toEqual(['B', 'A']);
		expect(recent[0].team_slug).toBe(team.slug);
		expect((await sheetCountsForUser(env.db, people.checker.id)).get(team.slug)).toBe(2);
	});
});

describe('saving the draft', () => {
	it('bumps the version, records who saved, and refuses a stale version with 409 naming them', async () => {
		const d = await access(people.designer);
		const s = await createSheet(env.db, d, { title: 'Vessel', doc: waterDoc() });
		const edited = waterDoc();
		edited.spec.legs[0].target = { T: 473.15 };
		const r = await saveDraft(
			env.db,
			await access(people.owner),
			s.id,
			{ version: 1, doc: edited },
			5000
		);
		expect(r).toEqual({ version: 2, updatedAt: 5000, updatedBy: 'Olu Owner' });
		const stale = waterDoc();
		stale.titleBlock.tag = 'V-9';
		const e = await expectAppError(
			saveDraft(env.db, d, s.id, { version: 1, doc: stale }),
			409,
			'draft-conflict'
		);
		expect(e).toBeInstanceOf(DraftConflictError);
		expect((e as DraftConflictError).current).toEqual({
			version: 2,
			updatedAt: 5000,
			updatedBy: 'Olu Owner'
		});
		expect(e.message).toContain('Olu Owner saved this sheet');
		const now = await readSheet(env.db, d, s.id);
		expect(now.version).toBe(2);
		expect(now.doc.spec.legs[0].target).toEqual({ T: 473.15 });
		expect(now.doc.titleBlock.tag).toBe('');
	});

	it('writes nothing for an invalid document, a checker or a viewer', async () => {
		const s = await createSheet(env.db, await access(people.designer), {
			title: 'Vessel',
			doc: waterDoc()
		});
		const bad = waterDoc() as unknown as { spec: { legs: Array<Record<string, unknown>> } };
		bad.spec.legs[0].process = 'isobaric';
		bad.spec.legs[0].target = { P: 2e5 };
		const e = await expectAppError(
			saveDraft(env.db, await access(people.designer), s.id, { version: 1, doc: bad }),
			400,
			'invalid-sheet'
		);
		expect(e.message).toMatch(/keeps P constant/);
		await expectAppError(
			saveDraft(env.db, await access(people.checker), s.id, { version: 1, doc: waterDoc() }),
			403
		);
		await expectAppError(
			saveDraft(env.db, await access(people.viewer), s.id, { version: 1, doc: waterDoc() }),
			403
		);
		await expectAppError(
			saveDraft(env.db, await access(people.designer), s.id, { version: 0, doc: waterDoc() }),
			400,
			'invalid-version'
		);
		expect((await readSheet(env.db, await access(people.viewer), s.id)).version).toBe(1);
	});

	it('the conditional write itself refuses a version that moved (two writers racing)', async () => {
		const s = await createSheet(env.db, await access(people.designer), {
			title: 'Race',
			doc: waterDoc()
		});
		const w = {
			draft: JSON.stringify(waterDoc()),
			fluid: 'water',
			systemKind: 'closed' as const,
			baseVersion: 1,
			actor: { id: null, label: 'x' }
		};
		expect(await writeDraft(env.db, team.id, s.id, w)).toBe(2);
		expect(await writeDraft(env.db, team.id, s.id, w)).toBeNull();
		expect(await writeDraft(env.db, other.id, s.id, { ...w, baseVersion: 2 })).toBeNull();
	});

	it('renames within the team only; titles are checked', async () => {
		const s = await createSheet(env.db, await access(people.designer), {
			title: 'Old',
			doc: waterDoc()
		});
		const r = await renameTeamSheet(env.db, await access(people.owner), s.id, ' New  name ');
		expect(r.title).toBe('New name');
		expect(r.version).toBe(1);
		await expectAppError(
			renameTeamSheet(env.db, await access(people.owner), s.id, ''),
			400,
			'invalid-title'
		);
		await expectAppError(renameTeamSheet(env.db, await access(people.checker), s.id, 'x'), 403);
		await expectAppError(
			renameTeamSheet(env.db, await access(people.outsider, other), s.id, 'x'),
			404
		);
	});
});
