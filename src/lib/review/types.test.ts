import { describe, expect, it } from 'vitest';
import { wasReturned } from './types';

describe('a returned revision is told from a withdrawn one (wasReturned)', () => {
	const author = { id: 'designer1', name: 'Tobias Lindqvist', at: 1 };
	it('returned by a checker: yes; withdrawn by its author, never sent back, or moved on: no', () => {
		expect(
			wasReturned({
				status: 'draft',
				author,
				returned: { id: 'checker1', name: 'Priya Ramanathan', at: 2 }
			})
		).toBe(true);
		expect(
			wasReturned({
				status: 'draft',
				author,
				returned: { id: 'designer1', name: 'Tobias Lindqvist', at: 2 }
			})
		).toBe(false);
		expect(wasReturned({ status: 'draft', author, returned: null })).toBe(false);
		expect(
			wasReturned({
				status: 'in-check',
				author,
				returned: { id: 'checker1', name: 'Priya Ramanathan', at: 2 }
			})
		).toBe(false);
	});
});
