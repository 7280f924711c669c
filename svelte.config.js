import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		// `npm test` builds into its own folder, so a test run never replaces the bundle `npm start` serves.
		adapter: adapter({ out: process.env.RUNRATE_BUILD_DIR || 'build' }),
		// Keep SvelteKit's origin check on: form posts from another origin are refused.
		csrf: { trustedOrigins: [] },
		// SvelteKit adds a nonce (or a hash, on prerendered pages) to its own inline script, so no
		// script runs without one. Styles allow inline because components set style attributes.
		csp: {
			mode: 'auto',
			directives: {
				'default-src': ['self'],
				'script-src': ['self'],
				'style-src': ['self', 'unsafe-inline'],
				'img-src': ['self', 'data:', 'blob:'],
				'font-src': ['self'],
				'connect-src': ['self'],
				'object-src': ['none'],
				'base-uri': ['self'],
				'form-action': ['self'],
				'frame-ancestors': ['none']
			}
		}
	}
};

export default config;
