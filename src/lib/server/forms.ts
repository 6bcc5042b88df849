import { error, fail, type ActionFailure, type RequestEvent } from '@sveltejs/kit';
import { retryAfterSeconds } from './rate-limit';
import { z } from 'zod';
import { isAppError } from './errors';
import { ROLES } from '$lib/roles';
import { controlCharProblem, plainText, withoutControlChars } from '$lib/plain-text';

/*
 * Form actions: validate with zod, answer problems with
 *   fail(status, { message, errors: { field: message }, values: { safe echoes } })
 * which every form component reads from `form`. Passwords are never echoed.
 *
 *   const parsed = parseForm(schema, await request.formData(), ['email']);
 *   if (!parsed.ok) return parsed.failure;
 *   return runAction(parsed.values, async () => { …; return { done: true }; });
 */

export interface FormFailure {
	message: string;
	errors: Record<string, string>;
	values: Record<string, string>;
}

export function formFailure(
	status: number,
	message: string,
	errors: Record<string, string> = {},
	values: Record<string, string> = {}
): ActionFailure<FormFailure> {
	return fail(status, { message, errors, values });
}

/** The posted form; a body that is not a readable form is the client's fault (400), not ours. */
export async function readFormData(request: Request): Promise<FormData> {
	try {
		return await request.formData();
	} catch {
		error(400, {
			code: 'bad-form',
			message:
				'The form could not be read. Send it as application/x-www-form-urlencoded or multipart/form-data.'
		});
	}
}

export type Parsed<T> =
	| { ok: true; data: T; values: Record<string, string> }
	| { ok: false; failure: ActionFailure<FormFailure> };

export function parseForm<S extends z.ZodType>(
	schema: S,
	form: FormData,
	echo: readonly string[] = []
): Parsed<z.infer<S>> {
	const raw: Record<string, unknown> = {};
	for (const key of new Set(form.keys())) raw[key] = form.get(key);
	const values: Record<string, string> = {};
	for (const key of echo) {
		const v = raw[key];
		// echoed into the page again: never with the control characters that may have been refused
		if (typeof v === 'string') values[key] = withoutControlChars(v.slice(0, 500));
	}
	for (const key of Object.keys(raw)) {
		const problem = controlCharProblem(
			key,
			'A form field’s name',
			'line',
			'Name form fields in plain text (letters, digits, "-" and "_").'
		);
		if (problem) return { ok: false, failure: formFailure(400, problem, {}, values) };
	}
	const r = schema.safeParse(raw);
	if (r.success) return { ok: true, data: r.data, values };
	const errors: Record<string, string> = {};
	for (const issue of r.error.issues) {
		const field = String(issue.path[0] ?? '_');
		errors[field] ??= issue.message;
	}
	const messages = Object.values(errors);
	const message =
		messages.length === 1 ? messages[0] : 'Some fields need attention: see the notes beside them.';
	return { ok: false, failure: formFailure(400, message, errors, values) };
}

/**
 * Runs an action body; an AppError becomes a form failure with its status and message (and a
 * Retry-After header for 429 when the event is given).
 */
export async function runAction<T>(
	values: Record<string, string>,
	fn: () => Promise<T>,
	event?: Pick<RequestEvent, 'setHeaders'>
): Promise<T | ActionFailure<FormFailure>> {
	try {
		return await fn();
	} catch (e) {
		if (!isAppError(e)) throw e;
		if (e.retryAfterMs !== undefined && event)
			event.setHeaders({ 'retry-after': retryAfterSeconds({ retryAfterMs: e.retryAfterMs }) });
		return formFailure(e.status, e.message, e.field ? { [e.field]: e.message } : {}, values);
	}
}

// shared field rules (the messages say what to give instead)
// one-line text: control characters refused (plain-text.ts), runs of spaces collapsed
const text = (label: string, field: string) =>
	plainText(field, 'line', `Enter ${label}.`).transform((s) => s.replace(/\s+/g, ' ').trim());

export const fields = {
	email: plainText('The e-mail address', 'line', 'Enter an e-mail address.')
		.trim()
		.min(1, 'Enter an e-mail address.')
		.max(254, 'That e-mail address is too long.')
		.pipe(z.email('Enter an e-mail address like name@example.com.'))
		.transform((s) => s.toLowerCase()),
	personName: text('your name', 'The name').pipe(
		z
			.string()
			.min(1, 'Enter your name as colleagues know it.')
			.max(80, 'Use at most 80 characters for the name.')
	),
	teamName: text('a team name', 'The team name').pipe(
		z
			.string()
			.min(2, 'Use at least 2 characters for the team name.')
			.max(60, 'Use at most 60 characters for the team name.')
	),
	description: plainText('The description', 'lines')
		.optional()
		.transform((s) => (s ?? '').trim())
		.pipe(z.string().max(500, 'Use at most 500 characters for the description.')),
	/** any non-empty password; the strength rules live in auth.passwordProblem */
	password: z
		.string({ error: 'Enter a password.' })
		.min(1, 'Enter a password.')
		.max(256, 'Use at most 256 characters for the password.'),
	role: z.enum(ROLES, { error: `Choose a role: ${ROLES.join(', ')}.` }),
	id: z.string({ error: 'Missing id.' }).regex(/^[a-z2-9]{16}$/, 'That id is not valid.'),
	tokenName: text('a token name', 'The token name').pipe(
		z
			.string()
			.min(1, 'Name the token after the script that will use it.')
			.max(60, 'Use at most 60 characters for the token name.')
	)
};

/** A same-site path to go to after signing in; anything else becomes '/'. */
export function safeNext(next: string | null | undefined): string {
	if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
	try {
		const u = new URL(next, 'http://x');
		return u.origin === 'http://x' ? u.pathname + u.search + u.hash : '/';
	} catch {
		return '/';
	}
}
