import type { Handle, HandleServerError, ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { dev } from '$app/environment';
import { randomUUID } from 'node:crypto';
import { startApp } from '$lib/server/startup';
import { getDb } from '$lib/server/database';
import {
	clearSessionCookie,
	sessionCookieName,
	setSessionCookie,
	validateSession
} from '$lib/server/auth';
import { authenticateToken } from '$lib/server/api-tokens';
import { codeForStatus, jsonError } from '$lib/server/api';
import { crossSiteFormRefusal } from '$lib/server/csrf';
import { drainUnread } from '$lib/server/body';

/** Migrations, mail and the demo seed, before the first request. */
export const init: ServerInit = async () => {
	await startApp({ dev });
};

const isApi = (path: string) => path.startsWith('/api/');

/** Bearer tokens on /api/v1/*; a bad token is refused outright (no silent fallback to a cookie). */
const authenticateApiToken: Handle = async ({ event, resolve }) => {
	event.locals.token = null;
	const header = event.request.headers.get('authorization');
	if (header === null || !event.url.pathname.startsWith('/api/v1/')) return resolve(event);
	const match = /^Bearer\s+(\S+)\s*$/i.exec(header);
	if (!match)
		return jsonError(
			401,
			'unauthenticated',
			'Send the token as "Authorization: Bearer swt_…".',
			{},
			{ 'www-authenticate': 'Bearer' }
		);
	const found = await authenticateToken(getDb(), match[1]);
	if (!found) {
		return jsonError(
			401,
			'invalid-token',
			'This API token is not valid: it may be mistyped or revoked. Create a new one in team settings.',
			{},
			{
				'www-authenticate': 'Bearer error="invalid_token"'
			}
		);
	}
	event.locals.token = found.principal;
	return resolve(event);
};

/** Cookie sessions: validate, renew when due, clear a stale cookie. */
const authenticateSession: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	event.locals.session = null;
	if (event.request.method === 'GET' || event.request.method === 'HEAD')
		event.locals.teamAccess = new Map();
	if (event.locals.token) return resolve(event);
	const token = event.cookies.get(sessionCookieName(event.url));
	if (token) {
		const found = await validateSession(getDb(), token);
		if (found) {
			event.locals.user = found.user;
			event.locals.session = found.session;
			if (found.session.renewed)
				setSessionCookie(event.cookies, event.url, token, found.session.expiresAt);
		} else {
			clearSessionCookie(event.cookies, event.url);
		}
	}
	return resolve(event);
};

/** Every /api/* error answers in the API's JSON shape, including unknown routes and wrong methods. */
const apiErrorShape: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	if (!isApi(event.url.pathname) || response.status < 400) return response;
	if ((response.headers.get('content-type') ?? '').includes('application/json')) {
		const body = await response
			.clone()
			.json()
			.catch(() => null);
		if (body && typeof body === 'object' && 'error' in body) return response;
		const message =
			body && typeof body.message === 'string'
				? body.message
				: `Request failed (${response.status}).`;
		const code = body?.code ?? codeForStatus(response.status);
		const extra = body && typeof body.ref === 'string' ? { ref: body.ref } : {};
		const headers = new Headers(response.headers);
		headers.delete('content-length');
		return jsonError(
			response.status,
			response.status === 413 ? 'too-large' : code,
			response.status === 413 ? tooLargeMessage() : message,
			extra,
			headers
		);
	}
	const message =
		response.status === 404
			? `There is no API route ${event.request.method} ${event.url.pathname}.`
			: response.status === 405
				? `${event.request.method} is not allowed on ${event.url.pathname}${response.headers.get('allow') ? `; use ${response.headers.get('allow')}` : ''}.`
				: `Request failed (${response.status}).`;
	const headers = new Headers(response.headers);
	headers.delete('content-type');
	headers.delete('content-length');
	return jsonError(response.status, codeForStatus(response.status), message, {}, headers);
};

/** The server's own body limit (adapter-node BODY_SIZE_LIMIT, default 512 kB) reached before a route read the body. */
function tooLargeMessage(): string {
	const m = /^\s*(\d+)\s*([KMG]?)\s*$/i.exec(process.env.BODY_SIZE_LIMIT ?? '512K');
	const bytes = m ? Number(m[1]) * 1024 ** ' KMG'.indexOf((m[2] || ' ').toUpperCase()) : NaN;
	const size =
		bytes > 0
			? bytes >= 1024 * 1024
				? `${(bytes / 1024 ** 2).toFixed(1)} MB`
				: `${Math.round(bytes / 1024)} kB`
			: 'its limit';
	return `The body is larger than the server accepts (${size}). Send a smaller request.`;
}

/** Cross-site form posts are refused before anything else runs (see src/lib/server/csrf.ts). */
const crossSiteForms: Handle = async ({ event, resolve }) =>
	crossSiteFormRefusal(
		event.request,
		event.url,
		event.cookies.get(sessionCookieName(event.url)) !== undefined
	) ?? resolve(event);

/** A body left unread by an early answer (413, 405, 401…) is drained, so the kept-alive connection stays usable. */
const drainUnreadBody: Handle = async ({ event, resolve }) =>
	drainUnread(event.request, await resolve(event));

const securityHeaders: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	const h = response.headers;
	h.set('x-content-type-options', 'nosniff');
	h.set('referrer-policy', 'same-origin');
	h.set('x-frame-options', 'DENY');
	h.set('cross-origin-opener-policy', 'same-origin');
	h.set('permissions-policy', 'camera=(), microphone=(), geolocation=(), payment=()');
	if (event.url.protocol === 'https:') h.set('strict-transport-security', 'max-age=31536000');
	// static assets never pass through here; everything that does is per-user or carries one-time tokens
	if (!h.has('cache-control')) h.set('cache-control', 'private, no-store');
	return response;
};

export const handle = sequence(
	drainUnreadBody,
	securityHeaders,
	crossSiteForms,
	apiErrorShape,
	authenticateApiToken,
	authenticateSession
);

export const handleError: HandleServerError = ({ error, event, status, message }) => {
	// 4xx here are the framework's own answers to bad requests (unknown route, wrong content type)
	if (status < 500) return { message, code: codeForStatus(status) };
	const ref = randomUUID().slice(0, 8);
	console.error(`[statewright] ${ref} ${event.request.method} ${event.url.pathname}`, error);
	return {
		message: `Something went wrong on our side (reference ${ref}).`,
		code: codeForStatus(status),
		ref
	};
};
