// "Check by ear": when the reading at the other metrical level (×2 or ÷2, and in 3/4 also ×3/2
// or ×2/3) scores nearly as well as the winner, the measurement cannot tell the two apart and
// the DJ's ear should. The threshold is the one figure here; it was set on the tuning half of
// the outside corpus (scripts/corpus) so that tracks marked sure are nearly always right.
import type { Meter } from '../domain';

export const NEARLY_AS_STRONG = 0.8;

const RELATED: Record<Meter, number[]> = { 4: [2, 0.5], 3: [2, 0.5, 1.5, 2 / 3] };

/** The other reading worth offering, or null when the winner stands clear. */
export function alternativeOf(
	result: { bpm: number; meter: Meter; candidates: { bpm: number; score: number }[] },
	threshold = NEARLY_AS_STRONG
): number | null {
	const best = result.candidates[0];
	if (!best || best.score <= 0) return null;
	let pick: { bpm: number; score: number } | null = null;
	for (const c of result.candidates.slice(1)) {
		const related = RELATED[result.meter].some(
			(k) => Math.abs(c.bpm / (result.bpm * k) - 1) < 0.03
		);
		if (related && c.score >= threshold * best.score && (!pick || c.score > pick.score)) pick = c;
	}
	return pick ? pick.bpm : null;
}
