import { expect, test } from '@playwright/test';
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, rmSync } from 'node:fs';
import Database from 'better-sqlite3';
import { DEMO, DEMO_PASSWORD, ownPort } from './helpers';

// Crash durability of the built server (build/index.js, as `npm start` runs it) on its own SQLite
// file: sign in, make an API token and a sheet, then in each cycle save revisions through the API
// in a loop and kill the server with SIGKILL while a save is in flight. After each kill the file
// must pass PRAGMA integrity_check; after each restart every acknowledged revision (a 201 the
// client received) must be there with its message. Each cycle also races four saves on the same
// base revision: exactly one 201, the rest 409. Fixed counts, so the run is repeatable and bounded.

const PORT = Number(process.env.DURABILITY_PORT ?? ownPort(10));
const ORIGIN = `http://127.0.0.1:${PORT}`;
const DIR = `tmp/durability-${PORT}`;
const DB_PATH = `${DIR}/statewright.db`;
const TEAM = 'brindlemoor';
/** acknowledged saves before the kill, per cycle; and how long (ms) the last save is in flight before it */
const CYCLES: Array<{ saves: number; killAfterMs: number }> = [
	{ saves: 9, killAfterMs: 0 },
	{ saves: 13, killAfterMs: 2 },
	{ saves: 6, killAfterMs: 5 },
	{ saves: 14, killAfterMs: 1 }
];

let server: ChildProcess | null = null;
let log = '';

async function start(): Promise<void> {
	const child = spawn(process.execPath, ['build/index.js'], {
		stdio: ['ignore', 'pipe', 'pipe'],
		env: {
			...process.env,
			NODE_ENV: 'test',
			PORT: String(PORT),
			HOST: '127.0.0.1',
			ORIGIN,
			DATABASE_PATH: DB_PATH,
			SEED_DEMO: '1',
			STATEWRIGHT_DEV_TOOLS: '0',
			SMTP_URL: ''
		}
	});
	child.stdout!.on('data', (d) => (log += d));
	child.stderr!.on('data', (d) => (log += d));
	server = child;
	// ready when it prints its address (after migrations and the demo seed), or gone if it exits
	await new Promise<void>((resolve, reject) => {
		const onData = () => {
			if (log.includes(`Listening on ${ORIGIN}`)) {
				child.stdout!.off('data', onData);
				resolve();
			}
		};
		child.stdout!.on('data', onData);
		child.once('exit', (code) =>
			reject(new Error(`the server exited (${code}) before listening:\n${log.slice(-2000)}`))
		);
	});
	expect((await fetch(`${ORIGIN}/healthz`)).status).toBe(200);
}

async function stop(signal: NodeJS.Signals): Promise<void> {
	const child = server;
	if (!child || child.exitCode !== null || child.signalCode !== null) return;
	const exited = new Promise((r) => child.once('exit', r));
	child.kill(signal);
	await exited;
	server = null;
	log = '';
}

function integrity(): string {
	// opened read-write like the server does, so a crash's WAL is recovered as on a restart
	const db = new Database(DB_PATH);
	try {
		return (db.pragma('integrity_check') as Array<{ integrity_check: string }>)
			.map((r) => r.integrity_check)
			.join('; ');
	} finally {
		db.close();
	}
}

/** A session cookie from the sign-in form, then an owner token from the team settings form. */
async function ownerToken(): Promise<string> {
	const form = (o: Record<string, string>) => new URLSearchParams(o).toString();
	const headers = {
		origin: ORIGIN,
		accept: 'text/html',
		'content-type': 'application/x-www-form-urlencoded'
	};
	const signin = await fetch(`${ORIGIN}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers,
		body: form({ email: DEMO.owner, password: DEMO_PASSWORD, next: '/' })
	});
	expect(signin.status).toBe(303);
	const cookie = signin.headers
		.getSetCookie()
		.map((c) => c.split(';')[0])
		.join('; ');
	const made = await fetch(`${ORIGIN}/t/${TEAM}/settings?/createToken`, {
		method: 'POST',
		headers: { ...headers, cookie },
		body: form({ name: 'durability probe', role: 'owner' })
	});
	expect(made.status).toBe(200);
	const token = (await made.text()).match(/swt_[A-Za-z0-9_-]{43}/)?.[0];
	expect(token).toBeTruthy();
	return token!;
}

test.afterAll(async () => {
	await stop('SIGTERM');
});

test('revisions acknowledged before a SIGKILL survive it, and the file stays intact', async () => {
	test.setTimeout(180_000);
	const started = Date.now();
	rmSync(DIR, { recursive: true, force: true });
	mkdirSync(DIR, { recursive: true });
	await start();
	const token = await ownerToken();
	const api = (path: string, init: { method?: string; body?: unknown } = {}) =>
		fetch(`${ORIGIN}/api/v1/teams/${TEAM}${path}`, {
			method: init.method ?? 'GET',
			headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
			body: init.body === undefined ? undefined : JSON.stringify(init.body)
		});
	const made = await api('/sheets', {
		method: 'POST',
		body: { example: 'vessel-v204-fire', title: 'Durability probe' }
	});
	expect(made.status).toBe(201);
	const sheet = ((await made.json()) as { sheet: { id: string; doc: Record<string, unknown> } })
		.sheet;
	const R = `/sheets/${sheet.id}/revisions`;

	const acknowledged = new Map<number, string>();
	let latest: number | null = null;
	let serial = 0;
	let inFlightCommitted = 0;
	let raceRounds = 0;
	const save = (message: string, base: number | null) =>
		api(R, {
			method: 'POST',
			body: { message, baseRevision: base, doc: { ...sheet.doc, description: message } }
		});
	const record = async (res: Response, message: string) => {
		expect(res.status, message).toBe(201);
		const { revision } = (await res.json()) as { revision: { number: number; message: string } };
		expect(revision.message).toBe(message);
		acknowledged.set(revision.number, message);
		latest = revision.number;
	};
	/** Every acknowledged revision, with its message, is in the list the restarted server gives. */
	const present = async () => {
		const res = await api(R);
		expect(res.status).toBe(200);
		const { revisions } = (await res.json()) as {
			revisions: Array<{ number: number; message: string }>;
		};
		const stored = new Map(revisions.map((r) => [r.number, r.message]));
		const lost = [...acknowledged].filter(([n, m]) => stored.get(n) !== m);
		return { lost, stored };
	};

	for (const [c, cycle] of CYCLES.entries()) {
		if (c > 0) {
			await start();
			const { lost, stored } = await present();
			expect(lost, `after restart ${c}`).toEqual([]);
			// an in-flight save may have committed before the kill without being acknowledged
			const newest = Math.max(...stored.keys());
			if (latest !== null && newest > latest) inFlightCommitted++;
			latest = newest;
		}
		// a race on the same base: exactly one save wins, the others are told someone saved first
		const racers = await Promise.all([0, 1, 2, 3].map((i) => save(`cycle ${c} race ${i}`, latest)));
		const statuses = racers.map((r) => r.status).sort();
		expect(statuses, `race in cycle ${c}`).toEqual([201, 409, 409, 409]);
		raceRounds++;
		const winner = racers.find((r) => r.status === 201)!;
		const { revision } = (await winner.json()) as { revision: { number: number; message: string } };
		acknowledged.set(revision.number, revision.message);
		latest = revision.number;
		for (let i = 0; i < cycle.saves; i++) {
			const message = `cycle ${c} save ${++serial}`;
			await record(await save(message, latest), message);
		}
		// one more save, and the kill while it is on its way
		const message = `cycle ${c} save ${++serial} (in flight at the kill)`;
		const pending = save(message, latest).then(
			async (res) => (res.status === 201 ? record(res, message) : undefined),
			() => undefined
		);
		await new Promise((r) => setTimeout(r, cycle.killAfterMs));
		await stop('SIGKILL');
		await pending;
		expect(integrity(), `integrity after kill ${c + 1}`).toBe('ok');
	}

	await start();
	const { lost, stored } = await present();
	expect(lost).toEqual([]);
	expect(acknowledged.size).toBeGreaterThan(CYCLES.reduce((n, c) => n + c.saves, 0));
	expect((await api(`/sheets/${sheet.id}`)).status).toBe(200);
	await stop('SIGTERM');
	expect(integrity()).toBe('ok');
	console.log(
		`durability: ${CYCLES.length} SIGKILL cycles, ${acknowledged.size} revisions acknowledged, ${lost.length} lost, ${stored.size} stored ` +
			`(${inFlightCommitted} in-flight saves committed unacknowledged), ${raceRounds} race rounds of 4 (one 201, three 409 each), ` +
			`integrity_check ok after every kill; ${((Date.now() - started) / 1000).toFixed(1)} s`
	);
});
