// Saving a run order: the whole list at once, refused (409) when the version is stale so that two
// people editing at once never overwrite each other; start times are recomputed here.
import { and, eq, sql } from 'drizzle-orm';
import type { SQLiteColumn } from 'drizzle-orm/sqlite-core';
import { DEFAULT_DURATION_S, recomputeStarts } from '../../run-order/timing';
import type { EntryInput } from '../../schemas/evening';
import { db } from '../db';
import { preparedFor } from '../db/prepared';
import { dances, evenings, fits, runOrderEntries, sections, tracks } from '../db/schema';
import { EveningError } from './errors';
import { eveningRow } from './load';
import { gapSeconds } from './gap';

export interface SaveResult {
	runOrderVersion: number;
	count: number;
}

const ids = (list: (number | null | undefined)[]) => [
	...new Set(list.filter((x): x is number => typeof x === 'number'))
];

function refuseStale(
	evening: { runOrderVersion: number } | undefined,
	version: number
): asserts evening {
	if (!evening) throw new EveningError('There is no such evening.', 404);
	if (evening.runOrderVersion !== version) {
		throw new EveningError(
			'Someone else saved this run order after you opened it. Reload to see their version; your changes stay on screen until you do.',
			409,
			{ currentVersion: evening.runOrderVersion }
		);
	}
}

// Lists of ids travel as one JSON array (json_each), so the statements stay prepared.
const inIds = (column: SQLiteColumn, name: string) =>
	sql`${column} IN (SELECT value FROM json_each(${sql.placeholder(name)}))`;

const statements = preparedFor((d) => {
	const p = (name: string) => sql.placeholder(name);
	return {
		sections: d
			.select()
			.from(sections)
			.where(eq(sections.eveningId, p('id')))
			.prepare(),
		dances: d.select({ id: dances.id }).from(dances).where(inIds(dances.id, 'ids')).prepare(),
		tracks: d
			.select({ id: tracks.id, durationS: tracks.durationS })
			.from(tracks)
			.where(inIds(tracks.id, 'ids'))
			.prepare(),
		refused: d
			.select({ trackId: fits.trackId, danceId: fits.danceId })
			.from(fits)
			.where(
				and(
					eq(fits.verdict, 'does-not-fit'),
					inIds(fits.trackId, 'trackIds'),
					inIds(fits.danceId, 'danceIds')
				)
			)
			.prepare(),
		deleteEntries: d
			.delete(runOrderEntries)
			.where(eq(runOrderEntries.eveningId, p('id')))
			.prepare(),
		// Building the SQL of a 50-row insert costs more than running 50 prepared ones.
		insertEntry: d
			.insert(runOrderEntries)
			.values({
				eveningId: p('eveningId'),
				position: p('position'),
				kind: p('kind'),
				sectionId: p('sectionId'),
				danceId: p('danceId'),
				trackId: p('trackId'),
				rate: p('rate'),
				startS: p('startS'),
				durationS: p('durationS'),
				locked: p('locked'),
				text: p('text'),
				reasons: p('reasons')
			})
			.prepare()
	};
});

/**
 * Throws EveningError 404 or 409 unless `version` is the evening's current run-order version.
 * When several people save at once most saves are stale: the route refuses them with this before
 * it validates their entries or opens a transaction (saveRunOrder checks again inside it).
 */
export function refuseStaleSave(eveningId: number, version: number) {
	refuseStale(eveningRow(eveningId), version);
}

/**
 * Replaces the evening's run order if `version` is the one stored, and bumps it. A stale version
 * throws EveningError 409 (with the current version) and changes nothing.
 */
export function saveRunOrder(
	eveningId: number,
	version: number,
	entries: readonly EntryInput[]
): SaveResult {
	return db().transaction((tx) => {
		const q = statements();
		const evening = eveningRow(eveningId);
		refuseStale(evening, version);
		const sectionRows = q.sections.all({ id: eveningId });
		const sectionIds = new Set(sectionRows.map((s) => s.id));
		for (const e of entries) {
			if (e.sectionId != null && !sectionIds.has(e.sectionId))
				throw new EveningError(`Section ${e.sectionId} is not part of this evening.`, 422);
		}
		const danceIds = ids(entries.map((e) => e.danceId));
		const known = danceIds.length ? q.dances.all({ ids: JSON.stringify(danceIds) }) : [];
		if (known.length !== danceIds.length)
			throw new EveningError('An entry names an unknown dance.', 422);
		const trackIds = ids(entries.map((e) => e.trackId));
		const trackRows = trackIds.length ? q.tracks.all({ ids: JSON.stringify(trackIds) }) : [];
		if (trackRows.length !== trackIds.length)
			throw new EveningError('An entry names an unknown track.', 422);
		const lengthOf = new Map(trackRows.map((t) => [t.id, t.durationS]));
		if (danceIds.length && trackIds.length) {
			const refused = q.refused.all({
				trackIds: JSON.stringify(trackIds),
				danceIds: JSON.stringify(danceIds)
			});
			const bad = entries.find((e) =>
				refused.some((r) => r.trackId === e.trackId && r.danceId === e.danceId)
			);
			if (bad)
				throw new EveningError(
					'The team marked one of these tracks as not fitting its dance.',
					422
				);
		}
		const rows = entries.map((e) => {
			const trackS = e.trackId != null ? lengthOf.get(e.trackId) : undefined;
			const durationS =
				e.kind === 'dance' && trackS !== undefined
					? trackS / e.rate
					: e.durationS > 0
						? e.durationS
						: DEFAULT_DURATION_S[e.kind];
			return { ...e, durationS };
		});
		const eveningStart = evening.startsAt.getTime();
		const starts = recomputeStarts(
			rows,
			sectionRows.map((s) => ({ id: s.id, startS: (s.startsAt.getTime() - eveningStart) / 1000 })),
			gapSeconds(evening.planSettings)
		);
		q.deleteEntries.run({ id: eveningId });
		rows.forEach((e, position) => {
			q.insertEntry.run({
				eveningId,
				position,
				kind: e.kind,
				sectionId: e.sectionId ?? null,
				danceId:
					e.kind === 'dance' || e.kind === 'teach' || e.kind === 'walkthrough'
						? (e.danceId ?? null)
						: null,
				trackId: e.kind === 'dance' || e.kind === 'teach' ? (e.trackId ?? null) : null,
				rate: e.rate,
				startS: Math.round(starts[position] * 1000) / 1000,
				durationS: Math.round(e.durationS * 1000) / 1000,
				locked: e.locked,
				text: e.text,
				reasons: e.reasons
			});
		});
		const next = version + 1;
		const bumped = tx
			.update(evenings)
			.set({ runOrderVersion: next, updatedAt: new Date() })
			.where(and(eq(evenings.id, eveningId), eq(evenings.runOrderVersion, version)))
			.run();
		if (bumped.changes !== 1) throw new EveningError('The run order changed meanwhile.', 409);
		return { runOrderVersion: next, count: rows.length };
	});
}
