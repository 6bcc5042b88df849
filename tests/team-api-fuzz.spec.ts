import {
	expect,
	request as playwrightRequest,
	test,
	type APIRequestContext
} from '@playwright/test';
import fc from 'fast-check';
import { BASE, DEMO, FORM, TEAM, createToken, signedInRequest } from './helpers';

// A seeded property-based fuzz of every team API route (me, team, members, sheets, sheet, draft,
// revisions, one revision, its steps and restore, compare, notes, one note, replies, traces, one
// trace) with real owner and viewer tokens on the built app and its migrated database. Requests
// are valid ones with a few fields replaced by arbitrary JSON or text, random path ids, query
// strings and content types. Property: never a 5xx, and every error is the API's JSON shape
// { error: { code, message } }. One request in six is sent across teams (the demo team's slug, or
// one of its sheet ids under the fuzz team): never a success, nor a 409 or an owner's 403 (which
// would tell the sheet exists), and the demo team's sheet is unchanged afterwards. Hand-picked junk lives in team-api-junk.spec.ts; this one draws.
// A fixed seed and a fixed number of requests keep it repeatable and bounded (well under a minute).

// FUZZ_SEED and FUZZ_RUNS explore further (e.g. FUZZ_SEED=7 FUZZ_RUNS=5000); the suite runs the fixed seed
const SEED = Number(process.env.FUZZ_SEED ?? 20261202);
const RUNS = Number(process.env.FUZZ_RUNS ?? 400);

let owner: APIRequestContext;
let tokens: APIRequestContext[] = [];
let slug = '';
const ids = { sheet: '', note: '', trace: '', member: '', foreignSheet: '' };
let doc: Record<string, unknown> = {};

test.beforeAll(async () => {
	owner = await signedInRequest(DEMO.owner);
	const made = await owner.post('/?/createTeam', {
		form: { name: `Fuzz ${Date.now().toString(36)}`, description: '' },
		headers: FORM,
		maxRedirects: 0
	});
	expect(made.status()).toBe(303);
	slug = made.headers()['location'].replace(/^\/t\//, '');
	for (const role of ['owner', 'viewer'])
		tokens.push(
			await playwrightRequest.newContext({
				baseURL: BASE,
				extraHTTPHeaders: {
					authorization: `Bearer ${await createToken(owner, slug, `fuzz ${role}`, role)}`
				}
			})
		);
	const api = tokens[0];
	const T = `/api/v1/teams/${slug}`;
	const s = await api.post(`${T}/sheets`, {
		data: { example: 'vessel-v204-fire', title: 'Fuzz target' }
	});
	expect(s.status(), await s.text()).toBe(201);
	const sheet = ((await s.json()) as { sheet: { id: string; doc: Record<string, unknown> } }).sheet;
	ids.sheet = sheet.id;
	doc = sheet.doc;
	expect(
		(
			await api.post(`${T}/sheets/${ids.sheet}/revisions`, {
				data: { message: 'Rev 1', baseRevision: null }
			})
		).status()
	).toBe(201);
	ids.note = (
		(await (
			await api.post(`${T}/sheets/${ids.sheet}/notes`, {
				data: { anchor: { kind: 'sheet' }, body: 'fuzz thread' }
			})
		).json()) as { note: { id: string } }
	).note.id;
	const up = await api.post(`${T}/sheets/${ids.sheet}/traces?filename=f.csv`, {
		data: CSV,
		headers: { 'content-type': 'text/csv' }
	});
	ids.trace = ((await up.json()) as { trace: { id: string } }).trace.id;
	ids.member = (
		(await (await api.get(`${T}/members`)).json()) as { members: Array<{ id: string }> }
	).members[0].id;
	// a sheet of another team (the demo team), read with the owner's session
	ids.foreignSheet = (
		(await (await owner.get(`/api/v1/teams/${TEAM}/sheets`)).json()) as {
			sheets: Array<{ id: string }>;
		}
	).sheets[0].id;
});
test.afterAll(async () => {
	for (const t of tokens) await t.dispose();
	await owner?.dispose();
	tokens = [];
});

const CSV = 'time [s],P [kPa a],T [°C]\n0,150,20\n10,160,21\n';

// ---- arbitraries ---------------------------------------------------------------------------

const junkText = fc.oneof(
	fc.string({ unit: 'binary', maxLength: 24 }),
	fc.string({ maxLength: 12 }),
	fc.constantFrom(
		'',
		' ',
		'\u0000abc',
		'a\u0007b',
		'x'.repeat(3000),
		'%00',
		'../..',
		"'; DROP TABLE sheets;--",
		'<b>x</b>',
		'draft',
		'0',
		'-1',
		'1e309',
		'NaN',
		'start',
		'\ud800'
	)
);
const anyJson = fc.oneof(
	{ weight: 3, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
	{ weight: 2, arbitrary: junkText },
	fc.double(),
	fc.integer(),
	fc.constant(null)
);

type Path = Array<string | number>;
function pathsOf(v: unknown, at: Path = [], out: Path[] = []): Path[] {
	out.push(at);
	if (v && typeof v === 'object')
		for (const [k, c] of Object.entries(v))
			pathsOf(c, [...at, Array.isArray(v) ? Number(k) : k], out);
	return out;
}

/** A valid body with up to three places replaced, removed or given an extra key. */
function mutated(template: () => unknown) {
	const change = fc.tuple(fc.nat(), fc.constantFrom('set', 'delete', 'extra'), anyJson, junkText);
	return fc.array(change, { maxLength: 3 }).map((changes) => {
		let body = structuredClone(template()) as unknown;
		for (const [i, kind, value, key] of changes) {
			const paths = pathsOf(body);
			const path = paths[i % paths.length];
			if (path.length === 0) {
				if (kind === 'set') body = value;
				continue;
			}
			// eslint-disable-next-line @typescript-eslint/no-explicit-any -- walks arbitrary JSON by a random path
			const parent = path.slice(0, -1).reduce<any>((o, k) => o?.[k], body);
			if (!parent || typeof parent !== 'object') continue;
			const last = path[path.length - 1];
			if (kind === 'set') parent[last] = value;
			else if (kind === 'delete') delete parent[last];
			else if (!Array.isArray(parent)) parent[key] = value;
		}
		return body;
	});
}

/** A path segment; text with a lone surrogate becomes a segment that is not UTF-8 at all (%ED%A0%80…). */
function enc(s: string): string {
	try {
		return encodeURIComponent(s);
	} catch {
		return `%ED%A0%80${encodeURIComponent(s.replace(/[\ud800-\udfff]/g, ''))}`;
	}
}

const seg = (valid: () => string) =>
	fc
		.oneof(
			{ weight: 4, arbitrary: fc.constant(null) },
			{ weight: 1, arbitrary: junkText },
			{ weight: 1, arbitrary: fc.stringMatching(/^[a-z2-9]{16}$/) }
		)
		.map((s) => (s === null ? valid() : enc(s)));
const revNumber = fc.oneof(
	{ weight: 4, arbitrary: fc.constant('1') },
	fc.nat({ max: 5 }).map(String),
	fc.constantFrom('0', '99999999999999999999', '1.5', '-1')
);
const query = fc
	.dictionary(
		fc.constantFrom(
			'q',
			'limit',
			'offset',
			'revision',
			'points',
			'a',
			'b',
			'filename',
			'name',
			'tolerance',
			'allowRejected',
			'x'
		),
		fc.oneof(
			junkText,
			fc.integer().map(String),
			fc.constantFrom('draft', 'chart', 'all', 'none', '1', '2')
		),
		{ maxKeys: 3 }
	)
	.map((q) => (Object.keys(q).length ? `?${new URLSearchParams(q)}` : ''));
const contentType = fc.constantFrom(
	'application/json',
	'application/json',
	'application/json',
	'application/json; charset=utf-8',
	'text/csv',
	'text/plain',
	'multipart/form-data; boundary=zz',
	'application/x-www-form-urlencoded',
	'application/octet-stream'
);

interface Req {
	method: string;
	path: string;
	body?: string;
	type?: string;
	as: number;
	/** sent to another team's resources */
	cross: boolean;
}

const T = () => `/api/v1/teams/${slug}`;
const S = (sheet: string) => `${T()}/sheets/${sheet}`;
const json = (body: unknown) => (body === undefined ? undefined : JSON.stringify(body));
const withBody = (method: string, path: fc.Arbitrary<string>, template: () => unknown) =>
	fc.record({
		method: fc.constant(method),
		path,
		body: fc.oneof(
			{ weight: 8, arbitrary: mutated(template).map(json) },
			{ weight: 1, arbitrary: junkText },
			{ weight: 1, arbitrary: fc.jsonValue().map(json) }
		),
		type: fc.oneof(
			{ weight: 5, arbitrary: fc.constant('application/json') },
			{ weight: 1, arbitrary: contentType }
		)
	});
// reads, now and then with another method (DELETE only on made-up ids, below: the target sheet stays)
const get = (path: fc.Arbitrary<string>) =>
	fc.record({
		method: fc.oneof(
			{ weight: 8, arbitrary: fc.constant('GET') },
			fc.constantFrom('HEAD', 'OPTIONS', 'POST', 'PUT', 'PATCH')
		),
		path
	});
const sheetSeg = seg(() => ids.sheet);

const request: fc.Arbitrary<Req> = fc
	.tuple(
		fc.oneof(
			get(query.map((q) => `/api/v1/me${q}`)),
			get(query.map((q) => `${T()}${q}`)),
			get(query.map((q) => `${T()}/members${q}`)),
			get(query.map((q) => `${T()}/sheets${q}`)),
			withBody('POST', fc.constant(`${T()}/sheets`), () => ({ title: 'Fuzzed sheet', doc })),
			withBody('POST', fc.constant(`${T()}/sheets`), () => ({
				example: 'vessel-v204-fire',
				title: 'Fuzzed example'
			})),
			get(sheetSeg.map(S)),
			withBody('PATCH', sheetSeg.map(S), () => ({ title: 'Renamed by fuzz' })),
			fc.record({
				method: fc.constant('DELETE'),
				path: fc.oneof(junkText, fc.stringMatching(/^[a-z2-9]{16}$/)).map((s) => S(enc(s)))
			}),
			withBody(
				'PUT',
				sheetSeg.map((s) => `${S(s)}/draft`),
				() => ({ version: 1, doc })
			),
			get(fc.tuple(sheetSeg, query).map(([s, q]) => `${S(s)}/revisions${q}`)),
			withBody(
				'POST',
				sheetSeg.map((s) => `${S(s)}/revisions`),
				() => ({ message: 'Fuzzed revision', baseRevision: 1, doc })
			),
			get(fc.tuple(sheetSeg, revNumber).map(([s, n]) => `${S(s)}/revisions/${n}`)),
			withBody(
				'POST',
				fc
					.tuple(
						sheetSeg,
						revNumber,
						fc.oneof(
							fc.constantFrom('submit', 'withdraw', 'check', 'return', 'approve', 'restore'),
							junkText.map(enc)
						)
					)
					.map(([s, n, a]) => `${S(s)}/revisions/${n}/${a}`),
				() => ({ note: 'Fuzzed step', checkerId: ids.member })
			),
			withBody(
				'POST',
				sheetSeg.map((s) => `${S(s)}/revisions/1/restore`),
				() => ({ version: 1 })
			),
			get(fc.tuple(sheetSeg, query).map(([s, q]) => `${S(s)}/revisions/compare${q}`)),
			get(fc.tuple(sheetSeg, query).map(([s, q]) => `${S(s)}/notes${q}`)),
			withBody(
				'POST',
				sheetSeg.map((s) => `${S(s)}/notes`),
				() => ({
					anchor: {
						kind: 'leg',
						legId: (doc as { spec: { legs: { id: string }[] } }).spec.legs[0].id
					},
					body: 'Fuzzed note @Maren',
					revision: 1
				})
			),
			get(
				fc
					.tuple(
						sheetSeg,
						seg(() => ids.note),
						query
					)
					.map(([s, n, q]) => `${S(s)}/notes/${n}${q}`)
			),
			withBody(
				'PATCH',
				fc
					.tuple(
						sheetSeg,
						seg(() => ids.note)
					)
					.map(([s, n]) => `${S(s)}/notes/${n}`),
				() => ({ resolved: true })
			),
			withBody(
				'POST',
				fc
					.tuple(
						sheetSeg,
						seg(() => ids.note)
					)
					.map(([s, n]) => `${S(s)}/notes/${n}/replies`),
				() => ({ body: 'Fuzzed reply' })
			),
			get(fc.tuple(sheetSeg, query).map(([s, q]) => `${S(s)}/traces${q}`)),
			fc.record({
				method: fc.constant('POST'),
				path: fc.tuple(sheetSeg, query).map(([s, q]) => `${S(s)}/traces${q}`),
				body: fc.oneof(
					fc.constant(CSV),
					fc.string({ maxLength: 200 }).map((t) => `time [s],P [kPa a],T [°C]\n${t}`),
					junkText
				),
				type: fc.oneof(
					{ weight: 3, arbitrary: fc.constant('text/csv') },
					{ weight: 1, arbitrary: contentType }
				)
			}),
			get(
				fc
					.tuple(
						sheetSeg,
						seg(() => ids.trace)
					)
					.map(([s, t]) => `${S(s)}/traces/${t}`)
			)
		),
		fc.nat({ max: 4 }),
		fc.nat({ max: 11 })
	)
	// four in five as the owner (who may do everything), the rest as a viewer; one in six across teams
	.map(([r, who, cross]) => {
		let path = r.path;
		if (cross === 0 && path.includes(`/teams/${slug}`))
			path = path.replace(`/teams/${slug}`, `/teams/${TEAM}`);
		else if (cross === 1 && path.includes(`/sheets/${ids.sheet}`))
			path = path.replace(`/sheets/${ids.sheet}`, `/sheets/${ids.foreignSheet}`);
		return { ...r, path, as: who === 0 ? 1 : 0, cross: path !== r.path };
	});

/** What the fuzz must not change in the other team's sheet, read with the owner's session. */
async function foreignState(ctx: APIRequestContext) {
	const base = `/api/v1/teams/${TEAM}/sheets/${ids.foreignSheet}`;
	const read = async (path: string) => {
		const res = await ctx.get(`${base}${path}`);
		expect(res.status()).toBe(200);
		return res.json();
	};
	const { sheet } = (await read('')) as {
		sheet: { version: number; title: string; updatedAt: number };
	};
	const { revisions } = (await read('/revisions')) as {
		revisions: Array<{ number: number; status: string }>;
	};
	const { notes } = (await read('/notes')) as {
		notes: Array<{ id: string; resolved: unknown; replies: unknown[] }>;
	};
	const { traces } = (await read('/traces')) as { traces: Array<{ id: string }> };
	return {
		sheet,
		revisions,
		notes: notes.map((n) => [n.id, n.resolved, n.replies.length]),
		traces: traces.map((t) => t.id)
	};
}

test('seeded fuzz: no team API route answers a 5xx, every error has the JSON shape', async () => {
	test.setTimeout(Math.max(120_000, RUNS * 150));
	const statuses: Record<string, number> = {};
	let crossTeam = 0;
	const foreign = () => foreignState(owner);
	const foreignBefore = await foreign();
	const started = Date.now();
	await fc.assert(
		fc.asyncProperty(request, async (r) => {
			const headers: Record<string, string> = {};
			if (r.type) headers['content-type'] = r.type;
			const res = await tokens[r.as].fetch(r.path, {
				method: r.method,
				data: r.body,
				headers,
				maxRedirects: 0
			});
			const status = res.status();
			statuses[status] = (statuses[status] ?? 0) + 1;
			const what = `${r.method} ${r.path} ${r.type ?? ''} ${(r.body ?? '').slice(0, 200)} → ${status}`;
			expect(status, what).toBeLessThan(500);
			if (r.cross) {
				crossTeam++;
				expect(status, what).toBeGreaterThanOrEqual(400);
				// a viewer is refused writes by role before any sheet is looked up (403 either way)
				expect(r.as === 1 ? [409] : [403, 409], what).not.toContain(status);
			}
			if (status >= 400 && r.method !== 'HEAD') {
				expect(res.headers()['content-type'], what).toMatch(/application\/json/);
				const body = (await res.json()) as { error?: { code?: unknown; message?: unknown } };
				expect(typeof body.error?.code, what).toBe('string');
				expect(typeof body.error?.message, what).toBe('string');
				expect((body.error!.message as string).length, what).toBeGreaterThan(5);
			}
		}),
		{ seed: SEED, numRuns: RUNS, endOnFailure: true }
	);
	const seconds = (Date.now() - started) / 1000;
	console.log(
		`team API fuzz: seed ${SEED}, ${RUNS} requests in ${seconds.toFixed(1)} s; statuses ${JSON.stringify(statuses)}; ${crossTeam} sent across teams, all refused`
	);
	// the fuzz reached past the validation into the services, and was refused often too
	const ok = Object.entries(statuses)
		.filter(([s]) => Number(s) < 300)
		.reduce((n, [, c]) => n + c, 0);
	const refused = Object.entries(statuses)
		.filter(([s]) => Number(s) >= 400)
		.reduce((n, [, c]) => n + c, 0);
	expect(ok).toBeGreaterThan(RUNS / 10);
	expect(refused).toBeGreaterThan(RUNS / 4);
	expect(crossTeam).toBeGreaterThan(RUNS / 20);
	expect(await foreign()).toEqual(foreignBefore);
	// the target is still readable
	expect((await tokens[0].get(S(ids.sheet))).status()).toBe(200);
});
