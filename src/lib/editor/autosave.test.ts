import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { Autosave, readLocalCopy, type AutosaveState } from './autosave';
import { ApiError, OfflineError } from './client';

class MemoryStore {
	map = new Map<string, string>();
	getItem(k: string) {
		return this.map.get(k) ?? null;
	}
	setItem(k: string, v: string) {
		this.map.set(k, v);
	}
	removeItem(k: string) {
		this.map.delete(k);
	}
}

type Doc = { n: number };

/** A server holding a draft version; `mode` decides how the next save goes. */
function server() {
	const s = {
		version: 1,
		saves: [] as Array<{ doc: Doc; base: number }>,
		mode: 'ok' as 'ok' | 'offline' | 'conflict' | 'forbidden' | 'fault',
		latency: 100,
		save(doc: Doc, base: number) {
			s.saves.push({ doc, base });
			return new Promise<{ version: number; updatedAt: number; updatedBy: string }>(
				(resolve, reject) =>
					setTimeout(() => {
						if (s.mode === 'offline')
							return reject(new OfflineError(new TypeError('fetch failed')));
						if (s.mode === 'fault') return reject(new ApiError(503, 'unavailable', 'Busy.'));
						if (s.mode === 'forbidden')
							return reject(new ApiError(403, 'forbidden', 'Checkers cannot edit sheets.'));
						if (s.mode === 'conflict' || base !== s.version)
							return reject(
								new ApiError(409, 'draft-conflict', 'Maren saved this sheet.', {
									current: { version: s.version, updatedAt: 42, updatedBy: 'Maren' }
								})
							);
						s.version++;
						resolve({ version: s.version, updatedAt: Date.now(), updatedBy: 'me' });
					}, s.latency)
			);
		}
	};
	return s;
}

let store: MemoryStore;
let states: AutosaveState[];
beforeEach(() => {
	vi.useFakeTimers();
	store = new MemoryStore();
	states = [];
});
afterEach(() => vi.useRealTimers());

function make(srv: ReturnType<typeof server>, version = 1) {
	return new Autosave<Doc>(version, {
		save: (d, v) => srv.save(d, v),
		storage: store,
		key: 'k',
		onState: (s) => states.push(s),
		delay: 800,
		retryDelay: 1000
	});
}
const last = () => states[states.length - 1];

describe('autosave', () => {
	it('keeps every edit locally at once and saves once after a quiet spell of 800 ms', async () => {
		const srv = server();
		const a = make(srv);
		a.change({ n: 1 });
		expect(readLocalCopy<Doc>(store, 'k')).toMatchObject({ doc: { n: 1 }, baseVersion: 1 });
		expect(last().status).toBe('unsaved');
		await vi.advanceTimersByTimeAsync(500);
		a.change({ n: 2 });
		await vi.advanceTimersByTimeAsync(799);
		expect(srv.saves).toHaveLength(0);
		await vi.advanceTimersByTimeAsync(1);
		expect(last().status).toBe('saving');
		await vi.advanceTimersByTimeAsync(100);
		expect(srv.saves).toEqual([{ doc: { n: 2 }, base: 1 }]);
		expect(last()).toMatchObject({ status: 'saved', version: 2 });
		expect(readLocalCopy(store, 'k')).toBeNull();
	});

	it('an edit during a save goes next, on the version that save returned', async () => {
		const srv = server();
		const a = make(srv);
		a.change({ n: 1 });
		await vi.advanceTimersByTimeAsync(850);
		a.change({ n: 2 });
		expect(a.dirty).toBe(true);
		await vi.advanceTimersByTimeAsync(50);
		expect(last().status).toBe('unsaved');
		expect(readLocalCopy<Doc>(store, 'k')).toMatchObject({ doc: { n: 2 }, baseVersion: 2 });
		await vi.advanceTimersByTimeAsync(900);
		expect(srv.saves.map((s) => [s.doc.n, s.base])).toEqual([
			[1, 1],
			[2, 2]
		]);
		expect(last()).toMatchObject({ status: 'saved', version: 3 });
		expect(a.dirty).toBe(false);
	});

	it('on 409 it stops, names who saved, keeps the local copy; overwrite saves on their version', async () => {
		const srv = server();
		srv.version = 5; // someone else saved four times
		const a = make(srv, 1);
		a.change({ n: 7 });
		await vi.advanceTimersByTimeAsync(900);
		expect(last()).toMatchObject({
			status: 'conflict',
			conflict: { version: 5, updatedBy: 'Maren' }
		});
		a.change({ n: 8 });
		await vi.advanceTimersByTimeAsync(5000);
		expect(srv.saves).toHaveLength(1);
		expect(readLocalCopy<Doc>(store, 'k')?.doc).toEqual({ n: 8 });
		a.overwrite(5);
		await vi.advanceTimersByTimeAsync(100);
		expect(srv.saves[1]).toEqual({ doc: { n: 8 }, base: 5 });
		expect(last()).toMatchObject({ status: 'saved', version: 6 });
	});

	it('offline: says so, retries with a growing delay, and saves when the connection returns', async () => {
		const srv = server();
		srv.mode = 'offline';
		const a = make(srv);
		a.change({ n: 1 });
		await vi.advanceTimersByTimeAsync(900);
		expect(last().status).toBe('offline');
		await vi.advanceTimersByTimeAsync(1100);
		expect(srv.saves).toHaveLength(2);
		await vi.advanceTimersByTimeAsync(1500);
		expect(srv.saves).toHaveLength(2); // the next retry waits 2 s
		srv.mode = 'ok';
		a.online();
		await vi.advanceTimersByTimeAsync(100);
		expect(last()).toMatchObject({ status: 'saved', version: 2 });
		expect(readLocalCopy(store, 'k')).toBeNull();
	});

	it('a server fault is retried; a refusal (403) waits for the person', async () => {
		const srv = server();
		srv.mode = 'fault';
		const a = make(srv);
		a.change({ n: 1 });
		await vi.advanceTimersByTimeAsync(900);
		expect(last()).toMatchObject({ status: 'error' });
		srv.mode = 'forbidden';
		await vi.advanceTimersByTimeAsync(1100);
		expect(last()).toMatchObject({ status: 'error', message: 'Checkers cannot edit sheets.' });
		const n = srv.saves.length;
		await vi.advanceTimersByTimeAsync(60_000);
		expect(srv.saves).toHaveLength(n);
		expect(readLocalCopy<Doc>(store, 'k')?.doc).toEqual({ n: 1 });
	});

	it('adopting the server draft drops the local copy and ignores a save still in flight', async () => {
		const srv = server();
		const a = make(srv);
		a.change({ n: 1 });
		await vi.advanceTimersByTimeAsync(850);
		a.adopt(9, 123);
		await vi.advanceTimersByTimeAsync(200);
		expect(last()).toMatchObject({ status: 'saved', version: 9, savedAt: 123 });
		expect(readLocalCopy(store, 'k')).toBeNull();
	});
});
