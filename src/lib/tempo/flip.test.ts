import { describe, expect, it } from 'vitest';
import { flipTempo } from './flip';

describe('flipTempo', () => {
	const candidates = [
		{ bpm: 72.01, score: 30 },
		{ bpm: 143.96, score: 28 },
		{ bpm: 36.2, score: 5 }
	];

	it('takes the measured candidate near twice or half the tempo', () => {
		expect(flipTempo(72.01, 2, candidates)).toBe(143.96);
		expect(flipTempo(143.96, 0.5, candidates)).toBe(72.01);
	});

	// 72.01 × ½ = 36.005 lies within 4 % of the 36.2 candidate (0.5 % off), which is taken;
	// 95 × 2 = 190 and 95 × ½ = 47.5 have no candidate: plain arithmetic.
	it('falls back to plain arithmetic where nothing was measured', () => {
		expect(flipTempo(72.01, 0.5, candidates)).toBe(36.2);
		expect(flipTempo(95, 2, candidates)).toBe(190);
		expect(flipTempo(95, 0.5)).toBe(47.5);
	});
});
