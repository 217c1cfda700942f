// The server `npm run bench:turns` measures: plain node:http, 0.3 ms of synchronous work per
// request (about what a kept Floorset answer costs), with or without FairTurns in front;
// FAIR_TURNS_MS sets its target turn length (Floorset's hooks use 5).
import { createServer } from 'node:http';
import { FairTurns } from '../../src/lib/server/fair-turns';

const turns =
	process.env.FAIR_TURNS === 'on'
		? new FairTurns({ targetMs: Number(process.env.FAIR_TURNS_MS ?? 5) })
		: null;
const body = JSON.stringify({ ok: true });

function work(ms: number) {
	const until = performance.now() + ms;
	while (performance.now() < until);
}

const server = createServer(async (_req, res) => {
	const wait = turns?.enter();
	if (wait) await wait;
	work(0.3);
	res.setHeader('content-type', 'application/json');
	res.end(body);
});
server.listen(Number(process.env.PORT), '127.0.0.1', () => console.log('ready'));
