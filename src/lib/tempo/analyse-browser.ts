// Analysis of one dropped file in the browser: tags with music-metadata, a mono excerpt
// decoded at a low sample rate with the Web Audio API, web-audio-beat-detector's guesses over
// several tempo windows, then our resolution (resolve.ts). Browser APIs only, no framework:
// the music page and `npm run analyse` (headless Chromium) run this same module.
// The detector must run on the main thread (a worker has no OfflineAudioContext); its heavy
// step runs in its own worker, so the page stalls only briefly.
import { parseBlob, type IAudioMetadata } from 'music-metadata';
import { guess } from 'web-audio-beat-detector';
import type { Meter, Rhythm } from '../domain';
import { alternativeOf } from './alternative';
import { id3v2Size, mp3Head, wavExcerpt } from './excerpt';
import { analysePcm, firstBeatS, type TempoCandidate } from './resolve';

export interface AnalyseOptions {
	/**
	 * Decoding rate (default 12 000 Hz); the detector low-passes at 240 Hz and our envelope
	 * looks mostly below 300 Hz, so little is lost. It must be a multiple of 4: the detector
	 * skips `sampleRate / 4` samples after each peak and, at 11 025 or 22 050 Hz, that
	 * fractional index makes it read undefined samples, slowly (seconds instead of tens of ms)
	 * and wrongly (seen in web-audio-beat-detector-worker 6.0.14, get-peaks-at-threshold.js).
	 */
	sampleRate?: number;
	/** Seconds of audio analysed (taken from about a quarter into the track). */
	excerptS?: number;
	/** Tempo windows given to the detector; [] analyses with our own candidates only. */
	windows?: { minTempo: number; maxTempo: number }[];
	meter?: Meter;
	rhythm?: Rhythm;
	signal?: AbortSignal;
}

export interface FileTags {
	title: string | null;
	artist: string | null;
	album: string | null;
	durationS: number;
	tagBpm: number | null;
	/** e.g. "MPEG 1 Layer 3", "WAVE PCM", "FLAC". */
	format: string;
}

export interface FileAnalysis {
	tags: FileTags;
	tempo: {
		bpm: number;
		rawBpm: number;
		offsetS: number;
		confidence: number;
		/** The other metrical level when it is nearly as strong: the DJ should check by ear. */
		alternative: number | null;
		candidates: TempoCandidate[];
		source: 'detected';
		/** The file's BPM tag is within 4 % of the measured tempo (so the tag can be shown as
		 * confirmed); a tag that disagrees is reported in tags.tagBpm and otherwise ignored. */
		tagAgrees: boolean;
	};
	meter: Meter;
	/** Wall-clock time of the whole analysis, and of its parts. */
	ms: number;
	timings: { tagsMs: number; decodeMs: number; detectMs: number; resolveMs: number };
}

/** The detector's own default window first: its answer is reported as rawBpm. */
export const DEFAULT_WINDOWS = [
	{ minTempo: 90, maxTempo: 180 },
	{ minTempo: 60, maxTempo: 120 },
	{ minTempo: 120, maxTempo: 240 }
];
const MIN_AUDIO_S = 5;

export async function analyseFile(file: Blob, o: AnalyseOptions = {}): Promise<FileAnalysis> {
	const t0 = performance.now();
	const rate = o.sampleRate ?? 12000;
	if (rate % 4 !== 0) throw new RangeError('sampleRate must be a multiple of 4');
	const excerptS = o.excerptS ?? 45;
	if (file.size === 0) throw new Error('The file is empty.');
	const meta = await readTags(file);
	const tags = tagsOf(meta);
	const t1 = performance.now();
	o.signal?.throwIfAborted();

	const { pcm, startS } = await decodeExcerpt(file, meta, tags.durationS, rate, excerptS);
	if (pcm.length < MIN_AUDIO_S * rate)
		throw new Error(`The audio is too short to measure a tempo (under ${MIN_AUDIO_S} s).`);
	if (!tags.durationS) tags.durationS = pcm.length / rate;
	const t2 = performance.now();
	o.signal?.throwIfAborted();

	const detected = await detect(pcm, rate, o.windows ?? DEFAULT_WINDOWS);
	const t3 = performance.now();
	let r;
	try {
		r = analysePcm(pcm, rate, { detected, tagBpm: tags.tagBpm, meter: o.meter, rhythm: o.rhythm });
	} catch {
		throw new Error('No steady beat found in this file; tap or type the tempo instead.');
	}
	const t4 = performance.now();
	const beatS = 60 / r.bpm;
	return {
		tags,
		tempo: {
			bpm: r.bpm,
			rawBpm: r.rawBpm,
			offsetS: round3(firstBeatS(startS + r.offsetS, beatS)),
			confidence: r.confidence,
			alternative: alternativeOf(r),
			candidates: r.candidates,
			source: 'detected',
			tagAgrees: tags.tagBpm !== null && Math.abs(r.bpm / tags.tagBpm - 1) <= 0.04
		},
		meter: r.meter,
		ms: Math.round(t4 - t0),
		timings: {
			tagsMs: Math.round(t1 - t0),
			decodeMs: Math.round(t2 - t1),
			detectMs: Math.round(t3 - t2),
			resolveMs: Math.round(t4 - t3)
		}
	};
}

async function readTags(file: Blob): Promise<IAudioMetadata> {
	let meta: IAudioMetadata;
	try {
		meta = await parseBlob(file);
	} catch (e) {
		const why = e instanceof Error ? e.message : String(e);
		if (/end of (the )?stream|EOF|truncat/i.test(why))
			throw new Error('The file is truncated or damaged: its tags end early.');
		throw new Error('Not an audio file: its contents are not a known audio format.');
	}
	if (!meta.format.container && !meta.format.codec)
		throw new Error('Not an audio file: no audio stream was found in it.');
	// music-metadata notes a data chunk longer than the file (a WAV cut short). Its other
	// message, "Data chunk size exceeds file size", also appears on whole files (11.16.1
	// compares after subtracting the chunk), so only this one counts.
	if (meta.quality.warnings.some((w) => /length exceeding file length|truncat/i.test(w.message)))
		throw new Error('The file is truncated or damaged: it ends before its audio does.');
	return meta;
}

function tagsOf(meta: IAudioMetadata): FileTags {
	const f = meta.format;
	const bpm = Number(meta.common.bpm);
	return {
		title: meta.common.title ?? null,
		artist: meta.common.artist ?? null,
		album: meta.common.album ?? null,
		durationS: f.duration && Number.isFinite(f.duration) ? round3(f.duration) : 0,
		tagBpm: Number.isFinite(bpm) && bpm > 0 ? bpm : null,
		format: [f.container, f.codec].filter(Boolean).join(' ')
	};
}

let context: OfflineAudioContext | null = null;
let contextRate = 0;

async function decodeExcerpt(
	file: Blob,
	meta: IAudioMetadata,
	durationS: number,
	rate: number,
	excerptS: number
): Promise<{ pcm: Float32Array; startS: number }> {
	const whole = new Uint8Array(await file.arrayBuffer());
	const long = durationS > excerptS * 1.25;
	// Past the intro, but not far: an MP3 is decoded from its start up to the excerpt's end.
	const startS = long ? Math.min(durationS * 0.25, 30, durationS - excerptS) : 0;
	let bytes: Uint8Array = whole;
	let cutS = 0;
	let sliced = false;
	const container = (meta.format.container ?? '').toUpperCase();
	if (long && container === 'MPEG' && meta.format.codec?.includes('Layer 3')) {
		bytes = mp3Head(whole, durationS, startS + excerptS, id3v2Size(whole));
	} else if (long && container === 'WAVE') {
		const cut = wavExcerpt(whole, startS, excerptS);
		if (cut) {
			bytes = cut.bytes;
			cutS = cut.startS;
			sliced = true;
		}
	}
	if (!context || contextRate !== rate) {
		context = new OfflineAudioContext(1, 1, rate);
		contextRate = rate;
	}
	let buffer: AudioBuffer;
	try {
		// decodeAudioData detaches its argument, so it gets a copy of just these bytes.
		buffer = await context.decodeAudioData(bytes.slice().buffer);
	} catch {
		throw new Error('The file is truncated or damaged: its audio could not be decoded.');
	}
	let pcm = mono(buffer);
	if (bytes === whole && durationS > 0 && buffer.duration < durationS * 0.9 - 1)
		throw new Error('The file is truncated or damaged: it holds less audio than it says.');
	if (long && !sliced) {
		// A whole file or an MP3 head: the excerpt is cut from the decoded samples.
		pcm = pcm.subarray(Math.round(startS * rate), Math.round((startS + excerptS) * rate));
		cutS = startS;
	}
	return { pcm, startS: cutS };
}

function mono(buffer: AudioBuffer): Float32Array {
	if (buffer.numberOfChannels === 1) return buffer.getChannelData(0);
	const out = new Float32Array(buffer.length);
	for (let c = 0; c < buffer.numberOfChannels; c++) {
		const ch = buffer.getChannelData(c);
		for (let i = 0; i < out.length; i++) out[i] += ch[i] / buffer.numberOfChannels;
	}
	return out;
}

async function detect(
	pcm: Float32Array,
	rate: number,
	windows: { minTempo: number; maxTempo: number }[]
): Promise<number[]> {
	if (windows.length === 0) return [];
	const buffer = new AudioBuffer({ length: pcm.length, numberOfChannels: 1, sampleRate: rate });
	buffer.copyToChannel(new Float32Array(pcm), 0);
	const out: number[] = [];
	for (const w of windows) {
		try {
			const g = (await guess(buffer, w)) as { bpm: number; tempo?: number };
			out.push(g.tempo ?? g.bpm);
		} catch {
			// "does not contain any detectable beats" in this window: the others may still find one.
		}
	}
	return out;
}

const round3 = (x: number) => Math.round(x * 1000) / 1000;
