// The server the end-to-end tests talk to: the built app on a fresh database seeded with the
// demo (the seed's audio cache is shared with `npm start`, so only the first run encodes).
import { spawn } from 'node:child_process';
import { rmSync } from 'node:fs';
import { applyEnvDefaults, serverArgs } from './env';

process.env.PORT = process.env.E2E_PORT ?? '4173';
const dir = `test-results/e2e-data-${process.env.PORT}`;
rmSync(dir, { recursive: true, force: true });
process.env.HOST = '127.0.0.1';
process.env.DATABASE_URL = `${dir}/floorset.db`;
process.env.UPLOAD_DIR = `${dir}/uploads`;
process.env.AUTH_SECRET = 'e2e-only-secret-not-for-production-0123456789';
process.env.MAX_UPLOAD_MB ??= '5';
// Test clients keep idle connections longer than Node's 5 s default: a request sent just as the
// server closed its socket failed with ECONNRESET now and then. Keep idle sockets for 65 s.
process.env.KEEP_ALIVE_TIMEOUT ??= '65';
delete process.env.SMTP_HOST;
applyEnvDefaults();

const { seed } = await import('./seed');
await seed();
const { db } = await import('../src/lib/server/db');
db().$client.close();

const server = spawn(process.execPath, serverArgs(), { stdio: 'inherit', env: process.env });
for (const signal of ['SIGINT', 'SIGTERM'] as const) process.on(signal, () => server.kill(signal));
server.on('exit', (code) => process.exit(code ?? 0));
