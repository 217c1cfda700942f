import { describe, expect, it } from 'vitest';
import { fitTrackToDance } from './fit-score';
import { dance, track } from '../testing/fit-facts';

// Song of exactly 8 repetitions of 32 counts at 120 BPM (8 × 16 s).
const clean = track({ bpm: 120, durationS: 128 });

describe('fitTrackToDance', () => {
	it('has the fits API item shape', () => {
		const item = fitTrackToDance(clean, dance());
		expect(Object.keys(item).sort()).toEqual(
			['danceId', 'phrasing', 'reasons', 'score', 'tempo', 'trackId', 'verdict'].sort()
		);
		expect(Object.keys(item.tempo).sort()).toEqual(
			['effectiveBpm', 'rate', 'relation', 'trackBpm'].sort()
		);
		expect(Object.keys(item.phrasing).sort()).toEqual(
			[
				'driftCounts',
				'endWall',
				'endsCleanly',
				'realignAfterRepetitions',
				'repetitions',
				'secondsPerRepetition'
			].sort()
		);
	});
	it('scores a direct, in-phrase, cleanly ending song 1 and says why', () => {
		const item = fitTrackToDance(clean, dance());
		expect(item.score).toBe(1);
		expect(item.verdict).toBeNull();
		expect(item.phrasing).toEqual({
			driftCounts: 0,
			realignAfterRepetitions: 1,
			secondsPerRepetition: 16,
			repetitions: 8,
			endWall: 1,
			endsCleanly: true
		});
		expect(item.reasons).toContain('120 BPM, inside 116–124 BPM');
		expect(item.reasons).toContain('ends on the starting wall');
	});
	it('words a rate change as issue 4 does: "danced at 0.96× — 125 → 120 BPM"', () => {
		const item = fitTrackToDance(track({ bpm: 125 }), dance({ bpmMin: 112, bpmMax: 120 }));
		expect(item.tempo).toEqual({
			trackBpm: 125,
			effectiveBpm: 120,
			rate: 0.96,
			relation: 'direct'
		});
		expect(item.reasons).toContain('danced at 0.96× — 125 → 120 BPM');
	});
	it('scores a rate change lower the further it is from 1', () => {
		// Same song length in counts for each, so only the tempo differs.
		const at = (bpm: number) =>
			fitTrackToDance(track({ bpm, durationS: (128 * 120) / bpm }), dance()).score;
		expect(at(120)).toBeGreaterThan(at(126));
		expect(at(126)).toBeGreaterThan(at(130));
		expect(at(130)).toBeGreaterThan(at(124 / 0.92 - 0.01));
		expect(at(124 / 0.92 - 0.01)).toBeGreaterThan(at(140));
	});
	it('scores half or double time a little below direct', () => {
		const direct = fitTrackToDance(clean, dance()).score;
		const half = fitTrackToDance(track({ bpm: 240, durationS: 128 }), dance());
		const double = fitTrackToDance(track({ bpm: 60, durationS: 128 }), dance());
		expect(half.tempo.relation).toBe('half');
		expect(double.tempo.relation).toBe('double');
		expect(half.score).toBeLessThan(direct);
		expect(half.score).toBeGreaterThan(0.8);
		expect(double.score).toBeLessThan(direct);
		expect(half.reasons).toContain('counted at half time — 240 → 120 BPM');
	});
	it('says how a 40-count dance drifts over 32-beat phrases and scores it lower', () => {
		const item = fitTrackToDance(track({ bpm: 120, durationS: 160 }), dance({ counts: 40 }));
		expect(item.reasons).toContain('drifts 8 counts a repetition, back in line every 4');
		expect(item.score).toBeLessThan(1);
		expect(item.score).toBeGreaterThan(0.7);
	});
	it('fails a meter mismatch outright, with the reason first after any verdict', () => {
		const item = fitTrackToDance(track({ meter: 3 }), dance());
		expect(item.score).toBe(0);
		expect(item.reasons[0]).toBe('3/4 music for a 4/4 dance');
	});
	it('gives an unmeasured track a low score, above a clear tempo misfit', () => {
		const unmeasured = fitTrackToDance(track({ bpm: null }), dance());
		expect(unmeasured.reasons).toContain('tempo not measured yet');
		expect(unmeasured.score).toBeGreaterThan(0);
		expect(unmeasured.score).toBeLessThan(0.25);
		expect(unmeasured.tempo).toEqual({
			trackBpm: null,
			effectiveBpm: null,
			rate: 1,
			relation: 'direct'
		});
		const tooFast = fitTrackToDance(track({ bpm: 150 }), dance());
		expect(tooFast.score).toBeLessThan(unmeasured.score);
		expect(tooFast.reasons[0]).toMatch(/^too fast: 150 BPM would need 0\.83× /);
	});
	it('rewards a song that ends with a repetition', () => {
		const ends = fitTrackToDance(clean, dance()).score;
		const stops = fitTrackToDance(track({ bpm: 120, durationS: 136 }), dance());
		expect(stops.phrasing.endsCleanly).toBe(false);
		expect(stops.reasons).toContain('the music stops 16 counts into a repetition');
		expect(stops.score).toBeLessThan(ends);
	});
	it('penalises a song too short for 2 repetitions, and a very long one', () => {
		const short = fitTrackToDance(track({ bpm: 120, durationS: 16 }), dance());
		expect(short.reasons).toContain('too short for 2 repetitions');
		expect(short.score).toBeLessThan(0.9);
		const long = fitTrackToDance(track({ bpm: 120, durationS: 448 }), dance());
		expect(long.reasons).toContain('a long song as played (7:28)');
		expect(long.score).toBeLessThan(1);
		expect(long.score).toBeGreaterThan(short.score);
	});
	it('names the end wall in the dance’s turning direction', () => {
		// 9 repetitions: the 10th would begin on wall 2.
		const item = fitTrackToDance(track({ bpm: 120, durationS: 144 }), dance({ turn: 'right' }));
		expect(item.phrasing.endWall).toBe(2);
		expect(item.reasons).toContain('ends on wall 2 (a quarter turn to the right)');
	});
});

describe('tags and restarts in the score', () => {
	it('a tag that puts the dance off the phrase for good costs phrasing points, in words', () => {
		const tagged = dance({
			events: [{ kind: 'tag', repetition: 3, afterCount: 32, lengthCounts: 4 }]
		});
		const item = fitTrackToDance(clean, tagged);
		expect(item.phrasing.realignAfterRepetitions).toBeNull();
		expect(item.reasons).toContain(
			'its tags and restarts leave it out of line with 32-count phrases'
		);
		expect(item.score).toBeLessThan(fitTrackToDance(clean, dance()).score);
	});
	it('a restart counts as a new repetition, so the end wall moves', () => {
		// 240 counts (120 s at 120 BPM). Plain: 7 repetitions and 16 counts, dancing on wall 4.
		// With a restart after 16 in repetition 2: 32 + 16 + 6 × 32 = 240, 8 whole repetitions,
		// and the 9th would begin on the starting wall.
		const song = track({ bpm: 120, durationS: 120 });
		expect(fitTrackToDance(song, dance()).phrasing).toMatchObject({
			repetitions: 7,
			endWall: 4,
			endsCleanly: false
		});
		const restarted = dance({
			events: [{ kind: 'restart', repetition: 2, afterCount: 16, lengthCounts: 0 }]
		});
		const item = fitTrackToDance(song, restarted);
		expect(item.phrasing).toMatchObject({ repetitions: 8, endWall: 1, endsCleanly: true });
		expect(item.reasons).toContain('ends on the starting wall');
	});
});

describe('the team’s verdict outranks the computed score', () => {
	it('does-not-fit scores 0 whatever the figures', () => {
		const item = fitTrackToDance(clean, dance(), { verdict: 'does-not-fit' });
		expect(item.score).toBe(0);
		expect(item.verdict).toBe('does-not-fit');
		expect(item.reasons[0]).toBe('the team marked it as not fitting');
	});
	it('fits-at-rate uses the verdict’s rate', () => {
		const item = fitTrackToDance(track({ bpm: 130 }), dance(), {
			verdict: 'fits-at-rate',
			rate: 0.95
		});
		expect(item.tempo.rate).toBe(0.95);
		expect(item.tempo.effectiveBpm).toBeCloseTo(123.5, 6);
		expect(item.reasons[0]).toBe('the team marked it as fitting at 0.95×');
	});
	it('a verdict rate that misses the range a little still scores as out of range', () => {
		// 130 at 0.97× is 126.1, just above 116–124: out of range, so at most the misfit ceiling.
		const item = fitTrackToDance(track({ bpm: 130 }), dance(), {
			verdict: 'fits-at-rate',
			rate: 0.97
		});
		expect(item.score).toBeLessThanOrEqual(0.15);
		expect(item.reasons[1]).toBe('danced at 0.97× — 130 → 126.1 BPM, above 116–124 BPM');
	});
	it('fits-at-rate without a rate falls back to the best rate', () => {
		const item = fitTrackToDance(track({ bpm: 130 }), dance(), { verdict: 'fits-at-rate' });
		expect(item.tempo.rate).toBeCloseTo(124 / 130, 2);
	});
	it('fits takes the song as it is (rate 1)', () => {
		const item = fitTrackToDance(track({ bpm: 130 }), dance(), { verdict: 'fits' });
		expect(item.tempo.rate).toBe(1);
		expect(item.verdict).toBe('fits');
	});
});

describe('scores stay within 0..1', () => {
	it('over a spread of invented tracks and dances', () => {
		for (let bpm = 40; bpm <= 260; bpm += 7) {
			for (const counts of [16, 32, 40, 48, 64]) {
				for (const durationS of [10, 95, 200, 600]) {
					const s = fitTrackToDance(track({ bpm, durationS }), dance({ counts })).score;
					expect(s).toBeGreaterThanOrEqual(0);
					expect(s).toBeLessThanOrEqual(1);
				}
			}
		}
	});
});
