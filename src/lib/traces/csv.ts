import Papa from 'papaparse';
import {
	BARE_PRESSURE,
	PROPERTY_QUANTITY,
	lookupUnit,
	normaliseUnitText,
	unitById,
	unitsOf,
	type UnitDef
} from '$lib/units/catalogue';
import { DEFAULT_ATMOSPHERE } from '$lib/units/factors';
import { formatNumber } from '$lib/units/format';
import type {
	RawTracePoint,
	RejectedLine,
	TraceColumn,
	TraceColumnKind,
	TraceRefusal,
	TraceRefusalCode
} from './types';

/**
 * Largest file accepted, bytes: 500 KiB, room for the row limit at about 50 characters a line, and
 * under the server's request body limit (adapter-node BODY_SIZE_LIMIT, 512 KiB by default) with
 * the multipart framing of an upload.
 */
export const MAX_TRACE_BYTES = 500 * 1024;
/** Most data lines accepted in one file. */
export const MAX_TRACE_ROWS = 10_000;
/** Rejected lines listed in a refusal (all are counted). */
export const MAX_LISTED_REJECTIONS = 100;

/** Time units of the time column; `iso` means ISO 8601 timestamps. */
export const TIME_UNITS: Readonly<Record<string, { id: string; seconds: number }>> = {
	s: { id: 's', seconds: 1 },
	sec: { id: 's', seconds: 1 },
	secs: { id: 's', seconds: 1 },
	second: { id: 's', seconds: 1 },
	seconds: { id: 's', seconds: 1 },
	ms: { id: 'ms', seconds: 1e-3 },
	min: { id: 'min', seconds: 60 },
	mins: { id: 'min', seconds: 60 },
	minute: { id: 'min', seconds: 60 },
	minutes: { id: 'min', seconds: 60 },
	h: { id: 'h', seconds: 3600 },
	hr: { id: 'h', seconds: 3600 },
	hrs: { id: 'h', seconds: 3600 },
	hour: { id: 'h', seconds: 3600 },
	hours: { id: 'h', seconds: 3600 },
	iso: { id: 'iso', seconds: 1 },
	iso8601: { id: 'iso', seconds: 1 },
	isodatetime: { id: 'iso', seconds: 1 },
	datetime: { id: 'iso', seconds: 1 },
	timestamp: { id: 'iso', seconds: 1 }
};

const COLUMN_NAME: Record<TraceColumnKind, string> = {
	time: 'time',
	P: 'pressure (P)',
	T: 'temperature (T)',
	v: 'specific volume (v)',
	rho: 'density (rho)'
};

/** The header this module documents, as shown in messages. */
export const EXAMPLE_HEADER = 'time [s],P [kPa g],T [°C]';

/**
 * A column name → what it measures. Single letters are case-sensitive (t is time, T is
 * temperature); words are not.
 */
function kindOf(name: string): TraceColumnKind | null {
	const n = name.normalize('NFKC').trim();
	if (n === 't') return 'time';
	if (n === 'T') return 'T';
	if (n === 'P' || n === 'p') return 'P';
	if (n === 'v') return 'v';
	if (n === 'ρ') return 'rho';
	const w = n.toLowerCase().replace(/[\s_-]+/g, ' ');
	if (['time', 'elapsed', 'elapsed time', 'timestamp', 'date time', 'datetime'].includes(w))
		return 'time';
	if (['pressure', 'press'].includes(w)) return 'P';
	if (['temperature', 'temp'].includes(w)) return 'T';
	if (['specific volume', 'spec volume', 'vol'].includes(w)) return 'v';
	if (['rho', 'density'].includes(w)) return 'rho';
	return null;
}

/** "P [kPa g]" or "P (kPa g)" → name and unit text; no brackets → unit null. */
function splitHeader(cell: string): { name: string; unit: string | null } {
	const m = /^(.+?)\s*[[(]\s*(.*?)\s*[\])]\s*$/.exec(cell.trim());
	if (!m) return { name: cell.trim(), unit: null };
	return { name: m[1].trim(), unit: m[2] };
}

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const DECIMAL_COMMA = /^[+-]?\d+,\d+$/;
const ISO =
	/^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,9}))?)?\s*(Z|[+-]\d{2}:?\d{2})?$/i;

/** Milliseconds of an ISO 8601 timestamp; a timestamp without a zone is read on the logger's own clock (as UTC). */
function isoMillis(text: string): number | null {
	const m = ISO.exec(text);
	if (!m) return null;
	const [, y, mo, d, h, mi, s, frac, zone] = m;
	const ms = frac ? Number(`0.${frac}`) * 1000 : 0;
	let t =
		Date.UTC(Number(y), Number(mo) - 1, Number(d), Number(h), Number(mi), Number(s ?? 0), 0) + ms;
	const check = new Date(t);
	if (
		check.getUTCDate() !== Number(d) ||
		check.getUTCMonth() !== Number(mo) - 1 ||
		Number(h) > 23 ||
		Number(mi) > 59 ||
		Number(s ?? 0) > 60
	)
		return null;
	if (zone && zone.toUpperCase() !== 'Z') {
		const sign = zone[0] === '-' ? -1 : 1;
		const digits = zone.slice(1).replace(':', '');
		t -= sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2, 4))) * 60_000;
	}
	return t;
}

const fmt = (x: number) => formatNumber(x, { sig: 6 });

export interface TraceCsvOptions {
	/** Pa absolute, for gauge columns (the sheet's atmospheric pressure) */
	atmosphere?: number;
	maxBytes?: number;
	maxRows?: number;
}

export interface ParsedTraceCsv {
	ok: true;
	columns: TraceColumn[];
	points: RawTracePoint[];
	rejected: RejectedLine[];
	rejectedCount: number;
	notes: string[];
	delimiter: ',' | ';' | '\t';
	startedAt: string | null;
}

function refuse(
	code: TraceRefusalCode,
	message: string,
	rejected: RejectedLine[] = [],
	rejectedCount = rejected.length
): TraceRefusal {
	return { ok: false, code, message, rejected, rejectedCount };
}

const excerpt = (line: string) => (line.length > 80 ? `${line.slice(0, 79)}…` : line);

/** Text of an upload: refuses files over the size limit, UTF-16 and anything that is not UTF-8. */
export function decodeTraceFile(
	input: string | Uint8Array,
	maxBytes = MAX_TRACE_BYTES
): { ok: true; text: string } | TraceRefusal {
	const size =
		typeof input === 'string' ? new TextEncoder().encode(input).length : input.byteLength;
	if (size > maxBytes)
		return refuse(
			'too-large',
			`The file is ${Math.ceil(size / 1024)} kB; the limit is ${Math.floor(maxBytes / 1024)} kB. Split the log into shorter periods or thin it out (every 10th line, say) before uploading.`
		);
	if (typeof input === 'string') return { ok: true, text: input };
	if ((input[0] === 0xff && input[1] === 0xfe) || (input[0] === 0xfe && input[1] === 0xff))
		return refuse(
			'not-utf8',
			'The file is UTF-16 text (what some spreadsheets call "Unicode text"). Save it as "CSV UTF-8" and upload again.'
		);
	try {
		return { ok: true, text: new TextDecoder('utf-8', { fatal: true }).decode(input) };
	} catch {
		return refuse(
			'not-utf8',
			'The file is not UTF-8 text. Export the log as CSV (UTF-8) and upload again.'
		);
	}
}

/** Most problems spelled out in a refusal's message (all are listed in `rejected`, up to MAX_LISTED_REJECTIONS). */
export const MAX_PROBLEMS_IN_MESSAGE = 5;

/** "N problems: line 1: …; line 4: …; … and K more (all listed)" for a refusal message. */
export function problemSummary(list: readonly RejectedLine[], total: number): string {
	const shown = list
		.slice(0, MAX_PROBLEMS_IN_MESSAGE)
		.map((r) => `line ${r.line}: ${r.reason.replace(/\.$/, '')}`);
	const more = total - shown.length;
	return `${shown.join('; ')}${more > 0 ? `; and ${more} more, each listed with its line number` : ''}`;
}

/**
 * A header that cannot be read: every header problem, and, so the file can be mended in one go,
 * every data line whose values are not numbers or do not match the header's column count (the
 * columns that were recognised, whether or not their unit was).
 */
function refuseHeader(
	problems: readonly { code: TraceRefusalCode; message: string }[],
	ctx: {
		headerNo: number;
		headerLine: string;
		lines: readonly string[];
		headerIndex: number;
		delimiter: string;
		headerCells: readonly string[];
		columns: readonly { kind: TraceColumnKind; index: number; header: string; unit?: string }[];
		maxRows: number;
	}
): TraceRefusal {
	const rejected: RejectedLine[] = problems.map((p) => ({
		line: ctx.headerNo,
		reason: p.message,
		text: excerpt(ctx.headerLine)
	}));
	let count = rejected.length;
	const needed = ctx.columns.length
		? Math.max(...ctx.columns.map((c) => c.index)) + 1
		: ctx.headerCells.length;
	let rows = 0;
	for (let li = ctx.headerIndex + 1; li < ctx.lines.length && rows < ctx.maxRows; li++) {
		const raw = ctx.lines[li];
		if (raw.trim() === '' || raw.trimStart().startsWith('#')) continue;
		rows++;
		const cells = raw.includes('"')
			? (Papa.parse<string[]>(raw, { delimiter: ctx.delimiter }).data[0] ?? [])
			: raw.split(ctx.delimiter);
		const reasons: string[] = [];
		if (cells.length < needed)
			reasons.push(
				`${cells.length} value${cells.length === 1 ? '' : 's'} where the header has ${needed} columns`
			);
		else if (cells.slice(ctx.headerCells.length).some((c) => c.trim() !== ''))
			reasons.push(`${cells.length} values where the header has ${ctx.headerCells.length} columns`);
		else
			for (const c of ctx.columns) {
				const v = (cells[c.index] ?? '').trim();
				if (c.kind === 'time' && c.unit === 'iso') continue;
				if (v === '') reasons.push(`no ${c.header} value`);
				else if (DECIMAL_COMMA.test(v))
					reasons.push(`"${v}" in ${c.header} uses a decimal comma; write ${v.replace(',', '.')}`);
				else if (!NUMBER.test(v) && !(c.kind === 'time' && ISO.test(v)))
					reasons.push(`"${v}" in ${c.header} is not a number`);
			}
		if (reasons.length) {
			count++;
			if (rejected.length < MAX_LISTED_REJECTIONS)
				rejected.push({ line: li + 1, reason: reasons.join('; '), text: excerpt(raw) });
		}
	}
	if (count === 1) return refuse(problems[0].code, problems[0].message, rejected, count);
	const dataCount = count - problems.length;
	const message =
		`The file has ${count} problems; nothing was saved. ` +
		`${problems.length === 1 ? 'The header' : `The header has ${problems.length}`}: ${problems.map((p) => p.message).join(' ')}` +
		(dataCount > 0
			? ` ${dataCount === 1 ? 'One data line' : `${dataCount} data lines`} cannot be read either: ${problemSummary(rejected.slice(problems.length), dataCount)}.`
			: '');
	return refuse(problems[0].code, message, rejected, count);
}

/**
 * Reads a logger CSV (see README.md): the first line that is neither blank nor a # comment is the
 * header naming each column and its unit; the delimiter is taken from the header (semicolon if it
 * has one, else tab if it has one, else comma). Values use a decimal point. Lines that cannot be
 * read are listed with their line number and reason.
 */
export function parseTraceCsv(
	input: string | Uint8Array,
	options: TraceCsvOptions = {}
): ParsedTraceCsv | TraceRefusal {
	const atmosphere = options.atmosphere ?? DEFAULT_ATMOSPHERE;
	const maxRows = options.maxRows ?? MAX_TRACE_ROWS;
	const decoded = decodeTraceFile(input, options.maxBytes ?? MAX_TRACE_BYTES);
	if (!decoded.ok) return decoded;
	const text = decoded.text.replace(/^\ufeff/, '').replace(/\r\n?/g, '\n');
	if (text.trim() === '')
		return refuse(
			'empty',
			`The file is empty. Upload a CSV whose first line names the columns, e.g. ${EXAMPLE_HEADER}, followed by one line per reading.`
		);

	const lines = text.split('\n');
	const headerIndex = lines.findIndex((l) => l.trim() !== '' && !l.trimStart().startsWith('#'));
	if (headerIndex < 0)
		return refuse(
			'empty',
			`The file holds only comments. Add a header line such as ${EXAMPLE_HEADER} and the readings below it.`
		);
	const headerLine = lines[headerIndex];
	const delimiter: ',' | ';' | '\t' = headerLine.includes(';')
		? ';'
		: headerLine.includes('\t')
			? '\t'
			: ',';
	const headerCells = Papa.parse<string[]>(headerLine, { delimiter }).data[0] ?? [];
	const headerNo = headerIndex + 1;

	if (
		headerCells.length > 0 &&
		headerCells.every(
			(c) => c.trim() === '' || NUMBER.test(c.trim()) || DECIMAL_COMMA.test(c.trim())
		)
	)
		return refuse(
			'no-header',
			`Line ${headerNo} holds numbers, so the file has no header line. Add a first line naming each column with its unit in brackets, e.g. ${EXAMPLE_HEADER}.`,
			[{ line: headerNo, reason: 'numbers where the header should be', text: excerpt(headerLine) }]
		);

	const columns: TraceColumn[] = [];
	const notes: string[] = [];
	// every problem of the header is collected, so one answer names them all
	const headerProblems: { code: TraceRefusalCode; message: string }[] = [];
	const problem = (code: TraceRefusalCode, message: string) =>
		headerProblems.push({ code, message });
	/** columns recognised but not usable (no or unknown unit): their values are still checked as numbers */
	const unusable: { kind: TraceColumnKind; index: number; header: string }[] = [];
	for (let i = 0; i < headerCells.length; i++) {
		const cell = headerCells[i].trim();
		if (cell === '') continue;
		const { name, unit } = splitHeader(cell);
		const kind = kindOf(name);
		if (!kind) {
			notes.push(
				`Column ${i + 1} "${cell}" is not one Statewright reads (time, P, T, v or rho); it was left out.`
			);
			continue;
		}
		if (columns.some((c) => c.kind === kind) || unusable.some((c) => c.kind === kind)) {
			problem(
				'bad-header',
				`The header on line ${headerNo} names ${COLUMN_NAME[kind]} twice (column ${i + 1} "${cell}"). Keep one column per quantity.`
			);
			continue;
		}
		if (unit === null || unit.trim() === '') {
			const hint =
				kind === 'time'
					? `${name} [s]`
					: kind === 'P'
						? `${name} [kPa g] or ${name} [bar a]`
						: kind === 'T'
							? `${name} [°C]`
							: kind === 'v'
								? `${name} [m³/kg]`
								: `${name} [kg/m³]`;
			problem(
				'bad-header',
				`Column ${i + 1} "${cell}" on line ${headerNo} has no unit. Put the unit in brackets after the name, e.g. ${hint}.`
			);
			unusable.push({ kind, index: i, header: cell });
			continue;
		}
		if (kind === 'time') {
			const t = TIME_UNITS[normaliseUnitText(unit).toLowerCase()];
			if (!t) {
				problem(
					'unknown-unit',
					`"${unit}" in column ${i + 1} "${cell}" is not a time unit Statewright reads. Use s, min, h or ms for elapsed time, or iso for ISO 8601 timestamps (2026-01-05T09:30:00Z).`
				);
				unusable.push({ kind, index: i, header: cell });
				continue;
			}
			columns.push({ kind, index: i, header: cell, unit: t.id, unitText: unit });
			continue;
		}
		const quantity = PROPERTY_QUANTITY[kind];
		if (kind === 'P' && normaliseUnitText(unit) in BARE_PRESSURE) {
			problem(
				'pressure-reference',
				`Column ${i + 1} "${cell}" does not say whether the pressures are absolute or gauge. Write ${unit} a or ${unit} g${unit.toLowerCase() === 'psi' ? ' (psia or psig)' : ''}, as the instrument reads; gauge readings are turned into absolute with the sheet's atmospheric pressure of ${fmt(atmosphere / 1000)} kPa a.`
			);
			unusable.push({ kind, index: i, header: cell });
			continue;
		}
		const found: UnitDef[] = lookupUnit(unit, quantity);
		if (found.length === 0) {
			const known = [
				...new Set(
					unitsOf(quantity)
						.map((u) => u.label)
						.filter(Boolean)
				)
			].join(', ');
			problem(
				'unknown-unit',
				`"${unit}" in column ${i + 1} "${cell}" is not a unit of ${quantity === 'specificVolume' ? 'specific volume' : quantity} Statewright knows. Use one of: ${known}.`
			);
			unusable.push({ kind, index: i, header: cell });
			continue;
		}
		columns.push({ kind, index: i, header: cell, unit: found[0].id, unitText: unit });
	}
	const missing = (['time', 'P', 'T'] as const).filter(
		(k) => !columns.some((c) => c.kind === k) && !unusable.some((c) => c.kind === k)
	);
	if (missing.length)
		problem(
			'bad-header',
			`The header on line ${headerNo} has no ${missing.map((k) => COLUMN_NAME[k]).join(', no ')} column. Name the columns with their units, e.g. ${EXAMPLE_HEADER}.`
		);
	const has = (k: TraceColumnKind) =>
		columns.some((c) => c.kind === k) || unusable.some((c) => c.kind === k);
	if (has('v') && has('rho'))
		problem(
			'bad-header',
			`The header on line ${headerNo} has both a v and a rho column. Keep one of them: they say the same thing.`
		);
	if (headerProblems.length)
		return refuseHeader(headerProblems, {
			headerNo,
			headerLine,
			lines,
			headerIndex,
			delimiter,
			headerCells,
			columns: [...columns, ...unusable],
			maxRows
		});

	const byKind = new Map(columns.map((c) => [c.kind, c]));
	const unitOf = (k: TraceColumnKind) => unitById(byKind.get(k)!.unit);
	const timeCol = byKind.get('time')!;
	const timeSeconds = TIME_UNITS[timeCol.unit]?.seconds ?? 1;
	const volCol = byKind.get('v') ?? byKind.get('rho');
	const needed = Math.max(...columns.map((c) => c.index)) + 1;
	const delimName = delimiter === ',' ? 'commas' : delimiter === ';' ? 'semicolons' : 'tabs';

	const points: RawTracePoint[] = [];
	const rejected: RejectedLine[] = [];
	let rejectedCount = 0;
	let comments = lines.slice(0, headerIndex).filter((l) => l.trimStart().startsWith('#')).length;
	let dataRows = 0;
	let t0: number | null = null;
	let startedAt: string | null = null;
	let last: { t: number; line: number } | null = null;
	const reject = (line: number, reason: string, raw: string) => {
		rejectedCount++;
		if (rejected.length < MAX_LISTED_REJECTIONS)
			rejected.push({ line, reason, text: excerpt(raw) });
	};

	for (let li = headerIndex + 1; li < lines.length; li++) {
		const raw = lines[li];
		const lineNo = li + 1;
		if (raw.trim() === '') continue;
		if (raw.trimStart().startsWith('#')) {
			comments++;
			continue;
		}
		if (++dataRows > maxRows)
			return refuse(
				'too-many-rows',
				`The file has more than ${maxRows.toLocaleString('en-US')} data lines (line ${lineNo} is past the limit). Thin the log out (every 10th line, say) or split it into shorter periods.`
			);
		// a line without quotes splits plainly; papaparse reads quoted values
		let cells: string[];
		if (raw.includes('"')) {
			const parsed = Papa.parse<string[]>(raw, { delimiter });
			if (parsed.errors.length) {
				reject(lineNo, 'a quoted value is not closed', raw);
				continue;
			}
			cells = parsed.data[0] ?? [];
		} else cells = raw.split(delimiter);
		if (cells.length < needed) {
			const hint =
				delimiter !== ';' && raw.includes(';')
					? ` (this line uses semicolons; the header uses ${delimName})`
					: '';
			reject(
				lineNo,
				`${cells.length} value${cells.length === 1 ? '' : 's'} where the header has ${needed} columns separated by ${delimName}${hint}`,
				raw
			);
			continue;
		}
		if (cells.slice(headerCells.length).some((c) => c.trim() !== '')) {
			reject(lineNo, `more values than the header has columns (${headerCells.length})`, raw);
			continue;
		}

		const problems: string[] = [];
		const value = (k: TraceColumnKind): number | null => {
			const col = byKind.get(k)!;
			const s = (cells[col.index] ?? '').trim();
			if (s === '') {
				problems.push(`no ${col.header} value`);
				return null;
			}
			if (DECIMAL_COMMA.test(s)) {
				problems.push(`"${s}" in ${col.header} uses a decimal comma; write ${s.replace(',', '.')}`);
				return null;
			}
			if (!NUMBER.test(s)) {
				problems.push(`"${s}" in ${col.header} is not a number`);
				return null;
			}
			return Number(s);
		};

		let tMs: number | null = null;
		const tText = (cells[timeCol.index] ?? '').trim();
		if (timeCol.unit === 'iso') {
			if (tText === '') problems.push(`no ${timeCol.header} value`);
			else {
				tMs = isoMillis(tText);
				if (tMs === null)
					problems.push(
						`"${tText}" in ${timeCol.header} is not an ISO 8601 timestamp like 2026-01-05T09:30:00Z`
					);
			}
		} else {
			const n = value('time');
			if (n !== null) tMs = n * timeSeconds * 1000;
		}
		const pNum = value('P');
		const tNum = value('T');
		const vNum = volCol ? value(volCol.kind) : null;

		let P: number | null = null;
		let T: number | null = null;
		let v: number | null = null;
		if (pNum !== null) {
			const u = unitOf('P');
			P = u.toSI(pNum, atmosphere);
			if (!(P > 0)) {
				const floor =
					u.reference === 'gauge'
						? ` (gauge readings start at ${fmt(u.fromSI(0, atmosphere))} ${u.label} with the sheet's atmosphere)`
						: '';
				problems.push(
					`${fmt(pNum)} ${u.label} in ${byKind.get('P')!.header} is at or below a perfect vacuum${floor}`
				);
				P = null;
			}
		}
		if (tNum !== null) {
			const u = unitOf('T');
			T = u.toSI(tNum, atmosphere);
			if (!(T > 0)) {
				problems.push(
					`${fmt(tNum)} ${u.label} in ${byKind.get('T')!.header} is at or below absolute zero`
				);
				T = null;
			}
		}
		if (volCol && vNum !== null) {
			const u = unitById(volCol.unit);
			const si = u.toSI(vNum, atmosphere);
			if (!(si > 0))
				problems.push(`${fmt(vNum)} ${u.label} in ${volCol.header} must be above zero`);
			else v = volCol.kind === 'rho' ? 1 / si : si;
		}
		if (problems.length) {
			reject(lineNo, problems.join('; '), raw);
			continue;
		}
		if (t0 === null) {
			t0 = tMs!;
			if (timeCol.unit === 'iso') startedAt = tText;
		}
		const t = (tMs! - t0) / 1000;
		if (last && t < last.t) {
			reject(
				lineNo,
				`time goes backwards: ${tText}${timeCol.unit === 'iso' ? '' : ` ${timeCol.unitText}`} is earlier than line ${last.line}; keep the readings in time order`,
				raw
			);
			continue;
		}
		last = { t, line: lineNo };
		points.push({ line: lineNo, t, P: P!, T: T!, v, text: excerpt(raw) });
	}
	if (comments)
		notes.push(`${comments} comment line${comments === 1 ? '' : 's'} (starting with #) left out.`);
	return { ok: true, columns, points, rejected, rejectedCount, notes, delimiter, startedAt };
}
