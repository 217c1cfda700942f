// Consistent copies of the live database through SQLite's online backup API (better-sqlite3's
// db.backup), which copies page by page while other connections keep reading and writing.
import Database from 'better-sqlite3';
import { existsSync, mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';

export async function backupDatabase(source: string, target: string): Promise<{ pages: number }> {
	mkdirSync(dirname(resolve(target)), { recursive: true });
	const db = new Database(source, { fileMustExist: true });
	try {
		db.pragma('busy_timeout = 5000');
		const result = await db.backup(target);
		return { pages: result.totalPages };
	} finally {
		db.close();
	}
}

export function integrityOf(file: string): string {
	const db = new Database(file, { readonly: true, fileMustExist: true });
	try {
		return String(db.pragma('integrity_check', { simple: true }));
	} finally {
		db.close();
	}
}

/** Restores FILE over the live database, after checking the backup is sound. */
export async function restoreDatabase(backup: string, live: string) {
	if (!existsSync(backup)) throw new Error(`No backup at ${backup}`);
	const check = integrityOf(backup);
	if (check !== 'ok') throw new Error(`The backup fails SQLite's integrity check: ${check}`);
	// Copy through the backup API into the live file, so the WAL and open readers stay coherent.
	return backupDatabase(backup, live);
}
