/**
 * Work that must not sit on a request's path: mail whose sending time would tell a caller whether
 * an account exists (reset requests, sign-ups with a taken address). The task starts on a later
 * turn of the event loop, after the handler has returned its answer; a failure is logged, never
 * thrown at the caller, who already has the same answer as everyone else.
 */

const pending = new Set<Promise<void>>();

export function afterResponse(what: string, task: () => Promise<unknown>): void {
	const p: Promise<void> = new Promise<void>((resolve) => setImmediate(resolve))
		.then(task)
		.then(
			() => undefined,
			(e: unknown) => console.error(`[statewright] ${what} failed:`, e)
		)
		.finally(() => pending.delete(p));
	pending.add(p);
}

/** Resolves once every task started so far (and any they started) has finished. For tests and shutdown. */
export async function backgroundSettled(): Promise<void> {
	while (pending.size > 0) await Promise.all([...pending]);
}
