/**
 * Requests coalesced to the latest input: while dragging, the chart reports every pointer move,
 * but at most one request is in flight; moves arriving meanwhile replace each other, and only the
 * newest is sent when the running one lands. Answers are delivered in order, each the moment it
 * lands; after `cancel()` (the gesture was undone or superseded) an answer still in flight is
 * dropped as stale. With `minIntervalMs`, requests also start at least that far apart (an input
 * arriving sooner waits, replaced by newer ones) until `flush()` sends the waiting one at once.
 * Pure logic: `run` does the fetching.
 */
export interface Coalescer<I> {
	/** Ask for `input`: now if idle, else after the running request (replacing any waiting input). */
	submit(input: I): void;
	/** Send the waiting input now if nothing is in flight (not waiting out the spacing). */
	flush(): void;
	/** Drop the waiting input and ignore the answer in flight. */
	cancel(): void;
	/** True while a request is in flight or an input waits. */
	readonly busy: boolean;
	/** Resolves once nothing is in flight and nothing waits. */
	idle(): Promise<void>;
	/** Counts, for tests and benchmarks. */
	readonly stats: { sent: number; delivered: number; dropped: number; replaced: number };
}

export interface CoalescerHandlers<I, O> {
	/** an answer for `input` (never for a cancelled generation) */
	result(output: O, input: I): void;
	/** a failure for `input` (likewise) */
	error(error: unknown, input: I): void;
}

export interface CoalescerOptions {
	/** the least time from the start of one request to the start of the next (default 0) */
	minIntervalMs?: number;
}

export function createCoalescer<I, O>(
	run: (input: I) => Promise<O>,
	handlers: CoalescerHandlers<I, O>,
	options: CoalescerOptions = {}
): Coalescer<I> {
	const spacing = options.minIntervalMs ?? 0;
	let lastStart = -Infinity;
	let timer: ReturnType<typeof setTimeout> | undefined;
	let inFlight = false;
	let waiting: { input: I } | null = null;
	let generation = 0;
	let idleWaiters: Array<() => void> = [];
	const stats = { sent: 0, delivered: 0, dropped: 0, replaced: 0 };

	function settleIdle() {
		if (inFlight || waiting) return;
		const w = idleWaiters;
		idleWaiters = [];
		for (const f of w) f();
	}

	/**
	 * Start `input` now, or wait out the spacing since the last start (nothing is in flight then:
	 * only `flush` starts a request meanwhile, and it stops the wait); the newest input goes.
	 */
	function startOrWait(input: I) {
		const wait = lastStart + spacing - Date.now();
		if (wait <= 0) return start(input);
		waiting = { input };
		timer ??= setTimeout(() => {
			timer = undefined;
			if (waiting) start(waiting.input);
		}, wait);
	}

	function clearWait() {
		clearTimeout(timer);
		timer = undefined;
	}

	/** Send `input`, the newest: an older input still waiting (for the spacing's timer) is dropped. */
	function start(input: I) {
		clearWait();
		waiting = null;
		inFlight = true;
		lastStart = Date.now();
		stats.sent++;
		const gen = generation;
		let promise: Promise<O>;
		try {
			promise = run(input);
		} catch (e) {
			promise = Promise.reject(e);
		}
		promise.then(
			(out) => finish(gen, () => handlers.result(out, input)),
			(err) => finish(gen, () => handlers.error(err, input))
		);
	}

	function finish(gen: number, deliver: () => void) {
		inFlight = false;
		if (gen === generation) {
			stats.delivered++;
			try {
				deliver();
			} catch (e) {
				// a handler's fault must not stall the queue
				console.error(e);
			}
		} else stats.dropped++;
		const next = waiting;
		waiting = null;
		if (next) startOrWait(next.input);
		else settleIdle();
	}

	return {
		submit(input) {
			if (waiting) stats.replaced++;
			if (inFlight) waiting = { input };
			else startOrWait(input);
		},
		flush() {
			if (waiting && !inFlight) start(waiting.input);
		},
		cancel() {
			generation++;
			if (waiting) stats.replaced++;
			waiting = null;
			clearWait();
			settleIdle();
		},
		get busy() {
			return inFlight || waiting !== null;
		},
		idle() {
			if (!inFlight && !waiting) return Promise.resolve();
			return new Promise((resolve) => idleWaiters.push(resolve));
		},
		stats
	};
}
