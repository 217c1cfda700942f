// `npm run bench:load`: drives the built app on 127.0.0.1 with autocannon — 50 and then 200
// concurrent connections on the music table's API, the dance fits API, the public evening page
// and run-order saves — against a database of 10,000 tracks and 800 dances. Prints requests per
// second, median and 99th-percentile latency, errors, lost saves and the server's peak memory.
// BENCH_SECONDS (default 30) sets each run's length. Needs `npm run build` first.
import autocannon from 'autocannon';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { closeDb } from '../src/lib/server/db';
import { kill, seedPrivate, signInCookie, startInstance } from '../tests/support-server';
import { fillLibrary } from './bench/fill';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 30);
const PORT = Number(process.env.BENCH_PORT ?? 4300);
const dir = mkdtempSync(join(tmpdir(), 'floorset-load-'));

// The same private seeded database and server start the fault tests use.
const opts = await seedPrivate(dir);
const { db } = await import('../src/lib/server/db');
const { evenings, tracks } = await import('../src/lib/server/db/schema');
const first = db().select().from(tracks).get()!;
fillLibrary(db(), {
	tracks: 10_000 - 60,
	dances: 800 - 40,
	storageKey: first.storageKey,
	fileSize: first.fileSize
});
const evening = db().select().from(evenings).get()!;
closeDb();

const server = await startInstance({ port: PORT, ...opts });
const BASE = server.base;
const peakMemoryMb = () => {
	const status = readFileSync(`/proc/${server.proc.pid}/status`, 'utf8');
	return Number(status.match(/VmHWM:\s+(\d+)/)?.[1] ?? 0) / 1024;
};

interface Row {
	target: string;
	connections: number;
	rps: number;
	p50: number;
	p99: number;
	errors: number;
	non2xx: number;
	note?: string;
}
const rows: Row[] = [];

async function hammer(target: string, path: string, connections: number, cookie?: string) {
	const result = await autocannon({
		url: `${BASE}${path}`,
		connections,
		duration: SECONDS,
		headers: cookie ? { cookie, accept: 'application/json' } : { accept: 'text/html' }
	});
	rows.push({
		target,
		connections,
		rps: Math.round(result.requests.average),
		p50: result.latency.p50,
		p99: result.latency.p99,
		errors: result.errors + result.timeouts,
		non2xx: result.non2xx
	});
}

/** Concurrent run-order saves, each re-reading the version and retrying on 409. */
async function saves(connections: number, cookie: string) {
	const headers = {
		cookie,
		origin: BASE,
		'content-type': 'application/json',
		accept: 'application/json'
	};
	const url = `${BASE}/api/evenings/${evening.id}/run-order`;
	const latencies: number[] = [];
	let accepted = 0;
	let conflicts = 0;
	let errors = 0;
	let lastAccepted: unknown = null;
	const start = await (await fetch(url, { headers })).json();
	const startVersion: number = start.runOrderVersion;
	const until = Date.now() + SECONDS * 1000;
	await Promise.all(
		Array.from({ length: connections }, async (_, worker) => {
			while (Date.now() < until) {
				const current = await (await fetch(url, { headers })).json();
				const entries = [...current.entries].map((e: Record<string, unknown>) => ({ ...e }));
				// A visible change per save: toggle a lock on the worker's entry.
				if (entries.length) {
					const e = entries[worker % entries.length];
					e.locked = !e.locked;
				}
				const t0 = performance.now();
				const res = await fetch(url, {
					method: 'PUT',
					headers,
					body: JSON.stringify({ version: current.runOrderVersion, entries })
				});
				latencies.push(performance.now() - t0);
				if (res.status === 200) {
					accepted++;
					lastAccepted = entries.map((e) => e.locked);
				} else if (res.status === 409) conflicts++;
				else errors++;
				await res.arrayBuffer();
			}
		})
	);
	const end = await (await fetch(url, { headers })).json();
	const lost = startVersion + accepted - end.runOrderVersion;
	const sameAsLast =
		JSON.stringify(end.entries.map((e: { locked: boolean }) => e.locked)) ===
		JSON.stringify(lastAccepted);
	latencies.sort((a, b) => a - b);
	rows.push({
		target: 'run-order saves (PUT)',
		connections,
		rps: Math.round(latencies.length / SECONDS),
		p50: Math.round(latencies[Math.floor(latencies.length * 0.5)] ?? 0),
		p99: Math.round(latencies[Math.floor(latencies.length * 0.99)] ?? 0),
		errors,
		non2xx: conflicts,
		note: `${accepted} accepted, ${conflicts} stale (409), lost ${lost}, final = last accepted: ${sameAsLast}`
	});
}

try {
	const cookie = await signInCookie(BASE, 'organiser@floorset.test');
	const share = evening.shareToken;
	for (const c of [50, 200]) {
		await hammer('GET /api/tracks?limit=100', '/api/tracks?limit=100', c, cookie);
		await hammer('GET /api/dances/1/fits?limit=50', '/api/dances/1/fits?limit=50', c, cookie);
		if (share) await hammer('GET /e/<token> (public page)', `/e/${share}`, c);
		await saves(c, cookie);
	}
	console.log(
		`\nFloorset load benchmark — ${SECONDS} s per run, 10,000 tracks, 800 dances, 2 cores\n`
	);
	console.log(
		'target'.padEnd(34),
		'conn',
		'   req/s',
		'  p50 ms',
		'  p99 ms',
		' errors',
		' non-2xx'
	);
	for (const r of rows) {
		console.log(
			r.target.padEnd(34),
			String(r.connections).padStart(4),
			String(r.rps).padStart(8),
			String(r.p50).padStart(8),
			String(r.p99).padStart(8),
			String(r.errors).padStart(7),
			String(r.non2xx).padStart(8),
			r.note ? ` ${r.note}` : ''
		);
	}
	console.log(`\nserver peak memory (VmHWM): ${peakMemoryMb().toFixed(0)} MB`);
} finally {
	await kill(server);
	rmSync(dir, { recursive: true, force: true });
}
