// Tempo arithmetic from DESIGN.md: effective tempo at a playback rate is bpm × rate, bars per
// minute is bpm ÷ beats per bar.

export const effectiveBpm = (bpm: number, rate: number): number => bpm * rate;

export const barsPerMinute = (bpm: number, beatsPerBar: number): number => bpm / beatsPerBar;

/** The inverse: a dance table's bars per minute in beats per minute. */
export const barsPerMinuteToBpm = (bars: number, beatsPerBar: number): number => bars * beatsPerBar;

/** The playback rate that turns `bpm` into `targetBpm` (0.9 slows by 10 %). */
export function rateFor(bpm: number, targetBpm: number): number {
	if (!(bpm > 0) || !(targetBpm > 0)) throw new RangeError('tempi must be positive');
	return targetBpm / bpm;
}
