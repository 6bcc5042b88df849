import Papa from 'papaparse';
import type { PathResult } from '../thermo/types';
import type { UnitPrefs } from '../units';
import { sheetTable, type SheetTable } from './table';

// Kept apart from table.ts so pages that show the table do not ship the CSV writer.

/** The table as one CSV file: a "States" block and a "Legs" block, separated by a blank line. */
export function tableCsv(result: PathResult, prefs: UnitPrefs, caption: string[] = []): string {
	const t = sheetTable(result, prefs, { style: 'ascii' });
	const block = (title: string, b: SheetTable['states']) => Papa.unparse({ fields: [title, ...b.columns.slice(1).map(() => '')], data: [] }) + '\r\n' + Papa.unparse({ fields: b.columns.map((c) => c.header), data: b.rows });
	const head = caption.length ? Papa.unparse(caption.map((c) => [c])) + '\r\n\r\n' : '';
	return head + block('States', t.states) + '\r\n\r\n' + block('Legs', t.legs) + '\r\n\r\n' + Papa.unparse([[t.note]]) + '\r\n';
}
