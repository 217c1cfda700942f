// Against the real migrations. What the stamp may rely on is SQLite's documented behaviour:
// AFTER triggers run for each row inserted, updated or deleted, inside the statement's
// transaction (https://sqlite.org/lang_createtrigger.html), so a rolled-back write takes its
// count back with it; a reader in WAL mode sees another connection's commit from its next
// statement on (https://sqlite.org/wal.html).
import { eq } from 'drizzle-orm';
import Database from 'better-sqlite3';
import { afterEach, beforeEach, expect, test } from 'vitest';
import type { Db } from '../db';
import { outbox, signInFailures, tracks, users } from '../db/schema';
import { makeTestDb } from '../testing/test-db';
import { changeStamp, type CountedTable } from './change-stamp';

let t: { db: Db; cleanup: () => void };
beforeEach(() => (t = makeTestDb()));
afterEach(() => t.cleanup());

const CONTENT: CountedTable[] = ['tracks', 'dances', 'fits', 'evenings'];
const WHO: CountedTable[] = ['users', 'user_roles'];
const stamp = (tables: CountedTable[]) => changeStamp(t.db.$client, tables);

const addTrack = () =>
	t.db
		.insert(tracks)
		.values({
			title: 'Kettle Road',
			durationS: 200,
			mimeType: 'audio/mpeg',
			fileSize: 1,
			sha256: String(Math.random()),
			storageKey: 'k'
		})
		.returning({ id: tracks.id })
		.get().id;

test('reads leave the stamp alone; every insert, update and delete moves it', () => {
	const s0 = stamp(CONTENT);
	t.db.select().from(tracks).all();
	expect(stamp(CONTENT)).toBe(s0);
	const seen = new Set([s0]);
	const id = addTrack();
	for (const write of [
		() => undefined,
		() => t.db.update(tracks).set({ title: 'Kettle Road (long)' }).where(eq(tracks.id, id)).run(),
		() => t.db.delete(tracks).where(eq(tracks.id, id)).run()
	]) {
		write();
		const s = stamp(CONTENT);
		expect(seen.has(s)).toBe(false);
		seen.add(s);
	}
});

test('writes to tables a cache does not hold leave its stamp alone', () => {
	const content = stamp(CONTENT);
	const who = stamp(WHO);
	// A failed sign-in and a queued e-mail: the example of a write that emptied caches.
	t.db.insert(signInFailures).values({ key: 'ip:127.0.0.1', at: Date.now() }).run();
	t.db
		.insert(outbox)
		.values({ from: 'a@b.test', to: 'c@d.test', subject: 's', text: 't', raw: 'r' })
		.run();
	expect(stamp(CONTENT)).toBe(content);
	expect(stamp(WHO)).toBe(who);
	addTrack();
	expect(stamp(WHO)).toBe(who);
	expect(stamp(CONTENT)).not.toBe(content);
	t.db.insert(users).values({ email: 'new@b.test', name: 'Wren Alder' }).run();
	expect(stamp(WHO)).not.toBe(who);
});

test('a rolled-back write leaves the stamp where the data is', () => {
	const s0 = stamp(CONTENT);
	const fail = t.db.$client.transaction(() => {
		addTrack();
		expect(stamp(CONTENT)).not.toBe(s0);
		throw new Error('undo');
	});
	expect(fail).toThrow('undo');
	expect(stamp(CONTENT)).toBe(s0);
});

test('a commit by another connection moves it', () => {
	const s0 = stamp(CONTENT);
	const other = new Database(t.db.$client.name);
	other
		.prepare(
			"INSERT INTO tracks (title, duration_s, mime_type, file_size, sha256, storage_key) VALUES ('x', 1, 'audio/mpeg', 1, 'elsewhere', 'k')"
		)
		.run();
	other.close();
	expect(stamp(CONTENT)).not.toBe(s0);
});

test('every table is either counted or named here as held by no cache', () => {
	const HELD_BY_NO_CACHE = ['invitations', 'password_resets', 'sign_in_failures', 'outbox'];
	const all = t.db.$client
		.prepare(
			"SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' AND name NOT LIKE '__drizzle%' AND name != 'data_changes'"
		)
		.pluck()
		.all() as string[];
	const counted = t.db.$client
		.prepare('SELECT table_name FROM data_changes')
		.pluck()
		.all() as string[];
	expect([...counted, ...HELD_BY_NO_CACHE].sort()).toEqual([...all].sort());
	const triggers = t.db.$client
		.prepare("SELECT tbl_name FROM sqlite_master WHERE type = 'trigger' AND name LIKE '%_counted'")
		.pluck()
		.all() as string[];
	for (const table of counted) expect(triggers.filter((x) => x === table)).toHaveLength(3);
});

test('two connections never share a stamp, even with the same history', () => {
	const other = makeTestDb();
	try {
		expect(changeStamp(other.db.$client, CONTENT)).not.toBe(stamp(CONTENT));
	} finally {
		other.cleanup();
	}
});
