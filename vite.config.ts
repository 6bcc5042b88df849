import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { availableParallelism } from 'node:os';
import { defineConfig } from 'vitest/config';

// The integration tests (real database, real mail catcher) run on SQLite and, when
// TEST_POSTGRES_URL names a PostgreSQL server, once more on PostgreSQL (project "postgres").
const INTEGRATION = ['src/lib/server/*.test.ts', 'src/lib/server/db/*.test.ts'];
const postgresUrl = process.env.TEST_POSTGRES_URL?.trim();
if (process.env.VITEST && !postgresUrl)
	console.log(
		'[statewright] TEST_POSTGRES_URL is not set: integration tests run on SQLite only, PostgreSQL skipped.'
	);

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	server: { port: 5173 },
	// chunks under 20 kB are merged into the chunks that import them (where that runs no code
	// earlier than before): a page's scripts came in up to 50 files, 33 of them under 5 kB, and
	// each file costs the browser a request (a sheet page's load: 57 → 40 requests, about 13 % less
	// browser CPU; docs/performance.md)
	build: { rollupOptions: { output: { experimentalMinChunkSize: 20_000 } } },
	test: {
		environment: 'node',
		testTimeout: 30_000,
		hookTimeout: 30_000,
		pool: 'forks',
		// one fork per core: vitest's own default leaves one core idle (on 2 cores, one fork)
		maxWorkers: availableParallelism(),
		// test files share a fork's module graph instead of importing it again each (import time was
		// most of the run: 137 → 63 s). The rule that makes this safe: a file restores whatever global
		// state it changes (process.env, fake timers, spies) in its after-hooks, and each integration
		// test opens its own database (setupIntegration). The suite passes in shuffled file orders too
		// (--sequence.shuffle.files).
		isolate: false,
		projects: [
			// (include lists per project: a project that extends the root adds to the root's lists)
			{
				extends: true,
				test: { name: 'sqlite', include: ['src/**/*.test.ts', 'bench/**/*.test.ts'] }
			},
			...(postgresUrl
				? [
						{
							extends: true as const,
							test: {
								name: 'postgres',
								include: INTEGRATION,
								env: { STATEWRIGHT_TEST_DB: 'postgres', TEST_POSTGRES_URL: postgresUrl },
								globalSetup: ['scripts/vitest-postgres.ts']
							}
						}
					]
				: [])
		]
	}
});
