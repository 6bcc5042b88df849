import { expect, test, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { DEMO, signInPage, TEAM } from './helpers';

// python3-iapws 1.5.2 (Debian), IAPWS95, direct calls: tests/reference/make-iapws-sketcher.py
const reference = JSON.parse(readFileSync('tests/reference/iapws-sketcher.json', 'utf8')) as {
	isochore: { v: number; saturatedVapor: { T: number; P: number } };
};

/*
 * The drag preview: while a state is dragged, the browser's engine redraws the path on every
 * frame before the server answers (the chart marks it a preview, the table waits for the
 * server); after release the server's states are what the chart, the table and the saved draft
 * show. The server's answers are held back here with page.route, so only the preview can move
 * the path while they are. Neither a preview nor an answer during the gesture places the labels
 * again; the end of the gesture does.
 */

const stamp = () => `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 5)}`;

/** The T–v chart's T axis (page y of a temperature in °C, and back) and its state discs. */
async function tvChart(page: Page) {
	const chart = page.locator('[data-chart="T-v"]');
	const box = (await chart.locator('svg.swc-drawing').boundingBox())!;
	const ticks = await chart.locator('svg.swc-drawing text.yl').evaluateAll((els) =>
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
	const disc = async (i: number) => {
		const c = chart.locator('circle.swc-hit-state').nth(i);
		return {
			x: box.x + Number(await c.getAttribute('cx')),
			y: box.y + Number(await c.getAttribute('cy'))
		};
	};
	return {
		overlay: chart.locator('svg.swc-overlay'),
		yOf: (celsius: number) => box.y + a.y + (celsius - a.value) * slope,
		celsiusAt: (pageY: number) => a.value + (pageY - box.y - a.y) / slope,
		disc
	};
}

const num = (t: string) => Number(t.replace('−', '-').replace(/\s.*$/, ''));

/** A table cell's number (an input where the property can be typed, else the cell's text). */
async function cellValue(page: Page, label: string, prop: string): Promise<number> {
	const c = page.locator(`tr[data-label="${label}"] [data-prop="${prop}"]`);
	const input = (await c.evaluate((e) => e.tagName)) === 'INPUT';
	return num(input ? await c.inputValue() : ((await c.textContent()) ?? '').trim());
}

test('dragging a state redraws its path before the server answers; after release the server’s states are shown and saved', async ({
	page
}) => {
	await signInPage(page, DEMO.designer);
	// a water sheet, wet at 100 °C with v = 0.5 m³/kg
	await page.goto(`/t/${TEAM}`);
	await page.getByTestId('new-sheet').click();
	await page.getByLabel('Title').fill(`Drag preview ${stamp()}`);
	await page.getByLabel('Sized by').selectOption('volume');
	await page.getByLabel('Volume').fill('0.5 m³');
	await page.locator('#f-propA').selectOption('T');
	await page.locator('#f-valueA').fill('100 °C');
	await page.locator('#f-propB').selectOption('v');
	await page.locator('#f-valueB').fill('0.5 m3/kg');
	await page.getByRole('button', { name: 'Create sheet' }).click();
	await expect(page.getByTestId('phase-S1')).toContainText('saturated mixture');
	const sheetId = page.url().split('/').pop()!;

	// an isochoric leg to about 120 °C (still wet: the isochore leaves the dome at 140.63 °C)
	await page.getByLabel('New leg').selectOption('isochoric');
	await page.getByTestId('add-leg').click();
	let chart = await tvChart(page);
	const s1 = await chart.disc(0);
	await page.mouse.click(s1.x, chart.yOf(120));
	await expect(page.getByTestId('phase-S2')).toContainText('saturated mixture');
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved', {
		timeout: 20_000
	});
	const tBefore = await cellValue(page, 'S2', 'T');
	chart = await tvChart(page);
	const s2 = await chart.disc(1);
	// the engine is loaded in the browser (the hover readout and drag projection use it)
	await page.mouse.move(s2.x + 40, s2.y);
	await expect(page.locator('[data-chart="T-v"] .readout')).toContainText(
		/· (saturated|superheated|compressed|supercritical)/
	);

	// hold every path answer back until released
	let release!: () => void;
	const gate = new Promise<void>((r) => (release = r));
	let answered = 0;
	let draftSaves = 0;
	page.on('response', (r) => {
		if (r.url().endsWith('/api/v1/paths')) answered++;
	});
	page.on('request', (r) => {
		if (r.method() === 'PUT' && r.url().endsWith(`/sheets/${sheetId}/draft`)) draftSaves++;
	});
	await page.route('**/api/v1/paths', async (route) => {
		await gate;
		await route.continue();
	});

	// the wet leg crosses no saturation line yet
	const crossings = page.locator(
		'[data-chart="T-v"] svg.swc-drawing path.swc-crossing:not(.sample)'
	);
	await expect(crossings).toHaveCount(0);
	const revBefore = Number(await chart.overlay.getAttribute('data-path-rev'));
	await page.mouse.move(s2.x, s2.y);
	await page.mouse.down();
	// up the isochore, across the saturated-vapor line, to about 190 °C
	const target = chart.yOf(190);
	for (let i = 1; i <= 10; i++) await page.mouse.move(s2.x, s2.y + ((target - s2.y) * i) / 10);

	// the path has been redrawn as a preview, S2 follows the pointer, and no answer has come
	await expect(chart.overlay).toHaveAttribute('data-path-preview', 'true');
	await expect
		.poll(async () => Math.abs((await chart.disc(1)).y - target), {
			message: 'the dragged disc is drawn at the pointer'
		})
		.toBeLessThan(2);
	expect(Number(await chart.overlay.getAttribute('data-path-rev'))).toBeGreaterThan(revBefore);
	// the preview's leg crosses the saturated-vapor line (its crossing mark is drawn)
	await expect(crossings).toHaveCount(1);
	// the preview is drawn lighter than a computed path
	await expect(page.locator('[data-chart="T-v"] svg.swc-drawing g.is-preview')).toHaveCount(1);
	expect(answered).toBe(0);
	// the table is the server's: it still shows S2 where the server last put it, and nothing is saved
	expect(await cellValue(page, 'S2', 'T')).toBe(tBefore);
	expect(draftSaves).toBe(0);

	// the server answers while the pointer is still down: its path replaces the preview, and the
	// labels stay where they are (placing them is most of a redraw) until the gesture ends. (The
	// preview may have placed them once more: its crossing added a row to the chart's key, which
	// redraws the frame under them.)
	const labelsRev = async () => Number(await chart.overlay.getAttribute('data-labels-rev'));
	const labelsBefore = await labelsRev();
	release();
	await expect(chart.overlay).not.toHaveAttribute('data-path-preview', 'true');
	expect(answered).toBeGreaterThan(0);
	expect(await labelsRev(), 'labels placed during the drag').toBe(labelsBefore);
	await page.mouse.up();
	await expect
		.poll(labelsRev, { message: 'the labels are placed again once the gesture ends' })
		.toBeGreaterThan(labelsBefore);
	await expect(page.getByTestId('phase-S2')).toContainText('superheated vapor');
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved', {
		timeout: 20_000
	});
	expect(answered).toBeGreaterThan(0);
	await expect(chart.overlay).not.toHaveAttribute('data-path-preview', 'true');
	await expect(page.locator('[data-chart="T-v"] svg.swc-drawing g.is-preview')).toHaveCount(0);

	// what was saved is what the server computed, and the table and chart show it. The status was
	// already "saved" before the drag (nothing is saved while dragging), so wait for the draft that
	// holds the released state rather than for the status word.
	const savedLeg = async () =>
		(await (await page.request.get(`/api/v1/teams/${TEAM}/sheets/${sheetId}`)).json()).sheet.doc
			.spec.legs[0];
	await expect
		.poll(async () => Math.abs(((await savedLeg()).target.T as number) - 273.15 - 190), {
			message: 'the released state (near the pointer’s 190 °C) is saved',
			timeout: 20_000
		})
		.toBeLessThan(3);
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved', {
		timeout: 20_000
	});
	expect(draftSaves).toBeGreaterThan(0);
	const leg = await savedLeg();
	expect(leg.process).toBe('isochoric');
	const tSaved = (leg.target.T as number) - 273.15;
	// past where python3-iapws's saturated vapour has ρ'' = 1/v, and near the pointer's 190 °C
	expect(tSaved + 273.15).toBeGreaterThan(reference.isochore.saturatedVapor.T);
	expect(Math.abs(tSaved - 190)).toBeLessThan(3);
	await expect.poll(() => cellValue(page, 'S2', 'T')).toBeCloseTo(tSaved, 2);
	const { state } = await (
		await page.request.post('/api/v1/states', {
			data: { fluid: 'water', inputs: { T: tSaved + 273.15, v: reference.isochore.v } }
		})
	).json();
	const pShown = await cellValue(page, 'S2', 'P');
	expect(Math.abs((pShown * 1e3) / state.P - 1)).toBeLessThan(2e-4); // kPa a, 5 significant figures
	expect(Math.abs(chart.celsiusAt((await chart.disc(1)).y) - tSaved)).toBeLessThan(1);
});
