import { expect, test } from '@playwright/test';
import { exchange, openSocket, rawRequest } from '../src/lib/server/testing-http';
import { PORT } from './helpers';

/*
 * A client that keeps its connection alive sends its next request on the same socket after an
 * early refusal. The built app used to leave such a body unread, and the next request on the
 * socket was reset (ECONNRESET); hooks.server.ts now drains it (src/lib/server/body.ts).
 */
const BIG = Buffer.alloc(300 * 1024, 'x');

for (const [name, method, path, status] of [
	['a 300 kB body answered 413 by a compute route', 'POST', '/api/v1/legs', 413],
	['a 300 kB body answered 405 (wrong method)', 'PUT', '/api/v1/paths', 405],
	['a 300 kB body answered 405 on a GET-only route', 'POST', '/api/v1/fluids', 405]
] as const) {
	test(`${name}: the next request on the same connection is answered`, async () => {
		const socket = await openSocket(PORT);
		try {
			const first = await exchange(socket, rawRequest(method, path, BIG));
			expect(first.status).toBe(status);
			expect(JSON.parse(first.body).error.code).toBe(
				status === 413 ? 'too-large' : 'method-not-allowed'
			);
			expect(first.headers.connection).not.toBe('close');
			const second = await exchange(
				socket,
				rawRequest(
					'POST',
					'/api/v1/states',
					JSON.stringify({ fluid: 'water', inputs: { T: 450, P: 1e6 } })
				)
			);
			expect(second.status).toBe(200);
			expect(JSON.parse(second.body).state.phase).toBe('compressed-liquid');
			const third = await exchange(socket, rawRequest('GET', '/api/v1/fluids'));
			expect(third.status).toBe(200);
		} finally {
			socket.destroy();
		}
	});
}
