// The browser's side of the tracks API: load every page, save an edit with its version, mark a
// fit. Plain fetch, no framework, so the page, the track page and the table share it.
import type { TrackJson, TrackPage } from './track-types';

export class ApiError extends Error {
	constructor(
		message: string,
		readonly status: number,
		readonly current?: TrackJson
	) {
		super(message);
	}
}

async function failure(res: Response): Promise<ApiError> {
	const body = (await res.json().catch(() => ({}))) as { error?: string; current?: TrackJson };
	return new ApiError(body.error ?? `The server answered ${res.status}.`, res.status, body.current);
}

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
		const res = await fetch(`/api/tracks?${params}`, { signal });
		if (!res.ok) throw await failure(res);
		const page = (await res.json()) as TrackPage;
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
	const res = await fetch(`/api/tracks/${track.id}`, {
		method: 'PATCH',
		headers: { 'content-type': 'application/json' },
		body: JSON.stringify({ ...changes, version: track.version })
	});
	if (!res.ok) throw await failure(res);
	return ((await res.json()) as { track: TrackJson }).track;
}

/** The team's verdict for a track and a dance (PUT /api/fits, the fits feature's endpoint). */
export async function putFit(body: {
	trackId: number;
	danceId: number;
	verdict: 'fits' | 'fits-at-rate' | 'does-not-fit';
	rate?: number;
	notes?: string;
}): Promise<void> {
	const res = await fetch('/api/fits', {
		method: 'PUT',
		headers: { 'content-type': 'application/json' },
		body: JSON.stringify(body)
	});
	if (!res.ok) throw await failure(res);
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
