// The browser analysis module end to end in Debian's headless Chromium, as `npm run analyse`
// runs it. Check values: the generating tempo, within 4 % (Accuracy 1 of Gouyon et al., IEEE
// TASLP 14(5), 2006); tags written by node-id3, an independent writer.
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeId3 } from '../../src/lib/synth/id3.server';
import { encodeMp3 } from '../../src/lib/synth/mp3';
import { generateSong } from '../../src/lib/synth/song';
import { encodeWav } from '../../src/lib/synth/wav';
import { accuracy1 } from '../../src/lib/tempo/accuracy';
import { Analyser } from './browser';

const dir = mkdtempSync(join(tmpdir(), 'floorset-analyse-test-'));
const file = (name: string) => join(dir, name);
let analyser: Analyser;

// No Chromium is a failure with the fix in its message, never a silent skip: `npm test` installs
// it first (scripts/ensure-chromium.ts).
it('Debian Chromium is installed (apt-get install chromium)', () => {
	expect(existsSync('/usr/bin/chromium'), 'run: apt-get install -y chromium').toBe(true);
});

describe('analyse-browser in Chromium', () => {
	beforeAll(async () => {
		const a = generateSong({ bpm: 100, durationS: 60, pad: true, seed: 11 });
		writeFileSync(file('a.mp3'), encodeMp3(a.samples, a.sampleRate, 40));
		const b = generateSong({ bpm: 88, meter: 3, durationS: 40, seed: 12, sampleRate: 16000 });
		writeFileSync(file('b.wav'), encodeWav(b.samples, 16000));
		const c = generateSong({ bpm: 190, durationS: 30, swing: 0.5, noise: 0.03, seed: 13 });
		const tags = { title: 'Gravel Moon', artist: 'Cedar Switchback', album: 'Demo', bpm: 190 };
		writeFileSync(file('c.mp3'), writeId3(encodeMp3(c.samples, c.sampleRate, 40), tags));
		writeFileSync(file('notes.mp3'), 'These are my notes, not a song.\n');
		writeFileSync(file('empty.wav'), '');
		analyser = await Analyser.start();
	}, 60_000);

	afterAll(async () => {
		await analyser?.close();
		rmSync(dir, { recursive: true, force: true });
	});

	it('measures an MP3, a WAV in 3/4 and a tagged MP3', async () => {
		const a = await analyser.analyse(file('a.mp3'));
		expect(a.ok).toBe(true);
		expect(accuracy1(a.bpm!, 100)).toBe(true);
		expect(a.meter).toBe(4);
		const b = await analyser.analyse(file('b.wav'));
		expect(accuracy1(b.bpm!, 88)).toBe(true);
		expect(b.meter).toBe(3);
		expect(b.durationS).toBeCloseTo(40, 2); // WAV header arithmetic: bytes ÷ (rate × 2)
		const c = await analyser.analyse(file('c.mp3'));
		expect(accuracy1(c.bpm!, 190)).toBe(true);
		expect(c).toMatchObject({ title: 'Gravel Moon', artist: 'Cedar Switchback', tagBpm: 190 });
		expect(c.candidates!.length).toBeGreaterThan(1);
	}, 60_000);

	it('says clearly what is wrong with a file that is not audio', async () => {
		const notes = await analyser.analyse(file('notes.mp3'));
		expect(notes.ok).toBe(false);
		expect(notes.error).toMatch(/^Not an audio file/);
		const empty = await analyser.analyse(file('empty.wav'));
		expect(empty).toMatchObject({ ok: false, error: 'The file is empty.' });
	}, 60_000);
});
