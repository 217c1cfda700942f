import { describe, expect, it } from 'vitest';
import { alternativeOf } from './alternative';

describe('alternativeOf', () => {
	const result = (meter: 3 | 4, candidates: [number, number][]) => ({
		bpm: candidates[0][0],
		meter,
		candidates: candidates.map(([bpm, score]) => ({ bpm, score }))
	});

	it('offers the double or half reading when it is nearly as strong', () => {
		expect(
			alternativeOf(
				result(4, [
					[120, 1],
					[240, 0.9],
					[60, 0.5]
				])
			)
		).toBe(240);
		expect(
			alternativeOf(
				result(4, [
					[120, 1],
					[60, 0.85]
				])
			)
		).toBe(60);
	});

	it('stays quiet when the winner stands clear, or the runner-up is another pulse', () => {
		expect(
			alternativeOf(
				result(4, [
					[120, 1],
					[240, 0.5]
				])
			)
		).toBeNull();
		// 3:2 is a related level only in 3/4 (a waltz's beat against its dotted half).
		expect(
			alternativeOf(
				result(4, [
					[120, 1],
					[180, 0.95]
				])
			)
		).toBeNull();
		expect(
			alternativeOf(
				result(3, [
					[120, 1],
					[180, 0.95]
				])
			)
		).toBe(180);
	});
});
