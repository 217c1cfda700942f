// The Drizzle client over better-sqlite3, opened lazily (never while SvelteKit builds) with
// WAL, foreign keys and a busy timeout, and migrated on first open.
import Database from 'better-sqlite3';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { config } from '../config';
import * as schema from './schema';

export type Db = BetterSQLite3Database<typeof schema> & { $client: Database.Database };

let instance: Db | undefined;

/** Where the generated SQL migrations live; drizzle-kit writes them to ./drizzle. */
export const migrationsFolder = () => resolve(process.env.MIGRATIONS_DIR ?? 'drizzle');

export function openDb(file: string): Db {
	if (file !== ':memory:') mkdirSync(dirname(resolve(file)), { recursive: true });
	const sqlite = new Database(file);
	sqlite.pragma('journal_mode = WAL');
	sqlite.pragma('foreign_keys = ON');
	sqlite.pragma('busy_timeout = 5000');
	sqlite.pragma('synchronous = NORMAL');
	const db = drizzle(sqlite, { schema }) as Db;
	migrate(db, { migrationsFolder: migrationsFolder() });
	return db;
}

export function db(): Db {
	instance ??= openDb(config().DATABASE_URL);
	return instance;
}

export function closeDb() {
	instance?.$client.close();
	instance = undefined;
}

/** Tests swap in a database of their own. */
export function useDb(next: Db | undefined) {
	instance = next;
}

export { schema };
