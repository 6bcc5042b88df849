import nodemailer, { type Transporter } from 'nodemailer';
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import type { AddressInfo } from 'node:net';
import type { DB } from './db/schema';
import { insertOutboxMessage } from './db/outbox';

/**
 * Outgoing mail. With SMTP_URL set, nodemailer sends through that server. Without it
 * (development, the demo, tests) a real SMTP server from `smtp-server` listens on 127.0.0.1 on a
 * free port, nodemailer delivers to it over TCP like to any other server, and every message it
 * receives is parsed and stored in the `outbox` table. Whoever runs the server reads it on the
 * console: the catcher prints each message's recipients, subject and links. /dev/outbox shows a
 * signed-in person only the mail addressed to their own address.
 */

export interface MailMessage {
	to: string;
	subject: string;
	text: string;
	html?: string;
}

export interface Mailer {
	send(message: MailMessage): Promise<{ messageId: string }>;
	close(): Promise<void>;
	/** true when mail goes to the local fake SMTP server and lands in the outbox */
	readonly catching: boolean;
	/** the fake server's port, when catching */
	readonly port: number | undefined;
}

function addressesText(a: AddressObject | AddressObject[] | undefined): string {
	if (!a) return '';
	return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
}

/** Where the catcher prints what it caught: the server's console unless told otherwise. */
export type CaughtPrinter = (text: string) => void;

const LINK = /https?:\/\/[^\s<>"]+/g;

/** The console lines for one caught message: recipients, subject and every link in its text. */
export function caughtSummary(m: { envelopeTo: string[]; subject: string; text: string }): string {
	// a full stop or comma after a link ends the sentence, not the link
	const links = [...new Set((m.text.match(LINK) ?? []).map((l) => l.replace(/[.,;:!?)\]]+$/, '')))];
	return [
		`[statewright] mail caught for ${m.envelopeTo.join(', ')}: ${m.subject}`,
		...links.map((l) => `  link: ${l}`)
	].join('\n');
}

/**
 * Starts the local fake SMTP server that stores what it receives in `db`'s outbox and prints
 * each message with `print`.
 */
export async function startFakeSmtp(
	db: DB,
	print: CaughtPrinter = (t) => console.log(t)
): Promise<{ port: number; close(): Promise<void> }> {
	const server = new SMTPServer({
		secure: false,
		authOptional: true,
		disabledCommands: ['STARTTLS', 'AUTH'],
		banner: 'Statewright local mail catcher',
		size: 10 * 1024 * 1024,
		logger: false,
		// no reverse DNS look-up of the client: it is always this machine
		disableReverseLookup: true,
		onData(stream, session, callback) {
			const chunks: Buffer[] = [];
			stream.on('data', (c: Buffer) => chunks.push(c));
			stream.on('error', callback);
			stream.on('end', () => {
				const raw = Buffer.concat(chunks);
				const envelopeTo = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
				simpleParser(raw)
					.then(async (parsed) => {
						await insertOutboxMessage(db, {
							message_id: parsed.messageId ?? null,
							envelope_from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
							envelope_to: JSON.stringify(envelopeTo),
							from_header: addressesText(parsed.from),
							to_header: addressesText(parsed.to),
							subject: parsed.subject ?? '',
							text: parsed.text ?? '',
							html: typeof parsed.html === 'string' ? parsed.html : null,
							raw: raw.toString('utf8'),
							received_at: Date.now()
						});
						print(
							caughtSummary({ envelopeTo, subject: parsed.subject ?? '', text: parsed.text ?? '' })
						);
					})
					// answer 250 only once the message is stored, so a sent mail is readable at once
					.then(
						() => callback(),
						(e: unknown) => callback(e instanceof Error ? e : new Error(String(e)))
					);
			});
		}
	});
	await new Promise<void>((resolve, reject) => {
		server.once('error', reject);
		server.listen(0, '127.0.0.1', () => resolve());
	});
	// the catcher alone must not keep a stopping server process alive
	server.server.unref();
	const port = (server.server.address() as AddressInfo).port;
	return { port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

export async function createMailer(options: {
	db: DB;
	smtpUrl?: string;
	from: string;
	print?: CaughtPrinter;
}): Promise<Mailer> {
	let transport: Transporter;
	let fake: Awaited<ReturnType<typeof startFakeSmtp>> | undefined;
	if (options.smtpUrl) {
		transport = nodemailer.createTransport(options.smtpUrl);
	} else {
		fake = await startFakeSmtp(options.db, options.print);
		transport = nodemailer.createTransport({
			host: '127.0.0.1',
			port: fake.port,
			secure: false,
			ignoreTLS: true,
			// one connection kept open for many messages: smtp-server waits 100 ms before its
			// greeting on every new connection (it listens for clients that talk too early)
			pool: true,
			maxConnections: 2
		});
	}
	return {
		catching: fake !== undefined,
		port: fake?.port,
		async send(message) {
			const info = await transport.sendMail({ from: options.from, ...message });
			return { messageId: String(info.messageId) };
		},
		async close() {
			transport.close();
			await fake?.close();
		}
	};
}

let appMailer: Promise<Mailer> | undefined;

/** The app's mailer, started on first use (the server starts it in `init`). */
export function getMailer(): Promise<Mailer> {
	appMailer ??= import('./config').then(async ({ config }) => {
		const { getDb } = await import('./database');
		const c = config();
		return createMailer({ db: getDb(), smtpUrl: c.smtpUrl, from: c.mailFrom });
	});
	return appMailer;
}
