import { describe, expect, it } from 'vitest';
import { computePath, transport, type PathResult } from '$lib/thermo';
import { unitPrefs } from '$lib/units';
import type { MemoFindings } from './findings';
import { sheetTable, tableMarkdown, transportSources } from './table';
import { tableCsv } from './table-csv';

/** Liquid water at 25 °C heated at 1 atm to saturated vapor, with transport as POST /api/v1/paths adds it. */
function heated(withTransport: boolean): PathResult {
	const path = computePath({
		fluid: 'water',
		start: { T: 298.15, P: 101325 },
		system: { kind: 'flow', massFlow: 1 },
		legs: [{ process: 'isobaric', target: { x: 1 } }]
	});
	if (withTransport) for (const ps of path.states) ps.transport = transport(ps.state);
	return path;
}

describe('transport columns in the exports', () => {
	const prefs = unitPrefs();
	it('the table adds μ, k, Pr and σ with their units only when asked and the states carry them', () => {
		expect(sheetTable(heated(true), prefs).states.columns).toHaveLength(11);
		expect(sheetTable(heated(false), prefs, { transport: true }).states.columns).toHaveLength(11);
		const t = sheetTable(heated(true), prefs, { transport: true, style: 'ascii' });
		expect(t.states.columns.slice(11).map((c) => c.header)).toEqual([
			'μ [μPa·s]',
			'k [W/(m·K)]',
			'Pr [–]',
			'σ [mN/m]'
		]);
		// python3-iapws 1.5.2 (Debian), IAPWS95(T=298.15, P=0.101325): mu 890.02 μPa·s, k 0.60652 W/(m·K), Prandt 6.1358
		expect(t.states.rows[0].slice(11)).toEqual(['890.02', '0.60652', '6.1358', '']);
		// IAPWS R1-76(2014) at 100 °C: 58.91 mN/m (from memory of the release's table); the vapor has μ and k too
		expect(t.states.rows[1][14]).toMatch(/^58\.9\d+$/);
		expect(t.states.rows[1][11]).not.toBe('');
	});
	it('US customary units in the headers', () => {
		const t = sheetTable(heated(true), unitPrefs({ system: 'us' }), { transport: true });
		expect(t.states.columns.slice(11).map((c) => c.header)).toEqual([
			'μ [lbm/(ft·h)]',
			'k [Btu/(h·ft·°F)]',
			'Pr [–]',
			'σ [lbf/ft]'
		]);
	});
	it('CSV and Markdown carry the columns and name the correlations', () => {
		const r = heated(true);
		const f: MemoFindings = { warnings: [], cycle: null, caution: 'c', cautionTitle: 'Caution' };
		const csv = tableCsv(r, prefs, [], f);
		expect(csv).toContain('μ [μPa·s],k [W/(m·K)],Pr [–],σ [mN/m]');
		expect(csv).toContain('Transport sources');
		expect(csv).toMatch(/μ: IAPWS R12-08/);
		const md = tableMarkdown(r, prefs, [], f);
		expect(md).toContain('| μ [μPa·s] | k [W/(m·K)] | Pr [–] | σ [mN/m] |');
		expect(md).toMatch(/σ: IAPWS R1-76\(2014\)/);
		expect(transportSources(heated(false))).toEqual([]);
		expect(tableCsv(heated(false), prefs, [], f)).not.toContain('Transport sources');
	});
});
