// The fit engine against a published tempo table. Source for every range below:
// WDSF Competition Rules, music rule (secondary: member federation extract), via REFERENCES.md —
// bars per minute × beats per bar = BPM.
import { describe, expect, it } from 'vitest';
import type { DanceFacts, Meter } from '../domain';
import { fitTrackToDance } from './fit-score';
import { rankDancesForTrack } from './rank';
import { RHYTHM_PRESETS, rhythmsAt } from '../tempo/rhythm-presets';
import { fitTempo } from './tempo-fit';
import { dance, track } from '../testing/fit-facts';

interface TableRow {
	name: string;
	/** Our meter field knows 4/4 and 3/4 only; duple 2/4 (Samba) is stored as 4/4. */
	meter: Meter;
	bpmMin: number;
	bpmMax: number;
}

// BPM = bars per minute × beats per bar, both columns as REFERENCES.md gives them.
const TABLE: TableRow[] = [
	{ name: 'Waltz', meter: 3, bpmMin: 84, bpmMax: 90 }, // 28–30 bars × 3
	{ name: 'Cha Cha', meter: 4, bpmMin: 120, bpmMax: 128 }, // 30–32 bars × 4
	{ name: 'Rumba', meter: 4, bpmMin: 100, bpmMax: 108 }, // 25–27 bars × 4
	{ name: 'Samba', meter: 4, bpmMin: 100, bpmMax: 104 }, // 50–52 bars × 2
	{ name: 'Jive', meter: 4, bpmMin: 168, bpmMax: 176 }, // 42–44 bars × 4
	{ name: 'Viennese Waltz', meter: 3, bpmMin: 174, bpmMax: 180 } // 58–60 bars × 3
];

// Dance records carry the invented catalogue's fields; only meter and range come from the table.
const dances: DanceFacts[] = TABLE.map((row, i) =>
	dance({
		id: i + 1,
		name: `Table ${row.name}`,
		meter: row.meter,
		counts: row.meter === 3 ? 48 : 32,
		walls: 1,
		bpmMin: row.bpmMin,
		bpmMax: row.bpmMax
	})
);
const byName = (name: string) => dances[TABLE.findIndex((r) => r.name === name)];

/** A song of exactly 8 repetitions of the dance at `bpm`, so length and ending are ideal. */
const songFor = (d: DanceFacts, bpm: number, meter: Meter = d.meter) =>
	track({ bpm, meter, phraseBeats: d.counts, durationS: (8 * d.counts * 60) / bpm });

describe.each(TABLE.map((row, i) => [row.name, row, dances[i]] as const))('%s', (_, row, d) => {
	it('refuses the dance at rate 1 just outside the range, and at all beyond the ±8 % reach', () => {
		// 2 % outside the range: the engine no longer takes the track as it is, it changes the rate.
		expect(fitTrackToDance(songFor(d, row.bpmMax * 1.02), d).tempo?.rate).toBeLessThan(1);
		expect(fitTrackToDance(songFor(d, row.bpmMin * 0.98), d).tempo?.rate).toBeGreaterThan(1);
		// Past the reach (needs 0.90× or 1.10×): refused, with the reason said, and scored low.
		const fast = fitTrackToDance(songFor(d, row.bpmMax / 0.9), d);
		expect(fast.reasons[0]).toMatch(/^too fast: .*the bound is ±8 %/);
		expect(fast.score).toBeLessThan(0.2);
		const slow = fitTrackToDance(songFor(d, row.bpmMin / 1.1), d);
		expect(slow.reasons[0]).toMatch(/^too slow: .*the bound is ±8 %/);
		expect(slow.score).toBeLessThan(0.2);
	});
	it('accepts the table’s tempos directly, at rate 1', () => {
		for (const bpm of [row.bpmMin, (row.bpmMin + row.bpmMax) / 2, row.bpmMax]) {
			const item = fitTrackToDance(songFor(d, bpm), d);
			expect(item.tempo).toMatchObject({ rate: 1, relation: 'direct', effectiveBpm: bpm });
			expect(item.score).toBeGreaterThan(0.95);
		}
	});
	it('accepts a track up to the ±8 % rate bound and no further', () => {
		expect(fitTempo(row.bpmMax / 0.92, d)).toMatchObject({ inRange: true, rate: 0.92 });
		expect(fitTempo(row.bpmMin / 1.08, d)).toMatchObject({ inRange: true, rate: 1.08 });
		expect(fitTempo(row.bpmMax / 0.9, d).inRange).toBe(false);
		expect(fitTempo(row.bpmMin / 1.1, d).inRange).toBe(false);
	});
	it('rejects music in the wrong meter', () => {
		const wrong: Meter = row.meter === 3 ? 4 : 3;
		const item = fitTrackToDance(songFor(d, row.bpmMin, wrong), d);
		expect(item.score).toBe(0);
		expect(item.reasons[0]).toBe(`${wrong}/4 music for a ${row.meter}/4 dance`);
	});
});

describe('half and double time against the table', () => {
	it('a 3/4 track at 180 BPM is a Viennese Waltz directly', () => {
		const vw = fitTrackToDance(songFor(byName('Viennese Waltz'), 180), byName('Viennese Waltz'));
		expect(vw.tempo).toMatchObject({ relation: 'direct', rate: 1, effectiveBpm: 180 });
	});
	it('the same track fits a 90 BPM Waltz only counted at half, scored lower, with a caution', () => {
		const waltz = byName('Waltz');
		const t = songFor(byName('Viennese Waltz'), 180);
		const item = fitTrackToDance(t, waltz);
		expect(item.tempo).toMatchObject({ relation: 'half', rate: 1, effectiveBpm: 90 });
		expect(item.reasons).toContain('counted at half time — 180 → 90 BPM');
		expect(item.reasons.some((r) => r.startsWith('in 3/4 this only works if 180 BPM'))).toBe(true);
		const vw = fitTrackToDance(t, byName('Viennese Waltz'));
		expect(item.score).toBeLessThan(vw.score);
		// Ranking the table's dances for it: Viennese Waltz, then Waltz; the 4/4 dances score 0.
		const ranked = rankDancesForTrack(t, dances);
		expect(ranked.slice(0, 2).map((i) => i.danceId)).toEqual([
			byName('Viennese Waltz').id,
			waltz.id
		]);
		expect(ranked.slice(2).every((i) => i.score === 0)).toBe(true);
	});
	it('a 4/4 track at 248 BPM is a Cha Cha counted at half (124)', () => {
		const chacha = byName('Cha Cha');
		expect(fitTempo(248, chacha)).toMatchObject({ relation: 'half', effectiveBpm: 124, rate: 1 });
	});
	it('a 4/4 track at 86 BPM is a Jive counted at double (172)', () => {
		expect(fitTempo(86, byName('Jive'))).toMatchObject({ relation: 'double', effectiveBpm: 172 });
	});
	it('half time in 4/4 scores a little below direct, in 3/4 lower still', () => {
		const chacha = byName('Cha Cha');
		const direct = fitTrackToDance(songFor(chacha, 124), chacha).score;
		const half = fitTrackToDance(track({ bpm: 248, durationS: (8 * 32 * 60) / 124 }), chacha).score;
		expect(half).toBeLessThan(direct);
		expect(half).toBeGreaterThan(0.85);
		const waltz = byName('Waltz');
		const tripleHalf = fitTrackToDance(
			track({ bpm: 174, meter: 3, phraseBeats: 96, durationS: (8 * 48 * 60) / 87 }),
			waltz
		).score;
		expect(tripleHalf).toBeLessThan(half);
	});
});

// The product's rhythm presets (a dance's default range) against the same table. The country
// waltz and rumba presets are wider than WDSF's, so every WDSF tempo must fall inside them; other
// bodies differ (REFERENCES.md), so only containment is checked, not equality.
describe('rhythm presets hold the WDSF tempi', () => {
	it.each([
		['Waltz', 'waltz'],
		['Rumba', 'rumba']
	] as const)('%s: every WDSF tempo is offered the %s rhythm', (name, rhythm) => {
		const row = TABLE.find((r) => r.name === name)!;
		expect(RHYTHM_PRESETS[rhythm].meter).toBe(row.meter);
		for (let bpm = row.bpmMin; bpm <= row.bpmMax; bpm++) {
			expect(rhythmsAt(bpm, row.meter)).toContain(rhythm);
		}
		// A dance given the preset's range accepts the table's tempi at rate 1.
		const p = RHYTHM_PRESETS[rhythm];
		const d = dance({
			id: 99,
			name: `Preset ${rhythm}`,
			meter: p.meter,
			counts: 32,
			walls: 1,
			bpmMin: p.bpmMin,
			bpmMax: p.bpmMax
		});
		for (const bpm of [row.bpmMin, row.bpmMax]) {
			expect(fitTrackToDance(songFor(d, bpm), d).tempo).toMatchObject({
				rate: 1,
				relation: 'direct'
			});
		}
	});
});
