// A sustained chord pad: a I–IV–V–I progression, one chord per bar, soft attack and release,
// so the pad adds sound without clear onsets (as real accompaniment often does).
import type { Meter } from '../domain';

const TABLE_SIZE = 4096;
const TABLE = (() => {
	// A few harmonics for a warm, organ-like tone.
	const t = new Float32Array(TABLE_SIZE + 1);
	for (let i = 0; i <= TABLE_SIZE; i++) {
		const x = (2 * Math.PI * i) / TABLE_SIZE;
		t[i] = Math.sin(x) + 0.4 * Math.sin(2 * x) + 0.2 * Math.sin(3 * x);
	}
	return t;
})();

// Semitones above A3 (220 Hz) for the chords of A major: A, D, E, A (triads).
const PROGRESSION = [
	[0, 4, 7],
	[5, 9, 12],
	[7, 11, 14],
	[0, 4, 7]
];

export function addPad(
	out: Float32Array,
	sampleRate: number,
	o: { bpm: number; meter: Meter; firstBeatS: number; gain: number }
): void {
	const barS = (60 / o.bpm) * o.meter;
	const fadeS = Math.min(0.15, barS / 4);
	// Table steps per sample for each chord's three notes, worked out once.
	const steps = PROGRESSION.map((chord) =>
		chord.map((semitones) => (220 * Math.pow(2, semitones / 12) * TABLE_SIZE) / sampleRate)
	);
	let p0 = 0;
	let p1 = 0;
	let p2 = 0;
	for (let i = 0; i < out.length; i++) {
		const t = i / sampleRate - o.firstBeatS;
		const bar = Math.floor(t / barS);
		const inBar = t - bar * barS;
		const step = steps[((bar % 4) + 4) % 4];
		const envelope = Math.min(1, inBar / fadeS, (barS - inBar) / fadeS);
		p0 = (p0 + step[0]) % TABLE_SIZE;
		p1 = (p1 + step[1]) % TABLE_SIZE;
		p2 = (p2 + step[2]) % TABLE_SIZE;
		const sum = TABLE[p0 | 0] + TABLE[p1 | 0] + TABLE[p2 | 0];
		out[i] += (o.gain * envelope * sum) / 3;
	}
}
