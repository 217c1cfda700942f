// `npm run bench:turns`: why Floorset's hooks start requests in turns (src/lib/server/fair-turns.ts).
// A plain node:http server doing 0.3 ms of work per request is driven by autocannon with 200
// connections opened at once, first as Node serves it, then with FairTurns in front. Node 20's
// libuv accepts one connection per turn of the event loop, so without turns the connections
// accepted last wait seconds for their first answer: watch the p99.9 and max columns.
// BENCH_SECONDS (default 15) sets each run's length; BENCH_CONNECTIONS (default 200) the crowd.
import autocannon from 'autocannon';
import { spawn } from 'node:child_process';
import { once } from 'node:events';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 15);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 200);
const PORT = Number(process.env.BENCH_PORT ?? 4310);

async function run(fairTurns: 'off' | 'on') {
	const server = spawn(process.execPath, ['--import', 'tsx', 'scripts/bench/turns-server.ts'], {
		env: { ...process.env, PORT: String(PORT), FAIR_TURNS: fairTurns },
		stdio: ['ignore', 'pipe', 'inherit']
	});
	try {
		await once(server.stdout, 'data');
		const result = await autocannon({
			url: `http://127.0.0.1:${PORT}/`,
			connections: CONNECTIONS,
			duration: SECONDS
		});
		return { fairTurns, result };
	} finally {
		server.kill('SIGKILL');
		await once(server, 'exit');
	}
}

const rows = [await run('off'), await run('on')];
console.log(
	`\nA connection storm: ${CONNECTIONS} connections, ${SECONDS} s, 0.3 ms of work per request\n`
);
console.log('fair turns', '   req/s', '  p50 ms', '  p99 ms', 'p99.9 ms', '  max ms', ' timeouts');
for (const { fairTurns, result } of rows) {
	const l = result.latency;
	console.log(
		fairTurns.padEnd(10),
		String(Math.round(result.requests.average)).padStart(8),
		[l.p50, l.p99, l.p99_9, l.max].map((v) => String(Math.round(v)).padStart(8)).join(' '),
		String(result.timeouts).padStart(9)
	);
}
