// The end-to-end tests use Debian's Chromium. Installs it when missing and we are root;
// otherwise stops with the exact command to run. Never downloads a browser of its own.
import { execSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const CHROMIUM = '/usr/bin/chromium';
const COMMAND = 'apt-get update && apt-get install -y chromium';

if (!existsSync(CHROMIUM)) {
	if (process.getuid?.() === 0) {
		console.log(`Chromium is missing; installing it: ${COMMAND}`);
		execSync(COMMAND, {
			stdio: 'inherit',
			env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' }
		});
	} else {
		console.error(
			`Chromium is missing. Install it, then run the tests again:\n  sudo sh -c '${COMMAND}'`
		);
		process.exit(1);
	}
}
