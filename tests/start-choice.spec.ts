import { expect, test } from '@playwright/test';
import { DEMO, TEAM, signInPage } from './helpers';

// python3-iapws 1.5 (Debian), IAPWS95: h of liquid water at 275 K, 1 MPa. (T, h) there also meets
// a liquid–vapor mixture near 700 Pa (issue 11 audit), so S1 typed by T and h is ambiguous.
const H_275_KJ = '8.768151501519118';

test('an ambiguous (T, h) start in cold water offers its states; picking the everyday liquid gives it', async ({
	page
}) => {
	// several edits, each computed and saved: generous on a shared machine
	test.setTimeout(240_000);
	await signInPage(page, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByLabel('Title').fill(`Cold feed ${Date.now().toString(36)}`);
	await page.getByLabel('Sized by').selectOption('perkg');
	await page.locator('#f-valueA').fill('1.85 °C');
	await page.locator('#f-valueB').fill('0.5');
	await page.getByRole('button', { name: 'Create sheet' }).click();
	await expect(page.getByTestId('phase-S1')).toContainText('saturated mixture');

	// S1 is fixed by T and x: typing T again keeps T and x, then h replaces x
	const t = page.locator('tr[data-label="S1"] [data-prop="T"]');
	await t.fill('1.85 °C');
	await t.press('Enter');
	const h = page.locator('tr[data-label="S1"] [data-prop="h"]');
	await h.fill(`${H_275_KJ} kJ/kg`);
	await h.press('Enter');

	const choice = page.getByTestId('start-choice');
	await expect(choice).toBeVisible();
	await expect(choice).toContainText('fit 2 states of S1');
	const candidates = choice.getByTestId('start-candidate');
	await expect(candidates).toHaveCount(2);
	await expect(choice.locator('[data-phase="saturated-mixture"]')).toContainText('1.85');
	const liquid = choice.locator('[data-phase="compressed-liquid"]');
	await expect(liquid).toContainText('compressed liquid');
	// the sheet is unchanged until a state is picked
	await expect(page.getByTestId('phase-S1')).toContainText('saturated mixture');

	await liquid.click();
	await expect(choice).toHaveCount(0);
	await expect(page.getByTestId('phase-S1')).toContainText('compressed liquid');
	// the everyday liquid: 1 MPa (the pressure cell in the sheet's kPa)
	const p = page.locator('tr[data-label="S1"] [data-prop="P"]');
	await expect(async () => {
		const kPa = Number((await p.inputValue()).replace(/[^\d.eE+-].*$/, ''));
		expect(Math.abs(kPa / 1000 - 1)).toBeLessThan(1e-3);
	}).toPass();
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved');

	// the choice is kept with the document, so a reload solves to the same state
	const id = page.url().split('/').pop()!;
	const res = await page.request.get(`/api/v1/teams/${TEAM}/sheets/${id}`);
	const { sheet } = (await res.json()) as {
		sheet: {
			doc: { spec: { start: Record<string, number>; startNear?: { T: number; P: number } } };
		};
	};
	expect(Object.keys(sheet.doc.spec.start).sort()).toEqual(['T', 'h']);
	expect(Math.abs(sheet.doc.spec.startNear!.P / 1e6 - 1)).toBeLessThan(1e-3);
	await page.reload();
	await expect(page.getByTestId('phase-S1')).toContainText('compressed liquid');
});

test('the sheet window is set under Setup and kept', async ({ page }) => {
	await signInPage(page, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByLabel('Title').fill(`Window ${Date.now().toString(36)}`);
	await page.getByLabel('Sized by').selectOption('perkg');
	await page.locator('#f-valueA').fill('20 °C');
	await page.locator('#f-valueB').fill('0.5');
	await page.getByRole('button', { name: 'Create sheet' }).click();
	await expect(page.getByTestId('phase-S1')).toContainText('saturated mixture');
	await page.getByRole('tab', { name: /Setup/ }).click();
	const win = page.getByTestId('setup-window');
	const lowest = win.getByLabel('Lowest pressure');
	await lowest.fill('1 kPa a');
	await lowest.press('Enter');
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved');
	const id = page.url().split('/').pop()!;
	await expect(async () => {
		const res = await page.request.get(`/api/v1/teams/${TEAM}/sheets/${id}`);
		const { sheet } = (await res.json()) as { sheet: { doc: { spec: { window?: unknown } } } };
		expect(sheet.doc.spec.window).toEqual({ Pmin: 1000 });
	}).toPass();
});
