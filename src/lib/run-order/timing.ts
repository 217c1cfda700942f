// Start times of a run order, shared by the editor (to show times while editing) and the server
// (which recomputes them on every save). Pure TypeScript: no framework imports.
import type { EntryKind } from '../domain';

export interface TimedEntry {
	kind: EntryKind;
	sectionId?: number | null;
	durationS: number;
	locked?: boolean;
	/** A locked entry's start: it stays there unless the entries before it run past it. */
	startS?: number | null;
}

export interface SectionStart {
	id: number;
	/** Seconds from the evening's start. */
	startS: number;
}

/** Default lengths of entries a person adds by hand, in seconds (common practice, no source). */
export const DEFAULT_DURATION_S: Record<EntryKind, number> = {
	dance: 0,
	teach: 10 * 60,
	walkthrough: 3 * 60,
	break: 10 * 60,
	announcement: 60
};

/**
 * Entries run back to back with `gapS` between them, but never start before their own section
 * does: a break section at 20:50 stays at 20:50 however the open floor before it was edited.
 * A locked entry keeps its own start too (the team fixed it), unless what comes before runs on.
 */
export function recomputeStarts(
	entries: readonly TimedEntry[],
	sections: readonly SectionStart[],
	gapS: number
): number[] {
	const floor = new Map(sections.map((s) => [s.id, s.startS]));
	const starts: number[] = [];
	let prevEnd: number | null = null;
	for (const e of entries) {
		const earliest = prevEnd === null ? 0 : prevEnd + gapS;
		const sectionStart = e.sectionId != null ? (floor.get(e.sectionId) ?? 0) : 0;
		const pinned = e.locked && typeof e.startS === 'number' ? e.startS : 0;
		const start = Math.max(earliest, sectionStart, pinned);
		starts.push(start);
		prevEnd = start + Math.max(0, e.durationS);
	}
	return starts;
}

/**
 * The section an entry belongs to after it moved to index `at`: its new neighbour's (the one
 * before it, or the one after when it is first), else the one it had.
 */
export function sectionAfterMove<T extends { sectionId: number | null | undefined }>(
	entries: readonly T[],
	at: number
): number | null {
	const before = entries[at - 1];
	const after = entries[at + 1];
	return before?.sectionId ?? after?.sectionId ?? entries[at]?.sectionId ?? null;
}
