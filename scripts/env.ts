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

/** Node's arguments for running the built server: adapter-node's entry, with no extra flags. */
export const serverArgs = (buildDir = process.env.FLOORSET_BUILD_DIR ?? 'build') => [
	`${buildDir}/index.js`
];
