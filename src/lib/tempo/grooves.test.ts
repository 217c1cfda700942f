// The beat dancers count, on grooves written out in the test. Which level is the beat is a
// fact of the trade (common practice, no source): a rock beat's kick and snare fall on the
// counted beats with the hi-hat on the eighths between; a cha-cha is counted in four with its
// "cha-cha-cha" on 4-and-1; an oom-pah-pah waltz is counted one-two-three per bar; a half-time
// ballad is counted on the quarter notes though its snare plays only on 3; a shuffle is counted
// on the beat, the hi-hat on the first and third notes of each triplet. Correct within 4 % as
// Accuracy 1 of Gouyon et al., IEEE TASLP 14(5), 2006.
import { describe, expect, it } from 'vitest';
import { accuracy1 } from './accuracy';
import { analysePcm } from './resolve';
import { every, renderGroove, type Hit } from '../testing/grooves';

const rock: Hit[] = [
	{ at: 0, sound: 'kick' },
	{ at: 1, sound: 'snare' },
	{ at: 2, sound: 'kick' },
	{ at: 3, sound: 'snare' },
	...every(0.5, 'hat', 4)
];
const chaCha: Hit[] = [
	{ at: 0, sound: 'kick' },
	{ at: 2, sound: 'kick' },
	{ at: 0, sound: 'bass', pitch: 36 },
	{ at: 2, sound: 'bass', pitch: 43 },
	...every(1, 'click', 4),
	{ at: 3, sound: 'snare', gain: 0.7 },
	{ at: 3.5, sound: 'snare', gain: 0.7 },
	{ at: 1, sound: 'chord', pitch: 60 },
	{ at: 3, sound: 'chord', pitch: 60 }
];
const oomPahPah: Hit[] = [
	{ at: 0, sound: 'bass', pitch: 36 },
	{ at: 1, sound: 'chord', pitch: 60, gain: 0.6 },
	{ at: 2, sound: 'chord', pitch: 60, gain: 0.6 }
];
const halfTimeBallad: Hit[] = [
	{ at: 0, sound: 'kick' },
	{ at: 2, sound: 'snare' },
	{ at: 0, sound: 'bass', pitch: 38 },
	{ at: 2, sound: 'bass', pitch: 45 },
	...every(1, 'chord', 4, 0, 0.5),
	...every(0.5, 'hat', 4, 0, 0.6)
];
const shuffle: Hit[] = [
	{ at: 0, sound: 'kick' },
	{ at: 1, sound: 'snare' },
	{ at: 2, sound: 'kick' },
	{ at: 3, sound: 'snare' },
	...[0, 1, 2, 3].flatMap((b) => [
		{ at: b, sound: 'hat' as const },
		{ at: b + 2 / 3, sound: 'hat' as const, gain: 0.7 }
	])
];

function measure(bpm: number, beatsPerBar: number, bar: Hit[], leadS = 0.25) {
	const { pcm, sampleRate } = renderGroove({ bpm, beatsPerBar, bar, leadS });
	return analysePcm(pcm, sampleRate);
}

describe('the beat dancers count', () => {
	it.each([90, 120, 140])('a rock beat at %i BPM', (bpm) => {
		expect(measure(bpm, 4, rock).bpm).toSatisfy((b: number) => accuracy1(b, bpm));
	});

	it('a cha-cha at 106 BPM', () => {
		expect(measure(106, 4, chaCha).bpm).toSatisfy((b: number) => accuracy1(b, 106));
	});

	it.each([88, 174])('an oom-pah-pah waltz at %i BPM, in three', (bpm) => {
		const r = measure(bpm, 3, oomPahPah);
		expect(r.bpm).toSatisfy((b: number) => accuracy1(b, bpm));
		expect(r.meter).toBe(3);
	});

	it('a half-time ballad at 66 BPM', () => {
		expect(measure(66, 4, halfTimeBallad).bpm).toSatisfy((b: number) => accuracy1(b, 66));
	});

	it('a triplet-feel shuffle at 112 BPM', () => {
		expect(measure(112, 4, shuffle).bpm).toSatisfy((b: number) => accuracy1(b, 112));
	});

	// The case: music from 0.000 s read one beat late (0.47–0.67 s) before.
	it('a rock beat whose first beat is at 0.000 s: offset within 30 ms of it', () => {
		const r = measure(120, 4, rock, 0);
		expect(r.bpm).toSatisfy((b: number) => accuracy1(b, 120));
		expect(r.offsetS).toBeLessThan(0.03);
	});
});
