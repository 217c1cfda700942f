// The track as the tracks API sends it (issue 3 lists the fields). Shared by the server, which
// builds it from a row, and the browser, which shows and edits it.
import type { Meter, TempoSource } from '../domain';

export interface TempoCandidateJson {
	bpm: number;
	score: number;
}

export interface TrackJson {
	id: number;
	title: string;
	artist: string;
	album: string;
	durationS: number;
	/** The tempo we trust; null when nothing was measured or entered. */
	bpm: number | null;
	/** What the detector said before half/double resolution. */
	rawBpm: number | null;
	bpmSource: TempoSource;
	offsetS: number;
	confidence: number | null;
	/** The other metrical level's tempo while the DJ has still to check by ear; else null. */
	altBpm: number | null;
	candidates: TempoCandidateJson[];
	meter: Meter;
	phraseBeats: number;
	introBeats: number;
	tagBpm: number | null;
	format: string;
	mimeType: string;
	fileSize: number;
	sha256: string;
	/** The uploader's file name, as display text only. */
	originalName: string;
	createdAt: string;
	updatedAt: string;
	version: number;
}

export interface TrackPage {
	items: TrackJson[];
	nextCursor: string | null;
	total: number;
}

/** Default phrase: 8 bars, so 32 beats in 4/4 and 24 in 3/4 (common practice, no source). */
export const defaultPhraseBeats = (meter: Meter): number => meter * 8;

/** How the tempo was obtained, in the words the pages show. */
export const SOURCE_WORDS: Record<TempoSource, string> = {
	detected: 'measured',
	tapped: 'tapped',
	entered: 'typed in',
	tag: 'from the file’s BPM tag'
};
