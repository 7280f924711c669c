import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import ts from 'typescript-eslint';
import svelteConfig from './svelte.config.js';

/** Modules of the calculation core that code outside it may not import: it uses `$lib/calc`. */
const CORE_MODULES = [
	'$lib/calc/*',
	'!$lib/calc/*.fixture',
	'**/lib/calc/*',
	'!**/lib/calc/*.fixture',
	'!**/lib/calc/index'
];
const CORE_MESSAGE = 'Import the calculation core from $lib/calc (its index), not its modules.';

export default ts.config(
	js.configs.recommended,
	...ts.configs.recommended,
	...svelte.configs.recommended,
	prettier,
	...svelte.configs.prettier,
	{
		languageOptions: { globals: { ...globals.browser, ...globals.node } },
		rules: {
			'no-undef': 'off',
			// Runrate is served at the root (no kit.paths.base), so plain hrefs are the resolved paths.
			'svelte/no-navigation-without-resolve': 'off',
			'@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }]
		}
	},
	{
		files: ['**/*.svelte', '**/*.svelte.ts', '**/*.svelte.js'],
		languageOptions: {
			parserOptions: {
				projectService: true,
				extraFileExtensions: ['.svelte'],
				parser: ts.parser,
				svelteConfig
			}
		}
	},
	// Fences (issue 16). The calculation core is pure and runs anywhere; only server code reaches the
	// server; everything outside the core enters it through `$lib/calc` (its index), so the core may
	// rearrange its modules freely. Test support (`*.fixture.ts`) is the one named exception.
	{
		files: ['src/lib/calc/**/*.ts'],
		rules: {
			'no-restricted-imports': [
				'error',
				{
					patterns: [
						{
							group: ['$app', '$app/*', '@sveltejs/kit', '@sveltejs/kit/*', 'svelte', 'svelte/*', '$env/*'],
							message: 'The calculation core runs anywhere: no SvelteKit, Svelte or environment imports.'
						},
						{
							group: ['drizzle-orm', 'drizzle-orm/*', 'postgres'],
							message: 'The calculation core never touches the database.'
						},
						{
							group: ['$lib', '$lib/*', '../*'],
							message: 'The calculation core imports only its own modules (./name) and plain libraries.'
						}
					]
				}
			]
		}
	},
	{
		files: ['src/**/*.ts', 'src/**/*.svelte'],
		ignores: ['src/lib/calc/**', 'src/lib/server/**', 'src/**/*.server.ts', 'src/**/+server.ts'],
		rules: {
			'no-restricted-imports': [
				'error',
				{
					patterns: [
						{ group: CORE_MODULES, message: CORE_MESSAGE },
						{
							group: ['$lib/server', '$lib/server/*', '**/lib/server/*', '**/server/*'],
							message: 'Only server code (src/lib/server, *.server.ts, +server.ts) imports $lib/server.'
						}
					]
				}
			]
		}
	},
	{
		files: [
			'src/lib/server/**/*.ts',
			'src/**/*.server.ts',
			'src/**/+server.ts',
			'tests/**/*.ts',
			'scripts/**/*.ts'
		],
		rules: {
			'no-restricted-imports': ['error', { patterns: [{ group: CORE_MODULES, message: CORE_MESSAGE }] }]
		}
	},
	{
		ignores: [
			'build/',
			'.test-build/',
			'.svelte-kit/',
			'.data/',
			'node_modules/',
			'drizzle/',
			'test-results/',
			'playwright-report/'
		]
	}
);
