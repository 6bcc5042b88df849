import { expect, test } from '@playwright/test';
import { BASE, DEMO, signInPage, TEAM } from './helpers';

/*
 * The sheet page's HTML carries the sheet, not every point of its path: the legs' points come
 * from an immutable per-draft URL the page preloads, and the chart draws the legs once they are
 * there. A reader without scripts still gets the state table from the HTML.
 */

/**
 * A sheet of its own made from the kettle example (a path with several legs): the demo's first
 * listed sheet may be one another journey in this worker has just made or emptied.
 */
async function kettleSheet(page: import('@playwright/test').Page): Promise<string> {
	const made = await page.request.post(`/api/v1/teams/${TEAM}/sheets`, {
		headers: { origin: BASE },
		data: { example: 'kettle-k101', title: `K-101 first paint ${Date.now().toString(36)}` }
	});
	expect(made.status(), await made.text()).toBe(201);
	const { sheet } = (await made.json()) as { sheet: { id: string } };
	return `/t/${TEAM}/sheets/${sheet.id}`;
}

test.describe('the sheet page', () => {
	test('leaves the legs’ points out of the HTML, preloads their URL, and draws the legs from it', async ({
		page
	}) => {
		await signInPage(page, DEMO.designer);
		const path = await kettleSheet(page);
		const html = await (await page.request.get(path)).text();
		const url = html.match(/href="([^"]*\/draft\/points\/[\w-]{16})"/)?.[1];
		expect(url, 'a preload of the legs’ points').toBeTruthy();
		const pointsUrl = new URL(url!, `${BASE}${path}`).pathname;
		// full states (with cp, w, …) appear only for the path's states and crossings, not every point
		const pointsRes = await page.request.get(pointsUrl);
		expect(pointsRes.status()).toBe(200);
		expect(pointsRes.headers()['cache-control']).toBe('private, max-age=31536000, immutable');
		const { points } = (await pointsRes.json()) as { points: Array<Array<{ T: number }>> };
		expect(points.length).toBeGreaterThan(0);
		const totalPoints = points.reduce((n, p) => n + p.length, 0);
		expect(totalPoints).toBeGreaterThan(20);
		expect((html.match(/gammaS/g) ?? []).length).toBeLessThan(totalPoints);

		const fetched = page.waitForResponse((r) => r.url().includes('/draft/points/'));
		await page.goto(path);
		expect((await fetched).status()).toBe(200);
		const legs = page.locator('[data-chart] svg.swc-drawing g.swc-leg path.swc-leg-line');
		await expect(legs.first()).toHaveAttribute('d', /^M[\d.-]+,[\d.-]+(L[\d.-]+,[\d.-]+){10,}/);
		expect(await legs.count()).toBeGreaterThanOrEqual(points.length);
	});

	test('without scripts the state table is there, from the HTML alone', async ({ browser }) => {
		const withJs = await browser.newPage();
		await signInPage(withJs, DEMO.designer);
		const path = await kettleSheet(withJs);
		const cookies = await withJs.context().cookies(BASE);
		await withJs.close();
		const ctx = await browser.newContext({ javaScriptEnabled: false });
		await ctx.addCookies(cookies);
		const page = await ctx.newPage();
		await page.goto(path);
		await expect(page.locator('tr[data-label="S1"]')).toBeVisible();
		await expect(page.locator('tr[data-label="S2"] [data-prop="T"]')).not.toBeEmpty();
		await ctx.close();
	});
});
