import {
	expect,
	request as playwrightRequest,
	test,
	type APIRequestContext
} from '@playwright/test';
import { BASE, DEMO, TEAM, createToken, signedInRequest } from './helpers';

// Junk thrown at every team-scoped API route with an owner's token (the role that may do most):
// every answer is below 500 and in the API's JSON error shape when it is an error.

let api: APIRequestContext;
const base = `/api/v1/teams/${TEAM}`;
let sheet = '';
let note = '';
let trace = '';

test.beforeAll(async () => {
	const owner = await signedInRequest(DEMO.owner);
	const token = await createToken(owner, TEAM, `junk ${Date.now().toString(36)}`, 'owner');
	api = await playwrightRequest.newContext({
		baseURL: BASE,
		extraHTTPHeaders: { authorization: `Bearer ${token}` }
	});
	const made = await api.post(`${base}/sheets`, {
		data: { example: 'vessel-v204-fire', title: 'Junk target' }
	});
	sheet = ((await made.json()) as { sheet: { id: string } }).sheet.id;
	await api.post(`${base}/sheets/${sheet}/revisions`, {
		data: { message: 'Rev 1 for junk', baseRevision: null }
	});
	note = (
		(await (
			await api.post(`${base}/sheets/${sheet}/notes`, {
				data: { anchor: { kind: 'sheet' }, body: 'junk thread' }
			})
		).json()) as { note: { id: string } }
	).note.id;
	const up = await api.post(`${base}/sheets/${sheet}/traces?filename=j.csv`, {
		data: 'time [s],P [kPa a],T [°C]\n0,150,20\n',
		headers: { 'content-type': 'text/csv' }
	});
	trace = ((await up.json()) as { trace: { id: string } }).trace.id;
});
test.afterAll(async () => {
	await api?.dispose();
});

const deep = '['.repeat(5000) + ']'.repeat(5000);
const BODIES: Array<[string, string | undefined, string]> = [
	['no body', undefined, 'application/json'],
	['null', 'null', 'application/json'],
	['array', '[]', 'application/json'],
	['number', '1e400', 'application/json'],
	['string', '"x"', 'application/json'],
	['empty object', '{}', 'application/json'],
	['deep nesting', deep, 'application/json'],
	[
		'prototype keys',
		'{"__proto__":{"admin":true},"constructor":{"prototype":{}}}',
		'application/json'
	],
	[
		'wrong types',
		'{"title":5,"doc":"x","message":[],"baseRevision":"one","anchor":{"kind":"leg","legId":7},"body":{},"version":-1,"revision":1.5,"resolved":"yes","checkerId":3,"note":false}',
		'application/json'
	],
	['broken JSON', '{"title": "x"', 'application/json'],
	[
		'huge numbers in a doc',
		'{"title":"x","doc":{"fluid":"water","system":{"kind":"closed","volume":1e308},"start":{"T":1e308,"P":-0},"legs":[{"id":"L1","process":"isochoric","target":{"T":"NaN"}}]}}',
		'application/json'
	],
	['binary', '\u0000\u0001\u0002\uffff', 'application/octet-stream'],
	['csv that is not', 'not,a,log\n1,2', 'text/csv'],
	['600 kB', `{"title":"${'a'.repeat(600_000)}"}`, 'application/json']
];

test('no team route answers junk with a 5xx', async () => {
	test.setTimeout(120_000);
	const S = `${base}/sheets/${sheet}`;
	const routes: Array<[string, string[]]> = [
		[`${base}`, ['GET', 'POST']],
		[`${base}/members`, ['GET', 'POST']],
		[`${base}/sheets?limit=-1&offset=x&q=${'%'.repeat(300)}`, ['GET', 'POST']],
		[S, ['GET', 'PATCH', 'PUT']],
		[`${S}/draft`, ['PUT', 'POST']],
		[`${S}/revisions`, ['GET', 'POST']],
		[`${S}/revisions/1`, ['GET', 'POST']],
		[`${S}/revisions/99999999999999999999`, ['GET']],
		[`${S}/revisions/1/submit`, ['POST']],
		[`${S}/revisions/1/frobnicate`, ['POST']],
		[`${S}/revisions/1/restore`, ['POST']],
		[`${S}/revisions/compare?a=0&b=draft`, ['GET']],
		[`${S}/revisions/compare?a=x`, ['GET']],
		[`${S}/notes?revision=abc`, ['GET', 'POST']],
		[`${S}/notes/${note}`, ['GET', 'PATCH']],
		[`${S}/notes/${note}/replies`, ['POST']],
		[`${S}/notes/nope`, ['GET', 'PATCH', 'DELETE']],
		[`${S}/traces?points=sideways`, ['GET', 'POST']],
		[`${S}/traces/${trace}`, ['GET', 'PATCH']],
		[`${S}/traces/nope`, ['GET', 'DELETE']],
		[`${base}/sheets/not-a-sheet`, ['GET', 'PATCH', 'DELETE']]
	];
	const fives: string[] = [];
	let refused = 0;
	for (const [path, methods] of routes) {
		for (const method of methods) {
			for (const [name, data, type] of BODIES) {
				if (method === 'GET' && data !== undefined) continue;
				const res = await api.fetch(path, { method, data, headers: { 'content-type': type } });
				const status = res.status();
				if (status >= 500) fives.push(`${method} ${path} (${name}) → ${status}`);
				if (status >= 400) {
					refused++;
					expect(res.headers()['content-type'], `${method} ${path} (${name})`).toMatch(
						/application\/json/
					);
					const body = (await res.json()) as { error?: { code?: string; message?: string } };
					expect(typeof body.error?.message, `${method} ${path} (${name})`).toBe('string');
				}
			}
		}
	}
	expect(fives).toEqual([]);
	expect(refused).toBeGreaterThan(200);
	// the sheet survived it all, readable
	expect((await api.get(S)).status()).toBe(200);
});
