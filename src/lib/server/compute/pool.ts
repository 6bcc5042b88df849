import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import { ThermoError } from '$lib/thermo';
import { runTask, type ComputeTask, type TaskOutcome } from './tasks';

/*
 * The engine work of the compute routes runs on a pool of worker threads (piscina), one per core by
 * default, so that one request's engine time does not hold up the event loop and throughput grows
 * with cores. The main thread keeps everything else: rate limits, body and query checks, the answer
 * cache and the HTTP answer; a worker gets a checked task and sends back the answer's JSON text.
 *
 * COMPUTE_WORKERS sets the pool size (default: the machine's available parallelism; 0 = no pool,
 * every task runs inline on the main thread). The pool needs the worker bundle that `vite build`
 * writes beside the server (build/compute-worker.js, see svelte.config.js); under `vite dev` and
 * vitest there is none, and tasks run inline.
 */

export const WORKER_FILE = 'compute-worker.js';

/**
 * The built worker bundle above this module (build/server/chunks/chunks/… → build/), if there is
 * one; from src/ (vite dev, vitest) the search finds none, as build/ is never an ancestor.
 */
function findWorkerFile(): string | undefined {
	let dir = dirname(fileURLToPath(import.meta.url));
	for (let i = 0; i < 6; i++) {
		const file = join(dir, WORKER_FILE);
		if (existsSync(file)) return file;
		dir = dirname(dir);
	}
	return undefined;
}

/** Pool size from COMPUTE_WORKERS (a whole number ≥ 0), else one worker per available core. */
export function poolSize(raw = process.env.COMPUTE_WORKERS): number {
	if (raw === undefined || raw.trim() === '') return availableParallelism();
	const n = Number(raw);
	if (Number.isInteger(n) && n >= 0) return n;
	console.warn(
		`[statewright] COMPUTE_WORKERS="${raw}" is not a whole number ≥ 0; using one worker per core (${availableParallelism()}).`
	);
	return availableParallelism();
}

export type ComputePool = Piscina<ComputeTask, TaskOutcome>;

/**
 * Tasks handed to a worker before it has finished the one it runs. A task runs synchronously, so two
 * never run at once; the second waits in the worker's own queue, and the worker goes straight on to
 * it instead of going to sleep and being woken for it. Measured with typical legs at 10 connections
 * (docs/performance.md): the server's CPU per request fell from 1.03–1.16 ms to 0.81–0.87 ms.
 */
export const TASKS_PER_WORKER = 2;

/** A pool of `size` workers started from the worker bundle `file`, kept for the process's life. */
export function startPool(file: string, size: number): ComputePool {
	return new Piscina<ComputeTask, TaskOutcome>({
		filename: file,
		minThreads: size,
		maxThreads: size,
		idleTimeout: Infinity,
		concurrentTasksPerWorker: TASKS_PER_WORKER
	});
}

let pool: ComputePool | null | undefined;

function thePool(): ComputePool | null {
	if (pool !== undefined) return pool;
	const size = poolSize();
	const file = size > 0 ? findWorkerFile() : undefined;
	pool = file ? startPool(file, size) : null;
	if (pool) console.log(`[statewright] compute pool: ${size} worker threads`);
	return pool;
}

/** Workers in the pool now (0 when tasks run inline). */
export function computeWorkers(): number {
	return thePool()?.threads.length ?? 0;
}

/**
 * Run a checked task on the pool (inline without one): the answer's JSON text. The engine's
 * refusals come back as the ThermoError they were; anything else rejects as an Error.
 */
export async function compute(
	task: ComputeTask,
	p: ComputePool | null = thePool()
): Promise<string> {
	const out = p ? await p.run(task) : runTask(task);
	if ('json' in out) return out.json;
	const r = out.refused;
	throw new ThermoError(r.code, r.message, r.hint, { field: r.field, candidates: r.candidates });
}
