import { expect, test } from '@playwright/test';
import { DEMO, TEAM, signInPage } from './helpers';

test.describe('new sheet form', () => {
	test('a directly loaded new-sheet page keeps the title when the pressure unit changes, and creates the sheet', async ({ page }) => {
		await signInPage(page, DEMO.designer);
		await page.goto(`/t/${TEAM}/sheets/new`);
		const title = page.getByLabel('Title');
		await title.fill('Direct-load kettle');
		await page.getByLabel('Sized by').selectOption('perkg');
		await page.getByLabel('Value one, with its unit').fill('120 °C');
		await page.getByLabel('Value two, with its unit').fill('0.5');
		await page.getByLabel('Pressure unit').selectOption('bar');
		await expect(title).toHaveValue('Direct-load kettle');
		await page.getByLabel('Show pressures').selectOption('gauge');
		await page.getByLabel('System', { exact: true }).selectOption('si');
		await expect(title).toHaveValue('Direct-load kettle');
		await page.getByRole('button', { name: 'Create sheet' }).click();
		await expect(page).toHaveURL(/\/sheets\/[a-z2-9]{16}$/);
	});
});

test('a closed cycle shows its last state beside its first on both charts, not over it', async ({ page }) => {
	await signInPage(page, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByRole('button', { name: /Start a sheet from HP-410/ }).click();
	await expect(page.getByTestId('sheet-title')).toHaveText('HP-410 R-134a heat-pump loop');
	for (const kind of ['T-v', 'P-v']) {
		const discs = page.locator(`[data-chart="${kind}"] g.swc-state`);
		await expect(discs.filter({ hasText: /^S5$/ })).toHaveCount(1);
		const box = async (label: string) => (await discs.filter({ hasText: new RegExp(`^${label}$`) }).locator('circle.swc-state-disc').boundingBox())!;
		const [s1, s5] = [await box('S1'), await box('S5')];
		// side by side: the discs do not overlap, and they sit at the same height
		const apart = Math.abs(s1.x - s5.x) >= s1.width - 1 || Math.abs(s1.y - s5.y) >= s1.height - 1;
		expect(apart, `${kind}: S1 at ${s1.x},${s1.y}, S5 at ${s5.x},${s5.y}`).toBe(true);
		expect(Math.abs(s1.y - s5.y)).toBeLessThan(1);
	}
});
