import { describe, expect, it } from 'vitest';
import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import { z } from 'zod';
import { apiRoute, readJson } from './api';
import { AppError } from './errors';

const event = {} as RequestEvent;
const body = async (r: Response) => ({ status: r.status, json: await r.json() });

describe('apiRoute', () => {
	it('answers a returned object as 200 JSON and passes a Response through', async () => {
		expect(await body(await apiRoute(() => ({ ok: 1 }))(event))).toEqual({
			status: 200,
			json: { ok: 1 }
		});
		const r = await apiRoute(() => new Response('x', { status: 201 }))(event);
		expect(r.status).toBe(201);
	});

	it('puts every client error in one shape', async () => {
		const cases: Array<[() => never, number, unknown]> = [
			[
				() => error(403, { code: 'forbidden', message: 'no' }),
				403,
				{ error: { code: 'forbidden', message: 'no' } }
			],
			[
				() => error(404, { message: 'gone' }),
				404,
				{ error: { code: 'not-found', message: 'gone' } }
			],
			[
				() => {
					throw new AppError(409, 'last-owner', 'keep one', 'role');
				},
				409,
				{ error: { code: 'last-owner', message: 'keep one', field: 'role' } }
			],
			[
				() => {
					z.object({ n: z.number({ error: 'n must be a number' }) }).parse({ n: 'x' });
					throw new Error('unreachable');
				},
				400,
				{
					error: {
						code: 'invalid-input',
						message: 'n must be a number.',
						issues: [{ path: 'n', message: 'n must be a number' }]
					}
				}
			],
			// one sentence per issue, named by its field, no doubled stops
			[
				() => {
					z.object({
						a: z.number({ error: 'Give a number.' }),
						b: z.string({ error: 'Give text' })
					}).parse({ a: 'x', b: 1 });
					throw new Error('unreachable');
				},
				400,
				{
					error: {
						code: 'invalid-input',
						message: 'a: Give a number. b: Give text.',
						issues: [
							{ path: 'a', message: 'Give a number.' },
							{ path: 'b', message: 'Give text' }
						]
					}
				}
			]
		];
		for (const [fn, status, json] of cases)
			expect(await body(await apiRoute(fn)(event))).toEqual({ status, json });
	});

	it('lets redirects and our own faults through', async () => {
		await expect(apiRoute(() => redirect(303, '/x'))(event)).rejects.toMatchObject({ status: 303 });
		await expect(
			apiRoute(() => {
				throw new TypeError('bug');
			})(event)
		).rejects.toThrow(TypeError);
	});
});

describe('readJson', () => {
	const schema = z.object({ a: z.number() });
	const req = (text: string, type = 'application/json') =>
		new Request('http://x/', { method: 'POST', body: text, headers: { 'content-type': type } });

	it('parses and validates', async () => {
		expect(await readJson(req('{"a":1}'), schema)).toEqual({ a: 1 });
		expect(
			await readJson(req('{"a":2}', 'application/vnd.api+json; charset=utf-8'), schema)
		).toEqual({ a: 2 });
	});

	it('refuses wrong type, too large, malformed and invalid bodies', async () => {
		await expect(readJson(req('{"a":1}', 'text/plain'), schema)).rejects.toMatchObject({
			status: 415
		});
		await expect(
			readJson(req(`{"a":1,"pad":"${'x'.repeat(2000)}"}`), schema, { maxBytes: 1000 })
		).rejects.toMatchObject({ status: 413 });
		await expect(readJson(req('{"a":'), schema)).rejects.toMatchObject({
			status: 400,
			code: 'invalid-json'
		});
		await expect(readJson(req('{"a":"1"}'), schema)).rejects.toBeInstanceOf(z.ZodError);
	});
});
