// What the fit engine reads from the database, selected narrowly: most of a track row (hashes,
// candidates, names) plays no part in a fit.
import { eq } from 'drizzle-orm';
import type { DanceFacts, TrackFacts } from '../../domain';
import type { TeamVerdict } from '../../fit';
import { db } from '../db';
import { dances, fits, tracks } from '../db/schema';
import { danceFacts } from '../dances/dance-json';

// The columns a fit uses, by name: Drizzle maps them, and nothing else of a track row is read.
const FIT_COLUMNS = {
	id: tracks.id,
	title: tracks.title,
	artist: tracks.artist,
	durationS: tracks.durationS,
	bpm: tracks.bpm,
	offsetS: tracks.offsetS,
	meter: tracks.meter,
	phraseBeats: tracks.phraseBeats,
	introBeats: tracks.introBeats
};

const factsOf = (r: Omit<TrackFacts, 'meter'> & { meter: number }): TrackFacts => ({
	...r,
	meter: r.meter === 3 ? 3 : 4
});

/** Every track's fit facts, read afresh (answers built from them are kept: cached-json.ts). */
export function loadTrackFacts(): TrackFacts[] {
	return db().select(FIT_COLUMNS).from(tracks).all().map(factsOf);
}

/** The same facts with an index by id. */
export function trackFacts(): { facts: TrackFacts[]; byId: Map<number, TrackFacts> } {
	const facts = loadTrackFacts();
	return { facts, byId: new Map(facts.map((t) => [t.id, t])) };
}

export function loadTrackFact(id: number): TrackFacts | null {
	const row = db().select(FIT_COLUMNS).from(tracks).where(eq(tracks.id, id)).get();
	return row ? factsOf(row) : null;
}

export const loadDanceRows = () => db().select().from(dances).all();

export function loadDanceFacts(): DanceFacts[] {
	return loadDanceRows().map(danceFacts);
}

export interface StoredVerdict extends TeamVerdict {
	notes: string;
	lessonRate: number | null;
}

/** A 'fits-at-rate' stored at rate 1 means "at some rate": the engine then picks the best. */
function asVerdict(row: {
	verdict: TeamVerdict['verdict'];
	rate: number;
	notes: string;
	lessonRate: number | null;
}): StoredVerdict {
	const rate = row.verdict === 'fits-at-rate' && row.rate === 1 ? null : row.rate;
	return { verdict: row.verdict, rate, notes: row.notes, lessonRate: row.lessonRate };
}

const VERDICT_COLUMNS = {
	trackId: fits.trackId,
	danceId: fits.danceId,
	verdict: fits.verdict,
	rate: fits.rate,
	notes: fits.notes,
	lessonRate: fits.lessonRate
};

export function verdictsForDance(danceId: number): Map<number, StoredVerdict> {
	const rows = db().select(VERDICT_COLUMNS).from(fits).where(eq(fits.danceId, danceId)).all();
	return new Map(rows.map((r) => [r.trackId, asVerdict(r)]));
}

export function verdictsForTrack(trackId: number): Map<number, StoredVerdict> {
	const rows = db().select(VERDICT_COLUMNS).from(fits).where(eq(fits.trackId, trackId)).all();
	return new Map(rows.map((r) => [r.danceId, asVerdict(r)]));
}
