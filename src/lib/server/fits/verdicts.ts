// The team's verdict on a track for a dance: one row per pair, replaced by the latest word.
import { and, eq, sql } from 'drizzle-orm';
import { fitTrackToDance } from '../../fit';
import type { FitVerdictBulkInput, FitVerdictInput } from '../../schemas/dance';
import { danceRow } from '../dances/catalogue';
import { danceFacts } from '../dances/dance-json';
import { db } from '../db';
import { fits } from '../db/schema';
import { loadTrackFact } from './load';
import { fitSettings } from './settings';

export type VerdictResult =
	{ ok: true; fit: typeof fits.$inferSelect } | { ok: false; status: 404 | 422; error: string };

/**
 * Upserts the verdict, decided by `userId`. 'fits-at-rate' without a rate takes the rate the
 * engine finds best for the pair; 'fits' without one means as recorded (1).
 */
export function setVerdict(input: FitVerdictInput, userId: number): VerdictResult {
	const track = loadTrackFact(input.trackId);
	if (!track) return { ok: false, status: 404, error: 'No such track.' };
	const dance = danceRow(input.danceId);
	if (!dance) return { ok: false, status: 404, error: 'No such dance.' };
	let rate = input.rate ?? null;
	if (rate == null && input.verdict === 'fits-at-rate') {
		const computed = fitTrackToDance(track, danceFacts(dance), null, fitSettings(), false);
		if (computed.tempo.trackBpm == null) {
			return { ok: false, status: 422, error: 'Measure the track’s tempo before choosing a rate.' };
		}
		rate = computed.tempo.rate;
	}
	rate ??= 1;
	const values = {
		trackId: input.trackId,
		danceId: input.danceId,
		verdict: input.verdict,
		rate,
		decidedBy: userId,
		updatedAt: new Date(),
		...(input.notes !== undefined ? { notes: input.notes } : {})
	};
	const fit = db()
		.insert(fits)
		.values(values)
		.onConflictDoUpdate({
			target: [fits.trackId, fits.danceId],
			set: {
				verdict: values.verdict,
				rate: values.rate,
				decidedBy: userId,
				updatedAt: values.updatedAt,
				notes: input.notes !== undefined ? input.notes : sql`${fits.notes}`
			}
		})
		.returning()
		.get();
	return { ok: true, fit };
}

export type BulkResult =
	| { ok: true; fits: (typeof fits.$inferSelect)[] }
	| { ok: false; status: 404 | 422; error: string };

/** The same verdict for several tracks and one dance, all or nothing. */
export function setVerdicts(input: FitVerdictBulkInput, userId: number): BulkResult {
	const { trackIds, ...rest } = input;
	try {
		const saved = db().transaction(() =>
			trackIds.map((trackId) => {
				const r = setVerdict({ ...rest, trackId }, userId);
				if (!r.ok) throw new BulkStop(r.status, `Track ${trackId}: ${r.error}`);
				return r.fit;
			})
		);
		return { ok: true, fits: saved };
	} catch (e) {
		if (e instanceof BulkStop) return { ok: false, status: e.status, error: e.message };
		throw e;
	}
}

class BulkStop extends Error {
	constructor(
		readonly status: 404 | 422,
		message: string
	) {
		super(message);
	}
}

/** Takes the team's verdict back: the pair is "not judged" again and the computed fit rules. */
export function clearVerdict(trackId: number, danceId: number): boolean {
	const row = db()
		.delete(fits)
		.where(and(eq(fits.trackId, trackId), eq(fits.danceId, danceId)))
		.returning({ trackId: fits.trackId })
		.get();
	return !!row;
}
