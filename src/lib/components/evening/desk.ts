// Where the evening is now, for the DJ's desk: the current and next entries by the clock against
// the planned start times, the time left in the section, the next announcement and the next
// rest. Pure.

export interface DeskEntry {
	kind: string;
	startS: number;
	durationS: number;
	sectionId: number | null;
}

export interface DeskSection {
	id: number;
	startS: number;
	endS: number;
}

export interface DeskPosition {
	/** 'before' the first entry, 'during' the run order, 'after' the last entry ends. */
	phase: 'before' | 'during' | 'after';
	current: number | null;
	next: number | null;
	/** Seconds left in the current entry. */
	entryLeftS: number | null;
	/** Seconds left in the section the current entry belongs to. */
	sectionLeftS: number | null;
	nextAnnouncement: number | null;
	/** The next break in the run order, and the seconds until it starts (by the planned start). */
	nextRest: number | null;
	restInS: number | null;
}

/** The entry playing at `atS` seconds from the evening's start (the last one that has begun). */
export function entryAt(entries: readonly DeskEntry[], atS: number): number | null {
	let found: number | null = null;
	for (let i = 0; i < entries.length; i++) if (entries[i].startS <= atS) found = i;
	return found;
}

/**
 * The desk's view at `atS`. `manual`, when given, is the entry the DJ moved to by hand; the clock
 * still measures the time left from the planned starts.
 */
export function deskPosition(
	entries: readonly DeskEntry[],
	sections: readonly DeskSection[],
	atS: number,
	manual: number | null = null
): DeskPosition {
	const n = entries.length;
	const last = entries[n - 1];
	const byClock = entryAt(entries, atS);
	const current = manual !== null ? Math.max(0, Math.min(n - 1, manual)) : byClock;
	const phase: DeskPosition['phase'] =
		n === 0 || (manual === null && byClock === null)
			? 'before'
			: manual === null && last && atS >= last.startS + last.durationS
				? 'after'
				: 'during';
	const next =
		phase === 'before' ? (n ? 0 : null) : current !== null && current + 1 < n ? current + 1 : null;
	const cur = current !== null && phase !== 'before' ? entries[current] : null;
	const section = cur ? sections.find((s) => s.id === cur.sectionId) : undefined;
	const from = phase === 'before' ? 0 : (current ?? 0) + 1;
	const firstFrom = (kind: string) => {
		for (let i = from; i < n; i++) if (entries[i].kind === kind) return i;
		return null;
	};
	const nextAnnouncement = firstFrom('announcement');
	// A rest under way counts as the rest: the floor is resting now.
	const nextRest = cur?.kind === 'break' ? current : firstFrom('break');
	return {
		phase,
		current: phase === 'before' ? null : current,
		next,
		entryLeftS: cur ? Math.max(0, cur.startS + cur.durationS - atS) : null,
		sectionLeftS: section ? Math.max(0, section.endS - atS) : null,
		nextAnnouncement,
		nextRest,
		restInS: nextRest !== null ? Math.max(0, entries[nextRest].startS - atS) : null
	};
}
