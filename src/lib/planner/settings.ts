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
	breaks: 1
};

export const DEFAULT_SETTINGS: PlanSettings = {
	fitThreshold: 0.5,
	// No dance twice within an hour; a break every 45 minutes of dancing, ten minutes long; a 15 s
	// changeover between entries: common practice (no source).
	repeatWindowMin: 60,
	breakEveryMin: 45,
	breakLengthMin: 10,
	maxConsecutiveFast: 2,
	// 150 BPM sits between the quick rhythms (two-step 182–198, east coast swing 142–158) and the
	// steady ones (cha-cha 100–116, west coast swing 112–128): REFERENCES.md's country-western
	// ranges (secondary, studios), threshold chosen from them.
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
