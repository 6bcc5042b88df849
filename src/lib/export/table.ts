import { FORMULATION_NAME, type PathResult } from '$lib/thermo/types';
import { displayUnit, formatQuantity, type Quantity, type UnitPrefs } from '$lib/units';
import { phaseName } from '$lib/charts/describe';
import { processText, tidy } from '$lib/sheets/format';
import { severityWord, type MemoFindings } from './findings';

/**
 * The state and leg table of a computed path in the sheet's display units, for the memo: as CSV
 * (papaparse) and as a Markdown table. Headers carry their units ("T [°C]", "P [kPa g]"); numbers
 * are the numbers the screen shows (5 significant figures, temperatures to 0.01, quality to 4
 * decimals), in plain ASCII for CSV so spreadsheets read them as numbers. Per-leg energies and
 * entropy changes below the round-off floor the screen uses (sheets/format.ts `tidy`) are written
 * as 0, as the screen shows them; a total is 0 when its per-kg value is.
 */

/** What an IF97 sheet's table says of its numbers. */
export const IF97_NOTE = `States and each leg's q and w by ${FORMULATION_NAME.if97} (IAPWS R7-97(2012)).`;

export interface TableColumn {
	key: string;
	/** header with its unit, e.g. "T [°C]" */
	header: string;
	/** right-aligned numbers */
	numeric: boolean;
}

export interface SheetTable {
	states: { columns: TableColumn[]; rows: string[][] };
	legs: { columns: TableColumn[]; rows: string[][] };
	/** what the energy columns mean for this system kind */
	note: string;
}

export interface TableOptions {
	/** `ascii` for CSV (- and e-5), `unicode` for Markdown (− and ×10⁻⁵) */
	style?: 'ascii' | 'unicode';
	/**
	 * add μ, k, Pr and σ columns when the states carry transport properties (POST /api/v1/paths
	 * gives them); an absent value is an empty cell, and `transportSources` names the correlations
	 */
	transport?: boolean;
}

const TRANSPORT_COLUMNS = [
	{ key: 'mu', symbol: 'μ', quantity: 'viscosity' },
	{ key: 'k', symbol: 'k', quantity: 'thermalConductivity' },
	{ key: 'Pr', symbol: 'Pr', quantity: 'dimensionless' },
	{ key: 'sigma', symbol: 'σ', quantity: 'surfaceTension' }
] as const;

/**
 * The publications behind a path's transport values, one line per property name that has any:
 * "μ: IAPWS R12-08 …". Empty when no state carries transport properties.
 */
export function transportSources(result: PathResult): string[] {
	const names = { mu: 'μ', k: 'k', Pr: 'Pr', sigma: 'σ' } as const;
	const out: string[] = [];
	for (const key of ['mu', 'k', 'Pr', 'sigma'] as const) {
		const seen = new Set<string>();
		for (const ps of result.states) {
			const src = ps.transport?.sources[key];
			if (src) seen.add(src);
		}
		if (seen.size) out.push(`${names[key]}: ${[...seen].join('; ')}`);
	}
	return out;
}

function unitLabel(q: Quantity, prefs: UnitPrefs, magnitude?: number[]): string {
	return displayUnit(q, prefs, magnitude ? { magnitude } : {}).label || '–';
}

/** Leg label by position: L1, L2, … (ids stay stable; labels follow the order). */
export const legLabel = (index: number) => `L${index + 1}`;
export const stateLabel = (index: number) => `S${index + 1}`;

export { processText };

export function sheetTable(
	result: PathResult,
	prefs: UnitPrefs,
	options: TableOptions = {}
): SheetTable {
	const style = options.style ?? 'unicode';
	const q = (si: number | null | undefined, quantity: Quantity, magnitude?: number[]): string => {
		if (si === null || si === undefined || !Number.isFinite(si)) return '';
		const unit = displayUnit(quantity, prefs, magnitude ? { magnitude } : {});
		return formatQuantity(si, quantity, prefs, { unit, style }).text;
	};

	const withTransport =
		options.transport === true && result.states.some((ps) => ps.transport !== undefined);
	const states = {
		columns: [
			{ key: 'state', header: 'State', numeric: false },
			{ key: 'phase', header: 'Phase', numeric: false },
			{ key: 'T', header: `T [${unitLabel('temperature', prefs)}]`, numeric: true },
			{ key: 'P', header: `P [${unitLabel('pressure', prefs)}]`, numeric: true },
			{ key: 'v', header: `v [${unitLabel('specificVolume', prefs)}]`, numeric: true },
			{ key: 'u', header: `u [${unitLabel('specificEnergy', prefs)}]`, numeric: true },
			{ key: 'h', header: `h [${unitLabel('specificEnergy', prefs)}]`, numeric: true },
			{ key: 's', header: `s [${unitLabel('specificEntropy', prefs)}]`, numeric: true },
			{ key: 'x', header: 'x [–]', numeric: true },
			{
				key: 'superheat',
				header: `superheat [${unitLabel('temperatureDifference', prefs)}]`,
				numeric: true
			},
			{
				key: 'subcooling',
				header: `subcooling [${unitLabel('temperatureDifference', prefs)}]`,
				numeric: true
			},
			...(withTransport
				? TRANSPORT_COLUMNS.map((c) => ({
						key: c.key,
						header: `${c.symbol} [${unitLabel(c.quantity, prefs)}]`,
						numeric: true
					}))
				: [])
		],
		rows: result.states.map((ps, i) => [
			stateLabel(i),
			phaseName(ps.state.phase),
			q(ps.state.T, 'temperature'),
			q(ps.state.P, 'pressure'),
			q(ps.state.v, 'specificVolume'),
			q(ps.state.u, 'specificEnergy'),
			q(ps.state.h, 'specificEnergy'),
			q(ps.state.s, 'specificEntropy'),
			q(ps.state.x, 'quality'),
			q(ps.extras.superheat, 'temperatureDifference'),
			q(ps.extras.subcooling, 'temperatureDifference'),
			...(withTransport ? TRANSPORT_COLUMNS.map((c) => q(ps.transport?.[c.key], c.quantity)) : [])
		])
	};

	const flow = result.system.kind === 'flow';
	const totalQuantity: Quantity = flow ? 'power' : 'energy';
	const magnitudes = result.legs.flatMap((l) =>
		flow ? [l.totals.QFlow, l.totals.WShaft] : [l.totals.Q, l.totals.W]
	);
	const totalUnit = unitLabel(totalQuantity, prefs, magnitudes);
	const eU = unitLabel('specificEnergy', prefs);
	const labelOf = (id: string) => stateLabel(result.states.findIndex((s) => s.id === id));
	// round-off to zero exactly as the screen does (an isentropic leg's q, an isochoric leg's w, …)
	const e = (si: number) => tidy(si, 'specificEnergy');
	const tot = (perKg: number, si: number) => (e(perKg) === 0 ? 0 : tidy(si, 'total'));
	const legs = {
		columns: [
			{ key: 'leg', header: 'Leg', numeric: false },
			{ key: 'from', header: 'From', numeric: false },
			{ key: 'to', header: 'To', numeric: false },
			{ key: 'process', header: 'Process', numeric: false },
			{ key: 'q', header: `q [${eU}]`, numeric: true },
			{ key: 'w', header: flow ? `w shaft [${eU}]` : `w [${eU}]`, numeric: true },
			{ key: 'ds', header: `Δs [${unitLabel('specificEntropy', prefs)}]`, numeric: true },
			{ key: 'Q', header: flow ? `Q̇ [${totalUnit}]` : `Q [${totalUnit}]`, numeric: true },
			{ key: 'W', header: flow ? `Ẇ shaft [${totalUnit}]` : `W [${totalUnit}]`, numeric: true }
		],
		rows: result.legs.map((pl, i) => [
			legLabel(i),
			labelOf(pl.from),
			labelOf(pl.to),
			processText(pl.leg.process, pl.leg.n),
			q(e(flow ? pl.leg.qFlow : pl.leg.q), 'specificEnergy'),
			q(e(flow ? pl.leg.wShaft : pl.leg.w), 'specificEnergy'),
			q(tidy(pl.leg.ds, 'specificEntropy'), 'specificEntropy'),
			q(
				flow ? tot(pl.leg.qFlow, pl.totals.QFlow) : tot(pl.leg.q, pl.totals.Q),
				totalQuantity,
				magnitudes
			),
			q(
				flow ? tot(pl.leg.wShaft, pl.totals.WShaft) : tot(pl.leg.w, pl.totals.W),
				totalQuantity,
				magnitudes
			)
		])
	};
	const note = flow
		? 'Steady-flow device: q − w shaft = Δh per kg; Q̇ and Ẇ shaft are per-kg values × mass flow. Heat is positive into the fluid, work positive when done by the fluid.'
		: 'Closed system: q − w = Δu per kg, w = ∫P dv; Q and W are per-kg values × mass. Heat is positive into the fluid, work positive when done by the fluid.';
	return { states, legs, note: result.formulation === 'if97' ? `${note} ${IF97_NOTE}` : note };
}

/**
 * Free text for Markdown: HTML's & < > as character references (so a title such as
 * "<img src=x onerror=…>" stays text in any renderer) and Markdown's own punctuation (\ ` * _ [ ] | ~ #)
 * behind a backslash; line breaks become spaces.
 */
export function mdText(s: string): string {
	return s
		.replace(/[\r\n]+/g, ' ')
		.replace(/[\\`*_[\]|~#]/g, (c) => `\\${c}`)
		.replace(/[&<>]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;' })[c]!);
}

/** A cell of our own making (numbers, units, phase and process names): only the pipe is escaped. */
function mdCell(s: string): string {
	return s.replace(/\|/g, '\\|').replace(/\n/g, ' ');
}

function mdTable(b: SheetTable['states']): string {
	const head = `| ${b.columns.map((c) => mdCell(c.header)).join(' | ')} |`;
	const rule = `| ${b.columns.map((c) => (c.numeric ? '---:' : ':---')).join(' | ')} |`;
	const rows = b.rows.map((r) => `| ${r.map(mdCell).join(' | ')} |`);
	return [head, rule, ...rows].join('\n');
}

/** The findings as Markdown: a bulleted list of warnings and the cycle, then the caution. */
export function findingsMarkdown(f: MemoFindings): string {
	const items = [
		...f.warnings.map(
			(w) => `- **${severityWord(w.severity)} — ${mdText(w.title)}:** ${mdText(w.text)}`
		),
		...(f.cycle ? [`- **Cycle:** ${mdText(f.cycle)}`] : [])
	];
	return [
		'**Findings**',
		items.length ? items.join('\n') : '_No warnings for this path._',
		`> **${mdText(f.cautionTitle)}.** ${mdText(f.caution)}`
	].join('\n\n');
}

/**
 * The table as Markdown (GitHub-flavoured pipe tables): the caption paragraph (free text, escaped),
 * the findings (warnings, cycle, caution), then the states and legs.
 */
export function tableMarkdown(
	result: PathResult,
	prefs: UnitPrefs,
	caption: string[],
	findings: MemoFindings
): string {
	const t = sheetTable(result, prefs, { style: 'unicode', transport: true });
	const parts = [];
	if (caption.length) parts.push(caption.map(mdText).join('  \n'));
	parts.push(findingsMarkdown(findings));
	parts.push('**States**', mdTable(t.states));
	const sources = transportSources(result);
	if (sources.length) parts.push(`_Transport properties — ${sources.map(mdText).join(' · ')}_`);
	parts.push('**Legs**', mdTable(t.legs), `_${t.note}_`);
	return parts.join('\n\n') + '\n';
}
