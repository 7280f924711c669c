import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		// `npm test` builds into its own folder, so a test run never replaces the bundle `npm start` serves.
		adapter: adapter({ out: process.env.RUNRATE_BUILD_DIR || 'build' }),
		// Keep SvelteKit's origin check on: form posts from another origin are refused.
		csrf: { trustedOrigins: [] }
	}
};

export default config;
