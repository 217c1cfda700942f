// `npm run dev`: the Vite development server on the same database and demo as `npm start`.
import { spawn } from 'node:child_process';
import { applyEnvDefaults } from './env';

applyEnvDefaults();
const { seed } = await import('./seed');
await seed();
const { db } = await import('../src/lib/server/db');
db().$client.close();

const dev = spawn(
	'npx',
	['vite', 'dev', '--host', process.env.HOST!, '--port', process.env.PORT!],
	{
		stdio: 'inherit',
		env: process.env
	}
);
dev.on('exit', (code) => process.exit(code ?? 0));
