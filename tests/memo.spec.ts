import { expect, test, type Download, type Page } from '@playwright/test';
import { DEMO, TEAM, signedInRequest, signedInPage } from './helpers';

// The memo carries the findings: a sealed 50 L vessel of water that starts liquid-full gets its
// caution on the screen, in the print view and in every export, with the same words; a memo-column
// figure comes out 85 mm wide at 300 dpi; and signing off over open review notes asks for a reason
// that the sign-off log, the print view and the exports keep.

test.describe.configure({ mode: 'serial' });

async function readDownload(d: Download, encoding: BufferEncoding = 'utf8'): Promise<string> {
	const { readFile } = await import('node:fs/promises');
	return (await readFile((await d.path())!)).toString(encoding);
}

async function exported(page: Page, testId: string): Promise<Download> {
	await page.getByTestId('export-menu').locator('summary').click();
	const [dl] = await Promise.all([page.waitForEvent('download'), page.getByTestId(testId).click()]);
	return dl;
}

// water at 20 °C and 0 bar g in a sealed 50 L vessel, heated shut-in to 40 °C; no design limits
const vessel = {
	spec: {
		fluid: 'water',
		system: { kind: 'closed', volume: 0.05 },
		start: { T: 293.15, P: 101325 },
		legs: [{ id: 'fire', process: 'isochoric', target: { T: 313.15 } }]
	},
	units: {
		system: 'si',
		pressureUnit: 'bar',
		pressureReference: 'gauge',
		usPower: 'Btu/h',
		atmosphere: 101325
	}
};
// (∂P/∂T)ᵥ = 450 643.7 Pa/K at 20 °C, 1 atm: python3-iapws 1.5.2 (Debian), IAPWS95, tests/reference/iapws-liquid-full.json
const RATE = 'Here about 4.51 bar per K at constant volume.';
// end pressure 13.954 MPa a = 138.53 bar g: the same fixture (IAPWS95 at 40 °C and the start density)
const END_BAR_G = '138.53';

let sheetId = '';
let liquidFullText = '';

test('a vessel that starts liquid-full: one caution, the same words on the screen, in print, CSV, Markdown and the memo figures', async ({
	browser
}) => {
	test.setTimeout(120_000);
	const api = await signedInRequest(DEMO.designer);
	const made = await api.post(`/api/v1/teams/${TEAM}/sheets`, {
		data: { title: `Sealed 50 L vessel ${Date.now().toString(36)}`, doc: vessel }
	});
	expect(made.status(), await made.text()).toBe(201);
	sheetId = ((await made.json()) as { sheet: { id: string } }).sheet.id;

	const page = await signedInPage(browser, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/${sheetId}`);
	const warning = page.getByTestId('warnings').locator('[data-code="liquid-full"]');
	await expect(warning).toContainText(
		'heats a closed system that is liquid-full from the leg’s start'
	);
	await expect(warning).toContainText(RATE);
	liquidFullText = ((await warning.locator('.text').textContent()) ?? '')
		.replace(/\u00a0/g, ' ')
		.trim();
	expect(liquidFullText).toMatch(/^L1 \(isochoric\)/);

	// CSV: the findings block with the same text, the caution; numbers stay numbers
	const csv = await readDownload(await exported(page, 'export-csv'));
	expect(csv).toContain('Findings,Heading,Text');
	expect(csv).toContain(
		`Caution,Liquid-full,${liquidFullText.includes(',') ? `"${liquidFullText}"` : liquidFullText}`
	);
	expect(csv).toContain('These are design-exploration results.');
	expect(csv).toContain(END_BAR_G);
	// Markdown: the same
	const md = await readDownload(await exported(page, 'export-md'));
	expect(md).toContain(
		`- **Caution — Liquid-full:** ${liquidFullText.replace(/[\\`*_[\]|~#]/g, (c) => `\\${c}`)}`
	);
	expect(md).toContain(
		'> **Design exploration, not a design approval.** These are design-exploration results.'
	);

	// the wide SVG figure carries the finding as well
	const svg = await readDownload(await exported(page, 'export-svg'));
	expect(svg).toContain('Liquid-full');
	expect(svg).toContain('4.51 bar per K');

	// the memo-column PNG: 1004 px wide (85 mm at 300 dpi), the charts stacked and redrawn narrow
	const png = Buffer.from(
		await readDownload(await exported(page, 'export-column-png'), 'binary'),
		'binary'
	);
	expect(png.subarray(12, 16).toString('ascii')).toBe('IHDR');
	expect(png.readUInt32BE(16)).toBe(1004);
	expect(png.readUInt32BE(20)).toBeGreaterThan(1004);
	const col = await readDownload(await exported(page, 'export-column-svg'));
	const fig = await page.evaluate((text) => {
		const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
		const root = doc.documentElement;
		const drawings = [...doc.querySelectorAll('.swm-drawing > svg')].map((s) => ({
			w: Number(s.getAttribute('width')),
			t: s.parentElement!.getAttribute('transform') ?? ''
		}));
		return {
			error: doc.querySelector('parsererror')?.textContent ?? null,
			width: Number(root.getAttribute('width')),
			drawings
		};
	}, col);
	expect(fig.error).toBeNull();
	expect(fig.width).toBe(320);
	expect(fig.drawings).toHaveLength(2);
	// each chart redrawn at the column's width (not scaled down, so its text keeps its size)
	for (const d of fig.drawings) {
		expect(d.w).toBeLessThanOrEqual(304);
		expect(d.t).not.toContain('scale');
	}
	// the smallest text the column figure sets, measured in the browser: ≥ 7 pt at 85 mm
	const smallest = await page.evaluate((text) => {
		const host = document.createElement('div');
		host.style.cssText = 'position:fixed;left:-5000px;top:0';
		host.innerHTML = text;
		document.body.appendChild(host);
		const sizes = [...host.querySelectorAll('text, tspan')]
			.filter((t) => (t.textContent ?? '').trim())
			.map((t) => parseFloat(getComputedStyle(t).fontSize));
		host.remove();
		return Math.min(...sizes);
	}, col);
	// px → pt at 85 mm for 320 px: × (85 / 320) mm per px ÷ (25.4 / 72) mm per pt
	expect((smallest * (85 / 320)) / (25.4 / 72)).toBeGreaterThanOrEqual(7);
	// the live charts are back at their width
	await expect
		.poll(async () => (await page.getByTestId('sheet-charts').boundingBox())!.width)
		.toBeGreaterThan(400);

	// the print view of the draft: the findings with the same text, and the caution
	await page.goto(`/t/${TEAM}/sheets/${sheetId}/print?rev=draft`);
	const findings = page.getByTestId('print-findings');
	await expect(findings.locator('[data-severity="caution"]')).toContainText(liquidFullText);
	await expect(page.getByTestId('print-caution')).toContainText('ASME BPVC Section VIII');
});

test('the R-134a heat pump in print: the cycle’s COP, and round-off shown as 0', async ({
	browser
}) => {
	const api = await signedInRequest(DEMO.designer);
	const made = await api.post(`/api/v1/teams/${TEAM}/sheets`, {
		data: { example: 'heat-pump-hp410', title: `HP-410 memo ${Date.now().toString(36)}` }
	});
	expect(made.status()).toBe(201);
	const id = ((await made.json()) as { sheet: { id: string } }).sheet.id;
	const page = await signedInPage(browser, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/${id}/print?rev=draft`);
	await expect(page.getByTestId('print-cycle')).toContainText(
		/Reverse cycle: COP heating \d\.\d\d, COP cooling \d\.\d\d/
	);
	const table = page.getByTestId('path-table');
	await expect(table).toContainText('isentropic');
	await expect(table).not.toContainText('×10⁻¹');
});

test('signing off over open review notes asks for a reason; the log, the print view and the exports keep it', async ({
	browser
}) => {
	test.setTimeout(120_000);
	expect(sheetId, 'runs after the first test').not.toBe('');
	const designer = await signedInRequest(DEMO.designer);
	const R = `/api/v1/teams/${TEAM}/sheets/${sheetId}/revisions`;
	expect(
		(await designer.post(R, { data: { message: 'First issue', baseRevision: null } })).status()
	).toBe(201);
	expect((await designer.post(`${R}/1/submit`, { data: {} })).status()).toBe(200);
	const checkerApi = await signedInRequest(DEMO.checker);
	const note = await checkerApi.post(`/api/v1/teams/${TEAM}/sheets/${sheetId}/notes`, {
		data: { anchor: { kind: 'sheet' }, body: 'Which relief device covers this case?', revision: 1 }
	});
	expect(note.status(), await note.text()).toBe(201);

	// the API refuses without a reason, in the error shape, with the count
	const refused = await checkerApi.post(`${R}/1/check`, { data: {} });
	expect(refused.status()).toBe(409);
	const body = (await refused.json()) as {
		error: { code: string; openNotes: number; message: string };
	};
	expect(body.error).toMatchObject({ code: 'open-notes', openNotes: 1 });
	expect(body.error.message).toMatch(/1 review note is still open/);
	expect((await checkerApi.post(`${R}/1/check`, { data: { override: '  ' } })).status()).toBe(400);

	// the checker in the browser: Mark checked → asked for the reason → checked over the note
	const checker = await signedInPage(browser, DEMO.checker);
	await checker.goto(`/t/${TEAM}/sheets/${sheetId}/revisions/1`);
	await checker.getByRole('tab', { name: /Sign-off/ }).click();
	await checker.getByTestId('check-revision').click();
	const panel = checker.getByTestId('override-panel');
	await expect(panel).toContainText('1 review note is still open');
	await expect(checker.getByTestId('signoff-state')).toContainText('waiting for a check');
	await checker.getByTestId('override-confirm').click();
	await expect(checker.getByRole('alert')).toContainText('Give the reason');
	await checker
		.getByTestId('override-reason')
		.fill('Relief device is covered by the site PSV study; note stays open for Rev 2.');
	await checker.getByTestId('override-confirm').click();
	await expect(checker.getByTestId('signoff-state')).toContainText('Checked by Priya Ramanathan');
	await expect(panel).toBeHidden();
	await checker.getByText('Sign-off log').click();
	await expect(checker.getByTestId('signoff-override')).toContainText(
		'over 1 open review note: “Relief device is covered by the site PSV study; note stays open for Rev 2.”'
	);

	// the print view of Rev 1 and its Markdown export name the override
	await checker.goto(`/t/${TEAM}/sheets/${sheetId}/print?rev=1`);
	await expect(checker.getByTestId('print-override')).toContainText(
		'Marked checked by Priya Ramanathan'
	);
	await expect(checker.getByTestId('print-override')).toContainText(
		'over 1 open review note: “Relief device is covered by the site PSV study'
	);
	await checker.goto(`/t/${TEAM}/sheets/${sheetId}/revisions/1`);
	const md = await readDownload(await exported(checker, 'export-md'));
	expect(md).toContain('Marked checked by Priya Ramanathan on');
	expect(md).toContain(
		'over 1 open review note: “Relief device is covered by the site PSV study; note stays open for Rev 2.”'
	);
});
