import { z } from 'zod';
import { transaction } from './db/dialect';
import type { DB, SheetTraceRow } from './db/schema';
import { AppError } from './errors';
import { newId } from './secrets';
import { readCapped } from './body';
import type { TeamAccess } from './guard';
import {
	countTraces,
	deleteTraceRow,
	getTraceRow,
	insertTrace,
	listTraceRows,
	listTraceRowsWithPoints,
	type TraceListRow
} from './db/traces';
import { checkDoc } from './sheets';
import { loadSheet } from './revisions';
import { ROLE_LABEL } from '$lib/roles';
import { readTraceCsv } from '$lib/traces/read';
import {
	DEFAULT_SATURATION_TOLERANCE,
	MAX_SATURATION_TOLERANCE,
	openSaturationPoints
} from '$lib/traces/fix';
import { MAX_TRACE_BYTES } from '$lib/traces/csv';
import type { RejectedLine, TraceColumn, TracePoint, TraceRefusalCode } from '$lib/traces/types';
import type { TraceSummary, TraceWithPoints } from '$lib/review/types';
import { controlCharProblem, plainText } from '$lib/plain-text';

export type { TraceSummary, TraceWithPoints };

/*
 * Measured traces: a logger CSV uploaded to a sheet, read and checked on the server (the file
 * convention is in src/lib/traces/README.md), each point fixed with the engine for the sheet's
 * fluid, and stored with the sheet. A file with any unreadable line is refused whole and nothing
 * is stored, unless the uploader asks to leave the listed lines out (the count and the lines are
 * then kept with the trace). Uploading and deleting need `sheet:edit`; everyone reads.
 */

/** Most traces one sheet keeps. */
export const MAX_TRACES_PER_SHEET = 20;
/** Points sent for drawing; longer traces are thinned evenly (every point is kept in the store). */
export const CHART_POINTS = 2000;

export const traceOptionsSchema = z.object({
	name: plainText('The trace name', 'line', 'name must be text.')
		.optional()
		.transform((s) => (s ?? '').replace(/\s+/g, ' ').trim())
		.pipe(z.string().max(80, { error: 'Use at most 80 characters for the trace name.' })),
	tolerance: z.coerce
		.number({ error: `Give the saturation tolerance in K (0 to ${MAX_SATURATION_TOLERANCE}).` })
		.min(0, { error: 'The saturation tolerance cannot be negative.' })
		.max(MAX_SATURATION_TOLERANCE, {
			error: `Use a saturation tolerance of at most ${MAX_SATURATION_TOLERANCE} K.`
		})
		.optional(),
	allowRejected: z
		.union([z.boolean(), z.enum(['1', '0', 'true', 'false', 'on', 'off', ''])])
		.optional()
		.transform((v) => v === true || v === '1' || v === 'true' || v === 'on')
});

/** A refused upload, with the lines and reasons to show. */
export class TraceRefusedError extends AppError {
	readonly rejected: RejectedLine[];
	readonly rejectedCount: number;
	constructor(
		code: TraceRefusalCode,
		message: string,
		rejected: RejectedLine[],
		rejectedCount: number
	) {
		super(code === 'too-large' ? 413 : 422, code, message, 'file');
		this.rejected = rejected;
		this.rejectedCount = rejectedCount;
	}
}

function summaryOf(r: TraceListRow, sheetFluid: string): TraceSummary {
	return {
		id: r.id,
		name: r.name,
		filename: r.original_filename,
		fluid: r.fluid,
		columns: JSON.parse(r.columns) as TraceColumn[],
		atmosphere: r.atmosphere,
		tolerance: r.tolerance,
		pointCount: r.point_count,
		inDomeCount: r.in_dome_count,
		rejectedCount: r.rejected_count,
		rejected: JSON.parse(r.rejected) as RejectedLine[],
		notes: JSON.parse(r.notes) as string[],
		startedAt: r.started_at,
		uploadedBy: r.uploaded_by_label,
		uploadedAt: r.uploaded_at,
		stale: r.fluid !== sheetFluid
	};
}

/** At most `max` points, evenly spaced, keeping the first and the last. */
export function thin<T>(points: readonly T[], max = CHART_POINTS): T[] {
	if (points.length <= max) return [...points];
	const out: T[] = [];
	const step = (points.length - 1) / (max - 1);
	for (let i = 0; i < max; i++) out.push(points[Math.round(i * step)]);
	return out;
}

function requireEdit(access: TeamAccess): void {
	if (!access.can('sheet:edit'))
		throw new AppError(
			403,
			'forbidden',
			`Your role in this team is ${ROLE_LABEL[access.role].toLowerCase()}, which cannot upload or remove measured traces (designers and owners can).`
		);
}

export interface UploadInput {
	bytes: Uint8Array;
	filename: string;
	name?: string;
	tolerance?: number;
	allowRejected?: boolean;
}

/** Reads, checks, fixes and stores a logger file; a refused file stores nothing. */
export async function uploadTrace(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	input: UploadInput,
	now = Date.now()
): Promise<TraceWithPoints> {
	requireEdit(access);
	const sheet = await loadSheet(db, access, sheetId);
	const doc = checkDoc(JSON.parse(sheet.draft)).doc;
	const badName = controlCharProblem(
		input.filename,
		'The file name',
		'line',
		'Rename the file using letters, digits, spaces, "-", "_" and "." (e.g. boiler-log.csv) and upload it again.'
	);
	if (badName) throw new AppError(400, 'invalid-filename', badName, 'filename');
	const filename = (input.filename || 'trace.csv').replace(/[\\/]/g, '_').slice(0, 255);
	if (input.bytes.byteLength === 0)
		throw new TraceRefusedError(
			'empty',
			'The file is empty. Upload a CSV with a header line such as time [s],P [kPa g],T [°C] and one line per reading.',
			[],
			0
		);
	if (input.bytes.byteLength > MAX_TRACE_BYTES)
		throw new TraceRefusedError(
			'too-large',
			`The file is ${Math.ceil(input.bytes.byteLength / 1024)} kB; the limit is ${MAX_TRACE_BYTES / 1024} kB. Split the log into shorter periods or thin it out before uploading.`,
			[],
			0
		);
	const atmosphere = doc.spec.atmosphericPressure ?? doc.units.atmosphere;
	const tolerance = input.tolerance ?? DEFAULT_SATURATION_TOLERANCE;
	const r = readTraceCsv(input.bytes, {
		fluid: doc.spec.fluid,
		atmosphere,
		toleranceK: tolerance,
		allowRejected: input.allowRejected ?? false
	});
	if (!r.ok) throw new TraceRefusedError(r.code, r.message, r.rejected, r.rejectedCount);
	const by = access.actor;
	const name =
		input.name?.trim() || filename.replace(/\.[^.]*$/, '').slice(0, 80) || 'Measured trace';
	const row: SheetTraceRow = {
		id: newId(),
		sheet_id: sheet.id,
		team_id: access.team.id,
		name,
		original_filename: filename,
		fluid: doc.spec.fluid,
		columns: JSON.stringify(r.columns),
		atmosphere,
		tolerance,
		points: JSON.stringify(r.points),
		point_count: r.points.length,
		in_dome_count: r.inDomeCount,
		rejected_count: r.rejectedCount,
		rejected: JSON.stringify(r.rejected),
		notes: JSON.stringify(r.notes),
		started_at: r.startedAt,
		uploaded_by: by.id,
		uploaded_by_label: by.label,
		uploaded_at: now
	};
	await transaction(db, async (trx) => {
		if ((await countTraces(trx, sheet.id)) >= MAX_TRACES_PER_SHEET)
			throw new AppError(
				409,
				'too-many-traces',
				`A sheet keeps at most ${MAX_TRACES_PER_SHEET} measured traces. Remove one before uploading another.`
			);
		await insertTrace(trx, row);
	});
	return { ...summaryOf(row, doc.spec.fluid), points: r.points };
}

export async function listTraces(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	options: { points?: 'all' | 'chart' | 'none' } = {}
): Promise<Array<TraceSummary & { points?: TracePoint[] }>> {
	return tracesOf(db, await loadSheet(db, access, sheetId), options);
}

/** listTraces for a sheet row already read (and scoped to the caller's team). */
export async function tracesOf(
	db: DB,
	sheet: { id: string; fluid: string },
	options: { points?: 'all' | 'chart' | 'none' } = {}
): Promise<Array<TraceSummary & { points?: TracePoint[] }>> {
	const fluid = sheet.fluid;
	if ((options.points ?? 'none') === 'none')
		return (await listTraceRows(db, sheet.id)).map((r) => summaryOf(r, fluid));
	const rows = await listTraceRowsWithPoints(db, sheet.id);
	return rows.map((r) => {
		const points = openSaturationPoints(fluid, JSON.parse(r.points) as TracePoint[]);
		return { ...summaryOf(r, fluid), points: options.points === 'chart' ? thin(points) : points };
	});
}

export async function readTrace(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	traceId: string
): Promise<TraceWithPoints> {
	const sheet = await loadSheet(db, access, sheetId);
	const row = await getTraceRow(db, sheet.id, traceId);
	if (!row)
		throw new AppError(404, 'trace-not-found', 'There is no such measured trace on this sheet.');
	return {
		...summaryOf(row, sheet.fluid),
		points: openSaturationPoints(sheet.fluid, JSON.parse(row.points) as TracePoint[])
	};
}

export async function deleteTrace(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	traceId: string
): Promise<void> {
	requireEdit(access);
	const sheet = await loadSheet(db, access, sheetId);
	if (!(await deleteTraceRow(db, sheet.id, traceId)))
		throw new AppError(404, 'trace-not-found', 'There is no such measured trace on this sheet.');
}

/** Room for the multipart framing and the small fields around the file. */
const FRAMING = 16 * 1024;

function readLimited(request: Request, max: number): Promise<Buffer> {
	return readCapped(
		request,
		max,
		() =>
			new TraceRefusedError(
				'too-large',
				`The upload is larger than ${MAX_TRACE_BYTES / 1024} kB. Split the log into shorter periods or thin it out before uploading.`,
				[],
				0
			),
		() =>
			new AppError(400, 'unreadable-upload', 'The upload could not be read completely. Try again.')
	);
}

/**
 * An upload as the API and the sheet page send it: multipart/form-data with a `file` field (and
 * optional `name`, `tolerance` in K, `allowRejected`), or the CSV itself as text/csv with the
 * options in the query string (`filename`, `name`, `tolerance`, `allowRejected`).
 */
export async function readUpload(request: Request, url: URL): Promise<UploadInput> {
	const type = request.headers.get('content-type') ?? '';
	if (/^multipart\/form-data/i.test(type)) {
		const raw = await readLimited(request, MAX_TRACE_BYTES + FRAMING);
		let form: FormData;
		try {
			form = await new Request('http://upload.invalid/', {
				method: 'POST',
				body: new Blob([raw as Uint8Array<ArrayBuffer>]),
				headers: { 'content-type': type }
			}).formData();
		} catch {
			throw new AppError(
				400,
				'unreadable-upload',
				'The form could not be read. Send multipart/form-data with the CSV in a field named "file".'
			);
		}
		for (const key of new Set(form.keys())) {
			const problem = controlCharProblem(
				key,
				'A form field’s name',
				'line',
				'Name the fields file, name, tolerance and allowRejected.'
			);
			if (problem) throw new AppError(400, 'invalid-field-name', problem);
		}
		const file = form.get('file');
		if (!(file instanceof File))
			throw new AppError(
				400,
				'no-file',
				'Choose a CSV file to upload (form field "file").',
				'file'
			);
		const opts = traceOptionsSchema.parse({
			name: form.get('name') ?? undefined,
			tolerance: (form.get('tolerance') as string | null) || undefined,
			allowRejected: form.get('allowRejected') ?? undefined
		});
		return {
			bytes: new Uint8Array(await file.arrayBuffer()),
			filename: file.name,
			name: opts.name,
			tolerance: opts.tolerance,
			allowRejected: opts.allowRejected
		};
	}
	if (/^text\/(csv|plain)\b/i.test(type)) {
		const bytes = await readLimited(request, MAX_TRACE_BYTES);
		const q = url.searchParams;
		const opts = traceOptionsSchema.parse({
			name: q.get('name') ?? undefined,
			tolerance: q.get('tolerance') || undefined,
			allowRejected: q.get('allowRejected') ?? undefined
		});
		return {
			bytes,
			filename: (q.get('filename') ?? 'trace.csv').slice(0, 255),
			name: opts.name,
			tolerance: opts.tolerance,
			allowRejected: opts.allowRejected
		};
	}
	throw new AppError(
		415,
		'unsupported-media-type',
		'Send the logger file as multipart/form-data (field "file") or as the body with "Content-Type: text/csv".'
	);
}
