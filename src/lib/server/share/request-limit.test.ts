import { describe, expect, test } from 'vitest';
import { SlidingWindowLimit } from '../sliding-window-limit';
import { requestKey } from './request-limit';

describe('request rate limit', () => {
	test('five in ten minutes per key, then refused until the oldest leaves the window', () => {
		const limit = new SlidingWindowLimit(5, 600_000);
		const key = requestKey(1, '203.0.113.9');
		for (let i = 0; i < 5; i++) expect(limit.take(key, 1000 + i)).toBe(true);
		expect(limit.take(key, 2000)).toBe(false);
		// Another evening, or another address, has its own count.
		expect(limit.take(requestKey(2, '203.0.113.9'), 2000)).toBe(true);
		expect(limit.take(requestKey(1, '198.51.100.4'), 2000)).toBe(true);
		// 600 s after the first try (t = 1000 ms) it no longer counts: one place frees up, no more.
		expect(limit.take(key, 601_000)).toBe(true);
		expect(limit.take(key, 601_000)).toBe(false);
	});

	test('the map stays bounded, forgetting the longest-idle keys first', () => {
		const limit = new SlidingWindowLimit(1, 600_000, 3);
		for (const k of ['a', 'b', 'c', 'd']) limit.take(k, 0);
		expect(limit.size).toBe(3);
		expect(limit.take('a', 1)).toBe(true);
		expect(limit.take('d', 1)).toBe(false);
	});
});
