// The catalogue as the pure modules see it: dances and tracks as facts, the team's verdicts, and
// fit scores computed by the fit engine (src/lib/fit/).
import { eq, isNull } from 'drizzle-orm';
import type { DanceFacts, Meter, Rhythm, TrackFacts } from '../../domain';
import { rankFits, type FitItem, type TeamVerdict } from '../../fit';
import { db } from '../db';
import { dances, fits, tracks } from '../db/schema';

type DanceRow = typeof dances.$inferSelect;
type TrackRow = typeof tracks.$inferSelect;
type FitRow = typeof fits.$inferSelect;

export const danceFacts = (d: DanceRow): DanceFacts => ({
	id: d.id,
	name: d.name,
	counts: d.counts,
	walls: (d.walls === 1 || d.walls === 2 ? d.walls : 4) as 1 | 2 | 4,
	level: d.level,
	rhythm: d.rhythm as Rhythm,
	meter: (d.meter === 3 ? 3 : 4) as Meter,
	bpmMin: d.bpmMin,
	bpmMax: d.bpmMax,
	turn: d.turn ?? null,
	events: d.events
});

export const trackFacts = (t: TrackRow): TrackFacts => ({
	id: t.id,
	title: t.title,
	artist: t.artist,
	durationS: t.durationS,
	bpm: t.bpm,
	offsetS: t.offsetS,
	meter: (t.meter === 3 ? 3 : 4) as Meter,
	phraseBeats: t.phraseBeats,
	introBeats: t.introBeats
});

export interface Catalogue {
	dances: DanceRow[];
	tracks: TrackRow[];
	fitRows: FitRow[];
}

/** A track the planner may offer: its audio file was there at the last sweep. */
export const playable = (t: TrackRow) => t.audioMissingAt === null;

export function readCatalogue(): Catalogue {
	return {
		dances: db().select().from(dances).all(),
		tracks: db().select().from(tracks).all(),
		fitRows: db().select().from(fits).all()
	};
}

export function verdictsOfDance(fitRows: readonly FitRow[], danceId: number) {
	const map = new Map<number, TeamVerdict>();
	for (const f of fitRows)
		if (f.danceId === danceId) map.set(f.trackId, { verdict: f.verdict, rate: f.rate });
	return map;
}

/** The tracks that suit one dance, best first, with reasons (team verdicts outrank scores). */
export function rankTracksFor(danceId: number, limit = 12): FitItem[] {
	const dance = db().select().from(dances).where(eq(dances.id, danceId)).get();
	if (!dance) return [];
	const trackRows = db().select().from(tracks).where(isNull(tracks.audioMissingAt)).all();
	const fitRows = db().select().from(fits).where(eq(fits.danceId, danceId)).all();
	return rankFits(
		danceFacts(dance),
		trackRows.map(trackFacts),
		verdictsOfDance(fitRows, danceId),
		null,
		limit
	);
}
