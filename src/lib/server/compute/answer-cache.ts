/**
 * The compute GET routes' answer cache: least recently used first out, bounded by the bytes it
 * holds (UTF-8 bodies plus keys plus a fixed allowance per entry) and by its number of entries.
 * An answer larger than a quarter of the byte bound is served but not kept, so one request can
 * never push the rest out.
 */

export interface CachedAnswer {
	/** the JSON answer, UTF-8 */
	body: Uint8Array<ArrayBuffer>;
	etag: string;
	/** units of work it cost (charged again when it is served from here) */
	units: number;
}

export interface AnswerCacheOptions {
	maxBytes: number;
	maxEntries: number;
}

/** Bytes counted per entry besides its body and key: Map slot, record, ETag (an estimate, on the safe side). */
export const ENTRY_OVERHEAD_BYTES = 256;

export interface AnswerCache {
	get(key: string): CachedAnswer | undefined;
	/** keeps the answer unless it is too large for the cache; returns whether it was kept */
	set(key: string, answer: CachedAnswer): boolean;
	clear(): void;
	readonly bytes: number;
	readonly size: number;
	readonly maxBytes: number;
	readonly maxEntries: number;
}

export function entryBytes(key: string, answer: CachedAnswer): number {
	// keys are URL paths and queries: ASCII after the URL parser's percent-encoding; 2 bytes a character to be safe
	return answer.body.byteLength + 2 * key.length + answer.etag.length + ENTRY_OVERHEAD_BYTES;
}

export function createAnswerCache({ maxBytes, maxEntries }: AnswerCacheOptions): AnswerCache {
	if (!(maxBytes > 0) || !(maxEntries >= 1))
		throw new RangeError('maxBytes must be > 0 and maxEntries >= 1');
	const map = new Map<string, { answer: CachedAnswer; bytes: number }>();
	let bytes = 0;

	function drop(key: string) {
		const e = map.get(key);
		if (!e) return;
		map.delete(key);
		bytes -= e.bytes;
	}

	return {
		get(key) {
			const e = map.get(key);
			if (!e) return undefined;
			map.delete(key); // re-insert: Map order is least recently used first
			map.set(key, e);
			return e.answer;
		},
		set(key, answer) {
			drop(key);
			const size = entryBytes(key, answer);
			if (size > maxBytes / 4) return false;
			while (map.size > 0 && (bytes + size > maxBytes || map.size + 1 > maxEntries))
				drop(map.keys().next().value as string);
			map.set(key, { answer, bytes: size });
			bytes += size;
			return true;
		},
		clear() {
			map.clear();
			bytes = 0;
		},
		get bytes() {
			return bytes;
		},
		get size() {
			return map.size;
		},
		maxBytes,
		maxEntries
	};
}
