// Audio and other bytes for the tracks tests, generated (src/lib/synth) so no outside file is needed.
import { mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Meter } from '../../domain';
import { encodeMp3, encodeWav, generateSong } from '../../synth/index';
import { diskStorage, useStorage, type Storage } from '../storage';

export function wav(bpm = 120, durationS = 4, meter: Meter = 4, seed = 1) {
	const song = generateSong({ bpm, durationS, meter, seed, sampleRate: 8000 });
	return { bytes: encodeWav(song.samples, song.sampleRate), song };
}

export function mp3(bpm = 120, durationS = 4) {
	const song = generateSong({ bpm, durationS, sampleRate: 22050 });
	return encodeMp3(song.samples, song.sampleRate);
}

/** A 1×1 PNG (the smallest valid image: signature, IHDR, IDAT, IEND; ISO/IEC 15948). */
export const png = () =>
	Uint8Array.from(
		Buffer.from(
			'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
			'base64'
		)
	);

export const text = (s = 'These are the lyrics, not the song.\n'.repeat(40)) =>
	new TextEncoder().encode(s);

export const analysisJson = (o: Record<string, unknown> = {}) =>
	JSON.stringify({
		bpm: 120,
		rawBpm: 120,
		offsetS: 0.1,
		confidence: 0.8,
		source: 'detected',
		meter: 4,
		candidates: [
			{ bpm: 120, score: 1 },
			{ bpm: 60, score: 0.4 },
			{ bpm: 240, score: 0.3 }
		],
		...o
	});

/** A temporary upload folder used as the app's storage; counts every file left in it. */
export function tempStorage(): { store: Storage; files: () => string[]; cleanup: () => void } {
	const root = mkdtempSync(join(tmpdir(), 'floorset-uploads-'));
	const store = diskStorage(root);
	useStorage(store);
	const walk = (dir: string): string[] =>
		readdirSync(dir).flatMap((n) => {
			const p = join(dir, n);
			return statSync(p).isDirectory() ? walk(p) : [p.slice(root.length + 1)];
		});
	return {
		store,
		files: () => walk(root),
		cleanup: () => {
			useStorage(undefined);
			rmSync(root, { recursive: true, force: true });
		}
	};
}
