import { availableParallelism } from 'node:os';
import { defineConfig, devices } from '@playwright/test';

const PORT = Number(process.env.E2E_PORT ?? 4317);

/*
 * Journeys run in parallel workers, each against its own copy of the built app on its own fresh
 * database: worker n (TEST_PARALLEL_INDEX, 0-based) talks to the server on E2E_PORT + n. Files are
 * spread over the workers; the tests of one file run in order in one worker, as before. The count
 * comes from E2E_WORKERS (default: one per core, at most 4); pass it there rather than with
 * --workers, since one server is started per worker.
 */
const WORKERS = Math.max(
	1,
	Math.min(8, Number(process.env.E2E_WORKERS) || Math.min(4, availableParallelism()))
);
// worker processes inherit it: tests/helpers.ts refuses a worker that has no server of its own
process.env.E2E_WORKERS = String(WORKERS);
const WORKER = Number(process.env.TEST_PARALLEL_INDEX ?? 0);

// Debian's Chromium: never a browser downloaded by Playwright (see DEVELOPERS.md).
const chromiumArgs = [
	'--no-sandbox',
	'--disable-gpu',
	'--disable-background-networking',
	'--disable-component-update',
	'--disable-sync',
	'--no-first-run'
];

export default defineConfig({
	testDir: 'tests',
	testMatch: '**/*.spec.ts',
	fullyParallel: false,
	workers: WORKERS,
	retries: 0,
	// generous: the machine is shared by parallel builds, and a test's time on it grows with the
	// load (a passing run takes a fraction of this); a passing run never waits for a timeout
	timeout: 90_000,
	expect: { timeout: 20_000 },
	reporter: [['list']],
	use: {
		// evaluated again in each worker process, where TEST_PARALLEL_INDEX names the worker
		baseURL: `http://127.0.0.1:${PORT + WORKER}`,
		trace: 'retain-on-failure',
		launchOptions: {
			executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
			args: chromiumArgs
		}
	},
	projects: [
		{
			name: 'chromium',
			use: { ...devices['Desktop Chrome'], viewport: { width: 1280, height: 800 } }
		}
	],
	// the built app (vite build runs before playwright in `npm test`), one per worker, each on a fresh database
	webServer: Array.from({ length: WORKERS }, (_, n) => ({
		command: 'node scripts/e2e-server.mjs',
		url: `http://127.0.0.1:${PORT + n}/healthz`,
		reuseExistingServer: false,
		timeout: 60_000,
		stdout: 'pipe' as const,
		stderr: 'pipe' as const,
		env: { PORT: String(PORT + n) }
	}))
});
