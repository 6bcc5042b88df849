import { expect, test, type Page } from '@playwright/test';
import { DEMO, TEAM, signInPage } from './helpers';

/** Press the Transport toggle until it reads `on` (a press before the page has hydrated does nothing). */
async function setTransport(page: Page, on: boolean): Promise<void> {
	const toggle = page.getByTestId('toggle-transport');
	await expect(async () => {
		if ((await toggle.getAttribute('aria-pressed')) !== String(on)) await toggle.click();
		await expect(toggle).toHaveAttribute('aria-pressed', String(on), { timeout: 2000 });
	}).toPass({ timeout: 30_000 });
}

test('the state table shows the Transport columns on request, with each value’s source, and remembers the choice', async ({
	page
}) => {
	// a sign-in, a new sheet, a reload: slow on a loaded machine
	test.setTimeout(180_000);
	await signInPage(page, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByRole('button', { name: /Start a sheet from K-101/ }).click();
	await expect(page.getByTestId('sheet-title')).toHaveText(/K-101/);
	const table = page.getByTestId('state-table');
	await expect(table.locator('tr.state-row')).toHaveCount(3);
	await expect(table.locator('th[data-col="mu"]')).toHaveCount(0);

	const toggle = page.getByTestId('toggle-transport');
	await expect(toggle).toHaveAttribute('aria-pressed', 'false');
	await setTransport(page, true);
	await expect(table.locator('th[data-col="mu"]')).toContainText('μPa·s');
	await expect(table.locator('th[data-col="sigma"]')).toContainText('mN/m');

	// S2: saturated liquid at 5 bar g (601.325 kPa a). python3-iapws 1.5.2 (Debian),
	// IAPWS95(P=0.601325, x=0): mu 171.675 μPa·s, sigma 46.826 mN/m
	const s2 = table.locator('tr.state-row[data-label="S2"]');
	const mu = s2.locator('td[data-col="mu"]');
	await expect(mu).toHaveText(/^171\.6\d$/);
	await expect(mu).toHaveAttribute('data-source', /IAPWS R12-08/);
	await expect(s2.locator('td[data-col="sigma"]')).toHaveText(/^46\.8\d\d$/);
	// S3 is a flashing mixture after the trap: σ, but no single μ, with the reason in its tooltip
	const s3mu = table.locator('tr.state-row[data-label="S3"] td[data-col="mu"]');
	await expect(s3mu).toHaveText('—');
	await expect(s3mu).toHaveAttribute('title', /two-phase mixture has no single viscosity/);
	await expect(page.getByTestId('transport-sources')).toContainText('IAPWS R1-76(2014)');

	// kept over a reload
	await page.reload();
	await expect(page.getByTestId('toggle-transport')).toHaveAttribute('aria-pressed', 'true');
	await expect(
		page.locator('[data-testid="state-table"] tr.state-row[data-label="S2"] td[data-col="mu"]')
	).toHaveText(/^171\.6\d$/);
	await setTransport(page, false);
	await expect(page.locator('[data-testid="state-table"] th[data-col="mu"]')).toHaveCount(0);
});
