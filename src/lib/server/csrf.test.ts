import { describe, expect, it } from 'vitest';
import { crossSiteFormRefusal } from './csrf';

const URL_API = new URL('http://app.test/api/v1/teams/brindlemoor/sheets/abc/traces');
const URL_PAGE = new URL('http://app.test/signin');

function req(url: URL, method: string, headers: Record<string, string>): Request {
	return new Request(url, { method, headers, body: method === 'GET' ? undefined : 'x' });
}

describe('cross-site form submissions', () => {
	it('lets same-origin forms, JSON bodies and safe methods through', () => {
		expect(crossSiteFormRefusal(req(URL_PAGE, 'POST', { 'content-type': 'application/x-www-form-urlencoded', origin: 'http://app.test' }), URL_PAGE)).toBeNull();
		expect(crossSiteFormRefusal(req(URL_API, 'POST', { 'content-type': 'application/json', origin: 'http://evil.test' }), URL_API)).toBeNull();
		expect(crossSiteFormRefusal(req(URL_API, 'GET', { 'content-type': 'text/plain' }), URL_API)).toBeNull();
		expect(crossSiteFormRefusal(req(URL_API, 'POST', { 'content-type': 'text/csv' }), URL_API)).toBeNull();
	});

	it('refuses a form post from another origin, or with none, as plain text on pages', async () => {
		for (const origin of ['http://evil.test', null]) {
			const headers: Record<string, string> = { 'content-type': 'multipart/form-data; boundary=x' };
			if (origin) headers.origin = origin;
			const res = crossSiteFormRefusal(req(URL_PAGE, 'POST', headers), URL_PAGE);
			expect(res?.status).toBe(403);
			expect(await res?.text()).toMatch(/Cross-site POST form submissions are refused/);
		}
	});

	it('answers an API refusal in the API error shape', async () => {
		for (const type of ['application/x-www-form-urlencoded', 'multipart/form-data; boundary=x', 'text/plain;charset=utf-8']) {
			const res = crossSiteFormRefusal(req(URL_API, 'DELETE', { 'content-type': type, origin: 'http://evil.test' }), URL_API);
			expect(res?.status).toBe(403);
			const body = (await res?.json()) as { error: { code: string; message: string } };
			expect(body.error.code).toBe('cross-site-form');
			expect(body.error.message).toMatch(/Authorization: Bearer/);
		}
	});

	it('lets a token-carrying API request through without an Origin (a script, not a browser form)', () => {
		const headers = { 'content-type': 'multipart/form-data; boundary=x', authorization: 'Bearer swt_abc' };
		expect(crossSiteFormRefusal(req(URL_API, 'POST', headers), URL_API)).toBeNull();
		// but not on pages: tokens mean nothing there
		expect(crossSiteFormRefusal(req(URL_PAGE, 'POST', headers), URL_PAGE)?.status).toBe(403);
		// and a malformed Authorization header does not count as one
		expect(crossSiteFormRefusal(req(URL_API, 'POST', { ...headers, authorization: 'Basic abc' }), URL_API)?.status).toBe(403);
	});
});
