import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { getDb } from '$lib/server/database';
import { apiRoute, jsonError } from '$lib/server/api';
import { requireTeam } from '$lib/server/guard';
import { AppError } from '$lib/server/errors';
import { listTraces, readUpload, TraceRefusedError, uploadTrace } from '$lib/server/traces';

/*
 * Measured traces of a sheet.
 *   GET ?points=none|chart|all → 200 { traces } (chart: at most 2000 evenly spaced points each)
 *   POST (designers, owners) → 201 { trace } — the logger CSV as multipart/form-data (field "file",
 *     optional "name", "tolerance" in K, "allowRejected") or as the body with Content-Type text/csv
 *     (options in the query: filename, name, tolerance, allowRejected). File convention:
 *     src/lib/traces/README.md.
 *     Refused files store nothing: 413 too-large, 422 empty / no-header / bad-header / unknown-unit /
 *     pressure-reference / rejected-lines / no-points / not-utf8, each with
 *     { rejected: [{ line, reason, text }], rejectedCount }. 415 for other content types.
 */

export const GET: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	const points = event.url.searchParams.get('points') ?? 'none';
	if (points !== 'none' && points !== 'chart' && points !== 'all')
		throw new AppError(400, 'invalid-points', 'points must be none, chart or all.');
	return { traces: await listTraces(getDb(), access, event.params.sheet, { points }) };
});

export const POST: RequestHandler = apiRoute(async (event) => {
	const access = await requireTeam(event, event.params.team, 'sheet:edit');
	try {
		const input = await readUpload(event.request, event.url);
		const { points, ...trace } = await uploadTrace(getDb(), access, event.params.sheet, input);
		return json({ trace: { ...trace, points: points.length } }, { status: 201 });
	} catch (e) {
		if (e instanceof TraceRefusedError)
			return jsonError(e.status, e.code, e.message, {
				rejected: e.rejected,
				rejectedCount: e.rejectedCount
			});
		throw e;
	}
});
