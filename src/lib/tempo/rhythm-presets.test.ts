import { describe, expect, it } from 'vitest';
import { RHYTHMS } from '../domain';
import { barsPerMinuteToBpm } from './effective';
import { RHYTHM_PRESETS, rhythmsAt } from './rhythm-presets';

// REFERENCES.md "Dance tempi": WDSF Competition Rules, music rule (secondary: a member
// federation's extract), bars per minute × beats per bar = BPM.
const WDSF: [string, number, number, number, number, number][] = [
	// dance, bars min, bars max, beats per bar, BPM min, BPM max
	['Waltz', 28, 30, 3, 84, 90],
	['Tango', 31, 33, 4, 124, 132],
	['Viennese Waltz', 58, 60, 3, 174, 180],
	['Slow Foxtrot', 28, 30, 4, 112, 120],
	['Quickstep', 50, 52, 4, 200, 208],
	['Samba', 50, 52, 2, 100, 104],
	['Cha Cha', 30, 32, 4, 120, 128],
	['Rumba', 25, 27, 4, 100, 108],
	['Paso Doble', 60, 62, 2, 120, 124],
	['Jive', 42, 44, 4, 168, 176]
];

describe('barsPerMinuteToBpm against the WDSF table', () => {
	it.each(WDSF)('%s', (_dance, barsMin, barsMax, beats, bpmMin, bpmMax) => {
		expect(barsPerMinuteToBpm(barsMin, beats)).toBe(bpmMin);
		expect(barsPerMinuteToBpm(barsMax, beats)).toBe(bpmMax);
	});
});

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
