import { expect, test, type Locator, type Page, type Request } from '@playwright/test';
import { DEMO, nextDraftSave, seededK101Id, signInPage, signedInRequest, TEAM } from './helpers';
import { readFileSync } from 'node:fs';

// python3-iapws 1.5.2 (Debian), IAPWS95, direct calls: tests/reference/make-iapws-sketcher.py
const reference = JSON.parse(readFileSync('tests/reference/iapws-sketcher.json', 'utf8')) as {
	isochore: {
		v: number;
		points: { T: number; P: number; x: number | null }[];
		saturatedVapor: { T: number; P: number };
	};
	vesselV204: { at523_15: { T: number; P: number } };
};

/*
 * The sketcher in the browser: a designer creates a water sheet, draws an isochoric heating leg
 * from a wet state on the T–v chart, drags its end across the saturated-vapor line, types an
 * exact target, undoes, reloads; a checker reads but cannot drag; search; worked examples;
 * autosave conflicts between two windows; offline edits kept and saved when back online.
 */

const stamp = () => `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 5)}`;

/** Pixel mapping of a chart's T axis (from its tick labels) and the state discs' positions. */
async function chartGeometry(page: Page, kind: 'T-v' | 'P-v') {
	const chart = page.locator(`[data-chart="${kind}"]`);
	const drawing = chart.locator('svg.swc-drawing');
	const box = (await drawing.boundingBox())!;
	const ticks = await drawing.locator('text.yl').evaluateAll((els) =>
		els
			.map((e) => ({
				value: Number((e.textContent ?? '').replace('−', '-')),
				y: Number(e.getAttribute('y'))
			}))
			.filter((t) => Number.isFinite(t.value))
	);
	expect(ticks.length).toBeGreaterThan(1);
	const [a, b] = [ticks[0], ticks[ticks.length - 1]];
	const slope = (b.y - a.y) / (b.value - a.value);
	const states = await chart.locator('circle.swc-hit-state').evaluateAll((els) =>
		els.map((e) => ({
			x: Number(e.getAttribute('cx')),
			y: Number(e.getAttribute('cy')),
			label: e.getAttribute('aria-label') ?? ''
		}))
	);
	return {
		/** page y of a temperature (°C on an SI sheet) */
		yOf: (value: number) => box.y + a.y + (value - a.value) * slope,
		state: (i: number) => ({
			x: box.x + states[i].x,
			y: box.y + states[i].y,
			label: states[i].label
		}),
		count: states.length
	};
}

function cell(page: Page, state: string, prop: string): Locator {
	return page.locator(`tr[data-label="${state}"] [data-prop="${prop}"]`);
}

/** A cell's shown value, once it shows one (right after a drag the input is refilled when the server's answer arrives). */
async function cellText(page: Page, state: string, prop: string): Promise<string> {
	const c = cell(page, state, prop);
	let text = '';
	await expect
		.poll(
			async () => {
				const tag = await c.evaluate((e) => e.tagName);
				text = tag === 'INPUT' ? await c.inputValue() : ((await c.textContent()) ?? '').trim();
				return text;
			},
			{ message: `${state} ${prop} shows a value` }
		)
		.not.toBe('');
	return text;
}

const num = (t: string) => Number(t.replace('−', '-').replace(/\s.*$/, ''));

async function waitSaved(page: Page) {
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved', {
		timeout: 20_000
	});
}

async function newBlankWaterSheet(page: Page, title: string) {
	await page.goto(`/t/${TEAM}`);
	await page.getByTestId('new-sheet').click();
	await expect(page.getByRole('heading', { name: 'New sheet', level: 1 })).toBeVisible();
	await page.getByLabel('Title').fill(title);
	await page.getByLabel('Sized by').selectOption('volume');
	await page.getByLabel('Volume').fill('0.5 m³');
	await page.locator('#f-propA').selectOption('T');
	await page.locator('#f-valueA').fill('100 °C');
	await page.locator('#f-propB').selectOption('v');
	await page.locator('#f-valueB').fill('0.5 m3/kg');
	await page.getByRole('button', { name: 'Create sheet' }).click();
	await expect(page.getByTestId('sheet-title')).toHaveText(title);
	await expect(page.getByTestId('phase-S1')).toContainText('saturated mixture');
}

test.describe('the sketcher', () => {
	test('designer: draw an isochoric leg from a wet state, drag it across the saturated-vapor line, type, undo, reload', async ({
		page
	}) => {
		await signInPage(page, DEMO.designer);
		const title = `Isochoric heating ${stamp()}`;
		await newBlankWaterSheet(page, title);
		const sheetUrl = page.url();
		const sheetId = sheetUrl.split('/').pop()!;

		// a leg: isochoric, clicked at about 125 °C straight above S1 (still wet: the isochore meets
		// the saturated-vapor line at 140.63 °C, python3-iapws, tests/reference/iapws-sketcher.json)
		await page.getByLabel('New leg').selectOption('isochoric');
		await page.getByTestId('add-leg').click();
		let g = await chartGeometry(page, 'T-v');
		const s1 = g.state(0);
		await page.mouse.click(s1.x, g.yOf(125));
		await expect(page.getByTestId('phase-S2')).toContainText('saturated mixture');
		const tWet = num(await cellText(page, 'S2', 'T'));
		expect(tWet).toBeGreaterThan(110);
		expect(tWet).toBeLessThan(reference.isochore.saturatedVapor.T - 273.15);

		// drag the end up across the saturated-vapor line, to about 180 °C
		g = await chartGeometry(page, 'T-v');
		const s2 = g.state(1);
		await page.mouse.move(s2.x, s2.y);
		await page.mouse.down();
		const target = g.yOf(180);
		for (let i = 1; i <= 12; i++)
			await page.mouse.move(s2.x + 1, s2.y + ((target - s2.y) * i) / 12, { steps: 2 });
		const saved = nextDraftSave(page);
		await page.mouse.up();
		await expect(page.getByTestId('phase-S2')).toContainText('superheated vapor');
		await saved;
		await waitSaved(page);

		// the table shows what the API says for that end state
		const api = page.request;
		const sheet = (await (await api.get(`/api/v1/teams/${TEAM}/sheets/${sheetId}`)).json()).sheet;
		const leg = sheet.doc.spec.legs[0];
		expect(leg.process).toBe('isochoric');
		const tEnd = leg.target.T as number;
		expect(tEnd - 273.15).toBeGreaterThan(reference.isochore.saturatedVapor.T - 273.15);
		const res = await api.post('/api/v1/states', {
			data: { fluid: 'water', inputs: { T: tEnd, v: 0.5 } }
		});
		expect(res.status()).toBe(200);
		const { state } = await res.json();
		expect(state.phase).toBe('superheated-vapor');
		const pShown = num(await cellText(page, 'S2', 'P'));
		expect(Math.abs(pShown * 1e3 - state.P) / state.P).toBeLessThan(2e-4); // kPa a, 5 significant figures
		expect(num(await cellText(page, 'S2', 'T'))).toBeCloseTo(tEnd - 273.15, 2);
		const dragged = await cellText(page, 'S2', 'T');

		// type an exact target: 250 °C at v = 0.5 m³/kg is 474.864 kPa by IAPWS-95
		const tCell = cell(page, 'S2', 'T');
		await tCell.fill('250 °C');
		await tCell.press('Enter');
		await expect(cell(page, 'S2', 'T')).toHaveValue('250.00');
		const p250 = num(await cellText(page, 'S2', 'P')) * 1e3;
		// python3-iapws 1.5.2 (Debian), IAPWS95(T=523.15, rho=2).P — tests/reference/iapws-sketcher.json
		expect(Math.abs(p250 / reference.isochore.points[3].P - 1)).toBeLessThan(1e-4);

		// a bad value keeps the old one and says why
		await tCell.fill('-300 °C');
		await tCell.press('Enter');
		await expect(page.getByRole('alert').filter({ hasText: 'absolute zero' })).toBeVisible();
		await tCell.press('Escape');
		await expect(cell(page, 'S2', 'T')).toHaveValue('250.00');

		// undo the typed target: back to where the drag left it
		await page.getByRole('button', { name: /Undo/ }).click();
		await expect(cell(page, 'S2', 'T')).toHaveValue(dragged);
		await waitSaved(page);

		// reload: the draft is as left
		await page.reload();
		await expect(page.getByTestId('sheet-title')).toHaveText(title);
		await expect(cell(page, 'S2', 'T')).toHaveValue(dragged);
		await expect(page.getByTestId('phase-S2')).toContainText('superheated vapor');
		// the undo history belongs to the visit: after a reload there is nothing to undo
		await expect(page.getByRole('button', { name: /Undo/ })).toBeDisabled();
	});

	test('undo and redo step through every edit; a drag is one step', async ({ page }) => {
		await signInPage(page, DEMO.designer);
		await newBlankWaterSheet(page, `Undo steps ${stamp()}`);
		await page.getByLabel('New leg').selectOption('isochoric');
		await page.getByTestId('add-leg').click();
		let g = await chartGeometry(page, 'T-v');
		await page.mouse.click(g.state(0).x, g.yOf(120));
		await expect(page.getByTestId('phase-S2')).toContainText('saturated mixture');
		const first = await cellText(page, 'S2', 'T');
		g = await chartGeometry(page, 'T-v');
		const s2 = g.state(1);
		await page.mouse.move(s2.x, s2.y);
		await page.mouse.down();
		for (let i = 1; i <= 10; i++)
			await page.mouse.move(s2.x, s2.y + ((g.yOf(200) - s2.y) * i) / 10);
		await page.mouse.up();
		await expect(page.getByTestId('phase-S2')).toContainText('superheated vapor');
		// the drag's end is computed and saved before its value is read (not a preview on the way)
		await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved', {
			timeout: 20_000
		});
		const second = await cellText(page, 'S2', 'T');
		await page.locator('body').click({ position: { x: 5, y: 300 } });
		await page.keyboard.press('Control+z');
		await expect(cell(page, 'S2', 'T')).toHaveValue(first);
		await page.keyboard.press('Control+z');
		await expect(page.locator('tr[data-label="S2"]')).toHaveCount(0);
		await page.keyboard.press('Control+Shift+z');
		await expect(cell(page, 'S2', 'T')).toHaveValue(first);
		await page.keyboard.press('Control+y');
		await expect(cell(page, 'S2', 'T')).toHaveValue(second);
		// select the leg on the chart and nudge its end with the arrow keys, then delete it with Delete
		const legHit = page.locator('[data-chart="T-v"] path.swc-hit-leg').first();
		await legHit.focus();
		await page.keyboard.press('Shift+ArrowUp');
		await expect(cell(page, 'S2', 'T')).not.toHaveValue(second);
		await page.keyboard.press('Enter');
		await page.keyboard.press('Delete');
		await expect(page.locator('tr[data-label="S2"]')).toHaveCount(0);
		await page.getByRole('button', { name: /Undo/ }).click();
		await expect(page.locator('tr[data-label="S2"]')).toHaveCount(1);
	});

	test('the start moves freely: dragged on P–v it is fixed by the pointer’s P and v', async ({
		page
	}) => {
		await signInPage(page, DEMO.designer);
		await newBlankWaterSheet(page, `Free start ${stamp()}`);
		const id = page.url().split('/').pop()!;
		const chart = page.locator('[data-chart="P-v"]');
		await chart.scrollIntoViewIfNeeded();
		const box = (await chart.locator('svg.swc-overlay').boundingBox())!;
		const disc = chart.locator('circle.swc-hit-state').first();
		const x = box.x + Number(await disc.getAttribute('cx'));
		const y = box.y + Number(await disc.getAttribute('cy'));
		const before = await cellText(page, 'S1', 'P');
		await page.mouse.move(x, y);
		await page.mouse.down();
		for (let i = 1; i <= 8; i++) await page.mouse.move(x + 5 * i, y - 4 * i);
		const saved = nextDraftSave(page);
		await page.mouse.up();
		await expect.poll(() => cellText(page, 'S1', 'P')).not.toBe(before);
		await saved;
		await waitSaved(page);
		const sheet = (await (await page.request.get(`/api/v1/teams/${TEAM}/sheets/${id}`)).json())
			.sheet;
		expect(Object.keys(sheet.doc.spec.start).sort()).toEqual(['P', 'v']);
		expect(sheet.doc.spec.start.v).toBeGreaterThan(0.5);
		// the table's S1 shows what the API gives for that start
		const { state } = await (
			await page.request.post('/api/v1/states', {
				data: { fluid: 'water', inputs: sheet.doc.spec.start }
			})
		).json();
		expect(Math.abs((num(await cellText(page, 'S1', 'P')) * 1e3) / state.P - 1)).toBeLessThan(2e-4);
		await expect(page.getByTestId('phase-S1')).toContainText(state.phase.replace('-', ' '));
	});

	test('a checker reads the sheet but cannot drag or type, and the server refuses a draft save (403)', async ({
		page
	}) => {
		await signInPage(page, DEMO.checker);
		await page.goto(`/t/${TEAM}`);
		await page.getByRole('link', { name: /V-204/ }).first().click();
		await expect(page.getByTestId('sheet-screen')).toHaveAttribute('data-can-edit', 'false');
		await expect(page.locator('[data-save-status]')).toHaveAttribute(
			'data-save-status',
			'read-only'
		);
		await expect(page.getByTestId('add-leg')).toHaveCount(0);
		await expect(page.getByRole('button', { name: /Undo/ })).toHaveCount(0);
		await expect(cell(page, 'S2', 'T')).toHaveJSProperty('tagName', 'TD');
		const before = await cellText(page, 'S2', 'T');
		// no drag affordance: the discs are locked, and dragging one changes nothing
		const hit = page.locator('[data-chart="T-v"] circle.swc-hit-state').nth(1);
		await expect(hit).toHaveClass(/is-locked/);
		const g = await chartGeometry(page, 'T-v');
		const s2 = g.state(1);
		// a drag in an editable sheet posts the new path at once (then saves the draft); here no
		// request may leave the page. The page's own request sent after the drag is the barrier:
		// once it is answered, any request the drag made has been seen.
		const sent: string[] = [];
		const onRequest = (r: Request) => {
			if (r.method() !== 'GET') sent.push(`${r.method()} ${new URL(r.url()).pathname}`);
		};
		page.on('request', onRequest);
		await page.mouse.move(s2.x, s2.y);
		await page.mouse.down();
		await page.mouse.move(s2.x, s2.y + 60, { steps: 8 });
		await page.mouse.up();
		const barrier = page.waitForResponse((r) => r.url().endsWith('/healthz?after-drag'));
		await page.evaluate(() => fetch('/healthz?after-drag').then((r) => r.text()));
		await barrier;
		page.off('request', onRequest);
		expect(sent).toEqual([]);
		expect(await cellText(page, 'S2', 'T')).toBe(before);
		// the server refuses the checker's save, whatever the page shows
		const id = page.url().split('/').pop()!;
		const sheet = (await (await page.request.get(`/api/v1/teams/${TEAM}/sheets/${id}`)).json())
			.sheet;
		const put = await page.request.put(`/api/v1/teams/${TEAM}/sheets/${id}/draft`, {
			data: { version: sheet.version, doc: sheet.doc }
		});
		expect(put.status()).toBe(403);
		expect((await put.json()).error.code).toBe('forbidden');
	});

	test('the team page lists and searches sheets', async ({ page }) => {
		await signInPage(page, DEMO.viewer);
		await page.goto(`/t/${TEAM}`);
		const list = page.getByTestId('sheet-list');
		await expect(list).toContainText('R-310 ammonia receiver on a hot day');
		await expect(page.getByTestId('new-sheet')).toHaveCount(0);
		await page.getByRole('searchbox', { name: 'Search sheets' }).fill('ammonia');
		await page.getByRole('button', { name: 'Search' }).click();
		await expect(page).toHaveURL(/\?q=ammonia/);
		await expect(list).toContainText('R-310');
		// every row found is an ammonia sheet (other journeys may have added some)
		await expect(list.locator('tbody tr').filter({ hasNotText: 'Ammonia' })).toHaveCount(0);
		await expect(list).not.toContainText('K-101');
		await page.getByRole('searchbox', { name: 'Search sheets' }).fill('Marrowfield vessel');
		await page.getByRole('button', { name: 'Search' }).click();
		await expect(list).toContainText('V-204');
		await expect(list).not.toContainText('R-310');
		await page.getByRole('searchbox', { name: 'Search sheets' }).fill('no such equipment anywhere');
		await page.getByRole('button', { name: 'Search' }).click();
		await expect(list).toContainText('No sheet matches');
		// recent sheets on the signed-in home: newest first, as on the team page, at most eight
		await page.goto(`/t/${TEAM}`);
		const newest = (await page
			.getByTestId('sheet-list')
			.locator('tbody tr')
			.first()
			.locator('a')
			.textContent())!.trim();
		await page.goto('/');
		const recent = page.getByTestId('recent-sheets').locator('tbody tr');
		await expect(recent.first()).toContainText(newest);
		expect(await recent.count()).toBeLessThanOrEqual(8);
	});

	test('a sheet from a worked example opens with its warnings and cautions', async ({ page }) => {
		await signInPage(page, DEMO.designer);
		await page.goto(`/t/${TEAM}/sheets/new`);
		await page.getByRole('button', { name: /Start a sheet from V-204/ }).click();
		await expect(page.getByTestId('sheet-title')).toHaveText(
			'V-204 sealed expansion vessel in a fire case'
		);
		const warnings = page.getByTestId('warnings');
		await expect(warnings).toContainText('Design exploration, not a design approval');
		await expect(warnings).toContainText('ASME BPVC Section VIII');
		await expect(warnings.locator('[data-code="liquid-full"]')).toContainText(
			'Heating a liquid-full sealed vessel raises its pressure very fast'
		);
		await expect(warnings.locator('[data-code="limit-designPressure"]')).toContainText(
			'design pressure'
		);
		await expect(page.getByTestId('phase-S2')).toContainText('compressed liquid');
		// python3-iapws 1.5.2 (Debian): IAPWS95(T=523.15, rho=800).P = 4.9265 MPa
		expect(
			Math.abs((num(await cellText(page, 'S2', 'P')) * 1e6) / reference.vesselV204.at523_15.P - 1)
		).toBeLessThan(1e-4);
		// both charts, with the design limits drawn and labelled
		await expect(page.locator('[data-chart="T-v"] .swc-limit-label')).toHaveCount(3);
		await expect(page.locator('[data-chart="P-v"] .swc-limit-label')).toHaveCount(3);
	});

	test('a designer deletes a sheet they started from its Setup tab; an approved sheet says why it stays', async ({
		page
	}) => {
		await signInPage(page, DEMO.designer);
		const title = `Scratch R-310 ${Date.now().toString(36)}`;
		const made = await page.request.post(`/api/v1/teams/${TEAM}/sheets`, {
			data: { example: 'receiver-r310-hot-day', title }
		});
		expect(made.status(), await made.text()).toBe(201);
		const id = ((await made.json()) as { sheet: { id: string } }).sheet.id;
		await page.goto(`/t/${TEAM}/sheets/${id}`);
		await page.getByRole('tab', { name: /Setup/ }).click();
		const box = page.getByTestId('sheet-delete');
		await box.getByTestId('sheet-delete-start').click();
		await expect(box).toContainText('This cannot be undone');
		await box.getByRole('button', { name: 'Keep it' }).click();
		await expect(box.getByTestId('sheet-delete-confirm')).toHaveCount(0);
		await box.getByTestId('sheet-delete-start').click();
		await box.getByTestId('sheet-delete-confirm').click();
		await expect(page).toHaveURL(new RegExp(`/t/${TEAM}\\?deleted=`));
		await expect(page.locator('[data-notice="ok"]')).toContainText(`Sheet “${title}” was deleted.`);
		expect((await page.request.get(`/t/${TEAM}/sheets/${id}`)).status()).toBe(404);
		// the seeded K-101 holds an approved revision: the designer reads why it cannot be deleted
		const k101 = { id: await seededK101Id(page.request) };
		await page.goto(`/t/${TEAM}/sheets/${k101.id}`);
		await page.getByRole('tab', { name: /Setup/ }).click();
		await expect(page.getByTestId('sheet-delete-reason')).toContainText('approved');
		await expect(page.getByTestId('sheet-delete-start')).toHaveCount(0);
	});

	test('two windows: the second save is refused with 409, said on screen, and offered compare, load or keep', async ({
		browser
	}) => {
		const ctx = await browser.newContext();
		const a = await ctx.newPage();
		await signInPage(a, DEMO.designer);
		await newBlankWaterSheet(a, `Two windows ${stamp()}`);
		const url = a.url();
		const b = await ctx.newPage();
		await b.goto(url);
		await expect(b.getByTestId('sheet-title')).toBeVisible();

		// window A changes the start temperature and saves
		const t1 = cell(a, 'S1', 'T');
		await t1.fill('110 °C');
		await t1.press('Enter');
		await waitSaved(a);
		// window B, still on the old version, edits the title block
		await b.getByRole('tab', { name: 'Setup' }).click();
		await b.getByTestId('tb-tag').fill('V-77');
		await b.getByTestId('tb-tag').press('Tab');
		const banner = b.getByTestId('save-conflict');
		await expect(banner).toBeVisible({ timeout: 20_000 });
		await expect(banner).toContainText('Tobias Lindqvist saved this sheet');
		await expect(b.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'conflict');
		await banner.getByRole('button', { name: 'Compare' }).click();
		const diff = b.getByTestId('draft-diff');
		await expect(diff).toContainText('Tag');
		await expect(diff).toContainText('V-77');
		await expect(diff).toContainText('110.00 °C');
		// keep mine: saved over their version, nothing lost of mine
		await banner.getByRole('button', { name: 'Keep mine and save' }).click();
		await waitSaved(b);
		await b.reload();
		await b.getByRole('tab', { name: 'Setup' }).click();
		await expect(b.getByTestId('tb-tag')).toHaveValue('V-77');
		await ctx.close();
	});

	test('offline: edits are kept in the browser, the screen says so, and they are saved when the connection returns', async ({
		page,
		context
	}) => {
		await signInPage(page, DEMO.designer);
		await newBlankWaterSheet(page, `Offline ${stamp()}`);
		await page.getByRole('tab', { name: 'Setup' }).click();
		await context.setOffline(true);
		await page.getByTestId('tb-project').fill('Offline edit');
		await page.getByTestId('tb-project').press('Tab');
		await expect(page.locator('[data-save-status]')).toHaveAttribute(
			'data-save-status',
			'offline',
			{ timeout: 20_000 }
		);
		await expect(page.locator('[data-save-status]')).toContainText('kept in this browser');
		const local = await page.evaluate(() =>
			Object.keys(localStorage)
				.filter((k) => k.startsWith('sw:draft:'))
				.map((k) => JSON.parse(localStorage.getItem(k)!).doc.titleBlock.project)
		);
		expect(local).toContain('Offline edit');
		await context.setOffline(false);
		await waitSaved(page);
		await page.reload();
		await page.getByRole('tab', { name: 'Setup' }).click();
		await expect(page.getByTestId('tb-project')).toHaveValue('Offline edit');
	});

	test('a local copy left by a closed window is replayed on the next visit', async ({ page }) => {
		await signInPage(page, DEMO.designer);
		await newBlankWaterSheet(page, `Replay ${stamp()}`);
		const id = page.url().split('/').pop()!;
		// as if the window closed before autosave ran: the local copy holds an edit the server lacks
		const sheet = (await (await page.request.get(`/api/v1/teams/${TEAM}/sheets/${id}`)).json())
			.sheet;
		const doc = { ...sheet.doc, titleBlock: { ...sheet.doc.titleBlock, tag: 'R-99' } };
		await page.evaluate(
			([k, v]) => localStorage.setItem(k, v),
			[`sw:draft:${id}`, JSON.stringify({ doc, baseVersion: sheet.version, changedAt: Date.now() })]
		);
		await page.reload();
		await expect(
			page.getByRole('status').filter({ hasText: 'Restored edits kept in this browser' })
		).toBeVisible();
		await waitSaved(page);
		const after = (await (await page.request.get(`/api/v1/teams/${TEAM}/sheets/${id}`)).json())
			.sheet;
		expect(after.doc.titleBlock.tag).toBe('R-99');
		expect(after.version).toBe(sheet.version + 1);
	});
});

test.describe('sheet pages refuse what they should', () => {
	test('the new-sheet form says what is wrong beside the field and creates nothing', async ({
		page
	}) => {
		await signInPage(page, DEMO.designer);
		await page.goto(`/t/${TEAM}/sheets/new`);
		const title = `Refused ${stamp()}`;
		await page.getByLabel('Title').fill(title);
		await page.locator('#f-propA').selectOption('T');
		await page.locator('#f-valueA').fill('100 °C');
		await page.locator('#f-propB').selectOption('x');
		await page.locator('#f-valueB').fill('1.5');
		await page.getByLabel('Volume').fill('0,5 m³');
		await page.getByRole('button', { name: 'Create sheet' }).click();
		await expect(page.locator('#f-valueB-err')).toContainText('outside 0 to 1');
		await expect(page.locator('#f-sizeValue-err')).toContainText('decimal point');
		await expect(page.getByLabel('Title')).toHaveValue(title);
		// the engine's refusal lands beside the start state: no quality above the critical temperature
		await page.locator('#f-valueA').fill('700 °C');
		await page.locator('#f-valueB').fill('0.5');
		await page.getByLabel('Volume').fill('0.5 m³');
		await page.getByRole('button', { name: 'Create sheet' }).click();
		await expect(page.locator('#f-valueB-err')).toContainText('start state cannot be fixed');
		await page.goto(`/t/${TEAM}?q=${encodeURIComponent(title)}`);
		await expect(page.getByTestId('sheet-list')).toContainText('No sheet matches');
	});

	test('a viewer cannot open the new-sheet page (403); an unknown sheet is 404', async () => {
		const viewer = await signedInRequest(DEMO.viewer);
		expect((await viewer.get(`/t/${TEAM}/sheets/new`)).status()).toBe(403);
		expect((await viewer.get(`/t/${TEAM}/sheets/abcdefghijkmnpqr`)).status()).toBe(404);
		expect((await viewer.get(`/t/${TEAM}/sheets/not-an-id`)).status()).toBe(404);
		await viewer.dispose();
	});
});
