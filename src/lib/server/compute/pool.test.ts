import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ThermoError } from '$lib/thermo';
// eslint-disable-next-line no-restricted-imports -- the production worker entry, run by the pool under test
import { buildComputeWorker } from '../../../../scripts/compute-worker.js';
import { compute, poolSize, startPool, type ComputePool } from './pool';
import type { ComputeTask } from './tasks';

const typicalLeg: ComputeTask = {
	kind: 'leg',
	spec: {
		fluid: 'water',
		start: { T: 393.15, x: 0.3 },
		process: 'isochoric',
		target: { T: 450 }
	}
};
const tasks: ComputeTask[] = [
	typicalLeg,
	{
		kind: 'path',
		spec: {
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: 300, P: 1e5 },
			legs: [
				{ process: 'isobaric', target: { T: 500 } },
				{ process: 'isentropic', target: { P: 1e4 } }
			]
		}
	},
	{ kind: 'state', fluid: 'water', inputs: { T: 373.15, x: 0 }, options: {} },
	{ kind: 'isolines', fluid: 'water', line: 'isobar', values: [1e5, 1e6], points: 80 },
	{ kind: 'saturation', fluid: 'r134a', points: 30 }
];
const unreachable: ComputeTask = {
	kind: 'leg',
	spec: { fluid: 'water', start: { T: 300, P: 1e5 }, process: 'isobaric', target: { P: 2e5 } }
};

describe('poolSize (COMPUTE_WORKERS)', () => {
	it('reads a whole number ≥ 0, and falls back to one worker per core otherwise', () => {
		expect(poolSize('0')).toBe(0);
		expect(poolSize('3')).toBe(3);
		const cores = poolSize(undefined);
		expect(cores).toBeGreaterThan(0);
		expect(poolSize('')).toBe(cores);
		expect(poolSize('-1')).toBe(cores);
		expect(poolSize('two')).toBe(cores);
	});
});

describe('compute inline (no worker bundle under vitest)', () => {
	it('answers with the JSON text of the engine answer', async () => {
		const state = JSON.parse(await compute(tasks[2])) as {
			state: { P: number; rho: number; h: number };
		};
		// python3-iapws 1.5 (Debian), IAPWS95(T=373.15, x=0): P = 101417.99665987348 Pa, ρ = 958.3490516049192 kg/m³
		expect(state.state.P).toBeCloseTo(101417.99665987348, 2);
		expect(state.state.rho).toBeCloseTo(958.3490516049192, 6);
	});

	it('gives back the engine refusal as the ThermoError it was', async () => {
		const e = await compute(unreachable).catch((x: unknown) => x);
		expect(e).toBeInstanceOf(ThermoError);
		expect((e as ThermoError).code).toBe('target-is-invariant');
	});
});

describe('compute on worker threads (the built worker bundle)', () => {
	let dir: string;
	let pool: ComputePool;
	beforeAll(async () => {
		dir = mkdtempSync(join(tmpdir(), 'statewright-pool-'));
		const file = join(dir, 'compute-worker.js');
		await buildComputeWorker(file);
		pool = startPool(file, 2);
	});
	afterAll(async () => {
		await pool?.destroy();
		rmSync(dir, { recursive: true, force: true });
	});

	it('answers every kind of task with exactly the text the main thread computes', async () => {
		for (const task of tasks) {
			const [onPool, inline] = await Promise.all([compute(task, pool), compute(task, null)]);
			expect(onPool, task.kind).toBe(inline);
		}
	});

	it('keeps the refusal code, message, hint and candidates across the thread', async () => {
		const [onPool, inline] = await Promise.all(
			[pool, null].map((p) => compute(unreachable, p).catch((x: unknown) => x as ThermoError))
		);
		expect(onPool).toBeInstanceOf(ThermoError);
		expect((onPool as ThermoError).toJSON()).toEqual((inline as ThermoError).toJSON());
	});

	it('spreads concurrent tasks over its workers and answers each one', async () => {
		const answers = await Promise.all(Array.from({ length: 20 }, () => compute(typicalLeg, pool)));
		expect(new Set(answers).size).toBe(1);
		expect(pool.completed).toBeGreaterThanOrEqual(20);
		expect(pool.threads.length).toBe(2);
	});
});
