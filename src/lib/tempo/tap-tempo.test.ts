import { describe, expect, it } from 'vitest';
import { median, TapTempo } from './tap-tempo';

const tapEvery = (t: TapTempo, startMs: number, gapMs: number, n: number) => {
	let last: number | null = null;
	for (let i = 0; i < n; i++) last = t.tap(startMs + i * gapMs);
	return last;
};

describe('TapTempo', () => {
	// Plain arithmetic: a tap every 500 ms is 60 000 / 500 = 120 BPM; every 600 ms is 100 BPM.
	it('needs four taps, then gives the tempo', () => {
		const t = new TapTempo();
		expect(t.tap(0)).toBeNull();
		expect(t.tap(500)).toBeNull();
		expect(t.tap(1000)).toBeNull();
		expect(t.tap(1500)).toBe(120);
		expect(t.tap(2000)).toBe(120);
		expect(t.count).toBe(5);
	});

	it('is not thrown by one late tap (median of intervals)', () => {
		const t = new TapTempo();
		// Gaps 600, 600, 700, 600, 600 ms: the median is 600 ms = 100 BPM.
		for (const at of [0, 600, 1200, 1900, 2500]) t.tap(at);
		expect(t.tap(3100)).toBe(100);
	});

	it('starts over after a pause longer than 2 s', () => {
		const t = new TapTempo();
		expect(tapEvery(t, 0, 500, 6)).toBe(120);
		// 2.6 s later the DJ taps a new song at 90 BPM (every 666.7 ms).
		expect(t.tap(5100)).toBeNull();
		expect(t.count).toBe(1);
		expect(tapEvery(t, 5100 + 2000 / 3, 2000 / 3, 3)).toBeCloseTo(90, 6);
	});

	it('starts over after a gap of more than 2.5 beats, even under 2 s', () => {
		const t = new TapTempo();
		tapEvery(t, 0, 300, 5); // 200 BPM
		expect(t.tap(1200 + 800)).toBeNull(); // 800 ms > 2.5 × 300 ms
	});

	it('follows a change of tempo within its window', () => {
		const t = new TapTempo({ window: 4 });
		tapEvery(t, 0, 500, 5);
		expect(tapEvery(t, 2500, 400, 5)).toBe(150); // 60 000 / 400
	});

	it('takes the median of an even count as the mean of the middle two', () => {
		expect(median([1, 4, 2, 3])).toBe(2.5);
		expect(median([5])).toBe(5);
	});
});
