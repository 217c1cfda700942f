// JSON answers that depend only on the database and the request's own words (not on who asks,
// once the route's right is checked), kept until the next write to the tables they read. Many
// people open the same music table and the same dance's fits; each ranking or page is computed
// once per change.
import { db } from '../db';
import { changeStamp, CONTENT_TABLES } from './change-stamp';
import { CachedBody } from './cached-body';
import { StampedCache } from './stamped-cache';

const encoder = new TextEncoder();

/** 32 MB of kept answers at most: a few hundred music-table pages. */
export const jsonCache = new StampedCache<CachedBody>(32 * 1024 * 1024);

/**
 * A JSON response for `key`, computed by `compute` at most once per database change; null (not
 * kept) when `compute` finds nothing to answer, so the route can say what is missing.
 */
export function cachedJson(request: Request, key: string, compute: () => unknown): Response | null {
	const stamp = changeStamp(db().$client, CONTENT_TABLES);
	let body = jsonCache.get(key, stamp);
	if (!body) {
		const value = compute();
		if (value == null) return null;
		body = new CachedBody(encoder.encode(JSON.stringify(value)));
		jsonCache.set(key, stamp, body);
	}
	return body.respond(request, { headers: { 'content-type': 'application/json' } });
}
