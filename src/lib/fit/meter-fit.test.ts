import { describe, expect, it } from 'vitest';
import { fitMeter } from './meter-fit';

describe('fitMeter — a waltz needs 3/4 (DESIGN.md; common practice)', () => {
	it('matches like with like', () => {
		expect(fitMeter(3, 3)).toEqual({ ok: true, reason: null });
		expect(fitMeter(4, 4).ok).toBe(true);
	});
	it('rejects 3/4 music for a 4/4 dance and the other way round, in plain words', () => {
		expect(fitMeter(3, 4)).toEqual({ ok: false, reason: '3/4 music for a 4/4 dance' });
		expect(fitMeter(4, 3)).toEqual({ ok: false, reason: '4/4 music for a 3/4 dance' });
	});
});
