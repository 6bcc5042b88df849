import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterEach, describe, expect, it } from 'vitest';
import { getRequest, setResponse } from '@sveltejs/kit/node';
import { drainUnread, readCapped } from './body';
import { exchange, openSocket, rawRequest } from './testing-http';

/*
 * An in-process server on 127.0.0.1 that turns Node's request into a web Request the way
 * adapter-node does (getRequest with its body limit), answers like a route, and passes the answer
 * through drainUnread as hooks.server.ts does. (Without it, the built app reset the next request on
 * the socket: tests/api-keepalive.spec.ts checks the real server.)
 */
let server: Server | undefined;

async function serve(
	route: (request: Request) => Promise<Response>,
	bodySizeLimit = 512 * 1024
): Promise<number> {
	server = createServer(async (req, res) => {
		const request = await getRequest({ request: req, base: 'http://127.0.0.1', bodySizeLimit });
		const response = await route(request);
		await setResponse(res, await drainUnread(request, response));
	});
	await new Promise<void>((r) => server!.listen(0, '127.0.0.1', r));
	return (server.address() as AddressInfo).port;
}

afterEach(async () => {
	const s = server;
	server = undefined;
	if (!s) return;
	s.closeAllConnections();
	await new Promise((r) => s.close(r));
});

const json = (status: number, body: unknown) =>
	new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

/** A route that refuses a body on its declared size without reading it (as readJson does), and answers GETs. */
async function earlyRefusal(request: Request): Promise<Response> {
	if (request.method === 'GET') return json(200, { ok: true });
	try {
		await readCapped(
			request,
			64 * 1024,
			() => Object.assign(new Error('too large'), { status: 413 }),
			() => new Error('unreadable')
		);
		return json(200, { read: true });
	} catch {
		return json(413, { error: { code: 'too-large', message: 'The body is larger than 64 kB.' } });
	}
}

describe('drainUnread: the connection after an early refusal', () => {
	it('a 300 kB body refused with 413 is drained: the next request on the same socket is answered', async () => {
		const port = await serve(earlyRefusal);
		const socket = await openSocket(port);
		const first = await exchange(socket, rawRequest('POST', '/x', Buffer.alloc(300 * 1024, 'a')));
		expect(first.status).toBe(413);
		expect(first.headers.connection).not.toBe('close');
		const second = await exchange(socket, rawRequest('GET', '/y'));
		expect(second.status).toBe(200);
		expect(JSON.parse(second.body)).toEqual({ ok: true });
		socket.destroy();
	});

	it('a body the route never looked at (a 405) is drained too', async () => {
		const port = await serve(async (request) =>
			request.method === 'GET'
				? json(200, { ok: true })
				: json(405, { error: { code: 'method-not-allowed', message: 'Use GET.' } })
		);
		const socket = await openSocket(port);
		expect(
			(await exchange(socket, rawRequest('PUT', '/x', Buffer.alloc(300 * 1024, 'b')))).status
		).toBe(405);
		expect((await exchange(socket, rawRequest('GET', '/y'))).status).toBe(200);
		socket.destroy();
	});

	it('a body the route read is left alone, and the connection stays open', async () => {
		const port = await serve(earlyRefusal);
		const socket = await openSocket(port);
		const first = await exchange(socket, rawRequest('POST', '/x', '{"a":1}'));
		expect(first.status).toBe(200);
		expect(first.headers.connection).not.toBe('close');
		expect((await exchange(socket, rawRequest('GET', '/y'))).status).toBe(200);
		socket.destroy();
	});

	it('a body past the drain cap or refused by the server limit gets Connection: close instead', async () => {
		const response = await drainUnread(
			new Request('http://x/', { method: 'POST', body: 'x'.repeat(2000) }),
			json(405, {}),
			1000
		);
		expect(response.headers.get('connection')).toBe('close');
		const small = await drainUnread(
			new Request('http://x/', { method: 'POST', body: 'x'.repeat(999) }),
			json(405, {}),
			1000
		);
		expect(small.headers.get('connection')).toBeNull();
		const failing = new Request('http://x/', {
			method: 'POST',
			body: new ReadableStream({ start: (c) => c.error(new Error('over the server limit')) }),
			duplex: 'half'
		} as RequestInit);
		expect((await drainUnread(failing, json(413, {}))).headers.get('connection')).toBe('close');
	});
});
