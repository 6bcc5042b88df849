import { expect, test, type Locator, type Page } from '@playwright/test';
import {
	createToken,
	DEMO,
	FORM,
	freshEmail,
	gotoQuiet,
	seededK101Id,
	signedInRequest,
	signInPage,
	TEAM,
	twoFrames
} from './helpers';

/*
 * A checker reads and comments on a phone: every signed-in page fits a 390 px wide screen in every
 * role (nothing wider than the screen, so nothing cut off), and the controls each role needs there
 * can be reached and pressed. Plus two screen details: a reader's Setup fields that cannot change
 * look unlike the ones that can, and "Draw on chart" does not move the charts.
 */

const PHONE = { width: 390, height: 844 };

interface Sheet {
	id: string;
	title: string;
	status: string;
}

async function sheets(page: Page): Promise<Record<string, Sheet>> {
	const res = await page.request.get(`/api/v1/teams/${TEAM}/sheets`);
	expect(res.status()).toBe(200);
	const { sheets } = (await res.json()) as { sheets: Sheet[] };
	return Object.fromEntries(sheets.map((s) => [s.title.split(' ')[0], s]));
}

/** After gotoQuiet, or after a click that fetches nothing: nothing wider than the screen. */
async function fits(page: Page, where: string) {
	await twoFrames(page);
	const width = await page.evaluate(() => document.scrollingElement!.scrollWidth);
	expect(width, `${where}: page width at a 390 px screen`).toBeLessThanOrEqual(PHONE.width);
}

/**
 * Reachable and pressable: scrolled into view (inside its scroll box if any), shown, enabled, on
 * screen from edge to edge, and the element a tap at its middle lands on (nothing covers it). One
 * look in the page instead of Playwright's actionability waits, which cost a few frames each and
 * made this the slowest journey file.
 */
async function pressable(control: Locator, what: string) {
	const seen = await control.evaluate((el) => {
		// to the middle of its scroll box, as a reader would scroll it, clear of the sticky header
		el.scrollIntoView({ block: 'center', inline: 'nearest' });
		const b = el.getBoundingClientRect();
		const style = getComputedStyle(el);
		const hit = document.elementFromPoint(b.x + b.width / 2, b.y + b.height / 2);
		return {
			shown: b.width > 0 && b.height > 0 && style.visibility !== 'hidden',
			enabled: !(el as HTMLButtonElement).disabled,
			top: b.y,
			bottom: b.y + b.height,
			left: b.x,
			right: b.x + b.width,
			hit: hit
				? hit === el || el.contains(hit)
					? 'itself'
					: hit.outerHTML.slice(0, 120)
				: 'nothing'
		};
	});
	expect(seen.shown, `${what}: shown`).toBe(true);
	expect(seen.enabled, `${what}: enabled`).toBe(true);
	expect(seen.hit, `${what}: what a tap at its middle lands on`).toBe('itself');
	expect(seen.top, `${what}: top edge on screen`).toBeGreaterThanOrEqual(-0.5);
	expect(seen.bottom, `${what}: bottom edge on screen`).toBeLessThanOrEqual(PHONE.height + 0.5);
	expect(seen.left, `${what}: left edge on screen`).toBeGreaterThanOrEqual(-0.5);
	expect(seen.right, `${what}: right edge on screen`).toBeLessThanOrEqual(PHONE.width + 0.5);
}

const signOut = (page: Page) => page.getByRole('banner').getByRole('button', { name: 'Sign out' });

test.describe('on a 390 px phone', () => {
	test.use({ viewport: PHONE });

	// the settings page as a team in use has it: a pending invitation and an API token with long names
	test.beforeAll(async () => {
		const owner = await signedInRequest(DEMO.owner);
		const invite = await owner.post(`/t/${TEAM}/settings?/invite`, {
			form: { email: freshEmail('a-rather-long-colleague-address-for-the-phone'), role: 'checker' },
			headers: FORM
		});
		expect(invite.status(), 'invitation sent').toBe(200);
		await createToken(owner, TEAM, 'nightly memo export for the plant historian', 'viewer');
		await owner.dispose();
	});

	for (const role of ['owner', 'designer', 'checker', 'viewer'] as const) {
		test(`every signed-in page fits, as ${role}`, async ({ page }) => {
			await signInPage(page, DEMO[role]);
			const s = await sheets(page);
			const approved = { id: await seededK101Id(page.request) };
			const draft = s['V-204'];
			const inCheck = s['HP-410'];
			const pages: [string, string][] = [
				['home', '/'],
				['team', `/t/${TEAM}`],
				['settings', `/t/${TEAM}/settings`],
				['sheet in check', `/t/${TEAM}/sheets/${inCheck.id}`],
				['draft sheet', `/t/${TEAM}/sheets/${draft.id}`],
				['revision', `/t/${TEAM}/sheets/${approved.id}/revisions/1`],
				['compare', `/t/${TEAM}/sheets/${approved.id}/compare`],
				['print', `/t/${TEAM}/sheets/${approved.id}/print`],
				['account', '/account']
			];
			for (const [name, url] of pages) {
				await gotoQuiet(page, url);
				await fits(page, `${role}: ${name}`);
				if (name !== 'print') await pressable(signOut(page), `${role}: ${name}: Sign out`);
				await pressable(page.getByTestId('header-account'), `${role}: ${name}: account`);
			}

			// the sheet: the state table's s and x columns, and the Setup tab
			await gotoQuiet(page, `/t/${TEAM}/sheets/${draft.id}`);
			await fits(page, `${role}: sheet`);
			for (const col of ['s', 'x'])
				await pressable(
					page.locator(`[data-testid="state-table"] th[data-col="${col}"]`),
					`${role}: state table column ${col}`
				);
			const setup = page.getByRole('tab', { name: /Setup/ });
			await pressable(setup, `${role}: Setup tab`);
			await setup.click();
			await expect(page.getByTestId('sheet-setup')).toBeVisible();
			await pressable(page.locator('#setup-system-units'), `${role}: units`);
			await fits(page, `${role}: sheet, Setup tab`);
			if (role === 'owner' || role === 'designer') {
				await pressable(page.getByTestId('open-save-revision-header'), `${role}: Save revision…`);
				await pressable(page.locator('#setup-fluid'), `${role}: fluid`);
			}

			// team settings: owners change roles there
			if (role === 'owner') {
				await page.goto(`/t/${TEAM}/settings`);
				const row = page.locator(`tr[data-member="${DEMO.checker}"]`);
				await pressable(row.getByLabel(/^Role of/), 'owner: role of the checker');
				await pressable(row.getByRole('button', { name: 'Set' }), 'owner: Set role');
				await pressable(row.getByRole('button', { name: /Remove/ }), 'owner: Remove member');
				await pressable(
					page.getByTestId('invites').getByRole('button', { name: 'Withdraw' }).first(),
					'owner: Withdraw an invitation'
				);
				await pressable(
					page.getByTestId('tokens').getByRole('button', { name: 'Revoke' }).first(),
					'owner: Revoke a token'
				);
			}
		});
	}

	test('a checker comments on a leg from the phone', async ({ page }) => {
		await signInPage(page, DEMO.checker);
		const s = await sheets(page);
		await gotoQuiet(page, `/t/${TEAM}/sheets/${s['HP-410'].id}`);
		const notes = page.getByRole('tab', { name: /Notes/ });
		await pressable(notes, 'Notes tab');
		await notes.click();
		const write = page.getByRole('tabpanel').getByRole('textbox').first();
		await pressable(write, 'note box');
		await fits(page, 'notes tab');
	});
});

test.describe('sheet screen details', () => {
	test('a viewer’s Setup: fields that cannot change look unlike the two that can', async ({
		page
	}) => {
		await signInPage(page, DEMO.viewer);
		const s = await sheets(page);
		await page.goto(`/t/${TEAM}/sheets/${s['V-204'].id}`);
		await page.getByRole('tab', { name: /Setup/ }).click();
		const fluid = page.locator('#setup-fluid');
		const units = page.locator('#setup-system-units');
		await expect(fluid).toBeDisabled();
		await expect(units).toBeEnabled();
		const look = (l: Locator) =>
			l.evaluate((e) => ({
				border: getComputedStyle(e).borderTopStyle,
				background: getComputedStyle(e).backgroundColor
			}));
		const [fixed, live] = [await look(fluid), await look(units)];
		expect(fixed.border).toBe('dashed');
		expect(live.border).toBe('solid');
		expect(fixed.background).not.toBe(live.background);
	});

	test('“Draw on chart” at 1440 px does not move the charts', async ({ page }) => {
		await page.setViewportSize({ width: 1440, height: 900 });
		await signInPage(page, DEMO.designer);
		const s = await sheets(page);
		await page.goto(`/t/${TEAM}/sheets/${s['V-204'].id}`);
		const chart = page.locator('svg.swc-drawing').first();
		await expect(chart).toBeVisible();
		const before = (await chart.boundingBox())!.y;
		await page.getByTestId('add-leg').click();
		await expect(page.getByTestId('add-leg')).toHaveAttribute('aria-pressed', 'true');
		await expect(page.locator('#add-help')).toContainText('Esc cancels');
		expect((await chart.boundingBox())!.y).toBeCloseTo(before, 0);
		await page.keyboard.press('Escape');
	});

	for (const width of [1440, 390]) {
		test(`nothing is cut short at ${width} px: Setup selects, header fields, heat and work, a cell's message`, async ({
			page
		}) => {
			await page.setViewportSize({ width, height: 900 });
			await signInPage(page, DEMO.designer);
			const s = await sheets(page);
			await page.goto(`/t/${TEAM}/sheets/${s['HP-410'].id}`);

			// the sheet header's fields show their whole text
			for (const dd of await page.locator('[data-testid="sheet-header"] dd').all()) {
				const clipped = await dd.evaluate((e) => e.scrollWidth > e.clientWidth + 1);
				expect(clipped, `header field "${await dd.innerText()}"`).toBe(false);
			}

			// heat and work go together: in every pair both values sit on one line
			const pairs = page.locator('[data-testid="state-table"] .pair');
			expect(await pairs.count()).toBeGreaterThan(0);
			for (const pair of await pairs.all()) {
				const tops = await pair.evaluate((e) =>
					[...e.children].map((c) => Math.round(c.getBoundingClientRect().top))
				);
				expect(new Set(tops).size, `pair ${await pair.innerText()}`).toBe(1);
			}

			// a cell's error message is shown whole, inside the table, even under the left-most column
			const t = page.locator('tr[data-label="S1"] [data-prop="T"]');
			await t.fill('-300 °C');
			await t.press('Enter');
			const alert = page.locator('[data-testid="state-table"] .cell-error');
			await expect(alert).toContainText('absolute zero');
			const [a, wrap] = [
				(await alert.boundingBox())!,
				(await page.getByTestId('state-table').boundingBox())!
			];
			expect(a.x).toBeGreaterThanOrEqual(wrap.x - 0.5);
			expect(a.x + a.width).toBeLessThanOrEqual(Math.min(wrap.x + wrap.width, width) + 0.5);
			await t.press('Escape');

			// Setup: the fluid's whole name and formulation fit in its select
			await page.getByRole('tab', { name: /Setup/ }).click();
			for (const id of ['#setup-fluid', '#setup-basis']) {
				const fit = await page.locator(id).evaluate((el) => {
					const sel = el as HTMLSelectElement;
					const cs = getComputedStyle(sel);
					const ctx = document.createElement('canvas').getContext('2d')!;
					ctx.font = `${cs.fontWeight} ${cs.fontSize} ${cs.fontFamily}`;
					const text = sel.options[sel.selectedIndex].text;
					const room = sel.clientWidth - parseFloat(cs.paddingLeft) - parseFloat(cs.paddingRight);
					return { text, need: ctx.measureText(text).width, room };
				});
				expect(fit.need, `"${fit.text}" in ${id}`).toBeLessThanOrEqual(fit.room);
			}
		});
	}
});
