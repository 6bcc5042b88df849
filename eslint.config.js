import { readdirSync } from 'node:fs';
import prettier from 'eslint-config-prettier';
import js from '@eslint/js';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import ts from 'typescript-eslint';
import svelteConfig from './svelte.config.js';

/*
 * Import layering (docs/architecture.md). One `no-restricted-imports` setting per file group,
 * built here because a later setting of a rule replaces an earlier one for the same file.
 * - the engine (src/lib/thermo) imports nothing of the app, Svelte, SvelteKit or Node, and only
 *   relatively;
 * - src/lib/server/db imports only db modules (and kysely, Node);
 * - nothing outside src/lib/server imports it (components, the editor, shared modules);
 * - between top-level modules of src/lib: `$lib/<module>/…`; within one: relative paths.
 */
const LIB = 'src/lib';
const modules = readdirSync(LIB, { withFileTypes: true })
	.filter((d) => d.isDirectory())
	.map((d) => d.name);
const up = (n) => '\\.\\./'.repeat(n);
const escapes = (depth) => ({
	regex: `^${up(depth)}(?!.*tests/reference/)`,
	message: 'Another module of src/lib: import it as $lib/<module>/…, not by a relative path.'
});
const own = (m) => ({
	regex: `^\\$lib/${m}(/|$)`,
	message: `Inside src/lib/${m}, import its own files by relative paths.`
});
const noServer = {
	regex: '^\\$lib/server(/|$)',
	message:
		'Server code (secrets, database, mail) is not for this module; pass data in from a +page.server.ts or an API route.'
};
const engine = [
	{
		regex: '^(\\$lib|\\$app|\\$env)(/|$)',
		message: 'The engine imports nothing of the app; keep it pure TypeScript (relative imports).'
	},
	{ regex: '^(svelte|@sveltejs/)', message: 'The engine runs without Svelte.' },
	{ regex: '^node:', message: 'The engine runs in the browser too: no Node modules.' }
];
const dbOnly = [
	{
		regex: '^\\$lib/(?!roles$|slug$)',
		message: 'src/lib/server/db holds queries only: import db modules (relative), kysely or node:*.'
	},
	{
		regex: '^\\.\\./',
		message: 'src/lib/server/db imports only db modules; a service belongs in src/lib/server.'
	}
];
const layering = [];
for (const m of modules)
	for (const depth of [1, 2, 3]) {
		const glob = `${LIB}/${m}/${'*/'.repeat(depth - 1)}*.{ts,svelte}`;
		const patterns = [escapes(depth), own(m)];
		if (m === 'thermo') patterns.push(...engine);
		if (m !== 'server') patterns.push(noServer);
		if (m === 'server' && depth === 2) {
			layering.push({
				files: [`${LIB}/server/db/*.ts`],
				rules: { 'no-restricted-imports': ['error', { patterns: [...patterns, ...dbOnly] }] }
			});
			layering.push({
				files: [glob],
				ignores: [`${LIB}/server/db/*.ts`],
				rules: { 'no-restricted-imports': ['error', { patterns }] }
			});
			continue;
		}
		layering.push({ files: [glob], rules: { 'no-restricted-imports': ['error', { patterns }] } });
	}
layering.push({
	files: ['src/routes/**/*.svelte'],
	rules: { 'no-restricted-imports': ['error', { patterns: [noServer] }] }
});

export default ts.config(
	{
		ignores: [
			'build/',
			'.svelte-kit/',
			'.svelte-kit-build/',
			'data/',
			'tmp/',
			'test-results/',
			'playwright-report/',
			'node_modules/'
		]
	},
	js.configs.recommended,
	...ts.configs.recommended,
	...svelte.configs.recommended,
	prettier,
	...svelte.configs.prettier,
	{
		languageOptions: { globals: { ...globals.browser, ...globals.node } },
		rules: { 'no-undef': 'off' }
	},
	{
		// without projectService: no rule here needs TypeScript's type information, and building the
		// program for it doubled the lint's time (38 → 18 s)
		files: ['**/*.svelte', '**/*.svelte.ts', '**/*.svelte.js'],
		languageOptions: {
			parserOptions: {
				extraFileExtensions: ['.svelte'],
				parser: ts.parser,
				svelteConfig
			}
		}
	},
	{
		// published coefficients, quadrature nodes and reference values keep the digits their
		// sources print, even beyond what a double holds
		files: [
			'src/lib/thermo/fluids/**',
			'src/lib/thermo/solvers/quadrature.ts',
			'src/lib/thermo/**/*.test.ts'
		],
		rules: { 'no-loss-of-precision': 'off' }
	},
	{
		// a migration sees the database as it was then, not today's schema: Kysely<any> by design
		files: ['migrations/**'],
		rules: { '@typescript-eslint/no-explicit-any': 'off' }
	},
	...layering
);
