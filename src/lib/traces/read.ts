import { MAX_LISTED_REJECTIONS, parseTraceCsv, problemSummary, type TraceCsvOptions } from './csv';
import { DEFAULT_SATURATION_TOLERANCE, fixTracePoints, MAX_SATURATION_TOLERANCE } from './fix';
import type { TraceResult } from './types';

export interface ReadTraceOptions extends TraceCsvOptions {
	/** engine fluid id of the sheet */
	fluid: string;
	/** K, see DEFAULT_SATURATION_TOLERANCE */
	toleranceK?: number;
	/**
	 * Leave rejected lines out and keep the rest. Off by default: a file with any rejected line is
	 * refused whole and nothing is kept, so nobody draws half a log without knowing it.
	 */
	allowRejected?: boolean;
}

/**
 * A logger CSV → a measured trace: read and checked line by line (csv.ts), each point fixed with
 * the engine (fix.ts). Refuses the whole file for a file-level problem (size, rows, header, units)
 * and, unless `allowRejected`, for any rejected line — listing every rejected line (up to
 * MAX_LISTED_REJECTIONS) with its number and reason.
 */
export function readTraceCsv(input: string | Uint8Array, options: ReadTraceOptions): TraceResult {
	const tol = options.toleranceK ?? DEFAULT_SATURATION_TOLERANCE;
	if (!(tol >= 0 && tol <= MAX_SATURATION_TOLERANCE))
		throw new RangeError(`toleranceK must be within 0…${MAX_SATURATION_TOLERANCE} K`);
	const parsed = parseTraceCsv(input, options);
	if (!parsed.ok) return parsed;
	const fixed = fixTracePoints(options.fluid, parsed.points, { toleranceK: tol });
	const rejected = [...parsed.rejected, ...fixed.rejected]
		.sort((a, b) => a.line - b.line)
		.slice(0, MAX_LISTED_REJECTIONS);
	const rejectedCount = parsed.rejectedCount + fixed.rejected.length;

	if (rejectedCount > 0 && !options.allowRejected) {
		return {
			ok: false,
			code: 'rejected-lines',
			message:
				`${rejectedCount} line${rejectedCount === 1 ? '' : 's'} of the file could not be read — ${problemSummary(rejected, rejectedCount)}.` +
				` Nothing was saved. Correct ${rejectedCount === 1 ? 'it' : 'them'} and upload again, or upload again leaving ${rejectedCount === 1 ? 'it' : 'them'} out.`,
			rejected,
			rejectedCount
		};
	}
	if (fixed.points.length === 0)
		return {
			ok: false,
			code: 'no-points',
			message:
				'The file has a header but no readings below it. Add one line per reading under the header.',
			rejected,
			rejectedCount
		};
	return {
		ok: true,
		columns: parsed.columns,
		points: fixed.points,
		rejected,
		rejectedCount,
		notes: parsed.notes,
		delimiter: parsed.delimiter,
		startedAt: parsed.startedAt,
		inDomeCount: fixed.points.filter((p) => p.inDome).length
	};
}
