// Settings read from the environment, once. Plain process.env (not $env) so that the
// start, seed and benchmark scripts share this module with the app.
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { z } from 'zod';

const schema = z.object({
	PORT: z.coerce.number().int().min(1).max(65535).default(3000),
	HOST: z.string().default('127.0.0.1'),
	ORIGIN: z.string().optional(),
	DATABASE_URL: z.string().default('data/floorset.db'),
	UPLOAD_DIR: z.string().default('data/uploads'),
	AUTH_SECRET: z.string().optional(),
	SMTP_HOST: z.string().optional(),
	SMTP_PORT: z.coerce.number().int().default(587),
	SMTP_USER: z.string().optional(),
	SMTP_PASS: z.string().optional(),
	SMTP_SECURE: z
		.enum(['true', 'false'])
		.default('false')
		.transform((v) => v === 'true'),
	MAIL_FROM: z.string().default('Floorset <floorset@floorset.test>'),
	MAX_UPLOAD_MB: z.coerce.number().positive().default(200),
	/** How long a signed play link in an exported playlist works: a night and its set-up. */
	PLAY_LINK_HOURS: z.coerce.number().positive().max(8760).default(24)
});

export type Config = z.infer<typeof schema> & { origin: string };

let cached: Config | undefined;
let secret: string | undefined;

export function config(): Config {
	if (cached) return cached;
	const parsed = schema.parse(process.env);
	cached = { ...parsed, origin: parsed.ORIGIN ?? `http://${parsed.HOST}:${parsed.PORT}` };
	return cached;
}

/** For tests that point the app at a fresh database. */
export function resetConfig() {
	cached = undefined;
	secret = undefined;
}

/**
 * AUTH_SECRET from the environment, or one generated on first use and kept beside the
 * database so sessions survive a restart.
 */
export function authSecret(): string {
	secret ??= readOrCreateSecret();
	return secret;
}

function readOrCreateSecret(): string {
	const fromEnv = config().AUTH_SECRET;
	if (fromEnv) return fromEnv;
	const file = resolve(dirname(config().DATABASE_URL), '.auth-secret');
	if (existsSync(file)) return readFileSync(file, 'utf8').trim();
	mkdirSync(dirname(file), { recursive: true });
	const created = randomBytes(32).toString('base64url');
	writeFileSync(file, created, { mode: 0o600 });
	return created;
}
