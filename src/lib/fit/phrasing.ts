// Phrasing: how a dance of C counts lines up with music phrased in P beats, and where the dancer
// stands when the song stops (DESIGN.md, "Phrasing"). All positions are in dance counts.
import type { DanceFacts, PhraseEvent, TrackFacts } from '../domain';
import { secondsForCounts } from './figures';

export function gcd(a: number, b: number): number {
	a = Math.abs(a);
	b = Math.abs(b);
	while (b) {
		const r = a % b;
		a = b;
		b = r;
	}
	return a;
}

export function lcm(a: number, b: number): number {
	return a && b ? Math.abs(a * b) / gcd(a, b) : 0;
}

/** Counts the plain sequence slips against the phrase each repetition: C mod P. */
export function driftCounts(counts: number, phraseCounts: number): number {
	return counts % phraseCounts;
}

/** Repetitions of the plain sequence until it starts on a phrase again: lcm(C, P) ÷ C. */
export function realignAfterRepetitions(counts: number, phraseCounts: number): number {
	return lcm(counts, phraseCounts) / counts;
}

/** Seconds one plain repetition lasts at a count tempo: C × 60 ÷ bpm. */
export function secondsPerRepetition(counts: number, countBpm: number): number {
	return secondsForCounts(counts, countBpm);
}

/**
 * A dance's sequence with its tags and restarts applied: the length in counts of each repetition
 * up to the last one an event touches; every later repetition is the plain C counts.
 * A tag inserts its counts; a restart cuts its repetition after `afterCount` and the sequence
 * begins again from count 1 as a NEW repetition (so a restart also moves the dancer on a wall —
 * common practice (no source): you restart on the wall you face at that point, which we cannot
 * tell from counts alone, so we count it like a finished repetition).
 */
export interface Sequence {
	counts: number;
	walls: 1 | 2 | 4;
	/** lengths[r - 1] = counts danced in repetition r, for r ≤ lengths.length. */
	lengths: number[];
}

// One sequence per dance object: the ranking asks for it once per track. Dances are read, not
// changed, by the engine; a changed events list, count or wall number builds a new one.
const sequences = new WeakMap<object, { events: readonly PhraseEvent[]; seq: Sequence }>();

export function sequenceOf(dance: Pick<DanceFacts, 'counts' | 'walls' | 'events'>): Sequence {
	const cached = sequences.get(dance);
	if (
		cached &&
		cached.events === dance.events &&
		cached.seq.counts === dance.counts &&
		cached.seq.walls === dance.walls
	) {
		return cached.seq;
	}
	const events = dance.events ?? [];
	const seq = buildSequence(dance.counts, dance.walls, events);
	sequences.set(dance, { events, seq });
	return seq;
}

export function buildSequence(
	counts: number,
	walls: 1 | 2 | 4,
	events: readonly PhraseEvent[]
): Sequence {
	// A sequence has at least one whole count; anything else would never finish a repetition.
	counts = Number.isFinite(counts) && counts >= 1 ? Math.round(counts) : 1;
	// Events outside the sequence cannot be danced; they are left out rather than guessed at.
	const valid = events.filter(
		(e) =>
			Number.isInteger(e.repetition) &&
			e.repetition >= 1 &&
			e.afterCount >= 0 &&
			e.afterCount <= counts &&
			(e.kind === 'restart' ? e.afterCount >= 1 : e.lengthCounts > 0)
	);
	const last = valid.reduce((m, e) => Math.max(m, e.repetition), 0);
	const lengths: number[] = [];
	for (let r = 1; r <= last; r++) {
		const here = valid.filter((e) => e.repetition === r);
		const cut = here.reduce(
			(c, e) => (e.kind === 'restart' ? Math.min(c, e.afterCount) : c),
			counts
		);
		let length = cut;
		for (const e of here) if (e.kind === 'tag' && e.afterCount <= cut) length += e.lengthCounts;
		lengths.push(length);
	}
	return { counts, walls, lengths };
}

/**
 * Repetitions until the dance is back in line with the phrase, tags and restarts included.
 * Without events: lcm(C, P) ÷ C. With events (which fall on given repetitions, then the plain
 * sequence carries on): the longest run between two repetitions that start on a phrase, through
 * the events and the plain cycle after them — or null when the events leave the dance out of line
 * for good (after them it can only line up again if its position is a multiple of gcd(C, P)).
 */
export function realignWithEvents(seq: Sequence, phraseCounts: number): number | null {
	const c = seq.counts;
	const plain = realignAfterRepetitions(c, phraseCounts);
	const last = seq.lengths.length;
	if (last === 0) return plain;
	let pos = 0;
	let aligned = 0;
	let longest = plain;
	for (let r = 1; r <= last; r++) {
		pos += seq.lengths[r - 1];
		if (pos % phraseCounts === 0) {
			longest = Math.max(longest, r - aligned);
			aligned = r;
		}
	}
	if (pos % phraseCounts === 0) return longest;
	if (pos % gcd(c, phraseCounts) !== 0) return null;
	for (let j = 1; j <= plain; j++) {
		if ((pos + j * c) % phraseCounts === 0) return Math.max(longest, last + j - aligned);
	}
	return null;
}

/** Wall a repetition starts on (1-based): walls are numbered in the dance's turning direction. */
export function wallOfRepetition(walls: 1 | 2 | 4, repetition: number): number {
	return ((repetition - 1) % walls) + 1;
}

export interface SongWalk {
	/** Whole repetitions danced before the music stops. */
	repetitions: number;
	/** Counts into the repetition in progress when the music stops. */
	intoRepetition: number;
	/** Length of that repetition in counts. */
	currentLength: number;
}

/** Walk the sequence through `availableCounts` counts of music. */
export function walkSong(seq: Sequence, availableCounts: number): SongWalk {
	let pos = 0;
	let reps = 0;
	for (const length of seq.lengths) {
		if (pos + length > availableCounts) {
			return { repetitions: reps, intoRepetition: availableCounts - pos, currentLength: length };
		}
		pos += length;
		reps++;
	}
	const plain = Math.floor((availableCounts - pos) / seq.counts);
	return {
		repetitions: reps + plain,
		intoRepetition: availableCounts - pos - plain * seq.counts,
		currentLength: seq.counts
	};
}

export interface SongEnd {
	repetitions: number;
	/**
	 * The wall faced when the music stops, 1 = the starting wall: the wall the repetition in
	 * progress began on — or, when the song stops at (or within the clean-end margin before) a
	 * repetition's end, the wall that finished repetition leaves you on, i.e. the next one's.
	 * So a 4-wall dance whose song holds exactly 4 repetitions ends on wall 1.
	 */
	endWall: number;
	/** The music stops within `cleanEndCounts` counts of a repetition's end (either side). */
	endsCleanly: boolean;
	/** Counts into the repetition in progress (for reasons). */
	intoRepetition: number;
}

export function songEnd(seq: Sequence, availableCounts: number, cleanEndCounts: number): SongEnd {
	if (!(availableCounts > 0)) {
		return { repetitions: 0, endWall: 1, endsCleanly: false, intoRepetition: 0 };
	}
	const walk = walkSong(seq, availableCounts);
	const justShort = walk.currentLength - walk.intoRepetition <= cleanEndCounts;
	const finished = walk.repetitions + (justShort ? 1 : 0);
	const endsCleanly = finished >= 1 && (justShort || walk.intoRepetition <= cleanEndCounts);
	return {
		repetitions: walk.repetitions,
		endWall: wallOfRepetition(seq.walls, finished + 1),
		endsCleanly,
		intoRepetition: walk.intoRepetition
	};
}

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
	cleanEndCounts = 4
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
