import { expect, request as playwrightRequest, type APIRequestContext, type Page } from '@playwright/test';

// The demo team seeded on the fresh e2e database (scripts/e2e-server.mjs sets SEED_DEMO=1).
export const BASE = `http://127.0.0.1:${process.env.E2E_PORT ?? 4317}`;
export const DEMO_PASSWORD = 'statewright-demo';
export const TEAM = 'brindlemoor';
export const DEMO = {
	owner: 'maren.okafor@brindlemoor.example',
	designer: 'tobias.lindqvist@brindlemoor.example',
	checker: 'priya.ramanathan@brindlemoor.example',
	viewer: 'ezra.calloway@brindlemoor.example'
} as const;

/** A unique address for a person a test creates. */
export function freshEmail(label: string): string {
	return `${label}.${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}@e2e.example`;
}

/**
 * Headers of a browser's plain form post: the Origin (SvelteKit refuses cross-site form posts) and
 * an HTML Accept (without it SvelteKit answers form actions in its JSON protocol for use:enhance).
 */
export const FORM = { origin: BASE, accept: 'text/html' };

/** A request context signed in as `email` through the real sign-in form. */
export async function signedInRequest(email: string, password = DEMO_PASSWORD): Promise<APIRequestContext> {
	const ctx = await playwrightRequest.newContext({ baseURL: BASE });
	const res = await ctx.post('/signin', { form: { email, password, next: '/' }, headers: FORM, maxRedirects: 0 });
	expect(res.status(), `sign in as ${email}`).toBe(303);
	return ctx;
}

/** Creates an account through the sign-up form; returns a request context signed in as it. */
export async function signedUpRequest(name: string, email: string, password = 'a long e2e password'): Promise<APIRequestContext> {
	const ctx = await playwrightRequest.newContext({ baseURL: BASE });
	const res = await ctx.post('/signup', { form: { name, email, password, next: '/' }, headers: FORM, maxRedirects: 0 });
	expect(res.status(), `sign up ${email}`).toBe(303);
	return ctx;
}

let outboxReader: APIRequestContext | undefined;

export interface Mail {
	id: number;
	to: string[];
	subject: string;
	text: string;
}

/**
 * Waits for a mail to `to` (optionally with a subject containing `subject`) in the fake SMTP
 * server's outbox, read through /dev/outbox.json as the demo owner.
 */
export async function waitForMail(to: string, subject?: string, after = 0): Promise<Mail> {
	outboxReader ??= await signedInRequest(DEMO.owner);
	let found: Mail | undefined;
	await expect
		.poll(
			async () => {
				const res = await outboxReader!.get(`/dev/outbox.json?to=${encodeURIComponent(to)}`);
				expect(res.status()).toBe(200);
				const { messages } = (await res.json()) as { messages: Mail[] };
				found = messages.find((m) => m.id > after && (!subject || m.subject.includes(subject)));
				return found !== undefined;
			},
			{ message: `mail to ${to}${subject ? ` about "${subject}"` : ''}`, timeout: 20_000 }
		)
		.toBe(true);
	return found!;
}

/** The first link in a mail that starts with `prefix` (e.g. `${BASE}/reset?token=`). */
export function linkIn(mail: Mail, prefix: string): string {
	const link = mail.text.match(/https?:\/\/\S+/g)?.find((u) => u.startsWith(prefix));
	if (!link) throw new Error(`no link starting with ${prefix} in mail "${mail.subject}":\n${mail.text}`);
	return link;
}

export async function signInPage(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
	await page.goto('/signin');
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password').fill(password);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByRole('heading', { name: 'Your teams' })).toBeVisible();
}

/** The id of a member row in team settings (the hidden id of its role form). */
export async function memberId(ctx: APIRequestContext, team: string, email: string): Promise<string> {
	const html = await (await ctx.get(`/t/${team}/settings`)).text();
	const row = html.split('<tr').find((r) => r.includes(`data-member="${email}"`));
	const id = row?.match(/name="id" value="([a-z2-9]{16})"/)?.[1];
	if (!id) throw new Error(`no member ${email} in ${team}`);
	return id;
}

/** Creates an API token through team settings and returns the secret shown once. */
export async function createToken(ctx: APIRequestContext, team: string, name: string, role: string): Promise<string> {
	const res = await ctx.post(`/t/${team}/settings?/createToken`, { form: { name, role }, headers: FORM });
	expect(res.status(), `create ${role} token`).toBe(200);
	const token = (await res.text()).match(/swt_[A-Za-z0-9_-]{43}/)?.[0];
	if (!token) throw new Error('no token in the page');
	return token;
}
