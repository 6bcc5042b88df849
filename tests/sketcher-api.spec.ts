import {
	expect,
	request as playwrightRequest,
	test,
	type APIRequestContext
} from '@playwright/test';
import { BASE, createToken, DEMO, seededK101Id, signedInRequest, TEAM } from './helpers';

/*
 * The sheet API over HTTP with team tokens (and the session a browser has): list and search,
 * create from a document, a bare path spec or a worked example, read, rename, save the draft with
 * optimistic concurrency. Errors in the API's shape with 4xx statuses and messages.
 */

let owner: APIRequestContext;
let designer: APIRequestContext;
let checker: APIRequestContext;
let viewer: APIRequestContext;

async function tokenContext(token: string): Promise<APIRequestContext> {
	return playwrightRequest.newContext({
		baseURL: BASE,
		extraHTTPHeaders: { authorization: `Bearer ${token}` }
	});
}

test.beforeAll(async () => {
	owner = await signedInRequest(DEMO.owner);
	const stamp = Date.now().toString(36);
	designer = await tokenContext(
		await createToken(owner, TEAM, `sketch script ${stamp}`, 'designer')
	);
	checker = await tokenContext(await createToken(owner, TEAM, `check script ${stamp}`, 'checker'));
	viewer = await tokenContext(await createToken(owner, TEAM, `read script ${stamp}`, 'viewer'));
});
test.afterAll(async () => {
	for (const c of [owner, designer, checker, viewer]) await c?.dispose();
});

const url = `/api/v1/teams/${TEAM}/sheets`;
const bareSpec = {
	fluid: 'water',
	system: { kind: 'closed', volume: 0.2 },
	start: { T: 373.15, x: 0.1 },
	legs: [{ process: 'isochoric', target: { T: 453.15 } }]
};

test.describe('sheet API', () => {
	test('create from a bare path spec, read it back, rename, save the draft; a stale save is 409 naming who saved', async () => {
		const created = await designer.post(url, {
			data: { title: 'Script-made vessel', doc: bareSpec }
		});
		expect(created.status()).toBe(201);
		const { sheet } = await created.json();
		expect(sheet).toMatchObject({
			title: 'Script-made vessel',
			fluid: 'water',
			systemKind: 'closed',
			status: 'draft',
			version: 1
		});
		expect(sheet.doc.version).toBe(1);
		expect(sheet.doc.spec.legs[0].id).toMatch(/^L[a-z2-9]{6}$/);
		expect(sheet.doc.units.atmosphere).toBe(101325);

		const read = await viewer.get(`${url}/${sheet.id}`);
		expect(read.status()).toBe(200);
		expect((await read.json()).sheet.doc.spec.start).toEqual({ T: 373.15, x: 0.1 });

		const renamed = await designer.patch(`${url}/${sheet.id}`, {
			data: { title: '  Script-made   vessel V-5 ' }
		});
		expect(renamed.status()).toBe(200);
		expect((await renamed.json()).sheet.title).toBe('Script-made vessel V-5');

		const doc = { ...sheet.doc, titleBlock: { ...sheet.doc.titleBlock, tag: 'V-5' } };
		const saved = await designer.put(`${url}/${sheet.id}/draft`, { data: { version: 1, doc } });
		expect(saved.status()).toBe(200);
		expect(await saved.json()).toMatchObject({
			version: 2,
			updatedBy: expect.stringContaining('sketch script')
		});

		const stale = await owner.put(`${url}/${sheet.id}/draft`, {
			data: { version: 1, doc: sheet.doc }
		});
		expect(stale.status()).toBe(409);
		const body = await stale.json();
		expect(body.error.code).toBe('draft-conflict');
		expect(body.error.message).toContain('saved this sheet since you opened it');
		expect(body.error.current).toMatchObject({
			version: 2,
			updatedBy: expect.stringContaining('sketch script')
		});
		// nothing was written by the refused save
		expect((await (await viewer.get(`${url}/${sheet.id}`)).json()).sheet.doc.titleBlock.tag).toBe(
			'V-5'
		);
	});

	test('list and search by title-block words; a worked example by id', async () => {
		const ex = await designer.post(url, {
			data: { example: 'receiver-r310-hot-day', title: 'R-310 copy for the API test' }
		});
		expect(ex.status()).toBe(201);
		expect((await ex.json()).sheet.example).toBe('receiver-r310-hot-day');
		const found = await viewer.get(`${url}?q=${encodeURIComponent('Gorsebank copy')}`);
		expect(found.status()).toBe(200);
		const list = await found.json();
		expect(list.sheets.map((s: { title: string }) => s.title)).toContain(
			'R-310 copy for the API test'
		);
		expect(list.sheets.every((s: { fluid: string }) => s.fluid === 'ammonia')).toBe(true);
		expect(list.total).toBe(list.sheets.length);
		const all = await (await viewer.get(`${url}?limit=200`)).json();
		expect(all.total).toBeGreaterThanOrEqual(5);
	});

	test('roles: checkers and viewers read but cannot create, rename or save (403); no credentials is 401', async () => {
		const { sheet } = await (
			await designer.post(url, { data: { title: 'Role check', doc: bareSpec } })
		).json();
		for (const ctx of [checker, viewer]) {
			expect((await ctx.get(`${url}/${sheet.id}`)).status()).toBe(200);
			expect((await ctx.post(url, { data: { title: 'x', doc: bareSpec } })).status()).toBe(403);
			expect((await ctx.patch(`${url}/${sheet.id}`, { data: { title: 'x' } })).status()).toBe(403);
			const put = await ctx.put(`${url}/${sheet.id}/draft`, {
				data: { version: 1, doc: sheet.doc }
			});
			expect(put.status()).toBe(403);
			expect((await put.json()).error.code).toBe('forbidden');
		}
		const anon = await playwrightRequest.newContext({ baseURL: BASE });
		expect((await anon.get(url)).status()).toBe(401);
		await anon.dispose();
	});

	test('bad input gets a 4xx with a message, and nothing is saved', async () => {
		const before = (await (await viewer.get(`${url}?limit=200`)).json()).total;
		const cases: Array<[unknown, number, RegExp]> = [
			[{ title: 'x', doc: { ...bareSpec, start: { T: 373.15 } } }, 400, /exactly two properties/],
			[
				{ title: 'x', doc: { ...bareSpec, legs: [{ process: 'isobaric', target: { P: 1e5 } }] } },
				400,
				/keeps P constant/
			],
			[{ title: 'x', doc: { ...bareSpec, fluid: 'steam-ish' } }, 400, /must be one of/],
			[{ title: '', doc: bareSpec }, 400, /title/i],
			[
				{ title: 'x', doc: { ...bareSpec, start: { T: 700, x: 0.5 } } },
				422,
				/start state cannot be fixed/
			],
			[{ title: 'x', doc: { ...bareSpec, version: 7 } }, 400, /newer than this server reads/],
			[{ title: 'x' }, 400, /doc/],
			[{ example: 'no-such-example' }, 400, /worked example/]
		];
		for (const [data, status, message] of cases) {
			const r = await designer.post(url, { data });
			expect(r.status(), JSON.stringify(data).slice(0, 80)).toBe(status);
			expect((await r.json()).error.message).toMatch(message);
		}
		const notJson = await designer.post(url, {
			headers: { 'content-type': 'application/xml' },
			data: '<sheet/>'
		});
		expect(notJson.status()).toBe(415);
		expect((await designer.get(`${url}?limit=abc`)).status()).toBe(400);
		expect((await viewer.get(`${url}/abcdefghijkmnpqr`)).status()).toBe(404);
		const { sheet } = await (
			await designer.post(url, { data: { title: 'Bad saves', doc: bareSpec } })
		).json();
		const badSave = await designer.put(`${url}/${sheet.id}/draft`, {
			data: { version: 1, doc: { ...sheet.doc, units: { ...sheet.doc.units, atmosphere: 5 } } }
		});
		expect(badSave.status()).toBe(400);
		expect((await badSave.json()).error.message).toMatch(/20 to 120 kPa/);
		expect(
			(await designer.put(`${url}/${sheet.id}/draft`, { data: { doc: sheet.doc } })).status()
		).toBe(400);
		expect((await (await viewer.get(`${url}/${sheet.id}`)).json()).sheet.version).toBe(1);
		expect((await (await viewer.get(`${url}?limit=200`)).json()).total).toBe(before + 1);
	});

	test('delete: checkers and viewers cannot, a designer deletes a scratch sheet, an approved revision keeps its sheet', async () => {
		const made = await designer.post(url, {
			data: { title: 'Scratch sheet to delete', doc: bareSpec }
		});
		expect(made.status()).toBe(201);
		const id = ((await made.json()) as { sheet: { id: string } }).sheet.id;
		for (const ctx of [checker, viewer]) {
			const r = await ctx.delete(`${url}/${id}`);
			expect(r.status()).toBe(403);
			expect(((await r.json()) as { error: { code: string } }).error.code).toBe('forbidden');
		}
		expect((await designer.delete(`${url}/${id}`)).status()).toBe(204);
		expect((await viewer.get(`${url}/${id}`)).status()).toBe(404);
		expect((await designer.delete(`${url}/${id}`)).status()).toBe(404);
		// the seeded K-101 holds an approved revision: kept, even for the owner
		const k101 = { id: await seededK101Id(viewer) };
		const kept = await owner.delete(`${url}/${k101.id}`);
		expect(kept.status()).toBe(409);
		const e = ((await kept.json()) as { error: { code: string; message: string } }).error;
		expect(e.code).toBe('approved-record');
		expect(e.message).toMatch(/approved/);
		expect((await viewer.get(`${url}/${k101.id}`)).status()).toBe(200);
	});
});
