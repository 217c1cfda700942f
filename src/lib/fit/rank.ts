// Ranking fits, best first: the team's "fits" verdicts (as is or at a rate) above every computed
// guess, then the computed score, and "does not fit" last; ties by id so the order is stable.
import { Heap } from 'heap-js';
import type { DanceFacts, TrackFacts } from '../domain';
import { ReasonMemo } from './fit-reasons';
import { fitTrackToDance, prepareSettings, type FitItem, type TeamVerdict } from './fit-score';
import type { FitSettings } from './settings';

/** Verdicts by track id (or dance id); a Map or a plain object both work. */
export type VerdictLookup =
	ReadonlyMap<number, TeamVerdict> | Readonly<Record<number, TeamVerdict | undefined>>;

/** The verdict for an id in either kind of lookup. */
export function verdictFor(
	verdicts: VerdictLookup | null | undefined,
	id: number
): TeamVerdict | null {
	if (!verdicts) return null;
	if (verdicts instanceof Map) return verdicts.get(id) ?? null;
	return (verdicts as Record<number, TeamVerdict | undefined>)[id] ?? null;
}

/** 0 = the team says it fits, 1 = no verdict, 2 = the team says it does not. */
function group(verdict: TeamVerdict | null): number {
	if (!verdict) return 1;
	return verdict.verdict === 'does-not-fit' ? 2 : 0;
}

/**
 * Order n candidates by (group, score desc, id) and return the first `limit` indices. Scores are
 * rounded to 3 decimals and lie in 0..1, so one number per candidate carries group and score.
 * A short list from a long one (50 of 10,000 tracks) is picked with a bounded heap, which looks at
 * each candidate once instead of sorting them all.
 */
function order(keys: Float64Array, ids: Float64Array, limit: number): Uint32Array {
	const n = keys.length;
	const before = (a: number, b: number) => keys[a] - keys[b] || ids[a] - ids[b];
	if (limit * 8 >= n) {
		const idx = new Uint32Array(n);
		for (let i = 0; i < n; i++) idx[i] = i;
		idx.sort(before);
		return limit < n ? idx.subarray(0, limit) : idx;
	}
	// The `limit` best seen so far, the worst of them on top, so each newcomer is one comparison.
	const kept = new Heap<number>((a, b) => before(b, a));
	for (let i = 0; i < n; i++) {
		if (kept.length < limit) kept.push(i);
		else if (limit > 0 && before(i, kept.peek()!) < 0) kept.replace(i);
	}
	return Uint32Array.from(kept.toArray()).sort(before);
}

function normalLimit(limit: number | null | undefined, n: number): number {
	if (limit == null || !Number.isFinite(limit)) return n;
	return Math.max(0, Math.min(n, Math.floor(limit)));
}

/**
 * The tracks that suit a dance, best first. Only the first `limit` items carry reasons and are
 * built in full; the rest are scored without words.
 */
/**
 * Score every candidate, order them, and build the first `limit` in full. When every item will be
 * shown, each is built once with its reasons; otherwise the rest are scored without words.
 */
function rankCandidates<T extends { id: number }>(
	candidates: readonly T[],
	verdicts: VerdictLookup | null | undefined,
	limit: number | null | undefined,
	evaluate: (candidate: T, verdict: TeamVerdict | null, words: boolean | ReasonMemo) => FitItem,
	memo: ReasonMemo | null = null
): FitItem[] {
	const n = candidates.length;
	const keep = normalLimit(limit, n);
	const full = keep === n;
	const keys = new Float64Array(n);
	const ids = new Float64Array(n);
	const built: FitItem[] = full ? new Array<FitItem>(n) : [];
	for (let i = 0; i < n; i++) {
		const c = candidates[i];
		const v = verdictFor(verdicts, c.id);
		const item = evaluate(c, v, full && (memo ?? true));
		if (full) built[i] = item;
		keys[i] = group(v) * 2 - item.score;
		ids[i] = c.id;
	}
	const top = order(keys, ids, keep);
	const items = new Array<FitItem>(top.length);
	for (let k = 0; k < top.length; k++) {
		const i = top[k];
		items[k] = full
			? built[i]
			: evaluate(candidates[i], verdictFor(verdicts, candidates[i].id), memo ?? true);
	}
	return items;
}

/** The tracks that suit a dance, best first (see the file comment for the order). */
export function rankFits(
	dance: DanceFacts,
	tracks: readonly TrackFacts[],
	verdictsByTrackId?: VerdictLookup | null,
	settings?: Partial<FitSettings> | null,
	limit?: number | null
): FitItem[] {
	const s = prepareSettings(settings);
	// One dance and one settings object throughout, so sentences can be shared.
	return rankCandidates(
		tracks,
		verdictsByTrackId,
		limit,
		(t, v, words) => fitTrackToDance(t, dance, v, s, words),
		new ReasonMemo()
	);
}

/** The dances a track suits, best first; the same rules from the track's side. */
export function rankDancesForTrack(
	track: TrackFacts,
	dances: readonly DanceFacts[],
	verdictsByDanceId?: VerdictLookup | null,
	settings?: Partial<FitSettings> | null,
	limit?: number | null
): FitItem[] {
	const s = prepareSettings(settings);
	return rankCandidates(dances, verdictsByDanceId, limit, (d, v, words) =>
		fitTrackToDance(track, d, v, s, words)
	);
}
