import { describe, expect, it } from 'vitest';
import { fitTempo, rateIntoRange, tempoAtRate } from './tempo-fit';

const range = { bpmMin: 116, bpmMax: 124 };

describe('fitTempo', () => {
	it('takes a tempo inside the range as it is', () => {
		expect(fitTempo(120, range)).toEqual({
			trackBpm: 120,
			effectiveBpm: 120,
			rate: 1,
			relation: 'direct',
			inRange: true,
			distance: 0,
			neededRate: 1
		});
	});
	it('slows a fast track to the top of the range: 125 at 0.96× is 120 (issue 4 example)', () => {
		const t = fitTempo(125, { bpmMin: 112, bpmMax: 120 });
		expect(t).toMatchObject({ rate: 0.96, relation: 'direct', inRange: true });
		expect(t.effectiveBpm).toBeCloseTo(120, 9);
	});
	it('speeds a slow track to the bottom of the range', () => {
		const t = fitTempo(110, range);
		expect(t.rate).toBeGreaterThan(1);
		expect(t.effectiveBpm).toBeGreaterThanOrEqual(116);
		expect(t.effectiveBpm).toBeLessThan(116.2);
	});
	it('accepts rates up to the ±8 % bound and no further', () => {
		expect(fitTempo(124 / 0.92, range)).toMatchObject({ inRange: true, rate: 0.92 });
		const far = fitTempo(124 / 0.9, range);
		expect(far).toMatchObject({ inRange: false, rate: 1 });
		expect(far.distance).toBeCloseTo(0.1, 3);
		expect(far.neededRate).toBeCloseTo(0.9, 3);
		expect(fitTempo(116 / 1.08, range)).toMatchObject({ inRange: true });
		expect(fitTempo(116 / 1.1, range).inRange).toBe(false);
	});
	it('the bound is a setting', () => {
		const t = fitTempo(124 / 0.9, range, { maxRateChange: 0.12, allowHalfDouble: true });
		expect(t).toMatchObject({ inRange: true, rate: 0.9 });
	});
	it('counts at half time when that needs no change: 240 → 120', () => {
		expect(fitTempo(240, range)).toMatchObject({ relation: 'half', effectiveBpm: 120, rate: 1 });
	});
	it('counts at double time when that needs no change: 60 → 120', () => {
		expect(fitTempo(60, range)).toMatchObject({ relation: 'double', effectiveBpm: 120, rate: 1 });
	});
	it('chooses the relation with the smallest rate change', () => {
		// Direct needs 124/130 = 0.954; half is 65 → needs 1.78: direct wins.
		expect(fitTempo(130, range).relation).toBe('direct');
		// Half: 250 / 2 = 125 → 0.992; direct is 250 → far: half wins.
		expect(fitTempo(250, range)).toMatchObject({ relation: 'half', rate: 0.992 });
	});
	it('prefers direct on a tie', () => {
		// A range wide enough that both 100 and 200 sit in it.
		expect(fitTempo(100, { bpmMin: 90, bpmMax: 210 }).relation).toBe('direct');
	});
	it('can be held to direct counting', () => {
		const t = fitTempo(240, range, { maxRateChange: 0.08, allowHalfDouble: false });
		expect(t).toMatchObject({ relation: 'direct', inRange: false });
	});
});

describe('rateIntoRange keeps its 3-decimal rate inside the range', () => {
	it('rounds towards the inside', () => {
		const up = rateIntoRange(111, range);
		expect(111 * up).toBeGreaterThanOrEqual(116);
		const down = rateIntoRange(131, range);
		expect(131 * down).toBeLessThanOrEqual(124);
		expect(rateIntoRange(120, range)).toBe(1);
	});
});

describe('tempoAtRate (a rate the team chose)', () => {
	it('reports the effective tempo at that rate', () => {
		const t = tempoAtRate(130, range, 0.95);
		expect(t).toMatchObject({ relation: 'direct', rate: 0.95, inRange: true });
		expect(t.effectiveBpm).toBeCloseTo(123.5, 9);
	});
	it('says how far off it still is', () => {
		const t = tempoAtRate(130, range, 1);
		expect(t.inRange).toBe(false);
		expect(t.distance).toBeGreaterThan(0.04);
	});
});
