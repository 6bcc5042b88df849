/**
 * GET /api/v1/fluids through its handler: every fluid the engine carries, with the metadata the
 * picker searches and groups by (name, formula, aliases, group) and its reference state.
 */
import { describe, expect, it } from 'vitest';
import { GET } from './+server';
import { fluidData } from '$lib/thermo/fluids/index';
import { FLUID_GROUPS } from '$lib/thermo/fluids/schema';
import { groupFluids, searchFluids } from '$lib/fluid-picker';
import type { FluidInfo } from '$lib/thermo';

async function get(query = ''): Promise<{ status: number; json: { fluids: FluidInfo[] } }> {
	const url = new URL(`http://127.0.0.1/api/v1/fluids${query}`);
	const event = {
		request: new Request(url),
		url,
		getClientAddress: () => '127.0.0.9',
		params: {},
		locals: {}
	} as unknown as Parameters<typeof GET>[0];
	const res = await GET(event);
	return { status: res.status, json: await res.json() };
}

describe('GET /api/v1/fluids', () => {
	it('lists every registered fluid with the data file’s name, formula, aliases and group', async () => {
		const r = await get();
		expect(r.status).toBe(200);
		const listed = r.json.fluids;
		expect(listed.map((f) => f.id)).toEqual(fluidData.map((f) => f.id));
		for (const d of fluidData) {
			const f = listed.find((x) => x.id === d.id) as FluidInfo;
			expect(f.name).toBe(d.name);
			expect(f.formula).toBe(d.formula);
			expect(f.aliases).toEqual(d.aliases);
			expect(FLUID_GROUPS.map((g) => g.id)).toContain(f.group);
			expect(f.group).toBe(d.group);
			expect(f.referenceState).toMatch(/IAPWS|IIR|NBP|h = /);
		}
	});

	it('is what the picker searches and groups: four groups, aliases found', async () => {
		const listed = (await get()).json.fluids;
		expect(groupFluids(listed).map((g) => g.label)).toEqual([
			'Water and steam',
			'Refrigerants',
			'Hydrocarbons',
			'Cryogens and gases'
		]);
		for (const [q, id] of [
			['R-290', 'propane'],
			['LNG', 'methane'],
			['O2', 'oxygen'],
			['LH2', 'hydrogen'],
			['R-600a', 'isobutane'],
			['LAR', 'argon']
		])
			expect(searchFluids(listed, q)[0]?.id, q).toBe(id);
	});

	it('refuses a query parameter with a 400 that names it', async () => {
		const r = await get('?fluid=water');
		expect(r.status).toBe(400);
		expect(JSON.stringify(r.json)).toMatch(/fluid/);
	});
});
