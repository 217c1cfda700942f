// Phrasing: how a dance of C counts lines up with music phrased in P beats, and where the dancer
// stands when the song stops (DESIGN.md, "Phrasing"). All positions are in dance counts.
import type { DanceFacts, TrackFacts } from '../domain';
import { driftCounts, secondsPerRepetition } from './phrase-arithmetic';
import { realignWithEvents, sequenceOf, songEnd } from './sequence';
import { DEFAULT_FIT_SETTINGS } from './settings';

export * from './phrase-arithmetic';
export * from './sequence';

/**
 * Counts of music left for dancing: from the first beat (offsetS) past the intro (introBeats)
 * to the end. Counted in track beats × factor (½ when counted at half time, 2 at double), so it
 * does not depend on the playback rate: slowing the song stretches its counts with it.
 */
export function availableCounts(
	track: Pick<TrackFacts, 'durationS' | 'offsetS' | 'introBeats'>,
	trackBpm: number,
	factor: number
): number {
	const beats = (Math.max(0, track.durationS - track.offsetS) * trackBpm) / 60 - track.introBeats;
	return beats * factor;
}

/** The phrase length in dance counts (at least 1, whole): phrase beats × factor. */
export function phraseCounts(phraseBeats: number, factor: number): number {
	const p = Math.round((phraseBeats > 0 ? phraseBeats : 32) * factor);
	return p >= 1 ? p : 1;
}

export interface Phrasing {
	driftCounts: number;
	realignAfterRepetitions: number | null;
	secondsPerRepetition: number | null;
	repetitions: number | null;
	endWall: number | null;
	endsCleanly: boolean | null;
}

export interface PhrasingDetail extends Phrasing {
	phraseCounts: number;
	hasEvents: boolean;
	/** Counts into the repetition in progress when the music stops (null without tempo). */
	intoRepetition: number | null;
}

/**
 * Phrasing figures for a dance to a track. `factor` is the half/double counting factor and
 * `rate` the playback rate; trackBpm null gives the tempo-free figures only.
 */
export function phrasingFor(
	dance: Pick<DanceFacts, 'counts' | 'walls' | 'events'>,
	track: Pick<TrackFacts, 'durationS' | 'offsetS' | 'introBeats' | 'phraseBeats' | 'bpm'>,
	factor = 1,
	rate = 1,
	cleanEndCounts = DEFAULT_FIT_SETTINGS.cleanEndCounts
): PhrasingDetail {
	const seq = sequenceOf(dance);
	const p = phraseCounts(track.phraseBeats, factor);
	const drift = driftCounts(seq.counts, p);
	const realign = realignWithEvents(seq, p);
	const hasEvents = seq.lengths.length > 0;
	const bpm = track.bpm;
	// One object literal per call, no spreads: the ranking calls this 10,000 times.
	if (bpm == null || !(bpm > 0) || !(rate > 0)) {
		return {
			driftCounts: drift,
			realignAfterRepetitions: realign,
			secondsPerRepetition: null,
			repetitions: null,
			endWall: null,
			endsCleanly: null,
			phraseCounts: p,
			hasEvents,
			intoRepetition: null
		};
	}
	const end = songEnd(seq, availableCounts(track, bpm, factor), cleanEndCounts);
	return {
		driftCounts: drift,
		realignAfterRepetitions: realign,
		secondsPerRepetition: secondsPerRepetition(seq.counts, bpm * factor * rate),
		repetitions: end.repetitions,
		endWall: end.endWall,
		endsCleanly: end.endsCleanly,
		phraseCounts: p,
		hasEvents,
		intoRepetition: end.intoRepetition
	};
}
