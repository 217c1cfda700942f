// 16-bit PCM mono WAV: the canonical 44-byte RIFF header (RIFF, "fmt " with PCM format 1, "data")
// as Microsoft's RIFF/WAVE layout defines it; any WAV reader can check it.

export function encodeWav(samples: Float32Array, sampleRate: number): Uint8Array {
	const dataBytes = samples.length * 2;
	const out = new Uint8Array(44 + dataBytes);
	const view = new DataView(out.buffer);
	const ascii = (at: number, text: string) => {
		for (let i = 0; i < text.length; i++) out[at + i] = text.charCodeAt(i);
	};
	ascii(0, 'RIFF');
	view.setUint32(4, 36 + dataBytes, true);
	ascii(8, 'WAVE');
	ascii(12, 'fmt ');
	view.setUint32(16, 16, true); // fmt chunk size
	view.setUint16(20, 1, true); // PCM
	view.setUint16(22, 1, true); // mono
	view.setUint32(24, sampleRate, true);
	view.setUint32(28, sampleRate * 2, true); // byte rate = rate × block align
	view.setUint16(32, 2, true); // block align = channels × 2 bytes
	view.setUint16(34, 16, true); // bits per sample
	ascii(36, 'data');
	view.setUint32(40, dataBytes, true);
	const pcm = floatToInt16(samples);
	out.set(new Uint8Array(pcm.buffer, pcm.byteOffset, pcm.byteLength), 44);
	return out;
}

/** Clips to [-1, 1] and scales to signed 16-bit (little-endian on every platform we run on). */
export function floatToInt16(samples: Float32Array): Int16Array {
	const pcm = new Int16Array(samples.length);
	for (let i = 0; i < samples.length; i++) {
		const s = Math.max(-1, Math.min(1, samples[i]));
		pcm[i] = s < 0 ? Math.round(s * 32768) : Math.round(s * 32767);
	}
	return pcm;
}
