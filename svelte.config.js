import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';
import { buildComputeWorker } from './scripts/compute-worker.js';

const OUT = 'build';

/**
 * adapter-node, then the compute pool's worker bundle beside the server (build/compute-worker.js):
 * the engine work of the compute routes runs on worker threads (src/lib/server/compute/pool.ts),
 * and a worker needs a file of its own to start from. It holds only the engine, so one esbuild
 * step bundles it (scripts/compute-worker.js).
 */
function withComputeWorker(base) {
	return {
		...base,
		async adapt(builder) {
			await base.adapt(builder);
			await buildComputeWorker(`${OUT}/compute-worker.js`);
			builder.log.minor(`Wrote ${OUT}/compute-worker.js`);
		}
	};
}

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		adapter: withComputeWorker(adapter({ out: OUT })),
		// `npm test` builds the app for the journeys while svelte-check reads .svelte-kit: the build
		// gets a working directory of its own (SVELTEKIT_OUT_DIR) so neither sees the other's files.
		// That build says tsconfig.json should extend .svelte-kit-build/tsconfig.json: it need not,
		// the build reads no type information
		outDir: process.env.SVELTEKIT_OUT_DIR || '.svelte-kit',
		// cross-site form posts are refused by our own hook (src/lib/server/csrf.ts), which lets
		// token-carrying API scripts through and answers the API in its JSON error shape
		csrf: { trustedOrigins: ['*'] },
		// nonces for the inline theme script and SvelteKit's own start-up script
		csp: {
			mode: 'auto',
			directives: {
				'default-src': ['self'],
				'script-src': ['self'],
				// Svelte transitions and D3 set style attributes
				'style-src': ['self', 'unsafe-inline'],
				'img-src': ['self', 'data:', 'blob:'],
				'font-src': ['self', 'data:'],
				'connect-src': ['self'],
				'object-src': ['none'],
				'base-uri': ['self'],
				'form-action': ['self'],
				'frame-ancestors': ['none']
			}
		},
		typescript: {
			config(tsconfig) {
				tsconfig.include.push('../migrations/**/*.ts', '../scripts/**/*.ts');
			}
		}
	}
};

export default config;
