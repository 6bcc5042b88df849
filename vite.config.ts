import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	server: { port: 5173 },
	test: {
		include: ['src/**/*.test.ts', 'bench/**/*.test.ts'],
		environment: 'node',
		testTimeout: 30_000,
		hookTimeout: 30_000,
		pool: 'forks'
	}
});
