import { describe, expect, it } from 'vitest';
import { can, CAPABILITIES, roleWithin, ROLES, type Capability, type Role } from './roles';

// The role table of the product brief, written out by hand: who may do what.
const EXPECTED: Record<Capability, Role[]> = {
	read: ['owner', 'designer', 'checker', 'viewer'],
	'sheet:edit': ['owner', 'designer'],
	'sheet:check': ['owner', 'checker'],
	'sheet:approve': ['owner'],
	'note:write': ['owner', 'designer', 'checker'],
	'token:create': ['owner', 'designer'],
	'team:manage': ['owner']
};

describe('capabilities', () => {
	for (const capability of CAPABILITIES) {
		it(`${capability}: ${EXPECTED[capability].join(', ')}`, () => {
			expect(ROLES.filter((r) => can(r, capability))).toEqual(EXPECTED[capability]);
		});
	}

	it('refuses everything to no role', () => {
		for (const c of CAPABILITIES) expect(can(null, c)).toBe(false);
	});

	it('orders roles only where one covers another', () => {
		expect(roleWithin('viewer', 'checker')).toBe(true);
		expect(roleWithin('checker', 'designer')).toBe(false);
		expect(roleWithin('designer', 'checker')).toBe(false);
		for (const r of ROLES) expect(roleWithin(r, 'owner')).toBe(true);
	});
});
