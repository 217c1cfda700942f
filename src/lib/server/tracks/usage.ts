// What leans on a track, said before it is removed: the evenings whose run order plays it, the
// team's verdicts on it and the requests answered with it. Removing it keeps all of those but
// the verdicts; the run-order entries and the answers forget the track (ON DELETE SET NULL).
import { asc, count, eq } from 'drizzle-orm';
import { db } from '../db';
import { evenings, fits, requests, runOrderEntries } from '../db/schema';

export interface TrackUsage {
	evenings: { id: number; title: string; startsAt: string; entries: number }[];
	verdicts: number;
	answers: number;
}

export function trackUsage(trackId: number): TrackUsage {
	const d = db();
	const inEvenings = d
		.select({
			id: evenings.id,
			title: evenings.title,
			startsAt: evenings.startsAt,
			entries: count(runOrderEntries.id)
		})
		.from(runOrderEntries)
		.innerJoin(evenings, eq(evenings.id, runOrderEntries.eveningId))
		.where(eq(runOrderEntries.trackId, trackId))
		.groupBy(evenings.id)
		.orderBy(asc(evenings.startsAt))
		.all();
	const verdicts = d.select({ n: count() }).from(fits).where(eq(fits.trackId, trackId)).get()!.n;
	const answers = d
		.select({ n: count() })
		.from(requests)
		.where(eq(requests.answerTrackId, trackId))
		.get()!.n;
	return {
		evenings: inEvenings.map((e) => ({ ...e, startsAt: e.startsAt.toISOString() })),
		verdicts,
		answers
	};
}
