import { parseBuffer } from 'music-metadata';
import { describe, expect, it } from 'vitest';
import { WaveFile } from 'wavefile';
import { writeId3 } from '../synth/id3.server';
import { encodeMp3 } from '../synth/mp3';
import { generateSong } from '../synth/song';
import { encodeWav } from '../synth/wav';
import { id3v2Size, mp3Head, wavExcerpt } from './excerpt';

describe('wavExcerpt', () => {
	const rate = 8000;
	const song = generateSong({ bpm: 100, durationS: 10, sampleRate: rate });
	const wav = encodeWav(song.samples, rate);

	// RIFF/WAVE header arithmetic, read back by wavefile (an independent reader):
	// 3 s of 16-bit mono at 8000 Hz is 3 × 8000 × 2 = 48 000 data bytes.
	it('writes a valid WAV holding just the asked seconds', () => {
		const cut = wavExcerpt(wav, 4, 3);
		expect(cut).not.toBeNull();
		const w = new WaveFile(cut!.bytes);
		expect((w.data as { chunkSize: number }).chunkSize).toBe(48_000);
		expect(cut!.startS).toBe(4);
		// The samples are the original ones from 4 s on.
		const samples = w.getSamples(false, Int16Array) as unknown as Int16Array;
		const original = new WaveFile(wav).getSamples(false, Int16Array) as unknown as Int16Array;
		expect(Array.from(samples.subarray(0, 50))).toEqual(
			Array.from(original.subarray(4 * rate, 4 * rate + 50))
		);
	});

	it('stops at the end of the data and refuses what is not a WAV', () => {
		const cut = wavExcerpt(wav, 8, 5);
		expect(new WaveFile(cut!.bytes).data).toMatchObject({ chunkSize: 2 * rate * 2 });
		expect(wavExcerpt(new TextEncoder().encode('not a riff file at all'), 0, 1)).toBeNull();
	});
});

describe('mp3Head and id3v2Size', () => {
	const rate = 22050;
	const song = generateSong({ bpm: 120, durationS: 12, sampleRate: rate });
	const mp3 = encodeMp3(song.samples, rate, 32);

	it('finds where the audio starts after an ID3v2 tag', () => {
		const tagged = writeId3(mp3, { title: 'Prairie Clockwork', bpm: 120 });
		const size = id3v2Size(tagged);
		expect(size).toBe(tagged.length - mp3.length);
		expect(id3v2Size(mp3)).toBe(0);
	});

	it('keeps the first seconds, which music-metadata still reads as MPEG audio', async () => {
		const head = mp3Head(mp3, 12, 5);
		// 32 kbps = 4000 bytes a second: about 6 s (5 s and a second to spare).
		expect(head.length).toBeGreaterThan(5.5 * 4000);
		expect(head.length).toBeLessThan(6.5 * 4000);
		const meta = await parseBuffer(head, { mimeType: 'audio/mpeg' }, { duration: true });
		expect(Math.abs((meta.format.duration ?? 0) - head.length / 4000)).toBeLessThan(0.15);
		expect(mp3Head(mp3, 12, 20)).toBe(mp3);
	});
});
