// `npm run bench:plan-load`: the public evening page while ten long evenings are being planned
// at once. Planning runs in worker threads (plan-pool.ts); before it did, ten plans held the public
// page for about 10 s. Starts the built app on a private demo database, creates ten 12-hour
// evenings, asks for all ten plans together and, until they are done, reads the published
// evening's page one request after another. Prints the page's median, p99 and longest latency and
// how long the plans took. Target: p99 under 200 ms. Needs `npm run build` first.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { closeDb } from '../src/lib/server/db';
import { kill, seedPrivate, signInCookie, startInstance } from '../tests/support-server';

const PORT = Number(process.env.BENCH_PORT ?? 4310);
const PLANS = 10;
const dir = mkdtempSync(join(tmpdir(), 'floorset-plan-load-'));
const opts = await seedPrivate(dir);
closeDb();
const server = await startInstance({ port: PORT, ...opts });
const base = server.base;
try {
	const cookie = await signInCookie(base, 'organiser@floorset.test');
	const headers = { cookie, origin: base, 'content-type': 'application/json' };
	const { shareUrl } = await (
		await fetch(`${base}/api/evenings/1/publish`, { method: 'POST', headers })
	).json();
	const ids: number[] = [];
	for (let i = 0; i < PLANS; i++) {
		const start = Date.UTC(2027, 0, 8 + i, 12);
		const res = await fetch(`${base}/api/evenings`, {
			method: 'POST',
			headers,
			body: JSON.stringify({
				title: `Invented long night ${i + 1}`,
				startsAt: new Date(start).toISOString(),
				endsAt: new Date(start + 12 * 3600_000).toISOString(),
				// Four three-hour open floors: the whole night is the planner's to fill.
				sections: [0, 1, 2, 3].map((k) => ({
					kind: 'open-floor',
					startsAt: new Date(start + k * 3 * 3600_000).toISOString(),
					endsAt: new Date(start + (k + 1) * 3 * 3600_000).toISOString()
				}))
			})
		});
		if (res.status !== 201)
			throw new Error(`evening not created: ${res.status} ${await res.text()}`);
		ids.push((await res.json()).id);
	}
	// One read before the plans start, so the page's first rendering is not counted.
	await (await fetch(shareUrl)).arrayBuffer();
	const latencies: number[] = [];
	let done = false;
	const t0 = performance.now();
	const plans = Promise.all(
		ids.map(async (id) => {
			const res = await fetch(`${base}/api/evenings/${id}/plan`, {
				method: 'POST',
				headers,
				body: '{}'
			});
			if (res.status !== 200) throw new Error(`plan ${id}: ${res.status} ${await res.text()}`);
			return (await res.json()).entries.length as number;
		})
	).finally(() => (done = true));
	while (!done) {
		const s = performance.now();
		const page = await fetch(shareUrl);
		await page.arrayBuffer();
		if (page.status !== 200) throw new Error(`public page: ${page.status}`);
		latencies.push(performance.now() - s);
	}
	const entries = await plans;
	const planS = (performance.now() - t0) / 1000;
	latencies.sort((a, b) => a - b);
	const at = (q: number) =>
		latencies[Math.min(latencies.length - 1, Math.ceil(q * latencies.length) - 1)];
	console.log(
		`${PLANS} plans of 12-hour evenings at once: done in ${planS.toFixed(1)} s (${entries.join(', ')} entries)`
	);
	console.log(
		`public page meanwhile: ${latencies.length} requests, median ${at(0.5).toFixed(1)} ms, p99 ${at(0.99).toFixed(1)} ms, longest ${latencies.at(-1)!.toFixed(1)} ms (target p99 < 200 ms)`
	);
} finally {
	await kill(server);
	rmSync(dir, { recursive: true, force: true });
}
