import { describe, expect, test } from 'vitest';
import { peaks } from './peaks';

describe('peaks', () => {
	test('the loudest sample of each slice, scaled to the loudest slice', () => {
		const s = Float32Array.from([0.1, -0.2, 0.05, 0.4, -0.8, 0.2, 0, 0.1]);
		expect([...peaks(s, 4)].map((x) => Math.round(x * 1000) / 1000)).toEqual([0.25, 0.5, 1, 0.125]);
	});

	test('silence stays flat and more bins than samples still fills every bin', () => {
		expect([...peaks(new Float32Array(10), 5)]).toEqual([0, 0, 0, 0, 0]);
		expect(peaks(Float32Array.from([0.5, 1]), 4)).toHaveLength(4);
		expect(peaks(new Float32Array(0), 3)).toHaveLength(3);
	});
});
