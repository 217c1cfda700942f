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

/**
 * The fixture's MP3 with a Xing header frame in front, stating `frames` audio frames, as
 * encoders write for VBR files (an "Info" frame for CBR). Layout from the Xing VBR header
 * description (from memory, as widely documented): after the frame header and side information,
 * "Xing", a flags word (1 = frame count present, 2 = byte count present), then each as a
 * big-endian 32-bit number. The fixture is MPEG-2 Layer III, 40 kb/s, 22,050 Hz, mono: frames of
 * 72 × 40000 / 22050 = 130 bytes, 9 bytes of side information, 576 samples per frame.
 */
export function mp3WithXing(bytes: Uint8Array, frames: number): Uint8Array {
	const header = bytes.subarray(0, 4);
	if (header[0] !== 0xff || header[1] !== 0xf3 || header[2] !== 0x50 || (header[3] & 0xc0) !== 0xc0)
		throw new Error("mp3WithXing expects the fixture encoder's MPEG-2, 40 kb/s, mono frames");
	const frame = new Uint8Array(130);
	frame.set(header);
	const view = new DataView(frame.buffer);
	frame.set(new TextEncoder().encode('Xing'), 13);
	view.setUint32(17, 0x3);
	view.setUint32(21, frames);
	view.setUint32(25, bytes.length + frame.length);
	const out = new Uint8Array(frame.length + bytes.length);
	out.set(frame);
	out.set(bytes, frame.length);
	return out;
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
