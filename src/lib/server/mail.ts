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
 * receives is parsed and stored in the `outbox` table, where /dev/outbox and the tests read it.
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

/** Starts the local fake SMTP server that stores what it receives in `db`'s outbox. */
export async function startFakeSmtp(db: DB): Promise<{ port: number; close(): Promise<void> }> {
	const server = new SMTPServer({
		secure: false,
		authOptional: true,
		disabledCommands: ['STARTTLS', 'AUTH'],
		banner: 'Statewright local mail catcher',
		size: 10 * 1024 * 1024,
		logger: false,
		onData(stream, session, callback) {
			const chunks: Buffer[] = [];
			stream.on('data', (c: Buffer) => chunks.push(c));
			stream.on('error', callback);
			stream.on('end', () => {
				const raw = Buffer.concat(chunks);
				simpleParser(raw)
					.then((parsed) =>
						insertOutboxMessage(db, {
							message_id: parsed.messageId ?? null,
							envelope_from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
							envelope_to: JSON.stringify(session.envelope.rcptTo.map((r) => r.address.toLowerCase())),
							from_header: addressesText(parsed.from),
							to_header: addressesText(parsed.to),
							subject: parsed.subject ?? '',
							text: parsed.text ?? '',
							html: typeof parsed.html === 'string' ? parsed.html : null,
							raw: raw.toString('utf8'),
							received_at: Date.now()
						})
					)
					// answer 250 only once the message is stored, so a sent mail is readable at once
					.then(() => callback(), (e: unknown) => callback(e instanceof Error ? e : new Error(String(e))));
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

export async function createMailer(options: { db: DB; smtpUrl?: string; from: string }): Promise<Mailer> {
	let transport: Transporter;
	let fake: Awaited<ReturnType<typeof startFakeSmtp>> | undefined;
	if (options.smtpUrl) {
		transport = nodemailer.createTransport(options.smtpUrl);
	} else {
		fake = await startFakeSmtp(options.db);
		transport = nodemailer.createTransport({ host: '127.0.0.1', port: fake.port, secure: false, ignoreTLS: true });
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
		const { getDb } = await import('./db');
		const c = config();
		return createMailer({ db: getDb(), smtpUrl: c.smtpUrl, from: c.mailFrom });
	});
	return appMailer;
}
