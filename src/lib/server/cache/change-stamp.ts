// A cheap answer to "have the tables this cache holds changed since?": the triggers of
// migration 0007 count every row inserted, updated or deleted in each such table, inside the
// writing transaction and from any connection (a second process, a test). Reading the counters
// is one small indexed query, so a cache checks it on every request and never serves a value
// computed before a write to its tables, whichever code path made the write; writes to other
// tables (a failed sign-in, the outbox) leave it be. A serial number per connection keeps two
// databases (tests, a reopened file) from ever sharing a stamp.
import type Database from 'better-sqlite3';

/** The tables with a counter (migration 0007); a cache names the ones it holds. */
export type CountedTable =
	| 'users'
	| 'user_roles'
	| 'tracks'
	| 'dances'
	| 'fits'
	| 'settings'
	| 'evenings'
	| 'sections'
	| 'run_order_entries'
	| 'requests';

/**
 * What the JSON answers and the public page read: the library, the catalogue, the fits, the
 * evenings and the names of the people in them.
 */
export const CONTENT_TABLES: readonly CountedTable[] = [
	'users',
	'tracks',
	'dances',
	'fits',
	'settings',
	'evenings',
	'sections',
	'run_order_entries',
	'requests'
];

interface Readers {
	serial: number;
	versions: Database.Statement<[string], string | null>;
}

const readers = new WeakMap<Database.Database, Readers>();
let connections = 0;

export function changeStamp(client: Database.Database, tables: readonly CountedTable[]): string {
	let r = readers.get(client);
	if (!r) {
		r = {
			serial: ++connections,
			versions: client
				.prepare<[string], string | null>(
					`SELECT group_concat(version, '.') FROM (
						SELECT version FROM data_changes
						WHERE table_name IN (SELECT value FROM json_each(?)) ORDER BY table_name)`
				)
				.pluck()
		};
		readers.set(client, r);
	}
	return `${r.serial}:${r.versions.get(JSON.stringify(tables))}`;
}
