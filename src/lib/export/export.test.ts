import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import type { PathResult, State } from '$lib/thermo/types';
import { unitPrefs } from '$lib/units';
import {
	composeMemoFigure,
	escapeXml,
	fitText,
	wrapText,
	type MemoFont,
	type MemoTitle
} from './memo';
import { sheetTable, tableMarkdown } from './table';
import { tableCsv } from './table-csv';
import {
	chemical,
	memoTitle,
	shortFormulation,
	signOffOverrides,
	unitsText,
	type TitleInput
} from './title';
import { pngSize } from './png';
import { vesselDoc } from '$lib/revisions/test-fixtures';
import { CAUTION_TITLE, LIQUID_FULL_CAUTION, PRESSURE_EQUIPMENT_CAUTION } from '$lib/cautions';
import { columnPoints, COLUMN_CHART_CSS, MEMO_COLUMN, MEMO_COLUMN_PIXEL_RATIO } from './memo';
import { findingLines, memoFindings, type MemoFindings } from './findings';
import { csvCell } from './table-csv';
import { mdText } from './table';
import { DRAWING_CSS } from '$lib/charts/style';
import { computePath, getFluid } from '$lib/thermo';
import { engineSpec } from '$lib/sheets/doc';
import { workedExample } from '$lib/sheets/templates';
import type { SheetDoc } from '$lib/sheets/types';
import Papa from 'papaparse';

const NO_FINDINGS: MemoFindings = {
	warnings: [],
	cycle: null,
	caution: PRESSURE_EQUIPMENT_CAUTION,
	cautionTitle: CAUTION_TITLE
};

/** A worked example, optionally changed, computed by the engine, with its findings. */
function example(id: string, patch?: (d: SheetDoc) => void) {
	const doc = workedExample(id)!.build();
	patch?.(doc);
	const r = computePath(engineSpec(doc));
	const findings = (style: 'unicode' | 'ascii' = 'unicode') =>
		memoFindings(
			{ result: r, legs: doc.spec.legs, prefs: doc.units, fluid: getFluid(doc.spec.fluid) },
			style
		);
	return { doc, result: r, findings };
}
/** The 50 L sealed vessel: water at 20 °C and 0 bar g heated shut-in to 40 °C, no design limits. */
const vessel50 = () =>
	example('vessel-v204-fire', (d) => {
		d.spec.system = { kind: 'closed', volume: 0.05 };
		d.spec.start = { T: 293.15, P: 101_325 };
		d.spec.legs[0].target = { T: 313.15 };
		d.spec.limits = {};
		d.units = { ...d.units, pressureUnit: 'bar', pressureReference: 'gauge' };
	});

// A hand-made result with round numbers: the table's job is units and layout, not physics.
function st(T: number, P: number, v: number, x: number | null, phase: State['phase']): State {
	return {
		fluid: 'water',
		phase,
		T,
		P,
		v,
		rho: 1 / v,
		u: 1_000_000,
		h: 1_100_000,
		s: 3000,
		x,
		cp: null,
		cv: null,
		w: null
	};
}
const result: PathResult = {
	fluid: 'water',
	system: { kind: 'closed', mass: 2, volume: 0.5 },
	atmosphericPressure: 101_325,
	limits: {},
	states: [
		{
			id: 'S1',
			state: st(373.15, 201_325, 0.25, 0.5, 'saturated-mixture'),
			extras: {
				Tsat: 373.15,
				superheat: null,
				subcooling: null,
				liquidVolumeFraction: 0.5,
				vaporVolumeFraction: 0.5
			}
		},
		{
			id: 'S2',
			state: st(473.15, 1_101_325, 0.25, null, 'superheated-vapor'),
			extras: {
				Tsat: 457.15,
				superheat: 16,
				subcooling: null,
				liquidVolumeFraction: null,
				vaporVolumeFraction: null
			}
		}
	],
	legs: [
		{
			id: 'heat',
			from: 'S1',
			to: 'S2',
			leg: {
				process: 'isochoric',
				start: st(373.15, 201_325, 0.25, 0.5, 'saturated-mixture'),
				end: st(473.15, 1_101_325, 0.25, null, 'superheated-vapor'),
				points: [],
				crossings: [],
				w: 0,
				q: 1_234_500,
				du: 1_234_500,
				dh: 1_459_500,
				ds: 2500,
				wShaft: -225_000,
				qFlow: 1_234_500
			},
			totals: { unit: 'J', Q: 2_469_000, W: 0, WShaft: -450_000, QFlow: 2_469_000 }
		}
	],
	perKg: {
		q: 1_234_500,
		w: 0,
		wShaft: -225_000,
		qFlow: 1_234_500,
		du: 1_234_500,
		dh: 1_459_500,
		ds: 2500
	},
	totals: { unit: 'J', Q: 2_469_000, W: 0, WShaft: -450_000, QFlow: 2_469_000 },
	cycle: null,
	limitEvents: [],
	warnings: []
};

describe('state and leg table', () => {
	it('gives headers with units and numbers in display units (SI, gauge)', () => {
		const t = sheetTable(result, unitPrefs({ pressureReference: 'gauge' }));
		expect(t.states.columns.map((c) => c.header)).toEqual([
			'State',
			'Phase',
			'T [°C]',
			'P [kPa g]',
			'v [m³/kg]',
			'u [kJ/kg]',
			'h [kJ/kg]',
			's [kJ/(kg·K)]',
			'x [–]',
			'superheat [K]',
			'subcooling [K]'
		]);
		// 373.15 K = 100 °C; 201 325 Pa a − 101 325 Pa = 100 kPa g (definitions)
		expect(t.states.rows[0]).toEqual([
			'S1',
			'saturated mixture',
			'100.00',
			'100.00',
			'0.25000',
			'1000.0',
			'1100.0',
			'3.0000',
			'0.5000',
			'',
			''
		]);
		expect(t.states.rows[1][9]).toBe('16.00');
		expect(t.legs.columns.map((c) => c.header)).toEqual([
			'Leg',
			'From',
			'To',
			'Process',
			'q [kJ/kg]',
			'w [kJ/kg]',
			'Δs [kJ/(kg·K)]',
			'Q [MJ]',
			'W [MJ]'
		]);
		expect(t.legs.rows[0]).toEqual([
			'L1',
			'S1',
			'S2',
			'isochoric',
			'1234.5',
			'0',
			'2.5000',
			'2.4690',
			'0'
		]);
	});

	it('switches to steady-flow columns and to US customary units', () => {
		const flow: PathResult = {
			...result,
			system: { kind: 'flow', massFlow: 2 },
			legs: [{ ...result.legs[0], totals: { ...result.legs[0].totals, unit: 'W' } }]
		};
		const t = sheetTable(flow, unitPrefs({ system: 'us' }));
		expect(t.legs.columns.map((c) => c.header).slice(4)).toEqual([
			'q [Btu/lbm]',
			'w shaft [Btu/lbm]',
			'Δs [Btu/(lbm·°R)]',
			'Q̇ [Btu/h]',
			'Ẇ shaft [Btu/h]'
		]);
		// 1 Btu/lbm = 2326 J/kg exactly (NIST SP 811, B.9); 225 000 J/kg → 96.733 Btu/lbm, negative: work on the fluid
		expect(t.legs.rows[0][5]).toBe('−96.733');
		// (°C × 1.8) + 32: 100 °C = 212 °F
		expect(t.states.rows[0][2]).toBe('212.00');
		expect(t.note).toMatch(/q − w shaft = Δh/);
	});

	it('writes CSV that a spreadsheet reads (ASCII minus, quoted where needed) and Markdown pipe tables', () => {
		const csv = tableCsv(result, unitPrefs(), ['Sheet V-204 fire case, Rev 2'], NO_FINDINGS);
		const lines = csv.split('\r\n');
		expect(lines[0]).toBe('"Sheet V-204 fire case, Rev 2"');
		expect(lines).toContain('States,,,,,,,,,,');
		expect(lines).toContain(
			'State,Phase,T [°C],P [kPa a],v [m³/kg],u [kJ/kg],h [kJ/kg],s [kJ/(kg·K)],x [–],superheat [K],subcooling [K]'
		);
		expect(lines).toContain(
			'S1,saturated mixture,100.00,201.32,0.25000,1000.0,1100.0,3.0000,0.5000,,'
		);
		expect(lines).toContain('Leg,From,To,Process,q [kJ/kg],w [kJ/kg],Δs [kJ/(kg·K)],Q [MJ],W [MJ]');
		const us = tableCsv(
			{ ...result, legs: [{ ...result.legs[0], leg: { ...result.legs[0].leg, q: -5000 } }] },
			unitPrefs(),
			[],
			NO_FINDINGS
		);
		expect(us).toContain('L1,S1,S2,isochoric,-5.0000,');
		const md = tableMarkdown(result, unitPrefs(), ['V-204 | fire case'], NO_FINDINGS);
		expect(md).toContain('V-204 \\| fire case');
		expect(md).toContain('| State | Phase | T [°C] | P [kPa a] |');
		expect(md).toContain('| :--- | :--- | ---: | ---: |');
		expect(md).toContain('| L1 | S1 | S2 | isochoric | 1234.5 | 0 | 2.5000 | 2.4690 | 0 |');
	});
});

describe('round-off in the exports', () => {
	// an isentropic flow leg as the engine can return it: q, Δs and Q̇ at the quadrature's round-off
	const noisy: PathResult = {
		...result,
		system: { kind: 'flow', massFlow: 0.1 },
		legs: [
			{
				...result.legs[0],
				leg: {
					...result.legs[0].leg,
					process: 'isentropic',
					qFlow: 2.7649e-10,
					ds: -2.2737e-13,
					wShaft: -25_000
				},
				totals: { unit: 'W', Q: 0, W: 0, WShaft: -2500, QFlow: 2.7649e-11 }
			}
		]
	};
	it('writes values below the screen’s round-off floor as 0 in the table, the CSV and the Markdown', () => {
		const row = sheetTable(noisy, unitPrefs()).legs.rows[0];
		expect(row.slice(4)).toEqual(['0', '−25.000', '0', '0', '−2.5000']);
		const csv = tableCsv(noisy, unitPrefs(), [], NO_FINDINGS);
		expect(csv).toContain('L1,S1,S2,isentropic,0,-25.000,0,0,-2.5000');
		expect(csv).not.toMatch(/e-1[0-9]/);
		const md = tableMarkdown(noisy, unitPrefs(), [], NO_FINDINGS);
		expect(md).toContain('| L1 | S1 | S2 | isentropic | 0 | −25.000 | 0 | 0 | −2.5000 |');
		expect(md).not.toMatch(/×10⁻¹/);
	});
	it('keeps a small value that is not round-off', () => {
		const small: PathResult = {
			...noisy,
			legs: [
				{
					...noisy.legs[0],
					leg: { ...noisy.legs[0].leg, qFlow: 0.5 },
					totals: { ...noisy.legs[0].totals, QFlow: 0.05 }
				}
			]
		};
		expect(sheetTable(small, unitPrefs()).legs.rows[0][4]).toBe('0.00050000');
	});
});

describe('findings in every export', () => {
	it('the 50 L vessel that starts liquid-full: the caution and the liquid-full warning in the CSV, the Markdown and the figure', () => {
		const { result: r, findings } = vessel50();
		const f = findings();
		const full = f.warnings.find((w) => w.title === 'Liquid-full')!;
		expect(full.severity).toBe('caution');
		expect(full.text).toContain(LIQUID_FULL_CAUTION);
		// (∂P/∂T)ᵥ = 450 643.7 Pa/K: python3-iapws 1.5.2 (Debian), IAPWS95, tests/reference/iapws-liquid-full.json
		expect(full.text).toContain('Here about 4.51 bar per K at constant volume.');
		const csv = tableCsv(
			r,
			unitPrefs({ pressureUnit: 'bar', pressureReference: 'gauge' }),
			['50 L vessel'],
			findings('ascii')
		);
		const rows = Papa.parse<string[]>(csv.trim()).data;
		expect(rows).toContainEqual(['Findings', 'Heading', 'Text']);
		expect(rows.find((x) => x[1] === 'Liquid-full')?.[0]).toBe('Caution');
		expect(rows.find((x) => x[1] === 'Liquid-full')?.[2]).toContain('4.51 bar per K');
		expect(rows).toContainEqual(['Caution', CAUTION_TITLE, PRESSURE_EQUIPMENT_CAUTION]);
		const md = tableMarkdown(r, unitPrefs(), ['50 L vessel'], f);
		expect(md).toContain('**Findings**');
		expect(md).toMatch(
			/- \*\*Caution — Liquid-full:\*\* L1 \(isochoric\) heats a closed system that is liquid-full/
		);
		expect(md).toContain(`> **${CAUTION_TITLE}.** These are design-exploration results.`);
		// the caption does not carry it a second time; the findings do, once
		expect(md.split('These are design-exploration results.')).toHaveLength(2);
		const lines = findingLines(f);
		expect(lines[0]).toMatch(/^Caution — Liquid-full: /);
		expect(lines[lines.length - 1]).toBe(PRESSURE_EQUIPMENT_CAUTION);
	});
	it('the R-134a heat pump: the cycle’s COP and the limits met', () => {
		const { result: r, findings } = example('heat-pump-hp410');
		expect(r.cycle?.kind).toBe('reverse');
		const f = findings();
		expect(f.cycle).toBe(
			`Reverse cycle: COP heating ${r.cycle!.copHeating!.toFixed(2)}, COP cooling ${r.cycle!.copCooling!.toFixed(2)}; ` +
				f.cycle!.split('; ')[1]
		);
		expect(f.cycle).toMatch(
			/heat added \d+\.\d+ kJ\/kg, heat rejected \d+\.\d+ kJ\/kg, net work by the fluid −\d+\.\d+ kJ\/kg\.$/
		);
		const md = tableMarkdown(r, unitPrefs(), [], f);
		expect(md).toContain(
			`- **Cycle:** Reverse cycle: COP heating ${r.cycle!.copHeating!.toFixed(2)}`
		);
		const csv = tableCsv(r, unitPrefs(), [], findings('ascii'));
		expect(Papa.parse<string[]>(csv.trim()).data.find((x) => x[0] === 'Cycle')?.[2]).toMatch(
			/^Reverse cycle: COP heating \d\.\d\d, COP cooling \d\.\d\d; .*net work by the fluid -\d/
		);
		const throttling = f.warnings.find((w) => w.title === 'Throttling is irreversible');
		expect(throttling).toBeDefined();
		// said once: under its title the text goes on from the leg's name
		expect(throttling!.text).toMatch(/^Leg L\d: no reversible heat or work belongs to it/);
		expect(findingLines(f).join('\n')).not.toMatch(
			/Throttling is irreversible: .*Throttling is irreversible/
		);
	});
	it('a path without warnings still carries the caution', () => {
		const md = tableMarkdown(result, unitPrefs(), [], NO_FINDINGS);
		expect(md).toContain('_No warnings for this path._');
		expect(md).toContain(PRESSURE_EQUIPMENT_CAUTION.slice(0, 40));
		expect(tableCsv(result, unitPrefs(), [], NO_FINDINGS)).toContain(`Caution,"${CAUTION_TITLE}"`);
	});
});

describe('export escaping', () => {
	it('Markdown: a sheet title with HTML or Markdown in it stays text', () => {
		const title = '<img src=x onerror=alert(1)> **V-204** [site](javascript:x) | a_b & `c`';
		expect(mdText(title)).toBe(
			'&lt;img src=x onerror=alert(1)&gt; \\*\\*V-204\\*\\* \\[site\\](javascript:x) \\| a\\_b &amp; \\`c\\`'
		);
		const md = tableMarkdown(result, unitPrefs(), [title, 'line\nbreak'], NO_FINDINGS);
		expect(md).not.toContain('<img');
		expect(md).toContain('&lt;img src=x onerror=alert(1)&gt;');
		expect(md).toContain('line break');
	});
	it('CSV: text cells that begin with = + - @ tab or CR are neutralised; numbers, negative ones too, stay numbers', () => {
		for (const bad of [
			'=1+2',
			'+1',
			'-2+3',
			'@SUM(A1)',
			'\t=x',
			'\r=x',
			'=HYPERLINK("http://x","y")'
		])
			expect(csvCell(bad)).toBe(`'${bad}`);
		expect(csvCell('-12.5')).toBe(`'-12.5`); // in a text column a leading minus is text
		expect(csvCell('-12.5', true)).toBe('-12.5'); // in a numeric column a plain number is data
		expect(csvCell('-1.2346e-5', true)).toBe('-1.2346e-5');
		expect(csvCell('=1+2', true)).toBe(`'=1+2`); // a formula is not a number, whatever the column
		expect(csvCell('-', true)).toBe(`'-`);
		expect(csvCell('V-204 fire case')).toBe('V-204 fire case');
		const csv = tableCsv(
			{ ...result, legs: [{ ...result.legs[0], leg: { ...result.legs[0].leg, q: -12_500 } }] },
			unitPrefs(),
			['=cmd|"/c calc"!A1', '-hostile'],
			NO_FINDINGS
		);
		const rows = Papa.parse<string[]>(csv.trim()).data;
		expect(rows[0]).toEqual([`'=cmd|"/c calc"!A1`]);
		expect(rows[1]).toEqual([`'-hostile`]);
		// the numeric cell keeps its minus and no apostrophe
		expect(rows.find((r) => r[0] === 'L1')?.[4]).toBe('-12.500');
		// no cell of the whole file starts a formula
		for (const r of rows) for (const c of r) expect(c, c).not.toMatch(/^[=+@\t\r]|^-(?!\d)/);
	});
});

describe('memo figure', () => {
	const fonts: MemoFont[] = [
		{
			family: 'IBM Plex Sans',
			weight: 400,
			style: 'normal',
			dataUrl: `data:font/woff2;base64,${readFileSync('node_modules/@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff2').toString('base64')}`
		}
	];
	const titleInput = (): TitleInput => ({
		sheetName: 'V-204 fire case <draft & check>',
		teamName: 'Brindlemoor Thermal Works',
		doc: vesselDoc(),
		fluid: {
			name: 'Water',
			formula: 'H2O',
			formulation: {
				name: 'IAPWS-95',
				reference: 'IAPWS R6-95(2018), Revised Release; W. Wagner and A. Pruß (2002)'
			}
		},
		revision: { number: 2, status: 'approved' },
		signOff: {
			designer: { name: 'Tobias Lindqvist', at: Date.UTC(2026, 0, 5) },
			checker: { name: 'Priya Ramanathan', at: Date.UTC(2026, 0, 6) },
			approver: { name: 'Maren Okafor', at: Date.UTC(2026, 0, 7) }
		},
		issued: Date.UTC(2026, 0, 8)
	});
	const title: MemoTitle = memoTitle(titleInput());

	it('a working draft is called one, and its date is not called an issue date', () => {
		const draft = memoTitle({ ...titleInput(), revision: null, basedOn: 2 });
		expect(draft.status).toBe('Working draft');
		expect(draft.dateLabel).toBe('Date');
		expect(draft.revision).toBe('Working draft (after Rev 2)');
		expect(title.dateLabel).toBe('Issued');
		const { svg } = composeMemoFigure({
			drawings: [{ svg: '<svg width="10" height="10"></svg>', width: 10, height: 10 }],
			title: draft,
			caution: 'c',
			fonts: []
		});
		expect(svg).toContain('>DATE<');
		expect(svg).not.toContain('>ISSUED<');
	});

	it('builds the title block from the sheet, the revision and the sign-off', () => {
		expect(title.revision).toBe('Rev 2');
		expect(title.status).toBe('Approved');
		expect(title.fluid).toBe('Water (H₂O)');
		expect(title.formulation).toBe('IAPWS-95 — IAPWS R6-95(2018)');
		expect(title.system).toBe('Closed system, 0.5\u00a0m³');
		expect(title.units).toBe(
			'SI · T °C · P kPa g (atmosphere 101.33\u00a0kPa a) · v m³/kg · u, h, q, w kJ/kg · s kJ/(kg·K)'
		);
		expect(chemical('CO2')).toBe('CO₂');
		expect(chemical('C2H2F4')).toBe('C₂H₂F₄');
		expect(
			shortFormulation({
				name: 'Span–Wagner (1996)',
				formula: 'CO2',
				formulation: { name: 'Span–Wagner (1996)', reference: 'R. Span, W. Wagner, …' }
			})
		).toBe('Span–Wagner (1996)');
		expect(unitsText(unitPrefs({ system: 'us' }))).toMatch(
			/^US customary · T °F · P psia · v ft³\/lbm/
		);
	});

	it('composes one self-contained SVG: drawings, title block, caution, embedded fonts, paper colours', () => {
		const drawing = {
			svg: '<svg xmlns="http://www.w3.org/2000/svg" width="600" height="400"><rect width="600" height="400"/></svg>',
			width: 600,
			height: 400
		};
		const fig = composeMemoFigure({
			drawings: [drawing, drawing],
			title,
			caution: PRESSURE_EQUIPMENT_CAUTION,
			fonts
		});
		expect(fig.width).toBe(600 * 2 + 12 + 32);
		expect(fig.height).toBeGreaterThan(400 + 46 + 4 * 36);
		expect(fig.svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
		expect(fig.svg.match(/<g class="swm-drawing"/g)).toHaveLength(2);
		expect(fig.svg).toContain('V-204 fire case &lt;draft &amp; check&gt;');
		for (const text of [
			'Rev 2',
			'Approved',
			'Water (H₂O)',
			'Tobias Lindqvist · 2026-01-05',
			'Priya Ramanathan · 2026-01-06',
			'Maren Okafor · 2026-01-07',
			'BTW-CALC-0417',
			'V-204',
			'2026-01-08',
			'DESIGNED',
			'CHECKED',
			'APPROVED'
		])
			expect(fig.svg).toContain(text);
		expect(fig.svg).toContain('These are design-exploration results.');
		expect(fig.svg).toContain('API 520/521');
		expect(fig.svg).toContain(
			"@font-face{font-family:'IBM Plex Sans';font-style:normal;font-weight:400;"
		);
		expect(fig.svg).toContain('data:font/woff2;base64,d09GMg');
		expect(fig.svg).toContain('--sw-sheet:#fbf8f1');
		expect(fig.fontCss).toContain('@font-face');
		// balanced: every element opened is closed (a cheap well-formedness check; the browser test parses it)
		const opened = (fig.svg.match(/<(svg|g|text|tspan|title|style)\b/g) ?? []).length;
		const closed = (fig.svg.match(/<\/(svg|g|text|tspan|title|style)>/g) ?? []).length;
		expect(opened).toBe(closed);
	});

	it('lays the drawings out stacked in a memo column, with every text at 7 pt or more when printed 85 mm wide', () => {
		const drawing = {
			svg: `<svg xmlns="http://www.w3.org/2000/svg" class="swc-drawing" width="300" height="260"><style>${DRAWING_CSS}</style><rect width="300" height="260"/></svg>`,
			width: 300,
			height: 260
		};
		const fig = composeMemoFigure({
			drawings: [drawing, drawing],
			title,
			caution: PRESSURE_EQUIPMENT_CAUTION,
			findings: ['Caution — Liquid-full: L1 fills the closed system with liquid.'],
			fonts,
			layout: 'column'
		});
		expect(fig.width).toBe(MEMO_COLUMN.widthPx);
		// 85 mm at 300 dpi: 85 / 25.4 × 300 = 1003.9 → 1004 px (definition of the inch)
		expect(Math.round(fig.width * MEMO_COLUMN_PIXEL_RATIO)).toBe(1004);
		expect(Math.round((MEMO_COLUMN.widthMm / 25.4) * MEMO_COLUMN.dpi)).toBe(MEMO_COLUMN.outputPx);
		// stacked: the second drawing below the first, both at x = margin + (inner − 300)/2
		const at = [
			...fig.svg.matchAll(/class="swm-drawing" transform="translate\(([\d.]+),([\d.]+)\)"/g)
		].map((m) => [Number(m[1]), Number(m[2])]);
		expect(at).toHaveLength(2);
		expect(at[0][0]).toBe(at[1][0]);
		expect(at[1][1]).toBeGreaterThanOrEqual(at[0][1] + 260);
		expect(fig.height).toBeGreaterThan(2 * 260);
		// every font size the figure sets itself, and every one the chart's sheet sets unless the column overrides it
		const own = fig.svg.split(DRAWING_CSS).join('');
		const sizes = [...own.matchAll(/font-size:\s*([\d.]+)px/g)].map((m) => Number(m[1]));
		expect(sizes.length).toBeGreaterThan(5);
		expect(Math.min(...sizes)).toBeGreaterThanOrEqual(MEMO_COLUMN.minFontPx);
		for (const rule of DRAWING_CSS.split('\n')) {
			const m = /^(.*?)\{.*font-size:\s*([\d.]+)px/.exec(rule);
			if (!m || Number(m[2]) >= MEMO_COLUMN.minFontPx) continue;
			const cls = m[1].trim().split(/\s+/).pop()!;
			expect(COLUMN_CHART_CSS, `${cls} is set larger in a column`).toContain(cls);
		}
		expect(fig.svg).toContain(COLUMN_CHART_CSS);
		// 9.5 px × 85/320 mm = 2.52 mm = 7.15 pt (1 pt = 25.4/72 mm)
		expect(columnPoints(MEMO_COLUMN.minFontPx)).toBeGreaterThanOrEqual(7);
		expect(columnPoints(MEMO_COLUMN.minFontPx)).toBeCloseTo(7.15, 2);
		expect(fig.svg).toContain('Liquid-full');
		// the title block in a column: every field whole (wrapped, never cut), the empty ones left out
		const words = fig.svg
			.replace(/<style>[\s\S]*?<\/style>/g, '')
			.replace(/<[^>]+>/g, ' ')
			.replace(/\s+/g, ' ');
		expect(words).toContain('Rev 2 · Approved · BTW-CALC-0417 · issued 2026-01-08');
		expect(words).toContain(
			'Designed Tobias Lindqvist · 2026-01-05; checked Priya Ramanathan · 2026-01-06; approved Maren Okafor · 2026-01-07'
		);
		expect(words).toContain('V-204 fire case &lt;draft &amp; check&gt;');
		expect(words).toContain('SI · T °C · P kPa g (atmosphere 101.33 kPa a) · v m³/kg'); // the no-break space reads as a space here
		expect(words).not.toContain('…');
		const opened = (fig.svg.match(/<(svg|g|text|tspan|title|style)\b/g) ?? []).length;
		const closed = (fig.svg.match(/<\/(svg|g|text|tspan|title|style)>/g) ?? []).length;
		expect(opened).toBe(closed);
	});

	it('scales a drawing wider than the column down to fit', () => {
		const wide = {
			svg: '<svg xmlns="http://www.w3.org/2000/svg" width="608" height="400"></svg>',
			width: 608,
			height: 400
		};
		const fig = composeMemoFigure({
			drawings: [wide],
			title,
			caution: 'c',
			fonts,
			layout: 'column'
		});
		expect(fig.svg).toMatch(/scale\(0\.5000\)/);
	});

	it('names a sign-off over open review notes in the figure', () => {
		const events = [
			{
				number: 2,
				kind: 'approved',
				actor: 'Maren Okafor',
				at: Date.UTC(2026, 0, 7),
				override: { reason: 'Datasheet follows with Rev 3.', openNotes: 1 }
			},
			{
				number: 2,
				kind: 'checked',
				actor: 'Priya Ramanathan',
				at: Date.UTC(2026, 0, 6),
				override: { reason: 'Both notes are for Rev 3.', openNotes: 2 }
			},
			{
				number: 2,
				kind: 'submitted',
				actor: 'Tobias Lindqvist',
				at: Date.UTC(2026, 0, 5),
				override: null
			},
			{
				number: 1,
				kind: 'checked',
				actor: 'Priya Ramanathan',
				at: Date.UTC(2026, 0, 1),
				override: { reason: 'older', openNotes: 1 }
			}
		];
		const lines = signOffOverrides(events, 2);
		expect(lines).toEqual([
			'Marked checked by Priya Ramanathan on 2026-01-06 over 2 open review notes: “Both notes are for Rev 3.”',
			'Approved by Maren Okafor on 2026-01-07 over 1 open review note: “Datasheet follows with Rev 3.”'
		]);
		const fig = composeMemoFigure({
			drawings: [],
			title: { ...title, overrides: lines },
			caution: 'c',
			fonts
		});
		expect(fig.svg).toContain(
			'Marked checked by Priya Ramanathan on 2026-01-06 over 2 open review'
		);
	});

	it('wraps and shortens text to the space it has', () => {
		const lines = wrapText(PRESSURE_EQUIPMENT_CAUTION, 400, 10);
		expect(lines.length).toBeGreaterThan(3);
		expect(lines.join(' ')).toBe(PRESSURE_EQUIPMENT_CAUTION);
		expect(Math.max(...lines.map((l) => l.length))).toBeLessThanOrEqual(Math.floor(400 / 5.4));
		expect(fitText('Jacketed steam kettle with a very long description', 100, 10)).toMatch(/…$/);
		expect(fitText('short', 100, 10)).toBe('short');
		expect(escapeXml(`"a" & 'b'`)).toBe('&quot;a&quot; &amp; &apos;b&apos;');
	});
});

describe('pngSize', () => {
	it('reads width and height from the IHDR chunk', () => {
		// a 3 × 2 PNG header (signature, IHDR length 13, "IHDR", width, height)
		const bytes = new Uint8Array([
			0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0,
			3, 0, 0, 0, 2, 8, 6, 0, 0, 0
		]);
		expect(pngSize(bytes)).toEqual({ width: 3, height: 2 });
		expect(pngSize(new Uint8Array(30))).toBeNull();
	});
});
