import { describe, expect, it } from 'vitest';
import type { TeamVerdict } from './fit-score';
import { fitTrackToDance } from './fit-score';
import { rankDancesForTrack, rankFits } from './rank';
import { dance, track } from './test-helpers';

const d = dance({ id: 7 });
// Invented tracks: a perfect fit, one needing a rate change, one too fast, one unmeasured.
const perfect = track({ id: 10, bpm: 120, durationS: 128 });
const rated = track({ id: 11, bpm: 130, durationS: 128 });
const tooFast = track({ id: 12, bpm: 160 });
const unmeasured = track({ id: 13, bpm: null });
const alsoPerfect = track({ id: 9, bpm: 120, durationS: 128 });

describe('rankFits', () => {
	it('puts the best computed fit first and breaks ties by track id', () => {
		const items = rankFits(d, [tooFast, rated, perfect, unmeasured, alsoPerfect]);
		expect(items.map((i) => i.trackId)).toEqual([9, 10, 11, 13, 12]);
		for (let k = 1; k < items.length; k++) {
			expect(items[k].score).toBeLessThanOrEqual(items[k - 1].score);
		}
		expect(items.every((i) => i.danceId === 7 && i.reasons.length > 0)).toBe(true);
	});
	it('ranks a track the team says fits above every unverdicted one, whatever its score', () => {
		const verdicts = new Map<number, TeamVerdict>([[12, { verdict: 'fits' }]]);
		const items = rankFits(d, [perfect, tooFast, rated], verdicts);
		expect(items[0].trackId).toBe(12);
		expect(items[0].score).toBeLessThan(items[1].score);
	});
	it('counts fits-at-rate as the team’s fit too, and does-not-fit always last', () => {
		const verdicts: Record<number, TeamVerdict> = {
			10: { verdict: 'does-not-fit' },
			13: { verdict: 'fits-at-rate', rate: 1 }
		};
		const items = rankFits(d, [perfect, rated, tooFast, unmeasured], verdicts);
		expect(items.map((i) => i.trackId)).toEqual([13, 11, 12, 10]);
		expect(items[3].score).toBe(0);
	});
	it('returns only the first `limit` items, the same as the head of the full list', () => {
		const all = rankFits(d, [tooFast, rated, perfect, unmeasured, alsoPerfect]);
		const two = rankFits(d, [tooFast, rated, perfect, unmeasured, alsoPerfect], null, null, 2);
		expect(two).toEqual(all.slice(0, 2));
		expect(rankFits(d, [perfect], null, null, 0)).toEqual([]);
	});
	it('applies the settings: a wider rate bound lets a faster track in', () => {
		const narrow = rankFits(d, [track({ id: 1, bpm: 140 })])[0];
		const wide = rankFits(d, [track({ id: 1, bpm: 140 })], null, { maxRateChange: 0.15 })[0];
		expect(wide.score).toBeGreaterThan(narrow.score);
		expect(wide.tempo.rate).toBeLessThan(1);
	});
});

describe('shared sentences', () => {
	it('a ranking words every item exactly as a single fit would', () => {
		const tracks = [];
		for (let i = 0; i < 300; i++) {
			const bpm = i % 17 === 0 ? null : 90 + ((i * 7) % 80) + (i % 3) * 0.5;
			tracks.push(
				track({ id: i, bpm, durationS: 60 + ((i * 13) % 300), meter: i % 11 === 0 ? 3 : 4 })
			);
		}
		const verdicts = new Map<number, TeamVerdict>([
			[5, { verdict: 'fits-at-rate', rate: 0.97 }],
			[6, { verdict: 'fits' }],
			[7, { verdict: 'does-not-fit' }]
		]);
		const ranked = rankFits(d, tracks, verdicts);
		expect(ranked).toHaveLength(300);
		for (const item of ranked) {
			const t = tracks[item.trackId];
			expect(item).toEqual(fitTrackToDance(t, d, verdicts.get(t.id) ?? null));
		}
	});
});

describe('rankDancesForTrack', () => {
	const waltz = dance({ id: 3, meter: 3, bpmMin: 84, bpmMax: 90, rhythm: 'waltz' });
	const stomp = dance({ id: 1 });
	const quick = dance({ id: 2, bpmMin: 150, bpmMax: 160 });
	it('ranks the dances a track suits, best first', () => {
		const items = rankDancesForTrack(perfect, [waltz, quick, stomp]);
		expect(items.map((i) => i.danceId)).toEqual([1, 2, 3]);
		expect(items[2].score).toBe(0);
		expect(items.every((i) => i.trackId === 10)).toBe(true);
	});
	it('lets the team’s verdicts outrank it by dance id', () => {
		const verdicts = new Map<number, TeamVerdict>([
			[2, { verdict: 'fits' }],
			[1, { verdict: 'does-not-fit' }]
		]);
		expect(
			rankDancesForTrack(perfect, [waltz, quick, stomp], verdicts).map((i) => i.danceId)
		).toEqual([2, 3, 1]);
	});
});
