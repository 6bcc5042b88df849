import { request as httpRequest } from 'node:http';
import Database from 'better-sqlite3';
import {
	expect,
	request as playwrightRequest,
	type APIRequestContext,
	type Browser,
	type Cookie,
	type Page,
	type Request
} from '@playwright/test';

/*
 * Each Playwright worker has a server of its own (playwright.config.ts): worker n, its
 * TEST_PARALLEL_INDEX, talks to the built app on E2E_PORT + n with its own fresh database and the
 * demo team seeded on it (scripts/e2e-server.mjs sets SEED_DEMO=1).
 */
const E2E_PORT = Number(process.env.E2E_PORT ?? 4317);
/** This worker's index (0 in a run with one worker). */
export const WORKER = Number(process.env.TEST_PARALLEL_INDEX ?? 0);
if (WORKER >= Number(process.env.E2E_WORKERS ?? 1))
	throw new Error(
		`worker ${WORKER} has no server: set the number of workers with E2E_WORKERS, not --workers`
	);
export const PORT = E2E_PORT + WORKER;
export const BASE = `http://127.0.0.1:${PORT}`;
/** This worker's database file, as scripts/e2e-server.mjs lays it out. */
export const DB_PATH = `tmp/e2e-${PORT}/statewright.db`;

/**
 * A port for a server a spec starts itself (a crash test, a differently configured copy): `offset`
 * names the kind, and each worker gets its own so two workers never collide.
 */
export function ownPort(offset: number): number {
	return E2E_PORT + offset + WORKER;
}

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
export async function signedInRequest(
	email: string,
	password = DEMO_PASSWORD
): Promise<APIRequestContext> {
	const ctx = await playwrightRequest.newContext({ baseURL: BASE });
	const res = await ctx.post('/signin', {
		form: { email, password, next: '/' },
		headers: FORM,
		maxRedirects: 0
	});
	expect(res.status(), `sign in as ${email}`).toBe(303);
	return ctx;
}

/**
 * Creates an account through the sign-up form and confirms it with the link mailed to it (which
 * signs it in); returns a request context signed in as it.
 */
export async function signedUpRequest(
	name: string,
	email: string,
	password = 'a long e2e password'
): Promise<APIRequestContext> {
	const ctx = await playwrightRequest.newContext({ baseURL: BASE });
	const after = await lastMailId(email);
	const res = await ctx.post('/signup', {
		form: { name, email, password, next: '/' },
		headers: FORM,
		maxRedirects: 0
	});
	expect(res.status(), `sign up ${email}`).toBe(200);
	expect(await res.text()).toContain('Check your mail');
	const mail = await waitForMail(email, 'Confirm your e-mail address', after);
	const confirmed = await ctx.get(linkIn(mail, `${BASE}/verify?token=`));
	expect(confirmed.status(), `confirm ${email}`).toBe(200);
	expect((await ctx.get('/account', { maxRedirects: 0 })).status(), `signed in as ${email}`).toBe(
		200
	);
	return ctx;
}

/** Signs up through the sign-up page in `page`, follows the confirmation link and lands on the home page, signed in. */
export async function signUpPage(
	page: Page,
	name: string,
	email: string,
	password = 'a long enough password'
): Promise<void> {
	const after = await lastMailId(email);
	await page.goto('/signup');
	await page.getByLabel('Name').fill(name);
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password').fill(password);
	await page.getByRole('button', { name: 'Create account' }).click();
	await expect(page.getByText('Check your mail')).toBeVisible();
	const mail = await waitForMail(email, 'Confirm your e-mail address', after);
	await page.goto(linkIn(mail, `${BASE}/verify?token=`));
	await expect(page.getByText('Address confirmed')).toBeVisible();
	await page.goto('/');
	await expect(page.getByRole('heading', { name: 'Your teams' })).toBeVisible();
}

export interface Mail {
	id: number;
	to: string[];
	subject: string;
	text: string;
}

/*
 * Caught mail is read the way whoever runs the server reads it, not through any route a client of
 * the server could use: straight from this worker's e2e server's SQLite file (DB_PATH), read-only. /dev/outbox shows each person only their own mail.
 */
let caught: Database.Database | undefined;
function caughtMail(): Database.Database {
	caught ??= new Database(DB_PATH, {
		readonly: true,
		fileMustExist: true
	});
	return caught;
}

/** Every caught mail to `to` (exact address), newest first. */
export function mailTo(to: string): Mail[] {
	const rows = caughtMail()
		.prepare(
			`select id, envelope_to, subject, text from outbox
			 where exists (select 1 from json_each(outbox.envelope_to) where json_each.value = ?) order by id desc`
		)
		.all(to.trim().toLowerCase()) as Array<{
		id: number;
		envelope_to: string;
		subject: string;
		text: string;
	}>;
	return rows.map((r) => ({
		id: r.id,
		to: JSON.parse(r.envelope_to) as string[],
		subject: r.subject,
		text: r.text
	}));
}

/** The id of the newest caught mail to `to` (0 when none): pass it as `after` to wait for the next one. */
export async function lastMailId(to: string): Promise<number> {
	return mailTo(to)[0]?.id ?? 0;
}

/**
 * Waits for a mail to `to` (optionally with a subject containing `subject`, and newer than the mail
 * id `after`) among the mail the e2e server's local SMTP catcher caught.
 */
export async function waitForMail(to: string, subject?: string, after = 0): Promise<Mail> {
	let found: Mail | undefined;
	await expect
		.poll(
			async () => {
				found = mailTo(to).find((m) => m.id > after && (!subject || m.subject.includes(subject)));
				return found !== undefined;
			},
			{ message: `mail to ${to}${subject ? ` about "${subject}"` : ''}`, timeout: 20_000 }
		)
		.toBe(true);
	return found!;
}

/**
 * A plain form post over HTTP from a chosen local source address (127.0.0.0/8 all reaches the
 * server on 127.0.0.1), so a test can be a second client address: the server sees `from` as the
 * client's address. Returns the status, headers and body, and the time until the full answer.
 */
export function postFrom(
	from: string,
	path: string,
	form: Record<string, string>
): Promise<{
	status: number;
	headers: Record<string, string | string[] | undefined>;
	body: string;
	ms: number;
}> {
	const body = new URLSearchParams(form).toString();
	return new Promise((resolve, reject) => {
		const start = performance.now();
		const req = httpRequest(
			`${BASE}${path}`,
			{
				method: 'POST',
				localAddress: from,
				headers: {
					...FORM,
					'content-type': 'application/x-www-form-urlencoded',
					'content-length': Buffer.byteLength(body)
				}
			},
			(res) => {
				const chunks: Buffer[] = [];
				res.on('data', (c: Buffer) => chunks.push(c));
				res.on('end', () =>
					resolve({
						status: res.statusCode ?? 0,
						headers: res.headers,
						body: Buffer.concat(chunks).toString('utf8'),
						ms: performance.now() - start
					})
				);
				res.on('error', reject);
			}
		);
		req.on('error', reject);
		req.end(body);
	});
}

/** The first link in a mail that starts with `prefix` (e.g. `${BASE}/reset?token=`). */
export function linkIn(mail: Mail, prefix: string): string {
	const link = mail.text.match(/https?:\/\/\S+/g)?.find((u) => u.startsWith(prefix));
	if (!link)
		throw new Error(`no link starting with ${prefix} in mail "${mail.subject}":\n${mail.text}`);
	return link;
}

/*
 * The seeded demo people sign in through the form once per worker; later journeys that only need
 * one of them signed in reuse that session's cookie, and fall back to the form when the session is
 * gone (a test signed it out or changed the password). Anyone else, and every test about signing in
 * itself, goes through the form each time.
 */
const demoSessions = new Map<string, Cookie[]>();
const isDemo = (email: string, password: string) =>
	password === DEMO_PASSWORD && (Object.values(DEMO) as string[]).includes(email);

async function signInThroughForm(page: Page, email: string, password: string): Promise<void> {
	await page.goto('/signin');
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password').fill(password);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByRole('heading', { name: 'Your teams' })).toBeVisible();
	if (isDemo(email, password))
		demoSessions.set(
			email,
			(await page.context().cookies(BASE)).filter((c) => c.name.endsWith('statewright_session'))
		);
}

/** Signs `page` in as `email` and leaves it on the home page ("Your teams"). */
export async function signInPage(
	page: Page,
	email: string,
	password = DEMO_PASSWORD
): Promise<void> {
	const saved = isDemo(email, password) ? demoSessions.get(email) : undefined;
	if (saved?.length) {
		await page.context().addCookies(saved);
		await page.goto('/');
		// the home page is rendered on the server: signed in, it shows the heading at once
		if (await page.getByRole('heading', { name: 'Your teams' }).isVisible()) return;
		demoSessions.delete(email);
		await page.context().clearCookies();
	}
	await signInThroughForm(page, email, password);
}

/** The id of a member row in team settings (the hidden id of its role form). */
export async function memberId(
	ctx: APIRequestContext,
	team: string,
	email: string
): Promise<string> {
	const html = await (await ctx.get(`/t/${team}/settings`)).text();
	const row = html.split('<tr').find((r) => r.includes(`data-member="${email}"`));
	const id = row?.match(/name="id" value="([a-z2-9]{16})"/)?.[1];
	if (!id) throw new Error(`no member ${email} in ${team}`);
	return id;
}

/** Creates an API token through team settings and returns the secret shown once. */
export async function createToken(
	ctx: APIRequestContext,
	team: string,
	name: string,
	role: string
): Promise<string> {
	const res = await ctx.post(`/t/${team}/settings?/createToken`, {
		form: { name, role },
		headers: FORM
	});
	expect(res.status(), `create ${role} token`).toBe(200);
	const token = (await res.text()).match(/swt_[A-Za-z0-9_-]{43}/)?.[0];
	if (!token) throw new Error('no token in the page');
	return token;
}

/** A new browser context (downloads on, a desktop window) signed in as `email`; page errors are logged. */
export async function signedInPage(
	browser: Browser,
	email: string,
	password = DEMO_PASSWORD
): Promise<Page> {
	const ctx = await browser.newContext({
		acceptDownloads: true,
		viewport: { width: 1400, height: 900 }
	});
	const page = await ctx.newPage();
	page.on('pageerror', (e) => console.log(`[${email}] page error: ${e.message}`));
	await signInPage(page, email, password);
	return page;
}

/**
 * The id of the seeded K-101 sheet (the one with an approved revision). Other journeys in the same
 * worker start sheets from the K-101 example — with the same title when started from the worked
 * example's button — so neither a search's first hit nor the title alone picks it: the seeded sheet
 * is the approved one of that title created first.
 */
export async function seededK101Id(ctx: APIRequestContext): Promise<string> {
	const seededTitle = 'K-101 kettle jacket: condensing steam, then the trap';
	const r = await ctx.get(`/api/v1/teams/${TEAM}/sheets?q=K-101&limit=200`);
	expect(r.status()).toBe(200);
	const { sheets } = (await r.json()) as {
		sheets: Array<{ id: string; title: string; status: string; createdAt: number }>;
	};
	const hit = sheets
		.filter((s) => s.title === seededTitle && s.status === 'approved')
		.sort((a, b) => a.createdAt - b.createdAt);
	expect(hit.length, 'the seeded, approved K-101 sheet').toBeGreaterThan(0);
	return hit[0].id;
}

/**
 * The next draft save's answer (call before the gesture that ends in a save, await after it). The
 * save status alone cannot tell: it already says "saved" before a drag, since nothing is saved until
 * the gesture ends, so waiting on it can return before the released state's save has started.
 */
export function nextDraftSave(page: Page): Promise<unknown> {
	return page.waitForResponse(
		(r) => r.request().method() === 'PUT' && /\/sheets\/[^/]+\/draft$/.test(r.url()) && r.ok(),
		{ timeout: 30_000 }
	);
}

/**
 * Goes to `url` and returns once the page has had no request in flight for `quietMs`, its fonts
 * are loaded and two frames have been drawn: the page as a reader sees it once its data has come.
 * (Playwright's 'networkidle' is the same idea with a fixed 500 ms of quiet.)
 */
export async function gotoQuiet(page: Page, url: string, quietMs = 150): Promise<void> {
	const inFlight = new Set<Request>();
	let last = Date.now();
	const started = (r: Request) => {
		inFlight.add(r);
		last = Date.now();
	};
	const ended = (r: Request) => {
		inFlight.delete(r);
		last = Date.now();
	};
	page.on('request', started);
	page.on('requestfinished', ended);
	page.on('requestfailed', ended);
	try {
		await page.goto(url);
		await expect
			.poll(() => inFlight.size === 0 && Date.now() - last >= quietMs, {
				message: `no request in flight for ${quietMs} ms after loading ${url}`,
				intervals: [25],
				timeout: 30_000
			})
			.toBe(true);
	} finally {
		page.off('request', started);
		page.off('requestfinished', ended);
		page.off('requestfailed', ended);
	}
	await page.evaluate(() => document.fonts.ready.then(() => undefined));
	await twoFrames(page);
}

/**
 * Returns once the page has drawn two more frames (what a click or a load changed is laid out), or
 * after a second without a frame: headless Chromium now and then stops ticking animation frames for
 * a page (a CI run once waited 90 s here for a frame that never came). The fallback forces a layout,
 * so a caller that measures next still measures the page as it stands; every caller asserts on what
 * it reads afterwards, so a late layout still fails there rather than here.
 */
export async function twoFrames(page: Page): Promise<void> {
	await page.evaluate(
		() =>
			new Promise<void>((resolve) => {
				const done = () => {
					clearTimeout(timer);
					void document.documentElement.offsetHeight;
					resolve();
				};
				const timer = setTimeout(done, 1000);
				requestAnimationFrame(() => requestAnimationFrame(done));
			})
	);
}
