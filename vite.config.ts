import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

const FREE_OF_SIDE_EFFECTS = /[\\/]node_modules[\\/]date-holidays[\\/]|[\\/]src[\\/]lib[\\/]calc[\\/]/;

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	build: {
		rollupOptions: {
			// Modules the bundler may leave out of a page's JavaScript when the page uses none of their exports.
			// date-holidays (with moment-timezone and astronomia: 1.2 MB, 180 kB gzipped) declares no
			// `sideEffects`, so it stayed in every page that reads a calculation schema, though only the server
			// prices. The calculation core's modules only define functions and schemas (no statement at their
			// top level does anything else), but a page that took one constant from `$lib/calc` got every
			// schema, with zod and Luxon.
			treeshake: { moduleSideEffects: (id: string) => !FREE_OF_SIDE_EFFECTS.test(id) }
		}
	},
	test: {
		expect: { requireAssertions: true },
		projects: [
			{
				extends: './vite.config.ts',
				test: {
					name: 'unit',
					environment: 'node',
					include: ['src/**/*.test.ts'],
					// CI is a busy 2-core machine: worker threads and big fixtures can take seconds to start.
					testTimeout: 20_000,
					env: { TZ: 'UTC' }
				}
			},
			{
				extends: './vite.config.ts',
				test: {
					name: 'integration',
					environment: 'node',
					include: ['tests/integration/**/*.test.ts'],
					// One database for the whole suite: files run one after another.
					fileParallelism: false,
					testTimeout: 20_000,
					env: { TZ: 'UTC' }
				}
			},
			{
				extends: './vite.config.ts',
				test: {
					name: 'processes',
					environment: 'node',
					// Against the production build: scripts/test.mjs runs these after building it.
					include: ['tests/processes/**/*.test.ts'],
					fileParallelism: false,
					testTimeout: 60_000,
					env: { TZ: 'UTC' }
				}
			}
		]
	}
});
