import type { Role } from '$lib/roles';
import { transaction } from './db/dialect';
import type { DB } from './db/schema';
import { countUsers, createUser } from './db/users';
import { createTeam } from './db/teams';
import { addMember } from './db/memberships';
import { logTeamEvent } from './db/team-events';
import { hashPassword } from './auth';
import { insertSheet } from './db/sheets';
import { newId } from './secrets';
import { WORKED_EXAMPLES } from '$lib/sheets/templates';
import type { SheetDoc } from '$lib/sheets/types';
import { resolveTeamAccess, type TeamAccess } from './guard';
import { moveRevision, saveRevision } from './revisions';
import { createNote, replyToNote, setNoteState } from './notes';
import { uploadTrace } from './traces';

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
	design: {
		volume?: number;
		designPressure: number;
		designTemperature: number;
		reliefSetPressure?: number;
	};
}

/** Invented equipment for the worked examples (numbers are illustrative, not from any real plant). */
export const DEMO_EQUIPMENT: readonly DemoEquipment[] = [
	{
		tag: 'K-101',
		name: 'Jacketed steam kettle',
		fluid: 'water',
		story:
			'Steam in the jacket condenses at constant pressure while it cooks a batch; the condensate is then throttled to the return line.',
		design: {
			volume: 0.085,
			designPressure: 701_325,
			designTemperature: 443.15,
			reliefSetPressure: 701_325
		}
	},
	{
		tag: 'V-204',
		name: 'Sealed hot-water expansion vessel, fire case',
		fluid: 'water',
		story:
			'A closed vessel charged mostly with liquid water is heated by a fire around it: constant volume, pressure climbing, until it runs liquid-full.',
		design: {
			volume: 0.5,
			designPressure: 1_101_325,
			designTemperature: 393.15,
			reliefSetPressure: 1_101_325
		}
	},
	{
		tag: 'R-310',
		name: 'Ammonia liquid receiver on a hot day',
		fluid: 'ammonia',
		story:
			'An isolated receiver holding liquid and vapor ammonia warms from a cool night to a hot afternoon: constant volume, saturation pressure rising.',
		design: {
			volume: 2.0,
			designPressure: 2_101_325,
			designTemperature: 328.15,
			reliefSetPressure: 2_101_325
		}
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
	const ids: Partial<Record<Role, string>> = {};
	const sheets = new Map<string, { id: string; doc: SheetDoc; at: number }>();
	// one clock for the whole story: the people and the team come first, then the sheets an hour
	// apart, then their reviews — so members' "since", the activity log and the sheets agree
	const hour = 3_600_000;
	const t0 = Date.now() - WORKED_EXAMPLES.length * hour;
	const founded = t0 - hour;
	const seeded = await transaction(db, async (trx) => {
		if ((await countUsers(trx)) > 0) return false;
		for (const [i, p] of DEMO_PEOPLE.entries()) {
			ids[p.role] = (
				await createUser(
					trx,
					{ email: p.email, name: p.name, passwordHash, emailVerified: true },
					founded - 10 * 60_000 + i * 60_000
				)
			).id;
		}
		const team = await createTeam(
			trx,
			{
				name: DEMO_TEAM.name,
				description: DEMO_TEAM.description,
				slug: DEMO_TEAM.slug,
				ownerId: ids.owner!
			},
			founded
		);
		await logTeamEvent(
			trx,
			{
				teamId: team.id,
				actorId: ids.owner!,
				actorLabel: DEMO_PEOPLE[0].name,
				kind: 'team.created',
				detail: { name: team.name }
			},
			founded
		);
		for (const [i, p] of DEMO_PEOPLE.entries())
			if (p.role !== 'owner')
				await addMember(trx, team.id, ids[p.role]!, p.role, founded + i * 5 * 60_000);
		// the worked examples as the designer's sheets, oldest first
		const designer = DEMO_PEOPLE.find((p) => p.role === 'designer')!;
		for (const [i, ex] of WORKED_EXAMPLES.entries()) {
			const doc = ex.build();
			const id = newId();
			const at = t0 + i * hour;
			await insertSheet(
				trx,
				{
					id,
					teamId: team.id,
					title: ex.title,
					fluid: doc.spec.fluid,
					systemKind: doc.spec.system.kind,
					example: ex.id,
					draft: JSON.stringify(doc),
					actor: { id: ids.designer!, label: designer.name }
				},
				at
			);
			sheets.set(ex.id, { id, doc, at });
		}
		return true;
	});
	if (!seeded) return { seeded: false };
	await seedReviewHistory(db, ids as Record<Role, string>, sheets);
	return { seeded: true, teamSlug: DEMO_TEAM.slug, people: DEMO_PEOPLE, password: DEMO_PASSWORD };
}

/**
 * A review history to look at in the demo, written through the same services the API uses (no
 * mail is sent while seeding): K-101 saved, checked and approved, with a commissioning trace;
 * HP-410 submitted for checking with an open note on its compression leg and a resolved one.
 * V-204 and R-310 stay plain drafts.
 */
async function seedReviewHistory(
	db: DB,
	ids: Record<Role, string>,
	sheets: Map<string, { id: string; doc: SheetDoc; at: number }>
): Promise<void> {
	const access = async (role: Role): Promise<TeamAccess> => {
		const p = DEMO_PEOPLE.find((x) => x.role === role)!;
		return (await resolveTeamAccess(
			db,
			{ kind: 'user', user: { id: ids[role], email: p.email, name: p.name, emailVerified: true } },
			DEMO_TEAM.slug
		))!;
	};
	const [owner, designer, checker] = [
		await access('owner'),
		await access('designer'),
		await access('checker')
	];
	const min = 60_000;

	const kettle = sheets.get('kettle-k101');
	if (kettle) {
		const t = kettle.at + 10 * min;
		await saveRevision(
			db,
			designer,
			kettle.id,
			{
				message: 'First issue: jacket at 5 bar g, trap to the 0.5 bar g return.',
				baseRevision: null
			},
			t
		);
		await moveRevision(
			db,
			designer,
			kettle.id,
			1,
			'submit',
			{
				checkerId: ids.checker,
				note: 'Steam table figures for the jacket duty; please check the flash fraction at the trap.'
			},
			undefined,
			t + min
		);
		await moveRevision(
			db,
			checker,
			kettle.id,
			1,
			'check',
			{ note: 'Jacket duty and flash fraction agree with my hand check.' },
			undefined,
			t + 20 * min
		);
		await moveRevision(db, owner, kettle.id, 1, 'approve', {}, undefined, t + 30 * min);
		// invented commissioning readings: jacket pressure rising to the 5 bar g header, a few kelvin of superheat
		const csv = [
			'# K-101 commissioning, jacket logger 1 (invented demo data)',
			'time [s],P [bar g],T [°C]',
			'0,0.5,116.0',
			'60,1.5,131.0',
			'120,2.5,141.5',
			'180,3.5,150.5',
			'240,4.5,157.5',
			'300,5.0,161.5',
			'360,5.0,159.0',
			'420,4.9,160.6'
		].join('\n');
		await uploadTrace(
			db,
			designer,
			kettle.id,
			{
				bytes: new TextEncoder().encode(csv),
				filename: 'k101-commissioning.csv',
				name: 'Commissioning, jacket logger 1'
			},
			t + 40 * min
		);
	}

	const heatPump = sheets.get('heat-pump-hp410');
	if (heatPump) {
		const t = heatPump.at + 10 * min;
		const compression = heatPump.doc.spec.legs[0].id;
		await saveRevision(
			db,
			designer,
			heatPump.id,
			{ message: 'Rating point, ideal cycle for a first look.', baseRevision: null },
			t
		);
		await moveRevision(
			db,
			designer,
			heatPump.id,
			1,
			'submit',
			{ checkerId: ids.checker },
			undefined,
			t + min
		);
		const open = await createNote(
			db,
			checker,
			heatPump.id,
			{
				anchor: { kind: 'leg', legId: compression },
				body: '@Tobias Lindqvist An isentropic leg gives the ideal heating COP only. State the compressor’s isentropic efficiency from the vendor sheet, or use a polytropic leg, before this goes to the client.',
				revision: 1
			},
			undefined,
			t + 15 * min
		);
		await replyToNote(
			db,
			designer,
			heatPump.id,
			open.id,
			{ body: 'Agreed. Waiting for the vendor’s curve; I will add the efficiency in Rev 2.' },
			undefined,
			t + 25 * min
		);
		const settled = await createNote(
			db,
			owner,
			heatPump.id,
			{
				anchor: { kind: 'sheet' },
				body: 'Rating point confirmed with the creamery: 300 kPa a evaporating, 1.4 MPa a condensing.',
				revision: 1
			},
			undefined,
			t + 30 * min
		);
		await setNoteState(db, owner, heatPump.id, settled.id, true, t + 31 * min);
	}
}
