import { describe, expect, it } from 'vitest';
import { effectiveBpm } from './effective';

describe('tempo arithmetic', () => {
	// REFERENCES.md, plain arithmetic: 120 BPM slowed by 10 % is 108 BPM (playback rate 0.9).
	it('gives the effective tempo at a playback rate', () => {
		expect(effectiveBpm(120, 0.9)).toBeCloseTo(108, 10);
		expect(effectiveBpm(96, 1)).toBe(96);
	});
});
