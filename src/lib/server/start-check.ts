// adapter-node reads HOST and BODY_SIZE_LIMIT itself, with defaults made for other apps: every
// network address, and request bodies of at most 512 KB. `npm start` sets Floorset's own
// (scripts/env.ts); a server started another way (`node build`, a service file) must set them too,
// or uploads over 512 KB fail with a misleading message. This says what is wrong, before serving.

/** adapter-node's BODY_SIZE_LIMIT syntax: bytes, or a number with K, M or G; Infinity for none. */
export function parseBodyLimit(text: string): number | null {
	if (text.trim() === 'Infinity') return Infinity;
	const m = /^\s*(\d+)\s*([KMG]?)\s*$/i.exec(text);
	if (!m) return null;
	const unit = { '': 1, K: 1024, M: 1024 ** 2, G: 1024 ** 3 }[m[2].toUpperCase() as '' | 'K'];
	return Number(m[1]) * unit;
}

export function startProblems(env: NodeJS.ProcessEnv): { fatal: string[]; warnings: string[] } {
	const fatal: string[] = [];
	const warnings: string[] = [];
	const maxUploadBytes = Number(env.MAX_UPLOAD_MB ?? 200) * 1024 * 1024;
	const limit = env.BODY_SIZE_LIMIT === undefined ? null : parseBodyLimit(env.BODY_SIZE_LIMIT);
	if (limit === null || limit < maxUploadBytes) {
		fatal.push(
			`BODY_SIZE_LIMIT is ${env.BODY_SIZE_LIMIT ?? 'unset (512K)'}, below MAX_UPLOAD_MB ` +
				`(${env.MAX_UPLOAD_MB ?? 200} MB): uploads would fail. Start Floorset with \`npm start\`, ` +
				`or set BODY_SIZE_LIMIT to at least ${maxUploadBytes + 1024 * 1024} (README, "Settings").`
		);
	}
	if (env.HOST === undefined) {
		warnings.push(
			'HOST is unset, so the server listens on every network address; `npm start` listens on 127.0.0.1.'
		);
	}
	return { fatal, warnings };
}
