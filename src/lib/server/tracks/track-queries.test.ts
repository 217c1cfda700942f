// One track: edit with its version (409 when stale), the meter's default phrase, delete.
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { tracks } from '../db/schema';
import { makeTestDb } from '../testing/test-db';
import { analysisJson, tempStorage, wav } from '../testing/tracks';
import { deleteTrack, getTrack, updateTrack } from './track-queries';
import { uploadTrack } from './upload';

let t: ReturnType<typeof makeTestDb>;
let s: ReturnType<typeof tempStorage>;
let id: number;
beforeEach(async () => {
	t = makeTestDb();
	s = tempStorage();
	const r = await uploadTrack({
		bytes: wav(120, 3).bytes,
		fileName: 'a.wav',
		analysis: analysisJson(),
		uploadedBy: null
	});
	if (!r.ok) throw new Error(r.error);
	id = r.track.id;
});
afterEach(() => {
	s.cleanup();
	t.cleanup();
});

describe('updateTrack', () => {
	test('saves, bumps the version and records a typed tempo as entered', () => {
		const r = updateTrack(id, { version: 1, bpm: 121.5, title: 'Renamed' });
		expect(r.kind).toBe('updated');
		if (r.kind !== 'updated') return;
		expect(r.track).toMatchObject({
			bpm: 121.5,
			bpmSource: 'entered',
			title: 'Renamed',
			version: 2
		});
		// The raw detection is kept beside the tempo we trust.
		expect(r.track.rawBpm).toBe(120);
	});

	test('keeps the source it is given (a tapped tempo)', () => {
		const r = updateTrack(id, { version: 1, bpm: 119, bpmSource: 'tapped' });
		expect(r.kind === 'updated' && r.track.bpmSource).toBe('tapped');
	});

	test('a stale version is refused with what the track holds now', () => {
		updateTrack(id, { version: 1, artist: 'First' });
		const r = updateTrack(id, { version: 1, artist: 'Second' });
		expect(r.kind).toBe('stale');
		expect(r.kind === 'stale' && r.current).toMatchObject({ artist: 'First', version: 2 });
		expect(getTrack(id)?.artist).toBe('First');
	});

	test('a meter change moves a default phrase to the new default, not a chosen one', () => {
		const r = updateTrack(id, { version: 1, meter: 3 });
		expect(r.kind === 'updated' && r.track.phraseBeats).toBe(24);
		updateTrack(id, { version: 2, phraseBeats: 48 });
		const again = updateTrack(id, { version: 3, meter: 4 });
		expect(again.kind === 'updated' && again.track.phraseBeats).toBe(48);
	});

	test('an unknown track is not found', () => {
		expect(updateTrack(9999, { version: 1, title: 'x' }).kind).toBe('not-found');
	});
});

describe('deleteTrack', () => {
	test('removes the row, then the file', async () => {
		expect(s.files()).toHaveLength(1);
		expect(await deleteTrack(id)).toBe(true);
		expect(t.db.select().from(tracks).all()).toHaveLength(0);
		expect(s.files()).toEqual([]);
		expect(await deleteTrack(id)).toBe(false);
	});
});
