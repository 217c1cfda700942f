// GET /api/tracks: search, filters, sort and keyset pages. Keyset (not offset) paging so a page
// deep in 10,000 tracks costs the same as the first and rows added meanwhile do not shift pages.
import { and, eq, getTableColumns, gte, isNotNull, lte, sql, type SQL } from 'drizzle-orm';
import type { TrackListQuery, TrackSort } from '../../music/track-schemas';
import type { TrackPage } from '../../music/track-types';
import { db } from '../db';
import { fits, tracks } from '../db/schema';
import { decodeCursor, encodeCursor } from './cursor';
import { toTrackJson } from './track-json';

type Field = TrackSort extends `-${infer F}` ? F : never;

// Sort keys are never NULL (NULL breaks keyset comparisons): a track without a tempo or a
// confidence sorts as 0, before every measured one. Text sorts ignore case.
const KEYS: Record<Field, SQL> = {
	bpm: sql`coalesce(${tracks.bpm}, 0)`,
	title: sql`${tracks.title} COLLATE NOCASE`,
	artist: sql`${tracks.artist} COLLATE NOCASE`,
	album: sql`${tracks.album} COLLATE NOCASE`,
	durationS: sql`${tracks.durationS}`,
	createdAt: sql`${tracks.createdAt}`,
	confidence: sql`coalesce(${tracks.confidence}, 0)`
};

export class BadCursorError extends Error {}

const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

function filters(q: TrackListQuery): SQL[] {
	const where: SQL[] = [];
	if (q.q) {
		const p = likePattern(q.q);
		where.push(
			sql`(${tracks.title} LIKE ${p} ESCAPE '\\' OR ${tracks.artist} LIKE ${p} ESCAPE '\\' OR ${tracks.album} LIKE ${p} ESCAPE '\\')`
		);
	}
	if (q.bpmMin !== undefined) where.push(gte(tracks.bpm, q.bpmMin));
	if (q.bpmMax !== undefined) where.push(lte(tracks.bpm, q.bpmMax));
	if (q.meter !== undefined) where.push(eq(tracks.meter, q.meter));
	if (q.checkByEar) where.push(isNotNull(tracks.altBpm));
	const forDance = q.dance === undefined ? sql`` : sql` AND ${fits.danceId} = ${q.dance}`;
	if (q.verdict === 'unjudged') {
		where.push(
			sql`NOT EXISTS (SELECT 1 FROM ${fits} WHERE ${fits.trackId} = ${tracks.id}${forDance})`
		);
	} else if (q.verdict || q.dance !== undefined) {
		// A dance alone means "tracks the team says suit it", at the recorded rate or another.
		const verdicts = q.verdict ? sql`(${q.verdict})` : sql`('fits', 'fits-at-rate')`;
		where.push(
			sql`EXISTS (SELECT 1 FROM ${fits} WHERE ${fits.trackId} = ${tracks.id}${forDance} AND ${fits.verdict} IN ${verdicts})`
		);
	}
	return where;
}

export function listTracks(q: TrackListQuery): TrackPage {
	const descending = q.sort.startsWith('-');
	const field = (descending ? q.sort.slice(1) : q.sort) as Field;
	const key = KEYS[field];
	const where = filters(q);
	const total =
		db()
			.select({ n: sql<number>`count(*)` })
			.from(tracks)
			.where(and(...where))
			.get()?.n ?? 0;

	const page = [...where];
	if (q.cursor) {
		const c = decodeCursor(q.cursor, q.sort);
		if (!c) throw new BadCursorError('The cursor does not belong to this sort; start again.');
		page.push(
			descending
				? sql`(${key} < ${c.key} OR (${key} = ${c.key} AND ${tracks.id} < ${c.id}))`
				: sql`(${key} > ${c.key} OR (${key} = ${c.key} AND ${tracks.id} > ${c.id}))`
		);
	}
	const rows = db()
		.select({ ...getTableColumns(tracks), sortKey: sql<string | number>`${key}` })
		.from(tracks)
		.where(and(...page))
		.orderBy(descending ? sql`${key} DESC, ${tracks.id} DESC` : sql`${key} ASC, ${tracks.id} ASC`)
		.limit(q.limit + 1)
		.all();
	const more = rows.length > q.limit;
	const items = more ? rows.slice(0, q.limit) : rows;
	const last = items[items.length - 1];
	return {
		items: items.map(({ sortKey: _, ...row }) => toTrackJson(row)),
		nextCursor:
			more && last ? encodeCursor({ sort: q.sort, key: last.sortKey, id: last.id }) : null,
		total
	};
}
