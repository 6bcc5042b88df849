/**
 * Autosave of a sheet's working draft. Every edit is written at once to a local copy (so a
 * reload, a crash or a dropped connection loses nothing) and, after a quiet spell (800 ms), sent
 * to the server with the version it was based on. One save is in flight at a time; edits made
 * meanwhile go out when it lands. The server refusing with 409 (someone saved in between) stops
 * saving until the person chooses: load theirs, or keep theirs aside and overwrite. Offline and
 * server faults are retried with a growing delay; other refusals (400, 403, 404) wait for the
 * person. Pure logic with injected save, storage and clock, so it is unit-tested.
 */
import { ApiError, OfflineError, type SavedDraft } from './client';

export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'offline' | 'conflict' | 'error';

export interface ConflictInfo {
	version: number;
	updatedAt: number;
	updatedBy: string;
}

export interface AutosaveState {
	status: SaveStatus;
	/** the server version this editor's changes are based on */
	version: number;
	/** when the server last took a save from this editor */
	savedAt: number | null;
	/** why saving stopped or failed, for the screen */
	message: string | null;
	conflict: ConflictInfo | null;
}

/** What the local copy holds: the draft and the version it was based on. */
export interface LocalCopy<D> {
	doc: D;
	baseVersion: number;
	changedAt: number;
}

export type KeyValueStore = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

export interface AutosaveOptions<D> {
	save(doc: D, baseVersion: number): Promise<SavedDraft>;
	storage: KeyValueStore | null;
	/** the local copy's key, e.g. `sw:draft:<sheet id>` */
	key: string;
	onState(state: AutosaveState): void;
	/** quiet spell before a save, ms (default 800) */
	delay?: number;
	/** first retry after a network or server fault, ms (doubling up to 60 s; default 3000) */
	retryDelay?: number;
	now?: () => number;
}

export const AUTOSAVE_DELAY = 800;

/** The local copy under `key`, if one is there and readable. */
export function readLocalCopy<D>(storage: KeyValueStore | null, key: string): LocalCopy<D> | null {
	if (!storage) return null;
	try {
		const raw = storage.getItem(key);
		if (!raw) return null;
		const v = JSON.parse(raw) as LocalCopy<D>;
		if (
			typeof v !== 'object' ||
			v === null ||
			typeof v.baseVersion !== 'number' ||
			typeof v.doc !== 'object'
		)
			return null;
		return v;
	} catch {
		return null;
	}
}

export class Autosave<D> {
	#o: AutosaveOptions<D>;
	#state: AutosaveState;
	#pending: D | null = null;
	#seq = 0;
	#inFlight = false;
	#timer: ReturnType<typeof setTimeout> | undefined;
	#retry: number;
	#disposed = false;
	/** bumped by adopt(): a save that lands after it belongs to a draft that was let go */
	#epoch = 0;

	constructor(version: number, options: AutosaveOptions<D>) {
		this.#o = options;
		this.#retry = options.retryDelay ?? 3000;
		this.#state = { status: 'saved', version, savedAt: null, message: null, conflict: null };
	}

	get state(): AutosaveState {
		return this.#state;
	}
	/** True while an edit is not yet on the server. */
	get dirty(): boolean {
		return this.#pending !== null || this.#inFlight;
	}

	#set(patch: Partial<AutosaveState>) {
		this.#state = { ...this.#state, ...patch };
		this.#o.onState(this.#state);
	}

	#now() {
		return (this.#o.now ?? Date.now)();
	}

	#writeLocal(doc: D) {
		try {
			this.#o.storage?.setItem(
				this.#o.key,
				JSON.stringify({
					doc,
					baseVersion: this.#state.version,
					changedAt: this.#now()
				} satisfies LocalCopy<D>)
			);
		} catch {
			// storage full or disabled: the server copy is still the goal
		}
	}

	#clearLocal() {
		try {
			this.#o.storage?.removeItem(this.#o.key);
		} catch {
			// nothing to clear
		}
	}

	#schedule(ms: number) {
		clearTimeout(this.#timer);
		if (this.#disposed) return;
		this.#timer = setTimeout(() => void this.flush(), ms);
	}

	/** An edit: kept locally now, sent after the quiet spell. */
	change(doc: D): void {
		if (this.#disposed) return;
		this.#pending = doc;
		this.#seq++;
		this.#writeLocal(doc);
		if (this.#state.status === 'conflict') return;
		if (this.#state.status !== 'offline' && this.#state.status !== 'saving')
			this.#set({
				status: 'unsaved',
				message: this.#state.status === 'error' ? this.#state.message : null
			});
		if (!this.#inFlight) this.#schedule(this.#o.delay ?? AUTOSAVE_DELAY);
	}

	/** Send what is pending now (also on leaving the page, and when the connection returns). */
	async flush(): Promise<void> {
		clearTimeout(this.#timer);
		if (
			this.#disposed ||
			this.#inFlight ||
			this.#pending === null ||
			this.#state.status === 'conflict'
		)
			return;
		const doc = this.#pending;
		const seq = this.#seq;
		const epoch = this.#epoch;
		this.#inFlight = true;
		this.#set({ status: 'saving' });
		try {
			const r = await this.#o.save(doc, this.#state.version);
			this.#inFlight = false;
			this.#retry = this.#o.retryDelay ?? 3000;
			if (this.#disposed || epoch !== this.#epoch) return;
			if (seq === this.#seq) {
				this.#pending = null;
				this.#clearLocal();
				this.#set({ status: 'saved', version: r.version, savedAt: r.updatedAt, message: null });
			} else {
				// edited while saving: the newer draft goes next, on the new version
				this.#set({ status: 'unsaved', version: r.version, savedAt: r.updatedAt, message: null });
				this.#writeLocal(this.#pending!);
				this.#schedule(this.#o.delay ?? AUTOSAVE_DELAY);
			}
		} catch (e) {
			this.#inFlight = false;
			if (this.#disposed || epoch !== this.#epoch) return;
			if (e instanceof ApiError && e.status === 409) {
				const c = (e.body.current ?? null) as ConflictInfo | null;
				this.#set({ status: 'conflict', conflict: c, message: e.message });
			} else if (e instanceof OfflineError) {
				this.#set({
					status: 'offline',
					message: 'No connection: edits are kept in this browser and saved when it returns.'
				});
				this.#backoff();
			} else if (e instanceof ApiError && (e.status >= 500 || e.status === 429)) {
				this.#set({ status: 'error', message: `${e.message} Retrying.` });
				this.#backoff();
			} else {
				this.#set({ status: 'error', message: e instanceof Error ? e.message : String(e) });
			}
		}
	}

	#backoff() {
		this.#schedule(this.#retry);
		this.#retry = Math.min(60_000, this.#retry * 2);
	}

	/** The connection is back: try now. */
	online(): void {
		if (this.#state.status === 'offline' || this.#state.status === 'error') void this.flush();
	}

	/** After a conflict: keep these edits and save them over the version the server now has. */
	overwrite(serverVersion: number): void {
		this.#set({ status: 'unsaved', version: serverVersion, conflict: null, message: null });
		if (this.#pending !== null) {
			this.#writeLocal(this.#pending);
			void this.flush();
		} else this.#set({ status: 'saved' });
	}

	/** Start again from a draft loaded from the server (its version); the local copy goes. */
	adopt(version: number, savedAt: number | null = null): void {
		clearTimeout(this.#timer);
		this.#pending = null;
		this.#seq++;
		this.#epoch++;
		this.#clearLocal();
		this.#set({ status: 'saved', version, savedAt, conflict: null, message: null });
	}

	dispose(): void {
		this.#disposed = true;
		clearTimeout(this.#timer);
	}
}
