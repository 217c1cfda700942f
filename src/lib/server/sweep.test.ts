import { mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, expect, test } from 'vitest';
import { tracks } from './db/schema';
import { diskStorage, type Storage } from './storage';
import { sweepOrphans } from './sweep';
import { makeTestDb } from './testing/test-db';

let t: ReturnType<typeof makeTestDb>;
let dir: string;
let store: Storage;
const sha = (c: string) => c.repeat(64);
const now = 1_800_000_000_000;

beforeEach(() => {
	t = makeTestDb();
	dir = mkdtempSync(join(tmpdir(), 'floorset-sweep-'));
	store = diskStorage(dir);
});
afterEach(() => {
	t.cleanup();
	rmSync(dir, { recursive: true, force: true });
});

function trackRow(key: string, hash: string) {
	return {
		title: 'Invented song',
		durationS: 10,
		mimeType: 'audio/mpeg',
		fileSize: 3,
		sha256: hash,
		storageKey: key
	};
}

test('removes files without rows and half-written files; marks, never deletes, rows without files', async () => {
	await store.put(`audio/${sha('a')}.mp3`, new Uint8Array([1, 2, 3])); // has a row
	await store.put(`audio/${sha('b')}.mp3`, new Uint8Array([1, 2, 3])); // orphan file
	writeFileSync(join(dir, 'audio', `${sha('c')}.mp3.123.part`), 'half');
	t.db
		.insert(tracks)
		.values(trackRow(`audio/${sha('a')}.mp3`, sha('a')))
		.run();
	t.db
		.insert(tracks)
		.values(trackRow(`audio/${sha('d')}.mp3`, sha('d')))
		.run(); // file gone

	const report = await sweepOrphans(store, now);

	expect(report.temporaryFiles).toBe(1);
	expect(report.orphanFiles).toEqual([`audio/${sha('b')}.mp3`]);
	expect(report.tracksWithoutFile).toHaveLength(1);
	expect(readdirSync(join(dir, 'audio'))).toEqual([`${sha('a')}.mp3`]);
	// The row whose file is gone stays, marked; the other is untouched (issue 13, finding 4).
	expect(
		t.db
			.select()
			.from(tracks)
			.all()
			.map((r) => [r.sha256, r.audioMissingAt])
	).toEqual([
		[sha('a'), null],
		[sha('d'), now]
	]);
});

test('a clean store is left alone', async () => {
	await store.put(`audio/${sha('a')}.mp3`, new Uint8Array([1]));
	t.db
		.insert(tracks)
		.values(trackRow(`audio/${sha('a')}.mp3`, sha('a')))
		.run();
	const report = await sweepOrphans(store);
	expect(report).toEqual({
		temporaryFiles: 0,
		orphanFiles: [],
		tracksWithoutFile: [],
		sheetsWithoutFile: []
	});
});

test('a wrong upload folder (every file missing) removes no rows', async () => {
	t.db
		.insert(tracks)
		.values(trackRow(`audio/${sha('e')}.mp3`, sha('e')))
		.run();
	t.db
		.insert(tracks)
		.values(trackRow(`audio/${sha('f')}.mp3`, sha('f')))
		.run();
	const report = await sweepOrphans(store);
	expect(report.uploadDirLooksWrong).toBe(true);
	expect(t.db.select().from(tracks).all()).toHaveLength(2);
});
