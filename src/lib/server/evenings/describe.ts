// Names for a plan's entries (the planner returns ids), so the editor can show the proposal.
import { inArray } from 'drizzle-orm';
import type { PlanEntry } from '../../planner';
import { db } from '../db';
import { dances, tracks } from '../db/schema';

const numbers = (list: unknown[]) => [
	...new Set(list.filter((x): x is number => typeof x === 'number'))
];

export function describeEntries(entries: readonly PlanEntry[]) {
	const danceIds = numbers(entries.map((e) => e.danceId));
	const trackIds = numbers(entries.map((e) => e.trackId));
	const d = new Map(
		(danceIds.length
			? db().select().from(dances).where(inArray(dances.id, danceIds)).all()
			: []
		).map((r) => [r.id, r])
	);
	const t = new Map(
		(trackIds.length
			? db().select().from(tracks).where(inArray(tracks.id, trackIds)).all()
			: []
		).map((r) => [r.id, r])
	);
	return entries.map((e) => {
		const dance = typeof e.danceId === 'number' ? d.get(e.danceId) : undefined;
		const track = typeof e.trackId === 'number' ? t.get(e.trackId) : undefined;
		return {
			...e,
			danceName: dance?.name ?? null,
			danceLevel: dance?.level ?? null,
			danceRhythm: dance?.rhythm ?? null,
			danceFormation: dance?.formation ?? null,
			trackTitle: track?.title ?? null,
			trackArtist: track?.artist ?? null,
			trackBpm: track?.bpm ?? null
		};
	});
}
