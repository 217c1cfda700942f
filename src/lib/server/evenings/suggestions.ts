// Tracks to swap in for a dance: the fit engine's ranking with the facts the editor shows.
import { eq, inArray } from 'drizzle-orm';
import { db } from '../db';
import { dances, tracks } from '../db/schema';
import { rankTracksFor } from './catalogue';

export interface Suggestion {
	trackId: number;
	title: string;
	artist: string;
	bpm: number | null;
	durationS: number;
	score: number;
	verdict: string | null;
	rate: number;
	reasons: string[];
}

/** The best fitting tracks for the dance (never one the team said does not fit); null if unknown. */
export function suggestTracks(danceId: number, limit = 12): Suggestion[] | null {
	const dance = db().select({ id: dances.id }).from(dances).where(eq(dances.id, danceId)).get();
	if (!dance) return null;
	const ranked = rankTracksFor(danceId, limit + 4).filter((f) => f.verdict !== 'does-not-fit');
	const top = ranked.slice(0, limit);
	if (!top.length) return [];
	const rows = db()
		.select()
		.from(tracks)
		.where(
			inArray(
				tracks.id,
				top.map((f) => f.trackId)
			)
		)
		.all();
	const byId = new Map(rows.map((t) => [t.id, t]));
	return top.map((f) => {
		const t = byId.get(f.trackId)!;
		return {
			trackId: t.id,
			title: t.title,
			artist: t.artist,
			bpm: t.bpm,
			durationS: t.durationS,
			score: f.score,
			verdict: f.verdict,
			rate: f.tempo.rate,
			reasons: f.reasons
		};
	});
}
