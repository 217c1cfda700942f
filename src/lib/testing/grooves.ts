// Grooves written out hit by hit for the tempo tests: a bar is a list of hits at beat
// positions, so a test states exactly what a drummer or a band would play (rock beat, cha-cha,
// oom-pah-pah, half-time ballad, shuffle) and the tempo it is played at. Not the demo's song
// generator: no randomised arrangement, every hit is in the test's own words.
import { seededRandom } from '../random';
import { hat, kick, mixIn, snare } from '../synth/voices';

export type Sound = 'kick' | 'snare' | 'hat' | 'bass' | 'chord' | 'click';

/** `at` in beats from the start of the bar; `pitch` a MIDI note for bass and chord. */
export interface Hit {
	at: number;
	sound: Sound;
	gain?: number;
	pitch?: number;
}

export interface Groove {
	bpm: number;
	beatsPerBar: number;
	bar: Hit[];
	bars?: number;
	/** Silence before the first beat, seconds. */
	leadS?: number;
	sampleRate?: number;
}

const RATE = 12000;

export function renderGroove(g: Groove): { pcm: Float32Array; sampleRate: number } {
	const rate = g.sampleRate ?? RATE;
	const beatS = 60 / g.bpm;
	const bars = g.bars ?? Math.ceil(30 / (beatS * g.beatsPerBar));
	const lead = g.leadS ?? 0;
	const pcm = new Float32Array(Math.ceil((lead + bars * g.beatsPerBar * beatS + 0.5) * rate));
	const random = seededRandom(g.bpm * 13 + g.beatsPerBar);
	const drums = { kick: kick(rate), snare: snare(rate, random), hat: hat(rate, random) };
	for (let b = 0; b < bars; b++)
		for (const h of g.bar) {
			const at = (lead + (b * g.beatsPerBar + h.at) * beatS) * rate;
			const gain = h.gain ?? 1;
			if (h.sound === 'kick' || h.sound === 'snare' || h.sound === 'hat')
				mixIn(pcm, drums[h.sound], at, gain * (h.sound === 'hat' ? 0.5 : 0.8));
			else mixIn(pcm, tone(h, rate, beatS), at, gain * 0.4);
		}
	return { pcm, sampleRate: rate };
}

function tone(h: Hit, rate: number, beatS: number): Float32Array {
	const pitches = h.sound === 'chord' ? [0, 4, 7].map((k) => (h.pitch ?? 60) + k) : [h.pitch ?? 40];
	const lengthS = h.sound === 'click' ? 0.02 : Math.min(0.35, beatS * 0.8);
	const n = Math.round(lengthS * rate);
	const out = new Float32Array(n);
	for (const p of pitches) {
		const hz = h.sound === 'click' ? 2000 : 440 * 2 ** ((p - 69) / 12);
		for (let i = 0; i < n; i++) {
			const t = i / rate;
			out[i] += (Math.sin(2 * Math.PI * hz * t) * Math.exp(-t / (lengthS / 3))) / pitches.length;
		}
	}
	return out;
}

/** Hits every `step` beats from `from` up to (not including) `to`. */
export function every(step: number, sound: Sound, to: number, from = 0, gain?: number): Hit[] {
	const out: Hit[] = [];
	for (let at = from; at < to - 1e-9; at += step) out.push({ at, sound, gain });
	return out;
}
