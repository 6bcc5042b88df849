/**
 * Read a request body of at most `max` bytes. A declared or actual size past the limit throws
 * `tooLarge()`; past the limit the stream is still drained (bounded by the server's
 * BODY_SIZE_LIMIT), since cancelling it would drop the connection before the 413 is sent. A body
 * refused on its declared size is left unread here and drained by `drainUnread` (hooks) once the
 * answer is ready. A dropped upload throws `unreadable()`; the server's own body limit counts as
 * too large.
 */
export async function readCapped(
	request: Request,
	max: number,
	tooLarge: () => Error,
	unreadable: () => Error
): Promise<Buffer> {
	const declared = Number(request.headers.get('content-length'));
	if (Number.isFinite(declared) && declared > max) throw tooLarge();
	if (!request.body) return Buffer.alloc(0);
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

/** Most bytes of an unread body drained after an early answer; past it the connection is closed. */
export const DRAIN_MAX_BYTES = 1024 * 1024;

/**
 * After an early answer (a 413 on the declared size, a 405, a 401 before the body was read…),
 * read and discard the body the route left unread, so the kept-alive connection is ready for the
 * client's next request: an unread body leaves the server's socket paused mid-request, and the
 * next request on it was reset. At most `max` bytes are read; a body the server's own limit
 * refuses or one past `max` instead gets `Connection: close` on the answer, so the client opens a
 * fresh connection for its next request.
 */
export async function drainUnread(
	request: Request,
	response: Response,
	max = DRAIN_MAX_BYTES
): Promise<Response> {
	const body = request.body;
	// a body a route began reading, it read to the end (readCapped, request.json(), formData())
	if (!body || request.bodyUsed || body.locked) return response;
	const reader = body.getReader();
	let size = 0;
	try {
		for (;;) {
			const { done, value } = await reader.read();
			if (done) return response;
			size += value.byteLength;
			if (size > max) break;
		}
	} catch {
		// the server's own limit or a dropped upload: nothing more to read on this connection
	}
	reader.releaseLock();
	return closing(response);
}

function closing(response: Response): Response {
	try {
		response.headers.set('connection', 'close');
		return response;
	} catch {
		// immutable headers (a fetched or redirect Response): copy it
		const copy = new Response(response.body, response);
		copy.headers.set('connection', 'close');
		return copy;
	}
}
