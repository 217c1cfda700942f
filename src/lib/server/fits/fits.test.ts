// The fits API's server side against a real SQLite: ranking with the team's verdicts, and the
// verdict upsert.
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { createDance } from '../dances/catalogue';
import { aDance, aTrack, aUser } from '../testing/rows';
import { makeTestDb } from '../testing/test-db';
import { eq } from 'drizzle-orm';
import { fits, tracks } from '../db/schema';
import { trackFacts } from './load';
import { fitsForDance, fitsForTrack, parseLimit } from './ranking';
import { clearVerdict, setVerdict, setVerdicts } from './verdicts';

let t: ReturnType<typeof makeTestDb>;
beforeEach(() => (t = makeTestDb()));
afterEach(() => t.cleanup());

describe('fits for a dance', () => {
	test('ranks by score, and a "fits" verdict outranks a better computed score', () => {
		const user = aUser(t.db);
		const dance = createDance(aDance({ bpmMin: 110, bpmMax: 126 }), user);
		const perfect = aTrack(t.db, { bpm: 118, durationS: 195 });
		const far = aTrack(t.db, { bpm: 160 });
		const waltz = aTrack(t.db, { bpm: 118, meter: 3, phraseBeats: 24 });
		const before = fitsForDance(dance.id)!;
		expect(before.items[0].track.id).toBe(perfect.id);
		expect(before.items[0].reasons.length).toBeGreaterThan(0);
		expect(before.items.find((i) => i.track.id === waltz.id)!.score).toBe(0);
		const fittingOf = (id: number) => before.items.find((i) => i.track.id === id)!.fitting;
		expect([fittingOf(perfect.id), fittingOf(far.id), fittingOf(waltz.id)]).toEqual([
			true,
			false,
			false
		]);

		expect(setVerdict({ trackId: far.id, danceId: dance.id, verdict: 'fits' }, user).ok).toBe(true);
		expect(
			setVerdict({ trackId: perfect.id, danceId: dance.id, verdict: 'does-not-fit' }, user).ok
		).toBe(true);
		const after = fitsForDance(dance.id)!;
		expect(after.items[0].track.id).toBe(far.id);
		expect(after.items[0].verdict).toBe('fits');
		expect(after.items[0].fitting).toBe(true);
		expect(after.items.at(-1)!.fitting).toBe(false);
		expect(after.items.at(-1)!.track.id).toBe(perfect.id);
		expect(after.items.at(-1)!.verdict).toBe('does-not-fit');
	});

	test('limit keeps the best; unknown dance is null; limits are checked', () => {
		const dance = createDance(aDance(), null);
		for (let i = 0; i < 5; i++) aTrack(t.db, { bpm: 100 + i * 5 });
		expect(fitsForDance(dance.id, 2)!.items).toHaveLength(2);
		expect(fitsForDance(9999)).toBeNull();
		expect(parseLimit(null)).toBe(50);
		expect(parseLimit('3')).toBe(3);
		expect(parseLimit('0')).toBeNull();
		expect(parseLimit('x')).toBeNull();
	});

	test('the track side lists dances with the same figures', () => {
		const dance = createDance(aDance({ counts: 40 }), null);
		const track = aTrack(t.db, { bpm: 120 });
		const side = fitsForTrack(track.id)!;
		expect(side.items[0].dance.id).toBe(dance.id);
		// 40 counts over 32-beat phrases: drift 8, back in line after lcm(40,32)/40 = 4
		// (DESIGN.md, "Phrasing"; common practice, no source).
		expect(side.items[0].phrasing).toMatchObject({ driftCounts: 8, realignAfterRepetitions: 4 });
		expect(fitsForTrack(9999)).toBeNull();
	});
});

describe('PUT /api/fits', () => {
	test('upserts one row per pair, keeping notes unless new ones are sent', () => {
		const user = aUser(t.db);
		const dance = createDance(aDance(), user);
		const track = aTrack(t.db, { bpm: 130 });
		const first = setVerdict(
			{ trackId: track.id, danceId: dance.id, verdict: 'fits', notes: 'start after 16' },
			user
		);
		expect(first.ok && first.fit).toMatchObject({ verdict: 'fits', rate: 1, decidedBy: user });
		const second = setVerdict(
			{ trackId: track.id, danceId: dance.id, verdict: 'fits-at-rate' },
			user
		);
		expect(second.ok).toBe(true);
		const rows = t.db.select().from(fits).all();
		expect(rows).toHaveLength(1);
		expect(rows[0].verdict).toBe('fits-at-rate');
		expect(rows[0].notes).toBe('start after 16');
		// 130 BPM into 110–126: the engine picks a rate below 1 (126/130 ≈ 0.969).
		expect(rows[0].rate).toBeLessThan(1);
		expect(rows[0].rate).toBeGreaterThan(0.92);
	});

	test('a cleared verdict is gone: the pair is not judged, and clearing again finds nothing', () => {
		const user = aUser(t.db);
		const dance = createDance(aDance(), user);
		const track = aTrack(t.db, { bpm: 120 });
		setVerdict({ trackId: track.id, danceId: dance.id, verdict: 'does-not-fit' }, user);
		expect(clearVerdict(track.id, dance.id)).toBe(true);
		expect(t.db.select().from(fits).all()).toEqual([]);
		expect(clearVerdict(track.id, dance.id)).toBe(false);
	});

	test('404 for an unknown track or dance', () => {
		const user = aUser(t.db);
		const dance = createDance(aDance(), user);
		const track = aTrack(t.db);
		const noTrack = setVerdict({ trackId: 999, danceId: dance.id, verdict: 'fits' }, user);
		const noDance = setVerdict({ trackId: track.id, danceId: 999, verdict: 'fits' }, user);
		expect(!noTrack.ok && noTrack.status).toBe(404);
		expect(!noDance.ok && noDance.status).toBe(404);
	});
});

describe('the track facts a ranking reads', () => {
	test('follow edits, uploads and deletes made after an earlier read', () => {
		const bpmOf = (id: number) => trackFacts().byId.get(id)?.bpm;
		const a = aTrack(t.db, { bpm: 100 });
		const b = aTrack(t.db, { bpm: 110 });
		expect(trackFacts().facts).toHaveLength(2);
		t.db.update(tracks).set({ bpm: 123 }).where(eq(tracks.id, a.id)).run();
		expect(bpmOf(a.id)).toBe(123);
		const c = aTrack(t.db, { bpm: 140 });
		t.db.delete(tracks).where(eq(tracks.id, b.id)).run();
		expect(
			trackFacts()
				.facts.map((x) => x.id)
				.sort()
		).toEqual([a.id, c.id].sort());
	});
});

describe('several tracks marked at once', () => {
	test('writes every verdict, or none when one track is unknown', () => {
		const user = aUser(t.db);
		const dance = createDance(aDance(), user);
		const a = aTrack(t.db);
		const b = aTrack(t.db);
		const bad = setVerdicts({ danceId: dance.id, trackIds: [a.id, 9999], verdict: 'fits' }, user);
		expect(!bad.ok && bad.status).toBe(404);
		expect(t.db.select().from(fits).all()).toEqual([]);
		const good = setVerdicts({ danceId: dance.id, trackIds: [a.id, b.id], verdict: 'fits' }, user);
		expect(good.ok && good.fits.map((f) => f.trackId)).toEqual([a.id, b.id]);
		expect(t.db.select().from(fits).all()).toHaveLength(2);
	});
});
