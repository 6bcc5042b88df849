/**
 * HTTP benchmark of the compute API: POST /api/v1/legs under load, against the budget of
 * docs/performance.md (≥ 800 requests/s, p99 ≤ 30 ms with 10 connections on the 2-core machine).
 * Prints figures; never fails on time.
 *
 * Run: npm run bench:api   (builds nothing: run `npx vite build` first)
 *
 * Starts the built app (build/index.js) on a free port with COMPUTE_RATE_LIMIT=0 and a throw-away
 * database under the system temp directory, warms it up, then runs autocannon for about 10 s with
 * 10 connections on one leg body (a typical sketcher request: 40 points, one crossing), and a
 * second round on a 200-point leg.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const CONNECTIONS = 10;

if (!existsSync('build/index.js')) {
	console.error(
		'No build/index.js: run `npx vite build` first (this benchmark builds nothing itself).'
	);
	process.exit(1);
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

async function waitFor(url: string, ms = 30_000): Promise<void> {
	const until = Date.now() + ms;
	while (Date.now() < until) {
		try {
			if ((await fetch(url)).ok) return;
		} catch {
			// not up yet
		}
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error(`${url} did not answer within ${ms / 1000} s`);
}

function run(url: string, body: object, seconds: number): Promise<autocannon.Result> {
	return new Promise((resolve, reject) => {
		autocannon(
			{
				url,
				method: 'POST',
				connections: CONNECTIONS,
				duration: seconds,
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify(body)
			},
			(err, res) => (err ? reject(err) : resolve(res))
		);
	});
}

const port = await freePort();
const dir = mkdtempSync(join(tmpdir(), 'statewright-bench-'));
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
process.on('SIGINT', () => {
	stop();
	process.exit(130);
});

try {
	const base = `http://127.0.0.1:${port}`;
	await waitFor(`${base}/healthz`);
	const url = `${base}/api/v1/legs`;
	const leg = {
		fluid: 'water',
		start: { T: 393.15, x: 0.3 },
		process: 'isochoric',
		target: { T: 450 }
	};
	const check = await fetch(url, {
		method: 'POST',
		headers: { 'content-type': 'application/json' },
		body: JSON.stringify(leg)
	});
	const sample = (await check.json()) as { leg: { points: unknown[]; crossings: unknown[] } };
	const bytes = JSON.stringify(sample).length;
	console.log(
		`Statewright compute API benchmark — POST /api/v1/legs, ${CONNECTIONS} connections, ${SECONDS} s (budget ≥ 800 req/s, p99 ≤ 30 ms)`
	);
	console.log(
		`node ${process.version}, load average ${loadavg()
			.map((l) => l.toFixed(2))
			.join(' ')}, COMPUTE_RATE_LIMIT=0\n`
	);
	await run(url, leg, 3); // warm-up
	for (const [name, body] of [
		[
			`typical leg (isochoric, ${sample.leg.points.length} points, ${sample.leg.crossings.length} crossing, ${(bytes / 1024).toFixed(1)} kB answer)`,
			leg
		],
		[
			'200-point leg (isentropic through the dome)',
			{
				fluid: 'water',
				start: { T: 800, P: 1e7 },
				process: 'isentropic',
				target: { P: 1e4 },
				samples: 200
			}
		]
	] as const) {
		const r = await run(url, body, SECONDS);
		const ok = r.requests.average >= 800 && r.latency.p99 <= 30;
		console.log(name);
		console.log(
			`  ${r.requests.average.toFixed(0)} req/s (total ${r.requests.total}), latency p50 ${r.latency.p50} ms, p99 ${r.latency.p99} ms, max ${r.latency.max} ms; errors ${r.errors}, non-2xx ${r.non2xx}  ${ok ? 'within budget' : 'OVER budget'}`
		);
	}
} finally {
	stop();
}
