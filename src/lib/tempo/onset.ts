// Onset-strength envelope: log-compressed spectral flux, the usual novelty curve for tempo
// estimation (e.g. Müller, "Fundamentals of Music Processing", 2015, ch. 6 — from memory).
// Each frame sums the rise in log magnitude over the bins; a moving average is taken away so
// sustained sound (a pad, steady noise) does not count, only what starts.
import { fft } from './fft';

export interface Envelope {
	/** Novelty per frame, ≥ 0. */
	values: Float32Array;
	/** Rise of the bass (below BASS_HZ, linear magnitude): where the loud low notes fall. */
	bass: Float32Array;
	/** Frames per second. */
	frameRate: number;
	/** Seconds from the start of the PCM to frame 0's onset time. */
	startS: number;
}

const HOP_S = 0.008;
const WINDOW_S = 0.023;
// Compression of magnitudes before the flux (log(1 + 10·|X|)).
const LOG_GAIN = 10;
// Bins above LOW_HZ count only LOW_WEIGHT: the beat lives in kick, snare body and bass, while
// hats (the subdivisions) and hiss are high. Tuned on generated music with
// scripts/analyse/dev-bounds.ts: all bins equal left no lift that suits every song; 300 Hz and
// 0.02 leave the widest window (lift 0.63–0.77). The detector itself low-passes at 240 Hz.
const LOW_HZ = 300;
const LOW_WEIGHT = 0.02;
const MEAN_WINDOW_S = 0.4;
const BASS_HZ = 250;

export function onsetEnvelope(pcm: Float32Array, sampleRate: number): Envelope {
	const hop = Math.max(1, Math.round(sampleRate * HOP_S));
	// The power of two nearest 23 ms (256 samples at 11.025–12 kHz).
	const n = 2 ** Math.round(Math.log2(sampleRate * WINDOW_S));
	const frames = Math.max(0, Math.floor((pcm.length - n) / hop) + 1);
	const hann = new Float64Array(n);
	for (let i = 0; i < n; i++) hann[i] = 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / n);
	const re = new Float64Array(n);
	const im = new Float64Array(n);
	const bins = n >> 1;
	let prev = new Float64Array(bins);
	let cur = new Float64Array(bins);
	const bassBins = Math.max(2, Math.ceil((BASS_HZ * n) / sampleRate));
	const weight = Float64Array.from({ length: bins }, (_, k) =>
		(k * sampleRate) / n > LOW_HZ ? LOW_WEIGHT : 1
	);
	let prevBass = new Float64Array(bassBins);
	let curBass = new Float64Array(bassBins);
	const flux = new Float32Array(frames);
	const bass = new Float32Array(frames);
	for (let f = 0; f < frames; f++) {
		const at = f * hop;
		for (let i = 0; i < n; i++) {
			re[i] = pcm[at + i] * hann[i];
			im[i] = 0;
		}
		fft(re, im);
		let rise = 0;
		for (let k = 1; k < bins; k++) {
			cur[k] = Math.log1p(LOG_GAIN * Math.sqrt(re[k] * re[k] + im[k] * im[k]));
			const d = cur[k] - prev[k];
			if (d > 0 && f > 0) rise += weight[k] * d;
		}
		flux[f] = rise;
		let low = 0;
		for (let k = 1; k < bassBins; k++) {
			curBass[k] = Math.sqrt(re[k] * re[k] + im[k] * im[k]);
			const d = curBass[k] - prevBass[k];
			if (d > 0 && f > 0) low += d;
		}
		bass[f] = low;
		[prev, cur] = [cur, prev];
		[prevBass, curBass] = [curBass, prevBass];
	}
	const values = subtractLocalMean(flux, Math.round(MEAN_WINDOW_S / HOP_S));
	// Frame f's flux marks sound that began inside its window; its centre is the best estimate.
	return { values, bass, frameRate: sampleRate / hop, startS: n / 2 / sampleRate };
}

function subtractLocalMean(x: Float32Array, width: number): Float32Array {
	const out = new Float32Array(x.length);
	const half = Math.max(1, width >> 1);
	let sum = 0;
	let lo = 0;
	let hi = 0;
	for (let i = 0; i < x.length; i++) {
		while (hi < x.length && hi <= i + half) sum += x[hi++];
		while (lo < i - half) sum -= x[lo++];
		out[i] = Math.max(0, x[i] - sum / (hi - lo));
	}
	return out;
}
