import { describe, expect, it } from 'vitest';
import { clicksBetween } from './click-times';

describe('clicksBetween', () => {
	// Worked example: at 120 BPM a beat lasts 0.5 s (60 / 120), so from a first beat at 0.25 s
	// the beats in [1, 2.5) are 1.25, 1.75 and 2.25 s — beats 2, 3 and 4 (0-based), of which
	// beat 4 opens the second bar of 4/4.
	it('puts the clicks on the grid, count 1 marked', () => {
		expect(clicksBetween(1, 2.5, { bpm: 120, offsetS: 0.25, meter: 4 })).toEqual([
			{ atS: 1.25, downbeat: false },
			{ atS: 1.75, downbeat: false },
			{ atS: 2.25, downbeat: true }
		]);
	});

	it('includes a beat exactly at the start of the window and none before the first beat', () => {
		const c = clicksBetween(0, 1, { bpm: 60, offsetS: 0.4, meter: 3 });
		expect(c).toEqual([{ atS: 0.4, downbeat: true }]);
		expect(clicksBetween(0.4, 0.41, { bpm: 60, offsetS: 0.4, meter: 3 })).toHaveLength(1);
	});

	it('doubles the clicks at the double reading', () => {
		const at = (bpm: number) => clicksBetween(10, 20, { bpm, offsetS: 0, meter: 4 }).length;
		expect(at(240)).toBe(2 * at(120));
	});
});
