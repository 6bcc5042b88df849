import { expect, test, type Page } from '@playwright/test';
import { BASE, DEMO, TEAM, signInPage } from './helpers';

test.describe('new sheet form', () => {
	test('a directly loaded new-sheet page keeps the title when the pressure unit changes, and creates the sheet', async ({
		page
	}) => {
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

test('a closed cycle shows its last state beside its first on both charts, not over it', async ({
	page
}) => {
	await signInPage(page, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByRole('button', { name: /Start a sheet from HP-410/ }).click();
	await expect(page.getByTestId('sheet-title')).toHaveText('HP-410 R-134a heat-pump loop');
	for (const kind of ['T-v', 'P-v']) {
		const discs = page.locator(`[data-chart="${kind}"] g.swc-state`);
		await expect(discs.filter({ hasText: /^S5$/ })).toHaveCount(1);
		const box = async (label: string) =>
			(await discs
				.filter({ hasText: new RegExp(`^${label}$`) })
				.locator('circle.swc-state-disc')
				.boundingBox())!;
		const [s1, s5] = [await box('S1'), await box('S5')];
		// side by side: the discs do not overlap, and they sit at the same height
		const apart = Math.abs(s1.x - s5.x) >= s1.width - 1 || Math.abs(s1.y - s5.y) >= s1.height - 1;
		expect(apart, `${kind}: S1 at ${s1.x},${s1.y}, S5 at ${s5.x},${s5.y}`).toBe(true);
		expect(Math.abs(s1.y - s5.y)).toBeLessThan(1);
		// and a screen reader hears where it is
		await expect(
			page.locator(`[data-chart="${kind}"] circle.swc-hit-state[aria-label^="State S5,"]`)
		).toHaveAttribute('aria-label', /the same point as S1, drawn beside it$/);
	}
});

test('a sealed 50 L vessel started by fill level: 80 % liquid at 20 °C, kept as such over a reload and in the API', async ({
	page
}) => {
	await signInPage(page, DEMO.designer);
	const title = `Fill V-50 ${Date.now().toString(36)}`;
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByLabel('Title').fill(title);
	await page.getByLabel('Sized by').selectOption('volume');
	await page.getByLabel('Volume').fill('50 L');
	await page.locator('#f-valueA').fill('20 °C');
	await page.locator('#f-valueB').fill('0.5');
	await page.getByRole('button', { name: 'Create sheet' }).click();
	await expect(page.getByTestId('sheet-title')).toHaveText(title);
	await page.getByRole('tab', { name: /Setup/ }).click();
	const fill = page.getByTestId('setup-fill');
	await fill.getByLabel('Liquid fill, % of the volume').fill('80');
	await fill.getByLabel('At a temperature or pressure').fill('20 °C');
	await fill.getByRole('button', { name: 'Set S1 by fill level' }).click();
	await expect(fill.getByTestId('start-fill-current')).toContainText(
		'fill 80\u00a0% liquid by volume at 20.00\u00a0°C'
	);
	await page.getByRole('tab', { name: /States/ }).click();
	await expect(page.getByTestId('start-fill')).toHaveText(
		'fill 80\u00a0% liquid by volume at 20.00\u00a0°C'
	);
	await expect(page.getByTestId('phase-S1')).toContainText('saturated mixture');
	await expect(page.getByTestId('phase-S1')).toContainText('liquid 80.00');
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved');
	const url = page.url();
	await page.reload();
	await expect(page.getByTestId('start-fill')).toHaveText(
		'fill 80\u00a0% liquid by volume at 20.00\u00a0°C'
	);
	const id = url.split('/').pop()!;
	const res = await page.request.get(`/api/v1/teams/${TEAM}/sheets/${id}`);
	const { sheet } = (await res.json()) as {
		sheet: { doc: { startSpec: unknown; spec: { start: { T: number; v: number } } } };
	};
	expect(sheet.doc.startSpec).toEqual({ kind: 'fill', fraction: 0.8, T: 293.15 });
	// python3-iapws 1.5.2 (Debian): IAPWS95(T=293.15, x=0).rho = 998.16180134, x=1: 0.017314008205 → v = 1/(0.8 ρ′ + 0.2 ρ″)
	expect(Math.abs(sheet.doc.spec.start.v / 0.0012522965492665402 - 1)).toBeLessThan(1e-6);
	// typing a property of S1 replaces the fill by two properties
	const tCell = page.locator('tr[data-label="S1"] [data-prop="T"]');
	await tCell.fill('25 °C');
	await tCell.press('Enter');
	await expect(page.getByTestId('start-fill')).toHaveCount(0);
	await expect(page.getByTestId('phase-S1')).toContainText('saturated mixture');
});

test('40 °C typed in a pressure cell sets the saturation pressure at 40 °C, and the cell says so', async ({
	page
}) => {
	await signInPage(page, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByLabel('Title').fill(`Psat typed ${Date.now().toString(36)}`);
	await page.getByLabel('Sized by').selectOption('perkg');
	await page.locator('#f-valueA').fill('20 °C');
	await page.locator('#f-valueB').fill('0.5');
	await page.getByRole('button', { name: 'Create sheet' }).click();
	await expect(page.getByTestId('phase-S1')).toContainText('saturated mixture');
	const p = page.locator('tr[data-label="S1"] [data-prop="P"]');
	await p.fill('40 °C');
	await p.press('Enter');
	await expect(page.locator('tr[data-label="S1"] .cell-note')).toContainText(
		'40.00\u00a0°C typed as a pressure: the saturation pressure at 40.00\u00a0°C'
	);
	// S1 is now fixed by x and P = Psat(40 °C): its temperature reads 40.00 °C
	await expect(page.locator('tr[data-label="S1"] [data-prop="T"]')).toHaveValue('40.00');
	// python3-iapws 1.5.2 (Debian): IAPWS95(T=313.15, x=0).P = 7.384938 kPa
	expect(Math.abs(Number((await p.inputValue()).replace(/\s.*$/, '')) / 7.384938 - 1)).toBeLessThan(
		2e-4
	);
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved');
});

function sealedVesselDoc() {
	return {
		version: 1,
		description: '',
		startSpec: { kind: 'fill', fraction: 0.8, T: 293.15 },
		spec: {
			fluid: 'water',
			system: { kind: 'closed', volume: 0.05 },
			start: { T: 293.15, x: 0.5 },
			legs: [{ id: 'Lheat01', process: 'isochoric', target: { T: 473.15 } }]
		},
		units: {
			system: 'si',
			pressureUnit: 'MPa',
			pressureReference: 'absolute',
			usPower: 'Btu/h',
			atmosphere: 101325
		},
		chart: { view: 'both', pressureScale: 'log', isolines: false },
		titleBlock: { project: '', equipment: '', tag: '', documentNumber: '', site: '' }
	};
}

async function openSealedVessel(page: Page): Promise<string> {
	const made = await page.request.post(`/api/v1/teams/${TEAM}/sheets`, {
		data: { title: `Heat-up ${Date.now().toString(36)}`, doc: sealedVesselDoc() }
	});
	expect(made.status(), await made.text()).toBe(201);
	const id = ((await made.json()) as { sheet: { id: string } }).sheet.id;
	await page.goto(`/t/${TEAM}/sheets/${id}`);
	return id;
}

test('a sealed vessel heated shut in, "to saturation": the leg ends liquid-full at the liquid line', async ({
	page
}) => {
	await signInPage(page, DEMO.designer);
	const id = await openSealedVessel(page);
	await expect(page.getByTestId('start-fill')).toContainText('fill 80');
	await page.getByRole('button', { name: 'End leg L1 on the saturation line' }).click();
	await expect(page.getByTestId('leg-to-saturation')).toHaveText(
		'to saturation (saturated liquid, x = 0)'
	);
	await expect(page.getByTestId('phase-S2')).toContainText('saturated liquid');
	// python3-iapws 1.5.2 (Debian): bisection on IAPWS95(T, x=0).rho = 1/v₁ → T = 523.393 K = 250.24 °C, P = 3.9925 MPa
	await expect(page.locator('tr[data-label="S2"] [data-prop="T"]')).toHaveValue(/^250\.2[34]$/);
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved');
	const res = await page.request.get(`/api/v1/teams/${TEAM}/sheets/${id}`);
	const { sheet } = (await res.json()) as {
		sheet: { doc: { spec: { legs: { to?: string; target: unknown }[] } } };
	};
	expect(sheet.doc.spec.legs[0]).toMatchObject({ to: 'saturation', target: { x: 0 } });
	// typing another end makes it an ordinary leg again
	const t2 = page.locator('tr[data-label="S2"] [data-prop="T"]');
	await t2.fill('200 °C');
	await t2.press('Enter');
	await expect(page.getByTestId('leg-to-saturation')).toHaveCount(0);
	await expect(
		page.getByRole('button', { name: 'End leg L1 on the saturation line' })
	).toBeVisible();
	await expect(page.locator('[data-save-status]')).toHaveAttribute('data-save-status', 'saved');
	const after = (await (await page.request.get(`/api/v1/teams/${TEAM}/sheets/${id}`)).json()) as {
		sheet: { doc: { spec: { legs: { to?: string; target: { T?: number } }[] } } };
	};
	expect(after.sheet.doc.spec.legs[0].to).toBeUndefined();
	expect(after.sheet.doc.spec.legs[0].target.T).toBeCloseTo(473.15, 6);
});

test('logger readings on the saturation line are drawn across the dome (v open, said in the key); a malformed log names every problem', async ({
	page
}) => {
	await signInPage(page, DEMO.designer);
	await openSealedVessel(page);
	await page.getByRole('tab', { name: /Traces/ }).click();
	const panel = page.getByTestId('trace-panel');
	// a sealed heat-up: P and T on the saturation line all the way (python3-iapws 1.5.2 (Debian), IAPWS95(T, x=0).P)
	await panel.getByLabel(/Logger file/).setInputFiles({
		name: 'heat-up.csv',
		mimeType: 'text/csv',
		buffer: Buffer.from(
			'time [min],P [kPa a],T [°C]\n0,19.946,60\n10,101.418,100\n20,361.539,140\n30,1002.811,180\n'
		)
	});
	await panel.getByRole('button', { name: 'Upload trace' }).click();
	await expect(panel.getByTestId('trace-item')).toContainText('4 on the saturation line');
	await expect(panel).toContainText('no v is assumed');
	for (const kind of ['T-v', 'P-v']) {
		const band = page.locator(`[data-chart="${kind}"] path.swc-trace-band:not(.sample)`);
		// one segment across the dome per reading, none joined into a sweep in v
		await expect(band).toHaveAttribute('d', /^(M[\d.]+,[\d.]+L[\d.]+,[\d.]+){4}$/);
		const d = (await band.getAttribute('d'))!;
		for (const seg of d.split('M').filter(Boolean)) {
			const [[, y1], [, y2]] = seg.split('L').map((p) => p.split(',').map(Number));
			expect(Math.abs(y1 - y2), `${kind}: a band is level (one T or one P)`).toBeLessThan(0.2);
		}
		await expect(
			page.locator(`[data-chart="${kind}"] .swc-key-text`, {
				hasText: 'measured at saturation (v not fixed by P, T)'
			})
		).toHaveCount(1);
	}

	await panel.getByLabel(/Logger file/).setInputFiles({
		name: 'broken.csv',
		mimeType: 'text/csv',
		buffer: Buffer.from('time,P [kPa],T [°C]\n0,100,20\n5,abc,21\n')
	});
	await panel.getByRole('button', { name: 'Upload trace' }).click();
	const refusal = page.getByTestId('trace-refusal');
	await expect(refusal).toContainText('The file has 3 problems; nothing was saved.');
	await expect(refusal).toContainText('has no unit');
	await expect(refusal).toContainText('absolute or gauge');
	await expect(refusal).toContainText('line 3: "abc"');
	const lines = await refusal
		.getByTestId('trace-rejected')
		.locator('tbody tr td:first-child')
		.allTextContents();
	expect(lines.map(Number)).toEqual([1, 1, 3]);
});

test('Compare draws the older revision as its own band, keyed by its label, not as "measured"', async ({
	page
}) => {
	await signInPage(page, DEMO.designer);
	const id = await openSealedVessel(page);
	const rev = await page.request.post(`/api/v1/teams/${TEAM}/sheets/${id}/revisions`, {
		data: { message: 'First issue', baseRevision: null },
		headers: { origin: BASE }
	});
	expect(rev.status(), await rev.text()).toBe(201);
	await page.goto(`/t/${TEAM}/sheets/${id}/compare?a=1&b=draft`);
	await expect(page.getByTestId('compare-page')).toBeVisible();
	for (const kind of ['T-v', 'P-v']) {
		const chart = page.locator(`[data-chart="${kind}"]`);
		await expect(chart.locator('path.swc-revision-line:not(.sample)')).toHaveAttribute('d', /^M/);
		await expect(chart.locator('.swc-key-text', { hasText: 'Rev 1' })).toHaveCount(1);
		await expect(chart.locator('.swc-key-text', { hasText: 'measured' })).toHaveCount(0);
	}
});

test('the new-sheet form takes a liquid fill with a temperature, and a temperature given for P as the saturation pressure', async ({
	page
}) => {
	await signInPage(page, DEMO.designer);
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByLabel('Title').fill(`Form fill ${Date.now().toString(36)}`);
	await page.getByLabel('Volume').fill('50 L');
	await page.locator('#f-propA').selectOption('fill');
	await page.locator('#f-valueA').fill('80');
	await page.locator('#f-propB').selectOption('T');
	await page.locator('#f-valueB').fill('20 °C');
	await page.getByRole('button', { name: 'Create sheet' }).click();
	await expect(page.getByTestId('start-fill')).toHaveText(
		'fill 80\u00a0% liquid by volume at 20.00\u00a0°C'
	);

	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByLabel('Title').fill(`Form Psat ${Date.now().toString(36)}`);
	await page.getByLabel('Sized by').selectOption('perkg');
	await page.locator('#f-propA').selectOption('P');
	await page.locator('#f-valueA').fill('40 °C');
	await page.locator('#f-propB').selectOption('x');
	await page.locator('#f-valueB').fill('0.5');
	await page.getByRole('button', { name: 'Create sheet' }).click();
	await expect(page.getByTestId('phase-S1')).toContainText('saturated mixture');
	await expect(page.locator('tr[data-label="S1"] [data-prop="T"]')).toHaveValue('40.00');

	// a fill with a property other than T or P is refused beside the field, nothing created
	await page.goto(`/t/${TEAM}/sheets/new`);
	await page.getByLabel('Title').fill('Never made');
	await page.getByLabel('Sized by').selectOption('perkg');
	await page.locator('#f-propA').selectOption('fill');
	await page.locator('#f-valueA').fill('80');
	await page.locator('#f-propB').selectOption('h');
	await page.locator('#f-valueB').fill('100 kJ/kg');
	await page.getByRole('button', { name: 'Create sheet' }).click();
	await expect(page.locator('.field-error')).toContainText(
		'A liquid fill goes with a temperature or a pressure'
	);
	await expect(page).toHaveURL(/\/sheets\/new/);
});
