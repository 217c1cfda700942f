// Tempo range and meter for each rhythm, used as a prior when half/double tempo is in doubt and
// as a dance's default range. These are settings, not constants: bodies differ
// (REFERENCES.md, "Dance tempi").
import type { Meter, Rhythm } from '../domain';

export interface RhythmPreset {
	bpmMin: number;
	bpmMax: number;
	meter: Meter;
	/** Where the range comes from. */
	source: string;
}

// Country-western tempo ranges as dance teachers commonly quote them. No document was found to
// name (REFERENCES.md, "Dance tempi"), so they are marked as common practice, from memory.
const STUDIOS = 'common practice (no source): country-western ranges as teachers quote them';
const PRACTICE = 'common practice (no source), from memory';

export const RHYTHM_PRESETS: Record<Rhythm, RhythmPreset> = {
	'two-step': { bpmMin: 182, bpmMax: 198, meter: 4, source: STUDIOS },
	waltz: { bpmMin: 84, bpmMax: 100, meter: 3, source: STUDIOS },
	'west-coast-swing': { bpmMin: 112, bpmMax: 128, meter: 4, source: STUDIOS },
	'cha-cha': { bpmMin: 100, bpmMax: 116, meter: 4, source: STUDIOS },
	'east-coast-swing': { bpmMin: 142, bpmMax: 158, meter: 4, source: STUDIOS },
	// Polka is written in 2/4; its beat is the same pulse, so it shares the 4/4 grid here.
	polka: { bpmMin: 114, bpmMax: 130, meter: 4, source: STUDIOS },
	'triple-two-step': { bpmMin: 150, bpmMax: 180, meter: 4, source: PRACTICE },
	nightclub: { bpmMin: 54, bpmMax: 72, meter: 4, source: PRACTICE },
	shuffle: { bpmMin: 90, bpmMax: 130, meter: 4, source: PRACTICE },
	rock: { bpmMin: 110, bpmMax: 150, meter: 4, source: PRACTICE },
	rumba: { bpmMin: 96, bpmMax: 120, meter: 4, source: PRACTICE },
	other: { bpmMin: 60, bpmMax: 200, meter: 4, source: PRACTICE }
};

export const inPreset = (bpm: number, p: RhythmPreset): boolean =>
	bpm >= p.bpmMin && bpm <= p.bpmMax;

/** Rhythms (other than "other") whose range holds `bpm` and whose meter matches. */
export function rhythmsAt(bpm: number, meter?: Meter): Rhythm[] {
	return (Object.keys(RHYTHM_PRESETS) as Rhythm[]).filter((r) => {
		const p = RHYTHM_PRESETS[r];
		return r !== 'other' && inPreset(bpm, p) && (meter === undefined || p.meter === meter);
	});
}
