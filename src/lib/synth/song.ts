// Music of known tempo, generated: for tests, the tempo benchmark and the demo seed.
import type { Meter } from '../domain';
import { addPad } from './pad';
import { drumHits, type Drum } from './pattern';
import { between, seededRandom } from '../random';
import { hat, kick, mixIn, snare, type Voice } from './voices';

export interface SongOptions {
	/** Beats (quarter notes) per minute, 60–200 is the range the tests and benchmark use. */
	bpm: number;
	meter?: Meter;
	durationS: number;
	/** 0 = straight, 1 = full triplet swing. */
	swing?: number;
	/** Adds a sustained chord pad. */
	pad?: boolean;
	/** Level of added white noise, 0 = none (0.05 is audible hiss, 0.2 is heavy). */
	noise?: number;
	seed?: number;
	sampleRate?: number;
}

export interface Song {
	samples: Float32Array;
	sampleRate: number;
	bpm: number;
	meter: Meter;
	/** Time of the first downbeat, seconds. */
	firstBeatS: number;
	durationS: number;
}

const PEAK = 0.89;

export function generateSong(options: SongOptions): Song {
	const { bpm, durationS } = options;
	if (!(bpm > 0 && bpm <= 400)) throw new RangeError(`bpm out of range: ${bpm}`);
	if (!(durationS > 0)) throw new RangeError(`durationS must be positive: ${durationS}`);
	const meter = options.meter ?? 4;
	const sampleRate = options.sampleRate ?? 22050;
	const random = seededRandom(options.seed ?? 1);
	const samples = new Float32Array(Math.round(durationS * sampleRate));
	const firstBeatS = Math.round(between(random, 0.05, 0.6) * 1000) / 1000;

	const voices: Record<Drum, Voice> = {
		kick: kick(sampleRate),
		snare: snare(sampleRate, random),
		hat: hat(sampleRate, random)
	};
	const hits = drumHits({
		bpm,
		meter,
		durationS,
		swing: options.swing ?? 0,
		firstBeatS,
		random
	});
	for (const h of hits) mixIn(samples, voices[h.drum], h.timeS * sampleRate, h.gain);
	if (options.pad) addPad(samples, sampleRate, { bpm, meter, firstBeatS, gain: 0.35 });
	const noise = options.noise ?? 0;
	if (noise > 0) for (let i = 0; i < samples.length; i++) samples[i] += noise * (random() * 2 - 1);

	normalise(samples, PEAK);
	return { samples, sampleRate, bpm, meter, firstBeatS, durationS };
}

function normalise(samples: Float32Array, peak: number): void {
	let max = 0;
	for (let i = 0; i < samples.length; i++) max = Math.max(max, Math.abs(samples[i]));
	if (max === 0) return;
	const k = peak / max;
	for (let i = 0; i < samples.length; i++) samples[i] *= k;
}
