import { describe, expect, it } from 'vitest';
import { crossSiteFormRefusal } from './csrf';

const URL_API = new URL('http://app.test/api/v1/teams/brindlemoor/sheets/abc/traces');
const URL_PAGE = new URL('http://app.test/signin');

function req(url: URL, method: string, headers: Record<string, string>): Request {
	return new Request(url, { method, headers, body: method === 'GET' ? undefined : 'x' });
}

describe('cross-site form submissions', () => {
	it('lets same-origin forms, JSON bodies and safe methods through', () => {
		expect(
			crossSiteFormRefusal(
				req(URL_PAGE, 'POST', {
					'content-type': 'application/x-www-form-urlencoded',
					origin: 'http://app.test'
				}),
				URL_PAGE,
				true
			)
		).toBeNull();
		expect(
			crossSiteFormRefusal(
				req(URL_API, 'POST', { 'content-type': 'application/json', origin: 'http://evil.test' }),
				URL_API,
				true
			)
		).toBeNull();
		expect(
			crossSiteFormRefusal(req(URL_API, 'GET', { 'content-type': 'text/plain' }), URL_API, true)
		).toBeNull();
		expect(
			crossSiteFormRefusal(req(URL_API, 'POST', { 'content-type': 'text/csv' }), URL_API, true)
		).toBeNull();
	});

	it('refuses a form post from another origin, or with none, as plain text on pages', async () => {
		for (const origin of ['http://evil.test', null]) {
			const headers: Record<string, string> = { 'content-type': 'multipart/form-data; boundary=x' };
			if (origin) headers.origin = origin;
			const res = crossSiteFormRefusal(req(URL_PAGE, 'POST', headers), URL_PAGE, true);
			expect(res?.status).toBe(403);
			expect(await res?.text()).toMatch(/Cross-site POST form submissions are refused/);
		}
	});

	it('answers an API refusal in the API error shape', async () => {
		for (const type of [
			'application/x-www-form-urlencoded',
			'multipart/form-data; boundary=x',
			'text/plain;charset=utf-8'
		]) {
			const res = crossSiteFormRefusal(
				req(URL_API, 'DELETE', { 'content-type': type, origin: 'http://evil.test' }),
				URL_API,
				true
			);
			expect(res?.status).toBe(403);
			const body = (await res?.json()) as { error: { code: string; message: string } };
			expect(body.error.code).toBe('cross-site-form');
			expect(body.error.message).toMatch(/Authorization: Bearer/);
		}
	});

	it('on the API, a request without a session cookie has nothing to forge: it goes on (and meets 401 where sign-in is needed)', () => {
		const headers = {
			'content-type': 'multipart/form-data; boundary=x',
			origin: 'http://evil.test'
		};
		expect(crossSiteFormRefusal(req(URL_API, 'POST', headers), URL_API, false)).toBeNull();
		// pages stay strict without a session too (a forged sign-in)
		expect(crossSiteFormRefusal(req(URL_PAGE, 'POST', headers), URL_PAGE, false)?.status).toBe(403);
	});

	it('lets a token-carrying API request through without an Origin (a script, not a browser form)', () => {
		const headers = {
			'content-type': 'multipart/form-data; boundary=x',
			authorization: 'Bearer swt_abc'
		};
		expect(crossSiteFormRefusal(req(URL_API, 'POST', headers), URL_API, true)).toBeNull();
		// but not on pages: tokens mean nothing there
		expect(crossSiteFormRefusal(req(URL_PAGE, 'POST', headers), URL_PAGE, true)?.status).toBe(403);
		// and a malformed Authorization header does not count as one
		expect(
			crossSiteFormRefusal(
				req(URL_API, 'POST', { ...headers, authorization: 'Basic abc' }),
				URL_API,
				true
			)?.status
		).toBe(403);
	});
});
