// The planner rules a DJ sets (issue 12): no clips on the floor, no track twice in a night, and
// rests only where the evening puts them or its form asks. The minimums are issue 12's defaults
// (90 s, two repetitions); "a repetition is counts × 60 ÷ count tempo" is plain arithmetic.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planEvening } from './index';
import { inventEvening } from './invented';
import { longEnough } from './prepare';
import { DEFAULT_SETTINGS } from './settings';
import type { PlanInput, PlanResult } from './types';

const quick = { iterations: 300, timeBudgetMs: 1e9 };

/** An invented two-hour evening where every third track is cut down to a clip of 20–139 s. */
function withClips(seed: number): PlanInput {
	const input = inventEvening({ seed, dances: 40, tracks: 300, minutes: 120 });
	const tracks = input.tracks.map((t, i) =>
		i % 3 === 0 ? { ...t, durationS: 20 + ((i * 37 + seed) % 120) } : t
	);
	return { ...input, tracks };
}

/** Checks each planned dance against the length rule, recomputed here from the input. */
function shortEntries(input: PlanInput, plan: PlanResult, minTrackS = 90, reps = 2): string[] {
	const bad: string[] = [];
	for (const e of plan.entries) {
		if (e.kind !== 'dance' || e.locked || e.trackId === null) continue;
		const d = input.dances.find((x) => x.id === e.danceId)!;
		const t = input.tracks.find((x) => x.id === e.trackId)!;
		if (e.durationS < minTrackS) bad.push(`${t.title}: ${e.durationS} s`);
		// The count tempo folded into the dance's range (half or double time), as counted.
		const eff = (t.bpm ?? (d.bpmMin + d.bpmMax) / 2) * e.rate;
		const off = (b: number) => Math.max(d.bpmMin - b, b - d.bpmMax, 0);
		const bpm = [eff, eff / 2, eff * 2].reduce((a, b) => (off(b) < off(a) ? b : a));
		if (e.durationS + 1e-9 < (reps * d.counts * 60) / bpm) bad.push(`${t.title}: < ${reps} reps`);
	}
	return bad;
}

describe('length rule', () => {
	const dance = { counts: 96, bpmMin: 100, bpmMax: 130 };
	it('refuses anything under 90 s, whatever the dance', () => {
		expect(longEnough({ ...dance, counts: 16 }, 89.9, 120, DEFAULT_SETTINGS)).toBe(false);
		expect(longEnough({ ...dance, counts: 16 }, 90, 120, DEFAULT_SETTINGS)).toBe(true);
	});
	it('refuses music shorter than two repetitions: 96 counts at 100 BPM are 57.6 s each', () => {
		expect(longEnough(dance, 115, 100, DEFAULT_SETTINGS)).toBe(false);
		expect(longEnough(dance, 115.2, 100, DEFAULT_SETTINGS)).toBe(true);
		// 200 BPM counted at half time is the same 100 BPM of counts.
		expect(longEnough(dance, 115, 200, DEFAULT_SETTINGS)).toBe(false);
		expect(longEnough(dance, 116, 200, DEFAULT_SETTINGS)).toBe(true);
	});
	it('follows the settings', () => {
		const loose = { minTrackS: 20, minRepetitions: 1 };
		expect(longEnough({ ...dance, counts: 16 }, 30, 120, loose)).toBe(true);
		expect(longEnough(dance, 60, 100, { minTrackS: 20, minRepetitions: 2 })).toBe(false);
	});

	it('never plans the 30-second clip of issue 12, even at a 99 % fit marked "fits"', () => {
		const input = withClips(3);
		const clip = {
			id: 'clip',
			title: 'Brief Lantern',
			artist: 'The Tamsels',
			durationS: 30,
			bpm: 112
		};
		const fits = input.dances.map((d) => ({
			danceId: d.id,
			trackId: clip.id,
			score: 0.99,
			verdict: 'fits' as const,
			rate: 1
		}));
		const plan = planEvening({
			...input,
			tracks: [...input.tracks, clip],
			fits: [...input.fits, ...fits],
			settings: quick
		});
		expect(plan.entries.some((e) => e.trackId === 'clip')).toBe(false);
		expect(plan.entries.filter((e) => e.kind === 'dance').length).toBeGreaterThan(10);
	});
});

describe('planner rules, on invented evenings full of clips (property)', () => {
	it('plans no short track, no track twice, and rests only where the sections put them', () => {
		fc.assert(
			fc.property(fc.integer({ min: 1, max: 1_000_000 }), (seed) => {
				const input = withClips(seed);
				const plan = planEvening({ ...input, settings: { ...quick, seed } });
				expect(shortEntries(input, plan)).toEqual([]);
				const tracks = plan.entries.flatMap((e) => (e.trackId === null ? [] : [e.trackId]));
				expect(new Set(tracks).size).toBe(tracks.length);
				const breakSections = new Set(
					input.evening.sections.filter((s) => s.kind === 'break').map((s) => s.id)
				);
				for (const e of plan.entries.filter((x) => x.kind === 'break')) {
					expect(breakSections.has(e.sectionId!), JSON.stringify(e)).toBe(true);
				}
			}),
			{ numRuns: 5, seed: 12 }
		);
	});

	it('with the setting on, each extra rest names it, and no stretch runs past it', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 1, max: 1_000_000 }),
				fc.integer({ min: 25, max: 50 }),
				(seed, every) => {
					const input = withClips(seed);
					const plan = planEvening({
						...input,
						settings: { ...quick, seed, breakEveryMin: every }
					});
					expect(shortEntries(input, plan)).toEqual([]);
					const rests = plan.entries.filter((e) => e.kind === 'break');
					const named = `"a rest after every ${every} minutes of dancing"`;
					for (const r of rests) {
						const inSection = input.evening.sections.some(
							(s) => s.id === r.sectionId && s.kind === 'break'
						);
						if (!inSection) expect(r.reasons.join(' ')).toContain(named);
					}
					expect(plan.violations.filter((v) => v.includes('of dancing'))).toEqual([]);
				}
			),
			{ numRuns: 4, seed: 7 }
		);
	});

	it('the minimums are settings: a looser one lets a 60 s track back in', () => {
		const input = withClips(5);
		const strict = planEvening({ ...input, settings: quick });
		const loose = planEvening({
			...input,
			settings: { ...quick, minTrackS: 20, minRepetitions: 1 }
		});
		const shortest = (p: PlanResult) =>
			Math.min(...p.entries.filter((e) => e.kind === 'dance').map((e) => e.durationS));
		expect(shortest(strict)).toBeGreaterThanOrEqual(90);
		expect(shortest(loose)).toBeLessThan(90);
	});
});
