// A cheap answer to "has anything in the database changed since?": SQLite counts every row this
// connection inserts, updates or deletes (total_changes(), triggers included), and
// `PRAGMA data_version` moves when another connection commits (a second process, a test).
// Reading both costs microseconds, so a cache can check it on every request and never serve a
// value computed before a write, whichever code path made the write. A serial number per
// connection keeps two databases (tests, a reopened file) from ever sharing a stamp.
import type Database from 'better-sqlite3';

interface Readers {
	serial: number;
	changes: Database.Statement;
	version: Database.Statement;
}

const readers = new WeakMap<Database.Database, Readers>();
let connections = 0;

export function changeStamp(client: Database.Database): string {
	let r = readers.get(client);
	if (!r) {
		r = {
			serial: ++connections,
			changes: client.prepare('SELECT total_changes()').pluck(),
			version: client.prepare('PRAGMA data_version').pluck()
		};
		readers.set(client, r);
	}
	return `${r.serial}:${r.changes.get()}:${r.version.get()}`;
}
