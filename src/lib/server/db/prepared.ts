// Drizzle builds a query's SQL anew on each call (tens of microseconds); the queries every
// request runs are prepared once per database with `.prepare()` and placeholders instead.
import { db, type Db } from './index';

/** `build`'s prepared statements for the current database, built on first use. */
export function preparedFor<T>(build: (d: Db) => T): () => T {
	const kept = new WeakMap<Db, T>();
	return () => {
		const d = db();
		let statements = kept.get(d);
		if (!statements) kept.set(d, (statements = build(d)));
		return statements;
	};
}
