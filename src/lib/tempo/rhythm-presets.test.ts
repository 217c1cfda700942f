import { describe, expect, it } from 'vitest';
import { RHYTHMS } from '../domain';
import { RHYTHM_PRESETS, rhythmsAt } from './rhythm-presets';

describe('rhythm presets', () => {
	it('has a preset for every rhythm, with min below max', () => {
		for (const r of RHYTHMS) {
			const p = RHYTHM_PRESETS[r];
			expect(p.bpmMin).toBeLessThan(p.bpmMax);
			expect(p.source.length).toBeGreaterThan(0);
		}
	});

	// REFERENCES.md: country-western competition ranges quoted by studios (secondary).
	it.each([
		['two-step', 182, 198],
		['waltz', 84, 100],
		['west-coast-swing', 112, 128],
		['cha-cha', 100, 116],
		['east-coast-swing', 142, 158],
		['polka', 114, 130]
	] as const)('%s is %i–%i BPM as the studios quote', (rhythm, lo, hi) => {
		expect(RHYTHM_PRESETS[rhythm].bpmMin).toBe(lo);
		expect(RHYTHM_PRESETS[rhythm].bpmMax).toBe(hi);
	});

	// The issue: "a two-step is not at 90, a waltz is not at 180".
	it('knows a waltz needs 3/4 and a two-step is fast', () => {
		expect(RHYTHM_PRESETS.waltz.meter).toBe(3);
		expect(rhythmsAt(90, 4)).not.toContain('two-step');
		expect(rhythmsAt(190, 4)).toContain('two-step');
		expect(rhythmsAt(90, 3)).toEqual(['waltz']);
		expect(rhythmsAt(180, 3)).toEqual([]);
	});
});
