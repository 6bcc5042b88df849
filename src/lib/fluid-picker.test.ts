import { describe, expect, it } from 'vitest';
import { listFluids } from './thermo';
import { FLUID_GROUPS } from './thermo/fluids/schema';
import { PICKER_GROUPS, groupFluids, normalize, notCarried, searchFluids } from './fluid-picker';

const fluids = listFluids();
const first = (q: string) => searchFluids(fluids, q)[0]?.id;

describe('fluid picker search', () => {
	it('normalizes the ways an R-number or formula is written', () => {
		expect(normalize('R-1234ze(E)')).toBe('r1234zee');
		expect(normalize(' r 290 ')).toBe('r290');
		expect(normalize('O₂')).toBe('o2');
	});

	it('finds each fluid by name, formula, R-number and alias, the exact match first', () => {
		// trade names and designations: ASHRAE 34 R-numbers (common practice), formulae, LNG/LH2 usage
		const cases: [string, string][] = [
			['R-290', 'propane'],
			['r290', 'propane'],
			['propane', 'propane'],
			['C3H8', 'propane'],
			['R-600a', 'isobutane'],
			['isobutane', 'isobutane'],
			['R-32', 'r32'],
			['difluoromethane', 'r32'],
			['R-1234yf', 'r1234yf'],
			['1234yf', 'r1234yf'],
			['R-1234ze(E)', 'r1234ze-e'],
			['HFO-1234ze', 'r1234ze-e'],
			['LNG', 'methane'],
			['CH4', 'methane'],
			['Ar', 'argon'],
			['argon', 'argon'],
			['LH2', 'hydrogen'],
			['H2', 'hydrogen'],
			['LN2', 'nitrogen'],
			['N2', 'nitrogen'],
			['steam', 'water'],
			['H2O', 'water'],
			['R-717', 'ammonia'],
			['R-744', 'carbon-dioxide'],
			['CO2', 'carbon-dioxide'],
			['R-134a', 'r134a'],
			['O2', 'oxygen'],
			['LOX', 'oxygen'],
			['R-732', 'oxygen'],
			['air', 'air'],
			['compressed air', 'air'],
			['Compressed Air', 'air'],
			['R-729', 'air'],
			['liquid air', 'air']
		];
		for (const [q, id] of cases) expect(first(q), q).toBe(id);
	});

	it('lists every fluid for an empty query and none for nonsense', () => {
		expect(searchFluids(fluids, '').map((f) => f.id)).toEqual(fluids.map((f) => f.id));
		expect(searchFluids(fluids, 'unobtainium')).toEqual([]);
	});

	it('says when a query names a fluid Statewright does not carry', () => {
		expect(notCarried('O2')).toBeNull(); // carried: oxygen is a fluid of its own
		expect(notCarried('air')).toBeNull(); // carried: air as a pseudo-pure fluid
		expect(notCarried('He')).toBe('Helium');
		expect(notCarried('CO2')).toBeNull();
		expect(notCarried('propane')).toBeNull();
		// none of them is a carried fluid's name
		for (const q of ['he'])
			expect(searchFluids(fluids, q).some((f) => normalize(f.name) === q)).toBe(false);
	});

	it('ranks an exact formula above one that merely contains it', () => {
		const ids = searchFluids(fluids, 'h2').map((f) => f.id);
		expect(ids[0]).toBe('hydrogen');
		expect(ids).toContain('water'); // H2O starts with h2
	});
});

describe('fluid picker groups', () => {
	it('groups every fluid by use, in the engine’s group order', () => {
		expect(PICKER_GROUPS).toEqual(FLUID_GROUPS);
		const groups = groupFluids(fluids);
		expect(groups.map((g) => g.label)).toEqual([
			'Water and steam',
			'Refrigerants',
			'Hydrocarbons',
			'Cryogens and gases'
		]);
		expect(groups.flatMap((g) => g.fluids).length).toBe(fluids.length);
		const of = (id: string) => groups.find((g) => g.fluids.some((f) => f.id === id))?.id;
		expect(of('water')).toBe('water');
		expect(of('r32')).toBe('refrigerant');
		expect(of('ammonia')).toBe('refrigerant');
		expect(of('propane')).toBe('hydrocarbon');
		expect(of('isobutane')).toBe('hydrocarbon');
		expect(of('methane')).toBe('cryogen');
		expect(of('nitrogen')).toBe('cryogen');
		expect(of('air')).toBe('cryogen');
	});
});
