import { describe, expect, it } from 'vitest';
import { render } from 'svelte/server';
import RevisionHistory from '$lib/components/RevisionHistory.svelte';
import StatusChip from '$lib/components/StatusChip.svelte';
import { reviewApi } from '$lib/review/client';
import type { RevisionSummary } from '$lib/review/types';
import { can } from '$lib/roles';
import { signOffOverrides, SIGNED_LABEL } from './sign-off';
import { EVENT_WORDS, RETURNED_LABEL, SIGN_OFF_ACTIONS, STATUS, STEPS } from './steps';

describe('the sign-off steps', () => {
	it('move a revision as the workflow says: draft → in check → checked → approved, back to draft by return or withdraw', () => {
		const moves = SIGN_OFF_ACTIONS.map((a) => `${a}: ${STEPS[a].from.join('|')} → ${STEPS[a].to}`);
		expect(moves).toEqual([
			'submit: draft → in-check',
			'withdraw: in-check → draft',
			'check: in-check → checked',
			'return: in-check|checked → draft',
			'approve: checked → approved'
		]);
		// approved is locked: no step leaves it
		expect(SIGN_OFF_ACTIONS.filter((a) => STEPS[a].from.includes('approved'))).toEqual([]);
	});

	it('are taken by the roles the team roles name: designers submit, checkers check, only owners approve', () => {
		const who = (a: keyof typeof STEPS) =>
			(['owner', 'designer', 'checker', 'viewer'] as const).filter((r) => can(r, STEPS[a].cap));
		expect(who('submit')).toEqual(['owner', 'designer']);
		expect(who('check')).toEqual(['owner', 'checker']);
		expect(who('approve')).toEqual(['owner']);
	});

	it('say each step with its own button and log words', () => {
		const buttons = SIGN_OFF_ACTIONS.map((a) => STEPS[a].button);
		expect(new Set(buttons).size).toBe(buttons.length);
		expect(EVENT_WORDS[STEPS.check.event]).toBe(STEPS.check.done);
		expect(EVENT_WORDS[STEPS.approve.event]).toBe(STEPS.approve.done);
		expect(STEPS.check.doTo('Rev 3')).toBe('mark Rev 3 checked');
		expect(STEPS.withdraw.doTo('it')).toBe('withdraw it from checking');
	});
});

function summary(status: RevisionSummary['status']): RevisionSummary {
	return {
		number: 2,
		basedOn: 1,
		title: 'V-204 fire case',
		message: 'Relief case',
		author: { id: 'u-designer', name: 'Tobias Lindqvist', at: 1_767_000_000_000 },
		status,
		submitted: {
			id: 'u-designer',
			name: 'Tobias Lindqvist',
			at: 1_767_000_100_000,
			checkerId: null
		},
		checked: status === 'checked' ? { id: 'u-checker', name: 'Priya Ramanathan', at: 1 } : null,
		approved: null,
		returned: null,
		latest: true
	};
}

function history(
	status: RevisionSummary['status'],
	role: { check?: boolean; approve?: boolean; edit?: boolean }
) {
	return render(RevisionHistory, {
		props: {
			api: reviewApi('demo', 'sheet'),
			team: 'demo',
			sheetId: 'sheet',
			revisions: [summary(status)],
			events: [],
			me: 'u-someone-else',
			canEdit: role.edit ?? false,
			canCheck: role.check ?? false,
			canApprove: role.approve ?? false,
			members: [],
			draftChanged: false,
			draftVersion: async () => 1
		}
	}).body;
}

describe('the sheet page and the title block take the words from the steps', () => {
	it('the sign-off panel labels its buttons and status with the steps’ words', () => {
		const inCheck = history('in-check', { check: true, edit: true });
		expect(inCheck).toContain(STEPS.check.button);
		expect(inCheck).toContain(STEPS.return.button);
		expect(inCheck).toContain(STEPS.withdraw.button);
		expect(inCheck).toContain(STATUS['in-check'].label);
		expect(inCheck).not.toContain(STEPS.approve.button + '</button');
		const checked = history('checked', { approve: true });
		expect(checked).toContain(STEPS.approve.button + '</button');
		expect(checked).toContain(`${STATUS.checked.label} by Priya Ramanathan`);
		expect(history('draft', { edit: true })).toContain(STEPS.submit.button);
	});

	it('the status chip says the status label, and Returned for a returned draft', () => {
		for (const s of ['draft', 'in-check', 'checked', 'approved'] as const)
			expect(render(StatusChip, { props: { status: s } }).body).toContain(STATUS[s].label);
		expect(render(StatusChip, { props: { status: 'draft', returned: true } }).body).toContain(
			RETURNED_LABEL
		);
	});

	it('the title block’s signers and the override record use the same words', () => {
		expect(SIGNED_LABEL).toEqual({
			designer: 'Designed',
			checker: 'Checked',
			approver: 'Approved'
		});
		const line = signOffOverrides(
			[
				{
					number: 2,
					kind: 'checked',
					actor: 'Priya Ramanathan',
					at: Date.UTC(2026, 0, 6),
					override: { reason: 'Noted for Rev 3', openNotes: 2 }
				}
			],
			2
		);
		expect(line).toEqual([
			'Marked checked by Priya Ramanathan on 2026-01-06 over 2 open review notes: “Noted for Rev 3”'
		]);
	});
});
