// The rules an evening's times must keep: an end after the start, a sensible length, and
// sections inside the evening that do not overlap. Pure, so the form and the API share it.
import type { SectionKind } from '../../domain';

export interface TimedSection {
	kind: SectionKind;
	title?: string;
	startsAt: number;
	endsAt: number;
}

/** Longest evening we accept: 18 hours (judgement: a long weekend social, not a festival). */
export const MAX_EVENING_MS = 18 * 3_600_000;

const label = (s: TimedSection, i: number) => `Section ${i + 1} (${s.title?.trim() || s.kind})`;

/** The first problem with the evening's times in plain words, or null when they are fine. */
export function timeProblem(
	startsAt: number,
	endsAt: number,
	sections: readonly TimedSection[]
): string | null {
	if (!Number.isFinite(startsAt) || !Number.isFinite(endsAt)) return 'The dates are not valid.';
	if (endsAt <= startsAt) return 'The evening must end after it starts.';
	if (endsAt - startsAt > MAX_EVENING_MS) return 'An evening can last at most 18 hours.';
	for (const [i, s] of sections.entries()) {
		if (!Number.isFinite(s.startsAt) || !Number.isFinite(s.endsAt))
			return `${label(s, i)} has no valid times.`;
		if (s.endsAt <= s.startsAt) return `${label(s, i)} must end after it starts.`;
		if (s.startsAt < startsAt || s.endsAt > endsAt)
			return `${label(s, i)} lies outside the evening's start and end.`;
	}
	const sorted = sections.map((s, i) => ({ s, i })).sort((a, b) => a.s.startsAt - b.s.startsAt);
	for (let k = 1; k < sorted.length; k++) {
		const prev = sorted[k - 1];
		const next = sorted[k];
		if (next.s.startsAt < prev.s.endsAt)
			return `${label(next.s, next.i)} overlaps ${label(prev.s, prev.i).toLowerCase()}.`;
	}
	return null;
}
