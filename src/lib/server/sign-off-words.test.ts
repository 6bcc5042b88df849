import { describe, expect, it } from 'vitest';
import { approvedMail, checkedMail, returnedMail, submittedMail } from './mail-templates';
import { NOTIFICATION_LABELS } from './notifications';
import { OpenNotesError } from './revisions';
import { STEPS } from '$lib/revisions/steps';

const input = {
	name: 'Tobias Lindqvist',
	actorName: 'Priya Ramanathan',
	sheetTitle: 'V-204 fire case',
	teamName: 'Demo Process Co',
	revision: 2,
	text: 'Relief valve sized for the fire case',
	url: 'http://localhost/t/demo/sheets/x/revisions/2',
	settingsUrl: 'http://localhost/account'
};

describe('sign-off mails and refusals say the steps in the workflow’s words', () => {
	it('each mail names its step as the sheet page does', () => {
		expect(checkedMail(input).subject).toBe(`Rev 2 of V-204 fire case was ${STEPS.check.past}`);
		expect(checkedMail(input).text).toContain(
			`Priya Ramanathan ${STEPS.check.didTo('Rev 2 of the sheet V-204 fire case (Demo Process Co)')}.`
		);
		expect(approvedMail(input).subject).toBe(`Rev 2 of V-204 fire case was ${STEPS.approve.past}`);
		expect(returnedMail(input).text).toContain(
			`Priya Ramanathan ${STEPS.return.didTo('Rev 2 of the sheet V-204 fire case (Demo Process Co)')} with this note:`
		);
		const ask = submittedMail(input).text;
		expect(ask).toContain(
			STEPS.submit.didTo('Rev 2 of the sheet V-204 fire case (Demo Process Co)')
		);
		expect(ask).toContain(`then ${STEPS.check.doTo('it')} or ${STEPS.return.doTo('it')}.`);
	});

	it('the account page’s switches and the open-notes refusal use the same words', () => {
		expect(NOTIFICATION_LABELS.checked.label).toBe(`My revision is ${STEPS.check.done}`);
		expect(NOTIFICATION_LABELS.approved.label).toBe(`My revision is ${STEPS.approve.done}`);
		const e = new OpenNotesError(3, 'check', 2);
		expect(e.message).toContain(`Rev 3 is not ${STEPS.check.done} yet`);
		expect(e.message).toContain(`or ${STEPS.check.doTo('Rev 3')} over them`);
	});
});
