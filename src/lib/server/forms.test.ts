import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { fields, parseForm, safeNext } from './forms';
import { readConfig } from './config';

function form(entries: Record<string, string>) {
	const f = new FormData();
	for (const [k, v] of Object.entries(entries)) f.set(k, v);
	return f;
}

describe('parseForm', () => {
	const schema = z.object({
		email: fields.email,
		name: fields.personName,
		password: fields.password,
		role: fields.role
	});

	it('normalises good input', () => {
		const r = parseForm(
			schema,
			form({
				email: ' A@Example.COM ',
				name: '  Ada   Lovelace ',
				password: 'pw',
				role: 'checker'
			}),
			['email']
		);
		expect(r.ok && r.data).toEqual({
			email: 'a@example.com',
			name: 'Ada Lovelace',
			password: 'pw',
			role: 'checker'
		});
	});

	it('says what to give instead, per field, and echoes only the listed fields', () => {
		const r = parseForm(
			schema,
			form({ email: 'not-an-address', name: '', password: 'secret', role: 'admin' }),
			['email', 'name']
		);
		expect(r.ok).toBe(false);
		if (r.ok) return;
		expect(r.failure.status).toBe(400);
		expect(r.failure.data.errors).toEqual({
			email: 'Enter an e-mail address like name@example.com.',
			name: 'Enter your name as colleagues know it.',
			role: 'Choose a role: owner, designer, checker, viewer.'
		});
		expect(r.failure.data.values).toEqual({ email: 'not-an-address', name: '' });
	});

	it('refuses control characters in values and field names, echoing the value without them', () => {
		const r = parseForm(
			schema,
			form({ email: 'a@example.com', name: '\u0000Ada', password: 'pw', role: 'viewer' }),
			['name']
		);
		expect(r.ok).toBe(false);
		if (r.ok) return;
		expect(r.failure.status).toBe(400);
		expect(r.failure.data.errors.name).toMatch(
			/^The name contains the control character U\+0000 \(NUL\) at character 1\. Send plain text/
		);
		expect(r.failure.data.values).toEqual({ name: 'Ada' });
		const named = parseForm(
			schema,
			form({ email: 'a@example.com', name: 'Ada', password: 'pw', role: 'viewer', 'x\u0007': '1' })
		);
		expect(!named.ok && named.failure.data.message).toMatch(
			/^A form field’s name contains the control character U\+0007 \(BEL\)/
		);
		const team = z.object({ name: fields.teamName, description: fields.description });
		expect(team.safeParse({ name: 'Heat\tWorks', description: '' }).success).toBe(false);
		expect(team.safeParse({ name: 'Heat Works', description: 'two\nlines\ttabbed' }).success).toBe(
			true
		);
		expect(
			team.safeParse({ name: 'Heat Works', description: 'bell\u0007' }).error?.issues[0].message
		).toMatch(/^The description contains the control character U\+0007/);
	});

	it('refuses a missing field and a file where text belongs', () => {
		const f = form({ name: 'x', password: 'p', role: 'viewer' });
		f.set('email', new Blob(['a']), 'a.txt');
		const r = parseForm(schema, f);
		expect(!r.ok && r.failure.data.errors.email).toBe('Enter an e-mail address.');
	});
});

describe('safeNext', () => {
	it('keeps same-site paths and drops everything else', () => {
		expect(safeNext('/t/team/settings?x=1#m')).toBe('/t/team/settings?x=1#m');
		for (const bad of [
			null,
			'',
			'https://evil.example/',
			'//evil.example/x',
			'/\\evil.example',
			'javascript:alert(1)'
		])
			expect(safeNext(bad)).toBe('/');
	});
});

describe('configuration', () => {
	it('serves the outbox only while catching mail, and not in production unless forced', () => {
		expect(readConfig({}).devTools).toBe(true); // `npm start` / `npm run dev`
		expect(readConfig({ NODE_ENV: 'test', STATEWRIGHT_DEV_TOOLS: '1' }).devTools).toBe(true);
		expect(readConfig({ NODE_ENV: 'production' }).devTools).toBe(false);
		expect(readConfig({ NODE_ENV: 'production', STATEWRIGHT_DEV_TOOLS: '1' }).devTools).toBe(true);
		expect(readConfig({ SMTP_URL: 'smtp://mail.example.com:587' }).devTools).toBe(false);
		expect(readConfig({ STATEWRIGHT_DEV_TOOLS: '0' }).devTools).toBe(false);
	});

	it('reads defaults and refuses bad values with a message', () => {
		const c = readConfig({});
		expect([c.port, c.host, c.databasePath, c.seedDemo]).toEqual([
			3000,
			'0.0.0.0',
			'data/statewright.db',
			true
		]);
		expect(readConfig({ SEED_DEMO: '0' }).seedDemo).toBe(false);
		expect(() => readConfig({ PORT: 'eighty' })).toThrow(/PORT/);
		expect(() => readConfig({ SMTP_URL: 'mail.example.com' })).toThrow(/SMTP_URL must look like/);
	});
});
