import { isHttpError, isRedirect, json, type RequestEvent } from '@sveltejs/kit';
import { ZodError, type z } from 'zod';
import { AppError, isAppError } from './errors';
import { readCapped } from './body';

/*
 * JSON API plumbing for /api/v1/*. Every error answers
 *   { "error": { "code": "…", "message": "…what was wrong and what to give instead…" } }
 * with a 4xx status (5xx only for our own faults).
 *
 *   export const GET = apiRoute(async (event) => {
 *     const access = await requireTeam(event, event.params.team);   // 401/403/404 in the shape above
 *     return { team: … };                                            // → 200 JSON
 *   });
 */

export interface ApiErrorBody {
	error: { code: string; message: string; issues?: Array<{ path: string; message: string }> };
}

export function jsonError(
	status: number,
	code: string,
	message: string,
	extra: Record<string, unknown> = {},
	headers?: HeadersInit
): Response {
	return json({ error: { code, message, ...extra } } satisfies ApiErrorBody, { status, headers });
}

const CODE_FOR_STATUS: Record<number, string> = {
	400: 'bad-request',
	401: 'unauthenticated',
	403: 'forbidden',
	404: 'not-found',
	405: 'method-not-allowed',
	409: 'conflict',
	410: 'gone',
	413: 'too-large',
	415: 'unsupported-media-type',
	422: 'unprocessable',
	429: 'rate-limited'
};

export function codeForStatus(status: number): string {
	return CODE_FOR_STATUS[status] ?? (status >= 500 ? 'internal' : 'error');
}

/** Whether a message already names its field ("limit must be …", "… \"limit\" …", "… start.T …"). */
function namesField(message: string, path: string): boolean {
	return (
		message.startsWith(`${path} `) ||
		message.includes(`"${path}"`) ||
		(path.length > 2 && message.includes(path))
	);
}

/**
 * Zod's issues as the API reports them: one sentence per issue naming its field ("limit: …"), unknown
 * fields named with what to do, and the list itself in `issues`.
 */
export function issueText(issues: z.core.$ZodIssue[]): {
	message: string;
	issues: { path: string; message: string }[];
} {
	const list = issues.map((i) => {
		const path = i.path.map(String).join('.');
		let message = i.message;
		if (i.code === 'unrecognized_keys' && !/^Unknown field/.test(message)) {
			const keys = (i as { keys: string[] }).keys;
			message = `Unknown field${keys.length > 1 ? 's' : ''} ${keys.map((k) => `"${k}"`).join(', ')}${path ? ` in ${path}` : ''}; remove ${keys.length > 1 ? 'them' : 'it'} (names are case-sensitive, values SI).`;
		} else if (i.code === 'invalid_type' && /expected object/.test(message))
			message = `${path || 'The body'} must be a JSON object.`;
		return { path, message };
	});
	const message = list
		.map((i) => (i.path && !namesField(i.message, i.path) ? `${i.path}: ${i.message}` : i.message))
		.map((t) => (/[.!?)]$/.test(t) ? t : `${t}.`))
		.join(' ');
	return { message, issues: list };
}

/** Turns anything thrown inside an API handler into the error shape; rethrows our own faults. */
export function toApiResponse(e: unknown): Response {
	if (isRedirect(e)) throw e;
	if (isHttpError(e)) {
		const body = e.body as App.Error;
		return jsonError(
			e.status,
			body.code ?? codeForStatus(e.status),
			body.message,
			{},
			e.status === 401 ? { 'www-authenticate': 'Bearer' } : undefined
		);
	}
	if (isAppError(e))
		return jsonError(
			e.status,
			e.code,
			e.message,
			e.field ? { field: e.field } : {},
			e.status === 401 ? { 'www-authenticate': 'Bearer' } : undefined
		);
	if (e instanceof ZodError) {
		const { message, issues } = issueText(e.issues);
		return jsonError(400, 'invalid-input', message, { issues });
	}
	throw e;
}

/** Wraps a handler: a returned object becomes 200 JSON, a Response passes through, errors take the shape. */
export function apiRoute<E extends RequestEvent>(
	handler: (event: E) => Promise<unknown> | unknown
): (event: E) => Promise<Response> {
	return async (event) => {
		try {
			const result = await handler(event);
			return result instanceof Response ? result : json(result);
		} catch (e) {
			return toApiResponse(e);
		}
	};
}

/**
 * Reads and validates a JSON body: 415 if not JSON, 413 over `maxBytes` (the message adds
 * `sizeHint`, e.g. what fits), 400 if empty, malformed or invalid for `schema`.
 */
export async function readJson<S extends z.ZodType>(
	request: Request,
	schema: S,
	{ maxBytes = 256 * 1024, sizeHint = '' }: { maxBytes?: number; sizeHint?: string } = {}
): Promise<z.infer<S>> {
	const type = request.headers.get('content-type') ?? '';
	if (!/^application\/(?:[\w.+-]+\+)?json\b/i.test(type))
		throw new AppError(
			415,
			'unsupported-media-type',
			`Send the body as JSON with "Content-Type: application/json" (got ${type ? `"${type.slice(0, 60)}"` : 'no content type'}).`
		);
	const limit = `The body is larger than ${Math.round(maxBytes / 1024)} kB`;
	const tooLarge = () =>
		new AppError(
			413,
			'too-large',
			sizeHint
				? `${limit}; ${sizeHint} Send a smaller request.`
				: `${limit}; send a smaller request.`
		);
	const unreadable = () =>
		new AppError(400, 'invalid-json', 'The request body could not be read completely.');
	const text = (await readCapped(request, maxBytes, tooLarge, unreadable)).toString('utf8');
	if (text.trim() === '')
		throw new AppError(
			400,
			'invalid-json',
			'The body is empty; send a JSON object (see the API documentation for its fields).'
		);
	let value: unknown;
	try {
		value = JSON.parse(text);
	} catch (e) {
		throw new AppError(
			400,
			'invalid-json',
			`The body is not valid JSON (${(e as Error).message.slice(0, 120)}). Numbers must be plain JSON numbers: no NaN, Infinity or units.`
		);
	}
	return schema.parse(value);
}
