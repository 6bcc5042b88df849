// Bundles the compute pool's worker (src/lib/server/compute/worker.ts: the engine and nothing else)
// into one file that a worker thread can start from. Used by svelte.config.js after adapter-node
// writes build/, and by the pool's tests.
import { build } from 'esbuild';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));

/**
 * Write the worker bundle (ES module, Node 20) to `outfile`.
 * @param {string} outfile
 */
export async function buildComputeWorker(outfile) {
	await build({
		absWorkingDir: root,
		entryPoints: ['src/lib/server/compute/worker.ts'],
		outfile,
		bundle: true,
		platform: 'node',
		format: 'esm',
		target: 'node20',
		sourcemap: true,
		alias: { $lib: `${root}src/lib` },
		logLevel: 'warning'
	});
}
