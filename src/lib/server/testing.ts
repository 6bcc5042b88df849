import { expect } from 'vitest';
import type { Kysely } from 'kysely';
import { AppError } from './errors';
import { createTestDb, disposeTestDb } from './db';
import type { Database } from './db/schema';
import { createMailer, type Mailer } from './mail';
import type { FlowContext } from './auth';
import { listOutboxMessages } from './db/outbox';
import { mailLimits, signInLimits, inviteLimits } from './rate-limit';
import { backgroundSettled } from './background';

/**
 * For integration tests: a fresh migrated database (in-memory SQLite, or a schema of its own on
 * TEST_POSTGRES_URL in the PostgreSQL test project) and a real local fake SMTP server storing
 * into it. Not used by the app.
 */
export async function setupIntegration(origin = 'http://statewright.test'): Promise<{
	db: Kysely<Database>;
	mailer: Mailer;
	ctx: FlowContext;
	/** the mail caught for an address, once the mail sent after earlier answers has gone out */
	mailTo(address: string): Promise<Array<{ subject: string; text: string }>>;
	/** what the catcher printed on the console, one entry per caught message */
	printed: string[];
	close(): Promise<void>;
}> {
	const db = await createTestDb();
	const printed: string[] = [];
	const mailer = await createMailer({
		db,
		from: 'Statewright <no-reply@statewright.test>',
		print: (t) => printed.push(t)
	});
	for (const l of [
		mailLimits.perAddress,
		mailLimits.perIp,
		signInLimits.perAccountAndIp,
		signInLimits.perIp,
		inviteLimits
	])
		await l.reset();
	return {
		db,
		mailer,
		ctx: { origin, send: (m) => mailer.send(m), ip: '192.0.2.10' },
		async mailTo(address) {
			await backgroundSettled();
			return listOutboxMessages(db, { to: address });
		},
		printed,
		async close() {
			await backgroundSettled();
			await mailer.close();
			await disposeTestDb(db);
		}
	};
}

/** Awaits a promise that must reject with an AppError of this status (and code); returns the error. */
export async function expectAppError(
	p: Promise<unknown>,
	status: number,
	code?: string
): Promise<AppError> {
	const e = await p.then(
		() => null,
		(err: unknown) => err
	);
	expect(e).toBeInstanceOf(AppError);
	expect((e as AppError).status).toBe(status);
	if (code) expect((e as AppError).code).toBe(code);
	return e as AppError;
}

/** The first link in a mail's text that starts with `prefix`. */
export function linkIn(text: string, prefix: string): string {
	const m = text.match(/https?:\/\/\S+/g)?.find((u) => u.startsWith(prefix));
	if (!m) throw new Error(`no link starting with ${prefix} in:\n${text}`);
	return m;
}
