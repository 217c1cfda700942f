// Saving a run order: the whole list at once, refused (409) when the version is stale so that two
// people editing at once never overwrite each other; start times are recomputed here.
import { and, eq, inArray, sql } from 'drizzle-orm';
import { DEFAULT_DURATION_S, recomputeStarts } from '../../components/evening/timing';
import type { EntryInput } from '../../schemas/evening';
import { db } from '../db';
import { preparedFor } from '../db/prepared';
import { dances, evenings, fits, runOrderEntries, sections, tracks } from '../db/schema';
import { EveningError } from './errors';
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

// When several people save at once most saves are stale: the route refuses them before it
// validates their entries or opens a transaction (saveRunOrder checks again inside it).
const storedVersion = preparedFor((d) =>
	d
		.select({ runOrderVersion: evenings.runOrderVersion })
		.from(evenings)
		.where(eq(evenings.id, sql.placeholder('id')))
		.prepare()
);

/** Throws EveningError 404 or 409 unless `version` is the evening's current run-order version. */
export function refuseStaleSave(eveningId: number, version: unknown) {
	refuseStale(storedVersion().get({ id: eveningId }), version as number);
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
		const evening = tx.select().from(evenings).where(eq(evenings.id, eveningId)).get();
		refuseStale(evening, version);
		const sectionRows = tx.select().from(sections).where(eq(sections.eveningId, eveningId)).all();
		const sectionIds = new Set(sectionRows.map((s) => s.id));
		for (const e of entries) {
			if (e.sectionId != null && !sectionIds.has(e.sectionId))
				throw new EveningError(`Section ${e.sectionId} is not part of this evening.`, 422);
		}
		const danceIds = ids(entries.map((e) => e.danceId));
		const known = danceIds.length
			? tx.select({ id: dances.id }).from(dances).where(inArray(dances.id, danceIds)).all()
			: [];
		if (known.length !== danceIds.length)
			throw new EveningError('An entry names an unknown dance.', 422);
		const trackIds = ids(entries.map((e) => e.trackId));
		const trackRows = trackIds.length
			? tx
					.select({ id: tracks.id, durationS: tracks.durationS })
					.from(tracks)
					.where(inArray(tracks.id, trackIds))
					.all()
			: [];
		if (trackRows.length !== trackIds.length)
			throw new EveningError('An entry names an unknown track.', 422);
		const lengthOf = new Map(trackRows.map((t) => [t.id, t.durationS]));
		if (danceIds.length && trackIds.length) {
			const refused = tx
				.select({ trackId: fits.trackId, danceId: fits.danceId })
				.from(fits)
				.where(
					and(
						eq(fits.verdict, 'does-not-fit'),
						inArray(fits.trackId, trackIds),
						inArray(fits.danceId, danceIds)
					)
				)
				.all();
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
		tx.delete(runOrderEntries).where(eq(runOrderEntries.eveningId, eveningId)).run();
		if (rows.length) {
			tx.insert(runOrderEntries)
				.values(
					rows.map((e, position) => ({
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
					}))
				)
				.run();
		}
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
