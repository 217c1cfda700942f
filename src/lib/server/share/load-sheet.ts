// The run sheet of one evening, from the evenings loader plus the one fact it leaves out: each
// track's own length, which a playlist needs (a player plays the file as recorded).
import { inArray } from 'drizzle-orm';
import { db } from '../db';
import { tracks } from '../db/schema';
import { loadEvening, type EveningJson } from '../evenings/load';
import type { RunSheet } from './sheet';

type TrackFile = { durationS: number; missing: boolean };

function trackLengths(ids: number[]): Map<number, TrackFile> {
	if (ids.length === 0) return new Map();
	const rows = db()
		.select({ id: tracks.id, durationS: tracks.durationS, missingAt: tracks.audioMissingAt })
		.from(tracks)
		.where(inArray(tracks.id, ids))
		.all();
	return new Map(
		rows.map((r) => [r.id, { durationS: r.durationS, missing: r.missingAt !== null }])
	);
}

export const firstName = (name: string | null) => name?.trim().split(/\s+/)[0] || null;

export const shareUrlOf = (origin: string, token: string) =>
	`${origin.replace(/\/$/, '')}/e/${encodeURIComponent(token)}`;

/** A teach or walkthrough without a dance of its own is of its lesson section's dance. */
function lessonDance(evening: EveningJson, e: EveningJson['entries'][number]): string | null {
	if (e.danceName || (e.kind !== 'teach' && e.kind !== 'walkthrough')) return e.danceName;
	const at = Date.parse(e.startsAt);
	const section =
		evening.sections.find((s) => s.id === e.sectionId) ??
		evening.sections.find(
			(s) => s.kind === 'lesson' && Date.parse(s.startsAt) <= at && at < Date.parse(s.endsAt)
		);
	return section?.kind === 'lesson' ? section.danceName : null;
}

export function toSheet(
	evening: EveningJson,
	origin: string,
	lengths = new Map<number, TrackFile>()
) {
	const sheet: RunSheet = {
		id: evening.id,
		title: evening.title,
		venue: evening.venue,
		startsAt: Date.parse(evening.startsAt),
		endsAt: Date.parse(evening.endsAt),
		crowd: evening.crowd,
		notes: evening.notes,
		published: evening.published,
		shareUrl:
			evening.published && evening.shareToken ? shareUrlOf(origin, evening.shareToken) : null,
		timeZone: evening.timeZone,
		sections: evening.sections.map((s) => ({
			kind: s.kind,
			title: s.title,
			startsAt: Date.parse(s.startsAt),
			endsAt: Date.parse(s.endsAt),
			danceName: s.danceName,
			teacherFirstName: firstName(s.teacherName)
		})),
		entries: evening.entries.map((e, i) => ({
			position: i + 1,
			kind: e.kind,
			startsAt: Date.parse(e.startsAt),
			durationS: e.durationS,
			danceId: e.danceId,
			danceName: lessonDance(evening, e),
			level: e.danceLevel,
			formation: e.danceFormation,
			trackId: e.trackId,
			trackTitle: e.trackTitle,
			artist: e.trackArtist,
			trackDurationS: e.trackId === null ? null : (lengths.get(e.trackId)?.durationS ?? null),
			audioMissing: e.trackId !== null && lengths.get(e.trackId)?.missing === true,
			bpm: e.trackBpm,
			rate: e.rate,
			locked: e.locked,
			text: e.text
		}))
	};
	return sheet;
}

/** The run sheet, or null when there is no such evening. */
export function loadSheet(id: number, origin: string): RunSheet | null {
	const evening = loadEvening(id);
	if (!evening) return null;
	const ids = [...new Set(evening.entries.flatMap((e) => (e.trackId === null ? [] : [e.trackId])))];
	return toSheet(evening, origin, trackLengths(ids));
}
