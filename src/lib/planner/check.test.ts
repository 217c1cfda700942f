import { describe, expect, it } from 'vitest';
import { checkRunOrder } from './check';
import { planEvening } from './index';
import { inventEvening } from './invented';
import type { PlanEntry } from './types';

// The independent judge must catch broken run orders, or the property tests would prove nothing.
describe('checkRunOrder', () => {
	const input = inventEvening({ seed: 11, dances: 80, tracks: 500, minutes: 180 });
	// A rest after every 45 minutes of dancing, as an evening form may ask, so one can be missed.
	const settings = { iterations: 500, timeBudgetMs: 1e9, breakEveryMin: 45 };
	const plan = planEvening({ ...input, settings });
	const dances = plan.entries.filter((e) => e.kind === 'dance' && e.sectionId !== 's1');
	const rules = (entries: PlanEntry[]) =>
		checkRunOrder({ ...input, settings }, entries).map((p) => p.rule);
	const edit = (i: number, patch: Partial<PlanEntry>) =>
		plan.entries.map((e) => (e.position === i ? { ...e, ...patch } : e));

	it('passes the planner’s own plan', () => {
		expect(rules(plan.entries)).toEqual([]);
	});

	it('catches a track played twice and a dance repeated too soon', () => {
		const [a, b] = dances;
		expect(rules(edit(b.position, { trackId: a.trackId }))).toContain('track-twice');
		expect(rules(edit(b.position, { danceId: a.danceId }))).toContain('repeat');
	});

	it('catches a track that does not fit, and a never-play track', () => {
		const bad = input.fits.find((f) => f.verdict === 'does-not-fit')!;
		const track = input.tracks.find((t) => t.id === bad.trackId)!;
		const e = dances[3];
		const broken = edit(e.position, {
			danceId: bad.danceId,
			trackId: bad.trackId,
			durationS: track.durationS,
			rate: 1
		});
		expect(rules(broken)).toContain('fit');
		expect(rules(edit(e.position, { trackId: input.neverPlay!.trackIds![0] }))).toContain(
			'never-play'
		);
	});

	it('catches overlaps, overruns and a missing break', () => {
		const e = dances[2];
		expect(rules(edit(e.position, { startS: e.startS - 30 }))).toContain('overlap');
		const last = plan.entries.at(-1)!;
		expect(rules(edit(last.position, { startS: last.startS + 600 }))).toContain('evening-end');
		// Without the breaks, and the music closed up so that no gap is long enough to rest in.
		let t = 0;
		const noBreaks = plan.entries
			.filter((x) => x.kind !== 'break')
			.map((x) => {
				const moved = { ...x, startS: t };
				t += x.durationS + 15;
				return moved;
			});
		expect(rules(noBreaks)).toContain('break');
	});

	it('catches a lesson without its slow play, and a moved lock', () => {
		const slow = plan.entries.find((x) => x.kind === 'dance' && x.sectionId === 's1')!;
		expect(
			rules(edit(slow.position, { rate: 1, durationS: slow.durationS * slow.rate }))
		).toContain('lesson');
		const e = dances[4];
		const locked = [{ position: e.position, startS: e.startS, entry: { ...e, kind: e.kind } }];
		const held = checkRunOrder({ ...input, settings, locked }, edit(e.position, { locked: true }));
		expect(held.map((p) => p.rule)).not.toContain('lock');
		const moved = checkRunOrder(
			{ ...input, settings, locked },
			edit(e.position, { locked: true, startS: e.startS + 1 })
		);
		expect(moved.map((p) => p.rule)).toContain('lock');
	});
});
