/**
 * Read a request body of at most `max` bytes. A declared or actual size past the limit throws
 * `tooLarge()`; past the limit the stream is still drained (bounded by the server's
 * BODY_SIZE_LIMIT), since cancelling it would drop the connection before the 413 is sent. A
 * dropped upload throws `unreadable()`; the server's own body limit counts as too large.
 */
export async function readCapped(request: Request, max: number, tooLarge: () => Error, unreadable: () => Error): Promise<Buffer> {
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
