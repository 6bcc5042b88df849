/**
 * Test helper: HTTP/1.1 exchanges over one raw TCP socket (node:net), as a keep-alive client that
 * sends its next request on the same connection. Used by body.test.ts (an in-process server) and
 * the browser suite's tests/api-keepalive.spec.ts (the built app). No production code uses it.
 */
import { connect, type Socket } from 'node:net';

export interface RawAnswer {
	status: number;
	headers: Record<string, string>;
	body: string;
}

export function openSocket(port: number, host = '127.0.0.1'): Promise<Socket> {
	return new Promise((resolve, reject) => {
		const s = connect(port, host);
		s.once('connect', () => resolve(s));
		s.once('error', reject);
	});
}

/** The request head for `method path` with a body of `bodyBytes` bytes (JSON content type), kept alive. */
export function rawRequest(
	method: string,
	path: string,
	body: Buffer | string = '',
	extra: Record<string, string> = {}
): Buffer {
	const b = typeof body === 'string' ? Buffer.from(body) : body;
	const headers: Record<string, string> = { host: '127.0.0.1', connection: 'keep-alive', ...extra };
	if (b.length) {
		headers['content-type'] ??= 'application/json';
		headers['content-length'] = String(b.length);
	}
	const head = `${method} ${path} HTTP/1.1\r\n${Object.entries(headers)
		.map(([k, v]) => `${k}: ${v}\r\n`)
		.join('')}\r\n`;
	return Buffer.concat([Buffer.from(head, 'latin1'), b]);
}

/** The answer parsed from `data`, or null while incomplete (content-length or chunked bodies). */
function parse(data: Buffer): RawAnswer | null {
	const end = data.indexOf('\r\n\r\n');
	if (end < 0) return null;
	const lines = data.subarray(0, end).toString('latin1').split('\r\n');
	const status = Number(lines[0].split(' ')[1]);
	const headers: Record<string, string> = {};
	for (const l of lines.slice(1))
		headers[l.slice(0, l.indexOf(':')).trim().toLowerCase()] = l.slice(l.indexOf(':') + 1).trim();
	const rest = data.subarray(end + 4);
	if (headers['content-length'] !== undefined) {
		const n = Number(headers['content-length']);
		return rest.length < n ? null : { status, headers, body: rest.subarray(0, n).toString('utf8') };
	}
	if (!/chunked/i.test(headers['transfer-encoding'] ?? ''))
		return status === 304 || status === 204 ? { status, headers, body: '' } : null;
	const chunks: Buffer[] = [];
	let i = 0;
	for (;;) {
		const nl = rest.indexOf('\r\n', i);
		if (nl < 0) return null;
		const n = parseInt(rest.subarray(i, nl).toString('latin1'), 16);
		if (n === 0)
			return rest.length < nl + 4
				? null
				: { status, headers, body: Buffer.concat(chunks).toString('utf8') };
		if (rest.length < nl + 2 + n + 2) return null;
		chunks.push(rest.subarray(nl + 2, nl + 2 + n));
		i = nl + 4 + n;
	}
}

/**
 * Write `request` on `socket` and resolve with the answer; rejects with the socket's error (e.g.
 * ECONNRESET) or when the server closes the connection before answering.
 */
export function exchange(socket: Socket, request: Buffer): Promise<RawAnswer> {
	return new Promise((resolve, reject) => {
		let data = Buffer.alloc(0);
		const done = () => {
			socket.off('data', onData);
			socket.off('error', onError);
			socket.off('close', onClose);
		};
		const onData = (chunk: Buffer) => {
			data = Buffer.concat([data, chunk]);
			const answer = parse(data);
			if (answer) {
				done();
				resolve(answer);
			}
		};
		const onError = (e: Error) => {
			done();
			reject(e);
		};
		const onClose = () => {
			done();
			reject(
				new Error(
					`the server closed the connection before answering (${data.length} bytes received)`
				)
			);
		};
		socket.on('data', onData);
		socket.on('error', onError);
		socket.on('close', onClose);
		socket.write(request);
	});
}
