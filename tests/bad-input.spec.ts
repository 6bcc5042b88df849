import {
	expect,
	request as playwrightRequest,
	test,
	type APIRequestContext
} from '@playwright/test';
import { BASE, DEMO, FORM, signedInRequest, TEAM } from './helpers';

// Anything a client can send gets a 4xx with a message, never a 5xx.

type Case = {
	name: string;
	as: 'anonymous' | 'owner';
	method: string;
	path: string;
	headers?: Record<string, string>;
	data?: string;
	status: number;
};

const long = 'x'.repeat(100_000);
const CASES: Case[] = [
	{
		name: 'sign-in as JSON',
		as: 'anonymous',
		method: 'POST',
		path: '/signin',
		headers: { 'content-type': 'application/json' },
		data: '{"email":"a"}',
		status: 415
	},
	{ name: 'sign-in without a body', as: 'anonymous', method: 'POST', path: '/signin', status: 415 },
	{
		name: 'sign-in with broken multipart',
		as: 'anonymous',
		method: 'POST',
		path: '/signin',
		headers: { 'content-type': 'multipart/form-data; boundary=zz' },
		data: 'garbage',
		status: 400
	},
	{
		name: 'an action that does not exist',
		as: 'anonymous',
		method: 'POST',
		path: '/signin?/nope',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		data: 'email=a',
		status: 404
	},
	{
		name: 'a 100 kB name',
		as: 'anonymous',
		method: 'POST',
		path: '/signup',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		data: `name=${long}&email=a%40b.example&password=aaaaaaaaaaaaaaaa`,
		status: 400
	},
	{
		name: 'a reset with a made-up token',
		as: 'anonymous',
		method: 'POST',
		path: '/reset?/set',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		data: 'token=x&password=a+new+password&confirm=a+new+password',
		status: 400
	},
	{
		name: 'undecodable confirmation token',
		as: 'anonymous',
		method: 'GET',
		path: `/verify?token=${'%ff'.repeat(3000)}`,
		status: 200
	},
	{
		name: 'an invitation token that does not exist',
		as: 'anonymous',
		method: 'GET',
		path: `/invite/${'A'.repeat(43)}`,
		status: 404
	},
	{ name: 'undecodable path', as: 'anonymous', method: 'GET', path: '/t/%E0%A4%A', status: 400 },
	{ name: 'PUT on a page', as: 'owner', method: 'PUT', path: `/t/${TEAM}`, status: 405 },
	{
		name: 'POST of broken JSON to a GET-only API route',
		as: 'owner',
		method: 'POST',
		path: `/api/v1/teams/${TEAM}`,
		headers: { 'content-type': 'application/json' },
		data: '{',
		status: 405
	},
	{
		name: 'invite with broken multipart',
		as: 'owner',
		method: 'POST',
		path: `/t/${TEAM}/settings?/invite`,
		headers: { 'content-type': 'multipart/form-data; boundary=zz' },
		data: '--zz\r\nbroken',
		status: 400
	},
	{
		name: 'invite with a 100 kB address',
		as: 'owner',
		method: 'POST',
		path: `/t/${TEAM}/settings?/invite`,
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		data: `email=${long}%40x.example&role=viewer`,
		status: 400
	},
	{
		name: 'a team name of spaces',
		as: 'owner',
		method: 'POST',
		path: '/?/createTeam',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		data: 'name=+++',
		status: 400
	},
	{
		name: 'ending a session by a made-up id',
		as: 'owner',
		method: 'POST',
		path: '/account?/revokeSession',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		data: 'session=x',
		status: 400
	},
	{
		name: 'an outbox message id beyond any',
		as: 'owner',
		method: 'GET',
		path: '/dev/outbox/9999999999999999',
		status: 404
	},
	{
		name: 'an outbox message id too long to be one',
		as: 'owner',
		method: 'GET',
		path: '/dev/outbox/99999999999999999',
		status: 404
	}
];

let owner: APIRequestContext;
let anonymous: APIRequestContext;
test.beforeAll(async () => {
	owner = await signedInRequest(DEMO.owner);
	anonymous = await playwrightRequest.newContext({ baseURL: BASE });
});
test.afterAll(async () => {
	await owner.dispose();
	await anonymous.dispose();
});

test('bad requests get a 4xx, never a 5xx', async () => {
	const got: Record<string, number> = {};
	const want: Record<string, number> = {};
	for (const c of CASES) {
		const ctx = c.as === 'owner' ? owner : anonymous;
		const res = await ctx.fetch(c.path, {
			method: c.method,
			headers: { ...FORM, ...c.headers },
			data: c.data,
			maxRedirects: 0
		});
		got[c.name] = res.status();
		want[c.name] = c.status;
	}
	expect(got).toEqual(want);
});

test('a garbage session cookie is ignored and cleared', async () => {
	const ctx = await playwrightRequest.newContext({
		baseURL: BASE,
		extraHTTPHeaders: { cookie: 'statewright_session=../../etc/passwd' }
	});
	const res = await ctx.get('/', { maxRedirects: 0 });
	expect(res.status()).toBe(200);
	expect(res.headers()['set-cookie']).toMatch(/^statewright_session=;/);
	await ctx.dispose();
});
