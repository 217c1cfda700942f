// Fault test for the start-up sweep (issue 13, finding 4): one audio file missing at start (a
// partial restore, a late disk) must cost no row, verdict or run-order place. The track is
// marked "audio missing", left out of planning and the playlist, and restored by uploading the
// same file again. Real SQLite and a real temporary upload folder.
import { beforeEach, expect, test } from 'vitest';
import { eq } from 'drizzle-orm';
import { evenings, fits, runOrderEntries, tracks } from './db/schema';
import { rankTracksFor } from './evenings/catalogue';
import { planInputFor } from './evenings/plan-input';
import { seedLike } from './evenings/test-fixture';
import { audioUrl, buildM3u8 } from './share/m3u8';
import { loadSheet } from './share/load-sheet';
import { sweepOrphans } from './sweep';
import { makeTestDb } from './testing/test-db';
import { analysisJson, tempStorage, wav } from './testing/tracks';
import { uploadTrack } from './tracks/upload';

let t: ReturnType<typeof makeTestDb>;
let s: ReturnType<typeof tempStorage>;
// Vitest runs the function beforeEach returns as that test's teardown.
beforeEach(() => {
	[t, s] = [makeTestDb(), tempStorage()];
	return () => [s, t].forEach((x) => x.cleanup());
});

const origin = 'http://floorset.test';
const now = 1_800_000_000_000;

test('a missing file marks its track, keeps its verdicts and places, and keeps it out of plans and playlists', async () => {
	const { danceRows, trackRows } = seedLike(t.db);
	const lantern = danceRows.find((d) => d.name === 'Marrowby Lantern Waltz')!;
	const keeper = trackRows.find((r) => r.title === 'The Lantern Keeper’s Waltz')!;
	const evening = t.db.select().from(evenings).get()!;
	t.db
		.insert(runOrderEntries)
		.values({
			eveningId: evening.id,
			position: 0,
			kind: 'dance',
			danceId: lantern.id,
			trackId: keeper.id,
			durationS: keeper.durationS
		})
		.run();
	// Every file is there but the keeper's.
	for (const r of trackRows)
		if (r.id !== keeper.id) await s.store.put(r.storageKey, new Uint8Array([1]));
	expect(rankTracksFor(lantern.id).map((f) => f.trackId)).toContain(keeper.id);

	const report = await sweepOrphans(s.store, now);

	expect(report.tracksWithoutFile).toEqual([keeper.id]);
	expect(report.uploadDirLooksWrong).toBeUndefined();
	expect(t.db.select().from(tracks).all()).toHaveLength(trackRows.length);
	expect(t.db.select().from(tracks).where(eq(tracks.id, keeper.id)).get()!.audioMissingAt).toBe(
		now
	);
	expect(t.db.select().from(fits).where(eq(fits.trackId, keeper.id)).all()).toHaveLength(1);
	const entry = t.db.select().from(runOrderEntries).get()!;
	expect(entry.trackId).toBe(keeper.id);

	// Out of suggestions and the planner's candidates; its place stays in the run order.
	expect(rankTracksFor(lantern.id).map((f) => f.trackId)).not.toContain(keeper.id);
	expect(planInputFor(evening.id).fits.map((f) => f.trackId)).not.toContain(keeper.id);
	// Out of the playlist (no dead line), still on the run sheet.
	const sheet = loadSheet(evening.id, origin)!;
	expect(sheet.entries.map((e) => e.trackId)).toContain(keeper.id);
	expect(buildM3u8(sheet, (e) => audioUrl(origin, e.trackId))).not.toContain(
		`/api/tracks/${keeper.id}/audio`
	);

	// A second start-up marks nothing anew and keeps the first date.
	expect((await sweepOrphans(s.store, now + 1)).tracksWithoutFile).toEqual([]);
	expect(t.db.select().from(tracks).where(eq(tracks.id, keeper.id)).get()!.audioMissingAt).toBe(
		now
	);
});

test('uploading the same file again restores the track; a file back on disk is unmarked', async () => {
	const { bytes } = wav(120, 4);
	const first = await uploadTrack({
		bytes,
		fileName: 'Barn.wav',
		analysis: analysisJson(),
		uploadedBy: null
	});
	if (!first.ok) throw new Error(first.error);
	const row = t.db.select().from(tracks).get()!;
	await s.store.remove(row.storageKey);
	// A second track, still on disk, so this is not taken for a wrong upload folder.
	const other = await uploadTrack({
		bytes: wav(100, 4).bytes,
		fileName: 'Other.wav',
		analysis: analysisJson(),
		uploadedBy: null
	});
	expect(other.ok).toBe(true);

	await sweepOrphans(s.store, now);
	expect(t.db.select().from(tracks).where(eq(tracks.id, row.id)).get()!.audioMissingAt).toBe(now);

	const again = await uploadTrack({
		bytes,
		fileName: 'renamed.wav',
		analysis: analysisJson(),
		uploadedBy: null
	});
	expect(again).toMatchObject({
		ok: true,
		status: 200,
		duplicate: true,
		track: { id: row.id, audioMissing: false }
	});
	expect(await s.store.size(row.storageKey)).toBe(bytes.length);
	expect(t.db.select().from(tracks).where(eq(tracks.id, row.id)).get()!.audioMissingAt).toBeNull();

	// A late disk: the file comes back by itself, and the next start-up unmarks the row.
	await s.store.remove(row.storageKey);
	await sweepOrphans(s.store, now);
	await s.store.put(row.storageKey, bytes);
	const report = await sweepOrphans(s.store, now + 1);
	expect(report.tracksFileBack).toEqual([row.id]);
	expect(t.db.select().from(tracks).where(eq(tracks.id, row.id)).get()!.audioMissingAt).toBeNull();
});
