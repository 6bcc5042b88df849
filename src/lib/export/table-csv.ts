import Papa from 'papaparse';
import type { PathResult } from '$lib/thermo/types';
import type { UnitPrefs } from '$lib/units';
import { severityWord, type MemoFindings } from './findings';
import { sheetTable, transportSources, type SheetTable } from './table';

// Kept apart from table.ts so pages that show the table do not ship the CSV writer.

/** A plain decimal number as the table writes it in ASCII style: -12.5, 0.25000, 1.2346e-5. */
const NUMBER = /^-?\d+(\.\d+)?(e[+-]?\d+)?$/;
/** What a spreadsheet may read as the start of a formula (or that hides one after a tab or CR). */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * One CSV cell, safe to open in a spreadsheet. A text cell that begins with =, +, -, @, a tab or a
 * carriage return gets a leading apostrophe, so the spreadsheet shows it as text rather than
 * running it as a formula (the usual CSV-injection precaution). A cell of a numeric column that is
 * a plain number is data, not a formula: "-12.5" stays as it is, so the spreadsheet still reads a
 * negative number; anything else in a numeric column is treated as text.
 */
export function csvCell(value: string, numeric = false): string {
	if (numeric && NUMBER.test(value)) return value;
	return FORMULA_START.test(value) ? `'${value}` : value;
}

const textRows = (rows: string[][]) => rows.map((r) => r.map((c) => csvCell(c)));

/**
 * The table as one CSV file: the caption, the findings (warnings, cycle, caution: severity,
 * heading, text), then a "States" block and a "Legs" block, separated by blank lines. Free text is
 * neutralised against formulas (csvCell); numbers stay numbers.
 */
export function tableCsv(
	result: PathResult,
	prefs: UnitPrefs,
	caption: string[],
	findings: MemoFindings
): string {
	const t = sheetTable(result, prefs, { style: 'ascii', transport: true });
	const sources = transportSources(result);
	const block = (title: string, b: SheetTable['states']) =>
		Papa.unparse({ fields: [title, ...b.columns.slice(1).map(() => '')], data: [] }) +
		'\r\n' +
		Papa.unparse({
			fields: b.columns.map((c) => csvCell(c.header)),
			data: b.rows.map((r) => r.map((c, j) => csvCell(c, b.columns[j].numeric)))
		});
	const head = caption.length ? Papa.unparse(textRows(caption.map((c) => [c]))) + '\r\n\r\n' : '';
	const found = Papa.unparse({
		fields: ['Findings', 'Heading', 'Text'],
		data: textRows([
			...findings.warnings.map((w) => [severityWord(w.severity), w.title, w.text]),
			...(findings.cycle ? [['Cycle', 'Cycle results', findings.cycle]] : []),
			['Caution', findings.cautionTitle, findings.caution]
		])
	});
	return (
		head +
		found +
		'\r\n\r\n' +
		block('States', t.states) +
		'\r\n\r\n' +
		(sources.length
			? Papa.unparse(textRows([['Transport sources'], ...sources.map((s) => [s])])) + '\r\n\r\n'
			: '') +
		block('Legs', t.legs) +
		'\r\n\r\n' +
		Papa.unparse(textRows([[t.note]])) +
		'\r\n'
	);
}
