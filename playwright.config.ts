import { defineConfig } from '@playwright/test';

// End-to-end tests run the built app (adapter-node) on 127.0.0.1 against a fresh database
// seeded with the demo, in Debian's Chromium — never a downloaded browser.
const PORT = Number(process.env.E2E_PORT ?? 4173);

export default defineConfig({
	testDir: 'tests',
	timeout: 60_000,
	expect: { timeout: 10_000 },
	fullyParallel: false,
	workers: process.env.CI ? 2 : 2,
	retries: 0,
	reporter: [['list']],
	outputDir: 'test-results/artifacts',
	use: {
		baseURL: `http://127.0.0.1:${PORT}`,
		trace: 'retain-on-failure',
		launchOptions: {
			executablePath: '/usr/bin/chromium',
			args: [
				'--no-sandbox',
				'--disable-gpu',
				'--disable-quic',
				'--no-first-run',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync',
				'--autoplay-policy=no-user-gesture-required'
			]
		}
	},
	webServer: {
		command: 'npx tsx scripts/e2e-server.ts',
		url: `http://127.0.0.1:${PORT}/healthz`,
		timeout: 240_000,
		reuseExistingServer: false,
		stdout: 'pipe',
		stderr: 'pipe',
		env: { E2E_PORT: String(PORT), FLOORSET_BUILD_DIR: process.env.FLOORSET_BUILD_DIR ?? 'build' }
	}
});
