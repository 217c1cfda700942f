// `npm run bench:load`: drives the built app on 127.0.0.1 with autocannon — 50 and then 200
// concurrent connections on the music table's API, the dance fits API, the public evening page
// and run-order saves (each connection reads the run order and saves it back) — against a database
// of 10,000 tracks and 800 dances; then the two APIs again at 50 connections with a new question
// every request, so that nothing kept from an earlier answer helps; and the public page with a
// damaged session cookie, printing how much the server's log grew. Prints requests per second,
// median, 99th-percentile and longest latency, errors, lost saves and the server's memory (peak resident
// size during each run). Requests accept gzip as browsers do, except the saves' reads, which the
// benchmark itself parses. The load generator shares the machine's two cores with the server.
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
const died = (code: number | null, signal: string | null) => {
	console.error(
		`\nThe server stopped (${signal ?? `exit ${code}`}) during the benchmark:\n${server.log().slice(-4000)}`
	);
	process.exit(1);
};
server.proc.once('exit', died);
// Whatever ends this script (an error in a callback included), the server goes with it.
process.once('exit', () => server.proc.kill('SIGKILL'));
const memoryMb = (field: 'VmHWM' | 'VmRSS') => {
	const status = readFileSync(`/proc/${server.proc.pid}/status`, 'utf8');
	return Number(status.match(new RegExp(`${field}:\\s+(\\d+)`))?.[1] ?? 0) / 1024;
};

/** The server's largest resident size while `run` goes on, sampled every 100 ms. */
async function peakDuring(run: () => Promise<void>): Promise<number> {
	let peak = memoryMb('VmRSS');
	const timer = setInterval(() => (peak = Math.max(peak, memoryMb('VmRSS'))), 100);
	try {
		await run();
	} finally {
		clearInterval(timer);
	}
	return Math.max(peak, memoryMb('VmRSS'));
}

interface Row {
	target: string;
	connections: number;
	rps: number;
	p50: number;
	p99: number;
	/** The slowest request: a connection left waiting shows here long before it times out. */
	max: number;
	errors: number;
	non2xx: number;
	rssMb?: number;
	note?: string;
}
const rows: Row[] = [];

/** GETs of `path`, or of a new path for every request when `path` is a function. */
async function hammer(
	target: string,
	path: string | ((n: number) => string),
	connections: number,
	cookie?: string,
	note?: () => string
) {
	let n = 0;
	// A damaged session cookie on a page (not an API call): the page is what a browser would ask.
	const page = cookie?.endsWith('=x');
	const result = await autocannon({
		url: BASE,
		connections,
		duration: SECONDS,
		// As a browser asks: every browser's page loads and fetches accept gzip.
		headers: {
			...(cookie ? { cookie } : {}),
			accept: cookie && !page ? 'application/json' : 'text/html',
			'accept-encoding': 'gzip, deflate, br'
		},
		requests: [
			{
				method: 'GET',
				setupRequest: (req) => ({ ...req, path: typeof path === 'string' ? path : path(n++) })
			}
		]
	});
	rows.push({
		target,
		connections,
		rps: Math.round(result.requests.average),
		p50: result.latency.p50,
		p99: result.latency.p99,
		max: result.latency.max,
		errors: result.errors + result.timeouts,
		non2xx: result.non2xx,
		note: note?.()
	});
}

interface RunOrder {
	runOrderVersion: number;
	entries: { locked: boolean }[];
}

/** What autocannon keeps per connection between its GET and its PUT. */
interface Context {
	current?: RunOrder;
	sentAt?: number;
}

/**
 * Concurrent run-order saves through autocannon: each connection reads the run order, saves it
 * with one lock toggled, and goes round again (a stale save gets 409 and the next read picks up
 * the newer version). Latency is reported for the saves alone, timed from the moment each PUT is
 * handed to the connection until its answer; afterwards every acknowledged save must be in the
 * database.
 */
async function saves(connections: number, cookie: string) {
	const url = `/api/evenings/${evening.id}/run-order`;
	const read = async (): Promise<RunOrder> =>
		(await fetch(`${BASE}${url}`, { headers: { cookie, accept: 'application/json' } })).json();
	// The newest run order any connection has read: a connection whose read timed out saves on it.
	let latest = await read();
	const startVersion = latest.runOrderVersion;
	const latencies: number[] = [];
	let accepted = 0;
	let conflicts = 0;
	let errors = 0;
	let toggles = 0;
	// What each save sent, by the version it was based on: the run order in the database at the
	// end must be exactly one of the saves based on the version before the last.
	const acknowledged = new Map<number, string>();
	const sentOn = new Map<number, Set<string>>();
	const locksOf = (r: RunOrder) => JSON.stringify(r.entries.map((e) => e.locked));
	const result = await autocannon({
		url: BASE,
		connections,
		duration: SECONDS,
		headers: { cookie, accept: 'application/json', origin: BASE },
		requests: [
			{
				method: 'GET',
				path: url,
				onResponse: (_status, body, context) => {
					(context as Context).current = latest = JSON.parse(body);
				}
			},
			{
				method: 'PUT',
				path: url,
				headers: {
					cookie,
					accept: 'application/json',
					origin: BASE,
					'content-type': 'application/json'
				},
				setupRequest: (req, context) => {
					const current = (context as Context).current ?? latest;
					const entries = current.entries.map((e) => ({ ...e }));
					// A visible change per save: toggle one entry's lock.
					const e = entries[toggles++ % entries.length];
					if (e) e.locked = !e.locked;
					(context as Context).sentAt = performance.now();
					const sent = sentOn.get(current.runOrderVersion) ?? new Set<string>();
					sent.add(locksOf({ runOrderVersion: 0, entries }));
					sentOn.set(current.runOrderVersion, sent);
					return { ...req, body: JSON.stringify({ version: current.runOrderVersion, entries }) };
				},
				onResponse: (status, body, context) => {
					latencies.push(performance.now() - (context as Context).sentAt!);
					if (status === 200) {
						accepted++;
						acknowledged.set(
							(JSON.parse(body) as RunOrder).runOrderVersion,
							locksOf(JSON.parse(body))
						);
					} else if (status === 409) conflicts++;
					else errors++;
				}
			}
		]
	});
	const end = await read();
	// Saves the server took but whose answer the benchmark's end cut off are in the database
	// without having been counted: only the opposite (counted, not stored) is a loss.
	const unanswered = end.runOrderVersion - startVersion - accepted;
	const final = locksOf(end);
	const asSaved = acknowledged.has(end.runOrderVersion)
		? acknowledged.get(end.runOrderVersion) === final
		: (sentOn.get(end.runOrderVersion - 1)?.has(final) ?? false);
	latencies.sort((a, b) => a - b);
	rows.push({
		target: 'run-order saves (GET + PUT)',
		connections,
		rps: Math.round(result.requests.average),
		p50: result.latency.p50,
		p99: result.latency.p99,
		max: result.latency.max,
		errors: result.errors + result.timeouts + errors,
		non2xx: conflicts,
		note: `the PUTs alone: p50 ${Math.round(latencies[Math.floor(latencies.length * 0.5)] ?? 0)} ms, p99 ${Math.round(latencies[Math.floor(latencies.length * 0.99)] ?? 0)} ms; ${accepted} accepted, ${conflicts} stale (409), lost ${Math.max(0, -unanswered)}, ${Math.max(0, unanswered)} stored with the answer cut off by the end of the run, final run order = a save as sent: ${asSaved}`
	});
}

try {
	const cookie = await signInCookie(BASE, 'organiser@floorset.test');
	const share = evening.shareToken;
	const measured = async (run: () => Promise<void>) => {
		const rss = await peakDuring(run);
		rows[rows.length - 1].rssMb = rss;
	};
	const startMb = memoryMb('VmRSS');
	for (const c of [50, 200]) {
		await measured(() => hammer('GET /api/tracks?limit=100', '/api/tracks?limit=100', c, cookie));
		await measured(() =>
			hammer('GET /api/dances/1/fits?limit=50', '/api/dances/1/fits?limit=50', c, cookie)
		);
		if (share) await measured(() => hammer('GET /e/<token> (public page)', `/e/${share}`, c));
		await measured(() => saves(c, cookie));
	}
	// Anyone can send a damaged session cookie on every request: it must count as signed out and
	// cost the log one short line a minute, not a stack trace per request (issue 13, finding 1).
	if (share) {
		const logBefore = server.log().length;
		await measured(() =>
			hammer(
				'GET /e/<token>, damaged session cookie',
				`/e/${share}`,
				50,
				'authjs.session-token=x',
				() => `the server's log grew by ${server.log().length - logBefore} bytes`
			)
		);
	}
	// The same two APIs with nothing kept: every request asks something not asked before, so each
	// answer is computed (a tempo window in thousandths of a BPM; a dance and a limit).
	await measured(() =>
		hammer(
			'GET /api/tracks, new query each time',
			(n) => `/api/tracks?limit=100&bpmMin=${(60 + (n % 100_000) / 1000).toFixed(3)}`,
			50,
			cookie
		)
	);
	await measured(() =>
		hammer(
			'GET /api/dances/N/fits, new each time',
			(n) => `/api/dances/${1 + (n % 800)}/fits?limit=${50 + (Math.floor(n / 800) % 50)}`,
			50,
			cookie
		)
	);
	console.log(
		`\nFloorset load benchmark — ${SECONDS} s per run, 10,000 tracks, 800 dances, 2 cores\n`
	);
	console.log(
		'target'.padEnd(38),
		'conn',
		'   req/s',
		'  p50 ms',
		'  p99 ms',
		'  max ms',
		' errors',
		' non-2xx',
		' RSS MB'
	);
	for (const r of rows) {
		console.log(
			r.target.padEnd(38),
			String(r.connections).padStart(4),
			String(r.rps).padStart(8),
			String(r.p50).padStart(8),
			String(r.p99).padStart(8),
			String(Math.round(r.max)).padStart(8),
			String(r.errors).padStart(7),
			String(r.non2xx).padStart(8),
			String(Math.round(r.rssMb ?? 0)).padStart(7),
			r.note ? ` ${r.note}` : ''
		);
	}
	console.log(
		`\nserver memory: ${startMb.toFixed(0)} MB resident after start, peak (VmHWM) ${memoryMb('VmHWM').toFixed(0)} MB`
	);
} finally {
	server.proc.off('exit', died);
	await kill(server);
	rmSync(dir, { recursive: true, force: true });
}
