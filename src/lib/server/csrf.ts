import { jsonError } from './api';

/*
 * Cross-site form posts, checked here instead of by SvelteKit's built-in check (switched off in
 * svelte.config.js) for two reasons:
 *
 * - A script that uploads a logger file with `Authorization: Bearer …` and multipart/form-data
 *   (curl -F) sends no Origin header. Browsers never attach an Authorization header to a
 *   cross-site request without a CORS preflight, which this app never grants, so such a request
 *   cannot be forged by another site: it passes.
 * - On /api/* the refusal answers in the API's JSON error shape, not as plain text.
 *
 * Everything else is as SvelteKit does it: a POST, PUT, PATCH or DELETE with a form content type
 * (the types an HTML form can send without a preflight) must come from this app's own origin.
 */

// the types an HTML form (or SvelteKit's own binary form encoding) sends without a preflight
const FORM_TYPES = new Set([
	'application/x-www-form-urlencoded',
	'multipart/form-data',
	'text/plain',
	'application/x-sveltekit-formdata'
]);
const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

function formContentType(request: Request): boolean {
	const type = request.headers.get('content-type')?.split(';', 1)[0].trim().toLowerCase() ?? '';
	return FORM_TYPES.has(type);
}

/**
 * The refusal for a cross-site form submission, or null when the request may go on. `hasSession`:
 * the request carries a session cookie. On the API a request without one has nothing to forge (it
 * goes on, and is answered 401 where sign-in is needed); pages stay strict (sign-in forms too).
 */
export function crossSiteFormRefusal(
	request: Request,
	url: URL,
	hasSession: boolean
): Response | null {
	if (!UNSAFE.has(request.method) || !formContentType(request)) return null;
	if (request.headers.get('origin') === url.origin) return null;
	const api = url.pathname.startsWith('/api/');
	if (api && !hasSession) return null;
	if (api && /^Bearer\s+\S+\s*$/i.test(request.headers.get('authorization') ?? '')) return null;
	const message = `Cross-site ${request.method} form submissions are refused. Submit the form from ${url.origin}, or from a script send "Authorization: Bearer <team API token>".`;
	if (api) return jsonError(403, 'cross-site-form', message);
	return new Response(message, {
		status: 403,
		headers: { 'content-type': 'text/plain; charset=utf-8' }
	});
}
