// A published evening's page is read by a hall full of dancers scanning the same QR code, nearly
// all signed out, and every one of them gets the same page. That page is rendered once per
// change to the tables it reads and then served as it was. Only signed-out GETs of the public
// evening pages are kept (no session cookie, no query), and only when no write overlapped the rendering. The
// Content-Security-Policy uses hashes (svelte.config.js), not a per-response nonce, so a page
// served twice weakens nothing.
import { createHash } from 'node:crypto';
import type { Handle } from '@sveltejs/kit';
import { db } from '../db';
import { clearing, sessionCookieNames } from '../session-cookie';
import { changeStamp, CONTENT_TABLES } from './change-stamp';
import { CachedBody } from './cached-body';
import { StampedCache } from './stamped-cache';

interface CachedPage {
	status: number;
	headers: [string, string][];
	body: CachedBody;
}

/** 16 MB: hundreds of evenings' pages. */
export const publicPages = new StampedCache<CachedPage>(16 * 1024 * 1024, (p) => p.body.byteLength);

const rendering = new Map<string, Promise<CachedPage | null>>();

const PUBLIC_PAGE = /^\/e\/[A-Za-z0-9_-]{1,64}(\/poster)?$/;

const replay = (p: CachedPage, request: Request) =>
	p.body.respond(request, { status: p.status, headers: p.headers });

function withCookies(response: Response, cookies: string[]): Response {
	for (const c of cookies) response.headers.append('set-cookie', c);
	return response;
}

export const cachePublicPages: Handle = async ({ event, resolve }) => {
	if (
		event.request.method !== 'GET' ||
		event.locals.user ||
		event.url.search ||
		!PUBLIC_PAGE.test(event.url.pathname)
	) {
		return resolve(event);
	}
	// Signed out with a session cookie: one nobody could read (damaged, forged, or from before a
	// password change). The kept page is served all the same, and the answer deletes the cookie.
	const unreadable = sessionCookieNames(event.cookies);
	const key = event.url.pathname;
	const stamp = changeStamp(db().$client, CONTENT_TABLES);
	const kept = publicPages.get(key, stamp);
	if (kept) return withCookies(replay(kept, event.request), clearing(unreadable));
	// When the QR code goes up, a hundred phones ask at once: one renders, the rest wait for it.
	const flight = `${stamp} ${key}`;
	const pending = rendering.get(flight);
	if (pending) {
		const page = await pending;
		if (page) return withCookies(replay(page, event.request), clearing(unreadable));
		return resolve(event);
	}
	let settle!: (page: CachedPage | null) => void;
	rendering.set(flight, new Promise((r) => (settle = r)));
	let page: CachedPage | null = null;
	try {
		const response = await resolve(event);
		// Auth.js's own cookies (clearing an unreadable session) belong to this answer only; any
		// other cookie would mean the page is not the same for everyone, so it is not kept.
		const cookies = response.headers.getSetCookie();
		if (
			response.status !== 200 ||
			!cookies.every((c) => /^(__Secure-)?authjs\./.test(c)) ||
			!response.headers.get('content-type')?.startsWith('text/html') ||
			changeStamp(db().$client, CONTENT_TABLES) !== stamp
		) {
			return response;
		}
		const bytes = new Uint8Array(await response.arrayBuffer());
		page = {
			status: response.status,
			// Length and encoding are set for each reply, by the form it goes out in. A browser
			// (or a proxy) may keep the page but asks again each time; the ETag turns an unchanged
			// page into a 304 with no body (RFC 9111 §5.2.2.4, RFC 9110 §13.1.2). A signed-in
			// visitor's page differs, hence Vary: Cookie.
			headers: [
				...[...response.headers].filter(
					([name]) => !['content-length', 'set-cookie', 'cache-control', 'etag'].includes(name)
				),
				['cache-control', 'no-cache'],
				['vary', 'cookie'],
				['etag', `"${createHash('sha256').update(bytes).digest('base64url').slice(0, 27)}"`]
			],
			body: new CachedBody(bytes)
		};
		publicPages.set(key, stamp, page);
		return withCookies(replay(page, event.request), cookies);
	} finally {
		rendering.delete(flight);
		settle(page);
	}
};
