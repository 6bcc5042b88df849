/**
 * Undo and redo for sheet edits: a stack of whole documents (small JSON), one entry per edit.
 * A drag is one edit: the page pushes once, when the gesture ends. Pushing after an undo drops
 * the redo branch, as editors do. Pure logic, no framework.
 */
export class History<T> {
	#past: T[] = [];
	#future: T[] = [];
	#present: T;
	readonly limit: number;
	readonly #same: (a: T, b: T) => boolean;

	constructor(initial: T, options: { limit?: number; same?: (a: T, b: T) => boolean } = {}) {
		this.#present = initial;
		this.limit = Math.max(1, options.limit ?? 200);
		this.#same = options.same ?? ((a, b) => a === b);
	}

	get present(): T {
		return this.#present;
	}
	get canUndo(): boolean {
		return this.#past.length > 0;
	}
	get canRedo(): boolean {
		return this.#future.length > 0;
	}
	/** Entries behind and ahead of the present. */
	get depth(): { undo: number; redo: number } {
		return { undo: this.#past.length, redo: this.#future.length };
	}

	/** Record a new present; a value equal to the present is not an edit (returns false). */
	push(next: T): boolean {
		if (this.#same(next, this.#present)) return false;
		this.#past.push(this.#present);
		if (this.#past.length > this.limit) this.#past.splice(0, this.#past.length - this.limit);
		this.#present = next;
		this.#future = [];
		return true;
	}

	/** Step back: the new present, or null when there is nothing to undo. */
	undo(): T | null {
		const prev = this.#past.pop();
		if (prev === undefined) return null;
		this.#future.push(this.#present);
		this.#present = prev;
		return prev;
	}

	redo(): T | null {
		const next = this.#future.pop();
		if (next === undefined) return null;
		this.#past.push(this.#present);
		this.#present = next;
		return next;
	}

	/** Forget everything and start again from `present` (e.g. after loading someone else's draft). */
	reset(present: T): void {
		this.#past = [];
		this.#future = [];
		this.#present = present;
	}
}
