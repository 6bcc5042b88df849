/**
 * Leg benchmark: median time to compute a 200-point leg with its saturation crossings, per process
 * kind, against the budget of ENGINEERING.md (≤ 3 ms). Prints a table; never fails on time.
 *
 * Run: npm run bench (after the engine bench), or npx tsx bench/legs.bench.ts
 *
 * Times are medians over batches after a warm-up, as wall time and as this process's CPU time
 * (user + system); on a shared machine the CPU time is the steadier figure and is the one compared
 * with the budget. The load average is printed beside them.
 */
import { loadavg } from 'node:os';
import { computeLeg, computePath } from '../src/lib/thermo/index.ts';
import type { LegSpec, PathSpec } from '../src/lib/thermo/types.ts';

const BUDGET_MS = 3;
const SAMPLES = 200;

const legs: [string, LegSpec][] = [
	['isobaric: water 101.325 kPa, 300 → 500 K', { fluid: 'water', start: { T: 300, P: 101325 }, process: 'isobaric', target: { T: 500 } }],
	['isochoric: water vessel 120 °C, x = 1e−4 → 220 °C', { fluid: 'water', start: { T: 393.15, x: 1e-4 }, process: 'isochoric', target: { T: 493.15 } }],
	['isothermal: water 450 K, 10 kPa → 10 MPa', { fluid: 'water', start: { T: 450, P: 1e4 }, process: 'isothermal', target: { P: 1e7 } }],
	['isentropic: water 800 K, 10 MPa → 10 kPa', { fluid: 'water', start: { T: 800, P: 1e7 }, process: 'isentropic', target: { P: 1e4 } }],
	['isenthalpic: water 500 K, 3 MPa → 0.1 MPa', { fluid: 'water', start: { T: 500, P: 3e6 }, process: 'isenthalpic', target: { P: 1e5 } }],
	['polytropic n = −0.5: water 300 K, 0.1 MPa → v 0.01', { fluid: 'water', start: { T: 300, P: 1e5 }, process: 'polytropic', n: -0.5, target: { v: 0.01 } }],
	['isobaric: ammonia 0.4 MPa, 250 → 320 K', { fluid: 'ammonia', start: { T: 250, P: 4e5 }, process: 'isobaric', target: { T: 320 } }],
	['isochoric: ammonia 300 K, x = 0.05 → 400 K', { fluid: 'ammonia', start: { T: 300, x: 0.05 }, process: 'isochoric', target: { T: 400 } }]
];

const sealedVessel: PathSpec = {
	fluid: 'water',
	system: { kind: 'closed', volume: 0.5 },
	start: { T: 393.15, x: 1e-4 },
	legs: [{ process: 'isochoric', target: { T: 493.15 } }],
	limits: { designPressure: 1.6e6, reliefSetPressure: 1.5e6, designTemperature: 473.15 }
};

function median(xs: number[]): number {
	const s = [...xs].sort((a, b) => a - b);
	const m = s.length >> 1;
	return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
}

/** Median wall and CPU ms per call over `batches` batches of `per` calls. */
function time(fn: () => unknown, batches = 15, per = 4): { wall: number; cpu: number } {
	for (let i = 0; i < 5; i++) fn();
	const wall: number[] = [], cpu: number[] = [];
	for (let b = 0; b < batches; b++) {
		const c0 = process.cpuUsage();
		const t0 = performance.now();
		for (let i = 0; i < per; i++) fn();
		const t1 = performance.now();
		const c = process.cpuUsage(c0);
		wall.push((t1 - t0) / per);
		cpu.push((c.user + c.system) / 1000 / per);
	}
	return { wall: median(wall), cpu: median(cpu) };
}

const pad = (s: string, n: number) => (s.length >= n ? s : s + ' '.repeat(n - s.length));
const num = (x: number) => x.toFixed(2).padStart(7);

console.log(`Statewright leg benchmark — ${SAMPLES}-point legs with their crossings (budget ≤ ${BUDGET_MS} ms, CPU median)`);
console.log(`node ${process.version}, load average ${loadavg().map((l) => l.toFixed(2)).join(' ')}\n`);
console.log(`${pad('leg', 52)} ${pad('points', 7)} ${pad('cross', 6)} ${'wall ms'.padStart(7)} ${'cpu ms'.padStart(7)}  budget`);
const cpus: number[] = [];
for (const [name, spec] of legs) {
	const s = { ...spec, samples: SAMPLES };
	const leg = computeLeg(s);
	const t = time(() => computeLeg(s));
	cpus.push(t.cpu);
	console.log(`${pad(name, 52)} ${String(leg.points.length).padStart(6)}  ${String(leg.crossings.length).padStart(5)} ${num(t.wall)} ${num(t.cpu)}  ${t.cpu <= BUDGET_MS ? 'within' : 'OVER'}`);
}
console.log(`\nmedian over the leg kinds: ${median(cpus).toFixed(2)} ms CPU (budget ${BUDGET_MS} ms)`);
const d = time(() => computeLeg({ ...legs[3][1] }));
console.log(`a default 40-point leg (isentropic above): ${d.wall.toFixed(2)} ms wall, ${d.cpu.toFixed(2)} ms CPU`);
const p = time(() => computePath(sealedVessel));
console.log(`the sealed-vessel path (1 leg, 3 design limits, 40 points): ${p.wall.toFixed(2)} ms wall, ${p.cpu.toFixed(2)} ms CPU`);
