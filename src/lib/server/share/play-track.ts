// The track a signed play link may serve: only while its evening exists and the track is in
// that evening's run order. A link outlives neither a deleted evening nor a track taken out.
import { and, eq } from 'drizzle-orm';
import { db } from '../db';
import { evenings, runOrderEntries, tracks } from '../db/schema';
import type { TrackRow } from '../tracks';

export function playableTrack(eveningId: number, trackId: number): TrackRow | null {
	const row = db()
		.select({ track: tracks })
		.from(runOrderEntries)
		.innerJoin(evenings, eq(evenings.id, runOrderEntries.eveningId))
		.innerJoin(tracks, eq(tracks.id, runOrderEntries.trackId))
		.where(and(eq(runOrderEntries.eveningId, eveningId), eq(runOrderEntries.trackId, trackId)))
		.limit(1)
		.get();
	return row?.track ?? null;
}
