// MP3 through lamejs (a JavaScript port of LAME): mono, constant bit rate.
import { Mp3Encoder } from '@breezystack/lamejs';
import { floatToInt16 } from './wav';

// LAME encodes 1152-sample frames; feeding a multiple of that keeps its buffers small.
const CHUNK = 1152 * 32;

export function encodeMp3(samples: Float32Array, sampleRate: number, kbps = 40): Uint8Array {
	const encoder = new Mp3Encoder(1, sampleRate, kbps);
	const pcm = floatToInt16(samples);
	const parts: Uint8Array[] = [];
	for (let i = 0; i < pcm.length; i += CHUNK) {
		const part = encoder.encodeBuffer(pcm.subarray(i, i + CHUNK));
		if (part.length > 0) parts.push(part.slice());
	}
	parts.push(encoder.flush().slice());
	const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
	let at = 0;
	for (const p of parts) {
		out.set(p, at);
		at += p.length;
	}
	return out;
}
