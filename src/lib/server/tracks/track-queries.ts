// One track: read, edit with optimistic locking (the row's version), delete with its audio.
import { and, eq, sql } from 'drizzle-orm';
import type { Meter } from '../../domain';
import type { TrackPatch } from '../../music/track-schemas';
import { defaultPhraseBeats, type TrackJson } from '../../music/track-types';
import { db } from '../db';
import { tracks } from '../db/schema';
import { storage, type Storage } from '../storage';
import { toTrackJson, type TrackRow } from './track-json';

export const getTrackRow = (id: number): TrackRow | undefined =>
	db().select().from(tracks).where(eq(tracks.id, id)).get();

export function getTrack(id: number): TrackJson | null {
	const row = getTrackRow(id);
	return row ? toTrackJson(row) : null;
}

export type UpdateResult =
	| { kind: 'updated'; track: TrackJson }
	| { kind: 'not-found' }
	| { kind: 'stale'; current: TrackJson };

export function updateTrack(id: number, patch: TrackPatch): UpdateResult {
	const { version, ...changes } = patch;
	const before = getTrackRow(id);
	if (!before) return { kind: 'not-found' };
	if (before.version !== version) return { kind: 'stale', current: toTrackJson(before) };
	const values: Partial<TrackRow> = { ...changes };
	// A tempo typed without saying where it came from was entered by hand.
	if (changes.bpm !== undefined && changes.bpmSource === undefined) values.bpmSource = 'entered';
	// A tempo the DJ sets settles a pending check by ear.
	if (changes.bpm !== undefined && changes.altBpm === undefined) values.altBpm = null;
	// Changing the meter moves a phrase still at the old default to the new default.
	if (
		changes.meter !== undefined &&
		changes.phraseBeats === undefined &&
		before.phraseBeats === defaultPhraseBeats(before.meter as Meter)
	) {
		values.phraseBeats = defaultPhraseBeats(changes.meter);
	}
	const row = db()
		.update(tracks)
		.set({ ...values, version: sql`${tracks.version} + 1`, updatedAt: new Date() })
		.where(and(eq(tracks.id, id), eq(tracks.version, version)))
		.returning()
		.get();
	if (!row) {
		// Someone else saved between our read and our write.
		const current = getTrackRow(id);
		return current ? { kind: 'stale', current: toTrackJson(current) } : { kind: 'not-found' };
	}
	return { kind: 'updated', track: toTrackJson(row) };
}

/**
 * Removes the row, then its audio. Should removing the file fail, the row is already gone and
 * the start-up sweep (src/lib/server/sweep.ts) removes the file without a row.
 */
export async function deleteTrack(id: number, store: Storage = storage()): Promise<boolean> {
	const row = db()
		.delete(tracks)
		.where(eq(tracks.id, id))
		.returning({ key: tracks.storageKey })
		.get();
	if (!row) return false;
	try {
		await store.remove(row.key);
	} catch (e) {
		console.error(`Track ${id}: its audio ${row.key} could not be removed`, e);
	}
	return true;
}
