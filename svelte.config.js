import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		adapter: adapter({ out: 'build' }),
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
