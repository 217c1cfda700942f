// Where the drum hits fall. The beat (quarter note) is the tempo we call true, also in 3/4.
// 4/4: kick on 1 and 3, snare on 2 and 4, hats on the eighths (a plain backbeat).
// 3/4: a strong kick on 1 and lighter "pah" hits on 2 and 3, as a waltz is played
// (common practice, no source). Swing moves the off-beat eighth from 1/2 towards 2/3 of the beat.
import type { Meter } from '../domain';
import type { Random } from '../random';

export type Drum = 'kick' | 'snare' | 'hat';

export interface Hit {
	drum: Drum;
	timeS: number;
	gain: number;
}

export interface PatternOptions {
	bpm: number;
	meter: Meter;
	durationS: number;
	/** 0 = straight eighths, 1 = full triplet swing (off-beat at 2/3 of the beat). */
	swing: number;
	firstBeatS: number;
	random: Random;
}

const JITTER_S = 0.003;

export function drumHits(o: PatternOptions): Hit[] {
	const beatS = 60 / o.bpm;
	const offBeat = 0.5 + Math.min(1, Math.max(0, o.swing)) / 6;
	const hits: Hit[] = [];
	const human = (gain: number) => gain * (0.9 + 0.2 * o.random());
	const at = (t: number) => t + (o.random() * 2 - 1) * JITTER_S;
	for (let beat = 0; ; beat++) {
		const t = o.firstBeatS + beat * beatS;
		if (t >= o.durationS) break;
		const inBar = beat % o.meter;
		if (o.meter === 4) {
			if (inBar === 0 || inBar === 2) hits.push({ drum: 'kick', timeS: at(t), gain: human(1) });
			else hits.push({ drum: 'snare', timeS: at(t), gain: human(0.8) });
		} else if (inBar === 0) {
			hits.push({ drum: 'kick', timeS: at(t), gain: human(1) });
		} else {
			hits.push({ drum: 'snare', timeS: at(t), gain: human(0.45) });
		}
		hits.push({ drum: 'hat', timeS: at(t), gain: human(0.5) });
		hits.push({ drum: 'hat', timeS: at(t + offBeat * beatS), gain: human(0.3) });
	}
	return hits;
}
