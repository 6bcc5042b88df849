import { config } from './config';
import { databaseLabel, getDb, migrateAppDatabase } from './database';
import { getMailer } from './mail';
import { backgroundSettled } from './background';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_TEAM, seedDemo } from './demo';
import { getTeamBySlug } from './db/teams';
import { deleteExpiredSessions } from './db/sessions';
import { deleteStaleCounters } from './db/rate-limits';
import { isPostgres } from './db/dialect';
import { shareLimitsThrough } from './rate-limit';

/**
 * Server start: apply migrations, start mail (the local fake SMTP server when SMTP_URL is unset),
 * seed the demo team on an empty database, and print where to go and how to sign in.
 * Called from `init` in hooks.server.ts, before the first request is served.
 */
export async function startApp(options: { dev?: boolean } = {}): Promise<void> {
	const c = config();
	const applied = await migrateAppDatabase();
	const db = getDb();
	const mailer = await getMailer();
	const seed = c.seedDemo ? await seedDemo(db) : { seeded: false };

	// several app processes on one PostgreSQL count their rate limits together
	if (isPostgres(db)) shareLimitsThrough(db);

	const timer = setInterval(() => {
		void deleteExpiredSessions(db).catch(() => {});
		void deleteStaleCounters(db, Date.now() - 24 * 3600_000).catch(() => {});
	}, 3600_000);
	timer.unref();
	// adapter-node emits this after it stopped taking requests (SIGINT/SIGTERM)
	process.once('sveltekit:shutdown', () => {
		clearInterval(timer);
		// mail queued after an answer (reset links, sign-up notices) goes out before the catcher stops
		void backgroundSettled()
			.then(() => mailer.close())
			.finally(() => db.destroy());
	});

	const shownHost = c.host === '0.0.0.0' || c.host === '::' ? 'localhost' : c.host;
	// under `vite dev` the address is Vite's, printed above
	const url = options.dev ? '' : (c.origin ?? `http://${shownHost}:${c.port}`);
	const lines = [
		'',
		'  Statewright',
		url ? `  ${url}` : '  (development server)',
		`  database  ${databaseLabel()}${applied.length ? `  (applied ${applied.length} migration${applied.length > 1 ? 's' : ''})` : ''}`,
		mailer.catching
			? `  mail      caught by the local SMTP server on 127.0.0.1:${mailer.port} and printed here, each message with its links${c.devTools ? `; signed-in people read their own at ${url}/dev/outbox` : ' (SMTP_URL unset: mail is not delivered)'}`
			: '  mail      sent through SMTP_URL'
	];
	if (seed.seeded || (await getTeamBySlug(db, DEMO_TEAM.slug))) {
		const note = seed.seeded ? 'seeded' : 'present';
		lines.push(
			'',
			`  Demo team "${DEMO_TEAM.name}" ${note}. Password ${DEMO_PASSWORD}${seed.seeded ? '' : ' (unless changed)'} for:`
		);
		for (const p of DEMO_PEOPLE) lines.push(`    ${p.role.padEnd(9)} ${p.email}`);
	}
	console.log(lines.join('\n') + '\n');
	if (c.production && mailer.catching) {
		console.warn(
			'  Warning: NODE_ENV=production without SMTP_URL — invitations and reset links are not delivered.\n'
		);
	}
}
