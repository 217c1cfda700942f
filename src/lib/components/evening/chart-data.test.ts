import { describe, expect, test } from 'vitest';
import { chartPoints, chartSummary } from './chart-data';

describe('chart data', () => {
	test('points sit at the middle of each dance, in minutes (plain arithmetic)', () => {
		const points = chartPoints([
			{ kind: 'teach', name: 'Teach', startS: 0, durationS: 600, bpm: null, level: null },
			{ kind: 'dance', name: 'A', startS: 600, durationS: 180, bpm: 120, level: 'beginner' },
			{ kind: 'dance', name: 'B', startS: 795, durationS: 210, bpm: 180, level: 'advanced' }
		]);
		// (600 + 90) / 60 = 11.5; (795 + 105) / 60 = 15.
		expect(points.map((p) => p.min)).toEqual([11.5, 15]);
		expect(points.map((p) => [p.rank, p.level])).toEqual([
			[1, 'Beginner'],
			[4, 'Advanced']
		]);
		expect(chartSummary(points)).toBe(
			'2 dances. Tempo from 120 to 180 BPM; 1 at 150 BPM or faster. Levels: 1 beginner, 1 advanced.'
		);
	});

	test('an empty run order says so', () => {
		expect(chartSummary([])).toMatch(/No dances/);
	});
});
