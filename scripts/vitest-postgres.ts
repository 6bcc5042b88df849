// Global setup of the vitest project that runs the integration tests on PostgreSQL
// (vite.config.ts): checks that TEST_POSTGRES_URL answers, and drops the test schemas left by
// earlier runs before and this run's after. Each test database is a schema of its own.
import pg from 'pg';

const PREFIX = 'sw_test_';

async function dropTestSchemas(client: pg.Client): Promise<void> {
	const { rows } = await client.query<{ nspname: string }>(
		`select nspname from pg_namespace where nspname like '${PREFIX}%'`
	);
	for (const { nspname } of rows) await client.query(`drop schema if exists "${nspname}" cascade`);
}

async function withClient(run: (c: pg.Client) => Promise<void>): Promise<void> {
	const client = new pg.Client({ connectionString: process.env.TEST_POSTGRES_URL });
	try {
		await client.connect();
	} catch (e) {
		throw new Error(
			`TEST_POSTGRES_URL is set but PostgreSQL does not answer there (${(e as Error).message}). ` +
				'Start it (pg_ctlcluster 15 main start) or unset TEST_POSTGRES_URL to run on SQLite only.',
			{ cause: e }
		);
	}
	try {
		await run(client);
	} finally {
		await client.end();
	}
}

export async function setup(): Promise<() => Promise<void>> {
	await withClient(async (c) => {
		const { rows } = await c.query<{ v: string }>("select current_setting('server_version') as v");
		console.log(`[statewright] integration tests also run on PostgreSQL ${rows[0].v}`);
		await dropTestSchemas(c);
	});
	return () => withClient(dropTestSchemas);
}
