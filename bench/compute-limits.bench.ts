/**
 * What the compute API's work caps buy (docs/compute-limits.md). Prints figures; never fails.
 *
 * Run: npx vite build && npx tsx bench/compute-limits.bench.ts
 *
 * 1. In this process, with the engine: CPU time and answer size of the heaviest requests the API
 *    took before the caps (isochores 40 × 2000 points; a path of 50 legs × 200 points) and of the
 *    heaviest it takes now (40 × 100 isochores; 50 legs × 80 points).
 * 2. Against the built app on 127.0.0.1 (COMPUTE_RATE_LIMIT=0, a throw-away database): the server's
 *    CPU and memory for BENCH_REQUESTS (default 300) distinct isolines requests at the cap, one at a
 *    time, with /healthz timed between them. Bounded in count; nothing leaves this machine.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { computePath, isolines, type PathSpec } from '../src/lib/thermo/index.ts';

const REQUESTS = Math.min(2000, Number(process.env.BENCH_REQUESTS ?? 300));

function cpuMs(f: () => unknown): { ms: number; bytes: number } {
	f(); // warm
	const a = process.cpuUsage();
	const body = JSON.stringify(f());
	const d = process.cpuUsage(a);
	return { ms: (d.user + d.system) / 1000, bytes: Buffer.byteLength(body) };
}

const fmt = (r: { ms: number; bytes: number }) =>
	`${r.ms.toFixed(0).padStart(5)} ms CPU, ${(r.bytes / 1024).toFixed(0).padStart(5)} kB`;
const isochores = (n: number, k = 0) =>
	Array.from({ length: n }, (_, i) => Number((0.0012 * 1.25 ** i * (1 + k * 1e-4)).toPrecision(8)));
const path = (legs: number, samples: number): PathSpec =>
	({
		fluid: 'water',
		system: { kind: 'closed', mass: 1 },
		start: { T: 800, P: 1e7 },
		legs: Array.from({ length: legs }, (_, i) =>
			i % 2 === 0
				? { process: 'isentropic', target: { P: 1e4 } }
				: { process: 'isothermal', target: { P: 1e7 } }
		),
		samples
	}) as PathSpec;

console.log('Statewright compute caps — engine cost of one request (CPU ms, answer size)\n');
console.log(
	`before  isochores 40 × 2000 points    ${fmt(cpuMs(() => isolines('water', 'isochore', isochores(40), 2000)))}`
);
console.log(
	`now     isochores 40 × 100 points     ${fmt(cpuMs(() => isolines('water', 'isochore', isochores(40), 100)))}`
);
console.log(
	`now     isochores 2 × 2000 points     ${fmt(cpuMs(() => isolines('water', 'isochore', isochores(2), 2000)))}`
);
console.log(
	`before  path 50 legs × 200 points     ${fmt(cpuMs(() => computePath(path(50, 200))))}`
);
console.log(`now     path 50 legs × 80 points      ${fmt(cpuMs(() => computePath(path(50, 80))))}`);
console.log(`sheet   path 50 legs × 40 points      ${fmt(cpuMs(() => computePath(path(50, 40))))}`);

if (!existsSync('build/index.js')) {
	console.log('\nNo build/index.js: run `npx vite build` for the server figures.');
	process.exit(0);
}

function freePort(): Promise<number> {
	return new Promise((resolve, reject) => {
		const srv = createServer();
		srv.listen(0, '127.0.0.1', () => {
			const addr = srv.address();
			srv.close(() =>
				typeof addr === 'object' && addr ? resolve(addr.port) : reject(new Error('no port'))
			);
		});
	});
}

const port = Number(process.env.BENCH_PORT ?? (await freePort()));
const dir = mkdtempSync(join(tmpdir(), 'statewright-limits-'));
const server = spawn(process.execPath, ['build/index.js'], {
	stdio: ['ignore', 'ignore', 'inherit'],
	env: {
		...process.env,
		NODE_ENV: 'production',
		PORT: String(port),
		HOST: '127.0.0.1',
		ORIGIN: `http://127.0.0.1:${port}`,
		DATABASE_PATH: join(dir, 'bench.db'),
		SEED_DEMO: '0',
		COMPUTE_RATE_LIMIT: '0'
	}
});
const stop = () => {
	server.kill('SIGTERM');
	rmSync(dir, { recursive: true, force: true });
};

/** The server's resident memory now and at its peak (MB), and its CPU time so far (ms), from /proc. */
function proc(): { rss: number; peak: number; cpu: number } {
	const status = readFileSync(`/proc/${server.pid}/status`, 'utf8');
	const kb = (name: string) =>
		Number(new RegExp(`^${name}:\\s+(\\d+)`, 'm').exec(status)?.[1] ?? NaN);
	const stat = readFileSync(`/proc/${server.pid}/stat`, 'utf8').split(') ')[1].split(' ');
	const ticks = Number(stat[11]) + Number(stat[12]); // utime + stime, in clock ticks (100 per second on Linux)
	return { rss: kb('VmRSS') / 1024, peak: kb('VmHWM') / 1024, cpu: ticks * 10 };
}

async function timed(url: string): Promise<{ ms: number; bytes: number; status: number }> {
	const t = performance.now();
	const r = await fetch(url);
	const bytes = (await r.arrayBuffer()).byteLength;
	return { ms: performance.now() - t, bytes, status: r.status };
}

try {
	const base = `http://127.0.0.1:${port}`;
	for (let i = 0; i < 150; i++) {
		if ((await fetch(`${base}/healthz`).catch(() => null))?.ok) break;
		await new Promise((r) => setTimeout(r, 200));
	}
	const refused = await timed(
		`${base}/api/v1/fluids/water/isolines?kind=isochore&points=2000&values=${isochores(40).join(',')}`
	);
	console.log(`\nserver on 127.0.0.1:${port}, COMPUTE_RATE_LIMIT=0`);
	console.log(
		`the old worst isolines request now: ${refused.status} in ${refused.ms.toFixed(1)} ms, ${refused.bytes} bytes`
	);
	for (let i = 0; i < 20; i++) await timed(`${base}/healthz`);
	const before = proc();
	const health: number[] = [];
	const times: number[] = [];
	let bytes = 0;
	for (let k = 0; k < REQUESTS; k++) {
		const r = await timed(
			`${base}/api/v1/fluids/water/isolines?kind=isochore&points=100&values=${isochores(40, k + 1).join(',')}`
		);
		if (r.status !== 200) throw new Error(`isolines answered ${r.status}`);
		times.push(r.ms);
		bytes += r.bytes;
		if (k % 5 === 0) health.push((await timed(`${base}/healthz`)).ms);
	}
	const after = proc();
	const p = (xs: number[], q: number) =>
		[...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(q * xs.length))];
	console.log(
		`${REQUESTS} distinct isolines requests at the cap (isochores 40 × 100), one at a time:`
	);
	console.log(
		`  answer ${(bytes / REQUESTS / 1024).toFixed(0)} kB each; latency p50 ${p(times, 0.5).toFixed(1)} ms, p95 ${p(times, 0.95).toFixed(1)} ms; server CPU ${((after.cpu - before.cpu) / REQUESTS).toFixed(1)} ms a request`
	);
	console.log(
		`  server memory: RSS ${before.rss.toFixed(0)} MB before, ${after.rss.toFixed(0)} MB after, peak ${after.peak.toFixed(0)} MB (answer cache bounded at 16 MB)`
	);
	console.log(
		`  /healthz between them: p50 ${p(health, 0.5).toFixed(1)} ms, p95 ${p(health, 0.95).toFixed(1)} ms`
	);
} finally {
	stop();
}
