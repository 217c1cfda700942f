import { describe, expect, it } from 'vitest';
import { endOf, eveningLengthS, minutesWords, playedLengthS, startTimes } from './time';

// Worked examples from plain arithmetic (no outside source needed).
describe('run-order arithmetic', () => {
	it('a section from 19:30 to 20:15 lasts 45 × 60 = 2700 s', () => {
		expect(eveningLengthS('2026-12-05T19:30:00Z', '2026-12-05T20:15:00Z')).toBe(2700);
		expect(eveningLengthS(Date.UTC(2026, 11, 5, 19, 30), Date.UTC(2026, 11, 5, 20, 15))).toBe(2700);
	});

	it('a four-hour evening from 19:00 to 23:00 lasts 4 × 3600 = 14400 s', () => {
		expect(eveningLengthS('2026-12-05T19:00:00+01:00', '2026-12-05T23:00:00+01:00')).toBe(14_400);
	});

	it('entries of 180 s and 200 s with 15 s changeovers start at 0, 195 and 410', () => {
		// 0; 0 + 180 + 15 = 195; 195 + 200 + 15 = 410.
		expect(startTimes(0, [180, 200, 150], 15)).toEqual([0, 195, 410]);
		// The run ends when the last entry does: 410 + 150 = 560 (no changeover after it).
		expect(endOf(0, [180, 200, 150], 15)).toBe(560);
		expect(endOf(300, [], 15)).toBe(300);
	});

	it('a 204 s track at 0.85× lasts 204 ÷ 0.85 = 240 s', () => {
		// playedLengthS is what the planner uses for an entry's length (prepare.ts).
		expect(playedLengthS(204, 0.85)).toBeCloseTo(240, 9);
		// Faster is shorter: 240 s at 1.2× lasts 200 s; at 1× a track keeps its own length.
		expect(playedLengthS(240, 1.2)).toBeCloseTo(200, 9);
		expect(playedLengthS(180, 1)).toBe(180);
	});

	it('says durations in words', () => {
		expect(minutesWords(44 * 60 + 10)).toBe('44 minutes');
		expect(minutesWords(60)).toBe('1 minute');
		expect(minutesWords(80 * 60)).toBe('1 h 20 min');
		expect(minutesWords(120 * 60)).toBe('2 h');
	});

	it('refuses a date-time it cannot read', () => {
		expect(() => eveningLengthS('not a date', '2026-12-05T20:15:00Z')).toThrow();
	});
});
