// Builds the analysis harness page (scripts/analyse/harness) for headless Chromium.
import { defineConfig } from 'vite';

export default defineConfig({
	root: new URL('./harness', import.meta.url).pathname,
	logLevel: 'warn',
	build: { target: 'es2022', emptyOutDir: true, sourcemap: false }
});
