// The stamp's meaning comes from SQLite's own documentation: total_changes() counts the rows
// inserted, updated or deleted by this connection, triggers included
// (https://sqlite.org/c3ref/total_changes.html), and PRAGMA data_version changes when another
// connection commits (https://sqlite.org/pragma.html#pragma_data_version).
import Database from 'better-sqlite3';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, expect, test } from 'vitest';
import { changeStamp } from './change-stamp';

let dir: string;
let a: Database.Database;
beforeEach(() => {
	dir = mkdtempSync(join(tmpdir(), 'floorset-stamp-'));
	a = new Database(join(dir, 'x.db'));
	a.pragma('journal_mode = WAL');
	a.exec('CREATE TABLE t (id INTEGER PRIMARY KEY, v TEXT)');
	a.exec('CREATE TABLE log (n INTEGER)');
});
afterEach(() => {
	a.close();
	rmSync(dir, { recursive: true, force: true });
});

test('reads leave the stamp alone; every insert, update and delete moves it', () => {
	const s0 = changeStamp(a);
	a.prepare('SELECT * FROM t').all();
	expect(changeStamp(a)).toBe(s0);
	const seen = new Set([s0]);
	for (const sql of [
		"INSERT INTO t (v) VALUES ('one')",
		"UPDATE t SET v = 'two'",
		'DELETE FROM t'
	]) {
		a.exec(sql);
		const s = changeStamp(a);
		expect(seen.has(s)).toBe(false);
		seen.add(s);
	}
});

test('an update that a trigger turns into more writes, and a rolled-back one, both move it', () => {
	a.exec("INSERT INTO t (v) VALUES ('one')");
	a.exec('CREATE TRIGGER bump AFTER UPDATE ON t BEGIN INSERT INTO log VALUES (1); END');
	const s0 = changeStamp(a);
	a.exec("UPDATE t SET v = 'x'");
	const s1 = changeStamp(a);
	expect(s1).not.toBe(s0);
	const fail = a.transaction(() => {
		a.exec("UPDATE t SET v = 'y'");
		throw new Error('undo');
	});
	expect(fail).toThrow('undo');
	expect(changeStamp(a)).not.toBe(s1);
});

test('a commit by another connection moves it', () => {
	const b = new Database(join(dir, 'x.db'));
	const s0 = changeStamp(a);
	b.exec("INSERT INTO t (v) VALUES ('from elsewhere')");
	b.close();
	expect(changeStamp(a)).not.toBe(s0);
});

test('two connections never share a stamp, even with the same history', () => {
	const b = new Database(':memory:');
	const c = new Database(':memory:');
	expect(changeStamp(b)).not.toBe(changeStamp(c));
	b.close();
	c.close();
});
