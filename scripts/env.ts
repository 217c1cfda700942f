// Defaults for the environment, shared by the start, seed and test scripts (README lists them).
export function applyEnvDefaults(env: NodeJS.ProcessEnv = process.env) {
	env.PORT ??= '3000';
	env.HOST ??= '127.0.0.1';
	env.ORIGIN ??= `http://${env.HOST}:${env.PORT}`;
	env.DATABASE_URL ??= 'data/floorset.db';
	env.UPLOAD_DIR ??= 'data/uploads';
	env.SEED_CACHE_DIR ??= 'data/seed-cache';
	// adapter-node limits request bodies; uploads may be up to MAX_UPLOAD_MB (default 200).
	env.BODY_SIZE_LIMIT ??= String((Number(env.MAX_UPLOAD_MB ?? 200) + 1) * 1024 * 1024);
	return env;
}

/**
 * Node flags for the app's server process, wherever a script starts it (start, e2e, faults, load
 * benchmarks). A ranking of every track builds ~10,000 result objects that live until the answer
 * is sent; with V8's default 16 MB semi-space they outlive a scavenge or two and are copied and
 * promoted, and garbage collection took 59 % of `npm run bench:fit`. A 32 MB semi-space halves the
 * full list's median (32 → 18 ms) and its p95 (55 → 26 ms); 64 MB gained less per megabyte.
 * Measured on this machine, not a general rule: see DEVELOPERS.md for the figures.
 */
export const SERVER_NODE_FLAGS = ['--max-semi-space-size=32'] as const;

/** Node's arguments for running the built server: its flags, then adapter-node's entry. */
export const serverArgs = (buildDir = process.env.FLOORSET_BUILD_DIR ?? 'build') => [
	...SERVER_NODE_FLAGS,
	`${buildDir}/index.js`
];
