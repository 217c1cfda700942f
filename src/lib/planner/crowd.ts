// What each crowd is best served by: a share of dances at each level, and the energy curve.
// These shapes are the planner's own judgement (common practice, no source): beginners mostly
// dance beginner and improver dances; an experienced crowd wants intermediate and advanced ones.
import type { CrowdMix } from '../domain';

/** Wanted share of dances at level rank 0 (absolute beginner) … 4 (advanced). */
export const LEVEL_MIX: Record<CrowdMix, number[]> = {
	'mostly-beginners': [0.25, 0.4, 0.25, 0.1, 0],
	mixed: [0.1, 0.25, 0.3, 0.25, 0.1],
	experienced: [0, 0.1, 0.25, 0.35, 0.3]
};

/** Energy 0..1 of an entry from its effective tempo (70 BPM calm … 200 BPM lively). */
export function energyOf(eff: number): number {
	if (!(eff > 0)) return 0.5;
	return Math.min(1, Math.max(0, (eff - 70) / 130));
}

/** A gentle shape through the night: warm up, peak about two thirds in, ease towards the end. */
export function energyTarget(fraction: number): number {
	const f = Math.min(1, Math.max(0, fraction));
	return f < 0.65 ? 0.4 + (0.3 * f) / 0.65 : 0.7 - (0.25 * (f - 0.65)) / 0.35;
}
