import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		adapter: adapter(),
		// Keep SvelteKit's origin check on: form posts from another origin are refused.
		csrf: { trustedOrigins: [] }
	}
};

export default config;
