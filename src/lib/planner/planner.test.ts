import { describe, expect, it } from 'vitest';
import { checkRunOrder } from './check';
import { planEvening, plainGreedy } from './index';
import { inventEvening } from './invented';
import type { PlanDance, PlanFit, PlanInput, PlanTrack } from './types';

// Invented catalogue and music for hand-made examples.
const dance = (id: number, over: Partial<PlanDance> = {}): PlanDance => ({
	id,
	name: `Velora Step ${id}`,
	level: 'beginner',
	rhythm: (['cha-cha', 'polka', 'two-step', 'shuffle', 'rock'] as const)[id % 5],
	counts: 32,
	walls: 4,
	bpmMin: 100,
	bpmMax: 130,
	wellKnown: true,
	...over
});
const track = (id: number, durationS: number, bpm = 112): PlanTrack => ({
	id,
	title: `Quiet Lantern ${id}`,
	artist: 'The Tamsels',
	durationS,
	bpm
});
const fit = (danceId: number, trackId: number, over: Partial<PlanFit> = {}): PlanFit => ({
	danceId,
	trackId,
	score: 0.9,
	verdict: 'fits',
	rate: 1,
	...over
});
const at = (hhmm: string) => `2026-12-05T${hhmm}:00Z`;
const quick = { iterations: 400, timeBudgetMs: 1e9 };

describe('worked examples of the timing (plain arithmetic)', () => {
	it('lays three tracks of 180, 200 and 175 s into a 10-minute floor with 15 s changeovers', () => {
		const input: PlanInput = {
			evening: {
				startsAt: at('20:00'),
				endsAt: at('20:10'),
				crowd: 'mixed',
				sections: [{ id: 'f', kind: 'open-floor', startS: 0, endS: 600 }]
			},
			dances: [dance(1), dance(2), dance(3)],
			tracks: [track(11, 180), track(12, 200), track(13, 175)],
			fits: [fit(1, 11), fit(2, 12), fit(3, 13)],
			settings: { ...quick, endToleranceS: 20 }
		};
		const plan = planEvening(input);
		expect(plan.violations).toEqual([]);
		const durs = plan.entries.map((e) => e.durationS);
		expect(durs.slice().sort((a, b) => a - b)).toEqual([175, 180, 200]);
		// Starts: 0, d1 + 15, d1 + d2 + 30; the floor ends at 180 + 200 + 175 + 30 = 585 s, inside
		// the window 600 − 20 … 600.
		expect(plan.entries.map((e) => e.startS)).toEqual([0, durs[0] + 15, durs[0] + durs[1] + 30]);
		const end = plan.entries[2].startS + plan.entries[2].durationS;
		expect(end).toBe(585);
	});

	it('fills a 19:30–20:15 lesson: teach, walkthrough, then the dance at 0.85×', () => {
		const input: PlanInput = {
			evening: {
				startsAt: at('19:30'),
				endsAt: at('20:30'),
				crowd: 'mostly-beginners',
				sections: [
					{ id: 'l', kind: 'lesson', startS: 0, endS: 2700, danceId: 1 },
					{ id: 'f', kind: 'open-floor', startS: 2700, endS: 3600 }
				]
			},
			dances: [dance(1), dance(2), dance(3), dance(4), dance(5)],
			tracks: [track(11, 204), track(12, 210), track(13, 200), track(14, 190), track(15, 220)],
			fits: [fit(1, 11, { lessonRate: 0.85 }), fit(1, 12), fit(2, 13), fit(3, 14), fit(4, 15)],
			settings: { ...quick, walkthroughLengthMin: 3 }
		};
		const plan = planEvening(input);
		expect(plan.violations).toEqual([]);
		const [teach, walk, slow] = plan.entries;
		// 204 s ÷ 0.85 = 240 s. The lesson ends one 15 s changeover before the open floor, as a
		// saved run order lays it out, and the teach fills the rest:
		// 2700 − 15 − 240 − 180 − 2 × 15 = 2235 s.
		expect(slow).toMatchObject({
			kind: 'dance',
			danceId: 1,
			trackId: 11,
			rate: 0.85,
			startS: 2445
		});
		expect(slow.durationS).toBeCloseTo(240, 9);
		expect(walk).toMatchObject({ kind: 'walkthrough', danceId: 1, startS: 2250, durationS: 180 });
		expect(teach).toMatchObject({ kind: 'teach', danceId: 1, startS: 0, durationS: 2235 });
		// The open floor's first entry starts at its section's start, after the changeover.
		expect(plan.entries[3].startS).toBe(2700);
		expect(slow.reasons).toContain('taught in the lesson at 0.85×');
		// And again later at full tempo, to the other track (no track twice).
		const again = plan.entries.filter((e) => e.danceId === 1 && e.startS >= 2700);
		expect(again).toHaveLength(1);
		expect(again[0]).toMatchObject({ trackId: 12, rate: 1 });
		expect(again[0].reasons.join(' ')).toMatch(/again at full tempo/);
	});
});

describe('the planner on an invented four-hour evening', () => {
	const input = inventEvening({ seed: 42, dances: 120, tracks: 700, minutes: 240 });
	// This evening's form asks for a rest after every 45 minutes of dancing (off by default).
	const settings = { iterations: 3000, timeBudgetMs: 1e9, breakEveryMin: 45 };
	const plan = planEvening({ ...input, settings });

	it('keeps every hard rule, checked independently of the search', () => {
		expect(plan.violations).toEqual([]);
		expect(checkRunOrder({ ...input, settings }, plan.entries)).toEqual([]);
	});

	it('numbers the entries in order and lays them out without overlap', () => {
		plan.entries.forEach((e, i) => {
			expect(e.position).toBe(i);
			if (i > 0) {
				const prev = plan.entries[i - 1];
				expect(e.startS).toBeGreaterThanOrEqual(prev.startS + prev.durationS);
			}
		});
	});

	it('inserts the rests the evening asks for and names the setting', () => {
		const breaks = plan.entries.filter((e) => e.kind === 'break');
		expect(breaks.length).toBeGreaterThanOrEqual(2);
		const added = breaks.filter((b) =>
			b.reasons.some((r) =>
				/^rest after \d+ minutes of dancing, as the evening's setting "a rest after every 45 minutes of dancing" asks$/.test(
					r
				)
			)
		);
		expect(added.length).toBeGreaterThanOrEqual(1);
	});

	it('gives every entry reasons, and every dance its fit score', () => {
		for (const e of plan.entries) expect(e.reasons.length).toBeGreaterThan(0);
		for (const e of plan.entries.filter((x) => x.kind === 'dance')) {
			expect(e.reasons.some((r) => /score \d/.test(r))).toBe(true);
		}
	});

	it('honours the must-play and keeps never-play dances and tracks out', () => {
		const must = input.mustPlay![0];
		expect(plan.entries.some((e) => e.danceId === must)).toBe(true);
		for (const e of plan.entries) {
			expect(input.neverPlay!.danceIds).not.toContain(e.danceId);
			expect(input.neverPlay!.trackIds).not.toContain(e.trackId);
		}
	});

	it('ends with a well-known, easy last dance', () => {
		const last = plan.entries.filter((e) => e.kind === 'dance').at(-1)!;
		const d = input.dances.find((x) => x.id === last.danceId)!;
		expect(d.wellKnown).toBe(true);
		expect(['absolute-beginner', 'beginner']).toContain(d.level);
		expect(last.reasons).toContain('last dance: well known and easy');
	});

	it('gives the same plan for the same seed', () => {
		const again = planEvening({ ...input, settings });
		expect(again.entries).toEqual(plan.entries);
		expect(again.objective).toEqual(plan.objective);
	});

	it('starts the social dancing easier than it goes on', () => {
		const rank = (id: unknown) =>
			['absolute-beginner', 'beginner', 'improver', 'intermediate', 'advanced'].indexOf(
				input.dances.find((d) => d.id === id)!.level
			);
		const social = plan.entries.filter((e) => e.kind === 'dance' && e.sectionId !== 's1');
		const first = social[0].startS;
		const early = social.filter((e) => e.startS - first < 1800).map((e) => rank(e.danceId));
		const later = social.filter((e) => e.startS - first >= 1800).map((e) => rank(e.danceId));
		const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
		expect(mean(early)).toBeLessThan(mean(later));
	});

	it('adds up its objective from its terms', () => {
		const sum = Object.values(plan.objective.terms).reduce((a, b) => a + b, 0);
		expect(plan.objective.total).toBeCloseTo(sum, 9);
		expect(plan.objective.terms.hard).toBe(0);
	});

	it('re-plans around locked entries without moving them', () => {
		const picks = plan.entries.filter((e) => e.kind === 'dance' && e.startS > 3000).slice(2, 5);
		const locked = picks.map((e) => ({
			position: e.position,
			startS: e.startS,
			entry: {
				kind: e.kind,
				danceId: e.danceId,
				trackId: e.trackId,
				durationS: e.durationS,
				rate: e.rate,
				sectionId: e.sectionId
			}
		}));
		const again = planEvening({ ...input, settings, locked, seed: 99 });
		expect(again.violations).toEqual([]);
		for (const l of locked) {
			const kept = again.entries.find((e) => e.locked && e.startS === l.startS)!;
			expect(kept).toMatchObject({
				danceId: l.entry.danceId,
				trackId: l.entry.trackId,
				durationS: l.entry.durationS
			});
			expect(kept.reasons).toContain('locked by the team');
		}
		expect(checkRunOrder({ ...input, settings, locked }, again.entries)).toEqual([]);
	});
});

describe('fit rules', () => {
	it('never plays a track the team marked "does not fit", however high its score', () => {
		const input: PlanInput = {
			evening: {
				startsAt: at('20:00'),
				endsAt: at('20:10'),
				crowd: 'mixed',
				sections: [{ id: 'f', kind: 'open-floor', startS: 0, endS: 600 }]
			},
			dances: [dance(1), dance(2), dance(3)],
			tracks: [track(11, 180), track(12, 200), track(13, 175), track(14, 190)],
			fits: [
				fit(1, 11, { verdict: 'does-not-fit', score: 1 }),
				fit(1, 14, { verdict: null, score: 0.6 }),
				fit(2, 12, { verdict: null, score: 0.49 }),
				fit(2, 13, { verdict: 'fits-at-rate', rate: 0.95, score: 0.4 }),
				fit(3, 11, { verdict: null, score: 0.8 })
			],
			settings: quick
		};
		const plan = planEvening(input);
		const pairs = plan.entries.map((e) => `${e.danceId}:${e.trackId}`);
		expect(pairs).not.toContain('1:11');
		expect(pairs).not.toContain('2:12');
		// A team verdict outranks a low score; its rate lengthens the entry: 175 ÷ 0.95.
		const slowed = plan.entries.find((e) => e.trackId === 13);
		expect(slowed).toBeDefined();
		expect(slowed!.durationS).toBeCloseTo(175 / 0.95, 9);
		expect(checkRunOrder(input, plan.entries).filter((p) => p.rule === 'fit')).toEqual([]);
	});
});

describe('locks the team chose', () => {
	it('keeps a locked entry even on a track marked "does not fit", and warns', () => {
		const input: PlanInput = {
			evening: {
				startsAt: at('20:00'),
				endsAt: at('20:10'),
				crowd: 'mixed',
				sections: [{ id: 'f', kind: 'open-floor', startS: 0, endS: 600 }]
			},
			dances: [dance(1), dance(2), dance(3)],
			tracks: [track(11, 180), track(12, 200), track(13, 175)],
			fits: [fit(1, 11, { verdict: 'does-not-fit' }), fit(2, 12), fit(3, 13)],
			locked: [
				{
					position: 0,
					startS: 0,
					entry: { kind: 'dance', danceId: 1, trackId: 11, durationS: 180, rate: 1 }
				}
			],
			settings: { ...quick, endToleranceS: 20 }
		};
		const plan = planEvening(input);
		expect(plan.entries[0]).toMatchObject({ locked: true, danceId: 1, trackId: 11, startS: 0 });
		// The rest fills around it: 180 + 15 + 200 + 15 + 175 = 585 s, or the other order.
		expect(plan.entries.slice(1).map((e) => e.startS)).toEqual([
			195,
			195 + plan.entries[1].durationS + 15
		]);
		expect(plan.unmet.join(' ')).toMatch(/position 1 plays a track that is not a playable fit/);
	});
});

describe('what it cannot do, it says', () => {
	it('explains a request for a dance no track fits, and a must-play it cannot place', () => {
		const input: PlanInput = {
			evening: {
				startsAt: at('20:00'),
				endsAt: at('20:10'),
				crowd: 'mixed',
				sections: [{ id: 'f', kind: 'open-floor', startS: 0, endS: 600 }]
			},
			dances: [dance(1), dance(2), dance(3), dance(4, { name: 'Lonely Quiver' })],
			tracks: [track(11, 180), track(12, 200), track(13, 175)],
			fits: [fit(1, 11), fit(2, 12), fit(3, 13)],
			requests: [{ danceId: 4 }],
			mustPlay: [{ danceId: 1, trackId: 12 }],
			settings: quick
		};
		const plan = planEvening(input);
		expect(plan.unmet).toContain(
			'Request for Lonely Quiver not met: no playable track fits it (or it is on the never-play list).'
		);
		expect(plan.unmet).toContain(
			'Must-play Velora Step 1 to "Quiet Lantern 12": that track does not fit it.'
		);
	});

	it('reports an evening it cannot fill instead of pretending', () => {
		const input: PlanInput = {
			evening: {
				startsAt: at('20:00'),
				endsAt: at('21:00'),
				crowd: 'mixed',
				sections: [{ id: 'f', kind: 'open-floor', startS: 0, endS: 3600 }]
			},
			dances: [dance(1)],
			tracks: [track(11, 180)],
			fits: [fit(1, 11)],
			settings: quick
		};
		const plan = planEvening(input);
		expect(plan.violations.length).toBeGreaterThan(0);
		expect(plan.violations.join(' ')).toMatch(/not enough music fits/);
	});
});

describe('thin or odd input', () => {
	it('plans nothing, without throwing, for an evening with no sections or no music', () => {
		const base: PlanInput = {
			evening: { startsAt: at('20:00'), endsAt: at('22:00'), crowd: 'mixed', sections: [] },
			dances: [],
			tracks: [],
			fits: [],
			settings: quick
		};
		expect(planEvening(base).entries).toEqual([]);
		const floor = {
			...base,
			evening: {
				...base.evening,
				sections: [{ id: 'f', kind: 'open-floor' as const, startS: 0, endS: 7200 }]
			}
		};
		const empty = planEvening(floor);
		expect(empty.violations.join(' ')).toMatch(/not enough music fits/);
		expect(Number.isFinite(empty.objective.total)).toBe(true);
	});

	it('trims a section that runs past the evening and says so', () => {
		const input: PlanInput = {
			evening: {
				startsAt: at('20:00'),
				endsAt: at('20:10'),
				crowd: 'mixed',
				sections: [{ id: 'f', kind: 'open-floor', startS: 0, endS: 1200 }]
			},
			dances: [dance(1), dance(2), dance(3)],
			tracks: [track(11, 180), track(12, 200), track(13, 175)],
			fits: [fit(1, 11), fit(2, 12), fit(3, 13)],
			settings: { ...quick, endToleranceS: 20 }
		};
		const plan = planEvening(input);
		for (const e of plan.entries) expect(e.startS + e.durationS).toBeLessThanOrEqual(600);
		expect(plan.violations).toEqual([]);
		expect(plan.unmet).toContain(
			'Section "open-floor" ends after the evening, so it was cut at the evening\'s end.'
		);
	});
});

// "No worse than greedy" could not fail (the annealer starts from the greedy plan and keeps the
// best it has seen), so the claim is now a margin on a fixed set of invented evenings: the
// annealed plan's objective must be at least 10 % below the greedy plan's, and check.ts (which
// shares no code with the search) must find no more hard-rule problems in it. Measured on main:
// 12–39 % lower on these four evenings, so 10 % leaves room and still fails if the search stalls.
describe('the search beats the plain greedy construction', () => {
	const MARGIN = 0.1;
	it.each([1, 2, 3, 4])('on invented two-hour evening %i, by at least 10 %', (seed) => {
		const input = inventEvening({ seed, dances: 120, tracks: 600, minutes: 120 });
		const greedy = plainGreedy(input);
		const plan = planEvening(input);
		expect(plan.objective.total).toBeLessThanOrEqual(greedy.objective.total * (1 - MARGIN));
		expect(checkRunOrder(input, plan.entries).length).toBeLessThanOrEqual(
			checkRunOrder(input, greedy.entries).length
		);
	});
});
