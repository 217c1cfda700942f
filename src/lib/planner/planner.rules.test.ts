// The planner rules a DJ sets (issue 12): no clips on the floor, no track twice in a night, and
// rests only where the evening puts them or its form asks. The minimums are issue 12's defaults
// (90 s, two repetitions); "a repetition is counts × 60 ÷ count tempo" is plain arithmetic.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkRunOrder } from './check';
import { planEvening } from './index';
import { inventEvening } from './invented';
import { longEnough } from './prepare';
import { DEFAULT_SETTINGS } from './settings';
import type { Id, PlanInput, PlanResult } from './types';

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

// Line and partner dances (issue 12): a country night alternates them, about one partner dance
// after every few line dances, and two partner dances never run on (common practice, no
// source). The invented catalogue gets every third dance as a partner dance.
describe('formation rule, on invented evenings (property)', () => {
	function withPartners(seed: number): PlanInput {
		const input = inventEvening({ seed, dances: 40, tracks: 300, minutes: 180 });
		const dances = input.dances.map((d, i) => ({
			...d,
			formation: i % 3 === 0 ? ('partner' as const) : ('line' as const)
		}));
		return { ...input, dances };
	}
	/** The night as a string: P partner, l line or circle, | a rest; lesson plays included. */
	function shape(input: PlanInput, plan: PlanResult): string {
		const partner = new Set(input.dances.filter((d) => d.formation === 'partner').map((d) => d.id));
		return plan.entries
			.filter((e) => e.kind === 'dance' || e.kind === 'break')
			.map((e) => (e.kind === 'break' ? '|' : partner.has(e.danceId!) ? 'P' : 'l'))
			.join('');
	}

	it('never two partner dances in a row; about one in four dances is a partner dance', () => {
		fc.assert(
			fc.property(fc.integer({ min: 1, max: 1_000_000 }), (seed) => {
				const input = withPartners(seed);
				const plan = planEvening({ ...input, settings: { ...quick, seed } });
				const night = shape(input, plan);
				expect(night, night).not.toContain('PP');
				expect(
					checkRunOrder(input, plan.entries).filter((p) => p.rule === 'partner-twice')
				).toEqual([]);
				// "One after every 3 line dances" is 1 in 4; a rest or the lesson shifts it a little.
				const share = (night.match(/P/g) ?? []).length / night.replace(/\|/g, '').length;
				expect(share, night).toBeGreaterThan(0.18);
				expect(share, night).toBeLessThan(0.32);
				// No run of line dances longer than the setting plus two.
				expect(
					night
						.split(/P/)
						.slice(1, -1)
						.every((run) => run.replace(/\|/g, '').length <= 5)
				).toBe(true);
			}),
			{ numRuns: 5, seed: 21 }
		);
	});

	it('the spacing and the back-to-back rule are the evening’s settings', () => {
		const input = withPartners(9);
		const one = planEvening({ ...input, settings: { ...quick, partnerEvery: 1 } });
		const oneNight = shape(input, one);
		// Every other dance a partner dance: the share is near a half.
		const dancesOnly = oneNight.replace(/\|/g, '');
		expect((dancesOnly.match(/P/g) ?? []).length / dancesOnly.length, oneNight).toBeGreaterThan(
			0.35
		);
		expect(oneNight).not.toContain('PP');
		// Only partner dances in the catalogue: with back to back allowed they follow each other.
		const partnersOnly = {
			...input,
			dances: input.dances.map((d) => ({ ...d, formation: 'partner' as const }))
		};
		const allowed = planEvening({
			...partnersOnly,
			settings: { ...quick, partnerBackToBack: true }
		});
		expect(shape(partnersOnly, allowed)).toContain('PP');
		expect(allowed.violations).toEqual([]);
		// Not allowed, the same catalogue cannot fill the night without breaking the rule: the
		// plan says so in words instead of hiding it.
		const refused = planEvening({ ...partnersOnly, settings: quick });
		const night = shape(partnersOnly, refused);
		if (night.includes('PP'))
			expect(refused.violations.join(' ')).toMatch(/second partner dance in a row/);
	});

	it('a partner dance says so in its reasons, naming the evening’s setting', () => {
		const input = withPartners(4);
		const plan = planEvening({ ...input, settings: quick });
		const partner = new Set(input.dances.filter((d) => d.formation === 'partner').map((d) => d.id));
		const social = plan.entries.filter(
			(e) =>
				e.kind === 'dance' && partner.has(e.danceId!) && e.reasons.some((r) => /partner/.test(r))
		);
		expect(social.length).toBeGreaterThan(3);
		expect(social[0].reasons.join(' ')).toContain('"a partner dance after every 3 line dances"');
	});
});

// Requests both ways (issue 12): a request the team accepted goes into the request block before
// the ones still waiting.
describe('accepted requests come first in the request block', () => {
	const input = inventEvening({ seed: 31, dances: 40, tracks: 300, minutes: 240 });
	const lesson = input.evening.sections.find((s) => s.kind === 'lesson')!.danceId;
	const fitted = new Set(input.fits.filter((f) => f.score >= 0.5).map((f) => f.danceId));
	const asked = input.dances
		.filter((d) => d.id !== lesson && fitted.has(d.id))
		.slice(0, 4)
		.map((d) => d.id);

	/** The requested dances in the block's order, with the `accepted` ones marked first. */
	function blockOrder(accepted: Set<Id>): Id[] {
		const plan = planEvening({
			...input,
			requests: asked.map((danceId) =>
				accepted.has(danceId) ? { danceId, weight: 2, first: true } : { danceId }
			),
			settings: quick
		});
		return plan.entries
			.filter((e) => e.sectionId === 's3' && e.kind === 'dance' && asked.includes(e.danceId!))
			.map((e) => e.danceId!);
	}

	it('whichever two are accepted, they are played before the two still waiting', () => {
		expect(asked).toHaveLength(4);
		for (const accepted of [new Set(asked.slice(2)), new Set(asked.slice(0, 2))]) {
			const order = blockOrder(accepted);
			expect(order.length, JSON.stringify(order)).toBeGreaterThanOrEqual(3);
			const lastAccepted = Math.max(...order.map((id, i) => (accepted.has(id) ? i : -1)));
			const firstWaiting = order.findIndex((id) => !accepted.has(id));
			expect(lastAccepted, JSON.stringify(order)).toBeLessThan(firstWaiting);
		}
	});
});
