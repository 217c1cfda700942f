// The upload pipeline against a real SQLite and a real upload folder: what is stored, what is
// refused, and that a refusal or a failure leaves no row and no file behind.
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { writeId3 } from '../../synth/id3-node';
import { resetConfig } from '../config';
import { tracks } from '../db/schema';
import type { Storage } from '../storage';
import { makeTestDb } from '../testing/test-db';
import { analysisJson, mp3, mp3WithXing, png, tempStorage, text, wav } from '../testing/tracks';
import { uploadTrack } from './upload';

let t: ReturnType<typeof makeTestDb>;
let s: ReturnType<typeof tempStorage>;
beforeEach(() => {
	t = makeTestDb();
	s = tempStorage();
});
afterEach(() => {
	s.cleanup();
	t.cleanup();
	delete process.env.MAX_UPLOAD_MB;
	resetConfig();
});

const rows = () => t.db.select().from(tracks).all();
const upload = (bytes: Uint8Array, o: { name?: string; analysis?: string | null } = {}) =>
	uploadTrack({
		bytes,
		fileName: o.name ?? 'song.wav',
		analysis: o.analysis === undefined ? analysisJson() : o.analysis,
		uploadedBy: null
	});

describe('a good upload', () => {
	test('stores the file under its SHA-256 and writes the row (201)', async () => {
		const { bytes, song } = wav(120, 4);
		const r = await upload(bytes, { name: 'Barn Dance.wav' });
		expect(r.ok && r.status).toBe(201);
		if (!r.ok) return;
		expect(r.duplicate).toBe(false);
		// 16-bit mono PCM: duration = data bytes ÷ (rate × 2) (RIFF/WAVE header arithmetic).
		expect(r.track.durationS).toBeCloseTo((bytes.length - 44) / (song.sampleRate * 2), 6);
		expect(r.track).toMatchObject({
			title: 'Barn Dance',
			bpm: 120,
			rawBpm: 120,
			bpmSource: 'detected',
			meter: 4,
			phraseBeats: 32,
			introBeats: 0,
			mimeType: 'audio/wav',
			fileSize: bytes.length,
			originalName: 'Barn Dance.wav',
			version: 1
		});
		expect(r.track.sha256).toMatch(/^[a-f0-9]{64}$/);
		expect(s.files()).toEqual([`audio/${r.track.sha256}.wav`]);
		expect(rows()).toHaveLength(1);
	});

	test('the same file twice gives the existing track with duplicate: true (200)', async () => {
		const { bytes } = wav(100, 3);
		const first = await upload(bytes);
		const again = await upload(bytes, { name: 'copy.wav' });
		expect(again).toMatchObject({ ok: true, status: 200, duplicate: true });
		expect(first.ok && again.ok && again.track.id === first.track.id).toBe(true);
		expect(rows()).toHaveLength(1);
		expect(s.files()).toHaveLength(1);
	});

	test('the same new file 20 times at once: exactly one 201, the rest duplicates', async () => {
		// Issue 13, finding 6: temporary names made of pid + millisecond collided into 507s.
		const { bytes } = wav(110, 3);
		const all = await Promise.all(Array.from({ length: 20 }, () => upload(bytes)));
		expect(all.map((r) => r.status).sort()).toEqual([...Array(19).fill(200), 201]);
		expect(new Set(all.map((r) => (r.ok ? r.track.id : null)))).toEqual(new Set([rows()[0].id]));
		expect(rows()).toHaveLength(1);
		// Whole file under its key and no temporary file left behind.
		expect(s.files()).toHaveLength(1);
	});

	test('a 3/4 track gets a 24-beat phrase (8 bars)', async () => {
		const r = await upload(wav(90, 4, 3).bytes, { analysis: analysisJson({ bpm: 90, meter: 3 }) });
		expect(r.ok && r.track.phraseBeats).toBe(24);
	});

	test('ID3 tags (TBPM among them) fill the facts; TBPM stays beside the measurement', async () => {
		// Written by node-id3, an independent writer; TBPM per id3.org "ID3 tag version 2.4.0 –
		// Native Frames" §4.2.3 (an integer as a numerical string).
		const tagged = writeId3(mp3(128, 3), {
			title: 'Copperwick Morning',
			artist: 'The Invented Few',
			album: 'Made Up',
			bpm: 128
		});
		const r = await upload(tagged, { name: 'x.mp3', analysis: analysisJson({ bpm: 127.6 }) });
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.track).toMatchObject({
			title: 'Copperwick Morning',
			artist: 'The Invented Few',
			album: 'Made Up',
			tagBpm: 128,
			bpm: 127.6,
			mimeType: 'audio/mpeg'
		});
		// Independent of music-metadata (which the app reads durations with): walk the MPEG
		// frames by their headers (ISO/IEC 11172-3 and 13818-3) and count their samples.
		expect(Math.abs(r.track.durationS! - mpegFramesDurationS(tagged))).toBeLessThan(0.06);
	});

	test('without a measured tempo the BPM tag is used and the source says "tag"', async () => {
		const tagged = writeId3(mp3(96, 3), { title: 'Slow One', bpm: 96 });
		const r = await upload(tagged, { analysis: analysisJson({ bpm: null, rawBpm: null }) });
		expect(r.ok && { bpm: r.track.bpm, src: r.track.bpmSource }).toEqual({ bpm: 96, src: 'tag' });
	});

	test('a hostile file name is kept only as display text', async () => {
		const hostile = '../../etc/\u202Egnp.\u0007passwd\u0000.mp3';
		const r = await upload(wav(110, 3).bytes, { name: hostile });
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.track.originalName).toBe('gnp.passwd.mp3');
		expect(r.track.title).toBe('gnp.passwd');
		// The only file is under audio/ by its hash: nothing named after the upload.
		expect(s.files()).toEqual([`audio/${r.track.sha256}.wav`]);
		const long = await upload(wav(111, 3).bytes, { name: `${'ü'.repeat(500)}.wav` });
		expect(long.ok && [...long.track.originalName].length).toBe(200);
	});
});

describe('bad input: a clear 4xx with an error, no row, no file', () => {
	const cases: [string, () => Uint8Array, { name?: string; analysis?: string | null }, number][] = [
		['an empty file', () => new Uint8Array(0), {}, 422],
		['truncated audio (a WAV cut after 200 bytes)', () => wav().bytes.slice(0, 200), {}, 422],
		['truncated audio (a WAV cut in half)', () => wav(120, 6).bytes.slice(0, 24_000), {}, 422],
		['an MP3 cut to its first frame', () => mp3().slice(0, 300), {}, 422],
		['a text file renamed .mp3', () => text(), { name: 'lyrics.mp3' }, 415],
		['a PNG', () => png(), { name: 'cover.mp3' }, 415],
		['hostile name on a text file', () => text(), { name: '../../etc/passwd.mp3' }, 415],
		['missing analysis', () => wav().bytes, { analysis: null }, 400],
		['empty analysis', () => wav().bytes, { analysis: '  ' }, 400],
		['malformed analysis JSON', () => wav().bytes, { analysis: '{"bpm": 12' }, 400],
		[
			'analysis with a tempo in words',
			() => wav().bytes,
			{ analysis: analysisJson({ bpm: 'fast' }) },
			422
		],
		['analysis with meter 5', () => wav().bytes, { analysis: analysisJson({ meter: 5 }) }, 422],
		[
			'analysis with an unknown source',
			() => wav().bytes,
			{ analysis: analysisJson({ source: 'guessed' }) },
			422
		]
	];
	for (const [what, bytes, o, status] of cases) {
		test(`${what} → ${status}`, async () => {
			const r = await upload(bytes(), o);
			expect(r.ok).toBe(false);
			if (r.ok) return;
			expect(r.status).toBe(status);
			expect(r.error.length).toBeGreaterThan(10);
			expect(rows()).toHaveLength(0);
			expect(s.files()).toEqual([]);
		});
	}

	test('a file over MAX_UPLOAD_MB → 413', async () => {
		process.env.MAX_UPLOAD_MB = '0.05';
		resetConfig();
		const r = await upload(wav(120, 8).bytes);
		expect(r).toMatchObject({ ok: false, status: 413 });
		expect(!r.ok && r.error).toContain('0.05 MB');
		expect(rows()).toHaveLength(0);
		expect(s.files()).toEqual([]);
	});

	test('an MP3 whose header promises more than its bytes hold is refused as cut off', async () => {
		// Issue 13, finding 7. 20 s at 22,050 Hz in 576-sample frames is 766 frames (MPEG-2 Layer III).
		const whole = mp3(120, 20);
		const frames = Math.round((20 * 22050) / 576);
		const ok = await upload(mp3WithXing(whole, frames), { name: 'whole.mp3' });
		expect(ok.ok && ok.track.durationS).toBeCloseTo(20, 0);
		const cut = await upload(mp3WithXing(whole, frames).slice(0, 30_000), { name: 'cut.mp3' });
		expect(cut).toMatchObject({ ok: false, status: 422 });
		expect(!cut.ok && cut.error).toMatch(/cut off: its header says 0:20, but only about 0:0\d/);
		expect(rows()).toHaveLength(1);
	});

	test('an MP3 cut short without such a header keeps the length of the audio there', async () => {
		// Without a frame count the length comes from the bytes at the frames' bitrate:
		// 30,000 bytes × 8 ÷ 40,000 b/s = 6 s (header arithmetic, ISO/IEC 13818-3 bitrates).
		const r = await upload(mp3(120, 20).slice(0, 30_000), { name: 'short.mp3' });
		expect(r.ok && r.track.durationS).toBeCloseTo(6, 0);
	});

	test('the error messages name the problem', async () => {
		const empty = await upload(new Uint8Array(0));
		expect(!empty.ok && empty.error).toMatch(/empty/);
		const picture = await upload(png());
		expect(!picture.ok && picture.error).toMatch(/image\/png/);
		const cut = await upload(wav().bytes.slice(0, 200));
		expect(!cut.ok && cut.error).toMatch(/cut off/);
	});
});

describe('failures leave neither the row nor the file', () => {
	test('when the row cannot be written, the stored file is removed', async () => {
		t.db.$client.exec(
			`CREATE TRIGGER refuse BEFORE INSERT ON tracks BEGIN SELECT RAISE(ABORT, 'disk full'); END`
		);
		await expect(upload(wav().bytes)).rejects.toThrow(/disk full/);
		expect(rows()).toHaveLength(0);
		expect(s.files()).toEqual([]);
	});

	test('when the file cannot be written, no row is written', async () => {
		const broken: Storage = {
			...s.store,
			put: async () => {
				throw new Error('no space left on device');
			}
		};
		await expect(
			uploadTrack(
				{ bytes: wav().bytes, fileName: 'a.wav', analysis: analysisJson(), uploadedBy: null },
				broken
			)
		).rejects.toThrow(/no space/);
		expect(rows()).toHaveLength(0);
		expect(s.files()).toEqual([]);
	});
});

describe('when the upload folder cannot be written', () => {
	// As root a chmod does not stop writes, so the storage refuses as a full or read-only disk does.
	const refusing = (code: string): Storage => ({
		...s.store,
		put: async () => {
			throw Object.assign(new Error(`${code}: cannot write`), { code });
		}
	});
	for (const code of ['ENOSPC', 'EACCES', 'EROFS']) {
		test(`${code} gives a clear 507, no row, no file and no crash`, async () => {
			const { bytes } = wav(120, 4);
			const r = await uploadTrack(
				{ bytes, fileName: 'full.wav', analysis: analysisJson(), uploadedBy: null },
				refusing(code)
			);
			expect(r).toMatchObject({ ok: false, status: 507 });
			expect(!r.ok && r.error).toMatch(/disk is full or the upload folder is not writable/);
			expect(rows()).toHaveLength(0);
			expect(s.files()).toEqual([]);
		});
	}
});

/** Seconds of audio in an MPEG Layer III stream, from its frame headers alone. */
function mpegFramesDurationS(bytes: Uint8Array): number {
	// ID3v2 tag: 10-byte header, size as four 7-bit bytes (id3.org, ID3v2.4 §3.1).
	let at =
		bytes[0] === 0x49 && bytes[1] === 0x44 && bytes[2] === 0x33
			? 10 + ((bytes[6] << 21) | (bytes[7] << 14) | (bytes[8] << 7) | bytes[9])
			: 0;
	const kbps1 = [0, 32, 40, 48, 56, 64, 80, 96, 112, 128, 160, 192, 224, 256, 320];
	const kbps2 = [0, 8, 16, 24, 32, 40, 48, 56, 64, 80, 96, 112, 128, 144, 160];
	let samples = 0;
	let rate = 0;
	while (at + 4 <= bytes.length) {
		if (bytes[at] !== 0xff || (bytes[at + 1] & 0xe0) !== 0xe0) break;
		const mpeg1 = (bytes[at + 1] & 0x18) === 0x18;
		const kbps = (mpeg1 ? kbps1 : kbps2)[bytes[at + 2] >> 4];
		rate = (mpeg1 ? [44100, 48000, 32000] : [22050, 24000, 16000])[(bytes[at + 2] >> 2) & 3];
		const padding = (bytes[at + 2] >> 1) & 1;
		const perFrame = mpeg1 ? 1152 : 576;
		const length = Math.floor(((perFrame / 8) * kbps * 1000) / rate) + padding;
		if (!kbps || !rate || length <= 4) break;
		samples += perFrame;
		at += length;
	}
	return samples / rate;
}
