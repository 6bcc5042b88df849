import type { Role } from '../roles';
import type { DB } from './db/schema';
import { countUsers, createUser } from './db/users';
import { createTeam } from './db/teams';
import { addMember } from './db/memberships';
import { logTeamEvent } from './db/team-events';
import { hashPassword } from './auth';
import { insertSheet } from './db/sheets';
import { newId } from './secrets';
import { WORKED_EXAMPLES } from '../sheets/templates';

/*
 * The demo scenario: an invented consultancy with invented people and equipment, seeded on the
 * first start of an empty database (SEED_DEMO=0 turns it off). Every name, address and number
 * here is made up; the addresses use the reserved .example domain. Later features (worked example
 * sheets) read DEMO_EQUIPMENT for their starting data.
 */

export const DEMO_PASSWORD = 'statewright-demo';

export const DEMO_TEAM = {
	slug: 'brindlemoor',
	name: 'Brindlemoor Thermal Works',
	description:
		'A small process-equipment consultancy: steam kettles, sealed hot-water vessels and refrigeration receivers for food plants and district heating.'
} as const;

export const DEMO_PEOPLE: ReadonlyArray<{ role: Role; name: string; email: string }> = [
	{ role: 'owner', name: 'Maren Okafor', email: 'maren.okafor@brindlemoor.example' },
	{ role: 'designer', name: 'Tobias Lindqvist', email: 'tobias.lindqvist@brindlemoor.example' },
	{ role: 'checker', name: 'Priya Ramanathan', email: 'priya.ramanathan@brindlemoor.example' },
	{ role: 'viewer', name: 'Ezra Calloway', email: 'ezra.calloway@brindlemoor.example' }
];

export interface DemoEquipment {
	tag: string;
	name: string;
	fluid: 'water' | 'ammonia';
	/** what the worked example follows */
	story: string;
	/** invented design data, SI base units (Pa absolute, K, m³) */
	design: { volume?: number; designPressure: number; designTemperature: number; reliefSetPressure?: number };
}

/** Invented equipment for the worked examples (numbers are illustrative, not from any real plant). */
export const DEMO_EQUIPMENT: readonly DemoEquipment[] = [
	{
		tag: 'K-101',
		name: 'Jacketed steam kettle',
		fluid: 'water',
		story: 'Steam in the jacket condenses at constant pressure while it cooks a batch; the condensate is then throttled to the return line.',
		design: { volume: 0.085, designPressure: 701_325, designTemperature: 443.15, reliefSetPressure: 701_325 }
	},
	{
		tag: 'V-204',
		name: 'Sealed hot-water expansion vessel, fire case',
		fluid: 'water',
		story: 'A closed vessel charged mostly with liquid water is heated by a fire around it: constant volume, pressure climbing, until it runs liquid-full.',
		design: { volume: 0.5, designPressure: 1_101_325, designTemperature: 393.15, reliefSetPressure: 1_101_325 }
	},
	{
		tag: 'R-310',
		name: 'Ammonia liquid receiver on a hot day',
		fluid: 'ammonia',
		story: 'An isolated receiver holding liquid and vapor ammonia warms from a cool night to a hot afternoon: constant volume, saturation pressure rising.',
		design: { volume: 2.0, designPressure: 2_101_325, designTemperature: 328.15, reliefSetPressure: 2_101_325 }
	}
];

export interface SeedResult {
	seeded: boolean;
	teamSlug?: string;
	people?: ReadonlyArray<{ role: Role; name: string; email: string }>;
	password?: string;
}

/** Seeds the demo team if the database has no users yet. */
export async function seedDemo(db: DB): Promise<SeedResult> {
	if ((await countUsers(db)) > 0) return { seeded: false };
	const passwordHash = await hashPassword(DEMO_PASSWORD);
	await db.transaction().execute(async (trx) => {
		if ((await countUsers(trx)) > 0) return;
		const ids: Partial<Record<Role, string>> = {};
		for (const p of DEMO_PEOPLE) {
			ids[p.role] = (await createUser(trx, { email: p.email, name: p.name, passwordHash, emailVerified: true })).id;
		}
		const team = await createTeam(trx, { name: DEMO_TEAM.name, description: DEMO_TEAM.description, slug: DEMO_TEAM.slug, ownerId: ids.owner! });
		await logTeamEvent(trx, { teamId: team.id, actorId: ids.owner!, actorLabel: DEMO_PEOPLE[0].name, kind: 'team.created', detail: { name: team.name } });
		for (const p of DEMO_PEOPLE) if (p.role !== 'owner') await addMember(trx, team.id, ids[p.role]!, p.role);
		// the worked examples as the designer's sheets, oldest first
		const designer = DEMO_PEOPLE.find((p) => p.role === 'designer')!;
		const t0 = Date.now() - WORKED_EXAMPLES.length * 3_600_000;
		for (const [i, ex] of WORKED_EXAMPLES.entries()) {
			const doc = ex.build();
			await insertSheet(
				trx,
				{ id: newId(), teamId: team.id, title: ex.title, fluid: doc.spec.fluid, systemKind: doc.spec.system.kind, example: ex.id, draft: JSON.stringify(doc), actor: { id: ids.designer!, label: designer.name } },
				t0 + i * 3_600_000
			);
		}
	});
	return { seeded: true, teamSlug: DEMO_TEAM.slug, people: DEMO_PEOPLE, password: DEMO_PASSWORD };
}
