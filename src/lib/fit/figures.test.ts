import { describe, expect, it } from 'vitest';
import { countsOfFigures, secondsForCounts, shuffleSeconds, stepsOfFigures } from './figures';

describe('figures — common practice (no source): a shuffle is three steps in two counts', () => {
	it('a shuffle is three steps in two counts', () => {
		expect(stepsOfFigures(['shuffle'])).toBe(3);
		expect(countsOfFigures(['shuffle'])).toBe(2);
	});
	it('an 8-count section of two shuffles, two steps and two holds adds up', () => {
		const section = ['shuffle', 'shuffle', 'step', 'step', 'hold', 'hold'] as const;
		expect(countsOfFigures(section)).toBe(8);
		expect(stepsOfFigures(section)).toBe(8);
	});
	it('at 120 BPM a count is half a second, so a shuffle takes 1 s (plain arithmetic)', () => {
		expect(secondsForCounts(32, 120)).toBe(16);
		expect(shuffleSeconds(120)).toBe(1);
		expect(shuffleSeconds(108)).toBeCloseTo(1.111, 3);
	});
});
