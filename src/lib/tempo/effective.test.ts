import { describe, expect, it } from 'vitest';
import { barsPerMinute, barsPerMinuteToBpm, effectiveBpm, rateFor } from './effective';

describe('tempo arithmetic', () => {
	// REFERENCES.md, plain arithmetic: 120 BPM slowed by 10 % is 108 BPM (playback rate 0.9).
	it('gives the effective tempo at a playback rate', () => {
		expect(effectiveBpm(120, 0.9)).toBeCloseTo(108, 10);
		expect(effectiveBpm(96, 1)).toBe(96);
	});

	it('finds the rate that reaches a target tempo', () => {
		expect(rateFor(120, 108)).toBeCloseTo(0.9, 10);
		expect(rateFor(90, 99)).toBeCloseTo(1.1, 10);
		expect(() => rateFor(0, 100)).toThrow(RangeError);
	});

	// DESIGN.md: bars per minute is bpm ÷ beats per bar; REFERENCES.md: 84 BPM waltz = 28 bars.
	it('converts between bars per minute and BPM', () => {
		expect(barsPerMinute(84, 3)).toBe(28);
		expect(barsPerMinute(128, 4)).toBe(32);
		expect(barsPerMinuteToBpm(30, 3)).toBe(90);
	});
});
