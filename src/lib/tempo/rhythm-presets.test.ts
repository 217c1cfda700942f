import { describe, expect, it } from 'vitest';
import { RHYTHMS } from '../domain';
import { RHYTHM_PRESETS, rhythmsAt } from './rhythm-presets';

describe('rhythm presets', () => {
	it('every rhythm but "other" is offered somewhere between 40 and 240 BPM', () => {
		for (const r of RHYTHMS.filter((r) => r !== 'other')) {
			const meter = RHYTHM_PRESETS[r].meter;
			const offered = Array.from({ length: 201 }, (_, i) => 40 + i).filter((bpm) =>
				rhythmsAt(bpm, meter).includes(r)
			);
			expect(offered.length, r).toBeGreaterThan(0);
		}
	});

	// Common practice (no source, from memory): country-western ranges as teachers quote them.
	// What depends on them: the rhythms offered for a tempo, inside the range and not 2 BPM out.
	it.each([
		['two-step', 182, 198],
		['waltz', 84, 100],
		['west-coast-swing', 112, 128],
		['cha-cha', 100, 116],
		['east-coast-swing', 142, 158],
		['polka', 114, 130]
	] as const)('%s is offered from %i to %i BPM and not beyond', (rhythm, lo, hi) => {
		const meter = RHYTHM_PRESETS[rhythm].meter;
		expect(rhythmsAt(lo, meter)).toContain(rhythm);
		expect(rhythmsAt(hi, meter)).toContain(rhythm);
		expect(rhythmsAt(lo - 2, meter)).not.toContain(rhythm);
		expect(rhythmsAt(hi + 2, meter)).not.toContain(rhythm);
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
