import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
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
