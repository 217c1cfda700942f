// `npm start`: builds if there is no current build, applies migrations, seeds the demo on an
// empty database, then serves the app with adapter-node.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { applyEnvDefaults, serverArgs } from './env';

applyEnvDefaults();

function newestMtime(dir: string): number {
	let newest = 0;
	for (const entry of readdirSync(dir, { withFileTypes: true })) {
		const path = join(dir, entry.name);
		newest = Math.max(newest, entry.isDirectory() ? newestMtime(path) : statSync(path).mtimeMs);
	}
	return newest;
}

const built = 'build/index.js';
const stale =
	!existsSync(built) ||
	statSync(built).mtimeMs < Math.max(newestMtime('src'), newestMtime('static'));
if (stale) {
	console.log('Building Floorset…');
	const result = spawnSync('npx', ['vite', 'build'], { stdio: 'inherit' });
	if (result.status !== 0) process.exit(result.status ?? 1);
}

// Migrate and seed in this process, then hand the database to the server.
const { seed } = await import('./seed');
await seed();
const { db } = await import('../src/lib/server/db');
db().$client.close();

console.log(`Floorset is serving on ${process.env.ORIGIN}`);
console.log(
	'Demo accounts: admin@, organiser@, dj@, instructor@, dancer@floorset.test — password floorset-demo'
);
const server = spawn(process.execPath, serverArgs('build'), {
	stdio: 'inherit',
	env: process.env
});
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
	process.on(signal, () => server.kill(signal));
}
server.on('exit', (code) => process.exit(code ?? 0));
