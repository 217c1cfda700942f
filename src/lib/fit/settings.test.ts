import { describe, expect, it } from 'vitest';
import { DEFAULT_FIT_SETTINGS, resolveFitSettings } from './settings';

describe('fit settings', () => {
	// What the defaults do (the ±8 % bound accepting and refusing tracks) is tested where it acts:
	// wdsf-table.test.ts and tempo-fit.test.ts. Here: nothing given means the defaults.
	it('without overrides, the defaults', () => {
		expect(resolveFitSettings()).toEqual(DEFAULT_FIT_SETTINGS);
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
