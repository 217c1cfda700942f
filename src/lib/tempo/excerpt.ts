// Cutting an excerpt out of a file's bytes before decoding, so a long track decodes in a
// fraction of the time. MP3 is a stream of frames (ISO/IEC 11172-3), so a decoder reads a
// truncated file up to its last whole frame; for WAV a new RIFF header is written in front of
// a block-aligned slice of the data chunk. Pure: testable in Node.

export interface ByteExcerpt {
	bytes: Uint8Array;
	/** Approximate start time of the excerpt in the whole file, seconds. */
	startS: number;
}

/**
 * The head of an MP3 up to about `untilS` (constant bit rate assumed for the length). A cut
 * from the start keeps the decoder's timing exact (its priming and the encoder's delay are
 * handled as for the whole file), which the beat offset needs; a cut in the middle would be
 * off by a frame or two (26–52 ms at 44.1–22.05 kHz) after the decoder resynchronises.
 */
export function mp3Head(
	bytes: Uint8Array,
	durationS: number,
	untilS: number,
	audioStart = 0
): Uint8Array {
	const perS = (bytes.length - audioStart) / durationS;
	// One second more, so that a variable bit rate's slower passages still reach `untilS`.
	const to = Math.ceil(audioStart + (untilS + 1) * perS);
	return to >= bytes.length ? bytes : bytes.subarray(0, to);
}

/** Offset of the first MPEG audio frame after an ID3v2 tag (ID3v2.4.0 structure, 3.1). */
export function id3v2Size(bytes: Uint8Array): number {
	if (bytes.length < 10 || bytes[0] !== 0x49 || bytes[1] !== 0x44 || bytes[2] !== 0x33) return 0;
	// A "syncsafe" integer: four bytes of seven bits each.
	const size =
		((bytes[6] & 0x7f) << 21) |
		((bytes[7] & 0x7f) << 14) |
		((bytes[8] & 0x7f) << 7) |
		(bytes[9] & 0x7f);
	const footer = bytes[5] & 0x10 ? 10 : 0;
	return 10 + size + footer;
}

export function wavExcerpt(bytes: Uint8Array, startS: number, lengthS: number): ByteExcerpt | null {
	const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
	const tag = (at: number) => String.fromCharCode(...bytes.subarray(at, at + 4));
	if (bytes.length < 12 || tag(0) !== 'RIFF' || tag(8) !== 'WAVE') return null;
	let fmt: Uint8Array | null = null;
	let byteRate = 0;
	let blockAlign = 0;
	for (let at = 12; at + 8 <= bytes.length;) {
		const size = view.getUint32(at + 4, true);
		if (tag(at) === 'fmt ') {
			fmt = bytes.subarray(at, at + 8 + size);
			byteRate = view.getUint32(at + 16, true);
			blockAlign = view.getUint16(at + 20, true);
		} else if (tag(at) === 'data' && fmt && byteRate > 0 && blockAlign > 0) {
			const dataStart = at + 8;
			const dataEnd = Math.min(bytes.length, dataStart + size);
			const align = (t: number) => Math.floor((t * byteRate) / blockAlign) * blockAlign;
			const from = Math.min(dataEnd, dataStart + align(startS));
			const to = Math.min(dataEnd, from + align(lengthS));
			const out = new Uint8Array(12 + fmt.length + 8 + (to - from));
			const o = new DataView(out.buffer);
			out.set(bytes.subarray(0, 12));
			o.setUint32(4, out.length - 8, true);
			out.set(fmt, 12);
			const d = 12 + fmt.length;
			out.set([0x64, 0x61, 0x74, 0x61], d); // "data"
			o.setUint32(d + 4, to - from, true);
			out.set(bytes.subarray(from, to), d + 8);
			return { bytes: out, startS: (from - dataStart) / byteRate };
		}
		at += 8 + size + (size & 1); // chunks are padded to an even length
	}
	return null;
}
