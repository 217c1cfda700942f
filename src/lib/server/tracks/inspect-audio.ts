// The server's own look at an upload: the real type from the bytes (file-type reads magic
// numbers, not the name the browser sent) and a parse with music-metadata for the duration,
// the format and the tags. Whatever the browser claimed, this decides what is stored.
import { fileTypeFromBuffer } from 'file-type';
import { parseBuffer } from 'music-metadata';
import { minutesSeconds } from '../../format';

/** Types a browser can decode and a DJ brings (extension → the Content-Type we serve). */
const ACCEPTED: Record<string, string> = {
	mp3: 'audio/mpeg',
	wav: 'audio/wav',
	flac: 'audio/flac',
	ogg: 'audio/ogg',
	oga: 'audio/ogg',
	opus: 'audio/ogg',
	m4a: 'audio/mp4',
	aac: 'audio/aac',
	aif: 'audio/aiff'
};

/** Shorter than this is not a song (and is what a cut-off file usually leaves). */
const MIN_DURATION_S = 1;

/** An MP3 whose bytes hold less than this share of what its header promises is cut off. */
const CUT_OFF_SHARE = 0.9;

/**
 * How many seconds of MPEG audio the bytes can hold at the stream's (average) bitrate. A Xing or
 * VBRI header states a frame count, so music-metadata's duration is the header's promise, not
 * the audio present: a download cut short kept its full length (dead air in a planned night).
 * Tags make a file longer than its audio, never shorter, so this errs towards keeping a file.
 */
function mp3SecondsPresent(size: number, bitrate: number | undefined): number | null {
	if (!bitrate || !Number.isFinite(bitrate) || bitrate <= 0) return null;
	return (size * 8) / bitrate;
}

export interface AudioFacts {
	ext: string;
	mimeType: string;
	format: string;
	durationS: number;
	title?: string;
	artist?: string;
	album?: string;
	tagBpm?: number;
}

export type Inspection =
	{ ok: true; facts: AudioFacts } | { ok: false; status: 415 | 422; error: string };

const refuse = (status: 415 | 422, error: string): Inspection => ({ ok: false, status, error });

export async function inspectAudio(bytes: Uint8Array): Promise<Inspection> {
	if (bytes.length === 0) return refuse(422, 'The file is empty.');
	const type = await fileTypeFromBuffer(bytes);
	if (!type) {
		return refuse(415, 'This file is not audio: its contents match no sound format we know.');
	}
	const mimeType = ACCEPTED[type.ext];
	if (!mimeType) {
		return refuse(
			415,
			`This file is ${type.mime}, not audio we can keep (MP3, WAV, FLAC, Ogg, M4A, AAC or AIFF).`
		);
	}
	let meta;
	try {
		meta = await parseBuffer(
			bytes,
			{ mimeType: type.mime, size: bytes.length },
			{ duration: true }
		);
	} catch (e) {
		return refuse(422, `The audio cannot be read: ${(e as Error).message}.`);
	}
	// music-metadata notes when a WAV's data chunk runs past the end of the file: cut off.
	if (meta.quality.warnings.some((w) => /exceed\w* file length/i.test(w.message))) {
		return refuse(422, 'The file is cut off: it ends before its audio does.');
	}
	let durationS = meta.format.duration;
	if (!durationS || !Number.isFinite(durationS) || durationS < MIN_DURATION_S) {
		return refuse(422, 'The file holds no playable audio (it is cut off or too short).');
	}
	if (type.ext === 'mp3') {
		const there = mp3SecondsPresent(bytes.length, meta.format.bitrate);
		if (there !== null && there < durationS * CUT_OFF_SHARE) {
			return refuse(
				422,
				`The file is cut off: its header says ${minutesSeconds(durationS)}, but only about ${minutesSeconds(there)} of audio is there.`
			);
		}
		if (there !== null) durationS = Math.min(durationS, there);
	}
	const c = meta.common;
	const format = [meta.format.container, meta.format.codec].filter(Boolean).join(' · ');
	return {
		ok: true,
		facts: {
			ext: type.ext,
			mimeType,
			format: format || type.ext.toUpperCase(),
			durationS,
			title: c.title?.trim() || undefined,
			artist: c.artist?.trim() || undefined,
			album: c.album?.trim() || undefined,
			tagBpm: typeof c.bpm === 'number' && c.bpm > 0 && c.bpm < 400 ? c.bpm : undefined
		}
	};
}
