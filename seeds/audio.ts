// Generates the demo songs' audio (MP3 with ID3 tags) on one process per core, with a cache so a
// second seed (tests, a reset demo) does not encode again.
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { fork } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import type { DemoTrack } from './tracks';

export const SAMPLE_RATE = 22050;
export const KBPS = 32 as const;

export interface AudioJob {
	index: number;
	track: DemoTrack;
}

const cacheKey = (t: DemoTrack) =>
	createHash('sha256')
		.update(JSON.stringify({ t, SAMPLE_RATE, KBPS, v: 2 }))
		.digest('hex')
		.slice(0, 32);

function runWorkers(jobs: AudioJob[], onDone: (index: number, bytes: Uint8Array) => void) {
	const threads = Math.max(1, Math.min(availableParallelism(), 4, jobs.length));
	let next = 0;
	return Promise.all(
		Array.from({ length: threads }, () => {
			// A child process per core (worker threads would not inherit tsx's TypeScript loader).
			const worker = fork(fileURLToPath(new URL('./audio-worker.ts', import.meta.url)), [], {
				execArgv: ['--import', 'tsx'],
				serialization: 'advanced'
			});
			return new Promise<void>((resolve, reject) => {
				const feed = () => {
					if (next >= jobs.length) {
						worker.disconnect();
						resolve();
						return;
					}
					worker.send(jobs[next++]);
				};
				worker.on('message', (m: { index: number; bytes: Uint8Array }) => {
					onDone(m.index, m.bytes);
					feed();
				});
				worker.on('error', reject);
				feed();
			});
		})
	);
}

/** The MP3 bytes of every demo track, in order; prints progress as it goes. */
export async function demoAudio(
	tracks: DemoTrack[],
	cacheDir: string,
	log: (line: string) => void
): Promise<Uint8Array[]> {
	mkdirSync(cacheDir, { recursive: true });
	const out: Uint8Array[] = new Array(tracks.length);
	const todo: AudioJob[] = [];
	tracks.forEach((track, index) => {
		const file = join(cacheDir, `${cacheKey(track)}.mp3`);
		if (existsSync(file)) out[index] = new Uint8Array(readFileSync(file));
		else todo.push({ index, track });
	});
	if (todo.length) log(`Generating audio for ${todo.length} demo songs…`);
	let done = 0;
	await runWorkers(todo, (index, bytes) => {
		out[index] = bytes;
		writeFileSync(join(cacheDir, `${cacheKey(tracks[index])}.mp3`), bytes);
		done++;
		if (done % 10 === 0 || done === todo.length) log(`  audio ${done}/${todo.length}`);
	});
	return out;
}
