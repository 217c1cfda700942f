import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	server: { host: '127.0.0.1' },
	test: {
		include: ['src/**/*.test.ts', 'seeds/**/*.test.ts', 'scripts/**/*.test.ts'],
		environment: 'node',
		testTimeout: 30_000,
		pool: 'forks'
	}
});
