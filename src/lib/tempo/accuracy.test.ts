import { describe, expect, it } from 'vitest';
import { accuracy1, accuracy2 } from './accuracy';

// Gouyon et al. 2006 (IEEE TASLP 14(5)): 4 % tolerance; Accuracy 2 allows ×2, ×3, ×½, ×⅓.
describe('Gouyon et al. accuracy measures', () => {
	it('counts within 4 % for Accuracy 1', () => {
		expect(accuracy1(124.8, 120)).toBe(true); // +4.0 %
		expect(accuracy1(125, 120)).toBe(false); // +4.17 %
		expect(accuracy1(115.2, 120)).toBe(true);
	});

	it('also counts the metrical relatives for Accuracy 2', () => {
		expect(accuracy2(240, 120)).toBe(true);
		expect(accuracy2(60, 120)).toBe(true);
		expect(accuracy2(270, 90)).toBe(true);
		expect(accuracy2(30, 90)).toBe(true);
		// 3/2 and 2/3 are not among them.
		expect(accuracy2(180, 120)).toBe(false);
		expect(accuracy2(80, 120)).toBe(false);
	});
});
