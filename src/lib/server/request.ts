import type { RequestEvent } from '@sveltejs/kit';
import type { ClientMeta, FlowContext } from './auth';
import { getMailer } from './mail';

/** The client's address (adapter-node: the socket, or ADDRESS_HEADER behind a proxy). */
export function clientIp(event: Pick<RequestEvent, 'getClientAddress'>): string | null {
	try {
		return event.getClientAddress();
	} catch {
		return null;
	}
}

export function clientMeta(event: RequestEvent): ClientMeta {
	return { ip: clientIp(event), userAgent: event.request.headers.get('user-agent') };
}

/** What account and team flows need from a request: where links point, how to mail, who asked. */
export function flowContext(event: RequestEvent): FlowContext {
	return {
		// adapter-node builds event.url from ORIGIN when it is set, so mails carry the public address
		origin: event.url.origin,
		send: async (message) => (await getMailer()).send(message),
		ip: clientIp(event)
	};
}

/**
 * Read a request body of at most `max` bytes. A declared or actual size past the limit throws
 * `tooLarge()`; past the limit the stream is still drained (bounded by the server's
 * BODY_SIZE_LIMIT), since cancelling it would drop the connection before the 413 is sent. A
 * dropped upload throws `unreadable()`; the server's own body limit counts as too large.
 */
export async function readCapped(request: Request, max: number, tooLarge: () => Error, unreadable: () => Error): Promise<Uint8Array> {
	const declared = Number(request.headers.get('content-length'));
	if (Number.isFinite(declared) && declared > max) throw tooLarge();
	if (!request.body) return new Uint8Array();
	const reader = request.body.getReader();
	const chunks: Uint8Array[] = [];
	let size = 0;
	try {
		for (;;) {
			const { done, value } = await reader.read();
			if (done) break;
			size += value.byteLength;
			if (size <= max) chunks.push(value);
		}
	} catch (e) {
		if ((e as { status?: number }).status === 413) throw tooLarge();
		throw unreadable();
	}
	if (size > max) throw tooLarge();
	return Buffer.concat(chunks);
}
