import type { Migration } from 'kysely';
import { migrationName, type MigrationModules } from './migrate';

// Bundled into the server build so `node build` needs no migrations directory at run time.
const files = import.meta.glob<Migration>('/migrations/*.ts', { eager: true });

export const migrations: MigrationModules = Object.fromEntries(
	Object.entries(files).map(([path, mod]) => [migrationName(path), mod])
);
