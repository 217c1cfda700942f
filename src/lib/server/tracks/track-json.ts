// A tracks row as the API's JSON: the columns the issue lists, dates as ISO strings, and never
// the storage key or the uploader's id.
import type { Meter } from '../../domain';
import type { TrackJson } from '../../music/track-types';
import type { tracks } from '../db/schema';

export type TrackRow = typeof tracks.$inferSelect;

export function toTrackJson(row: TrackRow): TrackJson {
	return {
		id: row.id,
		title: row.title,
		artist: row.artist,
		album: row.album,
		durationS: row.durationS,
		bpm: row.bpm,
		rawBpm: row.rawBpm,
		bpmSource: row.bpmSource,
		offsetS: row.offsetS,
		confidence: row.confidence,
		altBpm: row.altBpm,
		candidates: row.candidates,
		meter: row.meter as Meter,
		phraseBeats: row.phraseBeats,
		introBeats: row.introBeats,
		tagBpm: row.tagBpm,
		format: row.format,
		mimeType: row.mimeType,
		fileSize: row.fileSize,
		sha256: row.sha256,
		originalName: row.originalName,
		createdAt: row.createdAt.toISOString(),
		updatedAt: row.updatedAt.toISOString(),
		version: row.version
	};
}
