// Defaults for the planner's settings. Figures marked "common practice (no source)" are habits of
// social dance evenings, not published standards; every one is a setting the team can change.
import type { PlanInput, PlanSettings, PlanWeights } from './types';

export const DEFAULT_WEIGHTS: PlanWeights = {
	difficulty: 1,
	tempo: 1,
	energy: 1,
	rhythm: 1,
	phrasing: 1,
	requests: 5,
	mustPlay: 5,
	lastDance: 2,
	reprise: 1,
	filler: 1,
	breaks: 1,
	formation: 1
};

export const DEFAULT_SETTINGS: PlanSettings = {
	fitThreshold: 0.5,
	// No dance twice within an hour; a 15 s changeover between entries; a rest, when one is asked
	// for, ten minutes long: common practice (no source).
	repeatWindowMin: 60,
	// Off: rests come only where the evening's sections put them, unless the evening form asks for
	// "a rest after every N minutes of dancing" (issue 12: nobody asked for the extra breaks).
	breakEveryMin: 0,
	breakLengthMin: 10,
	// A partner dance after every three line dances, never two partner dances running: a
	// country night's usual mix (common practice, no source); both are evening settings.
	partnerEvery: 3,
	partnerBackToBack: false,
	// Never a clip on the floor: a track must hold two whole repetitions of the dance and last
	// 90 s at least (issue 12's defaults; common practice, no source).
	minRepetitions: 2,
	minTrackS: 90,
	maxConsecutiveFast: 2,
	// 150 BPM sits between the quick rhythms (two-step 182–198, east coast swing 142–158) and the
	// steady ones (cha-cha 100–116, west coast swing 112–128): REFERENCES.md's country-western
	// ranges (common practice, no source: see rhythm-presets.ts), threshold chosen from them.
	fastBpm: 150,
	gapS: 15,
	teachLengthMin: 10,
	walkthroughLengthMin: 3,
	endToleranceS: 180,
	announcementMaxS: 180,
	fullTempoTolerance: 0.05,
	// Teaching slows music by roughly 10–15 % (common practice, REFERENCES.md).
	lessonFallbackRate: 0.9,
	weights: DEFAULT_WEIGHTS,
	// A safety net only: the iteration budget binds, so a busy machine still gets the same plan.
	timeBudgetMs: 1000,
	seed: 1
};

/** Longest dancing without a rest, in seconds: unlimited when the setting is off (0). */
export const restLimitS = (s: PlanSettings) =>
	s.breakEveryMin > 0 ? s.breakEveryMin * 60 : Infinity;

/** The evening-form setting's own words, so a reason or a warning names what asked for it. */
export const restSettingWords = (s: PlanSettings) =>
	`the evening's setting "a rest after every ${s.breakEveryMin} minutes of dancing"`;

export function resolveSettings(input: PlanInput): PlanSettings {
	const given = input.settings ?? {};
	const merged: PlanSettings = {
		...DEFAULT_SETTINGS,
		...given,
		weights: { ...DEFAULT_WEIGHTS, ...(given.weights ?? {}) }
	};
	if (input.seed !== undefined) merged.seed = input.seed;
	return merged;
}
