// The browser's side of the tracks API: load every page, save an edit with its version, mark a
// fit, through the one API helper, so the page, the track page and the table share it.
import { api, ApiError } from '../api-client';
import type { TrackJson, TrackPage } from './track-types';

export { ApiError };

/** On a refused save (409), the track as it is saved now, sent with the refusal. */
export const trackOnConflict = (e: unknown): TrackJson | undefined =>
	e instanceof ApiError && e.status === 409 ? (e.body.current as TrackJson | undefined) : undefined;

/** Every track matching `query`, page by page (500 a page, the API's most). */
export async function fetchAllTracks(
	query: Record<string, string> = {},
	onPage?: (items: TrackJson[], total: number) => void,
	signal?: AbortSignal
): Promise<TrackJson[]> {
	const all: TrackJson[] = [];
	let cursor: string | null = null;
	do {
		const params = new URLSearchParams({ ...query, limit: '500', sort: 'title' });
		if (cursor) params.set('cursor', cursor);
		const page = await api<TrackPage>(`/api/tracks?${params}`, { signal });
		all.push(...page.items);
		onPage?.(page.items, page.total);
		cursor = page.nextCursor;
	} while (cursor);
	return all;
}

export type TrackChanges = Partial<
	Pick<
		TrackJson,
		| 'title'
		| 'artist'
		| 'album'
		| 'bpm'
		| 'altBpm'
		| 'bpmSource'
		| 'offsetS'
		| 'meter'
		| 'phraseBeats'
		| 'introBeats'
	>
>;

/** Saves changes; a 409 throws an ApiError carrying the track as it is now. */
export async function patchTrack(
	track: Pick<TrackJson, 'id' | 'version'>,
	changes: TrackChanges
): Promise<TrackJson> {
	const saved = await api<{ track: TrackJson }>(`/api/tracks/${track.id}`, {
		method: 'PATCH',
		body: { ...changes, version: track.version }
	});
	return saved.track;
}

/** The team's verdict for a track and a dance (PUT /api/fits, the fits feature's endpoint). */
export async function putFit(body: {
	trackId: number;
	danceId: number;
	verdict: 'fits' | 'fits-at-rate' | 'does-not-fit';
	rate?: number;
	notes?: string;
}): Promise<void> {
	await api('/api/fits', { method: 'PUT', body });
}

/**
 * Ids of the tracks matching the team's verdicts: for a dance (fits or fits-at-rate, or the one
 * verdict given), or with no dance (null) any track holding that verdict for some dance.
 */
export async function trackIdsFor(danceId: number | null, verdict: string): Promise<Set<number>> {
	const query: Record<string, string> = {};
	if (danceId !== null) query.dance = String(danceId);
	if (verdict) query.verdict = verdict;
	const rows = await fetchAllTracks(query);
	return new Set(rows.map((t) => t.id));
}

/** Whose word says a track suits a dance: the team's verdict, or the computed fit alone. */
export type FitWord = 'team' | 'computed';

/**
 * The tracks that suit a dance, each with whose word says so: the team's verdict where it gave
 * one ("does not fit" keeps a track out), else the computed fit (tempo, meter, the rate bound).
 */
export async function suitingTracks(danceId: number): Promise<Map<number, FitWord>> {
	const { items } = await api<{
		items: { track: { id: number }; fitting: boolean; verdict: string | null }[];
	}>(`/api/dances/${danceId}/fits?limit=10000`);
	const words = new Map<number, FitWord>();
	for (const i of items) if (i.fitting) words.set(i.track.id, i.verdict ? 'team' : 'computed');
	return words;
}
