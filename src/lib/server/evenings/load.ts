// Reading evenings: one evening with its sections and run order as plain JSON (the API's shape,
// also used by the exports and the public page), and the list of evenings.
import { asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { CrowdMix, EntryKind, Formation, Level, Rhythm, SectionKind } from '../../domain';
import { db } from '../db';
import { preparedFor } from '../db/prepared';
import { dances, evenings, runOrderEntries, sections, tracks, users } from '../db/schema';
import { planSettingsInput, type PlanSettingsInput } from '../../schemas/evening';
import { clubTimeZone } from './timezone';

/**
 * The stored planner settings, read once here. Every write validates them, so a value this
 * rejects comes from an older build or a hand edit: the planner then runs on its defaults.
 */
function readPlanSettings(stored: unknown): PlanSettingsInput {
	const parsed = planSettingsInput.safeParse(stored);
	return parsed.success ? parsed.data : {};
}

export interface SectionJson {
	id: number;
	position: number;
	kind: SectionKind;
	title: string;
	startsAt: string;
	endsAt: string;
	danceId: number | null;
	danceName: string | null;
	teacherId: number | null;
	teacherName: string | null;
}

export interface EntryJson {
	id: number;
	position: number;
	kind: EntryKind;
	sectionId: number | null;
	danceId: number | null;
	danceName: string | null;
	danceLevel: Level | null;
	danceRhythm: Rhythm | null;
	danceFormation: Formation | null;
	danceCounts: number | null;
	danceWalls: number | null;
	trackId: number | null;
	trackTitle: string | null;
	trackArtist: string | null;
	/** The track's own tempo; the floor hears trackBpm × rate (effectiveBpm). */
	trackBpm: number | null;
	effectiveBpm: number | null;
	rate: number;
	/** Seconds from the evening's start. */
	startS: number;
	durationS: number;
	/** startS as an ISO 8601 instant, for readers that want wall-clock times. */
	startsAt: string;
	locked: boolean;
	text: string;
	reasons: string[];
}

export interface EveningSummary {
	id: number;
	title: string;
	venue: string;
	startsAt: string;
	endsAt: string;
	crowd: CrowdMix;
	status: 'draft' | 'published';
	published: boolean;
	entryCount: number;
}

export interface EveningJson extends Omit<EveningSummary, 'entryCount'> {
	notes: string;
	shareToken: string | null;
	planSettings: PlanSettingsInput;
	runOrderVersion: number;
	version: number;
	/** The club's IANA time zone: show these instants in it. */
	timeZone: string;
	createdAt: string;
	updatedAt: string;
	sections: SectionJson[];
	entries: EntryJson[];
}

const iso = (d: Date) => d.toISOString();

// Every run-order read and save goes through these three queries: prepared once.
const statements = preparedFor((d) => {
	const eveningId = sql.placeholder('eveningId');
	return {
		evening: d.select().from(evenings).where(eq(evenings.id, eveningId)).prepare(),
		sections: d
			.select({
				s: sections,
				danceName: dances.name,
				teacherName: users.name
			})
			.from(sections)
			.leftJoin(dances, eq(dances.id, sections.danceId))
			.leftJoin(users, eq(users.id, sections.teacherId))
			.where(eq(sections.eveningId, eveningId))
			.orderBy(asc(sections.startsAt), asc(sections.position))
			.prepare(),
		entries: d
			.select({
				e: runOrderEntries,
				danceName: dances.name,
				danceLevel: dances.level,
				danceRhythm: dances.rhythm,
				danceFormation: dances.formation,
				danceCounts: dances.counts,
				danceWalls: dances.walls,
				trackTitle: tracks.title,
				trackArtist: tracks.artist,
				trackBpm: tracks.bpm
			})
			.from(runOrderEntries)
			.leftJoin(dances, eq(dances.id, runOrderEntries.danceId))
			.leftJoin(tracks, eq(tracks.id, runOrderEntries.trackId))
			.where(eq(runOrderEntries.eveningId, eveningId))
			.orderBy(asc(runOrderEntries.position))
			.prepare()
	};
});

function loadSections(eveningId: number): SectionJson[] {
	return statements()
		.sections.all({ eveningId })
		.map(({ s, danceName, teacherName }) => ({
			id: s.id,
			position: s.position,
			kind: s.kind,
			title: s.title,
			startsAt: iso(s.startsAt),
			endsAt: iso(s.endsAt),
			danceId: s.danceId,
			danceName: danceName ?? null,
			teacherId: s.teacherId,
			teacherName: teacherName ?? null
		}));
}

/** The run order of an evening, in position order, with names for people to read. */
export function loadEntries(eveningId: number, startsAtMs: number): EntryJson[] {
	return statements()
		.entries.all({ eveningId })
		.map(({ e, ...r }) => ({
			id: e.id,
			position: e.position,
			kind: e.kind,
			sectionId: e.sectionId,
			danceId: e.danceId,
			danceName: r.danceName ?? null,
			danceLevel: r.danceLevel ?? null,
			danceRhythm: (r.danceRhythm as Rhythm | null) ?? null,
			danceFormation: r.danceFormation ?? null,
			danceCounts: r.danceCounts ?? null,
			danceWalls: r.danceWalls ?? null,
			trackId: e.trackId,
			trackTitle: r.trackTitle ?? null,
			trackArtist: r.trackArtist ?? null,
			trackBpm: r.trackBpm ?? null,
			effectiveBpm: r.trackBpm ? Math.round(r.trackBpm * e.rate * 10) / 10 : null,
			rate: e.rate,
			startS: e.startS,
			durationS: e.durationS,
			startsAt: iso(new Date(startsAtMs + e.startS * 1000)),
			locked: e.locked,
			text: e.text,
			reasons: e.reasons
		}));
}

/** One evening with its sections and run order, or null when there is no such evening. */
/** The evening's own row, as stored (a run-order save checks its version with this). */
export const eveningRow = (id: number) => statements().evening.get({ eveningId: id });

export function loadEvening(id: number): EveningJson | null {
	const row = eveningRow(id);
	if (!row) return null;
	return {
		id: row.id,
		title: row.title,
		venue: row.venue,
		startsAt: iso(row.startsAt),
		endsAt: iso(row.endsAt),
		crowd: row.crowd,
		status: row.status,
		published: row.status === 'published',
		notes: row.notes,
		shareToken: row.shareToken,
		planSettings: readPlanSettings(row.planSettings),
		runOrderVersion: row.runOrderVersion,
		version: row.version,
		timeZone: clubTimeZone(),
		createdAt: iso(row.createdAt),
		updatedAt: iso(row.updatedAt),
		sections: loadSections(row.id),
		entries: loadEntries(row.id, row.startsAt.getTime())
	};
}

/** Evenings, soonest first; `publishedOnly` for people who may read only published ones. */
export function listEvenings(publishedOnly = false): EveningSummary[] {
	const rows = db()
		.select()
		.from(evenings)
		.where(publishedOnly ? eq(evenings.status, 'published') : undefined)
		.orderBy(asc(evenings.startsAt), desc(evenings.id))
		.all();
	const counts = new Map<number, number>();
	if (rows.length) {
		const entries = db()
			.select({ eveningId: runOrderEntries.eveningId })
			.from(runOrderEntries)
			.where(
				inArray(
					runOrderEntries.eveningId,
					rows.map((r) => r.id)
				)
			)
			.all();
		for (const e of entries) counts.set(e.eveningId, (counts.get(e.eveningId) ?? 0) + 1);
	}
	return rows.map((r) => ({
		id: r.id,
		title: r.title,
		venue: r.venue,
		startsAt: iso(r.startsAt),
		endsAt: iso(r.endsAt),
		crowd: r.crowd,
		status: r.status,
		published: r.status === 'published',
		entryCount: counts.get(r.id) ?? 0
	}));
}
