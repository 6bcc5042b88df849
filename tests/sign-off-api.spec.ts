import {
	expect,
	test,
	request as playwrightRequest,
	type APIRequestContext,
	type APIResponse
} from '@playwright/test';
import { BASE, DEMO, TEAM, createToken, signedInRequest } from './helpers';

// Revisions, review notes and measured traces over the JSON API with team tokens, one per role,
// against the built app: every refusal in the compute API's error shape.

const API = `/api/v1/teams/${TEAM}`;
type Role = 'owner' | 'designer' | 'checker' | 'viewer';
const tokens = {} as Record<Role, APIRequestContext>;
let designerToken: APIRequestContext;

async function tokenContext(secret: string): Promise<APIRequestContext> {
	return playwrightRequest.newContext({
		baseURL: BASE,
		extraHTTPHeaders: { authorization: `Bearer ${secret}` }
	});
}

async function errorOf(
	res: APIResponse,
	status: number,
	code?: string
): Promise<{ code: string; message: string } & Record<string, unknown>> {
	expect(res.status(), await res.text()).toBe(status);
	expect(res.headers()['content-type']).toMatch(/application\/json/);
	const body = (await res.json()) as {
		error: { code: string; message: string } & Record<string, unknown>;
	};
	expect(typeof body.error.message).toBe('string');
	expect(body.error.message.length).toBeGreaterThan(10);
	if (code) expect(body.error.code).toBe(code);
	return body.error;
}

const doc = (T = 453.15) => ({
	fluid: 'water',
	system: { kind: 'closed', volume: 0.5 },
	start: { T: 353.15, x: 0.02 },
	legs: [
		{ id: 'heat', process: 'isochoric', target: { T } },
		{ id: 'vent', process: 'isenthalpic', target: { P: 200000 } }
	]
});

test.beforeAll(async () => {
	const owner = await signedInRequest(DEMO.owner);
	const designer = await signedInRequest(DEMO.designer);
	tokens.owner = await tokenContext(
		await createToken(owner, TEAM, `api review owner ${Date.now()}`, 'owner')
	);
	tokens.checker = await tokenContext(
		await createToken(owner, TEAM, `api review checker ${Date.now()}`, 'checker')
	);
	tokens.viewer = await tokenContext(
		await createToken(owner, TEAM, `api review viewer ${Date.now()}`, 'viewer')
	);
	designerToken = await tokenContext(
		await createToken(designer, TEAM, `api review designer ${Date.now()}`, 'designer')
	);
	tokens.designer = designerToken;
});

async function newSheet(title = 'API review sheet'): Promise<string> {
	const res = await tokens.designer.post(`${API}/sheets`, { data: { title, doc: doc() } });
	expect(res.status(), await res.text()).toBe(201);
	return ((await res.json()) as { sheet: { id: string } }).sheet.id;
}

test('revisions: save per role, 409 on a moved base with the would-be revision, read, compare', async () => {
	const sheet = await newSheet();
	const R = `${API}/sheets/${sheet}/revisions`;
	for (const role of ['checker', 'viewer'] as const)
		await errorOf(
			await tokens[role].post(R, { data: { message: 'x', baseRevision: null } }),
			403,
			'forbidden'
		);
	const r1 = await tokens.designer.post(R, {
		data: { message: 'First issue', baseRevision: null }
	});
	expect(r1.status()).toBe(201);
	const rev1 = (
		(await r1.json()) as {
			revision: { number: number; author: { name: string }; result: { states: unknown[] } };
		}
	).revision;
	expect(rev1.number).toBe(1);
	expect(rev1.author.name).toMatch(/^Tobias Lindqvist \(token “api review designer \d+”\)$/);
	expect(rev1.result.states).toHaveLength(3);
	const conflict = await errorOf(
		await tokens.owner.post(R, {
			data: { message: 'Parallel edit', baseRevision: null, doc: { spec: doc(440) } }
		}),
		409,
		'revision-conflict'
	);
	expect(
		(conflict.yours as { message: string; doc: { spec: { legs: Array<{ target: unknown }> } } })
			.message
	).toBe('Parallel edit');
	expect(
		(conflict.yours as { doc: { spec: { legs: Array<{ target: unknown }> } } }).doc.spec.legs[0]
			.target
	).toEqual({ T: 440 });
	expect((conflict.latest as { number: number }).number).toBe(1);
	const list = (await (await tokens.viewer.get(R)).json()) as {
		revisions: Array<{ number: number }>;
	};
	expect(list.revisions.map((r) => r.number)).toEqual([1]);
	expect(
		(
			await tokens.owner.post(R, {
				data: { message: 'Lower end', baseRevision: 1, doc: { spec: doc(440) } }
			})
		).status()
	).toBe(201);
	const one = await tokens.viewer.get(`${R}/1`);
	expect(one.status()).toBe(200);
	await errorOf(await tokens.viewer.get(`${R}/9`), 404, 'revision-not-found');
	await errorOf(await tokens.designer.post(R, { data: { message: 'x' } }), 400, 'invalid-input');
	await errorOf(
		await tokens.designer.post(R, {
			data: '<revision/>',
			headers: { 'content-type': 'application/xml' }
		}),
		415
	);
	const cmp = await tokens.viewer.get(`${R}/compare?a=1&b=2`);
	expect(cmp.status()).toBe(200);
	const diff = ((await cmp.json()) as { diff: { legs: Array<{ id: string; status: string }> } })
		.diff;
	expect(diff.legs.find((l) => l.id === 'heat')!.status).toBe('changed');
	await errorOf(await tokens.viewer.get(`${R}/compare?a=1&b=later`), 400, 'invalid-compare');
});

test('sign-off over the API: each step per role, no self-check, unknown steps in the error shape', async () => {
	const sheet = await newSheet('API sign-off sheet');
	const R = `${API}/sheets/${sheet}/revisions`;
	expect(
		(
			await tokens.designer.post(R, { data: { message: 'For checking', baseRevision: null } })
		).status()
	).toBe(201);
	await errorOf(await tokens.checker.post(`${R}/1/check`), 409, 'wrong-status');
	await errorOf(await tokens.viewer.post(`${R}/1/submit`), 403, 'forbidden');
	const sub = await tokens.designer.post(`${R}/1/submit`, { data: {} });
	expect(sub.status(), await sub.text()).toBe(200);
	expect(((await sub.json()) as { revision: { status: string } }).revision.status).toBe('in-check');
	await errorOf(await tokens.designer.post(`${R}/1/check`), 403, 'forbidden');
	await errorOf(await tokens.checker.post(`${R}/1/return`, { data: {} }), 400, 'invalid-note');
	await errorOf(await tokens.checker.post(`${R}/1/approve`), 403, 'forbidden');
	expect(
		(
			await tokens.checker.post(`${R}/1/check`, {
				data: { note: 'Checked against the burner data.' }
			})
		).status()
	).toBe(200);
	await errorOf(await tokens.checker.post(`${R}/1/approve`), 403, 'forbidden');
	const ok = await tokens.owner.post(`${R}/1/approve`);
	expect(ok.status()).toBe(200);
	const approved = (
		(await ok.json()) as {
			revision: { status: string; checked: { name: string }; approved: { name: string } };
		}
	).revision;
	expect(approved.status).toBe('approved');
	await errorOf(
		await tokens.owner.post(`${R}/1/return`, { data: { note: 'too late' } }),
		409,
		'wrong-status'
	);
	await errorOf(await tokens.owner.post(`${R}/1/publish`), 404, 'not-found');
	// the owner's own revision: the owner's token cannot check it
	const own = await newSheet('API own-check sheet');
	const O = `${API}/sheets/${own}/revisions`;
	await tokens.owner.post(O, { data: { message: 'Owner drew this', baseRevision: null } });
	await tokens.owner.post(`${O}/1/submit`);
	await errorOf(await tokens.owner.post(`${O}/1/check`), 403, 'self-check');
	// restore needs the draft version
	await errorOf(
		await tokens.designer.post(`${R}/1/restore`, { data: { version: 99 } }),
		409,
		'draft-conflict'
	);
});

test('review notes over the API: write per role, anchors, replies, resolve', async () => {
	const sheet = await newSheet('API notes sheet');
	const N = `${API}/sheets/${sheet}/notes`;
	await errorOf(
		await tokens.viewer.post(N, { data: { anchor: { kind: 'sheet' }, body: 'hello' } }),
		403,
		'forbidden'
	);
	await errorOf(
		await tokens.checker.post(N, {
			data: { anchor: { kind: 'leg', legId: 'nope' }, body: 'hello' }
		}),
		400,
		'unknown-anchor'
	);
	await errorOf(
		await tokens.checker.post(N, { data: { anchor: { kind: 'leg' }, body: 'hello' } }),
		400,
		'invalid-anchor'
	);
	await errorOf(
		await tokens.checker.post(N, { data: { anchor: { kind: 'sheet' }, body: '' } }),
		400,
		'invalid-body'
	);
	const made = await tokens.checker.post(N, {
		data: { anchor: { kind: 'leg', legId: 'vent' }, body: 'Vent to 200 kPa a: which line?' }
	});
	expect(made.status(), await made.text()).toBe(201);
	const note = ((await made.json()) as { note: { id: string; label: string } }).note;
	expect(note.label).toBe('L2');
	const reply = await tokens.designer.post(`${N}/${note.id}/replies`, {
		data: { body: 'The 2 in header to the condensate tank.' }
	});
	expect(reply.status()).toBe(201);
	await errorOf(
		await tokens.viewer.patch(`${N}/${note.id}`, { data: { resolved: true } }),
		403,
		'forbidden'
	);
	const resolved = await tokens.checker.patch(`${N}/${note.id}`, { data: { resolved: true } });
	expect(
		((await resolved.json()) as { note: { resolved: { by: string } } }).note.resolved
	).not.toBeNull();
	await errorOf(
		await tokens.checker.patch(`${N}/${note.id}`, { data: { resolved: true } }),
		409,
		'already-resolved'
	);
	const list = (await (await tokens.viewer.get(N)).json()) as {
		notes: Array<{ replies: unknown[] }>;
		open: number;
	};
	expect(list.open).toBe(0);
	expect(list.notes[0].replies).toHaveLength(2);
	await errorOf(await tokens.viewer.get(`${N}?revision=x`), 400, 'invalid-revision');
	await errorOf(await tokens.viewer.get(`${N}/aaaaaaaaaaaaaaaa`), 404, 'note-not-found');
});

test('measured traces over the API: upload as CSV or form, refusals with line numbers, per role', async () => {
	const sheet = await newSheet('API traces sheet');
	const T = `${API}/sheets/${sheet}/traces`;
	const csv = 'time [s],P [kPa g],T [°C]\n0,100,20\n60,150,40\n120,180,60\n';
	await errorOf(
		await tokens.checker.post(`${T}?filename=log.csv`, {
			data: csv,
			headers: { 'content-type': 'text/csv' }
		}),
		403,
		'forbidden'
	);
	const up = await tokens.designer.post(`${T}?filename=log.csv&name=Morning%20run`, {
		data: csv,
		headers: { 'content-type': 'text/csv' }
	});
	expect(up.status(), await up.text()).toBe(201);
	const trace = ((await up.json()) as { trace: { id: string; name: string; pointCount: number } })
		.trace;
	expect(trace).toMatchObject({ name: 'Morning run', pointCount: 3 });
	// multipart as a script sends it (curl -F): no Origin header, the token is what counts
	const form = await tokens.designer.post(T, {
		multipart: {
			file: { name: 'second.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) },
			tolerance: '0.3'
		}
	});
	expect(form.status(), await form.text()).toBe(201);
	// a cookie session is refused a cross-site form post, in the API's error shape
	const browserish = await signedInRequest(DEMO.designer);
	const forged = await errorOf(
		await browserish.post(T, {
			headers: { origin: 'http://forged.example' },
			multipart: { file: { name: 'x.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) } }
		}),
		403,
		'cross-site-form'
	);
	expect(forged.message).toMatch(/Authorization: Bearer/);
	// with neither a session nor a token there is nothing to forge: the answer is the 401 of any unauthenticated call
	const nobody = await playwrightRequest.newContext({ baseURL: BASE });
	await errorOf(
		await nobody.post(T, {
			multipart: { file: { name: 'x.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) } }
		}),
		401,
		'unauthenticated'
	);
	const bad = await errorOf(
		await tokens.designer.post(T, {
			headers: { origin: BASE },
			multipart: {
				file: {
					name: 'bad.csv',
					mimeType: 'text/csv',
					buffer: Buffer.from('time [s],P [kPa g],T [°C]\n0,100,20\n5,abc,21\n10,110;22\n')
				}
			}
		}),
		422,
		'rejected-lines'
	);
	expect((bad.rejected as Array<{ line: number }>).map((r) => r.line)).toEqual([3, 4]);
	expect(bad.rejectedCount).toBe(2);
	await errorOf(
		await tokens.designer.post(`${T}?filename=x.csv`, {
			data: 'time [s],P [bar],T [°C]\n0,1,20\n',
			headers: { 'content-type': 'text/csv' }
		}),
		422,
		'pressure-reference'
	);
	await errorOf(
		await tokens.designer.post(`${T}?filename=x.csv`, {
			data: 'time [s],P [kPa a],T [°C]\n' + '0,200,20\n'.repeat(60_000),
			headers: { 'content-type': 'text/csv' }
		}),
		413,
		'too-large'
	);
	await errorOf(await tokens.designer.post(T, { data: { csv } }), 415, 'unsupported-media-type');
	await errorOf(
		await tokens.designer.post(T, { headers: { origin: BASE }, multipart: { other: 'no file' } }),
		400,
		'no-file'
	);
	const listed = (await (await tokens.viewer.get(`${T}?points=chart`)).json()) as {
		traces: Array<{ points: unknown[] }>;
	};
	expect(listed.traces).toHaveLength(2);
	expect(listed.traces[0].points).toHaveLength(3);
	const one = await tokens.viewer.get(`${T}/${trace.id}`);
	expect(
		((await one.json()) as { trace: { points: Array<{ P: number }> } }).trace.points[0].P
	).toBeCloseTo(201_325, 3);
	await errorOf(await tokens.viewer.delete(`${T}/${trace.id}`), 403, 'forbidden');
	expect((await tokens.designer.delete(`${T}/${trace.id}`)).status()).toBe(204);
	await errorOf(await tokens.viewer.get(`${T}/${trace.id}`), 404, 'trace-not-found');
});

test('nobody outside the team, and nobody signed out, reaches a sheet’s revisions, notes or traces', async () => {
	const sheet = await newSheet('API privacy sheet');
	const anon = await playwrightRequest.newContext({ baseURL: BASE });
	for (const path of ['revisions', 'notes', 'traces'])
		await errorOf(await anon.get(`${API}/sheets/${sheet}/${path}`), 401, 'unauthenticated');
	await errorOf(
		await tokens.viewer.get(`${API}/sheets/aaaaaaaaaaaaaaaa/revisions`),
		404,
		'sheet-not-found'
	);
});

test('what scripts rely on: member ids, examples in the list, a clean sign-off record, 401 and 413 answers', async () => {
	// member ids, usable as checkerId and in mentions
	const members = (
		(await (await tokens.viewer.get(`${API}/members`)).json()) as {
			members: Array<{ id: string; email: string; role: string }>;
		}
	).members;
	const checker = members.find((m) => m.email === DEMO.checker);
	expect(checker?.id).toMatch(/^\w{8,}$/);

	// a sheet made from a worked example says so in the list as well as alone; a token's actor names its creator
	const made = await tokens.designer.post(`${API}/sheets`, {
		data: { example: 'kettle-k101', title: `K-101 scripted ${Date.now().toString(36)}` }
	});
	expect(made.status(), await made.text()).toBe(201);
	const sheet = ((await made.json()) as { sheet: { id: string; title: string; createdBy: string } })
		.sheet;
	expect(sheet.createdBy).toMatch(/^Tobias Lindqvist \(token “api review designer \d+”\)$/);
	const listed = (await (
		await tokens.viewer.get(`${API}/sheets?q=${encodeURIComponent(sheet.title)}`)
	).json()) as { sheets: Array<{ id: string; example: string | null }> };
	expect(listed.sheets.find((s) => s.id === sheet.id)?.example).toBe('kettle-k101');

	// withdrawn, resubmitted to a named checker, checked, approved: no "returned" left on the record
	const R = `${API}/sheets/${sheet.id}/revisions`;
	expect(
		(
			await tokens.designer.post(R, { data: { message: 'First issue', baseRevision: null } })
		).status()
	).toBe(201);
	expect((await tokens.designer.post(`${R}/1/submit`, { data: {} })).status()).toBe(200);
	const withdrawn = await tokens.designer.post(`${R}/1/withdraw`, { data: {} });
	expect(
		((await withdrawn.json()) as { revision: { status: string; returned: unknown } }).revision
	).toMatchObject({
		status: 'draft',
		returned: { name: expect.stringMatching(/^Tobias Lindqvist/) }
	});
	expect(
		(await tokens.designer.post(`${R}/1/submit`, { data: { checkerId: checker!.id } })).status()
	).toBe(200);
	expect((await tokens.checker.post(`${R}/1/check`, { data: {} })).status()).toBe(200);
	expect((await tokens.owner.post(`${R}/1/approve`, { data: {} })).status()).toBe(200);
	const rev = (
		(await (await tokens.viewer.get(`${R}/1`)).json()) as {
			revision: { status: string; returned: unknown; submitted: { checkerId: string } };
		}
	).revision;
	expect(rev).toMatchObject({
		status: 'approved',
		returned: null,
		submitted: { checkerId: checker!.id }
	});

	// no credentials: 401 with the Bearer challenge
	const anon = await playwrightRequest.newContext({ baseURL: BASE });
	const me = await anon.get('/api/v1/me');
	await errorOf(me, 401, 'unauthenticated');
	expect(me.headers()['www-authenticate']).toBe('Bearer');

	// a body past any limit: a whole JSON error, not a cut-off one
	for (const [method, path] of [
		['POST', `${API}/sheets`],
		['PUT', `${API}/sheets/${sheet.id}/draft`]
	] as const) {
		const big = JSON.stringify({
			title: 'x',
			version: 1,
			doc: { description: 'a'.repeat(600_000) }
		});
		const res = await tokens.designer.fetch(path, {
			method,
			data: big,
			headers: { 'content-type': 'application/json' }
		});
		const e = await errorOf(res, 413, 'too-large');
		expect(e.message).toMatch(/smaller/);
	}
	// a note on revision 0 says what to give
	const bad = await errorOf(
		await tokens.checker.post(`${API}/sheets/${sheet.id}/notes`, {
			data: { anchor: { kind: 'sheet' }, body: 'x', revision: 0 }
		}),
		400,
		'invalid-input'
	);
	expect(bad.message).toMatch(/revision must be the number of the revision/);
});
