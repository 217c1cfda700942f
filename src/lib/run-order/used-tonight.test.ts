import { describe, expect, test } from 'vitest';
import { unusedFirst, usedTonight } from './used-tonight';

describe('songs already used tonight', () => {
	const order = [{ trackId: 5 }, { trackId: null }, { trackId: 9 }, { trackId: 5 }];
	test('names each used track by the number of its first entry, leaving out the one swapped', () => {
		expect([...usedTonight(order)]).toEqual([
			[5, 1],
			[9, 3]
		]);
		// Swapping entry 3 (index 2): its own track is not "used elsewhere".
		expect([...usedTonight(order, 2)]).toEqual([[5, 1]]);
		// Swapping entry 1: track 5 is still used, by entry 4.
		expect(usedTonight(order, 0).get(5)).toBe(4);
	});
	test('puts unused tracks first and keeps the ranking inside each group', () => {
		const ranked = [{ trackId: 9 }, { trackId: 2 }, { trackId: 5 }, { trackId: 7 }];
		const used = usedTonight(order);
		expect(unusedFirst(ranked, used).map((s) => s.trackId)).toEqual([2, 7, 9, 5]);
		expect(unusedFirst(ranked, new Map()).map((s) => s.trackId)).toEqual([9, 2, 5, 7]);
	});
});
