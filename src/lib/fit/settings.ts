// The fit engine's knobs. Every default is a judgement or common practice, not a published rule,
// so each one is a setting a team can change.

export interface FitSettings {
	/** Largest playback-rate change a DJ accepts, as a fraction: 0.08 = ±8 % (issue 4's default). */
	maxRateChange: number;
	/** Whether a track may be counted at half or double its measured tempo. */
	allowHalfDouble: boolean;
	/** Tempo-score multiplier for half/double counting in 4/4 (a little below direct). */
	halfDoubleFactor: number;
	/**
	 * Tempo-score multiplier for half/double counting in 3/4. Halving 3/4 puts 1½ dance counts in a
	 * bar, so it only works when the measured tempo was itself a double-time reading; scored lower.
	 */
	tripleHalfDoubleFactor: number;
	/** A song "ends cleanly" when it stops within this many counts of a repetition's end. */
	cleanEndCounts: number;
	/** Fewer whole repetitions than this and the song is too short to dance (judgement). */
	minRepetitions: number;
	/** Songs longer than this, as played, are penalised (judgement: 5½ minutes). */
	longSongS: number;
}

export const DEFAULT_FIT_SETTINGS: Readonly<FitSettings> = Object.freeze({
	maxRateChange: 0.08,
	allowHalfDouble: true,
	halfDoubleFactor: 0.9,
	tripleHalfDoubleFactor: 0.7,
	cleanEndCounts: 4,
	minRepetitions: 2,
	longSongS: 330
});

/** Fill a partial settings object from the defaults, ignoring values that are not numbers. */
export function resolveFitSettings(partial?: Partial<FitSettings> | null): FitSettings {
	const s: FitSettings = { ...DEFAULT_FIT_SETTINGS };
	if (!partial) return s;
	for (const key of Object.keys(s) as (keyof FitSettings)[]) {
		const value = partial[key];
		if (typeof value === typeof s[key] && (typeof value !== 'number' || Number.isFinite(value))) {
			(s as unknown as Record<string, unknown>)[key] = value;
		}
	}
	return s;
}
