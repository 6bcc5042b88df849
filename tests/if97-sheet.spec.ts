import { expect, test, type Download, type Page } from '@playwright/test';
import { DEMO, TEAM, signInPage } from './helpers';

// A water sheet switched to IAPWS-IF97 in Setup: its states are IF97's (a value the scientific
// formulation gives differently), the table, the exports and the title block name the formulation,
// the difference toggle shows IF97 − IAPWS-95 under each state, and the charts draw IF97's own dome
// and background lines.

async function readDownload(d: Download): Promise<string> {
	const { readFile } = await import('node:fs/promises');
	return (await readFile((await d.path())!)).toString('utf8');
}

/** A state cell's number: an input's value where the designer may type, else the cell's text. */
async function cellValue(page: Page, label: string, prop: string): Promise<string> {
	const cell = page.locator(
		`[data-testid="state-table"] tr[data-label="${label}"] [data-prop="${prop}"]`
	);
	if ((await cell.count()) === 0) return '';
	const tag = await cell.first().evaluate((el) => el.tagName);
	return tag === 'INPUT'
		? await cell.first().inputValue()
		: ((await cell.first().textContent()) ?? '');
}

async function exported(page: Page, testId: string): Promise<Download> {
	await page.getByTestId('export-menu').locator('summary').click();
	const [dl] = await Promise.all([page.waitForEvent('download'), page.getByTestId(testId).click()]);
	return dl;
}

test('a water sheet by IAPWS-IF97: IF97 values, the formulation named, the difference shown', async ({
	page
}) => {
	// a sign-in, a new sheet, a recompute: slow on a loaded machine
	test.setTimeout(180_000);
	await signInPage(page, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByRole('button', { name: /Start a sheet from K-101/ }).click();
	await expect(page.getByTestId('sheet-title')).toHaveText(/K-101/);
	const table = page.getByTestId('state-table');
	await expect(table.locator('tr.state-row')).toHaveCount(3);
	await expect(page.getByTestId('table-formulation')).toHaveText('Water by IAPWS-95');
	const s1T = () => cellValue(page, 'S1', 'T');
	const s2h = () => cellValue(page, 'S2', 'h');
	// IAPWS-95: python3-iapws 1.5.2 (Debian), IAPWS95(P=0.601325, x=1).T = 432.0627 K (158.9127 °C);
	// IAPWS95(P=0.601325, x=0).h = 670.7515 kJ/kg
	await expect.poll(s1T).toBe('158.91');
	await expect.poll(s2h).toBe('670.75');
	await expect(page.getByTestId('toggle-difference')).toHaveCount(0);
	// the charts draw the fluid's own dome (IAPWS-95): their description names no other
	const chartDesc = page.locator('.process-chart desc').first();
	await expect(chartDesc).toContainText('Critical point');
	await expect(chartDesc).not.toContainText('IAPWS-IF97');

	await page.getByRole('tab', { name: /Setup/ }).click();
	const select = page.getByTestId('setup-formulation');
	await expect(select).toHaveValue('iapws95');
	// once switched, the editor asks for the background lines by IF97 too
	const if97Lines = page.waitForResponse(
		(r) => r.url().includes('/isolines?') && r.url().includes('formulation=if97')
	);
	await expect(async () => {
		await select.selectOption('if97');
		await expect(select).toHaveValue('if97', { timeout: 2000 });
	}).toPass({ timeout: 30_000 });
	await page.getByRole('tab', { name: /States & legs/ }).click();

	// IAPWS-IF97: python3-iapws 1.5.2 (Debian), IAPWS97(P=0.601325, x=1).T = 432.0687 K
	// (158.9187 °C); IAPWS97(P=0.601325, x=0).h = 670.8758 kJ/kg
	await expect(page.getByTestId('table-formulation')).toHaveText('Water by IAPWS-IF97');
	await expect.poll(s1T).toBe('158.92');
	await expect.poll(s2h).toBe('670.88');
	// and now IF97's dome, which stops at 643.15 K and says so (src/lib/thermo/if97/dome.ts)
	await expect(chartDesc).toContainText('Vapor dome by IAPWS-IF97 from 273.15 K up to 643.15 K');
	expect((await if97Lines).status()).toBe(200);

	// the difference: IF97 − IAPWS-95 of S2's h, python3-iapws 1.5.2: 670.8758 − 670.7515 = +0.124 kJ/kg
	const toggle = page.getByTestId('toggle-difference');
	await expect(async () => {
		if ((await toggle.getAttribute('aria-pressed')) !== 'true') await toggle.click();
		await expect(toggle).toHaveAttribute('aria-pressed', 'true', { timeout: 2000 });
	}).toPass({ timeout: 30_000 });
	const d2 = page.getByTestId('difference-S2');
	await expect(d2.locator('td[data-col="h"]')).toHaveText(/^\+0\.12\d\s?kJ\/kg$/);
	await expect(d2.locator('td[data-col="T"]')).toContainText('K');
	await toggle.click();
	await expect(page.getByTestId('difference-S2')).toHaveCount(0);

	// the exports name it: CSV and Markdown caption and table note, the SVG title block
	const csv = await readDownload(await exported(page, 'export-csv'));
	expect(csv).toContain('IAPWS-IF97');
	expect(csv).toContain('670.88');
	const md = await readDownload(await exported(page, 'export-md'));
	expect(md).toContain('IAPWS-IF97');
	const svg = await readDownload(await exported(page, 'export-svg'));
	expect(svg).toContain('IAPWS-IF97');

	// kept with the sheet: once saved, a reload shows IF97 still
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved');
	await page.reload();
	await expect(page.getByTestId('table-formulation')).toHaveText('Water by IAPWS-IF97');
	await expect.poll(s2h).toBe('670.88');

	// the print view of the draft: the title block's formulation and the table's
	await page.goto(`${new URL(page.url()).pathname}/print?rev=draft`);
	await expect(page.locator('body')).toContainText('IAPWS-IF97 — IAPWS R7-97(2012)');
	await expect(page.getByTestId('path-table-formulation')).toContainText('IAPWS-IF97');
	// its charts are framed on the server with IF97's dome
	await expect(page.locator('.process-chart desc').first()).toContainText(
		'Vapor dome by IAPWS-IF97'
	);
});
