import { expect, test, type Download, type Page } from '@playwright/test';
import { DEMO, nextDraftSave, TEAM, signedInPage, signedInRequest } from './helpers';

/*
 * The five views in Chromium: an ammonia refrigeration cycle read on P–h with its COP, a state
 * dragged along its leg on T–s, and an h–s memo figure. Screenshots of each view go to tmp/.
 */

test.describe.configure({ mode: 'serial' });

// Ammonia between −10 °C and 40 °C saturation, python3-iapws 1.5.2 (Debian), iapws.ammonia.NH3
// (Tillner-Roth, Harms-Watzenberg & Baehr 1993): Psat(263.15 K) = 0.2907138 MPa, Psat(313.15 K) =
// 1.555422 MPa.
const P_EVAP = 290713.75;
const P_COND = 1555421.99;
// States fixed there with the same library: h1 = h″(263.15 K) = 1450.705 kJ/kg, s1 = 5.756867
// kJ/(kg·K); h2 = h(1.555422 MPa, s1) = 1698.478 kJ/kg (T from NH3(T, P) bisected to s1, 385.870 K);
// h3 = h4 = h′(313.15 K) = 390.637 kJ/kg. COP cooling = (h1 − h4)/(h2 − h1) = 4.2784, heating 5.2784.
const COP_COOLING = (1450.705 - 390.637) / (1698.478 - 1450.705);
const COP_HEATING = (1698.478 - 390.637) / (1698.478 - 1450.705);

const cycle = {
	spec: {
		fluid: 'ammonia',
		system: { kind: 'flow', massFlow: 0.1 },
		start: { T: 263.15, x: 1 },
		legs: [
			{ id: 'comp', process: 'isentropic', target: { P: P_COND } },
			{ id: 'cond', process: 'isobaric', target: { x: 0 } },
			{ id: 'valve', process: 'isenthalpic', target: { P: P_EVAP } },
			{ id: 'evap', process: 'isobaric', target: { x: 1 } }
		]
	},
	units: {
		system: 'si',
		pressureUnit: 'bar',
		pressureReference: 'absolute',
		usPower: 'Btu/h',
		atmosphere: 101325
	},
	chart: { view: 'both', pressureScale: 'log', isolines: true }
};

let sheetId = '';

async function showOnly(page: Page, view: string) {
	const toggle = (k: string) => page.locator(`[data-view-toggle="${k}"]`);
	if ((await toggle(view).getAttribute('aria-pressed')) !== 'true') await toggle(view).click();
	await expect(toggle(view)).toHaveAttribute('aria-pressed', 'true');
	for (const k of ['T-v', 'P-v', 'P-h', 'T-s', 'h-s'])
		if (k !== view && (await toggle(k).getAttribute('aria-pressed')) === 'true')
			await toggle(k).click();
	await expect(page.getByTestId('sheet-charts')).toHaveAttribute('data-view', view);
	await expect(page.locator(`[data-chart="${view}"] svg.swc-drawing`)).toBeVisible();
}

async function waitSaved(page: Page) {
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved', {
		timeout: 20_000
	});
}

async function readDownload(d: Download): Promise<string> {
	const { readFile } = await import('node:fs/promises');
	return (await readFile((await d.path())!)).toString('utf8');
}

test('an ammonia refrigeration cycle read on the P–h view: its COP against states fixed with python3-iapws', async ({
	browser
}) => {
	test.setTimeout(120_000);
	const api = await signedInRequest(DEMO.designer);
	const made = await api.post(`/api/v1/teams/${TEAM}/sheets`, {
		data: { title: `Ammonia chiller ${Date.now().toString(36)}`, doc: cycle }
	});
	expect(made.status(), await made.text()).toBe(201);
	sheetId = ((await made.json()) as { sheet: { id: string } }).sheet.id;

	const page = await signedInPage(browser, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/${sheetId}`);
	// an old-style sheet ("both") opens on T–v and P–v
	await expect(page.getByTestId('sheet-charts')).toHaveAttribute('data-view', 'both');
	await expect(page.locator('[data-chart="T-v"]')).toBeVisible();
	await expect(page.locator('[data-chart="P-v"]')).toBeVisible();

	await showOnly(page, 'P-h');
	const ph = page.locator('[data-chart="P-h"]');
	await expect(ph).toHaveAttribute('aria-label', 'Pressure–specific enthalpy diagram');
	const drawing = ph.locator('svg.swc-drawing');
	await expect(drawing.locator('text.swc-title.xt')).toContainText('specific enthalpy');
	await expect(drawing.locator('text.swc-title.yt')).toContainText('bar a, log');
	await expect(ph.locator('circle.swc-hit-state')).toHaveCount(5);
	// the P–h view's own lines: isotherms, isentropes and quality lines arrive from the API
	await expect
		.poll(async () => drawing.locator('path.swc-isoline').count(), { timeout: 20_000 })
		.toBeGreaterThan(15);
	await expect(
		drawing.locator('text.swc-iso-label').filter({ hasText: /^x 0\.\d$/ })
	).not.toHaveCount(0);

	// the cycle: the compressor and condenser rows at the condensing pressure, the COP for the sheet
	const text = ((await page.getByTestId('cycle').textContent()) ?? '').replace(/\s+/g, ' ');
	const m = text.match(/COP heating ([\d.]+), cooling ([\d.]+)/);
	expect(m, text).not.toBeNull();
	expect(Math.abs(Number(m![2]) - COP_COOLING)).toBeLessThanOrEqual(0.006);
	expect(Math.abs(Number(m![1]) - COP_HEATING)).toBeLessThanOrEqual(0.006);
	// the choice is kept with the sheet
	await waitSaved(page);
	const sheet = (await (await api.get(`/api/v1/teams/${TEAM}/sheets/${sheetId}`)).json()).sheet;
	expect(sheet.doc.chart.view).toBe('P-h');
	await ph.screenshot({ path: 'tmp/views-ph.png' });
	await page.context().close();
});

test('dragging the compressor outlet on the T–s view keeps it on its isentrope', async ({
	browser
}) => {
	test.setTimeout(240_000);
	const page = await signedInPage(browser, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/${sheetId}`);
	await showOnly(page, 'T-s');
	const ts = page.locator('[data-chart="T-s"]');
	await expect(ts.locator('svg.swc-drawing text.swc-title.xt')).toContainText('specific entropy');
	await ts.screenshot({ path: 'tmp/views-ts.png' });

	const pCell = page.locator('tr[data-label="S2"] [data-prop="P"]');
	const pOf = async () =>
		Number(
			(
				await pCell.evaluate((e) =>
					e.tagName === 'INPUT' ? (e as HTMLInputElement).value : (e.textContent ?? '')
				)
			).replace(/[^\d.]/g, '')
		);
	await expect.poll(pOf).toBeGreaterThan(0);
	const before = await pOf();
	const box = (await ts.locator('svg.swc-overlay').boundingBox())!;
	const s2 = ts.locator('circle.swc-hit-state[aria-label^="State S2"]');
	const x = box.x + Number(await s2.getAttribute('cx'));
	const y = box.y + Number(await s2.getAttribute('cy'));
	await page.mouse.move(x, y);
	await page.mouse.down();
	// up and a little sideways: on T–s the isentrope is a vertical line, so only T (and P) change
	for (let i = 1; i <= 10; i++) await page.mouse.move(x + i * 2, y - i * 4, { steps: 2 });
	const saved = nextDraftSave(page);
	await page.mouse.up();
	await saved;
	await waitSaved(page);
	await expect.poll(pOf).toBeGreaterThan(before * 1.05);
	// the stored leg: still isentropic, now ending at the dragged pressure
	const api = await signedInRequest(DEMO.designer);
	const read = async () =>
		(await (await api.get(`/api/v1/teams/${TEAM}/sheets/${sheetId}`)).json()).sheet;
	await expect
		.poll(async () => (await read()).doc.spec.legs[0].target.P)
		.toBeGreaterThan(P_COND * 1.05);
	const sheet = await read();
	const leg = sheet.doc.spec.legs[0];
	expect(leg.process).toBe('isentropic');
	expect(sheet.doc.chart.view).toBe('T-s');
	// S2's disc is still straight above S1's on screen: same s
	const s1 = ts.locator('circle.swc-hit-state[aria-label^="State S1"]');
	const cx = async () => [Number(await s1.getAttribute('cx')), Number(await s2.getAttribute('cx'))];
	await expect
		.poll(
			async () => {
				const [a, b] = await cx();
				return Math.abs(a - b);
			},
			{ message: `S1, S2 cx ${await cx()}` }
		)
		.toBeLessThan(3);
	await page.context().close();
});

test('an h–s memo figure is the h–s view', async ({ browser }) => {
	test.setTimeout(240_000);
	const page = await signedInPage(browser, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/${sheetId}`);
	await showOnly(page, 'h-s');
	const hs = page.locator('[data-chart="h-s"]');
	await expect(hs).toHaveAttribute('aria-label', 'Specific enthalpy–specific entropy diagram');
	await hs.screenshot({ path: 'tmp/views-hs.png' });
	await waitSaved(page);
	await page.getByTestId('export-menu').locator('summary').click();
	const [dl] = await Promise.all([
		page.waitForEvent('download'),
		page.getByTestId('export-svg').click()
	]);
	const svg = await readDownload(dl);
	expect(svg).toContain('Specific enthalpy–specific entropy diagram');
	expect(svg).toContain('specific entropy');
	expect(svg).not.toContain('specific volume ');
	expect(svg.match(/class="swc-drawing/g)?.length).toBe(1);

	// the print view draws the same view
	await page.goto(`/t/${TEAM}/sheets/${sheetId}/print`);
	await expect(page.locator('[data-chart="h-s"] svg.swc-drawing')).toBeVisible();
	await expect(page.locator('[data-chart="T-v"]')).toHaveCount(0);

	// two views side by side: P–h with T–s
	await page.goto(`/t/${TEAM}/sheets/${sheetId}`);
	await page.locator('[data-view-toggle="P-h"]').click();
	await expect(page.getByTestId('sheet-charts')).toHaveAttribute('data-view', 'P-h+h-s');
	await page.getByTestId('sheet-charts').screenshot({ path: 'tmp/views-pair.png' });
	await page.context().close();
});

// Water heated at 1 MPa a from 350 K to 600 K (Tsat(1 MPa) = 453.03 K, python3-iapws 1.5.2
// (Debian), IAPWS95(P=1, x=0)): the logger readings below are all single phase, off the dome.
const heater = {
	spec: {
		fluid: 'water',
		system: { kind: 'flow', massFlow: 0.1 },
		start: { T: 350, P: 1e6 },
		legs: [{ id: 'heat', process: 'isobaric', target: { T: 600 } }],
		// a pressure limit is a rule across P–h, a temperature limit its own isotherm
		limits: { designPressure: 1.2e6, designTemperature: 550 }
	},
	units: {
		system: 'si',
		pressureUnit: 'kPa',
		pressureReference: 'absolute',
		usPower: 'Btu/h',
		atmosphere: 101325
	},
	chart: { view: 'P-h', pressureScale: 'log', isolines: true }
};
const heaterLog = [
	'time [s],P [kPa a],T [°C]',
	'0,1000,80',
	'60,1000,120',
	'120,1000,150',
	'180,1000,220',
	'240,1000,260',
	'300,1000,300'
].join('\n');

test('a measured trace, a note flag and both design limits on the P–h view, and in its exported SVG', async ({
	browser
}) => {
	test.setTimeout(180_000);
	const api = await signedInRequest(DEMO.designer);
	const made = await api.post(`/api/v1/teams/${TEAM}/sheets`, {
		data: { title: `Feed heater ${Date.now().toString(36)}`, doc: heater }
	});
	expect(made.status(), await made.text()).toBe(201);
	const id = ((await made.json()) as { sheet: { id: string } }).sheet.id;
	const S = `/api/v1/teams/${TEAM}/sheets/${id}`;
	const up = await api.post(`${S}/traces?filename=heater.csv&name=Heater%20log`, {
		data: heaterLog,
		headers: { 'content-type': 'text/csv' }
	});
	expect(up.status(), await up.text()).toBe(201);
	const note = await api.post(`${S}/notes`, {
		data: { anchor: { kind: 'leg', legId: 'heat' }, body: 'Check the outlet against the log.' }
	});
	expect(note.status(), await note.text()).toBe(201);

	const page = await signedInPage(browser, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/${id}`);
	await expect(page.getByTestId('sheet-charts')).toHaveAttribute('data-view', 'P-h');
	const drawing = page.locator('[data-chart="P-h"] svg.swc-drawing');
	await expect(drawing).toBeVisible();
	// the trace: a line through the readings with a cross at each
	const traceLine = drawing.locator('path.swc-trace-line');
	await expect(traceLine).toHaveAttribute('d', /^M[\d.-]+,[\d.-]+(L[\d.-]+,[\d.-]+){5}$/, {
		timeout: 20_000
	});
	await expect(drawing.locator('path.swc-trace-mark:not(.sample)')).toHaveAttribute(
		'd',
		/^(M[\d.-]+,[\d.-]+h5M[\d.-]+,[\d.-]+v5){6}$/
	);
	// the note: a flag drawn beside the leg, and the page's button over it
	const flag = drawing.locator('g.swc-note-flag[data-anchor="leg:heat"]');
	await expect(flag).toHaveCount(1);
	await expect(flag.locator('text')).toHaveText('1');
	const marker = page.getByTestId('note-marker');
	await expect(marker).toHaveCount(1);
	await expect(marker).toHaveAttribute('aria-label', '1 open review note on L1');
	// the button sits over the drawn flag: the same bottom centre (where the flag points)
	const rect = (l: typeof flag) =>
		l.evaluate((e) => {
			const r = e.getBoundingClientRect();
			return { x: r.left + r.width / 2, bottom: r.bottom };
		});
	const [fb, mb] = [await rect(flag), await rect(marker)];
	expect(Math.abs(fb.x - mb.x)).toBeLessThan(1.5);
	expect(Math.abs(fb.bottom - mb.bottom)).toBeLessThan(1.5);
	// the key shows the flag's shape and says what it is; the chart's description names it
	await expect(drawing.locator('path.swc-note-flag-sample')).toHaveCount(1);
	await expect(drawing.locator('text.swc-key-text')).toContainText(['open review notes (count)']);
	await expect(drawing.locator('desc')).toContainText('Open review notes flagged: 1 on L1.');
	await expect(drawing.locator('desc')).toContainText('Measured trace Heater log: 6 points.');
	// both limits: design pressure straight across, design temperature along its isotherm
	const limits = drawing.locator('path.swc-limit:not(.sample)');
	await expect(limits).toHaveCount(2, { timeout: 20_000 });
	for (const d of await limits.evaluateAll((ls) => ls.map((l) => l.getAttribute('d') ?? '')))
		expect(d).toMatch(/^M[\d.-]+,[\d.-]+L/);
	await page.locator('[data-chart="P-h"]').screenshot({ path: 'tmp/views-ph-trace-note.png' });

	await waitSaved(page);
	await page.getByTestId('export-menu').locator('summary').click();
	const [dl] = await Promise.all([
		page.waitForEvent('download'),
		page.getByTestId('export-svg').click()
	]);
	const svg = await readDownload(dl);
	expect(svg).toContain('Pressure–specific enthalpy diagram');
	expect(svg).toMatch(/class="swc-trace-line" d="M[\d.-]+,[\d.-]+(L[\d.-]+,[\d.-]+){5}"/);
	expect(svg).toMatch(/<g class="swc-note-flag" data-anchor="leg:heat"[^>]*>/);
	expect(svg).toContain('1 open review note on L1');
	expect(svg).toContain('open review notes (count)');
	expect(svg).toContain('Open review notes flagged: 1 on L1.');
	expect(svg.match(/class="swc-limit"/g)?.length).toBe(2);

	// the print view draws the same on its P–h chart
	await page.goto(`/t/${TEAM}/sheets/${id}/print`);
	const printed = page.locator('[data-chart="P-h"] svg.swc-drawing');
	await expect(printed.locator('path.swc-trace-line')).toHaveAttribute('d', /^M.*L/);
	await expect(printed.locator('g.swc-note-flag[data-anchor="leg:heat"]')).toHaveCount(1);
	await expect(printed.locator('path.swc-limit:not(.sample)')).toHaveCount(2);
	await page.context().close();
	await api.dispose();
});
