import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	compilerOptions: {
		runes: true
	},
	kit: {
		// Separate output folders (FLOORSET_KIT_DIR, FLOORSET_BUILD_DIR) let parallel builds coexist.
		outDir: process.env.FLOORSET_KIT_DIR ?? '.svelte-kit',
		adapter: adapter({ out: process.env.FLOORSET_BUILD_DIR ?? 'build' }),
		typescript: {
			// The seed and the scripts are type-checked and linted like the app.
			config: (tsconfig) => {
				tsconfig.include.push('../seeds/**/*.ts', '../scripts/**/*.ts', '../*.config.ts');
			}
		},
		csp: {
			// Hashes, not nonces: a public page rendered once may be served many times
			// (src/lib/server/cache/public-pages.ts), and a nonce must never be reused.
			mode: 'hash',
			directives: {
				'default-src': ['self'],
				'script-src': ['self'],
				'style-src': ['self', 'unsafe-inline'],
				'img-src': ['self', 'data:', 'blob:'],
				'media-src': ['self', 'blob:'],
				'font-src': ['self'],
				'connect-src': ['self'],
				'worker-src': ['self', 'blob:'],
				'object-src': ['none'],
				'frame-ancestors': ['none'],
				'base-uri': ['self'],
				'form-action': ['self']
			}
		}
	}
};

export default config;
