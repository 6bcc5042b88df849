import { expect, test, type Page } from '@playwright/test';
import {
	BASE,
	DEMO,
	TEAM,
	lastMailId,
	linkIn,
	signedInRequest,
	waitForMail,
	signedInPage
} from './helpers';

// The review journey of a sheet, end to end in Chromium with the real mail catcher: a designer
// saves Rev 1 and submits it; the checker gets the mail, opens its link, writes a note on a leg
// and returns the revision; the designer replies and fixes the leg; Rev 2 is compared with Rev 1;
// the checker checks and the owner approves; the memo exports download and decode; a measured
// trace uploads and shows on the chart; a malformed one is refused with its line numbers.

test.describe.configure({ mode: 'serial' });

async function waitSaved(page: Page) {
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved', {
		timeout: 20_000
	});
}

const title = `V-204 review journey ${Date.now().toString(36)}`;
let sheetId = '';

test('designer saves Rev 1, checker notes and returns it, designer fixes the leg, Rev 2 is compared, checked and approved, memo exports decode', async ({
	browser
}) => {
	test.setTimeout(180_000);
	// a fresh sheet from the V-204 worked example
	const api = await signedInRequest(DEMO.designer);
	const made = await api.post(`/api/v1/teams/${TEAM}/sheets`, {
		data: { example: 'vessel-v204-fire', title }
	});
	expect(made.status()).toBe(201);
	sheetId = ((await made.json()) as { sheet: { id: string } }).sheet.id;
	const sheetUrl = `/t/${TEAM}/sheets/${sheetId}`;

	// ---- the designer saves Rev 1 and submits it to the checker
	const designer = await signedInPage(browser, DEMO.designer);
	await designer.goto(sheetUrl);
	await expect(designer.getByTestId('sheet-title')).toHaveText(title);
	await designer.getByTestId('open-save-revision-header').click();
	const dialog = designer.getByTestId('save-revision-dialog');
	await dialog.getByLabel('What changed').fill('First issue: fire case to 250 °C');
	await dialog.getByTestId('save-revision').click();
	await expect(dialog).toBeHidden();
	await designer.getByRole('tab', { name: /History/ }).click();
	const history = designer.getByTestId('revision-history');
	await expect(history.getByTestId('revision-item')).toHaveCount(1);
	const checkerAfter = await lastMailId(DEMO.checker);
	await history.getByLabel('Ask').selectOption({ label: 'Priya Ramanathan' });
	await history.getByTestId('submit-revision').click();
	await expect(history.getByTestId('signoff-state')).toContainText(
		'Submitted by Tobias Lindqvist for Priya Ramanathan'
	);
	await expect(designer.getByTestId('sheet-header').locator('[data-status]')).toHaveAttribute(
		'data-status',
		'in-check'
	);

	// ---- the checker gets the mail, opens its link, writes a note on the leg and returns Rev 1
	const ask = await waitForMail(DEMO.checker, 'ready for your check', checkerAfter);
	expect(ask.subject).toBe(`Rev 1 of ${title} is ready for your check`);
	const link = linkIn(ask, `${BASE}/t/${TEAM}/sheets/${sheetId}/revisions/1`);
	const checker = await signedInPage(browser, DEMO.checker);
	await checker.goto(link);
	await expect(checker.getByTestId('revision-page')).toHaveAttribute('data-number', '1');
	await checker.locator('[data-chart="T-v"] path.swc-hit-leg').first().focus();
	await checker.keyboard.press('Enter');
	await expect(checker.getByTestId('note-anchor')).toHaveValue(/^leg:/);
	await checker.locator('#note-body').fill('@Tob');
	await checker.getByRole('option', { name: 'Tobias Lindqvist' }).click();
	await checker
		.locator('#note-body')
		.pressSequentially('S2 at 250 °C is far past the design temperature: end this leg at 120 °C.');
	const designerAfter = await lastMailId(DEMO.designer);
	await checker.getByRole('button', { name: 'Add note' }).click();
	const thread = checker.getByTestId('note-thread').first();
	await expect(thread.getByTestId('note-anchor-label')).toHaveText('L1');
	await expect(checker.getByTestId('note-marker')).toHaveCount(2); // on both diagrams
	await checker.getByRole('tab', { name: /Sign-off/ }).click();
	await checker.getByLabel('Note with this step').fill('See my note on L1.');
	await checker.getByTestId('return-revision').click();
	await expect(checker.getByTestId('signoff-state')).toContainText('Saved, not yet submitted');

	// ---- the designer follows the mention mail to the exact note, replies and fixes the leg
	const mention = await waitForMail(DEMO.designer, 'mentioned you', designerAfter);
	const noteLink = linkIn(mention, `${BASE}/t/${TEAM}/sheets/${sheetId}?note=`);
	const noteId = new URL(noteLink).searchParams.get('note')!;
	await designer.goto(noteLink);
	const focused = designer.locator(`#note-${noteId}`);
	await expect(focused).toBeVisible();
	await expect(focused).toContainText('far past the design temperature');
	await focused.getByLabel('Reply').fill('Agreed: the leg now ends at the design temperature.');
	await focused.getByRole('button', { name: 'Reply', exact: true }).click();
	await expect(focused.getByTestId('note-reply')).toHaveCount(1);
	const tCell = designer.locator('tr[data-label="S2"] [data-prop="T"]');
	await designer.getByRole('tab', { name: /States/ }).click();
	await tCell.fill('120 °C');
	await tCell.press('Enter');
	await expect(tCell).toHaveValue('120.00');
	await waitSaved(designer);
	await designer.getByTestId('open-save-revision-header').click();
	await dialog
		.getByLabel('What changed')
		.fill('L1 ends at the design temperature (120 °C), per the check of Rev 1');
	await dialog.getByTestId('save-revision').click();
	await expect(dialog).toBeHidden();
	await designer.getByRole('tab', { name: /History/ }).click();
	await expect(history.getByTestId('revision-item')).toHaveCount(2);
	await history.getByTestId('submit-revision').click();
	await expect(history.getByTestId('signoff-state')).toContainText('Submitted by Tobias Lindqvist');

	// ---- Rev 2 compared with Rev 1: the leg's target and the end state changed
	await checker.goto(`/t/${TEAM}/sheets/${sheetId}/revisions/2`);
	await checker.getByRole('link', { name: 'Compare with Rev 1' }).click();
	await expect(checker.getByTestId('compare-page')).toBeVisible();
	await expect(checker.getByTestId('diff-summary')).toContainText('1 leg changed');
	const legRow = checker
		.getByTestId('diff-legs')
		.locator('tr[data-status="changed"]')
		.filter({ hasText: 'target T' });
	await expect(legRow).toContainText('250.00');
	await expect(legRow).toContainText('120.00');
	await expect(legRow).toContainText('−130.00');
	await expect(checker.locator('[data-chart="T-v"] .swc-trace-line')).toHaveCount(1); // Rev 1 drawn over Rev 2

	// ---- the checker checks Rev 2, the owner approves it
	await checker.goto(`/t/${TEAM}/sheets/${sheetId}/revisions/2`);
	const resolved = checker
		.getByTestId('note-thread')
		.filter({ hasText: 'far past the design temperature' });
	await expect(resolved.getByTestId('note-reply')).toContainText('Agreed');
	await resolved.getByTestId('note-toggle').click();
	await checker.getByRole('button', { name: /Resolved/ }).click();
	await expect(
		checker.getByTestId('note-thread').filter({ hasText: 'far past the design temperature' })
	).toContainText('Priya Ramanathan resolved this thread');
	await checker.getByRole('tab', { name: /Sign-off/ }).click();
	await checker.getByTestId('check-revision').click();
	await expect(checker.getByTestId('signoff-state')).toContainText('Checked by Priya Ramanathan');
	const owner = await signedInPage(browser, DEMO.owner);
	await owner.goto(`/t/${TEAM}/sheets/${sheetId}/revisions/2`);
	await owner.getByRole('tab', { name: /Sign-off/ }).click();
	await owner.getByTestId('approve-revision').click();
	await expect(owner.getByTestId('signoff-state')).toContainText('Approved by Maren Okafor');
	await owner.reload();
	await expect(owner.getByTestId('revision-page').locator('[data-status]').first()).toHaveAttribute(
		'data-status',
		'approved'
	);

	// ---- memo exports: SVG parses and carries the title block; PNG is 2× and 4× the figure
	await owner.getByTestId('export-menu').locator('summary').click();
	const [svgDl] = await Promise.all([
		owner.waitForEvent('download'),
		owner.getByTestId('export-svg').click()
	]);
	expect(svgDl.suggestedFilename()).toMatch(/-rev2\.svg$/);
	const svgText = await readDownload(svgDl);
	const parsed = await owner.evaluate((text) => {
		const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
		const root = doc.documentElement;
		return {
			error: doc.querySelector('parsererror')?.textContent ?? null,
			name: root.nodeName,
			width: Number(root.getAttribute('width')),
			height: Number(root.getAttribute('height')),
			text: root.textContent ?? '',
			drawings: doc.querySelectorAll('.swm-drawing svg').length
		};
	}, svgText);
	expect(parsed.error).toBeNull();
	expect(parsed.name).toBe('svg');
	expect(parsed.drawings).toBe(2);
	for (const t of [
		title,
		'Rev 2',
		'Approved',
		'Water (H₂O)',
		'IAPWS-95',
		'Tobias Lindqvist',
		'Priya Ramanathan',
		'Maren Okafor',
		'BTW-CALC-0157',
		'V-204',
		'These are design-exploration results.'
	])
		expect(parsed.text, `title block has "${t}"`).toContain(t);
	expect(svgText).toContain('@font-face');
	for (const ratio of [2, 4] as const) {
		await owner.getByTestId('export-menu').locator('summary').click();
		const [pngDl] = await Promise.all([
			owner.waitForEvent('download'),
			owner.getByTestId(`export-png${ratio}`).click()
		]);
		const png = Buffer.from(await readDownload(pngDl, 'binary'), 'binary');
		expect(png.subarray(1, 4).toString('ascii')).toBe('PNG');
		expect(png.subarray(12, 16).toString('ascii')).toBe('IHDR');
		expect(png.readUInt32BE(16)).toBe(parsed.width * ratio);
		expect(png.readUInt32BE(20)).toBe(parsed.height * ratio);
	}

	// the print view: title block, both diagrams, the table and the notes summary on A4 (or Letter)
	await owner.goto(`/t/${TEAM}/sheets/${sheetId}/print?rev=2`);
	const print = owner.getByTestId('print-view');
	await expect(print).toHaveAttribute('data-paper', 'a4');
	await expect(print.getByRole('table', { name: 'Title block' })).toContainText('Approved');
	await expect(print.getByRole('table', { name: 'Title block' })).toContainText('Maren Okafor');
	await expect(print.locator('[data-chart]')).toHaveCount(2);
	await expect(print.getByTestId('path-table')).toContainText('S2');
	await expect(print.getByRole('region', { name: 'Review notes' })).toContainText(
		'0 open · 1 resolved'
	);
	await owner.getByRole('link', { name: 'Letter' }).click();
	await expect(owner.getByTestId('print-view')).toHaveAttribute('data-paper', 'letter');

	// editing the approved sheet starts a new draft based on Rev 2; Rev 2 stays approved
	await designer.goto(sheetUrl);
	const chip = designer.getByTestId('sheet-header').locator('[data-status]');
	await expect(chip).toHaveAttribute('data-status', 'approved');
	await expect(designer.getByTestId('draft-base')).toHaveText('Rev 2');
	const again = designer.locator('tr[data-label="S2"] [data-prop="T"]');
	await again.fill('115 °C');
	await again.press('Enter');
	await expect(designer.getByTestId('draft-base')).toHaveText('Rev 2 + edits');
	await expect(chip).toHaveAttribute('data-status', 'draft');
	await waitSaved(designer);
	const rev2 = (await (
		await api.get(`/api/v1/teams/${TEAM}/sheets/${sheetId}/revisions/2`)
	).json()) as {
		revision: { status: string; doc: { spec: { legs: Array<{ target: { T: number } }> } } };
	};
	expect(rev2.revision.status).toBe('approved');
	expect(rev2.revision.doc.spec.legs[0].target.T).toBeCloseTo(393.15, 6);
});

test('a measured trace uploads and shows on the chart; a malformed file is refused with its line numbers', async ({
	browser
}) => {
	expect(sheetId, 'runs after the journey').not.toBe('');
	const designer = await signedInPage(browser, DEMO.designer);
	await designer.goto(`/t/${TEAM}/sheets/${sheetId}`);
	await designer.getByRole('tab', { name: /Traces/ }).click();
	const panel = designer.getByTestId('trace-panel');
	await panel.getByLabel(/Logger file/).setInputFiles({
		name: 'v204-fire-test.csv',
		mimeType: 'text/csv',
		buffer: Buffer.from(
			'# V-204 fire test, logger 2\ntime [s],P [kPa g],T [°C]\n0,0,80\n600,40,100\n1200,110,118\n1800,160,125\n'
		)
	});
	await panel.getByLabel('Name on the chart').fill('Fire test 2026-01');
	await panel.getByRole('button', { name: 'Upload trace' }).click();
	await expect(panel.getByTestId('trace-item')).toHaveCount(1);
	await expect(panel.getByTestId('trace-item')).toContainText('4 points');
	const line = designer.locator('[data-chart="T-v"] .swc-trace-line');
	await expect(line).toHaveCount(1);
	expect((await line.getAttribute('d'))?.length ?? 0).toBeGreaterThan(10);

	await panel.getByLabel(/Logger file/).setInputFiles({
		name: 'broken.csv',
		mimeType: 'text/csv',
		buffer: Buffer.from('time [s],P [kPa g],T [°C]\n0,0,80\n60,abc,90\n120;40;100\n180,50,\n')
	});
	await panel.getByRole('button', { name: 'Upload trace' }).click();
	const refusal = designer.getByTestId('trace-refusal');
	await expect(refusal).toContainText('Nothing was saved');
	const lines = await refusal
		.getByTestId('trace-rejected')
		.locator('tbody tr td:first-child')
		.allTextContents();
	expect(lines.map(Number)).toEqual([3, 4, 5]);
	await expect(panel.getByTestId('trace-item')).toHaveCount(1);
});

async function readDownload(
	d: import('@playwright/test').Download,
	encoding: BufferEncoding = 'utf8'
): Promise<string> {
	const { readFile } = await import('node:fs/promises');
	return (await readFile((await d.path())!)).toString(encoding);
}

test('a save based on an old revision is refused with the conflict screen: compare, then save on top, nothing lost', async ({
	browser
}) => {
	const api = await signedInRequest(DEMO.designer);
	const made = await api.post(`/api/v1/teams/${TEAM}/sheets`, {
		data: { example: 'vessel-v204-fire', title: `V-204 conflict ${Date.now().toString(36)}` }
	});
	const sheet = (
		(await made.json()) as {
			sheet: { id: string; doc: { spec: { legs: Array<{ target: Record<string, number> }> } } };
		}
	).sheet;
	expect(
		(
			await api.post(`/api/v1/teams/${TEAM}/sheets/${sheet.id}/revisions`, {
				data: { message: 'First issue', baseRevision: null }
			})
		).status()
	).toBe(201);

	const designer = await signedInPage(browser, DEMO.designer);
	await designer.goto(`/t/${TEAM}/sheets/${sheet.id}`);
	await expect(designer.getByTestId('draft-base')).toHaveText('Rev 1');

	// meanwhile the owner saves Rev 2 from a document of their own
	const owner = await signedInRequest(DEMO.owner);
	const theirs = structuredClone(sheet.doc);
	theirs.spec.legs[0].target = { T: 443.15 };
	expect(
		(
			await owner.post(`/api/v1/teams/${TEAM}/sheets/${sheet.id}/revisions`, {
				data: { message: 'Owner: 170 °C per the burner data', baseRevision: 1, doc: theirs }
			})
		).status()
	).toBe(201);

	const tCell = designer.locator('tr[data-label="S2"] [data-prop="T"]');
	await tCell.fill('120 °C');
	await tCell.press('Enter');
	await expect(tCell).toHaveValue('120.00');
	await expect(designer.getByTestId('draft-base')).toHaveText('Rev 1 + edits');
	await waitSaved(designer);
	await designer.getByTestId('open-save-revision-header').click();
	await designer.getByLabel('What changed').fill('L1 ends at 120 °C');
	await designer.getByTestId('save-revision').click();
	const conflict = designer.getByTestId('revision-conflict');
	await expect(conflict).toContainText('Maren Okafor saved Rev 2');
	await expect(conflict).toContainText('Nothing was saved over it');
	// what the draft changes against their revision, leg by leg
	const row = conflict.getByTestId('diff-legs').locator('tr').filter({ hasText: 'target T' });
	await expect(row).toContainText('170.00');
	await expect(row).toContainText('120.00');
	// nothing lost: the draft still holds the edit, and the revisions are untouched
	await expect(tCell).toHaveValue('120.00');
	const before = (await (
		await api.get(`/api/v1/teams/${TEAM}/sheets/${sheet.id}/revisions`)
	).json()) as { revisions: unknown[] };
	expect(before.revisions).toHaveLength(2);
	await conflict.getByTestId('save-on-top').click();
	await expect(designer.getByTestId('save-revision-dialog')).toBeHidden();
	await expect(designer.getByTestId('draft-base')).toHaveText('Rev 3');
	const after = (await (
		await api.get(`/api/v1/teams/${TEAM}/sheets/${sheet.id}/revisions`)
	).json()) as { revisions: Array<{ number: number; basedOn: number; message: string }> };
	expect(after.revisions[0]).toMatchObject({ number: 3, basedOn: 2, message: 'L1 ends at 120 °C' });
});

test('each person can turn a kind of review mail off on the account page', async ({ browser }) => {
	const owner = await signedInPage(browser, DEMO.owner);
	await owner.goto('/account');
	const settings = owner.getByTestId('notification-settings');
	const mention = settings.getByLabel(/Someone mentions me/);
	await expect(mention).toBeChecked();
	await mention.uncheck();
	await settings.getByRole('button', { name: 'Save notification settings' }).click();
	await expect(settings.getByRole('status')).toHaveText('Saved.');
	await owner.reload();
	await expect(
		owner.getByTestId('notification-settings').getByLabel(/Someone mentions me/)
	).not.toBeChecked();

	// a note mentioning the owner and the designer: only the designer is mailed
	const api = await signedInRequest(DEMO.designer);
	const made = await api.post(`/api/v1/teams/${TEAM}/sheets`, {
		data: { example: 'vessel-v204-fire', title: `V-204 mail settings ${Date.now().toString(36)}` }
	});
	const sheet = ((await made.json()) as { sheet: { id: string } }).sheet;
	const ownerAfter = await lastMailId(DEMO.owner);
	const designerAfter = await lastMailId(DEMO.designer);
	const checker = await signedInRequest(DEMO.checker);
	const res = await checker.post(`/api/v1/teams/${TEAM}/sheets/${sheet.id}/notes`, {
		data: {
			anchor: { kind: 'sheet' },
			body: '@Maren Okafor and @Tobias Lindqvist: which design code governs V-204?'
		}
	});
	expect(res.status()).toBe(201);
	const note = ((await res.json()) as { note: { id: string; mentions: string[] } }).note;
	expect(note.mentions).toHaveLength(2);
	const mail = await waitForMail(DEMO.designer, 'mentioned you', designerAfter);
	expect(linkIn(mail, BASE)).toContain(`?note=${note.id}#note-${note.id}`);
	expect(await lastMailId(DEMO.owner)).toBe(ownerAfter);

	// back on, for the other journeys
	await owner
		.getByTestId('notification-settings')
		.getByLabel(/Someone mentions me/)
		.check();
	await owner
		.getByTestId('notification-settings')
		.getByRole('button', { name: 'Save notification settings' })
		.click();
	await expect(owner.getByTestId('notification-settings').getByRole('status')).toHaveText('Saved.');
});
