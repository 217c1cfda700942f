// The migrations as a live database meets them: each step keeps the rows already there.
import Database from 'better-sqlite3';
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { drizzle } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import { afterEach, expect, test } from 'vitest';
import { migrationsFolder } from './index';

const dirs: string[] = [];
afterEach(() => dirs.splice(0).forEach((d) => rmSync(d, { recursive: true, force: true })));

/** The migrations folder with only its first `n` steps in the journal. */
function firstSteps(n: number): string {
	const dir = mkdtempSync(join(tmpdir(), 'floorset-migrations-'));
	dirs.push(dir);
	cpSync(migrationsFolder(), dir, { recursive: true });
	const journalFile = join(dir, 'meta', '_journal.json');
	const journal = JSON.parse(readFileSync(journalFile, 'utf8'));
	journal.entries = journal.entries.slice(0, n);
	writeFileSync(journalFile, JSON.stringify(journal));
	return dir;
}

test('adding formation keeps every dance and its fits, each dance a line dance', () => {
	const sqlite = new Database(':memory:');
	sqlite.pragma('foreign_keys = ON');
	const db = drizzle(sqlite);
	migrate(db, { migrationsFolder: firstSteps(5) });
	sqlite.exec(`INSERT INTO dances (name, counts, walls, level, bpm_min, bpm_max)
		VALUES ('Harrow Gate Shuffle', 32, 4, 'beginner', 100, 120)`);
	sqlite.exec(`INSERT INTO tracks (title, duration_s, storage_key, mime_type, sha256, file_size)
		VALUES ('Pinewick Road', 200, 'audio/x.mp3', 'audio/mpeg', 'x', 1)`);
	// A team's verdict: the row a cascading table rebuild would silently delete.
	sqlite.exec(`INSERT INTO fits (track_id, dance_id, verdict) VALUES (1, 1, 'fits')`);

	migrate(db, { migrationsFolder: migrationsFolder() });
	expect(sqlite.prepare('SELECT formation FROM dances').all()).toEqual([{ formation: 'line' }]);
	expect(sqlite.prepare('SELECT count(*) AS n FROM fits').get()).toEqual({ n: 1 });
	expect(() => sqlite.exec(`UPDATE dances SET formation = 'square'`)).toThrow(/CHECK/);
	sqlite.close();
});

test('a track that answered a request can still be deleted; the answer forgets it', () => {
	const sqlite = new Database(':memory:');
	sqlite.pragma('foreign_keys = ON');
	migrate(drizzle(sqlite), { migrationsFolder: migrationsFolder() });
	sqlite.exec(`INSERT INTO tracks (title, duration_s, storage_key, mime_type, sha256, file_size)
		VALUES ('Pinewick Road', 200, 'audio/x.mp3', 'audio/mpeg', 'x', 1)`);
	sqlite.exec(
		`INSERT INTO requests (dance_name, answer, answer_track_id) VALUES ('Any', 'Yes', 1)`
	);
	sqlite.exec('DELETE FROM tracks');
	expect(sqlite.prepare('SELECT answer, answer_track_id AS t FROM requests').get()).toEqual({
		answer: 'Yes',
		t: null
	});
	sqlite.close();
});
