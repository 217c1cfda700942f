// A backup taken while another connection keeps writing restores with every row committed
// before the backup finished (SQLite online backup API: the copy is a consistent snapshot).
import Database from 'better-sqlite3';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, expect, test } from 'vitest';
import { backupDatabase, integrityOf, restoreDatabase } from './backup';
import { openDb } from './db';
import { outbox } from './db/schema';

let dir: string;
beforeEach(() => (dir = mkdtempSync(join(tmpdir(), 'floorset-backup-'))));
afterEach(() => rmSync(dir, { recursive: true, force: true }));

test('a backup under write load restores every row committed before it', async () => {
	const live = join(dir, 'live.db');
	const db = openDb(live);
	const insert = (i: number) =>
		db
			.insert(outbox)
			.values({ from: 'a@x.test', to: 'b@x.test', subject: `m${i}`, text: '', raw: '' })
			.run();
	for (let i = 0; i < 2000; i++) insert(i);

	// Keep writing from the event loop while the backup copies pages.
	let written = 2000;
	let writing = true;
	const writer = (async () => {
		while (writing) {
			insert(written++);
			await new Promise((r) => setImmediate(r));
		}
	})();
	const backup = join(dir, 'backup.db');
	await backupDatabase(live, backup);
	writing = false;
	await writer;

	expect(integrityOf(backup)).toBe('ok');
	const copied = new Database(backup, { readonly: true });
	const subjects = copied
		.prepare('select subject from outbox order by id')
		.pluck()
		.all() as string[];
	copied.close();
	// A snapshot: a prefix of what was written, never a gap, and at least what existed before.
	expect(subjects.length).toBeGreaterThanOrEqual(2000);
	expect(subjects).toEqual(Array.from({ length: subjects.length }, (_, i) => `m${i}`));

	// Restore into a fresh file and read the rows back.
	db.$client.close();
	const restored = join(dir, 'restored.db');
	await restoreDatabase(backup, restored);
	const back = new Database(restored, { readonly: true });
	expect(back.prepare('select count(*) from outbox').pluck().get()).toBe(subjects.length);
	back.close();
});

test('restoring a damaged file is refused', async () => {
	const bad = join(dir, 'bad.db');
	const { writeFileSync } = await import('node:fs');
	writeFileSync(bad, 'this is not a database');
	await expect(restoreDatabase(bad, join(dir, 'x.db'))).rejects.toThrow();
});
