import { describe, expect, it } from 'vitest';
import { lessonRate, lessonTarget, lessonTracks } from './lesson-tempo';
import { dance, track } from '../testing/fit-facts';

// A dance whose range starts at 120 BPM, so the level slowdowns read as plain percentages.
const d = dance({ bpmMin: 120, bpmMax: 128 });

describe('lessonTarget — defaults are common practice (REFERENCES.md: teaching slows ~10–15 %)', () => {
	it('120 BPM slowed by 10 % is 108 BPM for improvers (plain arithmetic, REFERENCES.md)', () => {
		expect(lessonTarget(d, 'improver')).toMatchObject({ slowdown: 0.1, targetBpm: 108 });
	});
	it('beginners slower than improvers, improvers slower than intermediates; advanced at bpmMin', () => {
		const t = (level: Parameters<typeof lessonTarget>[1]) => lessonTarget(d, level).targetBpm;
		expect(t('absolute-beginner')).toBe(102);
		expect(t('beginner')).toBe(102);
		expect(t('improver')).toBeLessThan(t('intermediate'));
		expect(t('intermediate')).toBe(114);
		expect(t('advanced')).toBe(120);
	});
	it('the amounts are settings', () => {
		const t = lessonTarget(d, 'beginner', { slowdownByLevel: { beginner: 0.2 } });
		expect(t.targetBpm).toBe(96);
		expect(lessonTarget(d, 'improver', { slowdownByLevel: { beginner: 0.2 } }).targetBpm).toBe(108);
	});
	it('a shuffle (3 steps in 2 counts) takes longer at the lesson tempo', () => {
		const t = lessonTarget(d, 'improver');
		expect(t.shuffleSecondsAtDanceTempo).toBe(1);
		expect(t.shuffleSecondsAtTarget).toBeCloseTo(120 / 108, 9);
		expect(t.caution).toMatch(/rest and water/);
	});
});

describe('lessonRate — pitch kept via preservesPitch (MDN); bound 0.80× is judgement', () => {
	it('120 BPM to a 108 target is rate 0.9 (REFERENCES.md)', () => {
		const r = lessonRate(track({ bpm: 120 }), d, 'improver');
		expect(r).toMatchObject({ ok: true, rate: 0.9, effectiveBpm: 108, relation: 'direct' });
		expect(r.reason).toBe('play at 0.90× with pitch kept — 120 → 108 BPM');
	});
	it('uses half time for a song measured at double', () => {
		expect(lessonRate(track({ bpm: 240 }), d, 'improver')).toMatchObject({
			ok: true,
			rate: 0.9,
			relation: 'half'
		});
	});
	it('refuses past the bound and says why', () => {
		// 102 / 130 = 0.785 < 0.80.
		const r = lessonRate(track({ bpm: 130 }), d, 'beginner');
		expect(r.ok).toBe(false);
		expect(r.rate).toBeCloseTo(0.785, 3);
		expect(r.reason).toMatch(/slower than 0\.80×, where the music starts to sound wrong/);
		// Too slow a song would need speeding up past 1.08×.
		expect(lessonRate(track({ bpm: 90 }), d, 'advanced').ok).toBe(false);
	});
	it('the bound is a setting', () => {
		expect(lessonRate(track({ bpm: 130 }), d, 'beginner', { minLessonRate: 0.75 }).ok).toBe(true);
	});
	it('refuses the wrong meter and an unmeasured tempo', () => {
		expect(lessonRate(track({ meter: 3 }), d, 'beginner')).toMatchObject({
			ok: false,
			reason: '3/4 music for a 4/4 dance'
		});
		expect(lessonRate(track({ bpm: null }), d, 'beginner')).toMatchObject({
			ok: false,
			reason: 'tempo not measured yet'
		});
	});
});

describe('lessonTracks', () => {
	it('lists the songs already slow enough, slowest first, leaving out misfits', () => {
		// Improver target 108; "slow enough" is 97.2–108 by default.
		const tracks = [
			track({ id: 1, bpm: 106 }),
			track({ id: 2, bpm: 99 }),
			track({ id: 3, bpm: 120 }), // the dance's own tempo: not slow enough
			track({ id: 4, bpm: 90 }), // too slow: drags
			track({ id: 5, bpm: 100, meter: 3 }), // wrong meter
			track({ id: 6, bpm: 104 }), // rejected by the team
			track({ id: 7, bpm: 208 }), // half time: 104
			track({ id: 8, bpm: null })
		];
		const items = lessonTracks(d, tracks, 'improver', { 6: { verdict: 'does-not-fit' } });
		expect(items.map((i) => i.trackId)).toEqual([2, 7, 1]);
		expect(items.every((i) => i.tempo.rate === 1)).toBe(true);
		expect(items[1].tempo.relation).toBe('half');
		expect(items[0].reasons[0]).toBe('slow enough for an improver lesson: target 108 BPM');
	});
});
