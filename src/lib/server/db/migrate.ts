import { Migrator, sql, type Kysely, type Migration, type MigrationResult } from 'kysely';
import { isPostgres } from './dialect';

export type MigrationModules = Record<string, Migration>;

/**
 * Applies every pending migration in name order. `modules` maps a migration's name (its file
 * name without extension) to its module; the app builds it with import.meta.glob and the
 * `npm run migrate` script with dynamic imports, so both run the same files.
 */
export async function migrateToLatest(
	db: Kysely<any>, // eslint-disable-line @typescript-eslint/no-explicit-any
	modules: MigrationModules
): Promise<MigrationResult[]> {
	const migrator = await migratorFor(db, modules);
	const { error, results } = await migrator.migrateToLatest();
	if (error) {
		const failed = results?.find((r) => r.status === 'Error')?.migrationName ?? 'unknown';
		throw new Error(
			`Migration ${failed} failed: ${error instanceof Error ? error.message : String(error)}`,
			{
				cause: error
			}
		);
	}
	return results ?? [];
}

/**
 * A Migrator whose bookkeeping tables live where the data does: on PostgreSQL in the connection's
 * current schema (Kysely would otherwise take a kysely_migration table in any schema for ours).
 */
export async function migratorFor(
	db: Kysely<any>, // eslint-disable-line @typescript-eslint/no-explicit-any
	modules: MigrationModules
): Promise<Migrator> {
	const migrationTableSchema = isPostgres(db)
		? (await sql<{ s: string }>`select current_schema() as s`.execute(db)).rows[0]?.s
		: undefined;
	return new Migrator({
		db,
		provider: { getMigrations: async () => modules },
		...(migrationTableSchema ? { migrationTableSchema } : {})
	});
}

/** Turns a path like `/migrations/20251201T223000Z_create_accounts.ts` into its migration name. */
export function migrationName(path: string): string {
	return path.replace(/^.*\//, '').replace(/\.[cm]?[jt]s$/, '');
}
