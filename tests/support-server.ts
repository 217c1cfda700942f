// Starts and kills a private copy of the built app for the fault tests: its own port, database
// and upload folder, so SIGKILL never touches the server the other tests use.
import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { applyEnvDefaults, serverArgs } from '../scripts/env';

export interface Instance {
	base: string;
	proc: ChildProcess;
	log: () => string;
}

export async function startInstance(opts: {
	port: number;
	databaseUrl: string;
	uploadDir: string;
	env?: Record<string, string>;
}): Promise<Instance> {
	const base = `http://127.0.0.1:${opts.port}`;
	// A server left over on this port would answer the health check below in place of ours.
	if (
		await fetch(`${base}/healthz`).then(
			() => true,
			() => false
		)
	) {
		throw new Error(`Something already answers on port ${opts.port}; stop it first.`);
	}
	let output = '';
	const proc = spawn(process.execPath, serverArgs(), {
		// The defaults `npm start` applies (BODY_SIZE_LIMIT among them), then this server's own.
		env: applyEnvDefaults({
			...process.env,
			PORT: String(opts.port),
			HOST: '127.0.0.1',
			ORIGIN: base,
			DATABASE_URL: opts.databaseUrl,
			UPLOAD_DIR: opts.uploadDir,
			AUTH_SECRET: 'fault-test-secret-0123456789abcdef',
			SMTP_HOST: '',
			KEEP_ALIVE_TIMEOUT: '65',
			...opts.env
		}),
		stdio: ['ignore', 'pipe', 'pipe']
	});
	proc.stdout!.on('data', (d) => (output += d));
	proc.stderr!.on('data', (d) => (output += d));
	for (let i = 0; i < 150; i++) {
		try {
			if ((await fetch(`${base}/healthz`)).ok) return { base, proc, log: () => output };
		} catch {
			/* not listening yet */
		}
		if (proc.exitCode !== null) break;
		await new Promise((r) => setTimeout(r, 100));
	}
	proc.kill('SIGKILL');
	throw new Error(`The server did not start:\n${output}`);
}

export async function kill(instance: Instance) {
	if (instance.proc.exitCode !== null) return;
	const exited = new Promise((r) => instance.proc.once('exit', r));
	instance.proc.kill('SIGKILL');
	await exited;
}

export async function signInCookie(base: string, email: string): Promise<string> {
	const res = await fetch(`${base}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: {
			origin: base,
			'content-type': 'application/x-www-form-urlencoded',
			accept: 'text/html'
		},
		body: new URLSearchParams({
			providerId: 'credentials',
			email,
			password: 'floorset-demo',
			redirectTo: '/'
		})
	});
	const cookie = res.headers
		.getSetCookie()
		.map((c) => c.split(';')[0])
		.find((c) => c.startsWith('authjs.session-token='));
	if (!cookie) throw new Error(`Sign-in failed for ${email}: ${res.status}`);
	return cookie;
}

/**
 * Seeds a private database and upload folder under `dir`, as `npm start` would. The modules keep
 * their settings, database and storage for the process, so all three are reset first: several
 * spec files may do this one after another in the same test worker.
 */
export async function seedPrivate(dir: string) {
	process.env.DATABASE_URL = join(dir, 'floorset.db');
	process.env.UPLOAD_DIR = join(dir, 'uploads');
	process.env.SEED_CACHE_DIR ??= 'data/seed-cache';
	const { resetConfig } = await import('../src/lib/server/config');
	const { closeDb } = await import('../src/lib/server/db');
	const { useStorage } = await import('../src/lib/server/storage');
	resetConfig();
	closeDb();
	useStorage(undefined);
	const { seed } = await import('../scripts/seed');
	await seed();
	closeDb();
	return { databaseUrl: join(dir, 'floorset.db'), uploadDir: join(dir, 'uploads') };
}
