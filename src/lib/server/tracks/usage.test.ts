// What a track's removal would touch, read before it goes, and what removing it leaves behind.
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, expect, test } from 'vitest';
import { fits, runOrderEntries, tracks } from '../db/schema';
import { loadEvening } from '../evenings/load';
import { saveRunOrder } from '../evenings/run-order';
import { seedLike } from '../evenings/test-fixture';
import { makeTestDb } from '../testing/test-db';
import { trackUsage } from './usage';

let t: ReturnType<typeof makeTestDb>;
let refs: ReturnType<typeof seedLike>;
beforeEach(() => {
	t = makeTestDb();
	refs = seedLike(t.db);
});
afterEach(() => t.cleanup());

test('names each evening that plays the track, how often, and the verdicts on it', () => {
	const keeper = refs.trackRows.find((r) => r.title === 'The Lantern Keeper’s Waltz')!;
	const lantern = refs.danceRows.find((d) => d.name === 'Marrowby Lantern Waltz')!;
	const e = loadEvening(1)!;
	const entry = {
		kind: 'dance' as const,
		sectionId: e.sections[1].id,
		danceId: lantern.id,
		trackId: keeper.id,
		rate: 1,
		durationS: 180,
		locked: false,
		text: '',
		reasons: []
	};
	saveRunOrder(1, e.runOrderVersion, [entry, entry]);
	expect(trackUsage(keeper.id)).toEqual({
		evenings: [{ id: 1, title: e.title, startsAt: e.startsAt, entries: 2 }],
		verdicts: 1,
		answers: 0
	});
	const unused = refs.trackRows.find((r) => r.id !== keeper.id)!;
	expect(trackUsage(unused.id)).toEqual({ evenings: [], verdicts: 0, answers: 0 });

	// Removing the row keeps the entries (with no track) and drops the verdict.
	t.db.delete(tracks).where(eq(tracks.id, keeper.id)).run();
	const left = t.db.select().from(runOrderEntries).where(eq(runOrderEntries.eveningId, 1)).all();
	expect(left.map((x) => x.trackId)).toEqual([null, null]);
	expect(t.db.select().from(fits).where(eq(fits.trackId, keeper.id)).all()).toEqual([]);
});
