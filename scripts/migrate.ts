// Applies pending migrations to DATABASE_URL (PostgreSQL) or else DATABASE_PATH (default
// data/statewright.db): `npm run migrate`.
// `npm run migrate -- --down` reverts the latest one. The server also migrates on start.
import { readdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Migration } from 'kysely';
import { readConfig } from '../src/lib/server/config.ts';
import { isPostgresUrl, openDatabase, openPostgres } from '../src/lib/server/db/connection.ts';
import {
	migrateToLatest,
	migrationName,
	migratorFor,
	type MigrationModules
} from '../src/lib/server/db/migrate.ts';

const dir = resolve(import.meta.dirname, '..', 'migrations');
const modules: MigrationModules = {};
for (const file of readdirSync(dir)
	.filter((f) => f.endsWith('.ts'))
	.sort()) {
	modules[migrationName(file)] = (await import(pathToFileURL(join(dir, file)).href)) as Migration;
}

const { databasePath: path, databaseUrl } = readConfig();
const db = isPostgresUrl(databaseUrl) ? openPostgres(databaseUrl, { max: 1 }) : openDatabase(path);
const databasePath = databaseUrl ? new URL(databaseUrl).pathname.slice(1) || 'PostgreSQL' : path;
try {
	if (process.argv.includes('--down')) {
		const migrator = await migratorFor(db, modules);
		const { error, results } = await migrator.migrateDown();
		if (error) throw error;
		const name = results?.[0]?.migrationName;
		console.log(
			name ? `reverted ${name} in ${databasePath}` : `nothing to revert in ${databasePath}`
		);
	} else {
		const results = await migrateToLatest(db, modules);
		const applied = results.filter((r) => r.status === 'Success').map((r) => r.migrationName);
		console.log(
			applied.length
				? `applied to ${databasePath}:\n  ${applied.join('\n  ')}`
				: `${databasePath} is up to date (${Object.keys(modules).length} migrations)`
		);
	}
} finally {
	await db.destroy();
}
