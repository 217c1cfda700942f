// One helper builds every test's database: a temporary SQLite file with the real migrations.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { openDb, useDb, type Db } from '../db';

export function makeTestDb(): { db: Db; cleanup: () => void } {
	const dir = mkdtempSync(join(tmpdir(), 'floorset-test-'));
	const db = openDb(join(dir, 'test.db'));
	useDb(db);
	return {
		db,
		cleanup: () => {
			db.$client.close();
			useDb(undefined);
			rmSync(dir, { recursive: true, force: true });
		}
	};
}
