import { expect, test } from '@playwright/test';
import { spawn, type ChildProcess } from 'node:child_process';
import pg from 'pg';
import { DEMO, DEMO_PASSWORD, ownPort, TEAM } from './helpers';

// Two built app processes (build/index.js, as `npm start` runs it) on one PostgreSQL database, as
// behind a load balancer (docs/deploy.md): both start at once on an empty database (migrations
// and the demo seed must not trip over each other), then a session made on one is valid on the
// other, two saves of the same revision sent to different processes give one 201 and one 409,
// and the compute rate limit counts requests sent to either. Needs TEST_POSTGRES_URL (a role
// that may create databases); without it the test is skipped and says so.

const BASE_URL = process.env.TEST_POSTGRES_URL?.trim();
if (!BASE_URL)
	console.log(
		'[statewright] TEST_POSTGRES_URL is not set: the two-process PostgreSQL test is skipped.'
	);
// two ports of this worker's own (tests/helpers.ts ownPort): +700 and +720, plus the worker index
const PORTS = [ownPort(700), ownPort(720)];
// the public origin both processes sit behind (a reverse proxy's), so forms and cookies agree
const ORIGIN = `http://127.0.0.1:${PORTS[0]}`;
const DATABASE = `statewright_multinode_${PORTS[0]}`;
// one unit of compute work per 20 s per client, bursts of 1: a second request within that is a 429
const COMPUTE_RATE_LIMIT = '0.05';

interface Node {
	url: string;
	child: ChildProcess;
	log: string;
}
const nodes: Node[] = [];

function databaseUrl(base: string, name: string): string {
	const u = new URL(base);
	u.pathname = `/${name}`;
	return u.toString();
}

async function admin(run: (c: pg.Client) => Promise<void>): Promise<void> {
	const client = new pg.Client({ connectionString: BASE_URL });
	await client.connect();
	try {
		await run(client);
	} finally {
		await client.end();
	}
}

async function dropDatabase(c: pg.Client): Promise<void> {
	await c.query(`drop database if exists ${DATABASE} with (force)`);
}

function start(port: number): Promise<Node> {
	const child = spawn(process.execPath, ['build/index.js'], {
		stdio: ['ignore', 'pipe', 'pipe'],
		env: {
			...process.env,
			NODE_ENV: 'test',
			PORT: String(port),
			HOST: '127.0.0.1',
			ORIGIN,
			DATABASE_URL: databaseUrl(BASE_URL!, DATABASE),
			SEED_DEMO: '1',
			STATEWRIGHT_DEV_TOOLS: '0',
			SMTP_URL: '',
			COMPUTE_RATE_LIMIT
		}
	});
	const node: Node = { url: `http://127.0.0.1:${port}`, child, log: '' };
	child.stdout!.on('data', (d) => (node.log += d));
	child.stderr!.on('data', (d) => (node.log += d));
	return new Promise<Node>((resolve, reject) => {
		const onData = () => {
			if (node.log.includes('Listening on')) {
				child.stdout!.off('data', onData);
				resolve(node);
			}
		};
		child.stdout!.on('data', onData);
		child.once('exit', (code) =>
			reject(
				new Error(`app on ${port} exited (${code}) before listening:\n${node.log.slice(-3000)}`)
			)
		);
	});
}

async function stop(node: Node): Promise<void> {
	if (node.child.exitCode !== null || node.child.signalCode !== null) return;
	const exited = new Promise((r) => node.child.once('exit', r));
	node.child.kill('SIGTERM');
	await exited;
}

const form = (o: Record<string, string>) => new URLSearchParams(o).toString();
const FORM_HEADERS = {
	origin: ORIGIN,
	accept: 'text/html',
	'content-type': 'application/x-www-form-urlencoded'
};

async function signIn(node: Node, email: string): Promise<string> {
	const res = await fetch(`${node.url}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: FORM_HEADERS,
		body: form({ email, password: DEMO_PASSWORD, next: '/' })
	});
	expect(res.status, await res.clone().text()).toBe(303);
	return res.headers
		.getSetCookie()
		.map((c) => c.split(';')[0])
		.join('; ');
}

async function me(node: Node, cookie: string): Promise<{ status: number; email?: string }> {
	const res = await fetch(`${node.url}/api/v1/me`, { headers: { cookie } });
	if (res.status !== 200) return { status: res.status };
	const body = (await res.json()) as { user?: { email?: string }; email?: string };
	return { status: 200, email: body.user?.email ?? body.email };
}

test.describe('two app processes on one PostgreSQL', () => {
	test.skip(
		!BASE_URL,
		'TEST_POSTGRES_URL is not set: the two-process PostgreSQL test is skipped (CI sets it)'
	);
	test.describe.configure({ mode: 'serial' });

	test.beforeAll(async () => {
		test.setTimeout(180_000);
		await admin(async (c) => {
			await dropDatabase(c);
			await c.query(`create database ${DATABASE}`);
		});
		// both at once on the empty database: one migrates and seeds, the other waits or finds it done
		nodes.push(...(await Promise.all(PORTS.map(start))));
		for (const n of nodes) expect((await fetch(`${n.url}/healthz`)).status).toBe(200);
	});

	// eslint-disable-next-line no-empty-pattern -- Playwright reads the fixtures from this pattern
	test.afterEach(async ({}, info) => {
		if (info.status !== info.expectedStatus)
			for (const n of nodes) console.log(`--- app at ${n.url}:\n${n.log.slice(-4000)}`);
	});

	test.afterAll(async () => {
		await Promise.all(nodes.map(stop));
		nodes.length = 0;
		if (BASE_URL) await admin(dropDatabase);
	});

	test('a session made on one process is valid on the other, and ends on both', async () => {
		const [a, b] = nodes;
		const cookie = await signIn(a, DEMO.designer);
		expect(await me(a, cookie)).toEqual({ status: 200, email: DEMO.designer });
		expect(await me(b, cookie)).toEqual({ status: 200, email: DEMO.designer });
		const out = await fetch(`${b.url}/signout`, {
			method: 'POST',
			redirect: 'manual',
			headers: { ...FORM_HEADERS, cookie },
			body: ''
		});
		expect(out.status).toBe(303);
		expect((await me(a, cookie)).status).toBe(401);
	});

	test('two saves of one revision through different processes: one 201, one 409', async () => {
		const [a, b] = nodes;
		const cookie = await signIn(b, DEMO.owner);
		const made = await fetch(`${b.url}/t/${TEAM}/settings?/createToken`, {
			method: 'POST',
			headers: { ...FORM_HEADERS, cookie },
			body: form({ name: 'multi-node probe', role: 'owner' })
		});
		expect(made.status).toBe(200);
		const token = (await made.text()).match(/swt_[A-Za-z0-9_-]{43}/)?.[0];
		expect(token).toBeTruthy();
		const api = (node: Node, path: string, body?: unknown) =>
			fetch(`${node.url}/api/v1/teams/${TEAM}${path}`, {
				method: body === undefined ? 'GET' : 'POST',
				headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
				body: body === undefined ? undefined : JSON.stringify(body)
			});
		// the token made through b works on a
		const created = await api(a, '/sheets', {
			example: 'vessel-v204-fire',
			title: 'Two-process race'
		});
		expect(created.status).toBe(201);
		const sheet = ((await created.json()) as { sheet: { id: string; doc: object } }).sheet;
		let base: number | null = null;
		for (let round = 0; round < 3; round++) {
			const save = (node: Node, who: string) =>
				api(node, `/sheets/${sheet.id}/revisions`, {
					message: `round ${round} from ${who}`,
					baseRevision: base,
					doc: { ...sheet.doc, description: `round ${round} from ${who}` }
				});
			const answers = await Promise.all([save(a, 'a'), save(b, 'b')]);
			expect(answers.map((r) => r.status).sort(), `round ${round}`).toEqual([201, 409]);
			const loser = answers.find((r) => r.status === 409)!;
			expect(((await loser.json()) as { error: { code: string } }).error.code).toBe(
				'revision-conflict'
			);
			const winner = answers.find((r) => r.status === 201)!;
			base = ((await winner.json()) as { revision: { number: number } }).revision.number;
		}
		const list = (await (await api(b, `/sheets/${sheet.id}/revisions`)).json()) as {
			revisions: unknown[];
		};
		expect(list.revisions).toHaveLength(3);
	});

	test('the compute rate limit counts requests sent to either process', async () => {
		const [a, b] = nodes;
		const state = (node: Node) =>
			fetch(`${node.url}/api/v1/states`, {
				method: 'POST',
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify({ fluid: 'water', inputs: { T: 373.15, x: 0 } })
			});
		// the burst is one request: a's answer spends it, so b (and a again) must refuse
		expect((await state(a)).status).toBe(200);
		const fromB = await state(b);
		expect(fromB.status).toBe(429);
		expect(((await fromB.json()) as { error: { code: string } }).error.code).toBe('rate-limited');
		expect(Number(fromB.headers.get('retry-after'))).toBeGreaterThan(1);
		expect((await state(a)).status).toBe(429);
	});
});
