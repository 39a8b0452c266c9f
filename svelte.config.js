import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		adapter: adapter({ out: 'build' }),
		// Kit adds hashes for its own inline scripts; styles stay inline-capable because the
		// route map positions nodes with style attributes.
		csp: {
			mode: 'auto',
			directives: {
				'default-src': ['self'],
				'script-src': ['self'],
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
		// Kit's origin check also refused Bearer-token API scripts (no Origin header); the same
		// check, for cookie sessions only, is src/lib/server/hooks/form-origin.ts.
		csrf: { trustedOrigins: ['*'] },
		alias: { $rules: 'rules' }
	}
};

export default config;
