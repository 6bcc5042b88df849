/**
 * HTTP benchmark of the built app under load, with the compute worker pool on and off side by side
 * (docs/performance.md: typical legs ≥ 2,000 requests/s with p99 ≤ 20 ms; 200-point legs ≥ 1.8× the
 * one-core figure on 2 cores; a signed-in sheet page ≥ 400 views/s). Prints figures; never fails
 * on time.
 *
 * Run: npm run bench:api   (builds nothing: run `npx vite build` first)
 *
 * Starts the built app (build/index.js) twice on free ports, each with COMPUTE_RATE_LIMIT=0, the
 * demo data and a throw-away database under the system temp directory: once with the worker pool
 * (COMPUTE_WORKERS unset: one worker per core) and once without (COMPUTE_WORKERS=0: the engine runs
 * on the main thread, the one-core figure). Each scenario then runs with autocannon, 10 connections,
 * BENCH_SECONDS (default 10) a round, alternating pool on/off for BENCH_ROUNDS rounds (default 2)
 * so that a change in the machine's load hits both alike; the machine's load average is printed
 * before every round.
 *
 * Scenarios: POST /api/v1/legs with a typical sketcher leg (40 points, one crossing) and with a
 * 200-point leg through the dome; GET of a signed-in sheet page (the demo team's first sheet) and
 * of the team page that lists the sheets.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 2);
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

async function waitFor(url: string, ms = 60_000): Promise<void> {
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

interface Built {
	base: string;
	stop: () => void;
}

/** Start the built app on a free port with a throw-away database and `env` on top of the bench defaults. */
async function startBuilt(env: Record<string, string>): Promise<Built> {
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
			SEED_DEMO: '1',
			COMPUTE_RATE_LIMIT: '0',
			...env
		}
	});
	const base = `http://127.0.0.1:${port}`;
	const stop = () => {
		server.kill('SIGTERM');
		rmSync(dir, { recursive: true, force: true });
	};
	await waitFor(`${base}/healthz`);
	return { base, stop };
}

/** Sign in as the demo team's owner: the session cookie, and the first sheet's path. */
async function signedInSheet(base: string): Promise<{ cookie: string; path: string }> {
	const form = new URLSearchParams({
		email: 'tobias.lindqvist@brindlemoor.example',
		password: 'statewright-demo'
	});
	const r = await fetch(`${base}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: { 'content-type': 'application/x-www-form-urlencoded', origin: base },
		body: form
	});
	const cookie = r.headers
		.getSetCookie()
		.map((c) => c.split(';')[0])
		.join('; ');
	if (!cookie) throw new Error(`signing in gave ${r.status} and no cookie`);
	const team = await (await fetch(`${base}/t/brindlemoor`, { headers: { cookie } })).text();
	const path = [...team.matchAll(/href="(\/t\/brindlemoor\/sheets\/[^"/?#]+)"/g)]
		.map((m) => m[1])
		.find((p) => !p.endsWith('/new'));
	if (!path) throw new Error('no sheet link on the team page');
	return { cookie, path };
}

interface Scenario {
	name: string;
	request: (base: string) => autocannon.Options;
	budget: string;
}

function run(opts: autocannon.Options, seconds: number): Promise<autocannon.Result> {
	return new Promise((resolve, reject) => {
		autocannon({ ...opts, connections: CONNECTIONS, duration: seconds }, (err, res) =>
			err ? reject(err) : resolve(res)
		);
	});
}

const postLeg = (body: object) => (base: string) => ({
	url: `${base}/api/v1/legs`,
	method: 'POST' as const,
	headers: { 'content-type': 'application/json' },
	body: JSON.stringify(body)
});

const typicalLeg = {
	fluid: 'water',
	start: { T: 393.15, x: 0.3 },
	process: 'isochoric',
	target: { T: 450 }
};
const longLeg = {
	fluid: 'water',
	start: { T: 800, P: 1e7 },
	process: 'isentropic',
	target: { P: 1e4 },
	samples: 200
};

const load = () =>
	loadavg()
		.map((l) => l.toFixed(2))
		.join(' ');

const cores = availableParallelism();
console.log(
	`Statewright HTTP benchmark — built app, ${CONNECTIONS} connections, ${SECONDS} s a round, ${ROUNDS} rounds, pool on/off alternating`
);
console.log(
	`node ${process.version}, ${cores} cores, load average ${load()} (1, 5, 15 min; a shared machine counts other people's work too)\n`
);

const servers: Record<'on' | 'off', Built> = {
	on: await startBuilt({}),
	off: await startBuilt({ COMPUTE_WORKERS: '0' })
};
const stopAll = () => Object.values(servers).forEach((s) => s.stop());
process.on('SIGINT', () => {
	stopAll();
	process.exit(130);
});

try {
	const pages = {
		on: await signedInSheet(servers.on.base),
		off: await signedInSheet(servers.off.base)
	};
	const sample = (await (
		await fetch(postLeg(typicalLeg)(servers.on.base).url, postLeg(typicalLeg)(servers.on.base))
	).json()) as { leg: { points: unknown[]; crossings: unknown[] } };
	const page = await fetch(`${servers.on.base}${pages.on.path}`, {
		headers: { cookie: pages.on.cookie }
	});
	const pageBytes = (await page.arrayBuffer()).byteLength;

	const legScenarios: Scenario[] = [
		{
			name: `typical leg (isochoric, ${sample.leg.points.length} points, ${sample.leg.crossings.length} crossing)`,
			request: postLeg(typicalLeg),
			budget: '≥ 2000/s, p99 ≤ 20 ms'
		},
		{
			name: '200-point leg (isentropic through the dome)',
			request: postLeg(longLeg),
			budget: `on ≥ 1.8× off on ${cores} cores`
		}
	];
	const sheetScenario = (key: 'on' | 'off'): Scenario => ({
		name: `signed-in sheet page (${(pageBytes / 1024).toFixed(1)} kB HTML)`,
		request: (base) => ({
			url: `${base}${pages[key].path}`,
			headers: { cookie: pages[key].cookie }
		}),
		budget: '≥ 400/s'
	});

	type Row = { name: string; budget: string; on: autocannon.Result[]; off: autocannon.Result[] };
	const teamScenario = (key: 'on' | 'off'): Scenario => ({
		name: 'signed-in team page (the sheet list)',
		request: (base) => ({ url: `${base}/t/brindlemoor`, headers: { cookie: pages[key].cookie } }),
		budget: '≥ 400/s'
	});
	const rows: Row[] = [
		...legScenarios.map((s) => ({ name: s.name, budget: s.budget, on: [], off: [] })),
		{ name: sheetScenario('on').name, budget: '≥ 400/s', on: [], off: [] },
		{ name: teamScenario('on').name, budget: '≥ 400/s', on: [], off: [] }
	];
	const requestFor = (i: number, key: 'on' | 'off') =>
		i < legScenarios.length
			? legScenarios[i].request
			: i === legScenarios.length
				? sheetScenario(key).request
				: teamScenario(key).request;

	// warm both servers (JIT, worker start-up, the page's caches)
	for (const key of ['on', 'off'] as const)
		for (let i = 0; i < rows.length; i++) await run(requestFor(i, key)(servers[key].base), 2);

	const fmt = (r: autocannon.Result) =>
		`${r.requests.average.toFixed(0).padStart(5)}/s p50 ${String(r.latency.p50).padStart(3)} p99 ${String(r.latency.p99).padStart(3)} ms${r.errors || r.non2xx ? ` (${r.errors} errors, ${r.non2xx} non-2xx)` : ''}`;
	console.log(
		`database: ${process.env.DATABASE_URL ? 'PostgreSQL (DATABASE_URL; both servers share it)' : 'SQLite (a fresh file per server); set DATABASE_URL=postgres://… to measure PostgreSQL'}`
	);
	for (let round = 1; round <= ROUNDS; round++) {
		console.log(`round ${round}, load average ${load()}`);
		for (let i = 0; i < rows.length; i++) {
			const order = round % 2 ? (['on', 'off'] as const) : (['off', 'on'] as const);
			for (const key of order) {
				const r = await run(requestFor(i, key)(servers[key].base), SECONDS);
				rows[i][key].push(r);
			}
			const on = rows[i].on.at(-1)!;
			const off = rows[i].off.at(-1)!;
			console.log(
				`  ${rows[i].name.padEnd(58)} pool on ${fmt(on)} | off ${fmt(off)} | on/off ${(on.requests.average / off.requests.average).toFixed(2)}×`
			);
		}
	}
	console.log(`\nbest of ${ROUNDS} rounds (load average now ${load()}):`);
	for (const row of rows) {
		const best = (rs: autocannon.Result[]) =>
			rs.reduce((a, b) => (b.requests.average > a.requests.average ? b : a));
		const on = best(row.on);
		const off = best(row.off);
		console.log(
			`  ${row.name.padEnd(58)} pool on ${fmt(on)} | off ${fmt(off)} | on/off ${(on.requests.average / off.requests.average).toFixed(2)}×   budget ${row.budget}`
		);
	}
} finally {
	stopAll();
}
