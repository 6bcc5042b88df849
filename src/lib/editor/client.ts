/**
 * The browser's calls to the API for a sheet: compute a path, fetch isolines and the dome, save
 * the draft. Errors come back in the API's shape ({ error: { code, message } }) and are thrown as
 * ApiError; a network failure (offline, server gone) as OfflineError.
 */
import type {
	Formulation,
	Isoline,
	IsolineKind,
	PathResult,
	PathSpec,
	SaturationCurve
} from '$lib/thermo/types';
import type { SheetDoc } from '$lib/sheets/types';
import { fitPathPoints } from '$lib/compute-limits';

export class ApiError extends Error {
	readonly status: number;
	readonly code: string;
	readonly body: Record<string, unknown>;
	constructor(status: number, code: string, message: string, body: Record<string, unknown> = {}) {
		super(message);
		this.name = 'ApiError';
		this.status = status;
		this.code = code;
		this.body = body;
	}
}

export class OfflineError extends Error {
	constructor(cause: unknown) {
		super('The server could not be reached.', { cause });
		this.name = 'OfflineError';
	}
}

type Fetch = typeof fetch;

/**
 * One JSON call to the API: JSON in (when the body is a string), JSON out; a 204 is undefined.
 * A non-2xx answer throws ApiError with the API's error code and message, a network failure
 * OfflineError; an abort is passed on as it is.
 */
export async function apiCall<T>(f: Fetch, url: string, init: RequestInit = {}): Promise<T> {
	let res: Response;
	const json = typeof init.body === 'string';
	try {
		res = await f(url, {
			...init,
			headers: {
				accept: 'application/json',
				...(json ? { 'content-type': 'application/json' } : {}),
				...(init.headers ?? {})
			}
		});
	} catch (e) {
		if (e instanceof DOMException && e.name === 'AbortError') throw e;
		throw new OfflineError(e);
	}
	if (res.status === 204) return undefined as T;
	let body: unknown;
	try {
		body = await res.json();
	} catch {
		body = null;
	}
	if (!res.ok) {
		const err = (body as { error?: { code?: string; message?: string } } | null)?.error;
		throw new ApiError(
			res.status,
			err?.code ?? `http-${res.status}`,
			err?.message ?? `The server answered ${res.status}.`,
			(err ?? {}) as Record<string, unknown>
		);
	}
	return body as T;
}

/** POST /api/v1/paths: the whole path for a spec (its sampling thinned to the API's cap, for drawing). */
export async function postPath(spec: PathSpec, f: Fetch = fetch): Promise<PathResult> {
	const r = await apiCall<{ path: PathResult }>(f, '/api/v1/paths', {
		method: 'POST',
		body: JSON.stringify(fitPathPoints(spec))
	});
	return r.path;
}

/** GET /api/v1/fluids/{id}/isolines (cached by the browser: the answer depends on the URL only); water's by IAPWS-IF97 with `formulation` 'if97'. */
export async function getIsolines(
	fluid: string,
	kind: IsolineKind,
	values: number[],
	f: Fetch = fetch,
	formulation?: Formulation
): Promise<Isoline[]> {
	if (!values.length) return [];
	const q = values.map((v) => Number(v.toPrecision(12))).join(',');
	const by = formulation === 'if97' ? '&formulation=if97' : '';
	const r = await apiCall<{ lines: Isoline[] }>(
		f,
		`/api/v1/fluids/${encodeURIComponent(fluid)}/isolines?kind=${kind}&values=${q}&points=80${by}`
	);
	return r.lines;
}

export async function getSaturation(
	fluid: string,
	points = 100,
	f: Fetch = fetch
): Promise<SaturationCurve> {
	return apiCall<SaturationCurve>(
		f,
		`/api/v1/fluids/${encodeURIComponent(fluid)}/saturation?points=${points}`
	);
}

export interface SavedDraft {
	version: number;
	updatedAt: number;
	updatedBy: string;
}

/** PUT …/sheets/{id}/draft. A 409 is an ApiError with `body.current` naming who saved. */
export async function putDraft(
	team: string,
	sheet: string,
	version: number,
	doc: SheetDoc,
	f: Fetch = fetch
): Promise<SavedDraft> {
	return apiCall<SavedDraft>(
		f,
		`/api/v1/teams/${encodeURIComponent(team)}/sheets/${encodeURIComponent(sheet)}/draft`,
		{ method: 'PUT', body: JSON.stringify({ version, doc }) }
	);
}

export interface ServerSheet {
	id: string;
	title: string;
	version: number;
	updatedAt: number;
	updatedBy: string;
	doc: SheetDoc;
}

export async function getSheetDraft(
	team: string,
	sheet: string,
	f: Fetch = fetch
): Promise<ServerSheet> {
	const r = await apiCall<{ sheet: ServerSheet }>(
		f,
		`/api/v1/teams/${encodeURIComponent(team)}/sheets/${encodeURIComponent(sheet)}`
	);
	return r.sheet;
}
