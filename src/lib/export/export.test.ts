import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import type { PathResult, State } from '../thermo/types';
import { unitPrefs } from '../units';
import { composeMemoFigure, escapeXml, fitText, wrapText, type MemoFont, type MemoTitle } from './memo';
import { sheetTable, tableMarkdown } from './table';
import { tableCsv } from './table-csv';
import { chemical, memoTitle, shortFormulation, unitsText, type TitleInput } from './title';
import { pngSize } from './png';
import { vesselDoc } from '../revisions/test-fixtures';
import { PRESSURE_EQUIPMENT_CAUTION } from '../cautions';

// A hand-made result with round numbers: the table's job is units and layout, not physics.
function st(T: number, P: number, v: number, x: number | null, phase: State['phase']): State {
	return { fluid: 'water', phase, T, P, v, rho: 1 / v, u: 1_000_000, h: 1_100_000, s: 3000, x, cp: null, cv: null, w: null };
}
const result: PathResult = {
	fluid: 'water',
	system: { kind: 'closed', mass: 2, volume: 0.5 },
	atmosphericPressure: 101_325,
	limits: {},
	states: [
		{ id: 'S1', state: st(373.15, 201_325, 0.25, 0.5, 'saturated-mixture'), extras: { Tsat: 373.15, superheat: null, subcooling: null, liquidVolumeFraction: 0.5, vaporVolumeFraction: 0.5 } },
		{ id: 'S2', state: st(473.15, 1_101_325, 0.25, null, 'superheated-vapor'), extras: { Tsat: 457.15, superheat: 16, subcooling: null, liquidVolumeFraction: null, vaporVolumeFraction: null } }
	],
	legs: [
		{
			id: 'heat',
			from: 'S1',
			to: 'S2',
			leg: { process: 'isochoric', start: st(373.15, 201_325, 0.25, 0.5, 'saturated-mixture'), end: st(473.15, 1_101_325, 0.25, null, 'superheated-vapor'), points: [], crossings: [], w: 0, q: 1_234_500, du: 1_234_500, dh: 1_459_500, ds: 2500, wShaft: -225_000, qFlow: 1_234_500 },
			totals: { unit: 'J', Q: 2_469_000, W: 0, WShaft: -450_000, QFlow: 2_469_000 }
		}
	],
	perKg: { q: 1_234_500, w: 0, wShaft: -225_000, qFlow: 1_234_500, du: 1_234_500, dh: 1_459_500, ds: 2500 },
	totals: { unit: 'J', Q: 2_469_000, W: 0, WShaft: -450_000, QFlow: 2_469_000 },
	cycle: null,
	limitEvents: [],
	warnings: []
};

describe('state and leg table', () => {
	it('gives headers with units and numbers in display units (SI, gauge)', () => {
		const t = sheetTable(result, unitPrefs({ pressureReference: 'gauge' }));
		expect(t.states.columns.map((c) => c.header)).toEqual([
			'State', 'Phase', 'T [°C]', 'P [kPa g]', 'v [m³/kg]', 'u [kJ/kg]', 'h [kJ/kg]', 's [kJ/(kg·K)]', 'x [–]', 'superheat [K]', 'subcooling [K]'
		]);
		// 373.15 K = 100 °C; 201 325 Pa a − 101 325 Pa = 100 kPa g (definitions)
		expect(t.states.rows[0]).toEqual(['S1', 'saturated mixture', '100.00', '100.00', '0.25000', '1000.0', '1100.0', '3.0000', '0.5000', '', '']);
		expect(t.states.rows[1][9]).toBe('16.00');
		expect(t.legs.columns.map((c) => c.header)).toEqual(['Leg', 'From', 'To', 'Process', 'q [kJ/kg]', 'w [kJ/kg]', 'Δs [kJ/(kg·K)]', 'Q [MJ]', 'W [MJ]']);
		expect(t.legs.rows[0]).toEqual(['L1', 'S1', 'S2', 'isochoric', '1234.5', '0', '2.5000', '2.4690', '0']);
	});

	it('switches to steady-flow columns and to US customary units', () => {
		const flow: PathResult = { ...result, system: { kind: 'flow', massFlow: 2 }, legs: [{ ...result.legs[0], totals: { ...result.legs[0].totals, unit: 'W' } }] };
		const t = sheetTable(flow, unitPrefs({ system: 'us' }));
		expect(t.legs.columns.map((c) => c.header).slice(4)).toEqual(['q [Btu/lbm]', 'w shaft [Btu/lbm]', 'Δs [Btu/(lbm·°R)]', 'Q̇ [Btu/h]', 'Ẇ shaft [Btu/h]']);
		// 1 Btu/lbm = 2326 J/kg exactly (NIST SP 811, B.9); 225 000 J/kg → 96.733 Btu/lbm, negative: work on the fluid
		expect(t.legs.rows[0][5]).toBe('−96.733');
		// (°C × 1.8) + 32: 100 °C = 212 °F
		expect(t.states.rows[0][2]).toBe('212.00');
		expect(t.note).toMatch(/q − w shaft = Δh/);
	});

	it('writes CSV that a spreadsheet reads (ASCII minus, quoted where needed) and Markdown pipe tables', () => {
		const csv = tableCsv(result, unitPrefs(), ['Sheet V-204 fire case, Rev 2']);
		const lines = csv.split('\r\n');
		expect(lines[0]).toBe('"Sheet V-204 fire case, Rev 2"');
		expect(lines).toContain('States,,,,,,,,,,');
		expect(lines).toContain('State,Phase,T [°C],P [kPa a],v [m³/kg],u [kJ/kg],h [kJ/kg],s [kJ/(kg·K)],x [–],superheat [K],subcooling [K]');
		expect(lines).toContain('S1,saturated mixture,100.00,201.32,0.25000,1000.0,1100.0,3.0000,0.5000,,');
		expect(lines).toContain('Leg,From,To,Process,q [kJ/kg],w [kJ/kg],Δs [kJ/(kg·K)],Q [MJ],W [MJ]');
		const us = tableCsv({ ...result, legs: [{ ...result.legs[0], leg: { ...result.legs[0].leg, q: -5000 } }] }, unitPrefs());
		expect(us).toContain('L1,S1,S2,isochoric,-5.0000,');
		const md = tableMarkdown(result, unitPrefs(), ['V-204 | fire case']);
		expect(md).toContain('V-204 \\| fire case');
		expect(md).toContain('| State | Phase | T [°C] | P [kPa a] |');
		expect(md).toContain('| :--- | :--- | ---: | ---: |');
		expect(md).toContain('| L1 | S1 | S2 | isochoric | 1234.5 | 0 | 2.5000 | 2.4690 | 0 |');
	});
});

describe('memo figure', () => {
	const fonts: MemoFont[] = [
		{ family: 'IBM Plex Sans', weight: 400, style: 'normal', dataUrl: `data:font/woff2;base64,${readFileSync('node_modules/@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff2').toString('base64')}` }
	];
	const titleInput = (): TitleInput => ({
		sheetName: 'V-204 fire case <draft & check>',
		teamName: 'Brindlemoor Thermal Works',
		doc: vesselDoc(),
		fluid: { name: 'Water', formula: 'H2O', formulation: { name: 'IAPWS-95', reference: 'IAPWS R6-95(2018), Revised Release; W. Wagner and A. Pruß (2002)' } },
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
		const { svg } = composeMemoFigure({ drawings: [{ svg: '<svg width="10" height="10"></svg>', width: 10, height: 10 }], title: draft, caution: 'c', fonts: [] });
		expect(svg).toContain('>DATE<');
		expect(svg).not.toContain('>ISSUED<');
	});

	it('builds the title block from the sheet, the revision and the sign-off', () => {
		expect(title.revision).toBe('Rev 2');
		expect(title.status).toBe('Approved');
		expect(title.fluid).toBe('Water (H₂O)');
		expect(title.formulation).toBe('IAPWS-95 — IAPWS R6-95(2018)');
		expect(title.system).toBe('Closed system, 0.5\u00a0m³');
		expect(title.units).toBe('SI · T °C · P kPa g (atmosphere 101.33\u00a0kPa a) · v m³/kg · u, h, q, w kJ/kg · s kJ/(kg·K)');
		expect(chemical('CO2')).toBe('CO₂');
		expect(chemical('C2H2F4')).toBe('C₂H₂F₄');
		expect(shortFormulation({ name: 'Span–Wagner (1996)', formula: 'CO2', formulation: { name: 'Span–Wagner (1996)', reference: 'R. Span, W. Wagner, …' } })).toBe('Span–Wagner (1996)');
		expect(unitsText(unitPrefs({ system: 'us' }))).toMatch(/^US customary · T °F · P psia · v ft³\/lbm/);
	});

	it('composes one self-contained SVG: drawings, title block, caution, embedded fonts, paper colours', () => {
		const drawing = { svg: '<svg xmlns="http://www.w3.org/2000/svg" width="600" height="400"><rect width="600" height="400"/></svg>', width: 600, height: 400 };
		const fig = composeMemoFigure({ drawings: [drawing, drawing], title, caution: PRESSURE_EQUIPMENT_CAUTION, fonts });
		expect(fig.width).toBe(600 * 2 + 12 + 32);
		expect(fig.height).toBeGreaterThan(400 + 46 + 4 * 36);
		expect(fig.svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
		expect(fig.svg.match(/<g class="swm-drawing"/g)).toHaveLength(2);
		expect(fig.svg).toContain('V-204 fire case &lt;draft &amp; check&gt;');
		for (const text of ['Rev 2', 'Approved', 'Water (H₂O)', 'Tobias Lindqvist · 2026-01-05', 'Priya Ramanathan · 2026-01-06', 'Maren Okafor · 2026-01-07', 'BTW-CALC-0417', 'V-204', '2026-01-08', 'DESIGNED', 'CHECKED', 'APPROVED'])
			expect(fig.svg).toContain(text);
		expect(fig.svg).toContain('These are design-exploration results.');
		expect(fig.svg).toContain('API 520/521');
		expect(fig.svg).toContain("@font-face{font-family:'IBM Plex Sans';font-style:normal;font-weight:400;");
		expect(fig.svg).toContain('data:font/woff2;base64,d09GMg');
		expect(fig.svg).toContain('--sw-sheet:#fbf8f1');
		expect(fig.fontCss).toContain('@font-face');
		// balanced: every element opened is closed (a cheap well-formedness check; the browser test parses it)
		const opened = (fig.svg.match(/<(svg|g|text|tspan|title|style)\b/g) ?? []).length;
		const closed = (fig.svg.match(/<\/(svg|g|text|tspan|title|style)>/g) ?? []).length;
		expect(opened).toBe(closed);
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
		const bytes = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 3, 0, 0, 0, 2, 8, 6, 0, 0, 0]);
		expect(pngSize(bytes)).toEqual({ width: 3, height: 2 });
		expect(pngSize(new Uint8Array(30))).toBeNull();
	});
});
