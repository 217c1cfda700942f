// A dance's sequence with its tags and restarts, walked through a song: repetitions, the wall
// faced at the end, and whether the music stops near a repetition's end. Positions in counts.
import type { DanceFacts, PhraseEvent } from '../domain';
import { gcd, realignAfterRepetitions } from './phrase-arithmetic';

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
