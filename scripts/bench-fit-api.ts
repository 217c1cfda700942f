// Benchmark of the fits API's server side (issue 4 target: one dance over 10,000 tracks under
// 50 ms): a temporary SQLite database with the real migrations, 10,000 invented tracks and a few
// hundred verdicts, timed through fitsForDance — reading the tracks and verdicts included — and
// through fitsForTrack for the other direction. Deterministic: the same invented library each run.
import { mkdtempSync, rmSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { openDb, useDb } from '../src/lib/server/db';
import { dances, fits, tracks, users } from '../src/lib/server/db/schema';
import { fitsForDance, fitsForTrack } from '../src/lib/server/fits/ranking';
import { loadTrackFacts } from '../src/lib/server/fits/load';
import { seededRandom } from '../src/lib/random';

const TRACKS = 10_000;
const RUNS = 40;
const WARM_UP = 5;

const rand = seededRandom(20261202);
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];

const dir = mkdtempSync(join(tmpdir(), 'floorset-bench-'));
const db = openDb(join(dir, 'bench.db'));
useDb(db);

const user = db
	.insert(users)
	.values({ email: 'bench@floorset.test', name: 'Bench' })
	.returning()
	.get();
const danceIds = db.transaction((tx) =>
	[
		{
			name: 'Invented Stroll',
			counts: 32,
			walls: 4,
			rhythm: 'shuffle',
			meter: 4,
			min: 110,
			max: 128
		},
		{ name: 'Invented Waltz', counts: 48, walls: 2, rhythm: 'waltz', meter: 3, min: 84, max: 100 },
		{ name: 'Invented Cha', counts: 40, walls: 4, rhythm: 'cha-cha', meter: 4, min: 100, max: 116 }
	].map(
		(d) =>
			tx
				.insert(dances)
				.values({
					name: d.name,
					counts: d.counts,
					walls: d.walls,
					level: 'beginner',
					rhythm: d.rhythm,
					meter: d.meter,
					bpmMin: d.min,
					bpmMax: d.max,
					turn: 'left',
					events:
						d.counts === 40 ? [{ kind: 'tag', repetition: 3, afterCount: 40, lengthCounts: 4 }] : []
				})
				.returning()
				.get().id
	)
);

db.transaction((tx) => {
	for (let i = 0; i < TRACKS; i++) {
		const meter = rand() < 0.15 ? 3 : 4;
		const sha = (i + 1).toString(16).padStart(64, '0');
		tx.insert(tracks)
			.values({
				title: `Invented Song ${i + 1}`,
				artist: `Invented Band ${(i % 97) + 1}`,
				album: 'Invented Album',
				durationS: 120 + rand() * 240,
				bpm: rand() < 0.05 ? null : Math.round((60 + rand() * 150) * 10) / 10,
				offsetS: rand() * 1.5,
				candidates: [{ bpm: 100, score: 0.5 }],
				meter,
				phraseBeats: meter === 3 ? pick([24, 48]) : pick([32, 32, 32, 16, 64]),
				introBeats: pick([0, 0, 4, 8, 16, 32]),
				mimeType: 'audio/mpeg',
				fileSize: 4_000_000,
				sha256: sha,
				storageKey: `audio/${sha}.mp3`,
				originalName: `invented-${i + 1}.mp3`
			})
			.run();
	}
	for (const danceId of danceIds) {
		for (let trackId = 1; trackId <= TRACKS; trackId++) {
			const r = rand();
			if (r >= 0.03) continue;
			const verdict = r < 0.015 ? 'fits' : r < 0.02 ? 'fits-at-rate' : 'does-not-fit';
			tx.insert(fits)
				.values({
					trackId,
					danceId,
					verdict,
					rate: verdict === 'fits-at-rate' ? 0.95 : 1,
					decidedBy: user.id
				})
				.run();
		}
	}
});

function stats(ms: number[]) {
	const s = [...ms].sort((a, b) => a - b);
	return {
		median: s[Math.floor(s.length / 2)],
		p95: s[Math.min(s.length - 1, Math.ceil(s.length * 0.95) - 1)]
	};
}

/**
 * Wall-clock and on-CPU time per call. On a shared machine the wall clock includes waiting for
 * a core; process.cpuUsage() (getrusage) counts only this process's own work, so the two
 * together separate the code's cost from the machine's load.
 */
function time(label: string, f: () => unknown, before?: () => void): [number, number] {
	const wall: number[] = [];
	const cpu: number[] = [];
	for (let run = 0; run < WARM_UP + RUNS; run++) {
		before?.();
		const c0 = process.cpuUsage();
		const t0 = performance.now();
		f();
		const ms = performance.now() - t0;
		const c = process.cpuUsage(c0);
		if (run >= WARM_UP) {
			wall.push(ms);
			cpu.push((c.user + c.system) / 1000);
		}
	}
	const w = stats(wall);
	const c = stats(cpu);
	console.log(
		`${label.padEnd(56)} wall median ${w.median.toFixed(2)} p95 ${w.p95.toFixed(2)} ms · cpu median ${c.median.toFixed(2)} p95 ${c.p95.toFixed(2)} ms`
	);
	return [w.p95, c.p95];
}

console.log(
	`bench:fit-api — ${TRACKS} invented tracks in SQLite, ${RUNS} runs after ${WARM_UP} warm-up, ${cpus().length} CPUs, load average ${loadavg()[0].toFixed(1)}`
);
time('load track facts only', () => loadTrackFacts());
// A verdict written between rankings costs only the tracks' signature check; a track edit as
// the music API makes it (version and updated_at moved on) reads just the changed row; a change
// the signature cannot place (here: a version bumped with no new time) reads every track again.
let flip = 0;
const verdictWrite = () =>
	db.$client
		.prepare('UPDATE fits SET notes = ? WHERE rowid = (SELECT min(rowid) FROM fits)')
		.run(String(flip++));
let clock = Date.now();
const trackEdit = () =>
	db.$client
		.prepare('UPDATE tracks SET version = version + 1, updated_at = ? WHERE id = ?')
		.run((clock += 1000), 1 + (flip++ % 100));
const blindEdit = () =>
	db.$client
		.prepare('UPDATE tracks SET version = version + 1 WHERE id = ?')
		.run(1 + (flip++ % 100));
// A delete and an upload between rankings: the deleted id is found from the ids alone.
let spare = TRACKS + 1;
const deleteAndAdd = () => {
	const victim = db.$client.prepare('SELECT max(id) FROM tracks').pluck().get() as number;
	db.$client.prepare('DELETE FROM tracks WHERE id = ?').run(victim);
	const sha = (spare++).toString(16).padStart(64, '0');
	db.$client
		.prepare(
			`INSERT INTO tracks (title, duration_s, bpm, mime_type, file_size, sha256, storage_key)
			VALUES ('Invented Late Song', 200, 118, 'audio/mpeg', 1, ?, ?)`
		)
		.run(sha, `audio/${sha}.mp3`);
};
const worst = {
	cached: [0, 0],
	verdict: [0, 0],
	edit: [0, 0],
	deleteAdd: [0, 0],
	reread: [0, 0]
};
const keep = (key: keyof typeof worst, [wall, cpu]: [number, number]) => {
	worst[key] = [Math.max(worst[key][0], wall), Math.max(worst[key][1], cpu)];
};
for (const id of danceIds) {
	for (const limit of [50, 500]) {
		const label = `fitsForDance(${id}, limit ${limit})`;
		const run = () => fitsForDance(id, limit);
		keep('cached', time(`${label}, tracks cached`, run));
		keep('verdict', time(`${label}, after a verdict`, run, verdictWrite));
		keep('edit', time(`${label}, after a track edit`, run, trackEdit));
		keep('deleteAdd', time(`${label}, after a delete and an upload`, run, deleteAndAdd));
		keep('reread', time(`${label}, all tracks read again`, run, blindEdit));
	}
}
time('fitsForTrack(1, limit 50)', () => fitsForTrack(1, 50));
const met = (ms: number) => `${ms.toFixed(2)} ms (${ms < 50 ? 'under' : 'NOT under'} 50 ms)`;
const CASES = {
	cached: 'tracks cached',
	verdict: 'after a verdict',
	edit: 'after a track edit (changed rows read)',
	deleteAdd: 'after a delete and an upload',
	reread: 'all tracks read again'
};
for (const [key, words] of Object.entries(CASES)) {
	const [wall, cpu] = worst[key as keyof typeof worst];
	console.log(`fitsForDance, ${words}: worst p95 wall ${met(wall)}, cpu ${met(cpu)}`);
}

db.$client.close();
rmSync(dir, { recursive: true, force: true });
