import { createHash, randomUUID } from 'node:crypto';
import { json, type RequestEvent } from '@sveltejs/kit';
import { ZodError, type z } from 'zod';
import { ThermoError, type ThermoErrorCode } from '$lib/thermo';
import { issueText, jsonError, readJson } from '../api';
import { AppError } from '../errors';
import { appLimits, retryAfterSeconds, type AnyLimiter } from '../rate-limit';
import { clientIp } from '../request';
import { createAnswerCache } from './answer-cache';

/*
 * Glue between the compute routes (/api/v1/fluids, /states, /legs, /paths) and the engine.
 * Compute routes touch no stored data and need no sign-in.
 *
 * Status codes (error body { "error": { "code", "message", "hint"?, "issues"?, "field"?, "candidates"? } }):
 *   200  the answer
 *   304  a GET whose ETag matches If-None-Match
 *   400  malformed request: not JSON, wrong shape or types, unknown fields, values out of their
 *        plain range (negative absolute P, x > 1, samples, too many isoline values…): code
 *        `invalid-json` or `invalid-input` (with `issues` naming each field), or the engine's
 *        input codes (wrong-input-count, non-positive-input, quality-out-of-range, invalid-leg,
 *        invalid-path, invalid-option, unknown-fluid in a body…)
 *   404  unknown fluid in the URL (code `unknown-fluid`, the message lists the fluids)
 *   405  wrong method (the foundation's hooks answer in the same shape)
 *   413  body over 64 kB (code `too-large`)
 *   415  body not sent as application/json (code `unsupported-media-type`)
 *   422  well-formed but the engine cannot answer: unreachable-target, target-is-invariant,
 *        out-of-range, below-triple-point, two-phase-pressure-temperature, inconsistent-inputs,
 *        ambiguous-state, no-convergence… — also any unexpected failure while computing
 *        (code `compute-failed`, logged with a reference): never a 5xx for what a client sends
 *   429  over COMPUTE_RATE_LIMIT units of work per second from one client (bursts of twice that),
 *        with Retry-After in seconds (code `rate-limited`). A request costs one unit per
 *        WORK_UNIT_POINTS points it asks for (begun), at least one: a state, the fluid list or a
 *        leg of up to 100 points is one unit; a path of 50 legs × 40 points is 20.
 *
 * Work caps (points × lines, legs × points) are checked by the schemas (schemas.ts) and refused
 * with a 400 naming the cap; docs/compute-limits.md explains them.
 */

/** Largest request body, bytes. */
export const MAX_BODY_BYTES = 64 * 1024;

/** Engine codes that mean the request itself was malformed (400); the rest are 422. */
const BAD_REQUEST_CODES = new Set<ThermoErrorCode>([
	'unknown-input',
	'wrong-input-count',
	'duplicate-property',
	'non-finite-input',
	'non-positive-input',
	'quality-out-of-range',
	'invalid-option',
	'invalid-leg',
	'invalid-path',
	'unknown-fluid'
]);

export function thermoStatus(code: ThermoErrorCode): number {
	return BAD_REQUEST_CODES.has(code) ? 400 : 422;
}

/** Points computed per unit of work charged against the rate limit. */
export const WORK_UNIT_POINTS = 100;

/** Units of work for a request that asks for `points` points: one per WORK_UNIT_POINTS begun, at least 1. */
export function workUnits(points: number): number {
	return Number.isFinite(points) && points > WORK_UNIT_POINTS
		? Math.ceil(points / WORK_UNIT_POINTS)
		: 1;
}

let limiter: { limiter: AnyLimiter; rate: number; burst: number } | undefined;

let clock: (() => number) | undefined;

function computeBucket(): { limiter: AnyLimiter; rate: number; burst: number } {
	if (!limiter) {
		const raw = process.env.COMPUTE_RATE_LIMIT;
		const rate = raw === undefined || raw.trim() === '' ? 100 : Number(raw);
		const ok = Number.isFinite(rate) && rate >= 0;
		if (!ok)
			console.warn(`[statewright] COMPUTE_RATE_LIMIT="${raw}" is not a number ≥ 0; using 100.`);
		const r = ok ? rate : 100;
		const burst = Math.max(1, 2 * r);
		limiter = {
			limiter: appLimits.limiter('compute', { ratePerSecond: r, burst, now: clock }),
			rate: r,
			burst
		};
	}
	return limiter;
}

/**
 * The compute limiter: COMPUTE_RATE_LIMIT units of work per second per client (default 100,
 * bursts 2×, 0 = off), shared by every app process on one PostgreSQL database.
 */
export function computeLimiter(): AnyLimiter {
	return computeBucket().limiter;
}

/** Forget the limiter so the next request reads COMPUTE_RATE_LIMIT again, with `now` as its clock (tests). */
export function resetComputeLimiter(now?: () => number): void {
	limiter = undefined;
	clock = now;
}

const clientKey = (event: RequestEvent) => clientIp(event) ?? 'unknown';

function rateLimitedError(retryAfterMs: number, units: number): AppError {
	const { rate, burst } = computeBucket();
	const after = retryAfterSeconds({ retryAfterMs });
	const cost =
		units > 1
			? ` This request costs ${units} units (one per ${WORK_UNIT_POINTS} points asked for); fewer points cost less.`
			: '';
	return new AppError(
		429,
		'rate-limited',
		`Too many compute requests: at most ${rate} units of work per second from one client (bursts of ${burst}); a small request is one unit.${cost} Retry after ${after} s.`,
		undefined,
		{ retryAfterMs }
	);
}

/** Units charged so far to each request in flight (the GET cache keeps them with the answer). */
const charged = new WeakMap<RequestEvent, number>();

/**
 * Charge a request for the `points` it asks for, once its shape is checked: it paid one unit on
 * arrival, this takes the rest (capped at the burst, so any request within the work caps can pass
 * after a wait). Throws a 429 AppError with the wait when the client's bucket cannot pay.
 */
export async function chargeWork(event: RequestEvent, points: number): Promise<void> {
	const units = workUnits(points);
	await chargeUnits(event, units);
}

async function chargeUnits(event: RequestEvent, units: number): Promise<void> {
	const { limiter: l, burst } = computeBucket();
	if (!l.enabled) return;
	const target = Math.min(units, burst);
	const due = target - (charged.get(event) ?? 0);
	if (due <= 0) return;
	const r = await l.take(clientKey(event), due);
	if (!r.allowed) throw rateLimitedError(r.retryAfterMs, units);
	charged.set(event, target);
}

/** Turn anything thrown while computing into the error shape; never a 5xx. */
export function computeError(e: unknown, event: RequestEvent): Response {
	if (e instanceof AppError) {
		const headers: Record<string, string> = {};
		if (e.retryAfterMs !== undefined)
			headers['retry-after'] = retryAfterSeconds({ retryAfterMs: e.retryAfterMs });
		return jsonError(e.status, e.code, e.message, {}, headers);
	}
	if (e instanceof ZodError) {
		const { message, issues } = issueText(e.issues);
		return jsonError(400, 'invalid-input', message, { issues });
	}
	if (e instanceof ThermoError) {
		const extra: Record<string, unknown> = {};
		if (e.hint) extra.hint = e.hint;
		if (e.field !== undefined) extra.field = e.field;
		if (e.candidates !== undefined) extra.candidates = e.candidates;
		return jsonError(thermoStatus(e.code), e.code, e.message, extra);
	}
	const ref = randomUUID().slice(0, 8);
	console.error(`[statewright] compute ${ref} ${event.request.method} ${event.url.pathname}`, e);
	return jsonError(
		422,
		'compute-failed',
		`This request could not be computed (reference ${ref}). Please report it with the request body.`
	);
}

/** The unit every request pays on arrival, before its body or query is read. */
async function rateLimited(event: RequestEvent): Promise<Response | null> {
	const r = await computeLimiter().take(clientKey(event));
	if (r.allowed) {
		charged.set(event, 1);
		return null;
	}
	return computeError(rateLimitedError(r.retryAfterMs, 1), event);
}

/** Read a JSON body: application/json, at most MAX_BODY_BYTES, parsed and checked by `schema`. */
export function readBody<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
	return readJson(request, schema, {
		maxBytes: MAX_BODY_BYTES,
		sizeHint: 'a path of 50 legs fits easily in that.'
	});
}

/** Check URL query parameters against `schema` (each parameter once). */
export function readQuery<S extends z.ZodType>(url: URL, schema: S): z.infer<S> {
	const obj: Record<string, string> = {};
	for (const [k, v] of url.searchParams) {
		if (k in obj)
			throw new AppError(
				400,
				'invalid-input',
				`The query parameter "${k}" is given more than once.`
			);
		obj[k] = v;
	}
	return schema.parse(obj);
}

/** POST compute routes take everything in the JSON body: a query parameter is refused by name, never ignored. */
function refuseQuery(url: URL): void {
	const names = [...new Set(url.searchParams.keys())];
	if (names.length > 0)
		throw new AppError(
			400,
			'invalid-input',
			`Unknown field${names.length > 1 ? 's' : ''} ${names.map((n) => `"${n.slice(0, 40)}"`).join(', ')} in the query: this route takes its request in the JSON body, in SI units only.`
		);
}

/** An answer already serialised (by a compute worker): sent as it is, never parsed again. */
export class JsonText {
	constructor(readonly text: string) {}
}

/** A POST compute route: rate limit, then the handler's object (or JsonText) as JSON, errors in the shape. */
export function computePost<E extends RequestEvent>(
	handler: (event: E) => Promise<unknown> | unknown
) {
	return async (event: E): Promise<Response> => {
		const limited = await rateLimited(event);
		if (limited) return limited;
		try {
			refuseQuery(event.url);
			const out = await handler(event);
			if (out instanceof JsonText)
				return new Response(out.text, { headers: { 'content-type': 'application/json' } });
			return json(out);
		} catch (e) {
			return computeError(e, event);
		}
	};
}

/** The GET answer cache's bounds: a typical sheet's isolines answer is about 40 kB. */
export const CACHE_MAX_BYTES = 16 * 1024 * 1024;
export const CACHE_MAX_ENTRIES = 500;
const utf8 = new TextEncoder();
export const answerCache = createAnswerCache({
	maxBytes: CACHE_MAX_BYTES,
	maxEntries: CACHE_MAX_ENTRIES
});

/**
 * A cache-friendly GET compute route: the answer depends only on the URL (and the engine's
 * version), so it is memoised (answerCache: least recently used out, bounded in bytes and
 * entries), served with a strong ETag and `Cache-Control: public, max-age=86400`, and answered
 * 304 on a matching If-None-Match. A cached answer is charged the units it cost to compute.
 */
export function computeGet<E extends RequestEvent>(
	handler: (event: E) => Promise<unknown> | unknown
) {
	return async (event: E): Promise<Response> => {
		const limited = await rateLimited(event);
		if (limited) return limited;
		const key = event.url.pathname + event.url.search;
		let hit = answerCache.get(key);
		try {
			if (hit) await chargeUnits(event, hit.units);
			else {
				const out = await handler(event);
				const body = utf8.encode(out instanceof JsonText ? out.text : JSON.stringify(out));
				hit = {
					body,
					etag: `"${createHash('sha1').update(body).digest('base64url').slice(0, 27)}"`,
					units: charged.get(event) ?? 1
				};
				answerCache.set(key, hit);
			}
		} catch (e) {
			return computeError(e, event);
		}
		const headers = {
			etag: hit.etag,
			'cache-control': 'public, max-age=86400',
			vary: 'accept-encoding'
		};
		const inm = event.request.headers.get('if-none-match');
		const etag = hit.etag;
		if (inm && inm.split(',').some((t) => t.trim() === etag || t.trim() === `W/${etag}`))
			return new Response(null, { status: 304, headers });
		return new Response(hit.body, { headers: { ...headers, 'content-type': 'application/json' } });
	};
}
