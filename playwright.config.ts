import { existsSync } from 'node:fs';
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

// Debian's Chromium: never a browser downloaded by Playwright (see DEVELOPERS.md). Its headless shell
// (package chromium-headless-shell, the same build without the desktop browser around it) when the
// machine has it: a journey costs about a third less CPU than in the full browser's headless mode.
const HEADLESS_SHELL = '/usr/bin/chromium-headless-shell';
const CHROMIUM =
	process.env.CHROMIUM_PATH ?? (existsSync(HEADLESS_SHELL) ? HEADLESS_SHELL : '/usr/bin/chromium');
const chromiumArgs = [
	'--no-sandbox',
	'--disable-gpu',
	'--disable-background-networking',
	'--disable-component-update',
	'--disable-sync',
	'--no-first-run',
	'--renderer-process-limit=2',
	'--disable-site-isolation-trials'
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
		// off unless asked for: recording a trace (screencast and DOM snapshots) for every test took
		// about half of the journeys' CPU time; E2E_TRACE=1 keeps one for each failing test
		trace: process.env.E2E_TRACE ? 'retain-on-failure' : 'off',
		launchOptions: {
			executablePath: CHROMIUM,
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
