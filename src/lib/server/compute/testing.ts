/**
 * Test helper: call a compute route's handler (GET or POST from its +server.ts) with a request
 * event built from a URL and an optional body, as SvelteKit would. No production code uses it.
 */
import type { RequestEvent } from '@sveltejs/kit';

export type Handler = (event: never) => Promise<Response> | Response;

export function computeEvent(
	url: string,
	init: {
		method?: string;
		body?: string;
		headers?: Record<string, string>;
		params?: Record<string, string>;
		client?: string;
	} = {}
): RequestEvent {
	const u = new URL(url, 'http://127.0.0.1');
	const headers = new Headers(init.headers ?? {});
	if (init.body !== undefined && !headers.has('content-type'))
		headers.set('content-type', 'application/json');
	const request = new Request(u, {
		method: init.method ?? (init.body === undefined ? 'GET' : 'POST'),
		body: init.body,
		headers
	});
	const fluid = /^\/api\/v1\/fluids\/([^/]+)\//.exec(u.pathname)?.[1];
	return {
		request,
		url: u,
		params: init.params ?? (fluid ? { id: decodeURIComponent(fluid) } : {}),
		getClientAddress: () => init.client ?? '127.0.0.1',
		locals: {},
		platform: undefined,
		route: { id: null },
		cookies: undefined,
		fetch,
		setHeaders: () => {},
		isDataRequest: false,
		isSubRequest: false,
		isRemoteRequest: false
	} as unknown as RequestEvent;
}

export async function callRoute(
	handler: Handler,
	url: string,
	init: Parameters<typeof computeEvent>[1] = {}
): Promise<{ status: number; headers: Headers; text: string; body: unknown }> {
	const response = await handler(computeEvent(url, init) as never);
	const text = response.status === 304 ? '' : await response.text();
	let body: unknown;
	try {
		body = text ? JSON.parse(text) : null;
	} catch {
		body = undefined;
	}
	return { status: response.status, headers: response.headers, text, body };
}
