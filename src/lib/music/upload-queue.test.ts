// The batch queue with stand-ins for the analysis and the upload: how many run at once, what
// Cancel does, and that a file whose analysis fails is never uploaded.
import { describe, expect, test } from 'vitest';
import type { FileAnalysis } from '../tempo/analyse-browser';
import type { TrackJson } from './track-types';
import {
	analysisBody,
	UploadQueue,
	type QueueDeps,
	type UploadAnswer
} from './upload-queue.svelte';

const analysis = (bpm: number): FileAnalysis => ({
	tags: { title: null, artist: null, album: null, durationS: 30, tagBpm: null, format: 'WAVE PCM' },
	tempo: {
		bpm,
		rawBpm: bpm,
		offsetS: 0.1,
		confidence: 0.9,
		alternative: null,
		candidates: [{ bpm, score: 1 }],
		detected: [],
		source: 'detected',
		tagAgrees: false
	},
	meter: 4,
	ms: 5,
	timings: { tagsMs: 1, decodeMs: 1, detectMs: 1, resolveMs: 1 }
});

function harness(o: { failNames?: string[]; concurrency?: number } = {}) {
	let running = 0;
	let most = 0;
	const uploaded: string[] = [];
	const tracks: TrackJson[] = [];
	const waiters: (() => void)[] = [];
	const deps: QueueDeps = {
		concurrency: o.concurrency,
		analyse: async (file, signal) => {
			running++;
			most = Math.max(most, running);
			await new Promise<void>((resolve, reject) => {
				waiters.push(resolve);
				signal.addEventListener('abort', () => reject(new DOMException('Cancelled', 'AbortError')));
			}).finally(() => running--);
			if (o.failNames?.includes(file.name))
				throw new Error('Not an audio file: no audio stream was found in it.');
			return analysis(120);
		},
		upload: async (form): Promise<UploadAnswer> => {
			const file = form.get('file') as File;
			uploaded.push(file.name);
			expect(JSON.parse(String(form.get('analysis')))).toMatchObject({
				bpm: 120,
				source: 'detected',
				meter: 4
			});
			return {
				status: 201,
				body: { track: { id: uploaded.length, title: file.name } as TrackJson }
			};
		},
		onTrack: (t) => tracks.push(t)
	};
	const release = async () => {
		while (waiters.length) waiters.shift()!();
		await new Promise((r) => setTimeout(r, 5));
	};
	return { queue: new UploadQueue(deps), uploaded, tracks, release, most: () => most };
}

const files = (...names: string[]) => names.map((n) => new File(['x'], n));
const settle = () => new Promise((r) => setTimeout(r, 5));

describe('UploadQueue', () => {
	test('analyses two at a time and uploads each with its analysis', async () => {
		const h = harness();
		h.queue.add(files('a.wav', 'b.wav', 'c.wav', 'd.wav', 'e.wav'));
		await settle();
		expect(h.queue.items.filter((i) => i.state === 'analysing')).toHaveLength(2);
		for (let i = 0; i < 4 && h.queue.busy; i++) await h.release();
		expect(h.most()).toBe(2);
		expect(h.uploaded.sort()).toEqual(['a.wav', 'b.wav', 'c.wav', 'd.wav', 'e.wav']);
		expect(h.tracks).toHaveLength(5);
		expect(h.queue.done).toBe(5);
		expect(h.queue.items.every((i) => i.state === 'stored')).toBe(true);
	});

	test('a file that fails analysis gets its message and is not uploaded; the rest carry on', async () => {
		const h = harness({ failNames: ['notes.mp3'] });
		h.queue.add(files('notes.mp3', 'song.wav'));
		await settle();
		await h.release();
		const bad = h.queue.items.find((i) => i.name === 'notes.mp3')!;
		expect(bad.state).toBe('failed');
		expect(bad.message).toMatch(/Not an audio file/);
		expect(h.uploaded).toEqual(['song.wav']);
	});

	test('Cancel drops queued files and aborts those in flight', async () => {
		const h = harness();
		h.queue.add(files('a.wav', 'b.wav', 'c.wav', 'd.wav'));
		await settle();
		h.queue.cancel();
		await settle();
		expect(h.queue.items.map((i) => i.state)).toEqual([
			'cancelled',
			'cancelled',
			'cancelled',
			'cancelled'
		]);
		expect(h.uploaded).toEqual([]);
		expect(h.queue.busy).toBe(false);
	});

	test('time left comes from the pace so far', async () => {
		const h = harness({ concurrency: 1 });
		h.queue.add(files('a.wav', 'b.wav', 'c.wav'));
		expect(h.queue.secondsLeft).toBeNull();
		await settle();
		await h.release();
		expect(h.queue.done).toBe(1);
		expect(h.queue.secondsLeft).not.toBeNull();
		expect(h.queue.secondsLeft).toBeGreaterThanOrEqual(0);
	});
});

describe('analysisBody', () => {
	test('the BPM tag is used, as source "tag", only when the measurement agrees with it', () => {
		const measured = analysis(127.4);
		const agreeing = {
			...measured,
			tags: { ...measured.tags, tagBpm: 128 },
			tempo: { ...measured.tempo, tagAgrees: true }
		};
		expect(analysisBody(agreeing)).toMatchObject({ bpm: 128, rawBpm: 127.4, source: 'tag' });
		const disagreeing = {
			...agreeing,
			tags: { ...agreeing.tags, tagBpm: 64 },
			tempo: measured.tempo
		};
		expect(analysisBody(disagreeing)).toMatchObject({ bpm: 127.4, source: 'detected' });
	});
});
