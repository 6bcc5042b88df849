import type { RequestHandler } from './$types';
import { jsonError } from '$lib/server/api';
import { chartData, chartDataRef } from '$lib/server/chart-data';
import { computeError } from '$lib/server/compute/http';
import { fluidFromParam } from '$lib/server/compute/fluids';

/**
 * A fluid's chart data (the dome and the fluid list, $lib/chart-data.ts) under a content-versioned
 * URL: immutable, kept by the browser for a year, strong ETag, 304 on If-None-Match. Another
 * version than the current one is a 404 that names the current URL.
 */
export const GET: RequestHandler = (event) => {
	let entry;
	try {
		const fluid = fluidFromParam(event.params.id);
		entry = chartData(fluid.id);
		if (event.params.version !== entry.version) {
			const ref = chartDataRef(fluid.id);
			return jsonError(
				404,
				'unknown-version',
				`The chart data of ${fluid.id} is not at version "${event.params.version.slice(0, 40)}": fetch ${ref.url} (the current version) instead.`
			);
		}
	} catch (e) {
		return computeError(e, event);
	}
	const headers = {
		etag: entry.etag,
		'cache-control': 'public, max-age=31536000, immutable',
		vary: 'accept-encoding'
	};
	const inm = event.request.headers.get('if-none-match');
	if (inm && inm.split(',').some((t) => t.trim() === entry.etag || t.trim() === `W/${entry.etag}`))
		return new Response(null, { status: 304, headers });
	return new Response(entry.body, { headers: { ...headers, 'content-type': 'application/json' } });
};
