// The app's own request limits (the ones the public evening page's action calls), not a copy.
import { describe, expect, test } from 'vitest';
import { SlidingWindowLimit } from '../sliding-window-limit';
import {
	REQUEST_WINDOW_MS,
	REQUESTS_PER_ADDRESS,
	REQUESTS_PER_DEVICE,
	takeRequest
} from './request-limit';

describe('dance requests per evening', () => {
	test('five per device in ten minutes, then refused until the oldest leaves the window', () => {
		const from = { device: 'phone-a', address: '203.0.113.9' };
		const t0 = 1_000;
		for (let i = 0; i < REQUESTS_PER_DEVICE; i++) expect(takeRequest(-1, from, t0 + i)).toBe(true);
		expect(takeRequest(-1, from, t0 + 10)).toBe(false);
		// Just inside the window it is still refused; once the first try is 10 minutes old, one
		// place frees up, and only one.
		expect(takeRequest(-1, from, t0 + REQUEST_WINDOW_MS - 1)).toBe(false);
		expect(takeRequest(-1, from, t0 + REQUEST_WINDOW_MS)).toBe(true);
		expect(takeRequest(-1, from, t0 + REQUEST_WINDOW_MS)).toBe(false);
		// Another evening has its own count.
		expect(takeRequest(-2, from, t0 + 20)).toBe(true);
	});

	test('a hall on one Wi-Fi: many devices share an address up to its higher ceiling', () => {
		// Issue 13, finding 11: 5 per address locked out a whole hall.
		const address = '198.51.100.4';
		let allowed = 0;
		for (let d = 0; d < 30; d++) {
			for (let i = 0; i < 3; i++)
				if (takeRequest(-3, { device: `phone-${d}`, address }, 5_000)) allowed++;
		}
		expect(allowed).toBe(REQUESTS_PER_ADDRESS);
		expect(REQUESTS_PER_ADDRESS).toBeGreaterThan(REQUESTS_PER_DEVICE * 10);
		// A device on another address is untouched by this hall's ceiling.
		expect(takeRequest(-3, { device: 'phone-0', address: '192.0.2.1' }, 5_000)).toBe(true);
	});
});

test('the limit map stays bounded, forgetting the longest-idle keys first', () => {
	const limit = new SlidingWindowLimit(1, 600_000, 3);
	for (const k of ['a', 'b', 'c', 'd']) limit.take(k, 0);
	expect(limit.size).toBe(3);
	expect(limit.take('a', 1)).toBe(true);
	expect(limit.take('d', 1)).toBe(false);
});
