// Starts the built app for the Playwright journeys on a fresh SQLite file under tmp/.
import { rmSync, mkdirSync } from 'node:fs';
import { spawn } from 'node:child_process';

const port = process.env.PORT ?? '4317';
// one directory per port, so a second run on another port (E2E_PORT) never deletes this one's database
const dir = `tmp/e2e-${port}`;
rmSync(dir, { recursive: true, force: true });
mkdirSync(dir, { recursive: true });

const child = spawn(process.execPath, ['build/index.js'], {
	stdio: 'inherit',
	env: {
		...process.env,
		NODE_ENV: 'test',
		PORT: port,
		HOST: '127.0.0.1',
		ORIGIN: `http://127.0.0.1:${port}`,
		DATABASE_PATH: `${dir}/statewright.db`,
		SEED_DEMO: '1',
		STATEWRIGHT_DEV_TOOLS: '1'
	}
});
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => child.kill(sig));
child.on('exit', (code) => process.exit(code ?? 0));
