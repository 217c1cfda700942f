import { describe, expect, it } from 'vitest';
import { DEFAULT_FIT_SETTINGS, resolveFitSettings } from './settings';

describe('fit settings', () => {
	it('defaults: ±8 % rate bound (issue 4), clean end within 4 counts, 2 repetitions at least', () => {
		expect(resolveFitSettings()).toEqual(DEFAULT_FIT_SETTINGS);
		expect(DEFAULT_FIT_SETTINGS).toMatchObject({
			maxRateChange: 0.08,
			cleanEndCounts: 4,
			minRepetitions: 2
		});
	});
	it('takes valid overrides and ignores values of the wrong kind', () => {
		const s = resolveFitSettings({
			maxRateChange: 0.1,
			cleanEndCounts: Number.NaN,
			allowHalfDouble: 'no' as unknown as boolean
		});
		expect(s.maxRateChange).toBe(0.1);
		expect(s.cleanEndCounts).toBe(4);
		expect(s.allowHalfDouble).toBe(true);
	});
});
