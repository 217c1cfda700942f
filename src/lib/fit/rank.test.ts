import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { TeamVerdict } from './fit-score';
import { fitTrackToDance } from './fit-score';
import { rankDancesForTrack, rankFits } from './rank';
import { dance, track } from '../testing/fit-facts';

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
	it('a short list picked from a long one is the head of the fully sorted list (property)', () => {
		// The reference is the plain full sort (the path taken when most of the list is shown);
		// many equal scores and verdicts make the id tie-break matter.
		const arb = fc.record({
			tempos: fc.array(fc.constantFrom(null, 96, 112, 118, 120, 122, 128, 140, 160), {
				minLength: 16,
				maxLength: 400
			}),
			verdictEvery: fc.integer({ min: 2, max: 9 }),
			idSeed: fc.integer({ min: 1, max: 2 ** 30 }),
			fraction: fc.double({ min: 0, max: 0.12, noNaN: true })
		});
		fc.assert(
			fc.property(arb, ({ tempos, verdictEvery, idSeed, fraction }) => {
				// Distinct ids in a scrambled order (a multiplicative step modulo a prime).
				const tracks = tempos.map((bpm, i) => track({ id: 1 + ((i * idSeed) % 10_007), bpm }));
				const verdicts = new Map<number, TeamVerdict>();
				tracks.forEach((t, i) => {
					if (i % verdictEvery === 0)
						verdicts.set(t.id, { verdict: i % 2 ? 'fits' : 'does-not-fit' });
				});
				const limit = Math.max(1, Math.floor(tracks.length * fraction));
				const head = rankFits(d, tracks, verdicts, null, limit).map((i) => i.trackId);
				const all = rankFits(d, tracks, verdicts).map((i) => i.trackId);
				expect(head).toEqual(all.slice(0, limit));
			}),
			{ numRuns: 150, seed: 20261202 }
		);
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
