import { describe, expect, it } from 'vitest';
import { render } from 'svelte/server';
import StatusChip from './StatusChip.svelte';

describe('StatusChip', () => {
	it('a revision back in draft because it was returned says Returned, not Draft', () => {
		const returned = render(StatusChip, { props: { status: 'draft', returned: true } }).body;
		expect(returned).toContain('data-status="returned"');
		expect(returned).toContain('Returned');
		expect(returned).not.toContain('Draft');
		expect(render(StatusChip, { props: { status: 'draft' } }).body).toContain('Draft');
		// only a draft can read as returned
		expect(render(StatusChip, { props: { status: 'in-check', returned: true } }).body).toContain(
			'In check'
		);
	});
});
