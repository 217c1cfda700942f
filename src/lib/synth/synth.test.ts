import { parseBuffer } from 'music-metadata';
import { describe, expect, it } from 'vitest';
import { WaveFile } from 'wavefile';
import { writeId3 } from './id3.server';
import { encodeMp3 } from './mp3';
import { generateSong } from './song';
import { encodeWav } from './wav';

describe('generateSong', () => {
	it('is deterministic for a seed and differs across seeds', () => {
		const a = generateSong({ bpm: 120, durationS: 2, seed: 7, sampleRate: 8000 });
		const b = generateSong({ bpm: 120, durationS: 2, seed: 7, sampleRate: 8000 });
		const c = generateSong({ bpm: 120, durationS: 2, seed: 8, sampleRate: 8000 });
		expect(a.samples).toEqual(b.samples);
		expect(a.samples).not.toEqual(c.samples);
	});

	it('has the asked length and stays inside [-1, 1]', () => {
		const s = generateSong({ bpm: 90, meter: 3, durationS: 3, pad: true, noise: 0.1 });
		expect(s.samples.length).toBe(3 * 22050);
		let peak = 0;
		for (const x of s.samples) peak = Math.max(peak, Math.abs(x));
		expect(peak).toBeLessThanOrEqual(1);
		expect(peak).toBeGreaterThan(0.5);
	});

	it('puts loud onsets one beat apart (plain arithmetic: 120 BPM = 0.5 s)', () => {
		const rate = 8000;
		const s = generateSong({ bpm: 120, durationS: 4, seed: 2, sampleRate: rate });
		// Energy in 10 ms blocks; the loudest block after the first beat and one beat later.
		const block = rate / 100;
		const energy = (t: number) => {
			let e = 0;
			const i0 = Math.round(t * rate);
			for (let i = i0; i < i0 + block; i++) e += s.samples[i] ** 2;
			return e;
		};
		const onBeat = energy(s.firstBeatS + 0.5);
		const between = energy(s.firstBeatS + 0.5 + 0.125);
		expect(onBeat).toBeGreaterThan(4 * between);
	});

	it('rejects a tempo or a length that makes no sense', () => {
		expect(() => generateSong({ bpm: 0, durationS: 1 })).toThrow(RangeError);
		expect(() => generateSong({ bpm: 120, durationS: -1 })).toThrow(RangeError);
	});
});

describe('encodeWav', () => {
	// RIFF/WAVE header arithmetic: data bytes = samples × 2 (16-bit mono), duration =
	// data bytes ÷ (rate × 2); read back with wavefile, an independent reader.
	it('writes a header an independent reader agrees with', () => {
		const rate = 22050;
		const s = generateSong({ bpm: 100, durationS: 1.5, sampleRate: rate });
		const bytes = encodeWav(s.samples, rate);
		const wav = new WaveFile(bytes);
		const fmt = wav.fmt as { sampleRate: number; numChannels: number; bitsPerSample: number };
		const data = wav.data as { chunkSize: number };
		expect(fmt.sampleRate).toBe(rate);
		expect(fmt.numChannels).toBe(1);
		expect(fmt.bitsPerSample).toBe(16);
		expect(data.chunkSize).toBe(s.samples.length * 2);
		expect(data.chunkSize / (rate * 2)).toBeCloseTo(1.5, 6);
		expect(bytes.length).toBe(44 + s.samples.length * 2);
	});

	it('is read by music-metadata with the same duration', async () => {
		const s = generateSong({ bpm: 100, durationS: 2.5, sampleRate: 16000 });
		const meta = await parseBuffer(encodeWav(s.samples, 16000), { mimeType: 'audio/wav' });
		expect(meta.format.duration).toBeCloseTo(2.5, 3);
		expect(meta.format.sampleRate).toBe(16000);
	});
});

describe('encodeMp3 and writeId3', () => {
	const rate = 22050;
	const song = generateSong({ bpm: 140, durationS: 6, pad: true, sampleRate: rate });
	const mp3 = encodeMp3(song.samples, rate, 40);

	it('makes an MP3 music-metadata reads with the right duration (±0.1 s)', async () => {
		const meta = await parseBuffer(mp3, { mimeType: 'audio/mpeg' }, { duration: true });
		expect(meta.format.container).toBe('MPEG');
		expect(meta.format.sampleRate).toBe(rate);
		expect(meta.format.numberOfChannels).toBe(1);
		expect(Math.abs((meta.format.duration ?? 0) - 6)).toBeLessThan(0.1);
		// 40 kbps for 6 s is 30 000 bytes; frame padding and the encoder's delay add a little.
		expect(mp3.length).toBeGreaterThan(28_000);
		expect(mp3.length).toBeLessThan(34_000);
	});

	// TBPM: id3.org "ID3 tag version 2.4.0 – Native Frames", 4.2.3 (an integer as a numerical
	// string); written by node-id3, an independent writer, read by music-metadata as common.bpm.
	it('writes title, artist, album and TBPM that music-metadata reads back', async () => {
		const tagged = writeId3(mp3, {
			title: 'Lantern Road',
			artist: 'The Quiet Fenceposts',
			album: 'Invented Songs',
			bpm: 139.6
		});
		const meta = await parseBuffer(tagged, { mimeType: 'audio/mpeg' }, { duration: true });
		expect(meta.common.title).toBe('Lantern Road');
		expect(meta.common.artist).toBe('The Quiet Fenceposts');
		expect(meta.common.album).toBe('Invented Songs');
		expect(meta.common.bpm).toBe(140);
		expect(Math.abs((meta.format.duration ?? 0) - 6)).toBeLessThan(0.1);
	});
});
