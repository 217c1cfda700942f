// Runs an in-process benchmark under the same Node flags as the app's server (SERVER_NODE_FLAGS),
// so its figures are the server's: `tsx scripts/bench/as-server.ts scripts/bench-fit.ts`.
import { spawnSync } from 'node:child_process';
import { SERVER_NODE_FLAGS } from '../env';

const [script, ...args] = process.argv.slice(2);
if (!script) {
	console.error('usage: tsx scripts/bench/as-server.ts SCRIPT [ARGS…]');
	process.exit(2);
}
console.log(`(node ${SERVER_NODE_FLAGS.join(' ')}, as the server runs)`);
const run = spawnSync(
	process.execPath,
	[...SERVER_NODE_FLAGS, '--import', 'tsx', script, ...args],
	{
		stdio: 'inherit'
	}
);
process.exit(run.status ?? 1);
