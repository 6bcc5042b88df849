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
 * second round on a 200-point leg. With DATABASE_URL set (postgres://…) every round runs twice,
 * on SQLite and on that PostgreSQL database (migrated by the app as on any start), and the
 * figures are printed side by side.
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

function run(
	url: string,
	body: object | null,
	seconds: number,
	headers: Record<string, string> = {}
): Promise<autocannon.Result> {
	return new Promise((resolve, reject) => {
		autocannon(
			{
				url,
				method: body ? 'POST' : 'GET',
				connections: CONNECTIONS,
				duration: seconds,
				headers: body ? { 'content-type': 'application/json', ...headers } : headers,
				body: body ? JSON.stringify(body) : undefined
			},
			(err, res) => (err ? reject(err) : resolve(res))
		);
	});
}

const pgUrl = process.env.DATABASE_URL?.trim() || undefined;

/**
 * Starts the built app on a free port with `env` over the bench's own (a throw-away SQLite file
 * unless `env` names a DATABASE_URL); answers its base URL once /healthz does, and how to stop it.
 */
async function startServer(env: Record<string, string>): Promise<{ base: string; stop(): void }> {
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
			DATABASE_URL: '',
			DATABASE_PATH: join(dir, 'bench.db'),
			SEED_DEMO: '1',
			COMPUTE_RATE_LIMIT: '0',
			...env
		}
	});
	const stop = () => {
		server.kill('SIGTERM');
		rmSync(dir, { recursive: true, force: true });
	};
	process.once('SIGINT', () => {
		stop();
		process.exit(130);
	});
	const base = `http://127.0.0.1:${port}`;
	await waitFor(`${base}/healthz`);
	return { base, stop };
}

const databases: Array<{ name: string; env: Record<string, string> }> = [
	{ name: 'SQLite', env: {} },
	...(pgUrl ? [{ name: 'PostgreSQL', env: { DATABASE_URL: pgUrl } }] : [])
];
const figures = new Map<string, string[]>();

for (const database of databases) {
	const { base, stop } = await startServer(database.env);
	try {
		await measure(base, database.name);
	} finally {
		stop();
	}
}
if (databases.length > 1) {
	console.log(`\nside by side (req/s, p99 ms): ${databases.map((d) => d.name).join(' | ')}`);
	for (const [name, cells] of figures) console.log(`  ${name}: ${cells.join(' | ')}`);
} else console.log('\n(DATABASE_URL unset: PostgreSQL not measured; set it to compare)');

async function measure(base: string, database: string): Promise<void> {
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
		`Statewright compute API benchmark on ${database} — POST /api/v1/legs, ${CONNECTIONS} connections, ${SECONDS} s (budget ≥ 800 req/s, p99 ≤ 30 ms)`
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
		const cells = figures.get(name) ?? [];
		cells.push(`${r.requests.average.toFixed(0)}, ${r.latency.p99}`);
		figures.set(name, cells);
		console.log(
			`  ${r.requests.average.toFixed(0)} req/s (total ${r.requests.total}), latency p50 ${r.latency.p50} ms, p99 ${r.latency.p99} ms, max ${r.latency.max} ms; errors ${r.errors}, non-2xx ${r.non2xx}  ${ok ? 'within budget' : 'OVER budget'}`
		);
	}
	// a signed-in page that reads the database (session, team, sheet list): the demo team's home
	const signin = await fetch(`${base}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: {
			origin: base,
			accept: 'text/html',
			'content-type': 'application/x-www-form-urlencoded'
		},
		body: new URLSearchParams({
			email: 'maren.okafor@brindlemoor.example',
			password: 'statewright-demo',
			next: '/'
		}).toString()
	});
	const cookie = signin.headers
		.getSetCookie()
		.map((c) => c.split(';')[0])
		.join('; ');
	const page = `${base}/t/brindlemoor`;
	if (signin.status !== 303 || (await fetch(page, { headers: { cookie } })).status !== 200) {
		console.log('team page: could not sign in as the demo owner; not measured');
		return;
	}
	const name = 'signed-in team page (GET /t/brindlemoor: session, team, sheet list)';
	const r = await run(page, null, SECONDS, { cookie });
	const cells = figures.get(name) ?? [];
	cells.push(`${r.requests.average.toFixed(0)}, ${r.latency.p99}`);
	figures.set(name, cells);
	console.log(name);
	console.log(
		`  ${r.requests.average.toFixed(0)} pages/s (total ${r.requests.total}), latency p50 ${r.latency.p50} ms, p99 ${r.latency.p99} ms, max ${r.latency.max} ms; errors ${r.errors}, non-2xx ${r.non2xx}`
	);
}
