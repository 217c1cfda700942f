import { describe, expect, test } from 'vitest';
import { canFlip, flipTempo } from './tempo-flip';

describe('flipTempo', () => {
	test('doubles and halves', () => {
		expect(flipTempo(90, 2)).toBe(180);
		expect(flipTempo(128, 0.5)).toBe(64);
	});

	test('lands on a measured candidate within 4 % (Gouyon et al. 2006 tolerance)', () => {
		const candidates = [
			{ bpm: 91.2, score: 1 },
			{ bpm: 183.1, score: 0.5 },
			{ bpm: 45.6, score: 0.2 }
		];
		expect(flipTempo(91.2, 2, candidates)).toBe(183.1);
		expect(flipTempo(91.2, 0.5, candidates)).toBe(45.6);
		// 200 is 9.6 % from 182.4: not the same tempo, so the plain product is used.
		expect(flipTempo(91.2, 2, [{ bpm: 200, score: 1 }])).toBe(182.4);
	});

	test('takes the nearest candidate, not the best scored', () => {
		// Target 182.4: 183.1 is 0.4 % off, 188 is 3.1 % off (both within 4 %); the nearer wins
		// even though the farther one scores higher.
		const candidates = [
			{ bpm: 188, score: 1 },
			{ bpm: 183.1, score: 0.1 }
		];
		expect(flipTempo(91.2, 2, candidates)).toBe(183.1);
	});

	test('rounds the plain product to one decimal', () => {
		// 121.3 ÷ 2 = 60.65, kept as 60.7 (round1); plain arithmetic.
		expect(flipTempo(121.3, 0.5)).toBe(60.7);
	});

	test('refuses flips outside the tempo range the API keeps', () => {
		expect(canFlip(250, 2)).toBe(false);
		expect(canFlip(30, 0.5)).toBe(false);
		expect(canFlip(null, 2)).toBe(false);
		expect(canFlip(120, 2)).toBe(true);
	});
});
