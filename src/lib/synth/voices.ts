// Drum voices rendered once per song and mixed in at each hit, which keeps a four-minute song
// quick to generate. Shapes are the usual synthesis recipes (common practice, no source):
// a falling sine for the kick, a tone plus noise for the snare, differenced noise for the hat.
import type { Random } from '../random';

export type Voice = Float32Array;

export function kick(sampleRate: number): Voice {
	const n = Math.round(0.3 * sampleRate);
	const out = new Float32Array(n);
	let phase = 0;
	for (let i = 0; i < n; i++) {
		const t = i / sampleRate;
		const freq = 45 + 80 * Math.exp(-t / 0.03);
		phase += (2 * Math.PI * freq) / sampleRate;
		out[i] = Math.sin(phase) * Math.exp(-t / 0.09);
	}
	return out;
}

export function snare(sampleRate: number, random: Random): Voice {
	const n = Math.round(0.2 * sampleRate);
	const out = new Float32Array(n);
	let prev = 0;
	for (let i = 0; i < n; i++) {
		const t = i / sampleRate;
		const white = random() * 2 - 1;
		// A first difference tilts the noise towards the top, as a snare's wires sound.
		const bright = white - 0.5 * prev;
		prev = white;
		const tone = Math.sin(2 * Math.PI * 185 * t) * Math.exp(-t / 0.04);
		out[i] = 0.55 * tone + 0.6 * bright * Math.exp(-t / 0.05);
	}
	return out;
}

export function hat(sampleRate: number, random: Random): Voice {
	const n = Math.round(0.06 * sampleRate);
	const out = new Float32Array(n);
	let prev = 0;
	for (let i = 0; i < n; i++) {
		const t = i / sampleRate;
		const white = random() * 2 - 1;
		out[i] = 0.5 * (white - prev) * Math.exp(-t / 0.012);
		prev = white;
	}
	return out;
}

/** Adds `voice × gain` into `out` starting at sample `at` (clipped at the end). */
export function mixIn(out: Float32Array, voice: Voice, at: number, gain: number): void {
	const start = Math.max(0, Math.round(at));
	const end = Math.min(out.length, start + voice.length);
	for (let i = start; i < end; i++) out[i] += voice[i - start] * gain;
}
