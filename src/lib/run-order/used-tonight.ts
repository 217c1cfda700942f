// "No track twice in one night" (issue 12) in the editor: when the DJ swaps or adds a track by
// hand, the songs already in tonight's order (saved or not) are marked, and the best unused one
// is the one picked for them.

/** Tracks in the order other than at `except`, each with the 1-based number of its entry. */
export function usedTonight(
	entries: readonly { trackId: number | null }[],
	except = -1
): Map<number, number> {
	const used = new Map<number, number>();
	entries.forEach((e, i) => {
		if (i !== except && e.trackId !== null && !used.has(e.trackId)) used.set(e.trackId, i + 1);
	});
	return used;
}

/** Unused tracks first, each group in the ranking's own order (a stable sort keeps it). */
export function unusedFirst<T extends { trackId: number }>(
	items: readonly T[],
	used: ReadonlyMap<number, number>
): T[] {
	return [...items].sort((a, b) => Number(used.has(a.trackId)) - Number(used.has(b.trackId)));
}
