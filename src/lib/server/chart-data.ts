import { createHash } from 'node:crypto';
import { getFluid, listFluids, saturationCurve, ThermoError } from '$lib/thermo';
import type { ChartData, ChartDataRef } from '$lib/chart-data';

/*
 * Per-fluid chart data (the dome and the fluid list), computed once per process and fluid, kept as
 * its JSON text with a version taken from that text. A page carries only the versioned URL; the
 * answer under it never changes, so browsers and proxies keep it for a year.
 */

export interface ChartDataEntry {
	version: string;
	body: Uint8Array<ArrayBuffer>;
	etag: string;
}

const entries = new Map<string, ChartDataEntry>();
const utf8 = new TextEncoder();

function build(fluid: string): ChartDataEntry {
	let saturation = null;
	let saturationError: string | null = null;
	try {
		saturation = saturationCurve(fluid, 100);
	} catch (e) {
		if (!(e instanceof ThermoError)) throw e;
		console.error(`[statewright] the vapor dome of ${fluid} could not be traced: ${e.message}`);
		saturationError = e.message;
	}
	const data: ChartData = { fluid, saturation, saturationError, fluids: listFluids() };
	const body = utf8.encode(JSON.stringify(data));
	const version = createHash('sha256').update(body).digest('base64url').slice(0, 16);
	return { version, body, etag: `"${version}"` };
}

/** The chart data of a fluid (by id or alias; throws ThermoError `unknown-fluid`). */
export function chartData(fluid: string): ChartDataEntry {
	const id = getFluid(fluid).id;
	let e = entries.get(id);
	if (!e) {
		e = build(id);
		entries.set(id, e);
	}
	return e;
}

/** The versioned URL of a fluid's chart data, for a page to hand to the browser. */
export function chartDataRef(fluid: string): ChartDataRef {
	const id = getFluid(fluid).id;
	return {
		fluid: id,
		url: `/api/v1/fluids/${encodeURIComponent(id)}/chart-data/${chartData(id).version}`
	};
}

let names: Record<string, string> | undefined;

/** Fluid names by id, for lists of sheets (built once: the fluid list never changes while running). */
export function fluidNames(): Record<string, string> {
	names ??= Object.fromEntries(listFluids().map((f) => [f.id, f.name]));
	return names;
}
