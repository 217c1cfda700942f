// What the fit engine reads from the database, selected narrowly: ranking one dance over ten
// thousand tracks must stay well under 50 ms, and most of a track row (hashes, candidates,
// names) plays no part in a fit.
import { eq } from 'drizzle-orm';
import type { DanceFacts, TrackFacts } from '../../domain';
import type { TeamVerdict } from '../../fit';
import { db, type Db } from '../db';
import { dances, fits } from '../db/schema';
import { danceFacts } from '../dances/dance-json';

const COLUMNS = `id, title, artist, duration_s, bpm, offset_s, meter, phrase_beats, intro_beats,
	version, updated_at`;
const TRACK_SQL = `SELECT ${COLUMNS} FROM tracks`;
const CHANGED_SQL = `SELECT ${COLUMNS} FROM tracks WHERE updated_at > ? OR id > ?`;
const SIGNATURE_SQL = `SELECT count(*), coalesce(max(id), 0), coalesce(sum(version), 0),
	coalesce(max(updated_at), 0) FROM tracks`;

type TrackTuple = [
	number,
	string,
	string,
	number,
	number | null,
	number,
	number,
	number,
	number,
	number,
	number
];

const factsOf = (r: TrackTuple): TrackFacts => ({
	id: r[0],
	title: r[1],
	artist: r[2],
	durationS: r[3],
	bpm: r[4],
	offsetS: r[5],
	meter: r[6] === 3 ? 3 : 4,
	phraseBeats: r[7],
	introBeats: r[8]
});

/** count, max(id), sum(version), max(updated_at) of the tracks table. */
type Signature = [number, number, number, number];

interface TrackCache {
	/** Changes on this connection and others when last checked. */
	stamp: string;
	signature: Signature;
	facts: TrackFacts[];
	byId: Map<number, TrackFacts>;
	versions: Map<number, number>;
}

// Per connection (tests swap databases). Team-wide data, the same for every reader, so sharing
// it between requests leaks nothing.
const caches = new WeakMap<object, TrackCache>();

type Client = Db['$client'];

/**
 * total_changes() counts this process's writes, data_version other connections' commits (e.g.
 * the seed script): both O(1), so an unchanged database costs microseconds to confirm.
 */
function stamp(client: Client): string {
	const mine = client.prepare('SELECT total_changes()').pluck().get();
	const others = client.pragma('data_version', { simple: true });
	return `${mine}:${others}`;
}

/**
 * Whether a write touched the tracks: every track edit bumps its version and updated_at (the
 * music API's 409 check relies on the version), an upload adds a row, a delete lowers the count.
 * About 1 ms over 10,000 rows, against ~10 ms of CPU to read them all again.
 */
const signatureOf = (client: Client) => client.prepare(SIGNATURE_SQL).raw(true).get() as Signature;

function fullRead(client: Client, now: string, signature: Signature): TrackCache {
	const rows = client.prepare(TRACK_SQL).raw(true).all() as TrackTuple[];
	const facts = rows.map(factsOf);
	return {
		stamp: now,
		signature,
		facts,
		byId: new Map(facts.map((t) => [t.id, t])),
		versions: new Map(rows.map((r) => [r[0], r[9]]))
	};
}

/**
 * Reads only the rows edited or added since the cache was made, and drops deleted ones. The
 * result must match the new signature exactly (count and version sum): an edit the time window
 * missed fails that check and the caller reads everything again.
 */
function patch(client: Client, cache: TrackCache, signature: Signature): boolean {
	const [, maxId, , maxUpdated] = cache.signature;
	const rows = client.prepare(CHANGED_SQL).raw(true).all(maxUpdated, maxId) as TrackTuple[];
	let versionSum = cache.signature[2];
	for (const r of rows) {
		versionSum += r[9] - (cache.versions.get(r[0]) ?? 0);
		cache.versions.set(r[0], r[9]);
		cache.byId.set(r[0], factsOf(r));
	}
	if (cache.byId.size > signature[0]) {
		// Some tracks were deleted: the ids alone (an index scan) say which.
		const live = new Set(client.prepare('SELECT id FROM tracks').pluck().all() as number[]);
		for (const id of [...cache.byId.keys()]) {
			if (live.has(id)) continue;
			versionSum -= cache.versions.get(id) ?? 0;
			cache.versions.delete(id);
			cache.byId.delete(id);
		}
	}
	if (cache.byId.size !== signature[0] || versionSum !== signature[2]) return false;
	cache.facts = [...cache.byId.values()];
	cache.signature = signature;
	return true;
}

/**
 * Every track's fit facts, kept between requests and brought up to date after writes. A raw
 * prepared statement returning arrays skips the ORM's per-row mapping, most of the cost at
 * 10,000 rows; the column list is fixed here, never built from input.
 */
export function trackFacts(): TrackCache {
	const client = db().$client;
	const now = stamp(client);
	const cached = caches.get(client);
	if (cached && cached.stamp === now) return cached;
	const signature = signatureOf(client);
	if (cached && cached.signature.join() === signature.join()) {
		cached.stamp = now;
		return cached;
	}
	if (cached && patch(client, cached, signature)) {
		cached.stamp = now;
		return cached;
	}
	const fresh = fullRead(client, now, signature);
	caches.set(client, fresh);
	return fresh;
}

/** Reads every track's facts afresh. */
export function loadTrackFacts(): TrackFacts[] {
	const rows = db().$client.prepare(TRACK_SQL).raw(true).all() as TrackTuple[];
	return rows.map(factsOf);
}

export function loadTrackFact(id: number): TrackFacts | null {
	const row = db().$client.prepare(`${TRACK_SQL} WHERE id = ?`).raw(true).get(id) as
		TrackTuple | undefined;
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
