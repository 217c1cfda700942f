import { describe, expect, it } from 'vitest';
import type { PhraseEvent } from '../domain';
import {
	buildSequence,
	driftCounts,
	gcd,
	lcm,
	phrasingFor,
	realignAfterRepetitions,
	realignWithEvents,
	secondsPerRepetition,
	songEnd,
	wallOfRepetition
} from './phrasing';
import { dance, track } from '../testing/fit-facts';

const tag = (repetition: number, afterCount: number, lengthCounts: number): PhraseEvent => ({
	kind: 'tag',
	repetition,
	afterCount,
	lengthCounts
});
const restart = (repetition: number, afterCount: number): PhraseEvent => ({
	kind: 'restart',
	repetition,
	afterCount,
	lengthCounts: 0
});

describe('drift and realignment — common practice (no source), worked examples from issue 4', () => {
	it('a 32-count dance over 32-beat phrases never drifts', () => {
		expect(driftCounts(32, 32)).toBe(0);
		expect(realignAfterRepetitions(32, 32)).toBe(1);
	});
	it('a 40-count dance over 32-beat phrases drifts 8 and realigns after 4 repetitions', () => {
		expect(driftCounts(40, 32)).toBe(8);
		expect(realignAfterRepetitions(40, 32)).toBe(4);
	});
	it('a 48-count dance over 32-beat phrases drifts 16 and realigns after 2', () => {
		expect(driftCounts(48, 32)).toBe(16);
		expect(realignAfterRepetitions(48, 32)).toBe(2);
	});
	it('64 over 32 never drifts; 16 over 32 is back on the phrase every 2', () => {
		expect(driftCounts(64, 32)).toBe(0);
		expect(realignAfterRepetitions(64, 32)).toBe(1);
		expect(realignAfterRepetitions(16, 32)).toBe(2);
	});
	it('gcd and lcm are the school arithmetic they claim (lcm(40, 32) = 160)', () => {
		expect(gcd(40, 32)).toBe(8);
		expect(lcm(40, 32)).toBe(160);
		expect(lcm(0, 32)).toBe(0);
	});
});

describe('time per repetition — plain arithmetic (REFERENCES.md)', () => {
	it('32 counts at 120 BPM last 16 s', () => {
		expect(secondsPerRepetition(32, 120)).toBe(16);
	});
	it('at 0.9× a 120 BPM song is counted at 108, so 32 counts last 17.8 s', () => {
		const p = phrasingFor(dance(), track({ bpm: 120 }), 1, 0.9);
		expect(p.secondsPerRepetition).toBeCloseTo((32 * 60) / 108, 6);
	});
});

describe('walls — common practice (no source)', () => {
	it('a 4-wall dance faces the starting wall again after 4 repetitions', () => {
		expect([1, 2, 3, 4, 5].map((r) => wallOfRepetition(4, r))).toEqual([1, 2, 3, 4, 1]);
		// A song of exactly 4 × 32 counts: the dancer finishes on the wall they started on.
		const end = songEnd(buildSequence(32, 4, []), 128, 4);
		expect(end).toMatchObject({ repetitions: 4, endWall: 1, endsCleanly: true });
	});
	it('a 2-wall dance alternates, a 1-wall dance stays', () => {
		expect([1, 2, 3].map((r) => wallOfRepetition(2, r))).toEqual([1, 2, 1]);
		expect(songEnd(buildSequence(32, 2, []), 96, 4).endWall).toBe(2);
		expect(songEnd(buildSequence(32, 1, []), 96, 4).endWall).toBe(1);
	});
	it('mid-repetition the wall is the one that repetition began on', () => {
		// 2 whole repetitions + 16 counts: dancing repetition 3, begun on wall 3.
		const end = songEnd(buildSequence(32, 4, []), 80, 4);
		expect(end).toMatchObject({ repetitions: 2, endWall: 3, endsCleanly: false });
	});
	it('stopping a few counts short of the end counts as having finished it', () => {
		const end = songEnd(buildSequence(32, 4, []), 125, 4);
		expect(end).toMatchObject({ repetitions: 3, endWall: 1, endsCleanly: true });
		expect(songEnd(buildSequence(32, 4, []), 123, 4).endsCleanly).toBe(false);
		expect(songEnd(buildSequence(32, 4, []), 131, 4).endsCleanly).toBe(true);
		expect(songEnd(buildSequence(32, 4, []), 133, 4).endsCleanly).toBe(false);
	});
	it('a song with no room to dance does not end cleanly', () => {
		expect(songEnd(buildSequence(32, 4, []), -3, 4)).toMatchObject({
			repetitions: 0,
			endsCleanly: false
		});
		expect(songEnd(buildSequence(32, 4, []), 2, 4).endsCleanly).toBe(false);
	});
});

describe('tags and restarts shift the figures', () => {
	it('a tag lengthens its repetition; a restart cuts it', () => {
		expect(buildSequence(32, 4, [tag(3, 32, 4)]).lengths).toEqual([32, 32, 36]);
		expect(buildSequence(40, 4, [restart(2, 24)]).lengths).toEqual([40, 24]);
		// A tag after the cut is never danced.
		expect(buildSequence(32, 4, [restart(1, 16), tag(1, 24, 4)]).lengths).toEqual([16]);
	});
	it('events that cannot be danced are left out', () => {
		const seq = buildSequence(32, 4, [restart(2, 0), restart(2, 40), tag(0, 32, 4), tag(1, 8, 0)]);
		expect(seq.lengths).toEqual([]);
	});
	it('a 4-count tag puts a 32-count dance off 32-beat phrases for good', () => {
		expect(realignWithEvents(buildSequence(32, 4, [tag(3, 32, 4)]), 32)).toBeNull();
	});
	it('a later 28-count tag brings it back: out of line for 4 repetitions at most', () => {
		// Starts: 0, 32, 64 | 100, 132, 164 (4 off) | 224 = 7 phrases, after repetition 6.
		const seq = buildSequence(32, 4, [tag(3, 32, 4), tag(6, 32, 28)]);
		expect(realignWithEvents(seq, 32)).toBe(4);
	});
	it('a 32-count bridge keeps a 32-count dance in phrase', () => {
		expect(realignWithEvents(buildSequence(32, 4, [tag(2, 32, 32)]), 32)).toBe(1);
	});
	it('a restart moves a drifting dance back on the phrase, then the plain cycle resumes', () => {
		// 40 over 32: repetition 2 cut after 24 counts, so repetition 3 starts at 64 = 2 phrases;
		// after that the plain 40-count cycle needs 4 repetitions again.
		expect(realignWithEvents(buildSequence(40, 4, [restart(2, 24)]), 32)).toBe(4);
		// A restart after 20 leaves it at 60 — not a multiple of 8 = gcd(40, 32): never again.
		expect(realignWithEvents(buildSequence(40, 4, [restart(2, 20)]), 32)).toBeNull();
	});
	it('a tag moves where the song ends and on which wall', () => {
		// 32 + 32 + 36 + 32 + 32 = 164 counts: 5 whole repetitions, then wall 2.
		const seq = buildSequence(32, 4, [tag(3, 32, 4)]);
		expect(songEnd(seq, 164, 4)).toMatchObject({ repetitions: 5, endWall: 2, endsCleanly: true });
		// Without the tag the same 164 counts are 5 repetitions and 4 counts: still "clean".
		expect(songEnd(buildSequence(32, 4, []), 164, 4).repetitions).toBe(5);
		expect(songEnd(buildSequence(32, 4, []), 164, 0).endsCleanly).toBe(false);
	});
	it('a restart starts a new repetition, so the dancer moves on a wall sooner', () => {
		// 40 + 24 + 40 = 104 counts: 3 repetitions, the next would begin on wall 4.
		const withRestart = songEnd(buildSequence(40, 4, [restart(2, 24)]), 104, 4);
		expect(withRestart).toMatchObject({ repetitions: 3, endWall: 4, endsCleanly: true });
		// The plain dance is 24 counts into repetition 3 on wall 3 at that point.
		const plain = songEnd(buildSequence(40, 4, []), 104, 4);
		expect(plain).toMatchObject({ repetitions: 2, endWall: 3, endsCleanly: false });
	});
});

describe('phrasingFor a track', () => {
	it('counts from the first beat and past the intro', () => {
		// 120 BPM: 0.5 s offset, 16-beat intro (8 s), then 64 s = 128 counts = 4 repetitions.
		const p = phrasingFor(
			dance(),
			track({ bpm: 120, offsetS: 0.5, introBeats: 16, durationS: 72.5 })
		);
		expect(p).toMatchObject({
			driftCounts: 0,
			realignAfterRepetitions: 1,
			secondsPerRepetition: 16,
			repetitions: 4,
			endWall: 1,
			endsCleanly: true
		});
	});
	it('slowing the song stretches its counts: the repetitions stay the same', () => {
		const t = track({ bpm: 120, durationS: 200 });
		expect(phrasingFor(dance(), t, 1, 0.9).repetitions).toBe(
			phrasingFor(dance(), t, 1, 1).repetitions
		);
	});
	it('counted at half time, a 240 BPM song has half the counts and 16-count phrases', () => {
		const p = phrasingFor(dance({ counts: 32 }), track({ bpm: 240, durationS: 128 }), 0.5);
		expect(p.repetitions).toBe(8);
		expect(p.secondsPerRepetition).toBe(16);
		expect(p.phraseCounts).toBe(16);
		expect(p.driftCounts).toBe(0);
	});
	it('without a measured tempo only the tempo-free figures are given', () => {
		const p = phrasingFor(dance({ counts: 40 }), track({ bpm: null }));
		expect(p).toMatchObject({ driftCounts: 8, realignAfterRepetitions: 4, repetitions: null });
		expect(p.endWall).toBeNull();
		expect(p.endsCleanly).toBeNull();
	});
});
